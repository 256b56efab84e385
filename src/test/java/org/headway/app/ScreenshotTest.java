package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** Writes a PNG of each main view to target/screenshots/ for people to look at. */
@ExtendWith(ApplicationExtension.class)
class ScreenshotTest {

    static final Path FOLDER = Path.of("target", "screenshots");

    static {
        WindowFixture.prepareScreen();
    }

    private WindowFixture fx;
    private Stage stage;

    @Start
    void start(Stage stage) throws Exception {
        this.stage = stage;
        fx = new WindowFixture(stage);
    }

    private void snap(FxRobot robot, int tab, String name) throws Exception {
        robot.interact(() -> fx.window.tabs().getSelectionModel().select(tab));
        WaitForAsyncUtils.waitForFxEvents();
        Path file = FOLDER.resolve(name + ".png");
        WritableImage[] image = new WritableImage[1];
        robot.interact(() -> image[0] = stage.getScene().snapshot(null));
        ImageIO.write(SwingFXUtils.fromFXImage(image[0], null), "png", file.toFile());
        assertTrue(Files.size(file) > 10_000, file + " holds a drawn window");
    }

    @Test
    void eachMainViewIsWritten(FxRobot robot) throws Exception {
        fx.awaitResults();
        Files.createDirectories(FOLDER);
        String[] names = {"results", "grade-lines", "system-curve", "friction-chart"};
        for (int i = 0; i < names.length; i++) {
            snap(robot, i, names[i]);
        }
        // The bundled invented demo rig, analysed against its comparison correlation.
        Path rig = RigDataModelTest.copyDemoRig(fx.dir);
        robot.interact(() -> fx.window.tabs().getSelectionModel().select(4));
        fx.dialogs.files.add(rig);
        robot.clickOn("#rig-open");
        WaitForAsyncUtils.waitFor(
                30, TimeUnit.SECONDS, () -> fx.window.rigData().reportProperty().get() != null);
        WaitForAsyncUtils.waitForFxEvents();
        snap(robot, 4, "rig-data");
        // Invented rig readings, fitted with the usual forms; the chosen fit is used in the run.
        Path csv = FittingUiTest.rigCsv(fx.dir);
        robot.interact(() -> fx.window.tabs().getSelectionModel().select(5));
        fx.dialogs.files.add(csv);
        robot.clickOn("#fit-import");
        WaitForAsyncUtils.waitFor(
                20, TimeUnit.SECONDS, () -> fx.window.fitting().tableProperty().get() != null);
        robot.clickOn("#fit-run");
        WaitForAsyncUtils.waitFor(
                30, TimeUnit.SECONDS, () -> fx.window.fitting().fits().size() > 3);
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> fx.window
                .fitting()
                .selectedProperty()
                .set(fx.window.fitting().fits().stream()
                        .filter(r -> r.form().equals("power"))
                        .findFirst()
                        .orElseThrow()));
        fx.dialogs.files.add(fx.dir.resolve("rig-power-fit.json"));
        robot.clickOn("#fit-save");
        WaitForAsyncUtils.waitForFxEvents();
        snap(robot, 5, "rig-fitting");
        robot.clickOn("#fit-use");
        WaitForAsyncUtils.waitForFxEvents();
        snap(robot, 6, "pi-groups");
        Thread.sleep(FxRecalculator.DEBOUNCE_MS * 2L);
        fx.awaitResults();
        snap(robot, 3, "friction-chart-rig-data");
        robot.interact(() -> fx.editor.undo());
        // A trickle through the run: transitional flow raises cautions, so the panel opens.
        robot.interact(() -> {
            fx.window.tabs().getSelectionModel().select(0);
            fx.editor.setFlow("0.12 L/s");
        });
        Thread.sleep(FxRecalculator.DEBOUNCE_MS * 2L);
        fx.awaitResults();
        assertTrue(fx.results.specificCautionCount() > 0, "a trickle flow raises cautions");
        Path file = FOLDER.resolve("cautions.png");
        WritableImage[] image = new WritableImage[1];
        robot.interact(() -> image[0] = stage.getScene().snapshot(null));
        ImageIO.write(SwingFXUtils.fromFXImage(image[0], null), "png", file.toFile());
    }

    /** The run editor with the catalog's longest material name in the segment form. */
    @Test
    void aLongMaterialNameIsShownWhole(FxRobot robot) throws Exception {
        fx.awaitResults();
        Files.createDirectories(FOLDER);
        robot.interact(() -> {
            fx.window.tabs().getSelectionModel().select(0);
            fx.editor.setSegmentField(0, SegmentField.MATERIAL, "steel-en-10255-new");
        });
        fx.awaitResults();
        javafx.scene.control.ComboBox<?> box =
                robot.lookup("#segment-material").queryAs(javafx.scene.control.ComboBox.class);
        assertTrue(box.getValue().toString().contains("EN 10255"), String.valueOf(box.getValue()));
        snap(robot, 0, "run-editor-long-material");
    }
}
