package org.headway.pipe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The physical checks every fitting-loss method must pass, as {@code FrictionCorrelationContract}
 * does for friction: K finite and not negative over laminar to fully turbulent flow and 1/4 to 24 in
 * pipes; K never rises with Re (the viscous part only adds at low Re); K never rises with size in
 * turbulent flow (small fittings lose more); the fully turbulent limit and, where the method has
 * one, the laminar limit K·Re → K₁ equal values the subclass states as literals worked by hand from
 * the published equation; dK/dRe agrees with a central difference of K. A subclass names the
 * method, its coefficients' source and its reference values.
 */
abstract class FittingLossContract {

    static final double INCH = 0.0254;
    /** Re far into the fully turbulent range, where K₁/Re is below 10⁻⁹ of any tabulated K. */
    static final double FULLY_TURBULENT = 1e15;
    /** Relative agreement of hand-worked literals, written to 6 significant figures. */
    static final double SIX_FIGURES = 5e-6;

    private static final double[] REYNOLDS = {1, 10, 100, 2000, 4000, 1e4, 1e5, 1e6, 1e8};
    private static final double[] INCHES = {0.25, 0.5, 1, 2, 4, 8, 12, 24};

    /** The method under test, with its coefficients. */
    abstract Fitting fitting();

    /** K in fully turbulent flow in a pipe of this inner diameter (in), worked by hand. */
    abstract double turbulentLimit(double inches);

    /** K₁ of the method (K·Re as Re → 0), or NaN where K does not follow 1/Re. */
    abstract double laminarCoefficient();

    @Test
    void lossCoefficientIsFiniteAndNotNegative() {
        for (double re : REYNOLDS) {
            for (double d : INCHES) {
                double k = fitting().lossCoefficient(re, d * INCH);
                assertTrue(Double.isFinite(k) && k >= 0, "Re " + re + ", D " + d + " in: K = " + k);
            }
        }
    }

    @Test
    void lossCoefficientNeverRisesWithReynolds() {
        for (double d : INCHES) {
            double previous = Double.POSITIVE_INFINITY;
            for (double re : REYNOLDS) {
                double k = fitting().lossCoefficient(re, d * INCH);
                assertTrue(k <= previous, "D " + d + " in: K rose to " + k + " at Re " + re);
                previous = k;
            }
        }
    }

    @Test
    void lossCoefficientNeverRisesWithSizeInTurbulentFlow() {
        for (double re : new double[] {1e5, 1e6, FULLY_TURBULENT}) {
            double previous = Double.POSITIVE_INFINITY;
            for (double d : INCHES) {
                double k = fitting().lossCoefficient(re, d * INCH);
                assertTrue(k <= previous, "Re " + re + ": K rose to " + k + " at D " + d + " in");
                previous = k;
            }
        }
    }

    @Test
    void fullyTurbulentLimitIsTheHandWorkedValue() {
        for (double d : new double[] {0.5, 1, 2.067, 4.026, 12}) {
            double expected = turbulentLimit(d);
            assertEquals(
                    expected,
                    fitting().lossCoefficient(FULLY_TURBULENT, d * INCH),
                    SIX_FIGURES * expected,
                    "D " + d + " in");
        }
    }

    @Test
    void laminarLimitFollowsOneOverReynolds() {
        double k1 = laminarCoefficient();
        if (Double.isNaN(k1)) {
            return;
        }
        // K·Re = K₁ + Re·K∞(…): at Re = 10⁻⁶ the second term is below 10⁻⁸ of K₁ for every table row.
        double re = 1e-6;
        assertEquals(k1, fitting().lossCoefficient(re, 2 * INCH) * re, 1e-8 * k1);
    }

    @Test
    void slopeAgreesWithACentralDifference() {
        for (double re : new double[] {10, 2000, 1e5}) {
            double d = 2 * INCH;
            double h = re * 1e-5;
            double difference =
                    (fitting().lossCoefficient(re + h, d) - fitting().lossCoefficient(re - h, d)) / (2 * h);
            double slope = fitting().lossCoefficientSlope(re, d);
            // central difference error O(h²) ≈ 1e-10 relative, plus rounding of K/h
            assertEquals(difference, slope, 1e-6 * Math.abs(difference) + 1e-15, "Re " + re);
        }
    }
}
