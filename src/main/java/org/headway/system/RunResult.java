package org.headway.system;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;

/**
 * Hydraulics of a whole run at one flow.
 *
 * @param flow volumetric flow (m³/s)
 * @param segments per-segment results in flow order
 * @param totals totals
 * @param npshAvailable NPSH available at the pump inlet (m), when a pump and the vapour pressure
 *     are known
 * @param cautions every caution of the run and its segments, ending with the standing review caution
 */
public record RunResult(
        double flow,
        List<SegmentResult> segments,
        RunTotals totals,
        OptionalDouble npshAvailable,
        List<Caution> cautions) {

    public RunResult {
        segments = List.copyOf(segments);
        cautions = List.copyOf(cautions);
    }
}
