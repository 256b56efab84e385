package org.headway.system;

import java.util.ArrayList;
import java.util.List;
import org.headway.caution.InputException;

/** The system curve: total head the run needs against flow. */
public final class SystemCurve {

    /**
     * One point of the curve.
     *
     * @param flow volumetric flow (m³/s)
     * @param totalHead static head plus losses (m)
     * @param headLoss friction plus minor loss (m)
     */
    public record Point(double flow, double totalHead, double headLoss) {}

    /** Most points a curve may have; beyond this a chart or table gains nothing. */
    public static final int MAX_POINTS = 100_000;

    private SystemCurve() {}

    /**
     * @param run the run
     * @param minimumFlow first flow (m³/s), ≥ 0
     * @param maximumFlow last flow (m³/s), above the first
     * @param count number of evenly spaced points, 2 to {@link #MAX_POINTS}
     */
    public static List<Point> compute(PipeRun run, double minimumFlow, double maximumFlow, int count) {
        InputException.requireNonNegative("curve minimum flow", minimumFlow);
        InputException.requireFinite("curve maximum flow", maximumFlow);
        if (maximumFlow <= minimumFlow) {
            throw new InputException(
                    "curve maximum flow",
                    "must exceed the minimum flow " + minimumFlow + " m³/s, got " + maximumFlow + " m³/s");
        }
        if (count < 2 || count > MAX_POINTS) {
            throw new InputException("curve points", "must be between 2 and " + MAX_POINTS + ", got " + count);
        }
        double staticHead = run.staticHead();
        List<Point> points = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            double q = i == count - 1 ? maximumFlow : minimumFlow + (maximumFlow - minimumFlow) * i / (count - 1);
            double loss = HeadLossCalculator.headLossOnly(run, q);
            points.add(new Point(q, staticHead + loss, loss));
        }
        return points;
    }
}
