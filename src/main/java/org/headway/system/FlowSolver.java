package org.headway.system;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.headway.caution.InputException;

/**
 * Solve mode 2, flow for a given available head: finds Q with static head + losses(Q) = available
 * head by Brent's method (Commons Math) on a bracket grown from zero flow. Losses rise monotonically
 * with flow for every friction method Headway offers, so the bracketed root is unique; laminar,
 * transitional and turbulent flow are handled alike.
 *
 * <p>Accuracy: flow to about 1e-14 relative (Brent's relative accuracy), limited by the friction
 * method's continuity across regimes.
 */
public final class FlowSolver {

    /** How a flow solve ended. */
    public enum Outcome {
        /** A positive flow balances the available head. */
        FLOWING,
        /** The available head exactly balances the static head: no flow. */
        NO_FLOW,
        /** The delivery end's head exceeds what is available: flow would run from delivery to source. */
        REVERSE
    }

    /**
     * Result of a flow solve.
     *
     * @param outcome how it ended
     * @param flow the flow (m³/s); 0 unless {@link Outcome#FLOWING}
     * @param evaluations loss evaluations used
     * @param message plain-words summary
     * @param result the full head-loss result at that flow
     */
    public record Solution(Outcome outcome, double flow, int evaluations, String message, RunResult result) {}

    private static final int MAX_BRACKET_STEPS = 200;
    private static final int MAX_EVALUATIONS = 500;
    /** Velocity above which no liquid pipe flow is physical; the bracket stops growing there (m/s). */
    private static final double VELOCITY_CEILING = 1.0e4;

    private FlowSolver() {}

    /**
     * @param run the run (its design flow is ignored)
     * @param availableHead head available to drive the flow beyond the ends: a pump's head at fixed
     *     head, or 0 for a gravity run (m)
     */
    public static Solution solve(PipeRun run, double availableHead) {
        InputException.requireFinite("available head", availableHead);
        double staticHead = run.staticHead();
        double surplus = availableHead - staticHead;
        if (surplus == 0) {
            return new Solution(
                    Outcome.NO_FLOW,
                    0,
                    0,
                    "available head equals the static head: no flow",
                    HeadLossCalculator.solve(run, 0));
        }
        if (surplus < 0) {
            return new Solution(
                    Outcome.REVERSE,
                    0,
                    0,
                    String.format(
                            java.util.Locale.ROOT,
                            "the static head %.4g m exceeds the available head %.4g m by %.4g m: flow would run from"
                                    + " delivery back to source",
                            staticHead,
                            availableHead,
                            -surplus),
                    HeadLossCalculator.solve(run, 0));
        }
        double smallestArea = Double.POSITIVE_INFINITY;
        for (Segment s : run.segments()) {
            smallestArea = Math.min(smallestArea, s.area());
        }
        double high = smallestArea * 1.0; // 1 m/s in the narrowest segment
        int evaluations = 0;
        int steps = 0;
        while (HeadLossCalculator.headLossOnly(run, high) < surplus) {
            evaluations++;
            if (++steps > MAX_BRACKET_STEPS || high / smallestArea > VELOCITY_CEILING) {
                throw new InputException(
                        "available head",
                        String.format(
                                java.util.Locale.ROOT,
                                "%.4g m of surplus head would drive more than %.0f m/s through the run; it has"
                                        + " almost no resistance (check lengths, diameters and fittings)",
                                surplus,
                                VELOCITY_CEILING));
            }
            high *= 2;
        }
        evaluations++;
        BrentSolver brent = new BrentSolver(1e-15, high * 1e-16, 0);
        double flow;
        try {
            flow = brent.solve(MAX_EVALUATIONS, q -> HeadLossCalculator.headLossOnly(run, q) - surplus, 0, high);
        } catch (TooManyEvaluationsException e) {
            throw new IllegalStateException("flow solve did not converge in " + MAX_EVALUATIONS + " evaluations", e);
        }
        evaluations += brent.getEvaluations();
        RunResult result = HeadLossCalculator.solve(run, flow);
        return new Solution(
                Outcome.FLOWING,
                flow,
                evaluations,
                String.format(java.util.Locale.ROOT, "%.6g m³/s balances %.4g m of surplus head", flow, surplus),
                result);
    }
}
