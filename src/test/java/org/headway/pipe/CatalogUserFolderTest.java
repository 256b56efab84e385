package org.headway.pipe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CatalogUserFolderTest {

    private static final double MM = 1.0e-3;

    @TempDir
    Path dir;

    @Test
    void userRowsOverrideAndExtendTheBundledCatalog() throws IOException {
        Files.writeString(
                dir.resolve("materials.csv"),
                String.join(
                        "\n",
                        "# source: our plant survey 2026 (invented for this test)",
                        "id,name,roughness_mm,roughness_low_mm,roughness_high_mm,condition,size_table,source",
                        "steel-commercial-new,Our steel,0.05,0.04,0.08,new,asme-b36.10m,plant survey",
                        "glass-lined,Glass-lined steel,0.001,0.001,0.002,new,plant-glass,plant survey",
                        ""));
        Files.writeString(
                dir.resolve("sizes-plant-glass.csv"),
                "# source: supplier sheet (invented for this test)\nnominal,schedule,od_mm,wall_mm\n2,G,60.3,4.0\n");
        Catalog catalog = Catalog.withUserFolder(dir);
        Catalog bundled = Catalog.bundled();
        assertEquals(bundled.materials().size() + 1, catalog.materials().size());
        assertEquals(0.05 * MM, catalog.material("steel-commercial-new").roughness(), 1e-15);
        assertEquals("Our steel", catalog.material("steel-commercial-new").name());
        // untouched bundled rows stay
        assertEquals(bundled.material("pvc"), catalog.material("pvc"));
        assertEquals(bundled.fittings().size(), catalog.fittings().size());
        PipeSize glass = catalog.size(catalog.material("glass-lined"), "2", "g");
        assertEquals(52.3 * MM, glass.innerDiameter(), 1e-12);
        assertEquals("supplier sheet (invented for this test)", glass.source());
        assertTrue(catalog.tables().contains("plant-glass"));
    }

    @Test
    void userSizeRowReplacesTheBundledRow() throws IOException {
        Files.writeString(
                dir.resolve("sizes-asme-b36.10m.csv"),
                "# source: measured bore (invented for this test)\nnominal,schedule,od_mm,wall_mm\n2,40,60.3,4.15\n");
        Catalog catalog = Catalog.withUserFolder(dir);
        PipeSize size = catalog.size(catalog.material("steel-commercial-new"), "2", "40");
        assertEquals(52.0 * MM, size.innerDiameter(), 1e-12);
        assertEquals(
                Catalog.bundled().sizes("asme-b36.10m", null).size(),
                catalog.sizes("asme-b36.10m", null).size());
    }

    @Test
    void errorsNameTheUserFile() throws IOException {
        Files.writeString(
                dir.resolve("fittings.csv"),
                "# source: ours\nid,description,method,k,k1,k_inf,k_d,source\nmy-valve,Valve,fixed,-2,,,,ours\n");
        InputException e = assertThrows(InputException.class, () -> Catalog.withUserFolder(dir));
        assertEquals(dir.resolve("fittings.csv") + " line 3, column k: must not be negative, got -2", e.getMessage());
    }

    @Test
    void fittingsFileMayCarryTheKnownOptionalColumns() throws IOException {
        // A maker's Kv/Cv and a notes column added to a user's file must not break it; K still comes
        // from the row's method (invented rows for this test).
        Files.writeString(
                dir.resolve("fittings.csv"),
                String.join(
                        "\n",
                        "# source: our valve survey (invented for this test)",
                        "id,description,method,k,k1,k_inf,k_d,source,kv,notes,cv",
                        "our-gate,Our gate valve,fixed,0.2,,,,ours,250,DN 80 maker sheet,",
                        "our-elbow,Our elbow,2-k,,800,0.25,,ours,,,",
                        ""));
        Catalog catalog = Catalog.withUserFolder(dir);
        Fitting gate = catalog.fitting("our-gate");
        assertEquals(0.2, gate.lossCoefficient(1.0e5, 0.08), 0.0);
        assertEquals(
                Catalog.bundled().fitting("gate-valve-open").lossCoefficient(1.0e5, 0.08),
                catalog.fitting("gate-valve-open").lossCoefficient(1.0e5, 0.08),
                0.0);
        assertTrue(catalog.fitting("our-elbow") instanceof Hooper1981TwoK);
    }

    @Test
    void badOptionalFlowCoefficientIsRefusedWithItsPlace() throws IOException {
        Files.writeString(
                dir.resolve("fittings.csv"),
                "# source: ours\nid,description,method,k,k1,k_inf,k_d,source,kv\nmy-valve,Valve,fixed,0.2,,,,ours,-4\n");
        InputException e = assertThrows(InputException.class, () -> Catalog.withUserFolder(dir));
        assertEquals(
                dir.resolve("fittings.csv") + " line 3, column kv: must be greater than zero, got -4", e.getMessage());
        Files.writeString(
                dir.resolve("fittings.csv"),
                "# source: ours\nid,description,method,k,k1,k_inf,k_d,source,kvs\nmy-valve,Valve,fixed,0.2,,,,ours,4\n");
        InputException unknown = assertThrows(InputException.class, () -> Catalog.withUserFolder(dir));
        assertTrue(unknown.getMessage().contains("unknown column 'kvs'"), unknown.getMessage());
        assertTrue(unknown.getMessage().contains("optionally kv,cv,notes"), unknown.getMessage());
    }

    @Test
    void emptyOrMissingFolderIsRejected() {
        InputException empty = assertThrows(InputException.class, () -> Catalog.withUserFolder(dir));
        assertTrue(empty.getMessage().contains("no catalog files found"), empty.getMessage());
        Path missing = dir.resolve("nowhere");
        InputException gone = assertThrows(InputException.class, () -> Catalog.withUserFolder(missing));
        assertEquals(missing + ": not a folder", gone.getMessage());
    }
}
