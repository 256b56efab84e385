package org.headway.system;

import java.util.List;
import java.util.Locale;
import org.headway.caution.InputException;

/**
 * A valve (or any component) given by its flow coefficient: Δp = (ρ/ρ₀) (Q/K_v)² × 1 bar with Q in
 * m³/h, ρ₀ = 1000 kg/m³, so that the head loss h = Δp/(ρ g) = (Q/K_v)² × 10⁵ Pa / (ρ₀ g) does not
 * depend on the fluid's density.
 *
 * <p>K_v is the flow of water in m³/h through the valve at a pressure drop of 1 bar; C_v the flow of
 * water in US gal/min at 1 psi (IEC 60534-1:2005 §3 and IEC 60534-2-1:2011 §4, the sizing equation
 * for turbulent incompressible flow without fittings; the ρ/ρ₀ form with ρ₀ = 1000 kg/m³ is that
 * standard's). The conversion between the two follows from the two definitions: K_v = C_v × (US
 * gal/min in m³/h) × √(1 psi / 1 bar) = 0.864 97 C_v, i.e. C_v ≈ 1.156 K_v. The law holds for fully
 * turbulent flow of a liquid without flashing or choking (IEC 60534-2-1 §5 for the limits).
 *
 * @param id stable id
 * @param name name the engineer gave it
 * @param flowCoefficient K_v (m³/h at 1 bar), positive
 * @param givenAs how the engineer gave it ({@code Kv 25} or {@code Cv 29})
 */
public record FlowCoefficientValve(String id, String name, double flowCoefficient, String givenAs) implements Element {

    /** Reference density ρ₀ of the K_v definition (kg/m³), IEC 60534-1. */
    public static final double REFERENCE_DENSITY = 1000.0;

    /** Pressure drop of the K_v definition, 1 bar (Pa). */
    public static final double REFERENCE_PRESSURE_DROP = 1e5;

    /** Seconds per hour: K_v is defined on m³/h. */
    public static final double SECONDS_PER_HOUR = 3600.0;

    /** One US gallon per minute in m³/h: 3.785 411 784 L × 60 / 1000 (NIST SP 811 (2008) Appendix B.8). */
    public static final double US_GPM_IN_CUBIC_METRES_PER_HOUR = 3.785411784e-3 * 60.0;

    /** One pound-force per square inch in Pa: 6894.757 293 168 (NIST SP 811 (2008) Appendix B.8). */
    public static final double PSI = 6894.757293168361;

    /** K_v per unit C_v from the two definitions: 0.864 97 (IEC 60534-1 quotes K_v = 0.865 C_v). */
    public static final double KV_PER_CV = US_GPM_IN_CUBIC_METRES_PER_HOUR * Math.sqrt(REFERENCE_PRESSURE_DROP / PSI);

    /** Smallest flow coefficient accepted (m³/h at 1 bar): below it, a unit slip. */
    public static final double MIN_FLOW_COEFFICIENT = 1e-6;

    /** Largest flow coefficient accepted (m³/h at 1 bar): beyond the largest valves made, a unit slip. */
    public static final double MAX_FLOW_COEFFICIENT = 1e6;

    public FlowCoefficientValve {
        requireId(id);
        InputException.requirePositive(id + ".kv", flowCoefficient);
        if (flowCoefficient < MIN_FLOW_COEFFICIENT) {
            throw new InputException(
                    id + (givenAs != null && givenAs.startsWith("Cv") ? ".cv" : ".kv"),
                    "flow coefficient " + flowCoefficient + " m³/h is below the smallest needle valves made ("
                            + MIN_FLOW_COEFFICIENT + "); check the number and its unit");
        }
        if (flowCoefficient > MAX_FLOW_COEFFICIENT) {
            throw new InputException(
                    id + ".kv",
                    "flow coefficient " + flowCoefficient + " m³/h is beyond the plausible limit of "
                            + MAX_FLOW_COEFFICIENT + "; check the number and whether it is Kv or Cv");
        }
        name = name == null || name.isBlank() ? id : name;
        givenAs = givenAs == null || givenAs.isBlank() ? "Kv " + flowCoefficient : givenAs;
    }

    /** A valve by K_v (m³/h at 1 bar). */
    public static FlowCoefficientValve ofKv(String id, String name, double kv) {
        return new FlowCoefficientValve(id, name, kv, "Kv " + trim(kv));
    }

    /** A valve by C_v (US gal/min at 1 psi). */
    public static FlowCoefficientValve ofCv(String id, String name, double cv) {
        InputException.requirePositive(id + ".cv", cv);
        if (cv * KV_PER_CV > MAX_FLOW_COEFFICIENT) {
            throw new InputException(
                    id + ".cv",
                    "flow coefficient Cv " + cv + " (US gal/min at 1 psi) is beyond the plausible limit of "
                            + trim(MAX_FLOW_COEFFICIENT / KV_PER_CV) + "; check the number and whether it is Kv or Cv");
        }
        return new FlowCoefficientValve(id, name, cv * KV_PER_CV, "Cv " + trim(cv));
    }

    static void requireId(String id) {
        if (id == null || id.isBlank()) {
            throw new InputException("id", "every element needs an id");
        }
    }

    private static String trim(double value) {
        return String.format(Locale.ROOT, "%.6g", value)
                .replaceAll("\\.?0+$", "")
                .replaceAll("\\.?0+e", "e");
    }

    @Override
    public String kind() {
        return "valve";
    }

    /**
     * The flow coefficient that loses a head at a flow: the law above solved for K_v, K_v = Q·3600 ·
     * √(Δp₀ / (ρ₀ g h)), which is the IEC 60534-2-1 sizing relation K_v = Q[m³/h] · √((ρ/ρ₀) / (Δp /
     * 1 bar)) with Δp = ρ g h.
     *
     * @param flow volumetric flow (m³/s), positive
     * @param headLoss head lost across the valve at that flow (m), positive
     * @return K_v (m³/h at 1 bar)
     */
    public static double flowCoefficientFor(double flow, double headLoss) {
        InputException.requirePositive("flow", flow);
        InputException.requirePositive("head loss", headLoss);
        return flow
                * SECONDS_PER_HOUR
                * Math.sqrt(REFERENCE_PRESSURE_DROP / (REFERENCE_DENSITY * Gravity.STANDARD * headLoss));
    }

    /** Head-loss coefficient c of h = c Q |Q| (m per (m³/s)²). */
    public double resistance() {
        double ratio = SECONDS_PER_HOUR / flowCoefficient;
        return ratio * ratio * REFERENCE_PRESSURE_DROP / (REFERENCE_DENSITY * Gravity.STANDARD);
    }

    @Override
    public double headLoss(double flow, FlowContext context) {
        Element.requireFiniteFlow(this, flow);
        return resistance() * flow * Math.abs(flow);
    }

    @Override
    public double headLossSlope(double flow, FlowContext context) {
        Element.requireFiniteFlow(this, flow);
        return 2.0 * resistance() * Math.abs(flow);
    }

    @Override
    public ElementResult evaluate(double flow, FlowContext context) {
        double h = headLoss(flow, context);
        double rho = context.fluid().density();
        return new ElementResult(
                id,
                kind(),
                flow,
                h,
                rho * Gravity.STANDARD * h,
                (givenAs.startsWith("Kv")
                                ? givenAs + " m³/h at 1 bar"
                                : givenAs + " US gpm at 1 psi (Kv " + trim(flowCoefficient) + " m³/h at 1 bar)")
                        + ": Δp = (ρ/ρ₀)(Q/Kv)² × 1 bar, IEC 60534-2-1",
                List.of());
    }
}
