package org.headway.fluid;

import org.headway.caution.InputException;

/**
 * Kinematic viscosity of a petroleum oil against temperature by the ASTM D341 (Walther) relation,
 * fixed by two reference viscosities.
 *
 * <p>log₁₀ log₁₀(ν + 0.7) = A − B log₁₀ T, with ν kinematic viscosity (mm²/s = cSt) and T
 * temperature (K). Through (T₁, ν₁) and (T₂, ν₂): B = (Z₁ − Z₂)/(log₁₀ T₂ − log₁₀ T₁), A = Z₁ + B
 * log₁₀ T₁, Z = log₁₀ log₁₀(ν + 0.7).
 *
 * <p>Validity: liquid petroleum products, ν ≥ 2 mm²/s for the constant 0.7 (below that the standard
 * adds correction terms, not implemented here). Interpolation between the reference temperatures
 * is the intended use; extrapolation is customary but less certain.
 *
 * <p>Citation: ASTM D341, Standard Practice for Viscosity-Temperature Equations and Charts for Liquid
 * Petroleum or Hydrocarbon Products, Eqs. (1)-(2) (equation numbers from memory).
 *
 * @param a constant A (ratio)
 * @param b constant B (ratio)
 */
public record AstmD341(double a, double b) {

    /** The Walther constant (mm²/s). */
    public static final double WALTHER_CONSTANT = 0.7;
    /** Lowest kinematic viscosity for which the two-constant form holds (mm²/s). */
    public static final double MIN_VISCOSITY_CST = 2.0;

    public AstmD341 {
        InputException.requireFinite("ASTM D341 constant A", a);
        InputException.requirePositive("ASTM D341 constant B", b);
    }

    /**
     * The line through two reference points.
     *
     * @param temperature1 T₁ (K)
     * @param kinematicViscosity1 ν₁ (m²/s)
     * @param temperature2 T₂ (K), different from T₁
     * @param kinematicViscosity2 ν₂ (m²/s)
     * @return the constants A and B
     */
    public static AstmD341 through(
            double temperature1, double kinematicViscosity1, double temperature2, double kinematicViscosity2) {
        InputException.requirePositive("reference temperature 1", temperature1);
        InputException.requirePositive("reference temperature 2", temperature2);
        InputException.requirePositive("reference viscosity 1", kinematicViscosity1);
        InputException.requirePositive("reference viscosity 2", kinematicViscosity2);
        if (temperature1 == temperature2) {
            throw new InputException("reference temperatures", "must differ, both are " + Numbers.kelvin(temperature1));
        }
        double z1 = walther(kinematicViscosity1);
        double z2 = walther(kinematicViscosity2);
        double b = (z1 - z2) / (Math.log10(temperature2) - Math.log10(temperature1));
        if (!(b > 0)) {
            throw new InputException(
                    "reference viscosities",
                    "an oil's viscosity must fall as temperature rises; got " + Numbers.g(kinematicViscosity1 * 1e6)
                            + " mm²/s at " + Numbers.kelvin(temperature1) + " and "
                            + Numbers.g(kinematicViscosity2 * 1e6) + " mm²/s at " + Numbers.kelvin(temperature2));
        }
        return new AstmD341(z1 + b * Math.log10(temperature1), b);
    }

    private static double walther(double kinematicViscosity) {
        return Math.log10(Math.log10(kinematicViscosity * 1e6 + WALTHER_CONSTANT));
    }

    /**
     * @param temperature T (K)
     * @return kinematic viscosity ν (m²/s)
     */
    public double kinematicViscosity(double temperature) {
        double z = a - b * Math.log10(temperature);
        return (Math.pow(10, Math.pow(10, z)) - WALTHER_CONSTANT) * 1e-6;
    }
}
