package org.headway.friction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.headway.caution.Caution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Regime selection and the transitional blend of the auto method. */
class AutoFrictionTest {

    private final AutoFriction auto = new AutoFriction();

    @ParameterizedTest
    @ValueSource(doubles = {1, 64, 1000, 2000, 2299.999})
    void laminarBelowTheLimitIsSixtyFourOverRe(double reynolds) {
        // Hagen–Poiseuille: f = 64/Re; at Re = 64 that is exactly 1.
        FrictionResult result = auto.evaluate(reynolds, 1e-3);
        assertEquals(64 / reynolds, result.frictionFactor(), 1e-15 * result.frictionFactor());
        assertEquals("laminar", result.method());
        assertEquals(FlowRegime.LAMINAR, result.regime());
        assertTrue(result.cautions().isEmpty(), result.cautions()::toString);
    }

    @ParameterizedTest
    @ValueSource(doubles = {4000, 1e5, 1e8})
    void turbulentIsColebrook(double reynolds) {
        FrictionResult result = auto.evaluate(reynolds, 1e-4);
        assertEquals(
                ColebrookReference.frictionFactor(reynolds, 1e-4),
                result.frictionFactor(),
                1e-14 * result.frictionFactor());
        assertEquals("colebrook", result.method());
    }

    @Test
    void continuousAtBothLimits() {
        for (double rr : new double[] {0, 1e-4, 0.01, 0.05}) {
            double laminarSide = auto.frictionFactor(Math.nextDown(FlowRegimes.LAMINAR_LIMIT), rr);
            double blendStart = auto.frictionFactor(FlowRegimes.LAMINAR_LIMIT, rr);
            assertEquals(laminarSide, blendStart, 1e-12 * laminarSide);
            double blendEnd = auto.frictionFactor(Math.nextDown(FlowRegimes.TURBULENT_LIMIT), rr);
            double turbulentSide = auto.frictionFactor(FlowRegimes.TURBULENT_LIMIT, rr);
            assertEquals(turbulentSide, blendEnd, 1e-12 * turbulentSide);
        }
    }

    @Test
    void transitionalIsTheDocumentedStraightLineAndCautioned() {
        double rr = 1e-3;
        double mid = (FlowRegimes.LAMINAR_LIMIT + FlowRegimes.TURBULENT_LIMIT) / 2;
        double expected = (64 / FlowRegimes.LAMINAR_LIMIT + ColebrookReference.frictionFactor(4000, rr)) / 2;
        FrictionResult result = auto.evaluate(mid, rr);
        assertEquals(expected, result.frictionFactor(), 1e-14 * expected);
        assertEquals(auto.frictionFactor(mid, rr), result.frictionFactor(), 1e-14 * expected);
        assertEquals(AutoFriction.TRANSITIONAL_METHOD, result.method());
        assertEquals(FlowRegime.TRANSITIONAL, result.regime());
        Caution caution = result.cautions().get(0);
        assertEquals("transitional-flow", caution.code());
        assertTrue(
                caution.message().startsWith("Re = 3150 is in the transitional range (2300 ≤ Re < 4000)"),
                caution::message);
        // The conservative turbulent-branch value is named for the reviewer.
        String turbulent = FrictionChecks.format(ColebrookReference.frictionFactor(mid, rr));
        assertTrue(caution.message().contains("Colebrook–White " + turbulent), caution::message);
        assertTrue(
                ColebrookReference.frictionFactor(mid, rr) > result.frictionFactor(),
                "the blend is below the turbulent branch");
    }
}
