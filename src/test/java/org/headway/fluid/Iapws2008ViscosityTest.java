package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/** IAPWS 2008 viscosity against the release's Table 4, which was computed with μ̄₂ = 1. */
class Iapws2008ViscosityTest {

    /** Source: IAPWS R12-08 Table 4 via r12-08-table4.csv; tolerance 0.6 of the last printed digit (µPa·s). */
    @ParameterizedTest(name = "T = {0} K, ρ = {1} kg/m³: μ = {2} µPa·s")
    @CsvFileSource(resources = "r12-08-table4.csv", numLinesToSkip = 1)
    void reproducesTable4(double temperature, double density, String printedMicroPascalSeconds) {
        double viscosity = Iapws2008Viscosity.viscosity(temperature, density) * 1e6;
        assertEquals(
                Double.parseDouble(printedMicroPascalSeconds),
                viscosity,
                PrintedDigits.tolerance(printedMicroPascalSeconds));
    }
}
