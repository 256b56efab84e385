package org.headway.system;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;

/**
 * Solve mode 1, head loss for a given flow along a series run of elements: each pipe by
 * Darcy–Weisbach h_f = f (L/D) V²/(2g) (or Hazen–Williams) with its fittings' losses
 * h_m = ΣK V²/(2g) at its own Reynolds number and bore; each valve, component and diameter change
 * by its own law; grade lines and gauge pressures along the run; totals, NPSH available and
 * cautions.
 *
 * <p>Component losses (valves by K_v, rated components, diameter changes) are counted with the
 * fittings as minor (local) losses in the totals.
 *
 * <p>Accuracy: exact arithmetic of the formulas above in double precision; the friction factor's
 * accuracy is that of the chosen correlation (Colebrook solved to 1e-14 relative).
 */
public final class HeadLossCalculator {

    /** Basis of the column-separation check. */
    static final String VAPOUR_BASIS =
            "a liquid cannot sustain an absolute pressure below its vapour pressure; common practice, no source";

    /**
     * Gauge pressures closer to zero than this (Pa, about 1 mm of water) are taken as atmospheric:
     * a run discharging to an open tank closes its grade line on zero, and round-off or the flow
     * solver's tolerance leaves a few pascals either side.
     */
    static final double GRADE_RESOLUTION = 10.0;

    private HeadLossCalculator() {}

    /**
     * Full result at one flow.
     *
     * @param run the run
     * @param flow volumetric flow (m³/s), ≥ 0
     * @return per-element results, grade lines and pressures, totals, NPSH available and cautions
     */
    public static RunResult solve(PipeRun run, double flow) {
        InputException.requireNonNegative("flow", flow);
        FluidState fluid = run.fluid();
        double rho = fluid.density();
        double g = Gravity.STANDARD;
        Walk walk = new Walk(run, flow);
        for (Caution c : fluid.cautions()) {
            walk.cautions.add(c);
        }
        for (int i = 0; i < run.elements().size(); i++) {
            walk.step(i);
        }

        double staticHead = run.staticHead();
        double totalHead = staticHead + walk.friction + walk.minor;
        if (!Double.isFinite(totalHead) || !Double.isFinite(rho * g * totalHead)) {
            throw new InputException(
                    "flow",
                    "the head loss at " + flow + " m³/s overflows double precision; check flows, lengths and diameters"
                            + " and their units");
        }
        if (walk.pumpIndex >= 0) {
            walk.closeOnThePump(totalHead);
        }
        List<Caution> pressureCautions = new ArrayList<>();
        for (int i = 0; i < walk.profiles.size(); i++) {
            walk.profiles.set(
                    i, withPressures(walk.profiles.get(i), run.elements().get(i), run, pressureCautions));
        }
        Set<Caution> cautions = walk.cautions;
        cautions.addAll(pressureCautions);

        RunTotals totals = new RunTotals(
                walk.friction,
                walk.minor,
                staticHead,
                totalHead,
                rho * g * (walk.friction + walk.minor),
                rho * g * totalHead);

        cautions.addAll(balanceCautions(
                flow,
                walk.friction,
                walk.minor,
                walk.componentLoss,
                staticHead,
                totalHead,
                walk.pumpIndex >= 0,
                rho,
                g));
        OptionalDouble npsh = walk.pumpIndex < 0
                ? OptionalDouble.empty()
                : suctionHead(
                        run,
                        (PumpElement) run.elements().get(walk.pumpIndex),
                        flow,
                        walk.lossesBeforePump,
                        walk.elevationAtPump,
                        cautions);
        cautions.add(Caution.GENERAL_REVIEW);
        // identical cautions of several elements are listed once, naming them; each SegmentResult keeps its own
        return new RunResult(
                flow, walk.results, walk.profiles, totals, npsh, Caution.grouped(new ArrayList<>(cautions)));
    }

