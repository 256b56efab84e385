package org.headway.system;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;
import org.headway.friction.FlowRegime;
import org.headway.friction.FrictionResult;

/**
 * Solve mode 1, head loss for a given flow: Darcy–Weisbach h_f = f (L/D) V²/(2g) per segment, minor
 * losses h_m = ΣK V²/(2g) with each fitting's K evaluated at the segment's Reynolds number and bore,
 * grade lines along the run, totals, NPSH available and cautions.
 *
 * <p>Accuracy: exact arithmetic of the formulas above in double precision; the friction factor's
 * accuracy is that of the chosen correlation (Colebrook solved to 1e-14 relative).
 */
public final class HeadLossCalculator {

    private HeadLossCalculator() {}

    /**
     * Full result at one flow.
     *
     * @param run the run
     * @param flow volumetric flow (m³/s), ≥ 0
     * @return per-segment results, totals, NPSH available and cautions
     */
    public static RunResult solve(PipeRun run, double flow) {
        InputException.requireNonNegative("flow", flow);
        FluidState fluid = run.fluid();
        double rho = fluid.density();
        double mu = fluid.dynamicViscosity();
        double g = Gravity.STANDARD;
        DesignLimits limits = run.limits();

        List<SegmentResult> results = new ArrayList<>(run.segments().size());
        Set<Caution> cautions = new LinkedHashSet<>();
        for (Caution c : fluid.cautions()) {
            cautions.add(c);
        }

        double energy = run.source().head(rho); // relative to the run's inlet elevation
        double elevation = 0;
        double friction = 0;
        double minor = 0;
        double staticHead = run.staticHead();
        double lossesBeforePump = 0;
        double elevationAtPump = 0;

        for (int i = 0; i < run.segments().size(); i++) {
            Segment s = run.segments().get(i);
            if (i == run.pumpPosition() && run.pump().isPresent()) {
                lossesBeforePump = friction + minor;
                elevationAtPump = elevation;
            }
            List<Caution> segmentCautions = new ArrayList<>();
            double area = s.area();
            double velocity = flow / area;
            double velocityHead = velocity * velocity / (2 * g);
            double reynolds = rho * velocity * s.innerDiameter() / mu;
            double f;
            String method;
            int iterations;
            FlowRegime regime;
            double kTotal = s.extraLossCoefficient();
            if (flow == 0) {
                f = 0;
                method = "none (no flow)";
                iterations = 0;
                regime = FlowRegime.LAMINAR;
            } else {
                FrictionResult fr = evaluateFriction(run, s, reynolds);
                f = fr.frictionFactor();
                method = fr.method();
                iterations = fr.iterations();
                regime = fr.regime();
                for (Caution c : fr.cautions()) {
                    segmentCautions.add(c.about(s.name()));
                }
                kTotal += fittingK(s, reynolds);
                for (FittingUse use : s.fittings()) {
                    for (Caution c : use.fitting().cautions(reynolds, s.innerDiameter())) {
                        segmentCautions.add(c.about(s.name()));
                    }
                }
            }
            double major = s.length() == 0 ? 0 : f * s.length() / s.innerDiameter() * velocityHead;
            double minorLoss = kTotal * velocityHead;
            double inletEnergy = energy;
            double inletElevation = elevation;
            energy -= major + minorLoss;
            elevation += s.elevationChange();
            friction += major;
            minor += minorLoss;

            if (flow > 0) {
                if (velocity > limits.maximumVelocity()) {
                    segmentCautions.add(Caution.warning(
                                    "velocity-high",
                                    String.format(
                                            "velocity %.3g m/s is above the usual design maximum of %.3g m/s (erosion,"
                                                    + " noise, surge)",
                                            velocity, limits.maximumVelocity()),
                                    DesignLimits.USUAL_BASIS)
                            .about(s.name()));
                } else if (velocity < limits.minimumVelocity()) {
                    segmentCautions.add(Caution.note(
                                    "velocity-low",
                                    String.format(
                                            "velocity %.3g m/s is below the usual design minimum of %.3g m/s (settling,"
                                                    + " trapped air, oversized pipe)",
                                            velocity, limits.minimumVelocity()),
                                    DesignLimits.USUAL_BASIS)
                            .about(s.name()));
                }
            }
            if ("aged".equalsIgnoreCase(s.pipeCondition()) || "corroded".equalsIgnoreCase(s.pipeCondition())) {
                segmentCautions.add(Caution.note(
                                "aged-roughness",
                                "roughness of aged pipe varies widely with water chemistry and service; the band"
                                        + " shows its range",
                                "common practice, no source")
                        .about(s.name()));
            }
            if (s.length() == 0) {
                segmentCautions.add(Caution.note(
                                "zero-length", "segment has zero length; only its fittings contribute", "input check")
                        .about(s.name()));
            }
            results.add(new SegmentResult(
                    s.name(),
                    velocity,
                    reynolds,
                    s.relativeRoughness(),
                    regime,
                    f,
                    method,
                    iterations,
                    major,
                    kTotal,
                    minorLoss,
                    velocityHead,
                    inletElevation,
                    elevation,
                    inletEnergy,
                    energy,
                    inletEnergy - velocityHead,
                    energy - velocityHead,
                    segmentCautions));
            cautions.addAll(segmentCautions);
        }
        if (run.pump().isPresent() && run.pumpPosition() == run.segments().size()) {
            lossesBeforePump = friction + minor;
            elevationAtPump = elevation;
        }

        double totalHead = staticHead + friction + minor;
        if (!Double.isFinite(totalHead) || !Double.isFinite(rho * g * totalHead)) {
            throw new InputException(
                    "flow",
                    "the head loss at " + flow + " m³/s overflows double precision; check flows, lengths and diameters"
                            + " and their units");
        }
        if (run.pump().isPresent()) {
            // The pump adds exactly the head the run needs at this flow, so downstream of it the grade lines
            // close on the delivery head. Without a pump they start at the source head and a deficit shows as a
            // positive total head.
            for (int i = run.pumpPosition(); i < results.size(); i++) {
                results.set(i, raised(results.get(i), totalHead));
            }
        }
        RunTotals totals = new RunTotals(
                friction, minor, staticHead, totalHead, rho * g * (friction + minor), rho * g * totalHead);

        if (flow > 0 && minor > friction && minor > 0) {
            cautions.add(Caution.note(
                    "minor-losses-dominate",
                    String.format(
                            "fitting losses (%.3g m) exceed pipe friction (%.3g m); published K values scatter"
                                    + " more than friction factors, so the total is less certain",
                            minor, friction),
                    "common practice, no source"));
        }
        // Round-off of a balanced gravity run leaves ~1e-14 m; only a real deficit is worth a caution.
        double resolution = 1e-9 * Math.max(1.0, Math.abs(staticHead) + friction + minor);
        if (run.pump().isEmpty() && totalHead > resolution && flow > 0) {
            cautions.add(Caution.note(
                    "head-required",
                    String.format(
                            "no pump is given for this run; at this flow it needs %.3g m of head that the ends alone"
                                    + " do not supply",
                            totalHead),
                    "energy balance"));
        }

        OptionalDouble npsh = OptionalDouble.empty();
        if (run.pump().isPresent()) {
            if (fluid.vapourPressure().isPresent()) {
                // NPSHa = (p_abs/ρg + V²/2g) − p_v/ρg at the pump suction; energy grade minus elevation is the gauge
                // pressure head plus the velocity head.
                double energyAtPump = run.source().head(rho) - lossesBeforePump;
                double value = energyAtPump
                        - elevationAtPump
                        + (run.atmosphericPressure() - fluid.vapourPressure().getAsDouble()) / (rho * g);
                npsh = OptionalDouble.of(value);
                PumpCurve pump = run.pump().get();
                double required = pump.npshRequired().orElse(0.0);
                double margin = limits.npshMargin();
                if (value < required + margin) {
                    String what = pump.npshRequired().isPresent()
                            ? String.format("NPSH required %.3g m plus a margin of %.3g m", required, margin)
                            : String.format("a margin of %.3g m (NPSH required unknown)", margin);
                    cautions.add(Caution.serious(
                            "cavitation-risk",
                            String.format(
                                    "NPSH available at the pump inlet is %.3g m, less than %s; the pump may cavitate",
                                    value, what),
                            "margin: common practice, no source; NPSH definition per ISO 17769-1"));
                }
            } else {
                cautions.add(Caution.note(
                        "npsh-unknown",
                        "the fluid model gives no vapour pressure, so NPSH available was not computed",
                        "fluid model"));
            }
        }
        cautions.add(Caution.GENERAL_REVIEW);
        return new RunResult(flow, results, totals, npsh, new ArrayList<>(cautions));
    }

