package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class UserFluidTableTest {

    @TempDir
    Path folder;

    private Path write(String name, String... lines) throws IOException {
        return Files.write(folder.resolve(name), List.of(lines));
    }

    @Test
    void loadsACelsiusTable() throws IOException {
        Path csv = write(
                "brine.csv",
                "# name: Plant brine",
                "# source: lab report 12",
                "temperature [degC], density [kg/m3], viscosity [mPa*s]",
                "0, 1100, 4.0",
                "20, 1090, 2.0");
        TabulatedFluid fluid = UserFluidTable.load(csv);
        assertEquals("brine", fluid.id());
        assertEquals("Plant brine", fluid.displayName());
        FluidState s = fluid.state(283.15, 101_325);
        assertEquals(1095, s.density(), 1e-9);
        assertEquals(Math.sqrt(8) * 1e-3, s.dynamicViscosity(), 1e-15);
        assertEquals("lab report 12 (linear in T)", s.densitySource());
        assertEquals(List.of(), s.cautions());
    }

    @Test
    void loadsAnSiTable() throws IOException {
        Path csv = write(
                "oil.csv", "temperature [K], density [kg/m3], viscosity [Pa*s]", "300, 850, 0.05", "350, 820, 0.01");
        FluidState s = UserFluidTable.load(csv).state(300, 101_325);
        assertEquals(0.05, s.dynamicViscosity(), 1e-15);
        assertEquals("user table oil.csv (linear in T)", s.densitySource());
    }

    @ParameterizedTest(name = "{1}")
    @CsvSource(
            delimiter = '|',
            value = {
                "20, 1090, abc | bad.csv line 3, column viscosity: not a number: \"abc\"",
                "20, -5, 2.0 | bad.csv line 3, column density: must be greater than zero, got -5",
                "0, 1090, 2.0 | bad.csv line 3, column temperature: temperatures must increase row by row, got 0",
                "20, 1090 | bad.csv line 3: expected 3 values (temperature, density, viscosity), got 2: \"20, 1090\"",
                "20, NaN, 2.0 | bad.csv line 3, column density: not a number: \"NaN\""
            })
    void namesFileLineColumnAndValue(String badRow, String message) throws IOException {
        Path csv = write("bad.csv", "temperature [degC], density [kg/m3], viscosity [mPa*s]", "0, 1100, 4.0", badRow);
        InputException e = assertThrows(InputException.class, () -> UserFluidTable.load(csv));
        assertEquals(message, e.getMessage());
    }

    @Test
    void refusesAnUnknownHeader() throws IOException {
        Path csv = write("h.csv", "temperature [degF], density [lb/ft3], viscosity [cP]", "60, 62, 1");
        InputException e = assertThrows(InputException.class, () -> UserFluidTable.load(csv));
        assertEquals(
                "h.csv line 1: header must be \"temperature [degC], density [kg/m3], viscosity [mPa*s]\" or"
                        + " \"temperature [K], density [kg/m3], viscosity [Pa*s]\", got \"temperature [degF], density"
                        + " [lb/ft3], viscosity [cP]\"",
                e.getMessage());
    }

    @Test
    void refusesASingleRowAndAMissingFile() throws IOException {
        Path one = write("one.csv", "temperature [degC], density [kg/m3], viscosity [mPa*s]", "0, 1100, 4.0");
        assertEquals(
                "one.csv: a fluid table needs at least two rows, got 1",
                assertThrows(InputException.class, () -> UserFluidTable.load(one))
                        .getMessage());
        Path missing = folder.resolve("missing.csv");
        InputException e = assertThrows(InputException.class, () -> UserFluidTable.load(missing));
        assertTrue(e.getMessage().startsWith(missing + ": cannot read the fluid table"), e.getMessage());
    }
}
