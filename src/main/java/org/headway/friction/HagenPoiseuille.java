package org.headway.friction;

/**
 * The exact Darcy friction factor of fully developed laminar flow in a circular pipe.
 *
 * <p>Equation: f = 64/Re, with f the Darcy friction factor (ratio) and Re the Reynolds number
 * (ratio); independent of wall roughness.
 *
 * <p>Validity: laminar flow, Re &lt; 2300 (the laminar limit of {@link FlowRegimes}); any ε/D.
 *
 * <p>Citation: G. Hagen, "Über die Bewegung des Wassers in engen cylindrischen Röhren", Annalen der
 * Physik und Chemie 46, 1839, 423–442; J. L. M. Poiseuille, Comptes Rendus 11 and 12, 1840–1841.
 * f = 64/Re follows from their parabolic velocity profile (Hagen–Poiseuille law) written in Darcy
 * form.
 */
public final class HagenPoiseuille implements FrictionCorrelation {

    /** Numerator of f = 64/Re (ratio). */
    public static final double LAMINAR_CONSTANT = 64.0;

    private static final ValidityRange VALIDITY = new ValidityRange(
            0.0,
            FlowRegimes.LAMINAR_LIMIT,
            0.0,
            1.0,
            "laminar flow only; exact for the parabolic profile (Hagen 1839, Poiseuille 1840); laminar limit "
                    + FlowRegimes.BASIS);

    @Override
    public String id() {
        return "laminar";
    }

    @Override
    public String displayName() {
        return "Hagen–Poiseuille laminar (1839/1840)";
    }

    @Override
    public String citation() {
        return "G. Hagen, Über die Bewegung des Wassers in engen cylindrischen Röhren, Annalen der Physik und"
                + " Chemie 46 (1839) 423–442; J. L. M. Poiseuille, Comptes Rendus 11 and 12 (1840–1841)";
    }

    @Override
    public String equation() {
        return "f = 64/Re";
    }

    @Override
    public ValidityRange validity() {
        return VALIDITY;
    }

    @Override
    public FrictionResult evaluate(double reynolds, double relativeRoughness) {
        return FrictionChecks.explicitResult(
                this, reynolds, relativeRoughness, frictionFactor(reynolds, relativeRoughness));
    }

    @Override
    public double frictionFactor(double reynolds, double relativeRoughness) {
        FrictionChecks.requireValid(reynolds, relativeRoughness);
        return FrictionChecks.requireUsable(displayName(), LAMINAR_CONSTANT / reynolds, reynolds, relativeRoughness);
    }

    /** df/dRe = −64/Re². */
    @Override
    public double frictionFactorSlope(double reynolds, double relativeRoughness) {
        FrictionChecks.requireValid(reynolds, relativeRoughness);
        return -LAMINAR_CONSTANT / (reynolds * reynolds);
    }

    @Override
    public boolean laminarAtLowReynolds() {
        return true;
    }
}
