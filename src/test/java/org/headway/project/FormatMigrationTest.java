package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.system.HeadLossCalculator;
import org.headway.system.PipeRun;
import org.headway.system.RunResult;
import org.headway.system.SegmentResult;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Format-1 projects load, migrate to format 2 and solve to the same numbers as the format-2 files
 * they were re-saved as. Reference: the format-1 copies under src/test/resources (see their
 * SOURCE.md) as Headway 1 wrote them; the comparison is between two readings of the same run, so
 * the numbers must agree exactly, not within a tolerance.
 */
class FormatMigrationTest {

    private static final Path FORMAT1 = Path.of("src/test/resources/org/headway/project/format1");
    private static final Path EXAMPLES = Path.of("fluids-data/examples");

    private static RunResult solve(Path file) {
        PipeRun run = ProjectResolver.resolve(ProjectFile.load(file), Catalog.bundled(), file.getParent())
                .run();
        return HeadLossCalculator.solve(run, run.designFlow());
    }

    @ParameterizedTest
    @ValueSource(strings = {"demo-orchard-booster", "gravity-spring-line", "size-chilled-water-riser"})
    void formatOneAndItsFormatTwoCopyGiveTheSameLosses(String name) throws Exception {
        Path old = FORMAT1.resolve(name + ".json");
        assertTrue(Files.readString(old).contains("\"version\": 1"), "fixture must stay format 1");
        RunResult before = solve(old);
        RunResult after = solve(EXAMPLES.resolve(name + ".json"));
        assertEquals(before.segments().size(), after.segments().size());
        for (int i = 0; i < before.segments().size(); i++) {
            SegmentResult a = before.segments().get(i);
            SegmentResult b = after.segments().get(i);
            assertEquals(a.name(), b.name());
            assertEquals(a.velocity(), b.velocity(), 0.0, a.name());
            assertEquals(a.reynolds(), b.reynolds(), 0.0, a.name());
            assertEquals(a.frictionFactor(), b.frictionFactor(), 0.0, a.name());
            assertEquals(a.majorHeadLoss(), b.majorHeadLoss(), 0.0, a.name());
            assertEquals(a.minorHeadLoss(), b.minorHeadLoss(), 0.0, a.name());
        }
        assertEquals(before.totals().frictionHeadLoss(), after.totals().frictionHeadLoss(), 0.0);
        assertEquals(before.totals().minorHeadLoss(), after.totals().minorHeadLoss(), 0.0);
        assertEquals(before.elements().size(), after.elements().size());
    }

    @ParameterizedTest
    @ValueSource(strings = {"demo-orchard-booster", "gravity-spring-line", "size-chilled-water-riser"})
    void savingMigratesToFormatTwoAndReloadsEqual(String name, @TempDir Path dir) throws Exception {
        Project loaded = ProjectFile.load(FORMAT1.resolve(name + ".json"));
        Path saved = dir.resolve(name + ".json");
        ProjectFile.save(loaded, saved);
        String text = Files.readString(saved);
        assertTrue(text.contains("\"version\" : 2"), text.substring(0, Math.min(200, text.length())));
        assertTrue(text.contains("\"elements\""));
        assertEquals(loaded, ProjectFile.load(saved));
    }

    @org.junit.jupiter.api.Test
    void theFormatOnePumpBecomesAnElementBeforeTheSegmentAtItsPosition() {
        Project p = ProjectFile.load(FORMAT1.resolve("demo-orchard-booster.json"));
        // The format-1 file puts the pump at position 1: after the first segment.
        List<String> kinds =
                p.elements().stream().map(Project.ElementSpec::kind).toList();
        assertEquals(List.of("pipe", "pump", "pipe", "pipe", "pipe"), kinds);
        assertEquals(1, p.pump().orElseThrow().position());
    }

    @org.junit.jupiter.api.Test
    void aFileFromANewerFormatIsRefusedWithAClearMessage() {
        String json = "{\"format\": \"headway-project\", \"version\": 3, \"fluid\": {\"name\": \"water\"},"
                + " \"flow\": \"1 L/s\", \"elements\": []}";
        InputException e = assertThrows(InputException.class, () -> ProjectFile.parse(json));
        assertTrue(e.getMessage().contains("newer Headway"), e.getMessage());
        assertTrue(e.getMessage().contains("version 3"), e.getMessage());
    }

    @org.junit.jupiter.api.Test
    void formatTwoDevicesResolveAndDuplicateIdsAreRefused() {
        String devices = "{\"format\": \"headway-project\", \"version\": 2, \"fluid\": {\"name\": \"water\","
                + " \"temperature\": \"15 degC\"}, \"flow\": \"6 L/s\", \"elements\": ["
                + "{\"id\": \"p1\", \"length\": \"20 m\", \"innerDiameter\": \"80 mm\", \"roughness\": \"0.05 mm\"},"
                + "{\"id\": \"coil\", \"kind\": \"component\", \"ratedPressureDrop\": \"40 kPa\","
                + " \"ratedFlow\": \"6 L/s\"},"
                + "{\"id\": \"cv\", \"kind\": \"valve\", \"kv\": \"40\"},"
                + "{\"id\": \"p2\", \"length\": \"20 m\", \"innerDiameter\": \"80 mm\", \"roughness\": \"0.05 mm\"}]}";
        PipeRun run = ProjectResolver.resolve(ProjectFile.parse(devices), Catalog.bundled(), Path.of("."))
                .run();
        RunResult r = HeadLossCalculator.solve(run, run.designFlow());
        double rho = run.fluid().density();
        // The rated component loses its rated 40 kPa at its rated flow, whatever the pipe size (common practice).
        assertEquals(
                40_000.0 / (rho * 9.80665),
                r.element("coil").orElseThrow().result().headLoss(),
                1e-9);
        // Kv 40 at 21.6 m³/h: Δp = (ρ/1000)(21.6/40)² bar (IEC 60534-2-1).
        double dp = rho / 1000 * Math.pow(21.6 / 40, 2) * 1e5;
        assertEquals(dp, r.element("cv").orElseThrow().result().pressureDrop(), dp * 1e-12);
        String twice = devices.replace("\"id\": \"p2\"", "\"id\": \"p1\"");
        InputException e = assertThrows(InputException.class, () -> ProjectFile.parse(twice));
        assertTrue(e.getMessage().contains("elements[3].id"), e.getMessage());
    }
}
