package org.headway.fluid;

/**
 * Saturation line of water by the IAPWS-IF97 Region 4 equations.
 *
 * <p>Saturation pressure, Eq. (30): p_s/p* = [2C / (−B + √(B² − 4AC))]⁴ with θ = T/T* + n₉/(T/T* −
 * n₁₀), A = θ² + n₁θ + n₂, B = n₃θ² + n₄θ + n₅, C = n₆θ² + n₇θ + n₈, p* = 1 MPa, T* = 1 K.
 * Saturation temperature, Eq. (31): T_s/T* = [n₁₀ + D − √((n₁₀ + D)² − 4(n₉ + n₁₀D))]/2 with β =
 * (p/p*)^¼, E = β² + n₃β + n₆, F = n₁β² + n₄β + n₇, G = n₂β² + n₅β + n₈, D = 2G/(−F − √(F² − 4EG)).
 *
 * <p>Validity: 273.15 K ≤ T ≤ 647.096 K (611.213 Pa ≤ p ≤ 22.064 MPa). The release's verification
 * values (Tables 35 and 36) are reproduced to their 9 printed digits.
 *
 * <p>Citation: IAPWS R7-97(2012), Eqs. (30) and (31), coefficients Table 34.
 */
public final class If97Region4 {

    /** Lowest saturation temperature of the equation (K). */
    public static final double MIN_TEMPERATURE = 273.15;
    /** Critical temperature (K). */
    public static final double CRITICAL_TEMPERATURE = 647.096;

    private static final double N1 = 0.11670521452767e4;
    private static final double N2 = -0.72421316703206e6;
    private static final double N3 = -0.17073846940092e2;
    private static final double N4 = 0.12020824702470e5;
    private static final double N5 = -0.32325550322333e7;
    private static final double N6 = 0.14915108613530e2;
    private static final double N7 = -0.48232657361591e4;
    private static final double N8 = 0.40511340542057e6;
    private static final double N9 = -0.23855557567849;
    private static final double N10 = 0.65017534844798e3;

    private If97Region4() {}

    /**
     * Saturation (vapour) pressure. The caller checks the range.
     *
     * @param temperature T (K)
     * @return p_s (Pa)
     */
    public static double saturationPressure(double temperature) {
        double theta = temperature + N9 / (temperature - N10);
        double a = theta * theta + N1 * theta + N2;
        double b = N3 * theta * theta + N4 * theta + N5;
        double c = N6 * theta * theta + N7 * theta + N8;
        double ratio = 2 * c / (-b + Math.sqrt(b * b - 4 * a * c));
        double squared = ratio * ratio;
        return squared * squared * 1e6;
    }

    /**
     * Saturation temperature, the backward equation. The caller checks the range.
     *
     * @param pressure p (Pa)
     * @return T_s (K)
     */
    public static double saturationTemperature(double pressure) {
        double beta = Math.sqrt(Math.sqrt(pressure / 1e6));
        double e = beta * beta + N3 * beta + N6;
        double f = N1 * beta * beta + N4 * beta + N7;
        double g = N2 * beta * beta + N5 * beta + N8;
        double d = 2 * g / (-f - Math.sqrt(f * f - 4 * e * g));
        return (N10 + d - Math.sqrt((N10 + d) * (N10 + d) - 4 * (N9 + N10 * d))) / 2;
    }
}