    /**
     * The walk from the run's inlet to its outlet at one flow: each element's loss taken off the
     * energy grade in turn, the pipes' and the other elements' results and profiles, the loss totals
     * and where the pump stands. A pump adds nothing on the way; {@link #closeOnThePump} then lifts
     * the grade lines from it on by the head the run needs.
     */
    private static final class Walk {
        private final PipeRun run;
        private final double flow;
        private final FlowContext context;
        private final DesignLimits limits;
        private final List<Element> elements;
        private final double[] upstreamVelocityHead;
        private final double[] downstreamVelocityHead;
        final List<SegmentResult> results = new ArrayList<>();
        final List<ElementProfile> profiles;
        final Set<Caution> cautions = new LinkedHashSet<>();

        /** Energy grade relative to the run's inlet elevation (m). */
        private double energy;

        private double elevation;
        double friction;
        double minor;
        double componentLoss;
        double lossesBeforePump;
        double elevationAtPump;
        int pumpIndex = -1;

        Walk(PipeRun run, double flow) {
            this.run = run;
            this.flow = flow;
            this.context = run.context();
            this.limits = run.limits();
            this.elements = run.elements();
            this.upstreamVelocityHead = nearestVelocityHeads(elements, flow, true);
            this.downstreamVelocityHead = nearestVelocityHeads(elements, flow, false);
            this.profiles = new ArrayList<>(elements.size());
            this.energy = run.source().head(run.fluid().density());
        }

        /** Takes element {@code i}'s loss off the grade and records its result and profile. */
        void step(int i) {
            Element element = elements.get(i);
            double inletEnergy = energy;
            double inletElevation = elevation;
            double inletVelocityHead;
            double outletVelocityHead;
            ElementResult elementResult;
            if (element instanceof Segment s) {
                PipeFlow p = s.flowAt(flow, context);
                elementResult = pipe(s, p, inletEnergy, inletElevation);
                inletVelocityHead = p.velocityHead();
                outletVelocityHead = p.velocityHead();
            } else if (element instanceof PumpElement pump) {
                pumpIndex = i;
                lossesBeforePump = friction + minor;
                elevationAtPump = elevation;
                inletVelocityHead = upstreamVelocityHead[i];
                outletVelocityHead = downstreamVelocityHead[i];
                // Filled in once the head the run needs is known (closeOnThePump).
                elementResult = pump.evaluate(flow, context);
            } else {
                elementResult = element.evaluate(flow, context);
                double loss = elementResult.headLoss();
                energy -= loss;
                elevation += element.rise();
                minor += loss;
                componentLoss += loss;
                cautions.addAll(elementResult.cautions());
                if (element instanceof FlowControlValve fcv) {
                    cautions.add(fcv.seriesNote());
                }
                if (element instanceof PressureControlValve pcv) {
                    cautions.add(pcv.seriesNote());
                }
                if (element instanceof DiameterChange change) {
                    inletVelocityHead = velocityHead(flow, change.inletDiameter());
                    outletVelocityHead = velocityHead(flow, change.outletDiameter());
                } else {
                    inletVelocityHead = upstreamVelocityHead[i];
                    outletVelocityHead = downstreamVelocityHead[i];
                }
            }
            if (i == elements.size() - 1) {
                // The delivery's velocity is neglected (a tank or header; the exit loss is listed as a fitting), so
                // past the last element the whole energy grade is pressure and elevation.
                outletVelocityHead = 0;
            }
            profiles.add(new ElementProfile(
                    element.id(),
                    element.kind(),
                    element.name(),
                    elementResult,
                    inletElevation,
                    elevation,
                    inletEnergy,
                    energy,
                    inletEnergy - inletVelocityHead,
                    energy - outletVelocityHead,
                    0,
                    0,
                    OptionalDouble.empty(),
                    List.of()));
        }

