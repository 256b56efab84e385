package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Oversized or unrepresentable fluid tables are refused with a located message. */
class UserFluidTableLimitsTest {

    @Test
    void anOversizedTableIsRefusedBeforeItIsRead(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("brine.csv");
        try (RandomAccessFile sparse = new RandomAccessFile(file.toFile(), "rw")) {
            sparse.setLength(UserFluidTable.MAX_FILE_SIZE + 1);
        }
        InputException e = assertThrows(InputException.class, () -> UserFluidTable.load(file));
        assertEquals(
                file + ": file is larger than 4 MB; a fluid table has one short line per temperature", e.getMessage());
    }

    @Test
    void aViscosityThatUnderflowsInSiIsReportedWithItsLine(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("brine.csv");
        Files.writeString(file, UserFluidTable.CELSIUS_HEADER + "\n0, 1030, 2.0\n10, 1028, 4.9e-324\n");
        InputException e = assertThrows(InputException.class, () -> UserFluidTable.load(file));
        assertEquals(
                "brine.csv line 3, column viscosity: viscosity 4.9e-324 with density 1028 is outside what a double can"
                        + " hold in SI units (Pa·s, m²/s)",
                e.getMessage());
    }

    @Test
    void aSuffixedNumberIsNotANumber(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("brine.csv");
        Files.writeString(file, UserFluidTable.CELSIUS_HEADER + "\n0, 1030, 2.0\n10, 1028f, 1.5\n");
        InputException e = assertThrows(InputException.class, () -> UserFluidTable.load(file));
        assertEquals("brine.csv line 3, column density: not a number: \"1028f\"", e.getMessage());
    }

    @Test
    void theLastTablePointGivesItsOwnDensityEvenBesideAHugelyDifferentOne(@TempDir Path dir) throws IOException {
        // ρ₀ + f(ρ₁ − ρ₀) with ρ₀ = 1035, ρ₁ = 1e-300 and f = 1 cancels to 0; the table value must come back.
        Path file = dir.resolve("odd.csv");
        Files.writeString(file, UserFluidTable.CELSIUS_HEADER + "\n0, 1035, 2.0\n10, 1e-300, 1.5\n");
        TabulatedFluid fluid = UserFluidTable.load(file);
        assertEquals(1e-300, fluid.state(fluid.maxTemperature(), 101_325).density());
    }

    @Test
    void aByteOrderMarkIsSkipped(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("brine.csv");
        Files.writeString(file, "\uFEFF" + UserFluidTable.CELSIUS_HEADER + "\r\n0, 1030, 2.0\r\n10, 1028, 1.5\r\n");
        assertEquals(283.15, UserFluidTable.load(file).maxTemperature(), 1e-9);
    }
}