    /**
     * Friction plus minor loss of the whole run at one flow, without grade lines or cautions (the
     * hot path of system curves, root finding and sizing).
     *
     * @param run the run
     * @param flow volumetric flow (m³/s), ≥ 0
     * @return head loss (m)
     */
    public static double headLossOnly(PipeRun run, double flow) {
        if (!(flow >= 0) || Double.isInfinite(flow)) {
            throw new InputException("flow", "must be a finite number ≥ 0, got " + flow);
        }
        if (flow == 0) {
            return 0;
        }
        double rho = run.fluid().density();
        double mu = run.fluid().dynamicViscosity();
        double total = 0;
        for (Segment s : run.segments()) {
            double velocity = flow / s.area();
            double velocityHead = velocity * velocity / (2 * Gravity.STANDARD);
            double reynolds = rho * velocity * s.innerDiameter() / mu;
            double f = frictionFactorOnly(run, s, reynolds);
            double k = s.extraLossCoefficient() + fittingK(s, reynolds);
            double major = s.length() == 0 ? 0 : f * s.length() / s.innerDiameter() * velocityHead;
            total += major + k * velocityHead;
        }
        return total;
    }

    /**
     * Total head a pump must supply at one flow: static head plus losses.
     *
     * @param run the run
     * @param flow volumetric flow (m³/s), ≥ 0
     * @return total head (m)
     */
    public static double totalHead(PipeRun run, double flow) {
        return run.staticHead() + headLossOnly(run, flow);
    }

