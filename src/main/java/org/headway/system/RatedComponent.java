package org.headway.system;

import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * Equipment rated by its maker as a pressure drop at a flow — a coil, a heat exchanger, a
 * strainer, a meter: Δp = Δp_rated (Q/Q_rated)ⁿ, with n = 2 (fully turbulent, a fixed loss
 * coefficient) unless the maker gives another exponent.
 *
 * <p>Basis: a fixed K gives Δp ∝ Q², so one rated point fixes the law (common practice, no
 * source); makers of coils and exchangers often quote n between 1.8 and 2 for the water side (from
 * memory). The rating is taken as holding for the fluid in the system; a rating made with another
 * fluid scales with density for n = 2 only.
 *
 * @param id stable id
 * @param name name the engineer gave it
 * @param ratedPressureDrop Δp_rated (Pa), positive
 * @param ratedFlow Q_rated (m³/s), positive
 * @param exponent n (ratio), 1 ≤ n ≤ 2.5
 */
public record RatedComponent(String id, String name, double ratedPressureDrop, double ratedFlow, double exponent)
        implements Element {

    /** Default exponent, a fixed loss coefficient. */
    public static final double QUADRATIC = 2.0;

    /** Smallest exponent accepted: laminar (porous-medium) flow. */
    public static final double MIN_EXPONENT = 1.0;

    /** Largest exponent accepted. */
    public static final double MAX_EXPONENT = 2.5;

    /** Smallest rated flow accepted (m³/s), 1 µL/s: below it the rating is a unit slip. */
    public static final double MIN_RATED_FLOW = 1e-9;

    public RatedComponent {
        FlowCoefficientValve.requireId(id);
        InputException.requirePositive(id + ".rated_pressure_drop", ratedPressureDrop);
        InputException.requirePositive(id + ".rated_flow", ratedFlow);
        if (ratedPressureDrop > 1e9) {
            throw new InputException(
                    id + ".rated_pressure_drop",
                    "value " + ratedPressureDrop + " Pa is beyond the plausible limit of 1 GPa; check the unit");
        }
        if (ratedFlow < MIN_RATED_FLOW || ratedPressureDrop < 1e-3) {
            throw new InputException(
                    id + (ratedFlow < MIN_RATED_FLOW ? ".rated_flow" : ".rated_pressure_drop"),
                    "rating " + ratedPressureDrop + " Pa at " + ratedFlow + " m³/s is below any real component's"
                            + " (at least 1 mPa at 1 µL/s); check the number and its unit");
        }
        if (ratedFlow > PipeRun.MAX_FLOW) {
            throw new InputException(
                    id + ".rated_flow",
                    "value " + ratedFlow + " m³/s is beyond the plausible limit of " + PipeRun.MAX_FLOW + " m³/s");
        }
        if (!(exponent >= MIN_EXPONENT && exponent <= MAX_EXPONENT)) {
            throw new InputException(
                    id + ".exponent",
                    "must lie between " + MIN_EXPONENT + " and " + MAX_EXPONENT + ", got " + exponent);
        }
        name = name == null || name.isBlank() ? id : name;
    }

    @Override
    public String kind() {
        return "component";
    }

    private double ratedHead(FlowContext context) {
        return ratedPressureDrop / (context.fluid().density() * Gravity.STANDARD);
    }

    @Override
    public double headLoss(double flow, FlowContext context) {
        Element.requireFiniteFlow(this, flow);
        double ratio = Math.abs(flow) / ratedFlow;
        return Math.signum(flow) * ratedHead(context) * Math.pow(ratio, exponent);
    }

    @Override
    public double headLossSlope(double flow, FlowContext context) {
        Element.requireFiniteFlow(this, flow);
        double ratio = Math.abs(flow) / ratedFlow;
        if (ratio == 0) {
            return exponent == 1.0 ? ratedHead(context) / ratedFlow : 0.0;
        }
        return exponent * ratedHead(context) / ratedFlow * Math.pow(ratio, exponent - 1.0);
    }

    @Override
    public ElementResult evaluate(double flow, FlowContext context) {
        double h = headLoss(flow, context);
        double ratio = Math.abs(flow) / ratedFlow;
        List<Caution> cautions = ratio > 1.5 || (ratio > 0 && ratio < 0.1)
                ? List.of(Caution.note(
                                "rating-extrapolated",
                                String.format(
                                        Locale.ROOT,
                                        "flow is %.3g times the rated flow; the rated point is extrapolated by the"
                                                + " power law, which makers do not guarantee far from it",
                                        ratio),
                                "common practice, no source")
                        .about(id))
                : List.of();
        return new ElementResult(
                id,
                kind(),
                flow,
                h,
                context.fluid().density() * Gravity.STANDARD * h,
                String.format(
                        Locale.ROOT,
                        "rated %.4g kPa at %.4g L/s, Δp = Δp_rated (Q/Q_rated)^%.3g",
                        ratedPressureDrop / 1000.0,
                        ratedFlow * 1000.0,
                        exponent),
                cautions);
    }
}
