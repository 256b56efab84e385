package org.headway.fluid;

/**
 * Compressed liquid water by the IAPWS-IF97 Region 1 basic equation, the dimensionless Gibbs free
 * energy.
 *
 * <p>γ(π, τ) = g/(RT) = Σᵢ₌₁³⁴ nᵢ (7.1 − π)^Iᵢ (τ − 1.222)^Jᵢ, with π = p/p*, p* = 16.53 MPa, τ =
 * 1386 K / T (T* = 1386 K), R = 0.461526 kJ/(kg·K). Specific volume v = (RT/p) π γ_π; the other
 * properties follow from the derivatives of γ (Table 3 of the release).
 *
 * <p>Validity: 273.15 K ≤ T ≤ 623.15 K and p_s(T) ≤ p ≤ 100 MPa. Within it the release's
 * verification values (Table 5) are reproduced to their 9 printed digits.
 *
 * <p>Citation: IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997 for the
 * Thermodynamic Properties of Water and Steam, Eq. (7), Table 2 (coefficients), Table 3
 * (relations), Table 4 (derivatives).
 */
public final class If97Region1 {

    /** Specific gas constant R (J/(kg·K)), IF97 Eq. (1). */
    public static final double GAS_CONSTANT = 461.526;
    /** Reducing pressure p* (Pa). */
    public static final double REDUCING_PRESSURE = 16.53e6;
    /** Reducing temperature T* (K). */
    public static final double REDUCING_TEMPERATURE = 1386.0;
    /** Lowest temperature of Region 1 (K). */
    public static final double MIN_TEMPERATURE = 273.15;
    /** Highest temperature of Region 1 (K). */
    public static final double MAX_TEMPERATURE = 623.15;
    /** Highest pressure of Region 1 (Pa). */
    public static final double MAX_PRESSURE = 100e6;

    /** Exponents Iᵢ of (7.1 − π), Table 2. */
    private static final int[] I = {
        0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29, 30, 31, 32
    };
    /** Exponents Jᵢ of (τ − 1.222), Table 2. */
    private static final int[] J = {
        -2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6, -29, -31,
        -38, -39, -40, -41
    };
    /** Coefficients nᵢ, Table 2. */
    private static final double[] N = {
        0.14632971213167,
        -0.84548187169114,
        -0.37563603672040e1,
        0.33855169168385e1,
        -0.95791963387872,
        0.15772038513228,
        -0.16616417199501e-1,
        0.81214629983568e-3,
        0.28319080123804e-3,
        -0.60706301565874e-3,
        -0.18990068218419e-1,
        -0.32529748770505e-1,
        -0.21841717175414e-1,
        -0.52838357969930e-4,
        -0.47184321073267e-3,
        -0.30001780793026e-3,
        0.47661393906987e-4,
        -0.44141845330846e-5,
        -0.72694996297594e-15,
        -0.31679644845054e-4,
        -0.28270797985312e-5,
        -0.85205128120103e-9,
        -0.22425281908000e-5,
        -0.65171222895601e-6,
        -0.14341729937924e-12,
        -0.40516996860117e-6,
        -0.12734301741641e-8,
        -0.17424871230634e-9,
        -0.68762131295531e-18,
        0.14478307828521e-19,
        0.26335781662795e-22,
        -0.11947622640071e-22,
        0.18228094581404e-23,
        -0.93537087292458e-25
    };

    private static final int TERMS = N.length;
    private static final int MIN_J = -41;
    private static final int MAX_J = 17;
    private static final int MAX_I = 32;

    /**
     * Thermodynamic properties at one state (Table 3 of the release).
     *
     * @param specificVolume v (m³/kg)
     * @param specificEnthalpy h (J/kg)
     * @param specificInternalEnergy u (J/kg)
     * @param specificEntropy s (J/(kg·K))
     * @param isobaricHeatCapacity c_p (J/(kg·K))
     * @param speedOfSound w (m/s)
     */
    public record Properties(
            double specificVolume,
            double specificEnthalpy,
            double specificInternalEnergy,
            double specificEntropy,
            double isobaricHeatCapacity,
            double speedOfSound) {}

    private If97Region1() {}

