package org.headway.system;

/**
 * Totals of a run at one flow.
 *
 * @param frictionHeadLoss sum of Darcy–Weisbach losses (m)
 * @param minorHeadLoss sum of fitting losses (m)
 * @param staticHead elevation and end-pressure head to overcome (m)
 * @param totalHead head the pump must supply = static + friction + minor (m); negative means the
 *     ends alone drive more than this flow
 * @param pressureDrop pressure lost to friction and fittings ρ g (h_f + h_m) (Pa)
 * @param pumpPressureRise pressure the pump must add ρ g H (Pa)
 */
public record RunTotals(
        double frictionHeadLoss,
        double minorHeadLoss,
        double staticHead,
        double totalHead,
        double pressureDrop,
        double pumpPressureRise) {

    /** Friction plus minor loss (m). */
    public double headLoss() {
        return frictionHeadLoss + minorHeadLoss;
    }
}
