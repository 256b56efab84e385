package org.headway.pipe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.headway.caution.InputException;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Corrupted copies of the bundled files must fail to load with the file, line and column named. */
class CatalogValidationTest {

    @TempDir
    Path dir;

    @BeforeEach
    void copyBundledFiles() throws IOException {
        for (String name : Catalog.BUNDLED_FILES) {
            try (InputStream in = Catalog.class.getResourceAsStream("/fluids-data/catalog/" + name)) {
                Files.write(dir.resolve(name), in.readAllBytes());
            }
        }
    }

    /** The uncorrupted copy loads, so every failure below comes from the corruption. */
    @Test
    void cleanCopyLoads() {
        Catalog copy = Catalog.load(dir);
        assertEquals(Catalog.bundled().materials(), copy.materials());
    }

    static Stream<Arguments> corruptions() {
        return Stream.of(
                // file, row prefix, column, cell replacement, expected problem
                Arguments.of(
                        "materials.csv", "steel-commercial-new,", "roughness_mm", "0.0x46", "not a number: '0.0x46'"),
                Arguments.of(
                        "materials.csv",
                        "steel-commercial-new,",
                        "roughness_low_mm",
                        "-0.03",
                        "must not be negative, got -0.03"),
                Arguments.of(
                        "materials.csv",
                        "pvc,",
                        "roughness_high_mm",
                        "0.001",
                        "high roughness 0.001 mm is below the typical roughness 0.0015 mm"),
                Arguments.of(
                        "materials.csv",
                        "concrete,",
                        "roughness_low_mm",
                        "2",
                        "low roughness 2 mm exceeds the typical roughness 1.0 mm"),
                Arguments.of("materials.csv", "hdpe,", "condition", "old", "unknown condition 'old'"),
                Arguments.of("materials.csv", "hdpe,", "roughness_mm", "NaN", "must be a finite number, got 'NaN'"),
                Arguments.of(
                        "materials.csv",
                        "pvc,",
                        "size_table",
                        "astm-d2241",
                        "material pvc names size table 'astm-d2241', which is not loaded"),
                Arguments.of(
                        "sizes-asme-b36.10m.csv",
                        "2,40,",
                        "wall_mm",
                        "30.15",
                        "wall 30.15 mm must be less than half the outside diameter 60.3 mm"),
                Arguments.of(
                        "sizes-asme-b36.10m.csv",
                        "4,80,",
                        "od_mm",
                        "114.4",
                        "outside diameter 114.4 mm for nominal 4 differs from 114.3 mm on line"),
                Arguments.of("sizes-asme-b36.19m.csv", "6,10S,", "od_mm", "-168.3", "must be greater than zero"),
                Arguments.of("sizes-astm-b88.csv", "1,L,", "wall_mm", "1,27", "expected 4 values"),
                Arguments.of("sizes-astm-d1785.csv", "3,80,", "wall_mm", "", "must not be empty"),
                Arguments.of("fittings.csv", "exit,", "k", "one", "not a number: 'one'"),
                Arguments.of("fittings.csv", "hooper-globe-valve,", "method", "2k", "unknown method '2k'"),
                Arguments.of(
                        "fittings.csv",
                        "gate-valve-open,",
                        "k1",
                        "300",
                        "method fixed does not use k1; leave it empty"),
                Arguments.of("fittings.csv", "darby-ball-valve,", "k_d", "", "must not be empty"));
    }

    @ParameterizedTest(name = "{0} {1} {2} = ''{3}''")
    @MethodSource("corruptions")
    void corruptedCellIsReportedWithFileLineAndColumn(
            String file, String rowPrefix, String column, String replacement, String problem) throws IOException {
        int line = replaceCell(file, rowPrefix, column, replacement);
        InputException e = assertThrows(InputException.class, () -> Catalog.load(dir));
        String message = e.getMessage();
        assertTrue(message.contains(file + " line " + line), message);
        assertTrue(message.contains(problem), message);
        if (!problem.startsWith("expected")) {
            assertTrue(message.contains(file + " line " + line + ", column " + column), message);
        }
    }

    @Test
    void duplicateIdNamesBothLines() throws IOException {
        List<String> lines = Files.readAllLines(dir.resolve("fittings.csv"));
        int first = indexOfRow(lines, "exit,") + 1;
        lines.add(lines.get(first - 1));
        Files.write(dir.resolve("fittings.csv"), lines);
        InputException e = assertThrows(InputException.class, () -> Catalog.load(dir));
        assertEquals(
                "fittings.csv line " + lines.size() + ": duplicate id 'exit', first given on line " + first,
                e.getMessage().substring(e.getMessage().indexOf("fittings.csv")));
    }

