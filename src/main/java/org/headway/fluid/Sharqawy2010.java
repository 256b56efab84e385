package org.headway.fluid;

/**
 * Seawater density, viscosity and vapour pressure at atmospheric pressure by the correlations
 * collected and fitted by Sharqawy, Lienhard and Zubair (2010).
 *
 * <p>Density: ρ = ρ_w + b₁S + b₂St + b₃St² + b₄St³ + b₅S²t², ρ_w = a₁ + a₂t + a₃t² + a₄t³ + a₅t⁴
 * (kg/m³); valid 0-180 °C, S 0-0.16 kg/kg, accuracy ±0.1 %.
 *
 * <p>Viscosity: μ = μ_w (1 + A S + B S²), A = 1.541 + 1.998·10⁻² t − 9.52·10⁻⁵ t², B = 7.974 −
 * 7.561·10⁻² t + 4.724·10⁻⁴ t², μ_w = 4.2844·10⁻⁵ + [0.157 (t + 64.993)² − 91.296]⁻¹ (Pa·s); valid
 * 0-180 °C, S 0-0.15 kg/kg, accuracy ±1.5 %.
 *
 * <p>Vapour pressure: p_v = p_v,w / (1 + 0.57357 S/(1000 − S)) with S in g/kg, and for pure water
 * ln p_v,w = −5.8002206·10³/T + 1.3914993 − 4.8640239·10⁻² T + 4.1764768·10⁻⁵ T² − 1.4452093·10⁻⁸
 * T³ + 6.5459673 ln T (Pa, T in K, the Hyland-Wexler equation); valid 0-200 °C, S 0-240 g/kg,
 * accuracy ±0.1 %.
 *
 * <p>Symbols: t temperature (°C), T temperature (K), S absolute salinity (kg/kg unless stated).
 *
 * <p>Citation: M. H. Sharqawy, J. H. Lienhard V, S. M. Zubair, Thermophysical properties of
 * seawater: a review of existing correlations and data, Desalination and Water Treatment 16 (2010)
 * 354-380; density Eq. (8), viscosity Eqs. (22)-(23), vapour pressure Eqs. (28)-(29). The
 * coefficients, ranges and equation numbers here are from memory of that paper and are checked in
 * the tests against independent references. Measured: density within 0.05 % of TEOS-10 (0-40 °C,
 * 10-40 g/kg); pure-water viscosity within 0.12 % of IAPWS 2008 (0-90 °C); vapour pressure within
 * 0.02 % of IF97 for pure water but up to 0.2 % low against IAPWS-08 seawater boiling points at
 * 35-70 g/kg, so the salinity term as recalled does not reach the ±0.1 % stated above.
 */
public final class Sharqawy2010 {

    /** Lowest temperature of all three correlations (°C). */
    public static final double MIN_CELSIUS = 0.0;
    /** Highest temperature of the density and viscosity correlations (°C). */
    public static final double MAX_CELSIUS = 180.0;
    /** Highest temperature of the vapour-pressure correlation (°C). */
    public static final double MAX_CELSIUS_VAPOUR_PRESSURE = 200.0;
    /** Highest salinity of the density correlation (g/kg). */
    public static final double MAX_SALINITY_DENSITY = 160.0;
    /** Highest salinity of the viscosity correlation (g/kg). */
    public static final double MAX_SALINITY_VISCOSITY = 150.0;
    /** Highest salinity of the vapour-pressure correlation (g/kg). */
    public static final double MAX_SALINITY_VAPOUR_PRESSURE = 240.0;

    private static final double A1 = 9.999e2;
    private static final double A2 = 2.034e-2;
    private static final double A3 = -6.162e-3;
    private static final double A4 = 2.261e-5;
    private static final double A5 = -4.657e-8;
    private static final double B1 = 8.020e2;
    private static final double B2 = -2.001;
    private static final double B3 = 1.677e-2;
    private static final double B4 = -3.060e-5;
    private static final double B5 = -1.613e-5;

    private Sharqawy2010() {}

    /**
     * @param celsius temperature t (°C)
     * @param salinity S (g/kg)
     * @return density (kg/m³) at atmospheric pressure
     */
    public static double density(double celsius, double salinity) {
        double t = celsius;
        double s = salinity / 1000.0;
        double pure = A1 + t * (A2 + t * (A3 + t * (A4 + t * A5)));
        return pure + s * (B1 + t * (B2 + t * (B3 + t * B4))) + B5 * s * s * t * t;
    }

    /**
     * @param celsius temperature t (°C)
     * @param salinity S (g/kg)
     * @return dynamic viscosity (Pa·s)
     */
    public static double viscosity(double celsius, double salinity) {
        double t = celsius;
        double s = salinity / 1000.0;
        double pure = 4.2844e-5 + 1.0 / (0.157 * (t + 64.993) * (t + 64.993) - 91.296);
        double a = 1.541 + 1.998e-2 * t - 9.52e-5 * t * t;
        double b = 7.974 - 7.561e-2 * t + 4.724e-4 * t * t;
        return pure * (1 + a * s + b * s * s);
    }

    /**
     * @param temperature T (K)
     * @param salinity S (g/kg)
     * @return vapour pressure (Pa)
     */
    public static double vapourPressure(double temperature, double salinity) {
        double t = temperature;
        double lnPure = -5.8002206e3 / t
                + 1.3914993
                - 4.8640239e-2 * t
                + 4.1764768e-5 * t * t
                - 1.4452093e-8 * t * t * t
                + 6.5459673 * Math.log(t);
        return Math.exp(lnPure) / (1 + 0.57357 * salinity / (1000.0 - salinity));
    }
}
