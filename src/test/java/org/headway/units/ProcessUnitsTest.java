package org.headway.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The process unit system: flows in m³/h and pressures in bar. Factors: 1 bar = 10⁵ Pa exactly (SI
 * Brochure, 9th ed., 2019, Table 8: non-SI units accepted), 1 h = 3600 s.
 */
class ProcessUnitsTest {

    @Test
    void flowsAndPressuresAreShownInCubicMetresPerHourAndBar() {
        assertEquals("m³/h", Quantities.unitSymbol(QuantityKind.VOLUMETRIC_FLOW, UnitSystem.SI_PROCESS));
        assertEquals("bar", Quantities.unitSymbol(QuantityKind.PRESSURE, UnitSystem.SI_PROCESS));
        assertEquals("m", Quantities.unitSymbol(QuantityKind.HEAD, UnitSystem.SI_PROCESS));
        assertEquals("mm", Quantities.unitSymbol(QuantityKind.DIAMETER, UnitSystem.SI_PROCESS));
        assertEquals(32.4, Quantities.fromSi(9e-3, QuantityKind.VOLUMETRIC_FLOW, UnitSystem.SI_PROCESS), 1e-12);
        assertEquals(2.5, Quantities.fromSi(2.5e5, QuantityKind.PRESSURE, UnitSystem.SI_PROCESS), 1e-15);
    }

    @Test
    void messagesWrittenInSiAreShownInProcessUnits() {
        String text = Quantities.inSystem(
                "rated 6 kPa at 3 L/s; 0.0025 m³/s balances 12 m; bore 52.5 mm", UnitSystem.SI_PROCESS);
        assertTrue(text.contains("0.06000 bar"), text);
        assertTrue(text.contains("10.80 m³/h"), text);
        assertTrue(text.contains("9.000 m³/h"), text);
        assertTrue(text.contains("12 m") && text.contains("52.5 mm"), "lengths stay as written: " + text);
        assertFalse(text.contains("kPa") || text.contains("L/s") || text.contains("m³/s"), text);
    }
}
