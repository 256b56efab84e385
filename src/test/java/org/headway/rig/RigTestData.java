package org.headway.rig;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;
import org.headway.friction.FrictionMethods;
import org.headway.system.SiteAtmosphere;

/** Synthetic rig points for tests, built with an independent Colebrook–White solve. */
final class RigTestData {

    private RigTestData() {}

    /**
     * Colebrook–White by plain fixed-point iteration of x ← −2 log₁₀(ε/(3.7 D) + 2.51 x/Re), x = 1/√f
     * (C. F. Colebrook, J. ICE 11(4), 1939); it contracts by (2/ln 10)/x &lt; 0.3 a step in
     * turbulent flow, so 200 steps reach the double-precision fixed point.
     */
    static double colebrook(double reynolds, double relativeRoughness) {
        double x = 8.0;
        for (int i = 0; i < 200; i++) {
            x = -2.0 * Math.log10(relativeRoughness / 3.7 + 2.51 * x / reynolds);
        }
        return 1.0 / (x * x);
    }

    /** Pressure drop by Darcy–Weisbach, Δp = f (L/D) ρV²/2 (Pa). */
    static double pressureDrop(double f, double diameter, double length, double density, double velocity) {
        return f * length / diameter * density * velocity * velocity / 2.0;
    }

    static RigDescription rig(double diameter, double length, double roughness, RigUncertainty uncertainty) {
        return new RigDescription(
                "test rig",
                diameter,
                length,
                roughness,
                FrictionMethods.byId("colebrook"),
                "constant properties",
                uncertainty,
                List.of());
    }

    /**
     * Turbulent points from Colebrook at a true roughness, f multiplied by exp(σ·z), z standard
     * normal, Re spaced evenly in log between two limits.
     */
    static List<RigPoint> turbulentPoints(
            int count,
            double minReynolds,
            double maxReynolds,
            double diameter,
            double length,
            double trueRoughness,
            double noise,
            long seed) {
        double density = 998.0;
        double viscosity = 1.0e-3;
        Random random = new Random(seed);
        List<RigPoint> points = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            double re = minReynolds * Math.pow(maxReynolds / minReynolds, i / (count - 1.0));
            double velocity = re * viscosity / (density * diameter);
            double flow = velocity * Math.PI * diameter * diameter / 4.0;
            double f = colebrook(re, trueRoughness / diameter) * Math.exp(noise * random.nextGaussian());
            double dp = pressureDrop(f, diameter, length, density, velocity);
            points.add(new RigPoint(
                    i + 2,
                    flow,
                    dp,
                    OptionalDouble.empty(),
                    RigFluidProperties.constant(density, viscosity, SiteAtmosphere.SEA_LEVEL_PRESSURE),
                    List.of()));
        }
        return points;
    }
}
