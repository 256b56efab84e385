package org.headway.pipe;

import org.headway.caution.InputException;

/** Argument checks shared by the fitting methods. */
final class FittingChecks {

    /** Metres per inch, exact by definition of the international inch (1959). */
    static final double METRES_PER_INCH = 0.0254;

    private FittingChecks() {}

    static void requireFlow(double reynolds, double innerDiameter) {
        InputException.requirePositive("reynolds", reynolds);
        InputException.requirePositive("innerDiameter", innerDiameter);
    }

    static String requireText(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new InputException(field, "must not be empty");
        }
        return value;
    }
}
