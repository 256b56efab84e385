package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.headway.pipe.Catalog;
import org.headway.project.LineList;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** Writes PNGs of the network workspace to target/screenshots/ for people to look at. */
@ExtendWith(ApplicationExtension.class)
class NetworkScreenshotTest {

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

    private void snap(FxRobot robot, String name) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        Path file = ScreenshotTest.FOLDER.resolve(name + ".png");
        WritableImage[] image = new WritableImage[1];
        robot.interact(() -> image[0] = stage.getScene().snapshot(null));
        ImageIO.write(SwingFXUtils.fromFXImage(image[0], null), "png", file.toFile());
        assertTrue(Files.size(file) > 10_000, file + " holds a drawn window");
    }

    @Test
    void theNetworkWorkspaceIsWritten(FxRobot robot) throws Exception {
        Files.createDirectories(ScreenshotTest.FOLDER);
        // The invented demo network, opened as a project: positions from its x and y.
        Path examples = Path.of("fluids-data", "examples", "network");
        Project.NetworkSpec spec = LineList.read(
                examples.resolve("hillcrest-nodes.csv"),
                examples.resolve("hillcrest-links.csv"),
                Catalog.bundled(),
                false);
        Path file = fx.dir.resolve("hillcrest.json");
        ProjectFile.save(Project.network("Hillcrest (invented demo)", "water", "15 degC", "auto", spec), file);
        robot.interact(() -> fx.editor.openFile(file));
        snap(robot, "network-unsolved");
        NetworkWorkspaceUiTest.solve(robot, fx);
        robot.interact(() ->
                fx.window.network().selectionProperty().set(new NetworkEditor.Selection(NetworkEditor.Part.LINK, 4)));
        snap(robot, "network-solved");
        robot.interact(() -> fx.editor.unitSystemProperty().set(org.headway.units.UnitSystem.US_CUSTOMARY));
        snap(robot, "network-solved-us");
        robot.interact(() -> fx.editor.unitSystemProperty().set(org.headway.units.UnitSystem.SI));
        Path png = ScreenshotTest.FOLDER.resolve("network-drawing-export.png");
        SchematicView.export(fx.window.network(), png);
        // The same network without positions: the loops laid out by stress.
        java.util.List<java.util.Map<String, String>> rows = new java.util.ArrayList<>();
        for (var r : fx.window.network().draft().nodes()) {
            var m = new java.util.LinkedHashMap<>(r);
            m.remove("x");
            m.remove("y");
            rows.add(m);
        }
        robot.interact(() -> {
            NetworkEditor.Draft d = fx.window.network().draft();
            fx.window.network().load(fx.window.network().project(d.withBoth(rows, d.links())), file);
        });
        NetworkWorkspaceUiTest.solve(robot, fx);
        snap(robot, "network-auto-layout");
    }
}
