package org.headway.pipe;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * Darby's three-constant fitting loss coefficient, with a weaker size dependence than the 2-K
 * method.
 *
 * <p>K = K₁/Re + Kᵢ (1 + K_d/Dₙ^0.3), with Re the pipe Reynolds number (ratio), Dₙ the
 * <em>nominal</em> diameter of the pipe in inches as the method is published, K₁, Kᵢ and K_d
 * tabulated per fitting (ratio). K is referred to the pipe velocity.
 *
 * <p>The nominal size is bound with {@link #atNominalSize}; the project resolver binds it from
 * the catalog size of the pipe (NPS, or DN/25.4). Without one (an explicit bore) the inner
 * diameter in inches stands in for Dₙ and {@link #cautions} says so: at NPS 1/2 Sch 40 the bore
 * is 0.622 in against Dₙ = 0.5 in, which changes the size term by a few per cent.
 *
 * <p>Validity: fitted by the author to published fitting data over laminar to turbulent flow in
 * commercial sizes; this class flags sizes outside {@link #DIAMETER_LOW_INCHES}–{@link
 * #DIAMETER_HIGH_INCHES} in (an assumed span of common fitting sizes, no source) with a Caution.
 *
 * <p>Citation: Darby, R., Chemical Engineering Fluid Mechanics, 2nd ed., Marcel Dekker, 2001, 3-K
 * method and coefficient table (Table 7-3; "Dn is the nominal diameter in inches"); first published
 * as Darby, R. (1999), "Correlate pressure drops through fittings", Chemical Engineering 106(7),
 * 101–104 (both from memory; table number not checked against a copy).
 */
public final class Darby2001ThreeK implements Fitting {

    /** Smallest size not flagged (in); assumed, no source. */
    public static final double DIAMETER_LOW_INCHES = 0.25;
    /** Largest size not flagged (in); assumed, no source. */
    public static final double DIAMETER_HIGH_INCHES = 24.0;
    /** Caution code when the inner diameter stands in for the nominal size. */
    public static final String NOMINAL_SIZE_UNKNOWN = "three-k-nominal-size-unknown";
    /** Exponent of D in the size term, as published. */
    public static final double DIAMETER_EXPONENT = 0.3;

    private final String id;
    private final String description;
    private final double laminarCoefficient;
    private final double turbulentCoefficient;
    private final double sizeCoefficient;
    private final String source;
    private final OptionalDouble nominalDiameter;

    /**
     * @param id stable id
     * @param description plain-words description
     * @param laminarCoefficient K₁ (ratio), not negative
     * @param turbulentCoefficient Kᵢ (ratio), not negative
     * @param sizeCoefficient K_d (in^0.3), not negative
     * @param source publication and table the coefficients come from
     */
    public Darby2001ThreeK(
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
        this.nominalDiameter = OptionalDouble.empty();
    }

    private Darby2001ThreeK(Darby2001ThreeK unbound, OptionalDouble nominalDiameter) {
        this.id = unbound.id;
        this.description = unbound.description;
        this.laminarCoefficient = unbound.laminarCoefficient;
        this.turbulentCoefficient = unbound.turbulentCoefficient;
        this.sizeCoefficient = unbound.sizeCoefficient;
        this.source = unbound.source;
        this.nominalDiameter = nominalDiameter;
    }

    /**
     * The same fitting in a pipe of the given nominal size, which the size term then uses in place
     * of the inner diameter.
     *
     * @param nominal nominal diameter of the pipe (m; NPS × 0.0254, DN × 0.001), positive and
     *     finite; empty for a pipe of unknown nominal size
     * @return a copy bound to that nominal size
     */
    @Override
    public Darby2001ThreeK atNominalSize(OptionalDouble nominal) {
        if (nominal.isPresent()) {
            InputException.requirePositive("nominal diameter", nominal.getAsDouble());
        }
        return new Darby2001ThreeK(this, nominal);
    }

    /** The nominal diameter the size term uses (m), empty when the inner diameter stands in. */
    public OptionalDouble nominalDiameter() {
        return nominalDiameter;
    }

    /** Dₙ of the size term (m): the bound nominal size, else the inner diameter. */
    private double sizeTermDiameter(double innerDiameter) {
        return nominalDiameter.orElse(innerDiameter);
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
        double inches = sizeTermDiameter(innerDiameter) / FittingChecks.METRES_PER_INCH;
        return laminarCoefficient / reynolds
                + turbulentCoefficient * (1.0 + sizeCoefficient / Math.pow(inches, DIAMETER_EXPONENT));
    }

    @Override
    public List<Caution> cautions(double reynolds, double innerDiameter) {
        FittingChecks.requireFlow(reynolds, innerDiameter);
        List<Caution> out = new ArrayList<>();
        if (nominalDiameter.isPresent()) {
            double inches = nominalDiameter.getAsDouble() / FittingChecks.METRES_PER_INCH;
            if (inches < DIAMETER_LOW_INCHES || inches > DIAMETER_HIGH_INCHES) {
                out.add(Caution.warning(
                        "fitting-size-outside-data",
                        String.format(
                                Locale.ROOT,
                                "%s: nominal size %.2f in lies outside %.2f–%.0f in covered by the 3-K data; K is"
                                        + " extrapolated.",
                                id,
                                inches,
                                DIAMETER_LOW_INCHES,
                                DIAMETER_HIGH_INCHES),
                        "Darby 2001 3-K method; size range assumed, no source"));
            }
        } else {
            out.addAll(FittingChecks.sizeCautions(
                    id,
                    innerDiameter,
                    DIAMETER_LOW_INCHES,
                    DIAMETER_HIGH_INCHES,
                    "the 3-K data",
                    "Darby 2001 3-K method; size range assumed, no source"));
            out.add(Caution.note(
                    NOMINAL_SIZE_UNKNOWN,
                    String.format(
                            Locale.ROOT,
                            "%s: the pipe has no nominal size (explicit bore), so its inner diameter %.3f in stands"
                                    + " in for the nominal diameter of Darby's 3-K size term; give a catalog pipe to"
                                    + " use its nominal size.",
                            id,
                            innerDiameter / FittingChecks.METRES_PER_INCH),
                    "Darby 2001, 3-K method: Dn is the nominal diameter in inches (from memory)"));
        }
        return out;
    }

    @Override
    public String toString() {
        return id + " (3-K: K1 = " + laminarCoefficient + ", Ki = " + turbulentCoefficient + ", Kd = " + sizeCoefficient
                + (nominalDiameter.isPresent()
                        ? ", Dn = " + nominalDiameter.getAsDouble() / FittingChecks.METRES_PER_INCH + " in"
                        : "")
                + ")";
    }

    /** dK/dRe = −K₁/Re². */
    @Override
    public double lossCoefficientSlope(double reynolds, double innerDiameter) {
        FittingChecks.requireFlow(reynolds, innerDiameter);
        return -laminarCoefficient / (reynolds * reynolds);
    }
}
