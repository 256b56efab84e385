package org.headway.system;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * A flow-control valve: it throttles to hold its set flow while the heads across it allow, and
 * is no more than its fully open loss when they do not; it passes no reverse flow. The status
 * logic (active: Q = setting with any head loss ≥ the open loss at the setting; open: the open
 * loss, Q below the setting; shut: no reverse flow) follows the treatment of control valves in
 * Rossman, EPANET 2 Users Manual, EPA/600/R-00/057, 2000, §3.1 and Appendix D, and its
 * difficulties in Deuerlein, Simpson &amp; Dempe, "Modeling the behavior of flow regulating
 * devices in water distribution systems using constrained nonlinear programming", J. Hydraul.
 * Eng. 135(11), 2009. The status is the network solver's business; in a series run the valve is
 * its open loss and a note says so.
 *
 * @param id stable id
 * @param name name the engineer gave it
 * @param setting the flow it holds (m³/s), positive
 * @param openLoss loss when fully open
 */
public record FlowControlValve(String id, String name, double setting, LocalLoss openLoss) implements OneWayValve {

    public FlowControlValve {
        FlowCoefficientValve.requireId(id);
        Objects.requireNonNull(openLoss, "openLoss");
        InputException.requirePositive(id + ".setting", setting);
        if (setting > PipeRun.MAX_FLOW) {
            throw new InputException(id + ".setting", "value " + setting + " m³/s is beyond any plausible flow");
        }
        name = name == null || name.isBlank() ? id : name;
    }

    @Override
    public String kind() {
        return "flow-control";
    }

    @Override
    public ElementResult evaluate(double flow, FlowContext context) {
        double h = headLoss(flow, context);
        return new ElementResult(
                id,
                kind(),
                flow,
                h,
                context.fluid().density() * Gravity.STANDARD * h,
                String.format(Locale.ROOT, "flow-control valve set to %.4g L/s; open: ", setting * 1000)
                        + openLoss.description(),
                List.of());
    }

    /** The note a series run carries: the valve is taken fully open there. */
    public Caution seriesNote() {
        return Caution.note(
                        "control-not-modelled",
                        "in a series run the flow-control valve is taken fully open; its control action is solved"
                                + " in a network",
                        "common practice, no source")
                .about(id);
    }
}
