package org.headway.fluid;

import java.math.BigDecimal;

/** Tolerances tied to the number of digits a reference value was printed with. */
final class PrintedDigits {

    /**
     * Half a unit in the last printed digit (the rounding of the published value) plus a tenth for
     * double arithmetic.
     */
    static final double UNITS_IN_LAST_DIGIT = 0.6;

    private PrintedDigits() {}

    /** The tolerance for a value printed as {@code printed}, e.g. 0.6e-11 for "0.100215168e-2". */
    static double tolerance(String printed) {
        return UNITS_IN_LAST_DIGIT * new BigDecimal(printed.strip()).ulp().doubleValue();
    }
}
