package org.headway.system;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.pipe.ReferenceSection;
import org.headway.pipe.TransitionLoss;
import org.headway.pipe.Transitions;

/**
 * A change of bore between two pipes — a reducer or an enlarger, sudden or gradual — with the loss
 * coefficient of {@link Transitions} referred to the velocity its source uses (the smaller bore):
 * h = K V_ref²/(2 g). Reverse flow meets the opposite change (an enlarger becomes a reducer), so
 * the law is evaluated with the bores swapped.
 *
 * @param id stable id
 * @param name name the engineer gave it
 * @param inletDiameter bore at the inlet (m), positive
 * @param outletDiameter bore at the outlet (m), positive
 * @param includedAngle total included cone angle θ (rad), 0 &lt; θ ≤ π; π for a sudden change
 */
public record DiameterChange(String id, String name, double inletDiameter, double outletDiameter, double includedAngle)
        implements Element {

    /** Included angle of a sudden change (rad). */
    public static final double SUDDEN = Math.PI;

    public DiameterChange {
        FlowCoefficientValve.requireId(id);
        InputException.requirePositive(id + ".inlet_diameter", inletDiameter);
        InputException.requirePositive(id + ".outlet_diameter", outletDiameter);
        if (inletDiameter > Segment.MAX_DIAMETER || outletDiameter > Segment.MAX_DIAMETER) {
            throw new InputException(
                    id + (inletDiameter > Segment.MAX_DIAMETER ? ".inlet_diameter" : ".outlet_diameter"),
                    "a bore of " + (inletDiameter > Segment.MAX_DIAMETER ? inletDiameter : outletDiameter)
                            + " m is beyond the plausible limit of "
                            + Segment.MAX_DIAMETER + " m; check the unit");
        }
        if (!(includedAngle > 0 && includedAngle <= SUDDEN)) {
            throw new InputException(
                    id + ".angle",
                    "the included cone angle must lie in (0°, 180°], got " + Math.toDegrees(includedAngle) + "°");
        }
        name = name == null || name.isBlank() ? id : name;
    }

    @Override
    public String kind() {
        return "reducer";
    }

    /** The transition met by flow in the given direction. */
    public TransitionLoss transition(boolean forward) {
        double upstream = forward ? inletDiameter : outletDiameter;
        double downstream = forward ? outletDiameter : inletDiameter;
        if (downstream >= upstream) {
            return includedAngle == SUDDEN
                    ? Transitions.suddenExpansion(upstream, downstream)
                    : Transitions.gradualExpansion(upstream, downstream, includedAngle);
        }
        return Transitions.gradualContraction(upstream, downstream, includedAngle);
    }

    /** c of h = c Q |Q| for flow in one direction (m per (m³/s)²). */
    private double resistance(boolean forward) {
        TransitionLoss t = transition(forward);
        double reference = t.referredTo() == ReferenceSection.UPSTREAM ? t.upstreamDiameter() : t.downstreamDiameter();
        double area = Math.PI * reference * reference / 4.0;
        return t.lossCoefficient() / (2.0 * Gravity.STANDARD * area * area);
    }

    @Override
    public double headLoss(double flow, FlowContext context) {
        Element.requireFiniteFlow(this, flow);
        return resistance(flow >= 0) * flow * Math.abs(flow);
    }

    @Override
    public double headLossSlope(double flow, FlowContext context) {
        Element.requireFiniteFlow(this, flow);
        return 2.0 * resistance(flow >= 0) * Math.abs(flow);
    }

    @Override
    public ElementResult evaluate(double flow, FlowContext context) {
        double h = headLoss(flow, context);
        TransitionLoss t = transition(flow >= 0);
        List<Caution> cautions = new ArrayList<>();
        if (flow != 0) {
            double small = Math.min(inletDiameter, outletDiameter);
            double velocity = Math.abs(flow) / (Math.PI * small * small / 4.0);
            double reynolds = context.fluid().density()
                    * velocity
                    * small
                    / context.fluid().dynamicViscosity();
            for (Caution c : Transitions.cautions(reynolds)) {
                cautions.add(c.about(id));
            }
        }
        String referred = t.referredTo() == ReferenceSection.UPSTREAM ? "upstream" : "downstream";
        return new ElementResult(
                id,
                kind(),
                flow,
                h,
                context.fluid().density() * Gravity.STANDARD * h,
                String.format(
                        Locale.ROOT,
                        "%.4g → %.4g mm, K %.4g referred to the %s velocity (%s)",
                        t.upstreamDiameter() * 1000.0,
                        t.downstreamDiameter() * 1000.0,
                        t.lossCoefficient(),
                        referred,
                        t.basis()),
                cautions);
    }
}