        /** A pipe's step: its losses, its segment result with the run's design cautions, its element result. */
        private ElementResult pipe(Segment s, PipeFlow p, double inletEnergy, double inletElevation) {
            List<Caution> segmentCautions = new ArrayList<>(p.cautions());
            segmentCautions.addAll(designCautions(s, p, flow, limits));
            energy -= p.majorHeadLoss() + p.minorHeadLoss();
            elevation += s.elevationChange();
            friction += p.majorHeadLoss();
            minor += p.minorHeadLoss();
            results.add(new SegmentResult(
                    s.id(),
                    s.name(),
                    p.velocity(),
                    p.reynolds(),
                    s.relativeRoughness(),
                    p.regime(),
                    p.frictionFactor(),
                    p.frictionMethod(),
                    p.frictionIterations(),
                    p.majorHeadLoss(),
                    p.totalLossCoefficient(),
                    p.minorHeadLoss(),
                    p.velocityHead(),
                    inletElevation,
                    elevation,
                    inletEnergy,
                    energy,
                    inletEnergy - p.velocityHead(),
                    energy - p.velocityHead(),
                    segmentCautions));
            cautions.addAll(segmentCautions);
            // The pipe's own result (its law, at the flow already computed), with the run's design cautions.
            ElementResult law = s.evaluate(flow, p, context);
            return new ElementResult(
                    law.id(), law.kind(), flow, law.headLoss(), law.pressureDrop(), law.law(), segmentCautions);
        }

        /**
         * The pump adds exactly the head the run needs at this flow, so downstream of it the grade lines
         * close on the delivery head. Without a pump they start at the source head and a deficit shows as
         * a positive total head.
         */
        void closeOnThePump(double totalHead) {
            double rho = run.fluid().density();
            double g = Gravity.STANDARD;
            int firstRaisedPipe = run.pumpPosition();
            for (int i = firstRaisedPipe; i < results.size(); i++) {
                results.set(i, raised(results.get(i), totalHead));
            }
            for (int i = pumpIndex; i < profiles.size(); i++) {
                profiles.set(i, raised(profiles.get(i), totalHead, i == pumpIndex));
            }
            PumpElement pump = (PumpElement) elements.get(pumpIndex);
            ElementResult curve = profiles.get(pumpIndex).result();
            ElementResult supplied = new ElementResult(
                    curve.id(),
                    curve.kind(),
                    flow,
                    -totalHead,
                    -rho * g * totalHead,
                    String.format(
                            Locale.ROOT,
                            "supplies the %.4g m the run needs at this flow (its curve gives %.4g m; the operating"
                                    + " point is solved separately)",
                            totalHead,
                            pump.head(flow)),
                    curve.cautions());
            cautions.addAll(curve.cautions());
            profiles.set(pumpIndex, withResult(profiles.get(pumpIndex), supplied));
        }
    }

    private static List<Caution> balanceCautions(
            double flow,
            double friction,
            double minor,
            double componentLoss,
            double staticHead,
            double totalHead,
            boolean pumped,
            double rho,
            double g) {
        List<Caution> out = new ArrayList<>();
        // Components carry their own ratings; the scatter this caution is about is that of tabulated K values.
        double fittingLoss = minor - componentLoss;
        if (flow > 0 && fittingLoss > friction && fittingLoss > 0) {
            out.add(Caution.note(
                    "minor-losses-dominate",
                    String.format(
                            Locale.ROOT,
                            "fitting losses (%.3g m) exceed pipe friction (%.3g m); published K values scatter"
                                    + " more than friction factors, so the total is less certain",
                            fittingLoss,
                            friction),
                    "common practice, no source"));
        }
        // Round-off of a balanced gravity run leaves ~1e-14 m; only a real deficit is worth a caution.
        double resolution = 1e-9 * Math.max(1.0, Math.abs(staticHead) + friction + minor);
        if (!pumped && totalHead > resolution && flow > 0) {
            out.add(Caution.note(
                    "head-required",
                    String.format(
                            Locale.ROOT,
                            "no pump is given for this run; at this flow it needs %.3g m of head that the ends alone"
                                    + " do not supply",
                            totalHead),
                    "energy balance"));
        }
        if (!pumped && totalHead < -resolution && flow > 0) {
            out.add(Caution.note(
                    "head-surplus",
                    String.format(
                            Locale.ROOT,
                            "the ends supply %.3g m (%.3g kPa) more head than the run loses at this flow, so the"
                                    + " pressures along it end above the delivery's; unless a balancing or control"
                                    + " valve takes that up, the run carries more than this flow (the flow mode finds"
                                    + " how much)",
                            -totalHead,
                            -rho * g * totalHead / 1000.0),
                    "energy balance"));
        }

        return out;
    }

