package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.system.DiameterChange;
import org.headway.system.HeadLossCalculator;
import org.headway.system.PipeRun;
import org.headway.system.RunResult;
import org.junit.jupiter.api.Test;

/**
 * A reducer or enlarger between two catalog pipe sizes in a project file, its bores left to the pipes
 * either side, and its loss against the published formulas (each named beside its check).
 */
class ReducerBetweenPipesTest {

    /** Standard acceleration of gravity, 9.80665 m/s² (3rd CGPM, 1901). */
    private static final double G = 9.80665;
    /** The flow of the invented runs below (m³/s). */
    private static final double FLOW = 0.006;

    private static String project(String reducerFields) {
        return """
                {"format": "headway-project", "version": 2,
                 "title": "Invented run: PE DN110 to DN90 and back",
                 "fluid": {"name": "water", "temperature": "15 degC"},
                 "flow": "6 L/s",
                 "elements": [
                  {"id": "main", "length": "50 m", "pipe": {"material": "hdpe", "size": "DN110", "schedule": "SDR11"}},
                  {"id": "down", "kind": "reducer"%s},
                  {"id": "tail", "length": "20 m", "pipe": {"material": "hdpe", "size": "DN90", "schedule": "SDR11"}},
                  {"id": "up", "kind": "reducer"},
                  {"id": "last", "length": "5 m", "pipe": {"material": "hdpe", "size": "DN110", "schedule": "SDR11"}}
                 ]}
                """.formatted(reducerFields);
    }

    private static PipeRun run(String json) {
        return ProjectResolver.resolve(ProjectFile.parse(json), Catalog.bundled(), Path.of("."))
                .run();
    }

    private static double area(double d) {
        return Math.PI * d * d / 4;
    }

    @Test
    void boresComeFromTheCatalogPipesEitherSide() {
        PipeRun run = run(project(""));
        DiameterChange down = (DiameterChange) run.element("down").orElseThrow();
        DiameterChange up = (DiameterChange) run.element("up").orElseThrow();
        // ISO 4427-2 via the catalog: DN110 SDR 11 bore 110 − 2·10.0 = 90.0 mm, DN90 SDR 11 90 − 2·8.2 = 73.6 mm
        assertEquals(0.0900, down.inletDiameter(), 1e-12);
        assertEquals(0.0736, down.outletDiameter(), 1e-12);
        assertEquals(0.0736, up.inletDiameter(), 1e-12);
        assertEquals(0.0900, up.outletDiameter(), 1e-12);
        assertEquals(5, run.elements().size());
        assertEquals("tail", run.elements().get(2).id());
    }

    @Test
    void suddenContractionAndExpansionLosses() {
        PipeRun run = run(project(""));
        double large = 0.0900;
        double small = 0.0736;
        double beta2 = (small / large) * (small / large);
        double vSmall = FLOW / area(small);
        double vLarge = FLOW / area(large);
        // Crane TP-410 (1988) p. A-26, sudden contraction K = 0.5 (1 − β²) on the small-pipe velocity (from memory)
        double contraction = 0.5 * (1 - beta2) * vSmall * vSmall / (2 * G);
        // Borda–Carnot: a sudden enlargement loses (V₁ − V₂)²/(2g) (momentum balance, uniform velocity)
        double expansion = (vSmall - vLarge) * (vSmall - vLarge) / (2 * G);
        RunResult result = HeadLossCalculator.solve(run, FLOW);
        assertEquals(contraction, headLoss(result, "down"), 1e-12);
        assertEquals(expansion, headLoss(result, "up"), 1e-12);
    }

    private static double headLoss(RunResult result, String id) {
        return result.element(id).orElseThrow().result().headLoss();
    }

    @Test
    void gradualContractionWithTheConeAngle() {
        PipeRun run = run(project(", \"includedAngleDegrees\": \"30\""));
        double beta2 = (0.0736 / 0.0900) * (0.0736 / 0.0900);
        double vSmall = FLOW / area(0.0736);
        // Crane TP-410 (1988) p. A-26, gradual contraction θ ≤ 45°: K = 0.8 sin(θ/2)(1 − β²) (from memory)
        double k = 0.8 * Math.sin(Math.toRadians(15)) * (1 - beta2);
        DiameterChange down = (DiameterChange) run.element("down").orElseThrow();
        assertEquals(k * vSmall * vSmall / (2 * G), down.headLoss(FLOW, run.context()), 1e-12);
    }

    @Test
    void aGivenBoreWinsOverTheNeighbour() {
        PipeRun run = run(project(", \"outletDiameter\": \"80 mm\""));
        DiameterChange down = (DiameterChange) run.element("down").orElseThrow();
        assertEquals(0.0900, down.inletDiameter(), 1e-12);
        assertEquals(0.080, down.outletDiameter(), 1e-12);
    }

