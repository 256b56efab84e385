package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

class WaterTest {

    private static final double ATMOSPHERE = 101_325;
    private final Water water = new Water();

    /**
     * IF97 Region 1 against the scientific formulation IAPWS-95. IF97 was built to agree with
     * IAPWS-95 within ±0.05 % in specific volume in Region 1 (IAPWS R7-97(2012), from memory); at
     * 1 atm and 0-99 °C the agreement is better, and 0.005 % is asserted.
     */
    private static final double DENSITY_VS_IAPWS95 = 5e-5;
    /** Viscosity differs only through the density it is evaluated at (same R12-08 formulation). */
    private static final double VISCOSITY_VS_IAPWS95 = 5e-5;
    /** IF97 Region 4 was built to agree with IAPWS-95 saturation pressures within ±0.025 % (from memory). */
    private static final double VAPOUR_PRESSURE_VS_IAPWS95 = 2.5e-4;

    /** Source: water-iapws95-1atm.csv, generated with the iapws library (IAPWS-95, R12-08, IAPWS 1992 saturation). */
    @ParameterizedTest(name = "{0} °C")
    @CsvFileSource(resources = "water-iapws95-1atm.csv", numLinesToSkip = 1)
    void agreesWithIapws95AtOneAtmosphere(double celsius, double density, double viscosity, double vapourPressure) {
        FluidState s = water.state(273.15 + celsius, ATMOSPHERE);
        assertEquals(density, s.density(), density * DENSITY_VS_IAPWS95);
        assertEquals(viscosity, s.dynamicViscosity(), viscosity * VISCOSITY_VS_IAPWS95);
        assertEquals(vapourPressure, s.vapourPressure().orElseThrow(), vapourPressure * VAPOUR_PRESSURE_VS_IAPWS95);
        assertEquals(s.dynamicViscosity() / s.density(), s.kinematicViscosity(), 1e-15);
    }

    /**
     * Source: water-1atm-from-memory.csv — CRC Handbook values recalled FROM MEMORY, hence loose
     * tolerances: 0.01 % density (5 printed digits), 0.5 % viscosity, 0.1 % vapour pressure.
     */
    @ParameterizedTest(name = "{0} °C")
    @CsvFileSource(resources = "water-1atm-from-memory.csv", numLinesToSkip = 1)
    void agreesWithHandbookTableFromMemory(
            double celsius, double density, double viscosityMilli, double vapourPressureKilo) {
        FluidState s = water.state(273.15 + celsius, ATMOSPHERE);
        assertEquals(density, s.density(), density * 1e-4);
        assertEquals(viscosityMilli * 1e-3, s.dynamicViscosity(), viscosityMilli * 1e-3 * 5e-3);
        assertEquals(vapourPressureKilo * 1e3, s.vapourPressure().orElseThrow(), vapourPressureKilo * 1e3 * 1e-3);
    }

    @Test
    void namesEverySource() {
        FluidState s = water.state(293.15, ATMOSPHERE);
        assertTrue(s.densitySource().contains("IF97 Region 1"));
        assertTrue(s.viscositySource().contains("R12-08"));
        assertTrue(s.vapourPressureSource().contains("Region 4"));
        assertEquals(List.of(), s.cautions());
    }

    @Test
    void refusesFrozenWater() {
        InputException e = assertThrows(InputException.class, () -> water.state(268.15, ATMOSPHERE));
        assertEquals("temperature: water freezes below 273.15 K (0 °C); got 268.15 K (-5 °C)", e.getMessage());
    }

    @Test
    void refusesBoilingWaterNamingBothPressures() {
        InputException e = assertThrows(InputException.class, () -> water.state(373.15, ATMOSPHERE));
        assertEquals(
                "pressure: water boils at 373.15 K (100 °C): pressure 101325 Pa is below the vapour pressure 101418 Pa",
                e.getMessage());
    }

    @Test
    void refusesPressureAboveRegion1() {
        InputException e = assertThrows(InputException.class, () -> water.state(300, 150e6));
        assertEquals(
                "pressure: absolute pressure must be above 0 and at most 100000000 Pa (IAPWS-IF97 Region 1); got"
                        + " 150000000 Pa",
                e.getMessage());
    }

    @Test
    void refusesTemperatureAboveRegion1() {
        InputException e = assertThrows(InputException.class, () -> water.state(650, 30e6));
        assertTrue(e.getMessage().startsWith("temperature: liquid water is modelled up to 623.15 K"), e.getMessage());
    }

    @Test
    void refusesNaN() {
        InputException e = assertThrows(InputException.class, () -> water.state(Double.NaN, ATMOSPHERE));
        assertEquals("temperature: must be a finite number, got NaN", e.getMessage());
    }

    @Test
    void cautionsNearFreezingNearBoilingAndAboveStatedRange() {
        assertEquals(List.of("near-freezing"), codes(water.state(273.5, ATMOSPHERE)));
        // 99 °C at 1 atm: vapour pressure 97.85 kPa is within 10 % of 101.325 kPa.
        assertEquals(List.of("near-vapour-pressure"), codes(water.state(372.15, ATMOSPHERE)));
        assertEquals(List.of("outside-stated-range"), codes(water.state(473.15, 5e6)));
    }

    private static List<String> codes(FluidState s) {
        return s.cautions().stream().map(Caution::code).toList();
    }
}
