package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class MineralOilTest {

    /** A line through two points must return them: round-off only. */
    private static final double ROUND_TRIP = 1e-12;

    @ParameterizedTest(name = "ν({0} K) = {1}, ν({2} K) = {3} mm²/s")
    @CsvSource({
        "313.15, 46, 373.15, 6.8",
        "313.15, 32, 373.15, 5.4",
        "293.15, 220, 373.15, 19",
        "273.15, 3, 353.15, 2.1"
    })
    void astmD341LineReturnsItsReferencePoints(double t1, double nu1, double t2, double nu2) {
        AstmD341 line = AstmD341.through(t1, nu1 * 1e-6, t2, nu2 * 1e-6);
        assertEquals(nu1 * 1e-6, line.kinematicViscosity(t1), nu1 * 1e-6 * ROUND_TRIP);
        assertEquals(nu2 * 1e-6, line.kinematicViscosity(t2), nu2 * 1e-6 * ROUND_TRIP);
    }

    /** Round trip through the constants: a line made from two of its own points is the same line. */
    @Test
    void astmD341ConstantsSurviveARoundTrip() {
        AstmD341 original = new AstmD341(9.2, 3.6);
        AstmD341 rebuilt =
                AstmD341.through(300, original.kinematicViscosity(300), 360, original.kinematicViscosity(360));
        assertEquals(original.a(), rebuilt.a(), 1e-10);
        assertEquals(original.b(), rebuilt.b(), 1e-10);
        assertEquals(original.kinematicViscosity(330), rebuilt.kinematicViscosity(330), 1e-16);
    }

    @Test
    void astmD341RefusesViscosityRisingWithTemperature() {
        InputException e = assertThrows(InputException.class, () -> AstmD341.through(313.15, 6.8e-6, 373.15, 46e-6));
        assertTrue(e.getMessage().startsWith("reference viscosities: an oil's viscosity must fall"), e.getMessage());
    }

    @Test
    void vg46MeetsItsGradeAndNamesItsSources() {
        MineralOil oil = MineralOil.isoVg46();
        FluidState at40 = oil.state(313.15, 101_325);
        // ISO 3448: VG 46 means 41.4-50.6 mm²/s at 40 °C; the generic oil sits at the mid-point.
        assertEquals(46e-6, at40.kinematicViscosity(), 46e-6 * ROUND_TRIP);
        assertEquals(6.8e-6, oil.state(373.15, 101_325).kinematicViscosity(), 6.8e-6 * ROUND_TRIP);
        assertEquals(870.0 * (1 - 6.5e-4 * 25), at40.density(), 1e-9);
        assertTrue(at40.viscositySource().startsWith("ASTM D341"));
        assertTrue(at40.vapourPressure().isEmpty());
        assertEquals(List.of("generic-data"), codes(at40));
        assertEquals(List.of("generic-data", "outside-correlation-range"), codes(oil.state(263.15, 101_325)));
    }

    @Test
    void vg46RefusesStatesOutsideItsRange() {
        InputException e =
                assertThrows(InputException.class, () -> MineralOil.isoVg46().state(243.15, 101_325));
        assertEquals(
                "temperature: Mineral hydraulic oil ISO VG 46 (generic) is modelled from 253.15 K (-20 °C) to 423.15 K"
                        + " (150 °C); got 243.15 K (-30 °C)",
                e.getMessage());
    }

    private static List<String> codes(FluidState s) {
        return s.cautions().stream().map(Caution::code).toList();
    }
}
