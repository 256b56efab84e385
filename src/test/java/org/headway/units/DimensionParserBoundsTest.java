package org.headway.units;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;

/** Units that would wrap an int, overflow the stack or hang are refused with a located message. */
class DimensionParserBoundsTest {

    @Test
    void exponentsThatWouldWrapAreRefusedNotTurnedDimensionless() {
        // 2147483647 + 2147483647 + 2 wraps to 0 in int arithmetic: the unit would read as dimensionless.
        InputException e = assertThrows(
                InputException.class, () -> DimensionParser.parse("m^2147483647*m^2147483647*m^2", "--var a"));
        assertTrue(e.getMessage().contains("beyond"), e.getMessage());
        InputException huge = assertThrows(InputException.class, () -> DimensionParser.parse("m^99999999999", "v"));
        assertTrue(huge.getMessage().contains("99999999999"), huge.getMessage());
        // A sum of allowed exponents that leaves the range is refused too.
        assertThrows(InputException.class, () -> DimensionParser.parse("m^90*m^90", "v"));
        // The ordinary ones still read.
        assertArrayEquals(new int[] {0, -3, 0, 0, 0, 0, 0}, DimensionParser.parse("m^(-3)", "v"));
        assertArrayEquals(new int[] {1, -1, -1, 0, 0, 0, 0}, DimensionParser.parse("kg/m/s", "v"));
    }

    @Test
    void deepNestingAndLongTextAreRefusedWithoutOverflowingTheStack() {
        String deep = "(".repeat(3000) + "m" + ")".repeat(3000);
        InputException e = assertThrows(InputException.class, () -> DimensionParser.parse(deep, "v"));
        assertTrue(e.getMessage().contains("longer"), e.getMessage());
        String nested = "(".repeat(40) + "m" + ")".repeat(40);
        InputException n = assertThrows(InputException.class, () -> DimensionParser.parse(nested, "v"));
        assertTrue(n.getMessage().contains("nested"), n.getMessage());
        assertArrayEquals(
                new int[] {0, 1, 0, 0, 0, 0, 0}, DimensionParser.parse("(".repeat(10) + "m" + ")".repeat(10), "v"));
    }
}
