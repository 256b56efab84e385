package org.headway.friction;

import org.headway.caution.InputException;

/**
 * The rule that decides the flow regime in a full circular pipe from its Reynolds number.
 *
 * <p>Laminar below {@value #LAMINAR_LIMIT}, turbulent from {@value #TURBULENT_LIMIT} up,
 * transitional in between. The two limits are the values most design texts use; texts differ
 * (2000–2300 for the lower, 3000–4000 for the upper), so they are marked "common practice, no
 * source".
 */
public final class FlowRegimes {

    /** Reynolds number below which flow in a pipe is taken as laminar (ratio). */
    public static final double LAMINAR_LIMIT = 2300.0;

    /** Reynolds number from which flow in a pipe is taken as fully turbulent (ratio). */
    public static final double TURBULENT_LIMIT = 4000.0;

    /** Where the two limits come from. */
    public static final String BASIS = "common practice, no source (laminar below Re 2300, turbulent from Re 4000)";

    private FlowRegimes() {}

    /**
     * The regime at a Reynolds number.
     *
     * @param reynolds Reynolds number (ratio), finite and positive
     * @return laminar below 2300, transitional from 2300 to below 4000, turbulent from 4000
     * @throws InputException naming "reynolds" if the value is not finite and positive
     */
    public static FlowRegime of(double reynolds) {
        InputException.requirePositive("reynolds", reynolds);
        if (reynolds < LAMINAR_LIMIT) {
            return FlowRegime.LAMINAR;
        }
        return reynolds < TURBULENT_LIMIT ? FlowRegime.TRANSITIONAL : FlowRegime.TURBULENT;
    }
}
