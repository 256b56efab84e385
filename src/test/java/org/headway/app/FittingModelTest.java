package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.headway.chart.FrictionChart;
import org.headway.fitting.FitComparison;
import org.headway.fitting.FitForm;
import org.headway.fitting.FitResult;
import org.headway.pipe.Catalog;
import org.headway.project.FittedCorrelationFile;
import org.headway.units.UnitSystem;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The fitting view-model, without the toolkit. */
class FittingModelTest {

    /**
     * Blasius (1913) smooth-pipe law f = 0.3164 Re^(−1/4), valid about 4000 ≤ Re ≤ 10⁵ (Blasius, H.,
     * Forschungsheft 131, VDI, 1913; the constants as every fluid-mechanics text quotes them, from
     * memory). Points taken exactly on it must give these parameters back.
     */
    static final double BLASIUS_COEFFICIENT = 0.3164;

    static final double BLASIUS_EXPONENT = -0.25;

    /** Exact data, so the fit should be exact to rounding; 1e-9 relative leaves room for the optimizer's tolerance. */
    static final double EXACT_DATA_TOLERANCE = 1e-9;

    @TempDir
    Path dir;

    private FakeDialogs dialogs;
    private ProjectEditor editor;
    private FittingModel model;

    @BeforeEach
    void setUp() throws Exception {
        dialogs = new FakeDialogs();
        editor = new ProjectEditor(Catalog.bundled(), dialogs, new RecentFiles(dir.resolve("recent.txt")));
        assertTrue(editor.openFile(Demo.copyTo(dir)));
        model = new FittingModel(editor, dialogs);
    }

    static Path blasiusCsv(Path dir) throws Exception {
        StringBuilder csv = new StringBuilder("# points on the Blasius law\nRe [-],f [-],T [degC]\n");
        for (int i = 0; i <= 12; i++) {
            double re = 4000 * Math.pow(25, i / 12.0);
            double f = BLASIUS_COEFFICIENT * Math.pow(re, BLASIUS_EXPONENT);
            csv.append(String.format(Locale.ROOT, "%.17g,%.17g,%d%n", re, f, 15 + i));
        }
        Path file = dir.resolve("blasius.csv");
        Files.writeString(file, csv, StandardCharsets.UTF_8);
        return file;
    }

    private FitComparison fit(FittingModel.FitJob job) {
        return model.runFits(job, (done, total, form) -> {}, () -> false);
    }

    @Test
    void importShowsColumnsWithUnitsAndGuessesFandRe() throws Exception {
        assertTrue(model.importCsv(blasiusCsv(dir)));
        assertEquals(List.of("Re [-]", "f [-]", "T [degC]"), model.columnLabels());
        assertEquals("f [-]", model.responseColumnProperty().get());
        assertEquals("Re [-]", model.explanatoryColumnProperty().get());
        assertEquals(13, model.tableProperty().get().rows());
    }

    @Test
    void aPowerLawFittedToBlasiusPointsGivesBlasiusBack() throws Exception {
        model.importCsv(blasiusCsv(dir));
        model.forms()
                .forEach(c -> c.chosenProperty()
                        .set(c.form() instanceof FitForm.Power p && !p.logSpace()
                                || c.form() instanceof FitForm.Linear));
        FittingModel.FitJob job = model.prepareFits();
        List<String> progress = new ArrayList<>();
        FitComparison result = model.runFits(job, (done, total, form) -> progress.add(done + "/" + total), () -> false);
        model.showFits(job, result);
        assertEquals(List.of("0/2", "1/2", "2/2"), progress);
        assertEquals(2, model.fits().size());
        FittingModel.FitRow best = model.fits().get(0);
        assertEquals("power", best.form(), "the exact law ranks first by AICc");
        assertEquals(best, model.selectedProperty().get());
        FitResult r = best.result();
        assertEquals(BLASIUS_COEFFICIENT, r.parameter("a").value(), BLASIUS_COEFFICIENT * EXACT_DATA_TOLERANCE);
        assertEquals(BLASIUS_EXPONENT, r.parameter("b").value(), Math.abs(BLASIUS_EXPONENT) * EXACT_DATA_TOLERANCE);
        assertTrue(
                best.parameters().startsWith("a = 0.316400   (0.31640 … 0.31640)\nb = -0.250000"), best.parameters());
        assertTrue(model.residualChartProperty().get() != null, "the chosen fit's residuals are plotted");
        assertTrue(model.fits().get(1).rank() == 2 && model.fits().get(1).form().equals("linear"));
    }

