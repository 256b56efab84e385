package org.headway.pipe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Checks of the 2-K and 3-K methods beyond their contract ({@link FittingLossContract}): laminar
 * scaling, nominal-size binding, cautions and bad input. No published worked example of either
 * method was at hand, so the expected values are hand calculations from the printed equations,
 * written as literals (never the implementation's formula repeated).
 */
class FittingMethodsTest {

    private static final double INCH = 0.0254;
    /** Exact arithmetic identities: only rounding error. */
    private static final double ROUNDING = 1e-12;

    private final Hooper1981TwoK hooperFlangedElbow =
            new Hooper1981TwoK("e", "elbow", 800, 0.25, "Hooper 1981 table, from memory");
    private final Darby2001ThreeK darbyFlangedElbow =
            new Darby2001ThreeK("e", "elbow", 800, 0.091, 4.0, "Darby table, from memory");

    @ParameterizedTest
    @CsvSource({
        // Re, K·Re worked by hand: 800 + Re · 0.25 (1 + 1/2.067) = 800 + Re · 0.37094823416
        "1e-3, 800.0003709482",
        "1e-2, 800.0037094823",
        "0.1, 800.0370948234"
    })
    void twoKScalesWithInverseReynoldsWhenLaminar(double reynolds, double expectedProduct) {
        double k = hooperFlangedElbow.lossCoefficient(reynolds, 2.067 * INCH);
        assertEquals(expectedProduct, k * reynolds, 1e-9);
        double halved = hooperFlangedElbow.lossCoefficient(reynolds / 2, 2.067 * INCH);
        assertEquals(2.0, halved / k, 1e-3);
    }

    @Test
    void twoKHandCalculation() {
        // Hooper (1981) K = K1/Re + K∞ (1 + 1/D[in]); K1 = 800, K∞ = 0.25, D = 4 in, Re = 1e5:
        // 800/1e5 + 0.25 * 1.25 = 0.008 + 0.3125 = 0.3205 (hand calculation)
        assertEquals(0.3205, hooperFlangedElbow.lossCoefficient(1e5, 4 * INCH), ROUNDING);
    }

    @Test
    void threeKHandCalculationAtOneInch() {
        // Darby K = K1/Re + Ki (1 + Kd/D[in]^0.3); at D = 1 in the size term is Kd exactly:
        // 800/1e4 + 0.091 * (1 + 4) = 0.08 + 0.455 = 0.535 (hand calculation)
        assertEquals(0.535, darbyFlangedElbow.lossCoefficient(1e4, INCH), ROUNDING);
    }

    @Test
    void threeKScalesWithInverseReynoldsWhenLaminar() {
        double k = darbyFlangedElbow.lossCoefficient(1e-3, 2 * INCH);
        assertEquals(800.0, k * 1e-3, 1e-3);
    }

    @Test
    void threeKBoundToANominalSizeUsesItInsteadOfTheBore() {
        // Darby (2001): Dn is the nominal diameter in inches (from memory). NPS 2, bore 2.067 in:
        // 800/1e5 + 0.091 (1 + 4/2^0.3) = 0.008 + 0.091 · 4.249 = 0.394660, worked by hand to 6
        // figures from the printed formula
        Darby2001ThreeK bound = darbyFlangedElbow.atNominalSize(java.util.OptionalDouble.of(2 * INCH));
        assertEquals(0.394660, bound.lossCoefficient(1e5, 2.067 * INCH), 5e-7);
        assertEquals(List.of(), bound.cautions(1e5, 2.067 * INCH));
        // rebinding to unknown goes back to the bore, with the note
        Darby2001ThreeK unbound = bound.atNominalSize(java.util.OptionalDouble.empty());
        assertEquals(darbyFlangedElbow.lossCoefficient(1e5, 2.067 * INCH), unbound.lossCoefficient(1e5, 2.067 * INCH));
        assertEquals(
                List.of(Darby2001ThreeK.NOMINAL_SIZE_UNKNOWN),
                unbound.cautions(1e5, 2.067 * INCH).stream().map(Caution::code).toList());
        // a nominal size outside the assumed span is flagged by its nominal value
        Caution big = darbyFlangedElbow
                .atNominalSize(java.util.OptionalDouble.of(36 * INCH))
                .cautions(1e5, 35 * INCH)
                .get(0);
        assertTrue(big.message().contains("nominal size 36.00 in"), big.message());
    }

    @Test
    void bothMethodsFallWithSizeInTurbulentFlow() {
        double small = hooperFlangedElbow.lossCoefficient(1e6, 1 * INCH);
        double large = hooperFlangedElbow.lossCoefficient(1e6, 12 * INCH);
        assertTrue(small > large);
        assertTrue(
                darbyFlangedElbow.lossCoefficient(1e6, 1 * INCH) > darbyFlangedElbow.lossCoefficient(1e6, 12 * INCH));
    }

    @Test
    void fixedKIgnoresReynoldsButWarnsInLaminarFlow() {
        Weisbach1845FixedK elbow = new Weisbach1845FixedK("elbow-90-standard", "elbow", 0.75, "Perry, from memory");
        assertEquals(0.75, elbow.lossCoefficient(1e3, 0.05), 0.0);
        assertEquals(0.75, elbow.lossCoefficient(1e6, 0.05), 0.0);
        List<Caution> low = elbow.cautions(2000, 0.05);
        assertEquals(1, low.size());
        assertEquals("fixed-k-low-reynolds", low.get(0).code());
        assertTrue(low.get(0).message().contains("Re = 2000"), low.get(0).message());
        assertEquals(List.of(), elbow.cautions(1e5, 0.05));
    }

    @Test
    void sizeOutsideTheTablesIsFlagged() {
        assertEquals(List.of(), hooperFlangedElbow.cautions(1e5, 4 * INCH));
        List<Caution> big = hooperFlangedElbow.cautions(1e5, 48 * INCH);
        assertEquals("fitting-size-outside-data", big.get(0).code());
        assertTrue(big.get(0).message().contains("48.00 in"), big.get(0).message());
        assertEquals(
                "fitting-size-outside-data",
                darbyFlangedElbow.cautions(1e5, 0.1 * INCH).get(0).code());
    }

    @Test
    void badFlowConditionsAreRejected() {
        InputException re = assertThrows(InputException.class, () -> hooperFlangedElbow.lossCoefficient(0, 0.05));
        assertEquals("reynolds: must be greater than zero, got 0.0", re.getMessage());
        InputException d = assertThrows(InputException.class, () -> darbyFlangedElbow.lossCoefficient(1e5, Double.NaN));
        assertEquals("innerDiameter: must be a finite number, got NaN", d.getMessage());
        InputException k = assertThrows(InputException.class, () -> new Weisbach1845FixedK("x", "x", -1, "s"));
        assertEquals("k: must not be negative, got -1.0", k.getMessage());
    }

    @Test
    void everyBundledFittingGivesFiniteNonNegativeK() {
        for (Fitting f : Catalog.bundled().fittings()) {
            for (double re : new double[] {10, 1e3, 1e5, 1e8}) {
                for (double inches : new double[] {0.5, 2, 24}) {
                    double k = f.lossCoefficient(re, inches * INCH);
                    assertTrue(Double.isFinite(k) && k >= 0, f.id() + " Re " + re + " D " + inches);
                }
            }
        }
    }
}
