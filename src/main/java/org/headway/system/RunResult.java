package org.headway.system;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;

/**
 * Hydraulics of a whole run at one flow.
 *
 * @param flow volumetric flow (m³/s)
 * @param segments per-pipe results in flow order (pipes only, keyed by their id)
 * @param elements every element of the run in flow order with its grade lines and pressures
 * @param totals totals
 * @param npshAvailable NPSH available at the pump inlet (m), when a pump and the vapour pressure
 *     are known
 * @param cautions every caution of the run and its segments, ending with the standing review caution
 */
public record RunResult(
        double flow,
        List<SegmentResult> segments,
        List<ElementProfile> elements,
        RunTotals totals,
        OptionalDouble npshAvailable,
        List<Caution> cautions) {

    public RunResult {
        segments = List.copyOf(segments);
        elements = List.copyOf(elements);
        cautions = List.copyOf(cautions);
    }

    /** The result of the pipe with an id. */
    public java.util.Optional<SegmentResult> segment(String id) {
        return segments.stream().filter(s -> s.id().equals(id)).findFirst();
    }

    /** The profile of the element with an id. */
    public java.util.Optional<ElementProfile> element(String id) {
        return elements.stream().filter(e -> e.id().equals(id)).findFirst();
    }
}
