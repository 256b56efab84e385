package org.headway.friction;

/**
 * Serghides's explicit approximation of the Colebrook–White friction factor: three fixed-point
 * steps accelerated by Steffensen's (Aitken's Δ²) formula.
 *
 * <p>Equations: A = −2 log₁₀(ε/(3.7 D) + 12/Re); B = −2 log₁₀(ε/(3.7 D) + 2.51 A/Re);
 * C = −2 log₁₀(ε/(3.7 D) + 2.51 B/Re); 1/√f = A − (B − A)²/(C − 2B + A). f is the Darcy friction
 * factor (ratio), ε the roughness (m), D the bore (m), Re the Reynolds number (ratio). Where the
 * three steps agree exactly (C − 2B + A = 0, fully rough flow at very high Re) the acceleration is
 * undefined and C is used.
 *
 * <p>Validity: 2500 ≤ Re ≤ 1e8, 0 ≤ ε/D ≤ 0.05 (from memory). Accuracy: the author states a largest
 * error of 0.0023 % (from memory); we measure up to 0.0032 % in f over 4000 ≤ Re ≤ 1e8 (test
 * {@code Serghides1984Test}).
 *
 * <p>Citation: T. K. Serghides, "Estimate friction factor accurately", Chemical Engineering 91(5),
 * 1984, 63–64.
 */
public final class Serghides1984 implements FrictionCorrelation {

    /** Coefficient in front of each logarithm (ratio). */
    public static final double LOG_COEFFICIENT = 2.0;

    /** Divisor of the relative roughness (ratio). */
    public static final double ROUGHNESS_DIVISOR = 3.7;

    /** Viscous numerator of the first step A (ratio). */
    public static final double FIRST_VISCOUS_COEFFICIENT = 12.0;

    /** Viscous numerator of steps B and C, Colebrook's 2.51 (ratio). */
    public static final double VISCOUS_COEFFICIENT = 2.51;

    private static final ValidityRange VALIDITY =
            new ValidityRange(2500, 1e8, 0.0, 0.05, "Serghides (1984), stated range, from memory");

    @Override
    public String id() {
        return "serghides";
    }

    @Override
    public String displayName() {
        return "Serghides (1984)";
    }

    @Override
    public String citation() {
        return "T. K. Serghides, Estimate friction factor accurately, Chemical Engineering 91(5), 1984, 63–64";
    }

    @Override
    public String equation() {
        return "A = −2 log₁₀(ε/(3.7 D) + 12/Re); B = −2 log₁₀(ε/(3.7 D) + 2.51 A/Re);"
                + " C = −2 log₁₀(ε/(3.7 D) + 2.51 B/Re); 1/√f = A − (B − A)²/(C − 2B + A)";
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
        double roughness = relativeRoughness / ROUGHNESS_DIVISOR;
        double a = -LOG_COEFFICIENT * Math.log10(roughness + FIRST_VISCOUS_COEFFICIENT / re);
        double b = -LOG_COEFFICIENT * Math.log10(roughness + VISCOUS_COEFFICIENT * a / re);
        double c = -LOG_COEFFICIENT * Math.log10(roughness + VISCOUS_COEFFICIENT * b / re);
        double denominator = c - 2.0 * b + a;
        double inverseRoot = denominator == 0.0 ? c : a - (b - a) * (b - a) / denominator;
        return FrictionChecks.requireUsable(
                displayName(), 1.0 / (inverseRoot * inverseRoot), reynolds, relativeRoughness);
    }
}
