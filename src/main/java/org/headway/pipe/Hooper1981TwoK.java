package org.headway.pipe;

import java.util.List;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * Hooper's two-constant fitting loss coefficient, which grows at low Reynolds number and in small
 * pipes.
 *
 * <p>K = K₁/Re + K∞ (1 + 1/D), with Re the pipe Reynolds number (ratio), D the pipe inner diameter in
 * inches, K₁ and K∞ tabulated per fitting (ratio). K is referred to the pipe velocity.
 *
 * <p>Validity: the author presents the method for laminar through turbulent flow in commercial pipe
 * sizes; this class flags inner diameters outside {@link #DIAMETER_LOW_INCHES}–{@link
 * #DIAMETER_HIGH_INCHES} in (an assumed span of common fitting sizes, no source) with a Caution.
 *
 * <p>Citation: Hooper, W.B. (1981), "The two-K method predicts head losses in pipe fittings",
 * Chemical Engineering, Aug. 24, 1981, pp. 96–100 (equation and coefficient table).
 */
public final class Hooper1981TwoK implements Fitting {

    /** Smallest inner diameter not flagged (in); assumed, no source. */
    public static final double DIAMETER_LOW_INCHES = 0.25;
    /** Largest inner diameter not flagged (in); assumed, no source. */
    public static final double DIAMETER_HIGH_INCHES = 24.0;

    private final String id;
    private final String description;
    private final double laminarCoefficient;
    private final double turbulentCoefficient;
    private final String source;

    /**
     * @param id stable id
     * @param description plain-words description
     * @param laminarCoefficient K₁ (ratio), not negative
     * @param turbulentCoefficient K∞ (ratio), not negative
     * @param source publication and table the coefficients come from
     */
    public Hooper1981TwoK(
            String id, String description, double laminarCoefficient, double turbulentCoefficient, String source) {
        this.id = FittingChecks.requireText("id", id);
        this.description = FittingChecks.requireText("description", description);
        this.laminarCoefficient = InputException.requireNonNegative("k1", laminarCoefficient);
        this.turbulentCoefficient = InputException.requireNonNegative("k_inf", turbulentCoefficient);
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
        return "2-K (Hooper 1981)";
    }

    @Override
    public String source() {
        return source;
    }

    /** K₁ (ratio). */
    public double laminarCoefficient() {
        return laminarCoefficient;
    }

    /** K∞ (ratio). */
    public double turbulentCoefficient() {
        return turbulentCoefficient;
    }

    @Override
    public double lossCoefficient(double reynolds, double innerDiameter) {
        FittingChecks.requireFlow(reynolds, innerDiameter);
        double inches = innerDiameter / FittingChecks.METRES_PER_INCH;
        return laminarCoefficient / reynolds + turbulentCoefficient * (1.0 + 1.0 / inches);
    }

    @Override
    public List<Caution> cautions(double reynolds, double innerDiameter) {
        FittingChecks.requireFlow(reynolds, innerDiameter);
        return FittingChecks.sizeCautions(
                id,
                innerDiameter,
                DIAMETER_LOW_INCHES,
                DIAMETER_HIGH_INCHES,
                "the 2-K tables",
                "Hooper 1981 2-K method; size range assumed, no source");
    }

    @Override
    public String toString() {
        return id + " (2-K: K1 = " + laminarCoefficient + ", Kinf = " + turbulentCoefficient + ")";
    }

    /** dK/dRe = −K₁/Re². */
    @Override
    public double lossCoefficientSlope(double reynolds, double innerDiameter) {
        FittingChecks.requireFlow(reynolds, innerDiameter);
        return -laminarCoefficient / (reynolds * reynolds);
    }
}