    /**
     * Density from the Gibbs equation's pressure derivative only: the fast path for pipe
     * calculations. The caller checks the range.
     *
     * @param temperature T (K)
     * @param pressure p (Pa)
     * @return ρ = 1/v (kg/m³)
     */
    public static double density(double temperature, double pressure) {
        double pi = pressure / REDUCING_PRESSURE;
        double a = 7.1 - pi;
        double b = REDUCING_TEMPERATURE / temperature - 1.222;
        // γ_π written out term by term (Table 4), the integer powers built by multiplication: no
        // Math.pow, no arrays, about 90 multiplications. properties() keeps the plain loop over
        // Table 2, and the tests hold the two paths together.
        double r = 1.0 / b;
        double r2 = r * r;
        double r3 = r2 * r;
        double r4 = r2 * r2;
        double r5 = r4 * r;
        double r6 = r3 * r3;
        double r7 = r6 * r;
        double r8 = r4 * r4;
        double r9 = r8 * r;
        double r10 = r5 * r5;
        double r11 = r10 * r;
        double r20 = r10 * r10;
        double r29 = r20 * r9;
        double r31 = r29 * r2;
        double r38 = r31 * r7;
        double r39 = r38 * r;
        double r40 = r39 * r;
        double r41 = r40 * r;
        double b3 = b * b * b;
        double b6 = b3 * b3;
        double b10 = b6 * b3 * b;
        double b17 = b10 * b6 * b;
        double a2 = a * a;
        double a3 = a2 * a;
        double a4 = a2 * a2;
        double a7 = a4 * a3;
        double a5 = a4 * a;
        double a10 = a5 * a5;
        double a20 = a10 * a10;
        double a22 = a20 * a2;
        double a28 = a20 * a4 * a4;
        double a29 = a28 * a;
        double a30 = a29 * a;
        double a31 = a30 * a;
        double sum = (N[8] * r9 + N[9] * r7 + N[10] * r + N[11] + N[12] * b + N[13] * b3)
                + 2 * a * (N[14] * r3 + N[15] + N[16] * b + N[17] * b3 + N[18] * b17)
                + 3 * a2 * (N[19] * r4 + N[20] + N[21] * b6)
                + 4 * a3 * (N[22] * r5 + N[23] * r2 + N[24] * b10)
                + 5 * a4 * N[25] * r8
                + 8 * a7 * (N[26] * r11 + N[27] * r6)
                + 21 * a20 * N[28] * r29
                + 23 * a22 * N[29] * r31
                + 29 * a28 * N[30] * r38
                + 30 * a29 * N[31] * r39
                + 31 * a30 * N[32] * r40
                + 32 * a31 * N[33] * r41;
        double gammaPi = -sum;
        double specificVolume = pi * gammaPi * GAS_CONSTANT * temperature / pressure;
        return 1.0 / specificVolume;
    }

    private static double[] powersOf(double b) {
        double[] pow = new double[MAX_J - MIN_J + 1];
        pow[-MIN_J] = 1.0;
        for (int k = 1; k <= MAX_J; k++) {
            pow[-MIN_J + k] = pow[-MIN_J + k - 1] * b;
        }
        double inverse = 1.0 / b;
        for (int k = 1; k <= -MIN_J; k++) {
            pow[-MIN_J - k] = pow[-MIN_J - k + 1] * inverse;
        }
        return pow;
    }

    /**
     * All Table 3 properties. The caller checks the range.
     *
     * @param temperature T (K)
     * @param pressure p (Pa)
     * @return v, h, u, s, c_p, w
     */
    public static Properties properties(double temperature, double pressure) {
        double pi = pressure / REDUCING_PRESSURE;
        double tau = REDUCING_TEMPERATURE / temperature;
        double a = 7.1 - pi;
        double b = tau - 1.222;
        double[] powA = new double[MAX_I + 1];
        powA[0] = 1.0;
        for (int k = 1; k <= MAX_I; k++) {
            powA[k] = powA[k - 1] * a;
        }
        double[] powB = powersOf(b);
        double inverseA = 1.0 / a;
        double inverseB = 1.0 / b;
        double gamma = 0;
        double gammaPi = 0;
        double gammaPiPi = 0;
        double gammaTau = 0;
        double gammaTauTau = 0;
        double gammaPiTau = 0;
        for (int i = 0; i < TERMS; i++) {
            double n = N[i];
            int ii = I[i];
            int jj = J[i];
            double ai = powA[ii];
            double bj = powB[jj - MIN_J];
            gamma += n * ai * bj;
            gammaPi -= n * ii * ai * inverseA * bj;
            gammaPiPi += n * ii * (ii - 1) * ai * inverseA * inverseA * bj;
            gammaTau += n * ai * jj * bj * inverseB;
            gammaTauTau += n * ai * jj * (jj - 1) * bj * inverseB * inverseB;
            gammaPiTau -= n * ii * ai * inverseA * jj * bj * inverseB;
        }
        double rt = GAS_CONSTANT * temperature;
        double v = pi * gammaPi * rt / pressure;
        double h = rt * tau * gammaTau;
        double u = rt * (tau * gammaTau - pi * gammaPi);
        double s = GAS_CONSTANT * (tau * gammaTau - gamma);
        double cp = -GAS_CONSTANT * tau * tau * gammaTauTau;
        double x = gammaPi - tau * gammaPiTau;
        double w2 = rt * gammaPi * gammaPi / (x * x / (tau * tau * gammaTauTau) - gammaPiPi);
        return new Properties(v, h, u, s, cp, Math.sqrt(w2));
    }
}
