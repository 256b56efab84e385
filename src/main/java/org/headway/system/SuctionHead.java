package org.headway.system;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.headway.caution.Caution;

/**
 * Net positive suction head available at a pump inlet and its check against NPSH required, shared
 * by the series run and the network: NPSHa = (p_atm + p_gauge)/(ρ g) + V²/(2g) − p_v/(ρ g) (ISO
 * 17769-1:2012, the definition of NPSH available; the inlet is the datum). The caller gives the
 * energy head above the inlet, p_gauge/(ρ g) + V²/(2g), as its model knows it.
 *
 * <p>Accuracy: the arithmetic of the formula in double precision.
 */
public final class SuctionHead {

    /** Basis of the cavitation caution. */
    public static final String CAVITATION_BASIS = "margin: common practice, no source; NPSH definition per ISO 17769-1";

    private SuctionHead() {}

    /**
     * NPSH available.
     *
     * @param energyHeadAboveInlet gauge pressure head plus velocity head at the pump inlet (m)
     * @param barometricPressure site air pressure (Pa, absolute)
     * @param vapourPressure the liquid's vapour pressure (Pa, absolute)
     * @param density liquid density (kg/m³)
     * @return NPSHa (m)
     */
    public static double available(
            double energyHeadAboveInlet, double barometricPressure, double vapourPressure, double density) {
        return energyHeadAboveInlet + (barometricPressure - vapourPressure) / (density * Gravity.STANDARD);
    }

    /**
     * The cautions of an NPSH check at a flow: NPSH required read outside the maker's points, and NPSH
     * available below NPSH required plus the margin (or below the margin when NPSH required is not
     * known).
     *
     * @param pump the pump
     * @param flow its flow (m³/s)
     * @param npshAvailable NPSH available (m)
     * @param margin margin over NPSH required (m)
     * @param inlet words naming the inlet in the cavitation message, e.g. {@code "the pump inlet"}
     * @return the cautions, possibly none
     */
    public static List<Caution> check(
            PumpElement pump, double flow, double npshAvailable, double margin, String inlet) {
        List<Caution> cautions = new ArrayList<>();
        OptionalDouble requiredGiven = pump.npshRequiredAt(flow);
        if (pump.curve().npshRequiredOutsideCurve(flow / pump.speedRatio())) {
            cautions.add(Caution.warning(
                            "npsh-required-extrapolated",
                            String.format(
                                    Locale.ROOT,
                                    "flow %.4g L/s lies outside the maker's NPSH-required points; the"
                                            + " nearest end value %.3g m is used, and NPSH required usually"
                                            + " rises steeply beyond the last point",
                                    flow * 1000.0,
                                    requiredGiven.orElse(0.0)),
                            "common practice, no source")
                    .about(pump.id()));
        }
        double required = requiredGiven.orElse(0.0);
        if (npshAvailable < required + margin) {
            String what = requiredGiven.isPresent()
                    ? String.format(Locale.ROOT, "NPSH required %.3g m plus a margin of %.3g m", required, margin)
                    : String.format(Locale.ROOT, "a margin of %.3g m (NPSH required unknown)", margin);
            cautions.add(Caution.serious(
                    "cavitation-risk",
                    String.format(
                            Locale.ROOT,
                            "NPSH available at %s is %.3g m, less than %s; the pump may cavitate",
                            inlet,
                            npshAvailable,
                            what),
                    CAVITATION_BASIS));
        }
        return cautions;
    }
}