    /** NPSH available at the pump inlet, with its check, or empty (and a note) when the fluid gives no vapour pressure. */
    private static OptionalDouble suctionHead(
            PipeRun run,
            PumpElement pump,
            double flow,
            double lossesBeforePump,
            double elevationAtPump,
            Set<Caution> cautions) {
        FluidState fluid = run.fluid();
        double rho = fluid.density();
        DesignLimits limits = run.limits();
        if (fluid.vapourPressure().isPresent()) {
            // NPSHa = (p_abs/ρg + V²/2g) − p_v/ρg at the pump suction; energy grade minus elevation is the gauge
            // pressure head plus the velocity head.
            double energyAtPump = run.source().head(rho) - lossesBeforePump;
            double value = SuctionHead.available(
                    energyAtPump - elevationAtPump,
                    run.atmosphericPressure(),
                    fluid.vapourPressure().getAsDouble(),
                    rho);
            cautions.addAll(SuctionHead.check(pump, flow, value, limits.npshMargin(), "the pump inlet"));
            return OptionalDouble.of(value);
        } else {
            cautions.add(Caution.note(
                    "npsh-unknown",
                    "the fluid model gives no vapour pressure, so NPSH available was not computed",
                    "fluid model"));
        }
        return OptionalDouble.empty();
    }

    private static List<Caution> designCautions(Segment s, PipeFlow p, double flow, DesignLimits limits) {
        List<Caution> out = new ArrayList<>();
        double velocity = p.velocity();
        if (flow > 0) {
            if (velocity > limits.maximumVelocity()) {
                out.add(Caution.warning(
                                "velocity-high",
                                String.format(
                                        Locale.ROOT,
                                        "velocity %.3g m/s is above the usual design maximum of %.3g m/s (erosion,"
                                                + " noise, surge)",
                                        velocity,
                                        limits.maximumVelocity()),
                                DesignLimits.USUAL_BASIS)
                        .about(s.name()));
            } else if (velocity < limits.minimumVelocity()) {
                out.add(Caution.note(
                                "velocity-low",
                                String.format(
                                        Locale.ROOT,
                                        "velocity %.3g m/s is below the usual design minimum of %.3g m/s (settling,"
                                                + " trapped air, oversized pipe)",
                                        velocity,
                                        limits.minimumVelocity()),
                                DesignLimits.USUAL_BASIS)
                        .about(s.name()));
            }
        }
        if ("aged".equalsIgnoreCase(s.pipeCondition()) || "corroded".equalsIgnoreCase(s.pipeCondition())) {
            out.add(Caution.note(
                            "aged-roughness",
                            "roughness of aged pipe varies widely with water chemistry and service; the band"
                                    + " shows its range",
                            "common practice, no source")
                    .about(s.name()));
        }
        if (s.length() == 0) {
            out.add(Caution.note("zero-length", "segment has zero length; only its fittings contribute", "input check")
                    .about(s.name()));
        }
        return out;
    }

    /**
     * For each element, the velocity head in the nearest bore on one side (upstream or downstream),
     * or on the other side when there is none on that one; 0 in a run of devices alone.
     */
    private static double[] nearestVelocityHeads(List<Element> elements, double flow, boolean upstream) {
        int n = elements.size();
        double[] own = new double[n];
        double[] fromBefore = new double[n];
        double[] fromAfter = new double[n];
        for (int i = 0; i < n; i++) {
            own[i] = Double.NaN;
            if (elements.get(i) instanceof Segment s) {
                own[i] = velocityHead(flow, s.innerDiameter());
            }
        }
        double last = Double.NaN;
        for (int i = 0; i < n; i++) {
            fromBefore[i] = last;
            if (elements.get(i) instanceof DiameterChange d) {
                last = velocityHead(flow, d.outletDiameter());
            } else if (!Double.isNaN(own[i])) {
                last = own[i];
            }
        }
        double next = Double.NaN;
        for (int i = n - 1; i >= 0; i--) {
            fromAfter[i] = next;
            if (elements.get(i) instanceof DiameterChange d) {
                next = velocityHead(flow, d.inletDiameter());
            } else if (!Double.isNaN(own[i])) {
                next = own[i];
            }
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            double first = upstream ? fromBefore[i] : fromAfter[i];
            double second = upstream ? fromAfter[i] : fromBefore[i];
            out[i] = !Double.isNaN(first) ? first : !Double.isNaN(second) ? second : 0.0;
        }
        return out;
    }

