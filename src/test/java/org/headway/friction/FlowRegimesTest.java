package org.headway.friction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;

/** The regime rule; limits are common practice, no source (see FlowRegimes). */
class FlowRegimesTest {

    @Test
    void limitsSplitTheRegimes() {
        assertEquals(FlowRegime.LAMINAR, FlowRegimes.of(1e-3));
        assertEquals(FlowRegime.LAMINAR, FlowRegimes.of(Math.nextDown(2300.0)));
        assertEquals(FlowRegime.TRANSITIONAL, FlowRegimes.of(2300));
        assertEquals(FlowRegime.TRANSITIONAL, FlowRegimes.of(Math.nextDown(4000.0)));
        assertEquals(FlowRegime.TURBULENT, FlowRegimes.of(4000));
        assertEquals(FlowRegime.TURBULENT, FlowRegimes.of(1e12));
    }

    @Test
    void rejectsBadReynolds() {
        assertEquals(
                "reynolds: must be a finite number, got NaN",
                assertThrows(InputException.class, () -> FlowRegimes.of(Double.NaN))
                        .getMessage());
        assertEquals(
                "reynolds: must be greater than zero, got -1.0",
                assertThrows(InputException.class, () -> FlowRegimes.of(-1)).getMessage());
    }
}
