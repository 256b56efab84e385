package org.headway.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;
import org.apache.commons.math3.random.Well19937c;
import org.headway.system.SiteAtmosphere;
import org.junit.jupiter.api.Test;

class RigUncertaintyPropagationTest {

    /** Monte Carlo draws, as in JCGM 101:2008 (GUM Supplement 1), 7.2: 10⁶ advised, 2·10⁵ here for speed. */
    private static final int DRAWS = 200_000;
    /**
     * Allowed relative difference between the first-order and the Monte Carlo standard uncertainty:
     * the sampling error of a standard deviation from 2·10⁵ draws is 1/√(2N) ≈ 0.16 %, and the
     * second-order terms of f ∝ Q⁻² at 1 % are a few 0.01 %; 2 % leaves room for both.
     */
    private static final double MONTE_CARLO_AGREEMENT = 0.02;

    private static final double D = 0.0254;
    private static final double L = 2.0;
    private static final double Q = 1.0e-3;
    private static final double DP = 9000.0;
    private static final double T = 293.15;
    private static final double RHO = 998.2;
    private static final double MU = 1.0e-3;
    /** Slopes of the property model; test values, chosen near water at 20 °C (from memory). */
    private static final double RHO_SLOPE = -0.21;

    private static final double MU_SLOPE = -2.2e-5;

    private static final RigUncertainty STATED = new RigUncertainty(
            InstrumentUncertainty.relative(0.01),
            InstrumentUncertainty.absolute(250.0),
            InstrumentUncertainty.absolute(0.2),
            InstrumentUncertainty.absolute(0.05e-3),
            InstrumentUncertainty.absolute(2e-3),
            InstrumentUncertainty.relative(0.0005),
            InstrumentUncertainty.relative(0.01));

    private static RigPointResult analyticPoint(RigUncertainty u) {
        RigDescription rig = RigTestData.rig(D, L, 1.5e-6, u);
        RigPoint point = new RigPoint(
                2,
                Q,
                DP,
                OptionalDouble.of(T),
                new RigFluidProperties(
                        RigFluidProperties.constant(RHO, MU, SiteAtmosphere.SEA_LEVEL_PRESSURE)
                                .state(),
                        RHO_SLOPE,
                        MU_SLOPE),
                List.of());
        return RigAnalysis.of(rig).analysePoint(point);
    }

    @Test
    void firstOrderAgreesWithMonteCarloPropagation() {
        // JCGM 101:2008 (GUM-S1) practice: draw every input from its distribution (normal here,
        // standard deviation = the stated standard uncertainty), evaluate the model for each draw, and
        // compare the standard deviation of the output with the law of propagation (JCGM 100:2008 5.1.2).
        Well19937c random = new Well19937c(20081201L);
        double[] f = new double[DRAWS];
        double[] re = new double[DRAWS];
        for (int i = 0; i < DRAWS; i++) {
            double q = Q * (1 + 0.01 * random.nextGaussian());
            double dp = DP + 250.0 * random.nextGaussian();
            double dT = 0.2 * random.nextGaussian();
            double d = D + 0.05e-3 * random.nextGaussian();
            double length = L + 2e-3 * random.nextGaussian();
            double rho = RHO + RHO_SLOPE * dT + RHO * 0.0005 * random.nextGaussian();
            double mu = MU + MU_SLOPE * dT + MU * 0.01 * random.nextGaussian();
            double v = 4 * q / (Math.PI * d * d);
            f[i] = 2 * dp * d / (rho * v * v * length);
            re[i] = rho * v * d / mu;
        }
        RigPointResult analytic = analyticPoint(STATED);
        PointUncertainty u = analytic.uncertainty();
        double fStd = standardDeviation(f);
        double reStd = standardDeviation(re);
        double fAnalytic = u.frictionRelative() * analytic.frictionFactor();
        double reAnalytic = u.reynoldsRelative() * analytic.reynolds();
        assertEquals(1.0, fStd / fAnalytic, MONTE_CARLO_AGREEMENT, "u(f): MC " + fStd + ", first order " + fAnalytic);
        assertEquals(
                1.0, reStd / reAnalytic, MONTE_CARLO_AGREEMENT, "u(Re): MC " + reStd + ", first order " + reAnalytic);
        // The probabilistically symmetric 95 % interval of the draws (GUM-S1 7.7) against ±U (k = 2).
        double halfWidth = (quantile(f, 0.975) - quantile(f, 0.025)) / 2;
        assertEquals(1.0, halfWidth / u.frictionExpanded(), 0.05);
        assertEquals(2.0, u.coverageFactor(), 0.0);
        assertEquals(2.0 * fAnalytic, u.frictionExpanded(), 1e-15);
    }

    @Test
    void diameterDominatesThroughItsFifthPower() {
        // f ∝ D⁵: a 0.5 % bore uncertainty alone gives 2.5 % in f (relative sensitivity 5, GUM 5.1.6)
        // and 0.5 % in Re (sensitivity −1).
        RigUncertainty u = new RigUncertainty(
                InstrumentUncertainty.relative(0.001),
                InstrumentUncertainty.relative(0.001),
                InstrumentUncertainty.NONE,
                InstrumentUncertainty.relative(0.005),
                InstrumentUncertainty.NONE,
                InstrumentUncertainty.NONE,
                InstrumentUncertainty.NONE);
        PointUncertainty p = analyticPoint(u).uncertainty();
        double expectedF = Math.sqrt(0.025 * 0.025 + 0.002 * 0.002 + 0.001 * 0.001);
        double expectedRe = Math.sqrt(0.005 * 0.005 + 0.001 * 0.001);
        assertEquals(expectedF, p.frictionRelative(), 1e-15);
        assertEquals(expectedRe, p.reynoldsRelative(), 1e-15);
        assertEquals(UncertaintySource.INNER_DIAMETER, p.dominantFrictionSource());
        assertEquals(0.025 * 0.025 / (expectedF * expectedF), p.dominantFrictionShare(), 1e-12);
        assertEquals(UncertaintySource.INNER_DIAMETER, p.dominantReynoldsSource());
    }

    @Test
    void temperatureActsOnlyThroughTheProperties() {
        RigUncertainty onlyT = new RigUncertainty(
                InstrumentUncertainty.NONE,
                InstrumentUncertainty.NONE,
                InstrumentUncertainty.absolute(0.5),
                InstrumentUncertainty.NONE,
                InstrumentUncertainty.NONE,
                InstrumentUncertainty.NONE,
                InstrumentUncertainty.NONE);
        PointUncertainty p = analyticPoint(onlyT).uncertainty();
        // ∂ln f/∂T = −(dρ/dT)/ρ; ∂ln Re/∂T = (dρ/dT)/ρ − (dμ/dT)/μ (chain rule on the model).
        assertEquals(Math.abs(RHO_SLOPE / RHO) * 0.5, p.frictionRelative(), 1e-15);
        assertEquals(Math.abs(RHO_SLOPE / RHO - MU_SLOPE / MU) * 0.5, p.reynoldsRelative(), 1e-15);
        assertEquals(UncertaintySource.TEMPERATURE, p.dominantReynoldsSource());
    }

    private static double standardDeviation(double[] x) {
        double mean = Arrays.stream(x).average().orElseThrow();
        double s = 0;
        for (double v : x) {
            s += (v - mean) * (v - mean);
        }
        return Math.sqrt(s / (x.length - 1));
    }

    private static double quantile(double[] x, double p) {
        double[] sorted = x.clone();
        Arrays.sort(sorted);
        return sorted[(int) Math.round(p * (sorted.length - 1))];
    }
}
