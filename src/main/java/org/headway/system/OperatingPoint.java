package org.headway.system;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * Where the pump curve crosses the system curve, found by Brent's method on pump head − system
 * head between zero flow and the pump curve's run-out.
 *
 * @param found whether the curves cross
 * @param flow flow at the crossing (m³/s), 0 if not found
 * @param head head at the crossing (m), 0 if not found
 * @param message plain-words summary, or why there is no crossing
 * @param cautions e.g. the crossing lies beyond the maker's points
 */
public record OperatingPoint(boolean found, double flow, double head, String message, List<Caution> cautions) {

    /** How far beyond the maker's last point the fitted curve is followed (ratio of that flow). */
    private static final double SEARCH_FACTOR = 3.0;

    public OperatingPoint {
        cautions = List.copyOf(cautions);
    }

    /**
     * @param run a run with a pump
     */
    public static OperatingPoint find(PipeRun run) {
        PumpCurve pump = run.pump()
                .orElseThrow(
                        () -> new InputException("pump", "the run has no pump curve, so it has no operating point"));
        double shutoff = pump.head(0);
        double staticHead = run.staticHead();
        if (shutoff <= staticHead) {
            return new OperatingPoint(
                    false,
                    0,
                    0,
                    String.format(
                            java.util.Locale.ROOT,
                            "no intersection: the pump's shut-off head %.4g m does not exceed the static head %.4g m",
                            shutoff,
                            staticHead),
                    List.of());
        }
        double end = pump.maximumDataFlow();
        double high = end / 8;
        double limit = end * SEARCH_FACTOR;
        while (difference(run, pump, high) > 0) {
            if (high >= limit) {
                return new OperatingPoint(
                        false,
                        0,
                        0,
                        String.format(
                                java.util.Locale.ROOT,
                                "no intersection up to %.4g m³/s (%.0f× the pump's last point): the pump curve stays"
                                        + " above the system curve",
                                limit,
                                SEARCH_FACTOR),
                        List.of());
            }
            high = Math.min(high * 1.5, limit);
        }
        BrentSolver brent = new BrentSolver(1e-14, high * 1e-16, 0);
        double q = brent.solve(500, x -> difference(run, pump, x), 0, high);
        double h = pump.head(q);
        List<Caution> cautions = new ArrayList<>();
        if (q > end) {
            cautions.add(Caution.warning(
                    "pump-curve-extrapolated",
                    String.format(
                            java.util.Locale.ROOT,
                            "the operating point %.4g m³/s lies beyond the maker's last point %.4g m³/s; the fitted"
                                    + " curve is extrapolated there",
                            q,
                            end),
                    "pump curve fit"));
        }
        if (q < pump.points().get(0).flow()) {
            cautions.add(Caution.warning(
                    "pump-curve-extrapolated",
                    String.format(
                            java.util.Locale.ROOT,
                            "the operating point %.4g m³/s lies below the maker's first point",
                            q),
                    "pump curve fit"));
        }
        return new OperatingPoint(
                true,
                q,
                h,
                String.format(java.util.Locale.ROOT, "operating point %.5g m³/s at %.4g m", q, h),
                cautions);
    }

    private static double difference(PipeRun run, PumpCurve pump, double flow) {
        return pump.head(flow) - HeadLossCalculator.totalHead(run, flow);
    }
}
