package org.headway.pipe;

import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
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

    /**
     * The caution for a bore outside the span a method's coefficients were tabulated for, or none.
     *
     * @param id fitting id
     * @param innerDiameter pipe inner diameter (m)
     * @param lowInches smallest covered size (in)
     * @param highInches largest covered size (in)
     * @param coverage what covers the span, e.g. "the 2-K tables"
     * @param basis basis of the caution
     */
    static List<Caution> sizeCautions(
            String id, double innerDiameter, double lowInches, double highInches, String coverage, String basis) {
        double inches = innerDiameter / METRES_PER_INCH;
        if (inches >= lowInches && inches <= highInches) {
            return List.of();
        }
        return List.of(Caution.warning(
                "fitting-size-outside-data",
                String.format(
                        Locale.ROOT,
                        "%s: inner diameter %.2f in lies outside %.2f–%.0f in covered by %s; K is extrapolated.",
                        id,
                        inches,
                        lowInches,
                        highInches,
                        coverage),
                basis));
    }
}
