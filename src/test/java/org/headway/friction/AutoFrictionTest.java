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

    /**
     * The name says where the blend runs: Re 2300 to 4000, the regime limits of common practice (no
     * source), written here as numbers rather than read from the code, so that a name cut off
     * before its limits ("…straight-line blend between)") fails.
     */
    @Test
    void displayNameStatesTheBlendLimits() {
        String name = auto.displayName();
        assertTrue(name.endsWith("straight-line blend between Re 2300 and 4000)"), name);
        // the limits it names are where the method changes: laminar just below, Colebrook–White at 4000
        assertEquals("laminar", auto.evaluate(2299.0, 1e-4).method());
        assertEquals(
                AutoFriction.TRANSITIONAL_METHOD, auto.evaluate(2301.0, 1e-4).method());
        assertEquals("colebrook", auto.evaluate(4000.0, 1e-4).method());
    }

    /** No method's name stops on a word that needs a continuation, and its brackets close. */
    @Test
    void noDisplayNameIsCutOff() {
        for (FrictionCorrelation f : FrictionMethods.all()) {
            String name = f.displayName();
            long open = name.chars().filter(c -> c == '(').count();
            long close = name.chars().filter(c -> c == ')').count();
            assertEquals(open, close, name);
            assertTrue(!name.matches(".*\\b(between|and|to|from|with|of)\\)?$"), name);
        }
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
