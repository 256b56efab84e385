package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.headway.caution.Caution;
import org.headway.pipe.Catalog;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.system.HeadLossCalculator;
import org.headway.system.PipeRun;
import org.headway.system.RunResult;
import org.headway.system.SegmentResult;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The results view-model, run synchronously without the toolkit. */
class ResultsModelTest {

    @TempDir
    Path dir;

    private ProjectEditor editor;
    private ResultsModel results;
    private Path demo;

    @BeforeEach
    void openDemo() throws Exception {
        editor = new ProjectEditor(Catalog.bundled(), new FakeDialogs(), new RecentFiles(dir.resolve("recent.txt")));
        demo = Demo.copyTo(dir);
        editor.openFile(demo);
        results = new ResultsModel(editor, Recalculator.immediate(), "test");
    }

    /** The engine's own answer for a project file, as the reference the view-model must show. */
    private static RunResult engine(Path file, String segment2Length) {
        var project = ProjectFile.load(file);
        if (segment2Length != null) {
            var segments = new ArrayList<>(project.segments());
            var s = segments.get(2);
            segments.set(
                    2,
                    new org.headway.project.Project.SegmentSpec(
                            s.name(),
                            segment2Length,
                            s.pipe(),
                            s.innerDiameter(),
                            s.roughness(),
                            s.fittings(),
                            s.lossCoefficient(),
                            s.elevationChange()));
            project = org.headway.project.Project.of(
                    project.title(),
                    project.titleBlock(),
                    project.fluid(),
                    project.flow(),
                    project.flowUncertainty(),
                    project.friction(),
                    segments,
                    project.ends(),
                    project.pump(),
                    project.limits(),
                    project.sizing(),
                    project.curve());
        }
        PipeRun run = ProjectResolver.resolve(project, Catalog.bundled(), file.getParent())
                .run();
        return HeadLossCalculator.solve(run, run.designFlow());
    }

    @Test
    void totalsAreTheEnginesValues() {
        RunResult expected = engine(demo, null);
        assertEquals(
                Quantities.format(expected.totals().headLoss(), QuantityKind.HEAD, UnitSystem.SI),
                results.total("Total head loss"));
        assertEquals(
                Quantities.format(expected.totals().totalHead(), QuantityKind.HEAD, UnitSystem.SI),
                results.total("Head required"));
        assertEquals(4, results.rows().size());
        assertEquals(
                Quantities.format(expected.segments().get(2).velocity(), QuantityKind.VELOCITY, UnitSystem.SI),
                results.rows().get(2).velocity());
        assertEquals("turbulent", results.rows().get(2).regime());
    }

    /**
     * A gravity line whose ends give more head than it loses has a negative total head; the app
     * calls it a surplus (energy balance: H = static + losses, negative when the fall exceeds them).
     */
    @Test
    void aNegativeTotalHeadIsShownAsSurplusHead() throws Exception {
        Path gravity = dir.resolve("gravity.json");
        java.nio.file.Files.copy(Path.of("fluids-data", "examples", "gravity-spring-line.json"), gravity);
        editor.openFile(gravity);
        RunResult expected = engine(gravity, null);
        assertTrue(expected.totals().totalHead() < 0, "the example must be a surplus case");
        assertEquals("", results.total("Head required"));
        assertEquals(
                Quantities.format(-expected.totals().totalHead(), QuantityKind.HEAD, UnitSystem.SI),
                results.total("Surplus head"));
    }

    @Test
    void aLengthEditRecomputesTheTotals() {
        String before = results.total("Total head loss");
        assertTrue(editor.setSegmentField(2, SegmentField.LENGTH, "600 m"));
        RunResult expected = engine(demo, "600 m");
        String after = results.total("Total head loss");
        assertNotEquals(before, after);
        assertEquals(Quantities.format(expected.totals().headLoss(), QuantityKind.HEAD, UnitSystem.SI), after);
    }