    private static double velocityHead(double flow, double diameter) {
        double velocity = flow / (Math.PI * diameter * diameter / 4.0);
        return velocity * velocity / (2 * Gravity.STANDARD);
    }

    private static ElementProfile withPressures(ElementProfile p, Element element, PipeRun run, List<Caution> out) {
        double rho = run.fluid().density();
        double g = Gravity.STANDARD;
        double inlet = rho * g * (p.inletHydraulicGrade() - p.inletElevation());
        double outlet = rho * g * (p.outletHydraulicGrade() - p.outletElevation());
        OptionalDouble high = OptionalDouble.empty();
        if (element instanceof Segment s && s.highPoint().isPresent()) {
            Segment.HighPoint point = s.highPoint().get();
            double share = s.length() == 0 ? 0 : point.distance() / s.length();
            // Friction and fittings taken as spread evenly along the pipe: the energy grade falls linearly, and
            // inside the pipe the velocity head is the pipe's own (inlet energy minus hydraulic grade). The outlet's
            // hydraulic grade is not interpolated to: past the last element it is set to the energy grade (the
            // delivery's velocity is neglected), which would lift the grade at the high point by share × V²/(2g).
            double velocityHead = p.inletEnergyGrade() - p.inletHydraulicGrade();
            double energyGrade = p.inletEnergyGrade() + share * (p.outletEnergyGrade() - p.inletEnergyGrade());
            double grade = energyGrade - velocityHead;
            high = OptionalDouble.of(rho * g * (grade - (p.inletElevation() + point.rise())));
        }
        List<Caution> cautions = new ArrayList<>();
        double atmosphere = run.atmosphericPressure();
        double vapour = run.fluid().vapourPressure().orElse(0.0);
        String vapourWords = run.fluid().vapourPressure().isPresent() ? "the vapour pressure" : "zero (absolute)";
        String[] places = {"inlet", "outlet", "high point"};
        double[] gauges = {inlet, outlet, high.orElse(Double.NaN)};
        boolean separated = false;
        for (int k = 0; k < 3 && !separated; k++) {
            if (Double.isNaN(gauges[k])) {
                continue;
            }
            double absolute = gauges[k] + atmosphere;
            if (absolute < vapour) {
                separated = true;
                cautions.add(Caution.serious(
                                "below-vapour-pressure",
                                String.format(
                                        Locale.ROOT,
                                        "at its %s the absolute pressure would be %.1f kPa, below %s (%.2f kPa): the"
                                                + " hydraulic grade lies %.2f m below the pipe and the liquid column"
                                                + " separates, so the run cannot carry this flow as computed — raise"
                                                + " the grade line or lower the pipe",
                                        places[k],
                                        absolute / 1000.0,
                                        vapourWords,
                                        vapour / 1000.0,
                                        -gauges[k] / (rho * g)),
                                VAPOUR_BASIS)
                        .about(p.id()));
            }
        }
        if (!separated) {
            double lowest = Math.min(inlet, Math.min(outlet, high.orElse(Double.POSITIVE_INFINITY)));
            if (lowest < -GRADE_RESOLUTION && !(element instanceof PumpElement)) {
                cautions.add(Caution.warning(
                                "sub-atmospheric",
                                String.format(
                                        Locale.ROOT,
                                        "gauge pressure falls to %.1f kPa (below atmospheric): joints may draw in air"
                                                + " and an air valve here would admit air rather than release it",
                                        lowest / 1000.0),
                                "common practice, no source")
                        .about(p.id()));
            }
        }
        PressureLimits limits = run.pressureLimits();
        double lowest = Math.min(inlet, Math.min(outlet, high.orElse(Double.POSITIVE_INFINITY)));
        double highest = Math.max(inlet, outlet);
        if (lowest < limits.minimumGauge()) {
            cautions.add(Caution.warning(
                            "pressure-below-minimum",
                            String.format(
                                    Locale.ROOT,
                                    "gauge pressure %.1f kPa is below the minimum of %.1f kPa set for this run",
                                    lowest / 1000.0,
                                    limits.minimumGauge() / 1000.0),
                            "project pressure limits")
                    .about(p.id()));
        }
        if (highest > limits.maximumGauge()) {
            cautions.add(Caution.warning(
                            "pressure-above-maximum",
                            String.format(
                                    Locale.ROOT,
                                    "gauge pressure %.1f kPa is above the maximum of %.1f kPa set for this run",
                                    highest / 1000.0,
                                    limits.maximumGauge() / 1000.0),
                            "project pressure limits")
                    .about(p.id()));
        }
        out.addAll(cautions);
        return new ElementProfile(
                p.id(),
                p.kind(),
                p.name(),
                p.result(),
                p.inletElevation(),
                p.outletElevation(),
                p.inletEnergyGrade(),
                p.outletEnergyGrade(),
                p.inletHydraulicGrade(),
                p.outletHydraulicGrade(),
                inlet,
                outlet,
                high,
                cautions);
    }

