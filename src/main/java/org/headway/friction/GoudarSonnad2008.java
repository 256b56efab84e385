package org.headway.friction;

/**
 * Goudar and Sonnad's explicit solution of the Colebrook–White equation: its exact Lambert-W form
 * with the Lambert W function evaluated by a continued-fraction step.
 *
 * <p>Equations: a = 2/ln 10; b = ε/(3.7 D); d = (ln 10/5.02) Re; s = b d + ln d; q = s^(s/(s+1));
 * g = b d + ln(d/q); z = ln(q/g); δ_LA = z g/(g + 1); δ_CFA = δ_LA (1 + (z/2)/((g + 1)² + (z/3)(2g − 1)));
 * 1/√f = a [ln(d/q) + δ_CFA]. f is the Darcy friction factor (ratio), ε the roughness (m), D the bore
 * (m), Re the Reynolds number (ratio).
 *
 * <p>Validity: 4000 ≤ Re ≤ 1e8, 0 ≤ ε/D ≤ 0.05 (from memory). Accuracy: the authors report agreement
 * with the iterated Colebrook–White equation to near machine precision (from memory); we measure a
 * largest relative difference of about 1e-12 in f over that range (test {@code
 * GoudarSonnad2008Test}).
 *
 * <p>Citation: C. T. Goudar and J. R. Sonnad, "Comparison of the iterative approximations of the
 * Colebrook-White equation", Hydrocarbon Processing 87(8), 2008, 79–83.
 */
public final class GoudarSonnad2008 implements FrictionCorrelation {

    /** Divisor of the relative roughness (ratio). */
    public static final double ROUGHNESS_DIVISOR = 3.7;

    /** Divisor 5.02 = 2 × 2.51 in d (ratio). */
    public static final double REYNOLDS_DIVISOR = 5.02;

    private static final double LN10 = Math.log(10.0);

    private static final ValidityRange VALIDITY =
            new ValidityRange(4000, 1e8, 0.0, 0.05, "Goudar and Sonnad (2008), stated range, from memory");

    @Override
    public String id() {
        return "goudar-sonnad";
    }

    @Override
    public String displayName() {
        return "Goudar–Sonnad (2008)";
    }

    @Override
    public String citation() {
        return "C. T. Goudar and J. R. Sonnad, Comparison of the iterative approximations of the Colebrook-White"
                + " equation, Hydrocarbon Processing 87(8), 2008, 79–83";
    }

    @Override
    public String equation() {
        return "a = 2/ln 10; b = ε/(3.7 D); d = (ln 10/5.02) Re; s = b d + ln d; q = s^(s/(s+1)); g = b d + ln(d/q);"
                + " z = ln(q/g); δ = (z g/(g+1)) (1 + (z/2)/((g+1)² + (z/3)(2g − 1))); 1/√f = a [ln(d/q) + δ]";
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
        double a = 2.0 / LN10;
        double b = relativeRoughness / ROUGHNESS_DIVISOR;
        // Held below the floor, where the formula breaks down (FrictionChecks.EXPLICIT_FLOOR_REYNOLDS).
        double d = LN10 / REYNOLDS_DIVISOR * FrictionChecks.explicitReynolds(reynolds);
        double s = b * d + Math.log(d);
        double q = Math.pow(s, s / (s + 1.0));
        double g = b * d + Math.log(d / q);
        double z = Math.log(q / g);
        double deltaLa = z * g / (g + 1.0);
        double deltaCfa = deltaLa * (1.0 + (z / 2.0) / ((g + 1.0) * (g + 1.0) + (z / 3.0) * (2.0 * g - 1.0)));
        double inverseRoot = a * (Math.log(d / q) + deltaCfa);
        return FrictionChecks.requireUsable(
                displayName(), 1.0 / (inverseRoot * inverseRoot), reynolds, relativeRoughness);
    }
}
