package org.headway.friction;

/**
 * Swamee and Jain's explicit approximation of the Colebrook–White friction factor.
 *
 * <p>Equation: f = 0.25 / [log₁₀(ε/(3.7 D) + 5.74/Re^0.9)]², with f the Darcy friction factor
 * (ratio), ε the roughness (m), D the bore (m), Re the Reynolds number (ratio).
 *
 * <p>Validity: 5000 ≤ Re ≤ 1e8, 1e-6 ≤ ε/D ≤ 1e-2 (the range the authors state, from memory).
 * Accuracy: the authors state about 1 % of Colebrook–White (from memory); over their range we measure
 * up to 2.7 % (test {@code SwameeJain1976Test}).
 *
 * <p>Citation: P. K. Swamee and A. K. Jain, "Explicit equations for pipe-flow problems", Journal of
 * the Hydraulics Division, ASCE 102(HY5), 1976, 657–664 (their friction-factor equation).
 */
public final class SwameeJain1976 implements FrictionCorrelation {

    /** Numerator (ratio). */
    public static final double NUMERATOR = 0.25;

    /** Divisor of the relative roughness (ratio). */
    public static final double ROUGHNESS_DIVISOR = 3.7;

    /** Coefficient of the viscous term (ratio). */
    public static final double VISCOUS_COEFFICIENT = 5.74;

    /** Exponent of Re in the viscous term (ratio). */
    public static final double REYNOLDS_EXPONENT = 0.9;

    private static final ValidityRange VALIDITY =
            new ValidityRange(5000, 1e8, 1e-6, 1e-2, "Swamee and Jain (1976), stated range, from memory");

    @Override
    public String id() {
        return "swamee-jain";
    }

    @Override
    public String displayName() {
        return "Swamee–Jain (1976)";
    }

    @Override
    public String citation() {
        return "P. K. Swamee and A. K. Jain, Explicit equations for pipe-flow problems, Journal of the Hydraulics"
                + " Division, ASCE 102(HY5), 1976, 657–664";
    }

    @Override
    public String equation() {
        return "f = 0.25 / [log₁₀(ε/(3.7 D) + 5.74/Re^0.9)]²";
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
        double log = Math.log10(
                relativeRoughness / ROUGHNESS_DIVISOR + VISCOUS_COEFFICIENT / Math.pow(re, REYNOLDS_EXPONENT));
        return FrictionChecks.requireUsable(displayName(), NUMERATOR / (log * log), reynolds, relativeRoughness);
    }
}