    @Test
    void aReducerWithNoPipeBeforeItIsRefusedWithItsPlace() {
        String json = """
                {"format": "headway-project", "version": 2, "title": "Invented",
                 "fluid": {"name": "water", "temperature": "15 degC"}, "flow": "6 L/s",
                 "elements": [
                  {"id": "first", "kind": "reducer"},
                  {"id": "main", "length": "50 m", "pipe": {"material": "hdpe", "size": "DN110", "schedule": "SDR11"}}
                 ]}
                """;
        InputException e = assertThrows(InputException.class, () -> run(json));
        assertTrue(e.getMessage().contains("elements[0] (first)"), e.getMessage());
        assertTrue(e.getMessage().contains("inletDiameter"), e.getMessage());
        assertTrue(e.getMessage().contains("no pipe comes before the reducer"), e.getMessage());
    }

    private static String pipeFittingProject(String fitting, String firstSize, String secondSize) {
        return """
                {"format": "headway-project", "version": 2,
                 "title": "Invented run: a bore change written as the pipe's fitting",
                 "fluid": {"name": "water", "temperature": "15 degC"},
                 "flow": "6 L/s",
                 "elements": [
                  {"id": "main", "length": "50 m", "pipe": {"material": "hdpe", "size": "%s", "schedule": "SDR11"},
                   "fittings": [%s]},
                  {"id": "tail", "length": "20 m", "pipe": {"material": "hdpe", "size": "%s", "schedule": "SDR11"}}
                 ]}
                """.formatted(firstSize, fitting, secondSize);
    }

    @Test
    void boreChangeFittingIsTheSuddenContractionOnThePipesVelocity() {
        PipeRun run =
                run(pipeFittingProject("{\"kind\": \"bore-change\", \"toDiameter\": \"73.6 mm\"}", "DN110", "DN90"));
        double beta2 = (0.0736 / 0.0900) * (0.0736 / 0.0900);
        double vSmall = FLOW / area(0.0736);
        // Crane TP-410 (1988) p. A-26, sudden contraction K = 0.5 (1 − β²) on the small-pipe velocity (from memory)
        double expected = 0.5 * (1 - beta2) * vSmall * vSmall / (2 * G);
        RunResult result = HeadLossCalculator.solve(run, FLOW);
        assertEquals(expected, result.segment("main").orElseThrow().minorHeadLoss(), 1e-12);
        // and the same as the reducer element between the same two pipes
        assertEquals(
                headLoss(HeadLossCalculator.solve(run(project("")), FLOW), "down"),
                result.segment("main").orElseThrow().minorHeadLoss(),
                1e-12);
    }

    @Test
    void boreChangeFittingIsTheBordaCarnotEnlargement() {
        PipeRun run = run(pipeFittingProject(
                "{\"kind\": \"bore-change\", \"toDiameter\": \"90 mm\", \"includedAngleDegrees\": \"180\"}",
                "DN90",
                "DN110"));
        double vSmall = FLOW / area(0.0736);
        double vLarge = FLOW / area(0.0900);
        // Borda–Carnot: a sudden enlargement loses (V₁ − V₂)²/(2g)
        double expected = (vSmall - vLarge) * (vSmall - vLarge) / (2 * G);
        assertEquals(
                expected,
                HeadLossCalculator.solve(run, FLOW)
                        .segment("main")
                        .orElseThrow()
                        .minorHeadLoss(),
                1e-12);
    }

    @Test
    void boreChangeFittingIsSavedWithItsKeys() {
        Project p = ProjectFile.parse(pipeFittingProject(
                "{\"kind\": \"bore-change\", \"toDiameter\": \"73.6 mm\", \"includedAngleDegrees\": \"30\"}",
                "DN110",
                "DN90"));
        String json = ProjectFile.toJson(p);
        assertTrue(json.contains("\"toDiameter\" : \"73.6 mm\""), json);
        assertTrue(json.contains("\"includedAngleDegrees\" : \"30\""), json);
        assertEquals(p, ProjectFile.parse(json));
    }

    @Test
    void boreChangeFittingWithoutItsBoreIsRefusedWithItsPlace() {
        InputException e = assertThrows(
                InputException.class, () -> run(pipeFittingProject("{\"kind\": \"bore-change\"}", "DN110", "DN90")));
        assertTrue(e.getMessage().contains("fittings[0].toDiameter"), e.getMessage());
        InputException other = assertThrows(
                InputException.class,
                () -> run(pipeFittingProject(
                        "{\"kind\": \"elbow-90-standard\", \"toDiameter\": \"73.6 mm\"}", "DN110", "DN90")));
        assertTrue(other.getMessage().contains("only a bore-change fitting takes a bore"), other.getMessage());
    }
}
