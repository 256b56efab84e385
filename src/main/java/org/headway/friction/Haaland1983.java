package org.headway.friction;

/**
 * Haaland's explicit approximation of the Colebrook–White friction factor.
 *
 * <p>Equation: 1/√f = −1.8 log₁₀[(ε/(3.7 D))^1.11 + 6.9/Re], with f the Darcy friction factor
 * (ratio), ε the roughness (m), D the bore (m), Re the Reynolds number (ratio).
 *
 * <p>Validity: 4000 ≤ Re ≤ 1e8, 1e-6 ≤ ε/D ≤ 0.05 (from memory). Accuracy: within about 1.5 % of
 * Colebrook–White (from memory); we measure up to 1.43 % over that range (test {@code
 * Haaland1983Test}).
 *
 * <p>Citation: S. E. Haaland, "Simple and explicit formulas for the friction factor in turbulent
 * pipe flow", Journal of Fluids Engineering 105(1), 1983, 89–90.
 */
public final class Haaland1983 implements FrictionCorrelation {

    /** Coefficient in front of the logarithm (ratio). */
    public static final double LOG_COEFFICIENT = 1.8;

    /** Divisor of the relative roughness (ratio). */
    public static final double ROUGHNESS_DIVISOR = 3.7;

    /** Exponent of the roughness term (ratio). */
    public static final double ROUGHNESS_EXPONENT = 1.11;

    /** Numerator of the viscous term (ratio). */
    public static final double VISCOUS_COEFFICIENT = 6.9;

    private static final ValidityRange VALIDITY =
            new ValidityRange(4000, 1e8, 1e-6, 0.05, "Haaland (1983), stated range, from memory");

    @Override
    public String id() {
        return "haaland";
    }

    @Override
    public String displayName() {
        return "Haaland (1983)";
    }

    @Override
    public String citation() {
        return "S. E. Haaland, Simple and explicit formulas for the friction factor in turbulent pipe flow,"
                + " Journal of Fluids Engineering 105(1), 1983, 89–90";
    }

    @Override
    public String equation() {
        return "1/√f = −1.8 log₁₀[(ε/(3.7 D))^1.11 + 6.9/Re]";
    }

    @Override
    public ValidityRange validity() {
        return VALIDITY;
    }

    @Override
    public FrictionResult evaluate(double reynolds, double relativeRoughness) {
        return FrictionChecks.heldExplicitResult(
                this, reynolds, relativeRoughness, frictionFactor(reynolds, relativeRoughness));
    }

    @Override
    public double frictionFactor(double reynolds, double relativeRoughness) {
        FrictionChecks.requireValid(reynolds, relativeRoughness);
        // Held below the floor, where the formula breaks down (FrictionChecks.EXPLICIT_FLOOR_REYNOLDS).
        double re = FrictionChecks.explicitReynolds(reynolds);
        double inverseRoot = -LOG_COEFFICIENT
                * Math.log10(
                        Math.pow(relativeRoughness / ROUGHNESS_DIVISOR, ROUGHNESS_EXPONENT) + VISCOUS_COEFFICIENT / re);
        return FrictionChecks.requireUsable(
                displayName(), 1.0 / (inverseRoot * inverseRoot), reynolds, relativeRoughness);
    }
}
