package org.headway.system;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import org.headway.caution.InputException;

/**
 * Solve mode 3, size for limits: tries each candidate bore in every segment of the run (each
 * segment keeps its roughness) at the design flow, from the smallest up, and picks the smallest that
 * meets the maximum velocity, the maximum friction loss per 100 m and the total head budget. Every
 * candidate is listed with its figures and, if rejected, why.
 */
public final class SizeSelector {

    /**
     * A size to try.
     *
     * @param label how the engineer knows it, e.g. "NPS 4 Sch 40"
     * @param innerDiameter inner diameter (m)
     * @param nominalDiameter nominal diameter (m; NPS × 0.0254, DN × 0.001), empty when unknown; the
     *     size term of Darby's 3-K fittings uses it
     */
    public record CandidateSize(String label, double innerDiameter, OptionalDouble nominalDiameter) {

        public CandidateSize {
            nominalDiameter = nominalDiameter == null ? OptionalDouble.empty() : nominalDiameter;
        }

        /** A candidate of unknown nominal size. */
        public CandidateSize(String label, double innerDiameter) {
            this(label, innerDiameter, OptionalDouble.empty());
        }
    }

    /**
     * One candidate's figures at the design flow.
     *
     * @param size the candidate
     * @param maximumVelocity highest segment velocity (m/s)
     * @param maximumFrictionLossPer100m highest friction loss per 100 m over the segments (m)
     * @param totalHead total head (m)
     * @param accepted whether it meets every limit
     * @param reasons why it was rejected (empty if accepted)
     */
    public record SizeCheck(
            CandidateSize size,
            double maximumVelocity,
            double maximumFrictionLossPer100m,
            double totalHead,
            boolean accepted,
            List<String> reasons) {}

    /**
     * @param chosen the smallest accepted size, if any
     * @param candidates every candidate, smallest first
     * @param run the run with the chosen size applied (or the original run if none)
     */
    public record Selection(Optional<CandidateSize> chosen, List<SizeCheck> candidates, PipeRun run) {}

    private SizeSelector() {}

    /**
     * @param run the run, at its design flow
     * @param sizes candidate sizes (any order)
     * @param limits the limits to meet
     */
    public static Selection select(PipeRun run, List<CandidateSize> sizes, DesignLimits limits) {
        if (sizes.isEmpty()) {
            throw new InputException("sizes", "no candidate sizes to choose from");
        }
        if (run.designFlow() <= 0) {
            throw new InputException("flow", "sizing needs a design flow above zero, got " + run.designFlow());
        }
        List<CandidateSize> sorted = new ArrayList<>(sizes);
        sorted.sort(Comparator.comparingDouble(CandidateSize::innerDiameter));
        List<SizeCheck> checks = new ArrayList<>();
        Optional<CandidateSize> chosen = Optional.empty();
        PipeRun chosenRun = run;
        for (CandidateSize size : sorted) {
            PipeRun trial;
            try {
                trial = apply(run, size);
            } catch (InputException e) {
                checks.add(new SizeCheck(size, 0, 0, 0, false, List.of("cannot be used: " + e.getMessage())));
                continue;
            }
            RunResult r = HeadLossCalculator.solve(trial, trial.designFlow());
            double vmax = 0;
            double lossPer100 = 0;
            for (SegmentResult sr : r.segments()) {
                vmax = Math.max(vmax, sr.velocity());
                double length = ((Segment) trial.element(sr.id()).orElseThrow()).length();
                if (length > 0) {
                    lossPer100 = Math.max(lossPer100, sr.majorHeadLoss() / length * 100);
                }
            }
            List<String> reasons = new ArrayList<>();
            if (vmax > limits.maximumVelocity()) {
                reasons.add(
                        String.format(Locale.ROOT, "velocity %.3g m/s above %.3g m/s", vmax, limits.maximumVelocity()));
            }
            if (lossPer100 > limits.maximumFrictionLossPer100m()) {
                reasons.add(String.format(
                        Locale.ROOT,
                        "friction loss %.3g m per 100 m above %.3g m",
                        lossPer100,
                        limits.maximumFrictionLossPer100m()));
            }
            if (r.totals().totalHead() > limits.headBudget()) {
                reasons.add(String.format(
                        Locale.ROOT,
                        "total head %.4g m above the budget of %.4g m",
                        r.totals().totalHead(),
                        limits.headBudget()));
            }
            boolean ok = reasons.isEmpty();
            checks.add(new SizeCheck(size, vmax, lossPer100, r.totals().totalHead(), ok, reasons));
            if (ok && chosen.isEmpty()) {
                chosen = Optional.of(size);
                chosenRun = trial;
            }
        }
        return new Selection(chosen, checks, chosenRun);
    }

    /** The run with every segment given the candidate's bore. */
    public static PipeRun apply(PipeRun run, CandidateSize size) {
        List<Segment> segments = new ArrayList<>();
        for (Segment s : run.segments()) {
            segments.add(s.withPipe(
                    size.innerDiameter(),
                    s.roughness(),
                    s.roughnessLow(),
                    s.roughnessHigh(),
                    size.label(),
                    size.nominalDiameter()));
        }
        return run.withSegments(segments);
    }
}
