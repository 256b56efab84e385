package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

class ColebrookInverseTest {

    /**
     * The closed form cancels two nearly equal terms when ε/D is small; with f given to 17 digits the
     * recovered ε/D is good to about 1e-12 absolute (common practice, no source: error analysis of
     * the subtraction).
     */
    private static final double ABSOLUTE = 1e-11;

    private static final double RELATIVE = 1e-8;

    /** Points computed with mpmath at 60 digits (see src/test/resources/org/headway/friction/SOURCE.md). */
    @ParameterizedTest
    @CsvFileSource(resources = "/org/headway/friction/colebrook-spot-values.csv", numLinesToSkip = 1)
    void recoversTheRelativeRoughnessOfReferencePoints(double re, double rr, double f) {
        double back = ColebrookInverse.relativeRoughness(re, f);
        assertEquals(rr, back, ABSOLUTE + RELATIVE * rr, () -> "Re " + re + " ε/D " + rr);
    }

    @Test
    void readoutNamesTheCurveUnderTheCursor() {
        // Re 1e6, ε/D 1e-3: f ≈ 0.0199 on the Moody chart (from memory); the readout must give ε/D back near 1e-3.
        String text = ColebrookInverse.readout(1e6, 0.0199);
        assertTrue(text.contains("ε/D = 0.000"), text);
        double rr = ColebrookInverse.relativeRoughness(1e6, 0.0199);
        assertEquals(1e-3, rr, 1e-4);
    }

    @Test
    void readoutSaysWhenThePointIsBelowSmoothOrLaminar() {
        assertTrue(ColebrookInverse.readout(1e5, 0.010).contains("below the smooth-pipe"));
        assertTrue(ColebrookInverse.readout(1000, 0.064).contains("laminar range: 64/Re = 0.0640"));
        assertTrue(ColebrookInverse.readout(3000, 0.045).contains("transitional"));
        assertEquals("", ColebrookInverse.readout(Double.NaN, 0.02));
    }
}
