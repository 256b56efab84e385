package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.headway.pipe.Catalog;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.system.FlowSolver;
import org.headway.system.HeadLossCalculator;
import org.headway.system.RunResult;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** `headway solve`, `sheet` and `demo` driven as a user would, output checked against the engine. */
class PipeRunCommandsTest {

    @TempDir
    Path dir;

    private Path project;
    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @BeforeEach
    void writeDemoProject() throws Exception {
        project = dir.resolve("demo.json");
        Files.writeString(project, DemoCommand.resource(DemoCommand.DEMO_PROJECT));
    }

    private int run(String... args) {
        CommandLine cl = HeadwayCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void solveJsonHasTheDocumentedKeysAndTheEngineValues() throws Exception {
        assertEquals(0, run("solve", project.toString(), "--format", "json"), err::toString);
        JsonNode json = new ObjectMapper().readTree(out.toString());
        RunResult r = HeadLossCalculator.solve(
                ProjectResolver.resolve(ProjectFile.load(project), Catalog.bundled(), dir)
                        .run(),
                0.009);
        JsonNode seg = json.get("segments").get(2);
        for (String key : new String[] {
            "velocity_m_per_s", "reynolds", "friction_factor", "major_head_loss_m", "minor_head_loss_m"
        }) {
            assertTrue(seg.has(key), key);
        }
        assertEquals(
                r.segments().get(2).majorHeadLoss(),
                seg.get("major_head_loss_m").asDouble(),
                0);
        JsonNode totals = json.get("totals");
        assertEquals(
                r.totals().frictionHeadLoss(),
                totals.get("friction_head_loss_m").asDouble(),
                0);
        assertEquals(r.totals().minorHeadLoss(), totals.get("minor_head_loss_m").asDouble(), 0);
        assertEquals(r.totals().totalHead(), totals.get("total_head_m").asDouble(), 0);
        assertEquals(r.totals().pressureDrop(), totals.get("pressure_drop_pa").asDouble(), 0);
        assertTrue(json.get("cautions").size() >= 1);
    }

    @Test
    void solveFlowModeReturnsTheFlowForTheGivenHead() throws Exception {
        var run = ProjectResolver.resolve(ProjectFile.load(project), Catalog.bundled(), dir)
                .run();
        double head = HeadLossCalculator.totalHead(run, 0.008);
        assertEquals(
                0,
                run("solve", project.toString(), "--mode", "flow", "--available-head", head + " m", "--format", "json"),
                err::toString);
        JsonNode json = new ObjectMapper().readTree(out.toString());
        assertEquals(0.008, json.get("flow_m3_per_s").asDouble(), 0.008 * 1e-9);
        assertEquals(FlowSolver.Outcome.FLOWING, FlowSolver.solve(run, head).outcome());
    }

    @Test
    void flowModeWithNoForwardFlowHasItsOwnExitStatus() throws Exception {
        var run = ProjectResolver.resolve(ProjectFile.load(project), Catalog.bundled(), dir)
                .run();
        // Less head than the static lift at zero flow: nothing can flow forward (energy balance).
        double head = HeadLossCalculator.totalHead(run, 0.0) - 5;
        assertEquals(
                HeadwayCommand.EXIT_NO_FLOW,
                run("solve", project.toString(), "--mode", "flow", "--available-head", head + " m", "--format", "json"),
                err::toString);
        JsonNode json = new ObjectMapper().readTree(out.toString());
        assertEquals(0, json.get("flow_m3_per_s").asDouble(), 0);
        assertEquals(FlowSolver.Outcome.REVERSE, FlowSolver.solve(run, head).outcome());
    }

    @Test
    void solveSizeModeListsCandidates() {
        assertEquals(0, run("solve", project.toString(), "--mode", "size"), err::toString);
        String text = out.toString();
        assertTrue(text.contains("smallest size meeting the limits"), text);
        assertTrue(text.contains("rejected: velocity"), text);
    }

    @Test
    void solveTextShowsCurveAndCautions() {
        assertEquals(0, run("solve", project.toString(), "--curve", "0 L/s:12 L/s:4", "--units", "us"), err::toString);
        String text = out.toString();
        assertTrue(text.contains("System curve:"));
        assertTrue(text.contains("gpm"));
        assertTrue(text.contains("licensed or otherwise qualified engineer"));
    }

    /**
     * CSV keeps the segment table as it was and adds the curve after a blank line, as the network
     * command does with its two tables. Flows are evenly spaced from 0 to 12 L/s (4 points: 0, 4, 8,
     * 12 L/s, computed here); each head agrees with a head-loss solve at that flow.
     */
    @Test
    void solveCsvIncludesTheCurve() throws Exception {
        assertEquals(
                0, run("solve", project.toString(), "--format", "csv", "--curve", "0 L/s:12 L/s:4"), err::toString);
        String[] tables = out.toString().split("\n\n");
        assertEquals(2, tables.length, out.toString());
        assertTrue(tables[0].startsWith(String.join(",", org.headway.report.CsvSheetWriter.HEADER)), tables[0]);
        java.util.List<String> curve = tables[1].strip().lines().toList();
        assertEquals("flow [m3/s],total_head [m],head_loss [m]", curve.get(0));
        assertEquals(5, curve.size(), tables[1]);
        var run = ProjectResolver.resolve(ProjectFile.load(project), Catalog.bundled(), dir)
                .run();
        for (int i = 1; i <= 4; i++) {
            String[] cells = curve.get(i).split(",");
            double q = 0.004 * (i - 1);
            assertEquals(q, Double.parseDouble(cells[0]), 1e-15);
            if (q > 0) {
                assertEquals(
                        HeadLossCalculator.solve(run, q).totals().totalHead(),
                        Double.parseDouble(cells[1]),
                        1e-9 * Math.abs(Double.parseDouble(cells[1])));
            }
        }
    }

    @Test
    void curveWithBareNumbersIsRefused() {
        assertEquals(2, run("solve", project.toString(), "--curve", "0:6:4"));
        String e = err.toString().strip();
        assertTrue(e.startsWith("headway: --curve QMAX:"), e);
        assertTrue(e.contains("\"6\" has no unit"), e);
    }

    /** Energy balance: a total head below zero is head the ends give beyond the losses. */
    @Test
    void negativeTotalHeadIsCalledSurplusHead() throws Exception {
        Path gravity = Path.of("fluids-data", "examples", "gravity-spring-line.json");
        assertEquals(0, run("solve", gravity.toString()), err::toString);
        double h = ProjectResolver.resolve(ProjectFile.load(gravity), Catalog.bundled(), gravity.getParent())
                .run()
                .designFlow();
        var run = ProjectResolver.resolve(ProjectFile.load(gravity), Catalog.bundled(), gravity.getParent())
                .run();
        double total = HeadLossCalculator.solve(run, h).totals().totalHead();
        assertTrue(total < 0, "the example must be a surplus case");
        String surplus = org.headway.units.Quantities.format(
                -total, org.headway.units.QuantityKind.HEAD, org.headway.units.UnitSystem.SI);
        assertTrue(out.toString().contains("(surplus head " + surplus), out.toString());
    }

    /** In US output no SI unit is left in the result line, element laws or cautions. */
    @Test
    void usOutputCarriesNoSiUnits() throws Exception {
        Path gravity = Path.of("fluids-data", "examples", "gravity-spring-line.json");
        assertEquals(0, run("solve", gravity.toString(), "--mode", "flow", "--units", "us"), err::toString);
        assertEquals(0, run("solve", project.toString(), "--units", "us"), err::toString);
        java.util.regex.Pattern si = java.util.regex.Pattern.compile("\\d (m³/s|L/s|m/s|kPa|mm|m)(?![\\w²³/])");
        for (String line : out.toString().lines().toList()) {
            if (line.startsWith("Result:") || line.startsWith("  [") || line.contains("supplies the")) {
                assertTrue(!si.matcher(line).find(), line);
            }
        }
        assertTrue(out.toString().contains("Result: "), out.toString());
    }

    /**
     * Rises of 0.1 m and 0.2 m against a source 0.3 m up: the static head is exactly 0 (arithmetic),
     * but 0.1 + 0.2 − 0.3 is 5.55e-17 in binary; the display must show 0, not the noise.
     */
    @Test
    void roundingNoiseIsShownAsZero() throws Exception {
        Path p = dir.resolve("noise.json");
        Files.writeString(p, """
                { "format": "headway-project", "version": 2, "title": "invented noise check",
                  "fluid": { "name": "water", "temperature": "17.3 degC" }, "flow": "3.7 L/s",
                  "elements": [
                    { "id": "a", "length": "37.1 m", "innerDiameter": "52.5 mm", "roughness": "0.045 mm", "elevationChange": "0.1 m" },
                    { "id": "b", "length": "12.9 m", "innerDiameter": "40.9 mm", "roughness": "0.045 mm", "elevationChange": "0.2 m" } ],
                  "ends": { "source": { "level": "0.3 m" }, "delivery": { "level": "0 m" } } }
                """);
        assertEquals(0, run("solve", p.toString()), err::toString);
        assertTrue(out.toString().contains("Static head:      0 m\n"), out.toString());
    }

    @Test
    void badProjectExitsTwoWithOneLine() throws Exception {
        Files.writeString(project, Files.readString(project).replace("\"6 m\"", "\"-6 m\""));
        assertEquals(2, run("solve", project.toString()));
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
        assertTrue(err.toString().contains("segments[0].length"), err.toString());
    }

    @Test
    void sheetWritesFilesAndRefusesToOverwrite() throws Exception {
        Path pdf = dir.resolve("out/sheet.pdf");
        assertEquals(
                0, run("sheet", project.toString(), "--out", pdf.toString(), "--workbook", "--csv"), err::toString);
        assertTrue(Files.size(pdf) > 10_000);
        assertTrue(Files.exists(dir.resolve("out/sheet.xlsx")));
        assertTrue(Files.exists(dir.resolve("out/sheet.csv")));
        long before = Files.getLastModifiedTime(pdf).toMillis();
        assertEquals(2, run("sheet", project.toString(), "--out", pdf.toString()));
        assertTrue(err.toString().contains("--force"), err.toString());
        assertEquals(before, Files.getLastModifiedTime(pdf).toMillis());
        assertEquals(0, run("sheet", project.toString(), "--out", pdf.toString(), "--force"), err::toString);
    }

    @Test
    void demoRunsTheWholeJob() throws Exception {
        Path reports = dir.resolve("reports");
        assertEquals(0, run("demo", "--reports", reports.toString()), err::toString);
        assertTrue(out.toString().contains("Total head"));
        assertTrue(Files.size(reports.resolve("demo-orchard-booster.pdf")) > 10_000);
        assertTrue(Files.exists(reports.resolve("demo-orchard-booster.xlsx")));
        assertTrue(Files.exists(reports.resolve("demo-orchard-booster.csv")));
        // The village main's network sheet, with its cases and a fire flow in the text.
        assertTrue(Files.size(reports.resolve("demo-hillcrest-main.pdf")) > 10_000);
        assertTrue(Files.exists(reports.resolve("demo-hillcrest-main.xlsx")));
        assertTrue(out.toString().contains("Demand cases:"));
        assertTrue(out.toString().contains("fire flow"));
    }
}
