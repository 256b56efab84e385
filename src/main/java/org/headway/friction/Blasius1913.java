package org.headway.friction;

/**
 * Blasius's power law for the Darcy friction factor in turbulent flow through smooth pipes.
 *
 * <p>Equation: f = 0.3164 Re^(−1/4), with f the Darcy friction factor (ratio) and Re the Reynolds
 * number (ratio); takes no account of roughness.
 *
 * <p>Validity: hydraulically smooth pipes (ε/D = 0), 4000 ≤ Re ≤ 1e5. The upper limit is Blasius's
 * (from memory); the lower is the turbulent limit of {@link FlowRegimes}. A rough pipe is outside the
 * range and flagged, since the formula ignores ε/D.
 *
 * <p>Citation: H. Blasius, "Das Ähnlichkeitsgesetz bei Reibungsvorgängen in Flüssigkeiten",
 * Mitteilungen über Forschungsarbeiten auf dem Gebiete des Ingenieurwesens, Heft 131, VDI, Berlin,
 * 1913.
 */
public final class Blasius1913 implements FrictionCorrelation {

    /** Coefficient of the power law (ratio). */
    public static final double COEFFICIENT = 0.3164;

    /** Exponent of Re (ratio). */
    public static final double REYNOLDS_EXPONENT = -0.25;

    private static final ValidityRange VALIDITY = new ValidityRange(
            FlowRegimes.TURBULENT_LIMIT,
            1e5,
            0.0,
            0.0,
            "smooth pipes, Re ≤ 1e5: Blasius (1913), from memory; lower limit " + FlowRegimes.BASIS);

    @Override
    public String id() {
        return "blasius";
    }

    @Override
    public String displayName() {
        return "Blasius (1913)";
    }

    @Override
    public String citation() {
        return "H. Blasius, Das Ähnlichkeitsgesetz bei Reibungsvorgängen in Flüssigkeiten, Mitteilungen über"
                + " Forschungsarbeiten auf dem Gebiete des Ingenieurwesens, Heft 131, VDI, Berlin, 1913";
    }

    @Override
    public String equation() {
        return "f = 0.3164 Re^(−1/4)";
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
        double f = COEFFICIENT * Math.pow(reynolds, REYNOLDS_EXPONENT);
        return FrictionChecks.requireUsable(displayName(), f, reynolds, relativeRoughness);
    }
}