    private static SegmentResult raised(SegmentResult r, double head) {
        return new SegmentResult(
                r.name(),
                r.velocity(),
                r.reynolds(),
                r.relativeRoughness(),
                r.regime(),
                r.frictionFactor(),
                r.frictionMethod(),
                r.frictionIterations(),
                r.majorHeadLoss(),
                r.totalLossCoefficient(),
                r.minorHeadLoss(),
                r.velocityHead(),
                r.inletElevation(),
                r.outletElevation(),
                r.inletEnergyGrade() + head,
                r.outletEnergyGrade() + head,
                r.inletHydraulicGrade() + head,
                r.outletHydraulicGrade() + head,
                r.cautions());
    }

    private static FrictionResult evaluateFriction(PipeRun run, Segment s, double reynolds) {
        try {
            return run.friction().evaluate(reynolds, s.relativeRoughness());
        } catch (InputException e) {
            throw e.at("segment " + s.name() + ", ");
        }
    }

    private static double frictionFactorOnly(PipeRun run, Segment s, double reynolds) {
        try {
            return run.friction().frictionFactor(reynolds, s.relativeRoughness());
        } catch (InputException e) {
            throw e.at("segment " + s.name() + ", ");
        }
    }

    private static double fittingK(Segment s, double reynolds) {
        double k = 0;
        for (FittingUse use : s.fittings()) {
            k += use.count() * use.fitting().lossCoefficient(reynolds, s.innerDiameter());
        }
        return k;
    }
}
