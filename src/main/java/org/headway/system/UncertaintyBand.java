package org.headway.system;

import java.util.ArrayList;
import java.util.List;

/**
 * Head loss and total head at the low and high ends of each segment's roughness range and of the
 * design flow's relative uncertainty: low = every roughness at its low end and flow × (1 − u); high =
 * every roughness at its high end and flow × (1 + u), and in transitional flow the turbulent
 * (Colebrook–White) friction factor where it is larger than the run's method gives — the
 * conservative assumption. Losses rise with all three, so these bound the combinations (a corner
 * analysis, not a statistical interval).
 *
 * @param flow design flow (m³/s)
 * @param flowUncertainty relative flow uncertainty used (ratio)
 * @param headLoss friction plus minor loss: nominal, low, high (m)
 * @param totalHead total head: nominal, low, high (m)
 */
public record UncertaintyBand(double flow, double flowUncertainty, Band headLoss, Band totalHead) {

    /**
     * @param nominal nominal value
     * @param low low end
     * @param high high end
     */
    public record Band(double nominal, double low, double high) {}

    /** Evaluates the band at the run's design flow. */
    public static UncertaintyBand evaluate(PipeRun run) {
        double q = run.designFlow();
        double u = run.flowUncertainty();
        double nominal = HeadLossCalculator.headLossOnly(run, q);
        double low = HeadLossCalculator.headLossOnly(atRoughness(run, false), q * (1 - u));
        PipeRun highRun = atRoughness(run, true).withFriction(new TransitionalUpperBound(run.friction()));
        double high = HeadLossCalculator.headLossOnly(highRun, q * (1 + u));
        double s = run.staticHead();
        return new UncertaintyBand(q, u, new Band(nominal, low, high), new Band(s + nominal, s + low, s + high));
    }

    private static PipeRun atRoughness(PipeRun run, boolean highEnd) {
        List<Segment> segments = new ArrayList<>();
        for (Segment seg : run.segments()) {
            segments.add(seg.withRoughness(highEnd ? seg.roughnessHigh() : seg.roughnessLow()));
        }
        return run.withSegments(segments);
    }
}
