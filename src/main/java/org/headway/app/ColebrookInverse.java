package org.headway.app;

import java.util.Locale;
import org.headway.friction.Colebrook1939;
import org.headway.friction.FlowRegimes;

/**
 * The relative roughness of the Colebrook–White curve that passes through a point (Re, f) of the
 * friction chart, for the chart's crosshair readout.
 *
 * <p>Colebrook's equation 1/√f = −2 log₁₀(ε/(3.7 D) + 2.51/(Re √f)) solved for ε/D in closed form:
 * ε/D = 3.7 (10^(−1/(2√f)) − 2.51/(Re √f)), with f the Darcy friction factor (ratio), Re the
 * Reynolds number (ratio) and ε/D the relative roughness (ratio). Exact to rounding (no
 * iteration). A negative result means the point lies below the smooth-pipe curve. The equation
 * holds for turbulent flow, Re ≳ 4000 (C. F. Colebrook, "Turbulent flow in pipes, with particular
 * reference to the transition region between the smooth and rough pipe laws", J. Inst. Civil
 * Engineers 11 (1939) 133–156, eq. 10).
 */
final class ColebrookInverse {

    private ColebrookInverse() {}

    /**
     * @param reynolds Reynolds number (ratio), positive
     * @param frictionFactor Darcy friction factor (ratio), positive
     * @return ε/D (ratio); negative below the smooth-pipe curve
     */
    static double relativeRoughness(double reynolds, double frictionFactor) {
        double root = Math.sqrt(frictionFactor);
        return Colebrook1939.ROUGHNESS_DIVISOR
                * (Math.pow(10, -1 / (Colebrook1939.LOG_COEFFICIENT * root))
                        - Colebrook1939.VISCOUS_COEFFICIENT / (reynolds * root));
    }

    /**
     * The readout under the chart's cursor, in plain words.
     *
     * @param reynolds Reynolds number at the cursor (ratio)
     * @param frictionFactor friction factor at the cursor (ratio)
     */
    static String readout(double reynolds, double frictionFactor) {
        if (!(reynolds > 0)
                || !(frictionFactor > 0)
                || !Double.isFinite(reynolds)
                || !Double.isFinite(frictionFactor)) {
            return "";
        }
        String point = String.format(Locale.ROOT, "Re = %s   f = %.4f", reynoldsText(reynolds), frictionFactor);
        if (reynolds < FlowRegimes.LAMINAR_LIMIT) {
            return point + "   laminar range: 64/Re = " + String.format(Locale.ROOT, "%.4f", 64 / reynolds);
        }
        double rr = relativeRoughness(reynolds, frictionFactor);
        String where = reynolds < FlowRegimes.TURBULENT_LIMIT ? " (transitional: Colebrook extrapolated)" : "";
        if (rr < 0) {
            return point + "   below the smooth-pipe Colebrook curve" + where;
        }
        if (rr >= 0.1) {
            return point + "   ε/D ≥ 0.1: rougher than the Colebrook curves go" + where;
        }
        return point + String.format(Locale.ROOT, "   on the Colebrook curve ε/D = %.3g", rr) + where;
    }

    private static String reynoldsText(double re) {
        return re >= 1e5 ? String.format(Locale.ROOT, "%.3e", re) : String.format(Locale.ROOT, "%,.0f", re);
    }
}
