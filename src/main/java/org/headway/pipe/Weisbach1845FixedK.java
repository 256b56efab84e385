package org.headway.pipe;

import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * A fitting whose loss coefficient is a single number, independent of Reynolds number and size.
 *
 * <p>K = k, referred to the velocity in the pipe the fitting sits in. Such tabulated values are
 * measured in fully turbulent flow; below Re = 10⁴ (common practice, no source) the true K grows as
 * Re falls, so {@link #cautions} flags that use.
 *
 * <p>Citation: the loss written as K·V²/(2g) with a constant resistance coefficient per fitting goes
 * back to Weisbach, J. (1845), Lehrbuch der Ingenieur- und Maschinen-Mechanik (from memory; a
 * reviewer should check the edition). Each catalog row names the table its K comes from (Perry 7th
 * ed. Table 6-4, Crane TP-410, …). Catalog method id: {@code fixed}.
 */
public final class Weisbach1845FixedK implements Fitting {

    /** Reynolds number below which a fixed K is flagged (common practice, no source). */
    public static final double TURBULENT_REYNOLDS = 1.0e4;

    private final String id;
    private final String description;
    private final double coefficient;
    private final String source;

    /**
     * @param id stable id
     * @param description plain-words description
     * @param coefficient K (ratio), finite and not negative
     * @param source publication and table the value comes from
     */
    public Weisbach1845FixedK(String id, String description, double coefficient, String source) {
        this.id = FittingChecks.requireText("id", id);
        this.description = FittingChecks.requireText("description", description);
        this.coefficient = InputException.requireNonNegative("k", coefficient);
        this.source = FittingChecks.requireText("source", source);
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String description() {
        return description;
    }

    @Override
    public String method() {
        return "fixed K";
    }

    @Override
    public String source() {
        return source;
    }

    /** The fixed loss coefficient K (ratio). */
    public double coefficient() {
        return coefficient;
    }

    @Override
    public double lossCoefficient(double reynolds, double innerDiameter) {
        FittingChecks.requireFlow(reynolds, innerDiameter);
        return coefficient;
    }

    @Override
    public List<Caution> cautions(double reynolds, double innerDiameter) {
        FittingChecks.requireFlow(reynolds, innerDiameter);
        if (reynolds < TURBULENT_REYNOLDS) {
            return List.of(Caution.warning(
                    "fixed-k-low-reynolds",
                    id + ": fixed K = " + coefficient + " is a turbulent-flow value; at Re = "
                            + String.format(Locale.ROOT, "%.0f", reynolds)
                            + " the real loss is larger. Use a 2-K or 3-K fitting for low Reynolds numbers.",
                    "common practice, no source"));
        }
        return List.of();
    }

    @Override
    public String toString() {
        return id + " (fixed K = " + coefficient + ")";
    }

    @Override
    public double lossCoefficientSlope(double reynolds, double innerDiameter) {
        return 0;
    }
}