    @Test
    void duplicateSizeIsReported() throws IOException {
        List<String> lines = Files.readAllLines(dir.resolve("sizes-astm-b88.csv"));
        lines.add("1-1/2,k,41.275,1.8288");
        Files.write(dir.resolve("sizes-astm-b88.csv"), lines);
        InputException e = assertThrows(InputException.class, () -> Catalog.load(dir));
        assertTrue(e.getMessage().contains("sizes-astm-b88.csv line " + lines.size()), e.getMessage());
        assertTrue(e.getMessage().contains("duplicate id '1-1/2 / K'"), e.getMessage());
    }

    @ParameterizedTest
    @MethodSource("headerColumns")
    void missingColumnIsReported(String file, String column) throws IOException {
        List<String> lines = Files.readAllLines(dir.resolve(file));
        int header = indexOfRow(
                lines, Catalog.MATERIALS_FILE.equals(file) || Catalog.FITTINGS_FILE.equals(file) ? "id," : "nominal,");
        List<String> cells = List.of(lines.get(header).split(","));
        lines.set(
                header,
                String.join(",", cells.stream().filter(c -> !c.equals(column)).toList()));
        Files.write(dir.resolve(file), lines);
        InputException e = assertThrows(InputException.class, () -> Catalog.load(dir));
        assertTrue(e.getMessage().contains(file + " line " + (header + 1)), e.getMessage());
        assertTrue(e.getMessage().contains("missing column " + column), e.getMessage());
    }

    static Stream<Arguments> headerColumns() {
        return Stream.of(
                Arguments.of("materials.csv", "roughness_low_mm"),
                Arguments.of("fittings.csv", "k_d"),
                Arguments.of("sizes-asme-b36.10m.csv", "wall_mm"),
                Arguments.of("sizes-asme-b36.19m.csv", "od_mm"),
                Arguments.of("sizes-astm-b88.csv", "schedule"),
                Arguments.of("sizes-astm-d1785.csv", "nominal"));
    }

    @Test
    void fileWithoutSourceIsRejected() throws IOException {
        rewrite("sizes-astm-d1785.csv", text -> text.replace("# source:", "# origin:"));
        InputException e = assertThrows(InputException.class, () -> Catalog.load(dir));
        assertTrue(e.getMessage().contains("sizes-astm-d1785.csv line 6"), e.getMessage());
        assertTrue(e.getMessage().contains("'# source: …'"), e.getMessage());
    }

    @Test
    void folderWithoutMaterialsIsRejected() throws IOException {
        Files.delete(dir.resolve("materials.csv"));
        InputException e = assertThrows(InputException.class, () -> Catalog.load(dir));
        assertEquals(dir + ": missing materials.csv", e.getMessage());
    }

    /** Replaces one cell of the row starting with {@code rowPrefix}; returns its 1-based line. */
    private int replaceCell(String file, String rowPrefix, String column, String replacement) throws IOException {
        List<String> lines = Files.readAllLines(dir.resolve(file), StandardCharsets.UTF_8);
        int header = indexOfRow(lines, file.startsWith("sizes-") ? "nominal," : "id,");
        int columnIndex = List.of(lines.get(header).split(",")).indexOf(column);
        int row = indexOfRow(lines, rowPrefix);
        // the rows touched here quote nothing before the column, so a plain split finds the cell
        String[] cells = lines.get(row).split(",", -1);
        int quotedCommas = 0;
        StringBuilder rebuilt = new StringBuilder();
        int cell = 0;
        for (int i = 0; i < cells.length; i++) {
            boolean open = cells[i].startsWith("\"") && !cells[i].endsWith("\"");
            StringBuilder field = new StringBuilder(cells[i]);
            while (open && i + 1 < cells.length) {
                i++;
                quotedCommas++;
                field.append(',').append(cells[i]);
                open = !cells[i].endsWith("\"");
            }
            if (rebuilt.length() > 0) {
                rebuilt.append(',');
            }
            rebuilt.append(cell == columnIndex ? replacement : field);
            cell++;
        }
        assertTrue(
                columnIndex >= 0 && cell > columnIndex, "test setup: " + column + " in " + file + " " + quotedCommas);
        lines.set(row, rebuilt.toString());
        Files.write(dir.resolve(file), lines, StandardCharsets.UTF_8);
        return row + 1;
    }

    private static int indexOfRow(List<String> lines, String prefix) {
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).startsWith(prefix)) {
                return i;
            }
        }
        throw new AssertionError("test setup: no row starting with " + prefix);
    }

    private void rewrite(String file, UnaryOperator<String> change) throws IOException {
        Path path = dir.resolve(file);
        Files.writeString(path, change.apply(Files.readString(path)));
    }
}
