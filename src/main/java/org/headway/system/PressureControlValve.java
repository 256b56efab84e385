package org.headway.system;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * A pressure-reducing valve (holds the pressure at its outlet node at or below its setting) or a
 * pressure-sustaining valve (holds the pressure at its inlet node at or above it); neither passes
 * reverse flow. Status logic (active: the controlled node's head is held at the setting; open: the
 * fully open loss, when the heads cannot be controlled; shut: no flow) after Rossman, EPANET 2 Users
 * Manual, EPA/600/R-00/057, 2000, §3.1 and Appendix D, whose switching cases Deuerlein, Simpson &amp;
 * Dempe (J. Hydraul. Eng. 135(11), 2009) show can cycle; the network solver reports a cycle as not
 * converged. In a series run the valve is its open loss and a note says so.
 *
 * @param id stable id
 * @param name name the engineer gave it
 * @param reducing true for pressure-reducing (outlet held), false for pressure-sustaining (inlet held)
 * @param setting gauge pressure held at the controlled node (Pa)
 * @param openLoss loss when fully open
 */
public record PressureControlValve(String id, String name, boolean reducing, double setting, LocalLoss openLoss)
        implements OneWayValve {

    public PressureControlValve {
        FlowCoefficientValve.requireId(id);
        Objects.requireNonNull(openLoss, "openLoss");
        InputException.requireFinite(id + ".setting", setting);
        // Below a full vacuum at sea level no gauge setting is physical.
        if (setting < -SiteAtmosphere.SEA_LEVEL_PRESSURE || setting > 1e8) {
            throw new InputException(id + ".setting", "gauge pressure " + setting + " Pa is not plausible");
        }
        name = name == null || name.isBlank() ? id : name;
    }

    @Override
    public String kind() {
        return reducing ? "pressure-reducing" : "pressure-sustaining";
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
                String.format(
                                Locale.ROOT,
                                "%s valve set to %.4g kPa at its %s; open: ",
                                reducing ? "pressure-reducing" : "pressure-sustaining",
                                setting / 1000,
                                reducing ? "outlet" : "inlet")
                        + openLoss.description(),
                List.of());
    }

    /** The note a series run carries: the valve is taken fully open there. */
    public Caution seriesNote() {
        return Caution.note(
                        "control-not-modelled",
                        "in a series run the pressure-control valve is taken fully open; its control action is"
                                + " solved in a network",
                        "common practice, no source")
                .about(id);
    }
}
