package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.stage.Stage;
import org.headway.cli.HeadwayCommand;
import org.headway.fitting.FitResult;
import org.headway.fitting.FittedParameter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;
import picocli.CommandLine;

/** The fitting and π-groups views end to end through the real window, headless under Monocle. */
@ExtendWith(ApplicationExtension.class)
class FittingUiTest {

    static {
        WindowFixture.prepareScreen();
    }

    /**
     * The same code fits both ways (the view calls the fitter the CLI calls); the figures agree to
     * the last bits, 1e-12 relative allows only for a different order of summation.
     */
    static final double SAME_FIT = 1e-12;

    private WindowFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new WindowFixture(stage);
    }

    /**
     * Invented rig readings (not measured): the Blasius law with ±3 % scatter from a fixed
     * sequence, 14 points from Re 4,000 to 90,000.
     */
    static Path rigCsv(Path dir) throws Exception {
        StringBuilder csv = new StringBuilder("Re [-],f [-],dp [kPa]\n");
        for (int i = 0; i < 14; i++) {
            double re = 4000 * Math.pow(90_000 / 4000.0, i / 13.0);
            double f = 0.3164 * Math.pow(re, -0.25) * (1 + 0.03 * Math.sin(2.7 * i + 0.4));
            csv.append(String.format(Locale.ROOT, "%.1f,%.6f,%.3f%n", re, f, 0.02 * re / 1000));
        }
        Path file = dir.resolve("rig-readings.csv");
        Files.writeString(file, csv, StandardCharsets.UTF_8);
        return file;
    }

    /** Runs {@code headway fit … --format json} in this JVM and returns its parameters. */
    static JsonNode cliFit(Path csv, String form) throws Exception {
        CommandLine cl = HeadwayCommand.commandLine();
        StringWriter out = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(new StringWriter()));
        int code = cl.execute("fit", csv.toString(), "--y", "f", "--x", "Re", "--form", form, "--format", "json");
        assertEquals(0, code, out.toString());
        return new ObjectMapper().readTree(out.toString());
    }

    /** Imports the data, fits a power law in the background task and waits for it. */
    static void importAndFitPower(WindowFixture fx, FxRobot robot, Path csv) throws Exception {
        robot.interact(() -> fx.window.tabs().getSelectionModel().select(5));
        fx.dialogs.files.add(csv);
        robot.clickOn("#fit-import");
        WaitForAsyncUtils.waitFor(
                20, TimeUnit.SECONDS, () -> fx.window.fitting().tableProperty().get() != null);
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> fx.window
                .fitting()
                .forms()
                .forEach(c -> c.chosenProperty()
                        .set(c.form().id().equals("power") || c.form().id().equals("linear"))));
        robot.clickOn("#fit-run");
        WaitForAsyncUtils.waitFor(
                30, TimeUnit.SECONDS, () -> !fx.window.fitting().fits().isEmpty());
        WaitForAsyncUtils.waitForFxEvents();
    }

    /**
     * The fitting and rig-data views are built the first time their tab is shown (decision 0056), but
     * what the fitting puts on the friction chart must not depend on that: data imported before the
     * tab was ever shown reach the chart, and the view built later shows the same state.
     */
    @Test
    void dataImportedBeforeTheTabIsShownReachTheFrictionChart(FxRobot robot) throws Exception {
        fx.awaitResults();
        assertEquals(null, fx.window.tabs().getTabs().get(4).getContent(), "rig-data view built at start");
        assertEquals(null, fx.window.tabs().getTabs().get(5).getContent(), "fitting view built at start");
        Path csv = rigCsv(fx.dir);
        boolean[] read = new boolean[1];
        robot.interact(() -> read[0] = fx.window.fitting().importCsv(csv));
        assertTrue(read[0], fx.window.fitting().problemProperty().get());
        // The 14 invented (Re, f) points, all positive, are on the chart as points.
        assertEquals(14, fx.results.frictionOverlay().rigPoints().size());
        robot.interact(() -> fx.window.fitting().onFrictionChartProperty().set(false));
        assertEquals(0, fx.results.frictionOverlay().rigPoints().size());
        assertEquals(null, fx.window.tabs().getTabs().get(5).getContent(), "the model alone built the view");

        robot.interact(() -> fx.window.tabs().getSelectionModel().select(5));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(
                "rig-readings.csv — 14 rows",
                robot.lookup("#fit-file").queryAs(Label.class).getText());
        javafx.scene.control.CheckBox onChart =
                robot.lookup("#fit-on-chart").queryAs(javafx.scene.control.CheckBox.class);
        assertEquals(false, onChart.isSelected());
        robot.interact(() -> onChart.setSelected(true));
        assertEquals(14, fx.results.frictionOverlay().rigPoints().size());
    }

    @Test
    void importedRigDataFittedToAPowerLawGiveTheCommandLinesParameters(FxRobot robot) throws Exception {
        fx.awaitResults();
        Path csv = rigCsv(fx.dir);
        importAndFitPower(fx, robot, csv);
        Label file = robot.lookup("#fit-file").queryAs(Label.class);
        assertEquals("rig-readings.csv — 14 rows", file.getText());

        TableView<?> table = robot.lookup("#fit-table").queryAs(TableView.class);
        assertEquals(2, table.getItems().size());
        FittingModel.FitRow power = fx.window.fitting().fits().stream()
                .filter(r -> r.form().equals("power"))
                .findFirst()
                .orElseThrow();
        JsonNode cli = cliFit(csv, "power");
        FitResult shown = power.result();
        int k = 0;
        for (JsonNode p : cli.get("parameters")) {
            FittedParameter mine = shown.parameters().get(k++);
            assertEquals(p.get("name").asText(), mine.name());
            assertEquals(p.get("value").asDouble(), mine.value(), Math.abs(mine.value()) * SAME_FIT);
            assertEquals(p.get("ci95_low").asDouble(), mine.ci95Low(), Math.abs(mine.ci95Low()) * SAME_FIT);
            assertEquals(p.get("ci95_high").asDouble(), mine.ci95High(), Math.abs(mine.ci95High()) * SAME_FIT);
        }
        assertEquals(cli.get("r_squared").asDouble(), shown.rSquared(), SAME_FIT);
        // The table shows the CLI's figures, rounded for the screen.
        String a = String.format(
                Locale.ROOT,
                "a = %.6g",
                cli.get("parameters").get(0).get("value").asDouble());
        assertTrue(power.parameters().startsWith(a), power.parameters() + " vs " + a);
        assertEquals(String.format(Locale.ROOT, "%.5f", cli.get("r_squared").asDouble()), power.rSquared());

        // Save it and use it in the run: the friction chart gets the fitted curve and the points.
        Path target = fx.dir.resolve("rig-fit.json");
        robot.interact(() -> fx.window.fitting().selectedProperty().set(power));
        fx.dialogs.files.add(target);
        robot.clickOn("#fit-save");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(Files.isRegularFile(target), fx.dialogs.errors.toString());
        robot.clickOn("#fit-use");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("fitted:rig-fit.json", fx.editor.project().friction());
        Thread.sleep(FxRecalculator.DEBOUNCE_MS * 2L);
        fx.awaitResults();
        assertTrue(
                fx.results.problemProperty().get().isEmpty(),
                fx.results.problemProperty().get());
        assertTrue(fx.dialogs.errors.isEmpty(), fx.dialogs.errors.toString());
    }

    @Test
    void thePiGroupsHelperExplainsDependentRepeatingVariables(FxRobot robot) throws Exception {
        robot.interact(() -> fx.window.tabs().getSelectionModel().select(6));
        WaitForAsyncUtils.waitForFxEvents();
        Label summary = robot.lookup("#pi-summary").queryAs(Label.class);
        assertEquals("6 variables, rank 3: 3 dimensionless groups", summary.getText());
        robot.clickOn("#pi-repeating").write("rho, D, eps");
        robot.type(javafx.scene.input.KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        Label problem = robot.lookup("#pi-problem").queryAs(Label.class);
        assertTrue(problem.isVisible());
        assertTrue(problem.getText().contains("are not independent"), problem.getText());
        assertEquals("No groups until the problem above is fixed", summary.getText());
    }
}