    @Test
    void unitSwitchReformatsWithoutChangingTheValue() {
        RunResult expected = engine(demo, null);
        editor.unitSystemProperty().set(UnitSystem.US_CUSTOMARY);
        String ft = results.total("Total head loss");
        assertTrue(ft.endsWith(" ft"), ft);
        assertEquals(Quantities.format(expected.totals().headLoss(), QuantityKind.HEAD, UnitSystem.US_CUSTOMARY), ft);
    }

    @Test
    void aProjectThatDoesNotResolveShowsTheProblemAndKeepsTheLastResults() {
        String before = results.total("Total head loss");
        // A roughness larger than the bore passes the field check but not the resolver's.
        assertTrue(editor.setSegmentField(0, SegmentField.ROUGHNESS, "200 mm"));
        assertTrue(
                results.problemProperty().get().contains("segments[0].roughness"),
                results.problemProperty().get());
        assertEquals(before, results.total("Total head loss"));
        editor.undo();
        assertEquals("", results.problemProperty().get());
    }

    @Test
    void cautionsEndWithTheDesignReviewNoteAndNameTheirSegment() {
        var cautions = results.cautions();
        assertFalse(cautions.isEmpty());
        assertEquals(
                Caution.GENERAL_REVIEW.message(),
                cautions.get(cautions.size() - 1).message());
        for (var c : cautions) {
            if (c.segmentIndex() >= 0) {
                String name = editor.project().segments().get(c.segmentIndex()).name();
                assertTrue(c.message().startsWith(name + ":"), c.message());
            }
        }
    }

    @Test
    void chartsAreBuiltWithTheResults() {
        assertNotNull(results.frictionChartProperty().get());
        assertNotNull(results.systemChartProperty().get());
        assertEquals(
                "Pump operating point",
                results.totals().stream()
                        .filter(t -> t.label().startsWith("Pump"))
                        .findFirst()
                        .orElseThrow()
                        .label());
        // The grade chart must draw the engine's grade lines: along the length typed in the project
        // file (read here independently of the view-model), each pipe's energy grade falling by
        // exactly its head loss (major + minor) as the engine computes it.
        JFreeChart grade = results.gradeChartProperty().get();
        XYSeriesCollection data = (XYSeriesCollection) grade.getXYPlot().getDataset();
        XYSeries egl = data.getSeries("energy grade line");
        RunResult reference = engine(demo, null);
        List<SegmentResult> pipes = reference.segments();
        assertEquals(2 * pipes.size(), egl.getItemCount());
        double typedLength = 0;
        for (var spec : ProjectFile.load(demo).segments()) {
            typedLength += Quantities.parse(spec.length(), QuantityKind.LENGTH);
        }
        double drawnLength = egl.getX(egl.getItemCount() - 1).doubleValue();
        assertEquals(typedLength, drawnLength, 1e-9 * typedLength, "SI display draws metres");
        for (int i = 0; i < pipes.size(); i++) {
            double drop = egl.getY(2 * i).doubleValue() - egl.getY(2 * i + 1).doubleValue();
            double loss = pipes.get(i).majorHeadLoss() + pipes.get(i).minorHeadLoss();
            assertEquals(loss, drop, 1e-9 * Math.max(1, loss), pipes.get(i).id());
        }
    }

    @Test
    void onlyTheNewestRequestIsShown() {
        // A recalculator that holds requests back, as the desktop one does while typing goes on.
        List<Supplier<Recalculation.Outcome>> works = new ArrayList<>();
        List<Consumer<Recalculation.Outcome>> dones = new ArrayList<>();
        Recalculator held = (work, done) -> {
            works.add(work);
            dones.add(done);
        };
        ResultsModel late = new ResultsModel(editor, held, "test");
        editor.setSegmentField(2, SegmentField.LENGTH, "500 m");
        editor.setSegmentField(2, SegmentField.LENGTH, "700 m");
        assertEquals(3, works.size());
        dones.get(2).accept(works.get(2).get());
        RunResult expected = engine(demo, "700 m");
        assertEquals(
                Quantities.format(expected.totals().headLoss(), QuantityKind.HEAD, UnitSystem.SI),
                late.total("Total head loss"));
    }
}