    @Test
    void aCancelledRunStopsBetweenFormsAndKeepsThePreviousFits() throws Exception {
        model.importCsv(blasiusCsv(dir));
        FittingModel.FitJob job = model.prepareFits();
        model.showFits(job, fit(job));
        int before = model.fits().size();
        int[] calls = {0};
        FitComparison cancelled = model.runFits(job, (d, t, f) -> {}, () -> ++calls[0] > 1);
        assertNull(cancelled, "cancelled after the first form");
        model.fitsCancelled();
        assertEquals(before, model.fits().size());
        assertTrue(model.statusProperty().get().contains("cancelled"));
    }

    @Test
    void aBadCellIsNamedByFileLineAndColumnAndThePreviousDataStay() throws Exception {
        model.importCsv(blasiusCsv(dir));
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "Re [-],f [-]\n5000,0.037\n6000,abc\n");
        assertFalse(model.importCsv(bad));
        assertEquals(
                "bad.csv line 3, column f: 'abc' is not a number",
                model.problemProperty().get());
        assertEquals(13, model.tableProperty().get().rows());
    }

    @Test
    void aLongImportReportsRowsAndStopsWhenCancelled() throws Exception {
        StringBuilder csv = new StringBuilder("Re [-],f [-]\n");
        for (int i = 0; i < 25_000; i++) {
            csv.append(5000 + i).append(",0.03\n");
        }
        Path big = Files.writeString(dir.resolve("big.csv"), csv);
        List<Integer> seen = new ArrayList<>();
        assertEquals(25_000, DataTable.read(big, () -> false, seen::add).rows());
        assertEquals(List.of(10_000, 20_000), seen);
        assertThrows(
                java.util.concurrent.CancellationException.class,
                () -> DataTable.read(big, () -> true, rows -> {}),
                "a cancel is seen at the first block of rows");
    }

    @Test
    void noFormTickedOrSameColumnTwiceIsExplained() throws Exception {
        model.importCsv(blasiusCsv(dir));
        model.explanatoryColumnProperty().set("f [-]");
        assertNull(model.prepareFits());
        assertTrue(model.problemProperty().get().contains("other than the response f"));
        model.explanatoryColumnProperty().set("Re [-]");
        model.forms().forEach(c -> c.chosenProperty().set(false));
        assertNull(model.prepareFits());
        assertEquals(
                "forms: tick at least one form to fit", model.problemProperty().get());
    }

    @Test
    void theSavedFitBecomesThePipeRunsFrictionMethodAndIsDrawnOnTheFrictionChart() throws Exception {
        model.importCsv(blasiusCsv(dir));
        FittingModel.FitJob job = model.prepareFits();
        model.showFits(job, fit(job));
        assertEquals(
                "fit: power (not saved)",
                model.frictionOverlay().fitted().get(0).name());
        assertEquals(13, model.frictionOverlay().rigPoints().size());
        Path target = Files.createDirectories(dir.resolve("fits")).resolve("blasius-fit.json");
        dialogs.files.add(target);
        assertTrue(
                model.chooseAndSave(),
                dialogs.errors + " " + model.problemProperty().get());
        assertEquals(
                model.selectedProperty().get().result().parameter("a").value(),
                FittedCorrelationFile.load(target).parameters().get(0).value());
        assertTrue(model.useInPipeRun(), model.problemProperty().get());
        assertEquals("fitted:fits/blasius-fit.json", editor.project().friction());
        assertTrue(editor.dirtyProperty().get());

        Recalculation.Outcome o = Recalculation.compute(
                editor.project(),
                UnitSystem.SI,
                editor.catalog(),
                editor.baseFolder(),
                "test",
                model.frictionOverlay());
        assertTrue(o.ok(), o.problem());
        List<String> series = seriesNames((XYPlot) o.friction().getPlot());
        assertTrue(series.contains("pipe run: blasius-fit.json"), series.toString());
        assertTrue(series.stream().noneMatch(n -> n.startsWith("fit: ")), "the run's fit is drawn once: " + series);
        assertTrue(series.contains("rig data"), series.toString());
    }

    @Test
    void aFitThatCannotBeSavedLeavesThePreviousFileAndSaysWhy() throws Exception {
        model.importCsv(blasiusCsv(dir));
        FittingModel.FitJob job = model.prepareFits();
        model.showFits(job, fit(job));
        Path blocker = dir.resolve("not-a-folder");
        Files.writeString(blocker, "a file where a folder is expected");
        assertFalse(model.saveSelected(blocker.resolve("fit.json")));
        assertEquals(1, dialogs.errors.size());
        assertTrue(dialogs.errors.get(0).startsWith("Could not save fit.json: could not write"), dialogs.errors.get(0));
        assertTrue(dialogs.errors.get(0).endsWith("Not a directory"), dialogs.errors.get(0));
        assertEquals("a file where a folder is expected", Files.readString(blocker));
        assertNull(model.savedFitProperty().get());
    }

    @Test
    void pointsFromSeveralViewsShareTheFrictionChart() {
        FrictionOverlay fitting = new FrictionOverlay(List.of(new FrictionChart.RigPoint(1e4, 0.031, 0, 0)), List.of());
        FrictionOverlay rig =
                new FrictionOverlay(List.of(new FrictionChart.RigPoint(2e4, 0.027, 400, 0.0008)), List.of());
        ResultsModel results = new ResultsModel(editor, Recalculator.immediate(), "test");
        results.setFrictionOverlay("fitting", fitting);
        results.setFrictionOverlay("rig", rig);
        assertEquals(2, results.frictionOverlay().rigPoints().size());
        assertTrue(seriesNames((XYPlot) results.frictionChartProperty().get().getPlot())
                .contains("rig data (±U)"));
        results.setFrictionOverlay("fitting", FrictionOverlay.NONE);
        assertEquals(rig.rigPoints(), results.frictionOverlay().rigPoints());
        // A laminar point above the usual top of the chart (f = 0.11) widens the f axis to hold it and its bar.
        results.setFrictionOverlay(
                "rig", new FrictionOverlay(List.of(new FrictionChart.RigPoint(700, 0.12, 10, 0.02)), List.of()));
        XYPlot plot = (XYPlot) results.frictionChartProperty().get().getPlot();
        assertTrue(
                plot.getRangeAxis().getUpperBound() >= 0.14,
                "top " + plot.getRangeAxis().getUpperBound());
    }

    @Test
    void fittedReferencesAreRelativeToTheProjectFolder() {
        Path project = Path.of("/work/projects/a");
        assertEquals("fits/x.json", FittingModel.fittedReference(project, project.resolve("fits/x.json")));
        assertEquals("../b/x.json", FittingModel.fittedReference(project, Path.of("/work/projects/b/x.json")));
        assertEquals("/tmp/x.json", FittingModel.fittedReference(null, Path.of("/tmp/x.json")));
    }

    private static List<String> seriesNames(XYPlot plot) {
        List<String> names = new ArrayList<>();
        for (int d = 0; d < plot.getDatasetCount(); d++) {
            XYDataset ds = plot.getDataset(d);
            for (int s = 0; ds != null && s < ds.getSeriesCount(); s++) {
                names.add(String.valueOf(ds.getSeriesKey(s)));
            }
        }
        return names;
    }
}
