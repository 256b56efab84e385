package org.headway.fluid;

/**
 * Dynamic viscosity of water from temperature and density by the IAPWS 2008 formulation.
 *
 * <p>μ̄ = μ̄₀(T̄) · μ̄₁(T̄, ρ̄) · μ̄₂, with T̄ = T/647.096 K, ρ̄ = ρ/322.0 kg/m³, μ = μ̄ · 1 µPa·s;
 * μ̄₀ = 100 √T̄ / Σᵢ₌₀³ Hᵢ/T̄ⁱ (Eq. 11); μ̄₁ = exp[ρ̄ Σᵢ₌₀⁵ (1/T̄ − 1)ⁱ Σⱼ₌₀⁶ Hᵢⱼ (ρ̄ − 1)ʲ] (Eq. 12).
 *
 * <p>The critical enhancement is taken as μ̄₂ = 1, as the release recommends for industrial use:
 * it differs from 1 by more than 2 % only in a small region around the critical point (about 645.91
 * K to 650.77 K, 245.8 to 405.3 kg/m³), far from liquid water below 150 °C, where μ̄₂ = 1 to well
 * within the formulation's own uncertainty (about 1 % for the liquid below 150 °C at moderate
 * pressure).
 *
 * <p>Validity (Eq. 2 of the release): 273.16 K ≤ T ≤ 1173.15 K for p up to the melting pressure or
 * 1 GPa, whichever is smaller, among other bands. Table 4 of the release (computed with μ̄₂ = 1) is
 * reproduced to its printed digits.
 *
 * <p>Citation: IAPWS R12-08, Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary
 * Water Substance, Eqs. (10)–(12), Tables 1 and 2.
 */
public final class Iapws2008Viscosity {

    /** Reducing temperature T* (K). */
    public static final double REDUCING_TEMPERATURE = 647.096;
    /** Reducing density ρ* (kg/m³). */
    public static final double REDUCING_DENSITY = 322.0;
    /** Reducing viscosity μ* (Pa·s). */
    public static final double REDUCING_VISCOSITY = 1.00e-6;

    private static final double H0 = 1.67752;
    private static final double H1 = 2.20462;
    private static final double H2 = 0.6366564;
    private static final double H3 = -0.241605;

    /** Hᵢⱼ of Table 2: row i is the power of (1/T̄ − 1), column j the power of (ρ̄ − 1). */
    private static final double[][] HIJ = {
        {5.20094e-1, 2.22531e-1, -2.81378e-1, 1.61913e-1, -3.25372e-2, 0, 0},
        {8.50895e-2, 9.99115e-1, -9.06851e-1, 2.57399e-1, 0, 0, 0},
        {-1.08374, 1.88797, -7.72479e-1, 0, 0, 0, 0},
        {-2.89555e-1, 1.26613, -4.89837e-1, 0, 6.98452e-2, 0, -4.35673e-3},
        {0, 0, -2.57040e-1, 0, 0, 8.72102e-3, 0},
        {0, 1.20573e-1, 0, 0, 0, 0, -5.93264e-4}
    };

    private Iapws2008Viscosity() {}

    /**
     * Viscosity without critical enhancement. The caller checks the range.
     *
     * @param temperature T (K)
     * @param density ρ (kg/m³)
     * @return μ (Pa·s)
     */
    public static double viscosity(double temperature, double density) {
        double t = temperature / REDUCING_TEMPERATURE;
        double rho = density / REDUCING_DENSITY;
        double inverseT = 1.0 / t;
        double dilute = 100.0 * Math.sqrt(t) / (H0 + inverseT * (H1 + inverseT * (H2 + inverseT * H3)));
        double x = inverseT - 1.0;
        double y = rho - 1.0;
        double sum = 0.0;
        double xPower = 1.0;
        for (double[] row : HIJ) {
            // Horner in (ρ̄ − 1) for each row.
            double inner = row[6];
            for (int j = 5; j >= 0; j--) {
                inner = inner * y + row[j];
            }
            sum += xPower * inner;
            xPower *= x;
        }
        double residual = Math.exp(rho * sum);
        return dilute * residual * REDUCING_VISCOSITY;
    }
}
