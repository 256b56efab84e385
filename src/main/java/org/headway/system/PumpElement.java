package org.headway.system;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * A pump as an element of the system: it adds the head of its curve, H(Q) = s² H₀(Q/s) at speed
 * ratio s (the affinity laws for a geometrically similar operating point: Q ∝ n, H ∝ n²; e.g.
 * Gülich, Centrifugal Pumps, 3rd ed. 2014, Table 3.4 — from memory), so its head loss is −H(Q).
 * NPSH required scales as s² by the same laws (a rough rule; makers test it).
 *
 * @param id stable id
 * @param curve the maker's curve at rated speed
 * @param speedRatio running speed over the speed of the curve (ratio), 0.2 ≤ s ≤ 1.5
 */
public record PumpElement(String id, PumpCurve curve, double speedRatio) implements Element {

    /** Smallest speed ratio accepted. */
    public static final double MIN_SPEED_RATIO = 0.2;

    /** Largest speed ratio accepted. */
    public static final double MAX_SPEED_RATIO = 1.5;

    public PumpElement {
        FlowCoefficientValve.requireId(id);
        Objects.requireNonNull(curve, "curve");
        if (!(speedRatio >= MIN_SPEED_RATIO && speedRatio <= MAX_SPEED_RATIO)) {
            throw new InputException(
                    id + ".speed",
                    "speed ratio must lie between " + MIN_SPEED_RATIO + " and " + MAX_SPEED_RATIO + ", got "
                            + speedRatio);
        }
    }

    /** A pump running at the speed of its curve. */
    public PumpElement(String id, PumpCurve curve) {
        this(id, curve, 1.0);
    }

    @Override
    public String kind() {
        return "pump";
    }

    @Override
    public String name() {
        return curve.name().isBlank() ? id : curve.name();
    }

    @Override
    public boolean blocksReverseFlow() {
        return true;
    }

    /**
     * Head the pump adds at a flow.
     *
     * @param flow volumetric flow (m³/s), ≥ 0
     * @return H (m); may be negative beyond run-out
     */
    public double head(double flow) {
        double s = speedRatio;
        return s * s * curve.head(flow / s);
    }

    /** dH/dQ at a flow (m per m³/s). */
    public double headSlope(double flow) {
        double[] c = curve.coefficients();
        double q = flow / speedRatio;
        double slope = 0;
        for (int j = c.length - 1; j >= 1; j--) {
            slope = slope * q + j * c[j];
        }
        return speedRatio * slope;
    }

    /**
     * NPSH required at a flow at the running speed (m), if the maker gave it: by the affinity laws
     * NPSHr_s(Q) = s² NPSHr(Q/s) (the usual scaling for a speed change, e.g. Karassik et al., Pump
     * Handbook, 4th ed., 2008, §2.3; from memory).
     *
     * @param flow volumetric flow (m³/s)
     */
    public OptionalDouble npshRequiredAt(double flow) {
        OptionalDouble atCurveSpeed = curve.npshRequiredAt(flow / speedRatio);
        if (atCurveSpeed.isEmpty()) {
            return atCurveSpeed;
        }
        return OptionalDouble.of(speedRatio * speedRatio * atCurveSpeed.getAsDouble());
    }

    /** NPSH required at the running speed (m), if the maker gave one value for the duty. */
    public OptionalDouble npshRequired() {
        if (curve.npshRequired().isEmpty()) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(speedRatio * speedRatio * curve.npshRequired().getAsDouble());
    }

    @Override
    public double headLoss(double flow, FlowContext context) {
        Element.requireForwardFlow(this, flow);
        return -head(flow);
    }

    @Override
    public double headLossSlope(double flow, FlowContext context) {
        Element.requireForwardFlow(this, flow);
        return -headSlope(flow);
    }

    @Override
    public ElementResult evaluate(double flow, FlowContext context) {
        double h = headLoss(flow, context);
        List<Caution> cautions = new ArrayList<>();
        double maximum = speedRatio * curve.maximumDataFlow();
        if (flow > maximum * (1 + 1e-12)) {
            cautions.add(Caution.warning(
                            "pump-beyond-curve",
                            String.format(
                                    Locale.ROOT,
                                    "flow %.4g L/s is beyond the last point of the maker's curve (%.4g L/s); the"
                                            + " fitted curve is extrapolated",
                                    flow * 1000.0,
                                    maximum * 1000.0),
                            "common practice, no source")
                    .about(id));
        }
        String speed =
                speedRatio == 1.0 ? "" : String.format(Locale.ROOT, " at speed ratio %.4g (affinity laws)", speedRatio);
        return new ElementResult(
                id,
                kind(),
                flow,
                h,
                context.fluid().density() * Gravity.STANDARD * h,
                "pump curve " + curve.name() + speed,
                cautions);
    }
}
