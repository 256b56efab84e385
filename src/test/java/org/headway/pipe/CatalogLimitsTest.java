package org.headway.pipe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Oversized or overflowing catalog files are refused with a located message. */
class CatalogLimitsTest {

    @Test
    void anOversizedCatalogFileIsRefusedBeforeItIsRead(@TempDir Path dir) throws IOException {
        Path file = dir.resolve(Catalog.FITTINGS_FILE);
        try (RandomAccessFile sparse = new RandomAccessFile(file.toFile(), "rw")) {
            sparse.setLength(Catalog.MAX_FILE_SIZE + 1);
        }
        InputException e = assertThrows(InputException.class, () -> Catalog.withUserFolder(dir));
        assertEquals(
                file + ": file is larger than 8 MB; a catalog file holds one short line per material, size or fitting",
                e.getMessage());
    }

    @Test
    void hexadecimalAndSuffixedNumbersAreNotNumbers(@TempDir Path dir) throws IOException {
        // Java's parser reads "0x1p3" as 8 and "2f" as 2; a catalog value must be written as a decimal.
        for (String value : new String[] {"0x1p3", "2f", "1d"}) {
            Files.writeString(
                    dir.resolve(Catalog.FITTINGS_FILE),
                    "# source: test\nid,description,method,k,k1,k_inf,k_d,source\nvalve,Valve,fixed," + value
                            + ",,,,test\n");
            InputException e = assertThrows(InputException.class, () -> Catalog.withUserFolder(dir));
            assertEquals(
                    dir.resolve(Catalog.FITTINGS_FILE) + " line 3, column k: not a number: '" + value + "'",
                    e.getMessage());
        }
    }

    @Test
    void aCoefficientThatWouldOverflowKIsRefused(@TempDir Path dir) throws IOException {
        Files.writeString(
                dir.resolve(Catalog.FITTINGS_FILE),
                "# source: test\nid,description,method,k,k1,k_inf,k_d,source\ntee,Tee,3-k,,500,0.15,1e308,test\n");
        InputException e = assertThrows(InputException.class, () -> Catalog.withUserFolder(dir));
        assertEquals(
                dir.resolve(Catalog.FITTINGS_FILE) + " line 3, column k_d: must not exceed 1000000.0, got 1e308",
                e.getMessage());
    }
}
