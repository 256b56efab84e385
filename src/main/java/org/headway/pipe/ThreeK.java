package org.headway.pipe;

import java.util.List;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * Darby's three-constant fitting loss coefficient, with a weaker size dependence than the 2-K
 * method.
 *
 * <p>K = K₁/Re + Kᵢ (1 + K_d/D^0.3), with Re the pipe Reynolds number (ratio), D the pipe inner
 * diameter in inches, K₁, Kᵢ and K_d tabulated per fitting (ratio). K is referred to the pipe
 * velocity.
 *
 * <p>Validity: fitted by the author to published fitting data over laminar to turbulent flow in
 * commercial sizes; this class flags inner diameters outside {@link #DIAMETER_LOW_INCHES}–{@link
 * #DIAMETER_HIGH_INCHES} in (an assumed span of common fitting sizes, no source) with a Caution.
 *
 * <p>Citation: Darby, R., Chemical Engineering Fluid Mechanics, 2nd ed., Marcel Dekker, 2001, 3-K
 * coefficient table; first published as Darby, R. (1999), "Correlate pressure drops through
 * fittings", Chemical Engineering 106(7), 101–104 (both from memory; table number not checked).
 */
public final class ThreeK implements Fitting {

    /** Smallest inner diameter not flagged (in); assumed, no source. */
    public static final double DIAMETER_LOW_INCHES = 0.25;
    /** Largest inner diameter not flagged (in); assumed, no source. */
    public static final double DIAMETER_HIGH_INCHES = 24.0;
    /** Exponent of D in the size term, as published. */
    public static final double DIAMETER_EXPONENT = 0.3;

    private final String id;
    private final String description;
    private final double laminarCoefficient;
    private final double turbulentCoefficient;
    private final double sizeCoefficient;
    private final String source;

    /**
     * @param id stable id
     * @param description plain-words description
     * @param laminarCoefficient K₁ (ratio), not negative
     * @param turbulentCoefficient Kᵢ (ratio), not negative
     * @param sizeCoefficient K_d (in^0.3), not negative
     * @param source publication and table the coefficients come from
     */
    public ThreeK(
            String id,
            String description,
            double laminarCoefficient,
            double turbulentCoefficient,
            double sizeCoefficient,
            String source) {
        this.id = FittingChecks.requireText("id", id);
        this.description = FittingChecks.requireText("description", description);
        this.laminarCoefficient = InputException.requireNonNegative("k1", laminarCoefficient);
        this.turbulentCoefficient = InputException.requireNonNegative("k_inf", turbulentCoefficient);
        this.sizeCoefficient = InputException.requireNonNegative("k_d", sizeCoefficient);
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
        return "3-K (Darby 2001)";
    }

    @Override
    public String source() {
        return source;
    }

    /** K₁ (ratio). */
    public double laminarCoefficient() {
        return laminarCoefficient;
    }

    /** Kᵢ (ratio). */
    public double turbulentCoefficient() {
        return turbulentCoefficient;
    }

    /** K_d (in^0.3). */
    public double sizeCoefficient() {
        return sizeCoefficient;
    }

    @Override
    public double lossCoefficient(double reynolds, double innerDiameter) {
        FittingChecks.requireFlow(reynolds, innerDiameter);
        double inches = innerDiameter / FittingChecks.METRES_PER_INCH;
        return laminarCoefficient / reynolds
                + turbulentCoefficient * (1.0 + sizeCoefficient / Math.pow(inches, DIAMETER_EXPONENT));
    }

    @Override
    public List<Caution> cautions(double reynolds, double innerDiameter) {
        FittingChecks.requireFlow(reynolds, innerDiameter);
        return FittingChecks.sizeCautions(
                id,
                innerDiameter,
                DIAMETER_LOW_INCHES,
                DIAMETER_HIGH_INCHES,
                "the 3-K data",
                "Darby 2001 3-K method; size range assumed, no source");
    }

    @Override
    public String toString() {
        return id + " (3-K: K1 = " + laminarCoefficient + ", Ki = " + turbulentCoefficient + ", Kd = " + sizeCoefficient
                + ")";
    }

    /** dK/dRe = −K₁/Re². */
    @Override
    public double lossCoefficientSlope(double reynolds, double innerDiameter) {
        FittingChecks.requireFlow(reynolds, innerDiameter);
        return -laminarCoefficient / (reynolds * reynolds);
    }
}
