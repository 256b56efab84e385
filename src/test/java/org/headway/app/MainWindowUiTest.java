package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.system.HeadLossCalculator;
import org.headway.system.PipeRun;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** End to end through the real window, headless under Monocle. */
@ExtendWith(ApplicationExtension.class)
class MainWindowUiTest {

    static {
        WindowFixture.prepareScreen();
    }

    private WindowFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new WindowFixture(stage);
    }

    /** Total head loss the engine gives for the demo with the rising main at a given length. */
    private String engineTotal(String length) {
        Project p = ProjectFile.load(fx.demo);
        var segments = new ArrayList<>(p.segments());
        var s = segments.get(2);
        segments.set(
                2,
                new Project.SegmentSpec(
                        s.name(),
                        length,
                        s.pipe(),
                        s.innerDiameter(),
                        s.roughness(),
                        s.fittings(),
                        s.lossCoefficient(),
                        s.elevationChange()));
        Project changed = Project.of(
                p.title(),
                p.titleBlock(),
                p.fluid(),
                p.flow(),
                p.flowUncertainty(),
                p.friction(),
                segments,
                p.ends(),
                p.pump(),
                p.limits(),
                p.sizing(),
                p.curve());
        PipeRun run =
                ProjectResolver.resolve(changed, Catalog.bundled(), fx.dir).run();
        return Quantities.format(
                HeadLossCalculator.solve(run, run.designFlow()).totals().headLoss(), QuantityKind.HEAD, UnitSystem.SI);
    }

    /** The total shown; the totals grid is rebuilt on each result, so the label may be absent for a moment. */
    private static String totalShown(FxRobot robot) {
        return robot.lookup("#total-total-head-loss")
                .tryQuery()
                .map(n -> ((Label) n).getText())
                .orElse("");
    }

    private void typeLength(FxRobot robot, String text) {
        TableView<?> table = robot.lookup("#segment-table").queryAs(TableView.class);
        robot.interact(() -> table.getSelectionModel().select(2));
        TextField length = robot.lookup("#segment-length").queryAs(TextField.class);
        robot.clickOn(length);
        robot.interact(length::selectAll);
        robot.write(text);
        robot.type(KeyCode.ENTER);
    }

    @Test
    void changingALengthUpdatesTheTotalsToTheEnginesValue(FxRobot robot) throws Exception {
        fx.awaitResults();
        assertEquals(engineTotal("420 m"), totalShown(robot));
        typeLength(robot, "610 m");
        String expected = engineTotal("610 m");
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> expected.equals(totalShown(robot)));
        assertEquals("610 m", fx.editor.project().segments().get(2).length());
        // Ctrl+Z with the keyboard still in the length field undoes the edit, not just the typing.
        robot.press(KeyCode.CONTROL).press(KeyCode.Z).release(KeyCode.Z).release(KeyCode.CONTROL);
        String original = engineTotal("420 m");
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> original.equals(totalShown(robot)));
        assertEquals("420 m", fx.editor.project().segments().get(2).length());
    }

    @Test
    void aLengthCanBeTypedIntoTheSegmentTable(FxRobot robot) throws Exception {
        fx.awaitResults();
        // The table echoes the length in the chosen units without padding zeros ("420 m").
        String shown = fx.editor.summaries().get(2).length();
        assertEquals("420 m", shown);
        robot.doubleClickOn(shown);
        WaitForAsyncUtils.waitForFxEvents();
        TextField cell = robot.lookup("#segment-table .text-field").queryAs(TextField.class);
        robot.interact(cell::selectAll);
        robot.write("430 m");
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("430 m", fx.editor.project().segments().get(2).length());
        String expected = engineTotal("430 m");
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> expected.equals(totalShown(robot)));
    }

    @Test
    void aBadQuantityShowsTheMessageAndKeepsThePreviousValue(FxRobot robot) throws Exception {
        fx.awaitResults();
        String before = totalShown(robot);
        typeLength(robot, "420 kPa");
        WaitForAsyncUtils.waitForFxEvents();
        Label message = robot.lookup("#segment-length-message").queryAs(Label.class);
        assertTrue(message.getText().contains("length expected, got \"420 kPa\""), message.getText());
        assertTrue(message.getText().endsWith("still using 420 m"), message.getText());
        TextField length = robot.lookup("#segment-length").queryAs(TextField.class);
        assertEquals("420 kPa", length.getText(), "the typed text stays for correcting");
        assertTrue(length.getStyleClass().contains("rejected"));
        assertEquals("420 m", fx.editor.project().segments().get(2).length());
        Thread.sleep(FxRecalculator.DEBOUNCE_MS * 2L);
        fx.awaitResults();
        assertEquals(before, totalShown(robot));
    }

    @Test
    void theFrictionChartExportsToPngAndReadsOutUnderTheCursor(FxRobot robot) throws Exception {
        fx.awaitResults();
        robot.clickOn("Friction chart");
        WaitForAsyncUtils.waitForFxEvents();
        robot.moveTo("#friction-chart-viewer");
        WaitForAsyncUtils.waitForFxEvents();
        String readout =
                robot.lookup("#friction-chart-readout").queryAs(Label.class).getText();
        assertTrue(readout.startsWith("Re = "), readout);
        Path png = fx.dir.resolve("friction.png");
        fx.dialogs.files.add(png);
        robot.clickOn("#friction-chart-export-png");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(Files.isRegularFile(png));
        byte[] head = Arrays.copyOf(Files.readAllBytes(png), 4);
        // PNG signature, ISO/IEC 15948 section 5.2.
        assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G'}, head);
        assertTrue(fx.dialogs.errors.isEmpty(), fx.dialogs.errors.toString());
    }
}