    /**
     * Friction plus minor loss of the whole run at one flow, without grade lines or cautions (the
     * hot path of system curves, root finding and sizing). A pump's head is not counted.
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
        FlowContext context = run.context();
        double total = 0;
        for (Element e : run.elements()) {
            total += elementHeadLoss(e, flow, context);
        }
        return total;
    }

    /**
     * The loss one element adds to a run's friction-plus-minor total at a flow ≥ 0, by the law
     * {@link #solve} reports for it: a pipe's friction and fitting loss by the formulas its
     * {@link Segment#flowAt} uses ({@link Segment#headLossMagnitude}), any other element's own law
     * ({@link Element#headLoss}, which its {@link Element#evaluate} reports). A pump's head is the
     * run's business, not a loss: 0. Allocates nothing.
     *
     * @param element the element
     * @param flow volumetric flow (m³/s), ≥ 0
     * @param context fluid and default friction method
     * @return head loss (m)
     */
    static double elementHeadLoss(Element element, double flow, FlowContext context) {
        if (element instanceof Segment s) {
            return s.headLossMagnitude(flow, context);
        }
        if (element instanceof PumpElement) {
            return 0;
        }
        return element.headLoss(flow, context);
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
                r.id(),
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

    private static ElementProfile raised(ElementProfile p, double head, boolean outletOnly) {
        double inletRaise = outletOnly ? 0 : head;
        return new ElementProfile(
                p.id(),
                p.kind(),
                p.name(),
                p.result(),
                p.inletElevation(),
                p.outletElevation(),
                p.inletEnergyGrade() + inletRaise,
                p.outletEnergyGrade() + head,
                p.inletHydraulicGrade() + inletRaise,
                p.outletHydraulicGrade() + head,
                p.inletPressure(),
                p.outletPressure(),
                p.highPointPressure(),
                p.cautions());
    }

    private static ElementProfile withResult(ElementProfile p, ElementResult result) {
        return new ElementProfile(
                p.id(),
                p.kind(),
                p.name(),
                result,
                p.inletElevation(),
                p.outletElevation(),
                p.inletEnergyGrade(),
                p.outletEnergyGrade(),
                p.inletHydraulicGrade(),
                p.outletHydraulicGrade(),
                p.inletPressure(),
                p.outletPressure(),
                p.highPointPressure(),
                p.cautions());
    }
}
