package org.headway.pipe;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * A constant K (the bundled standard 90° elbow, K = 0.75: Perry 7th ed. Table 6-4, from memory):
 * the same K at every Re and size, the Re → ∞ limit being the tabulated value itself.
 */
class Weisbach1845FixedKContractTest extends FittingLossContract {

    @Override
    Fitting fitting() {
        return Catalog.bundled().fitting("elbow-90-standard");
    }

    @Override
    double turbulentLimit(double inches) {
        return 0.75;
    }

    @Override
    double laminarCoefficient() {
        return Double.NaN;
    }

    @Test
    void exitLossIsOneExactly() {
        // Borda–Carnot with a large downstream area: the whole velocity head is lost, K = 1.
        assertEquals(1.0, Catalog.bundled().fitting("exit").lossCoefficient(1e5, 0.1), 0.0);
    }
}
