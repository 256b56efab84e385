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

    /** An invented booster network with each kind of device, laid out in layers (no positions). */
    @Test
    void aNetworkWithDevicesIsWritten(FxRobot robot) throws Exception {
        Files.createDirectories(ScreenshotTest.FOLDER);
        String nodes = "id,elevation [m],demand [L/s],fixed_head [m]\n"
                + "SUMP,,,10\nS,10,0,\nD,10,0,\nA,25,3,\nB,30,2,\nC,22,2.5,\nE,18,1,\nTOP,,,60\n";
        String links = "id,from,to,kind,length [m],diameter [mm],roughness [mm],kv,pump_curve,setting\n"
                + "P0,SUMP,S,pipe,10,150,0.05,,,\n"
                + "PU1,S,D,pump,,,,,0 L/s:55 m; 10 L/s:50 m; 20 L/s:35 m,\n"
                + "CV1,D,A,check-valve,,,,60,,\n"
                + "P1,A,B,pipe,300,100,0.05,,,\n"
                + "P2,A,C,pipe,250,100,0.05,,,\n"
                + "PRV1,C,E,pressure-reducing,,,,30,,200 kPa\n"
                + "V1,B,TOP,valve,,,,25,,\n"
                + "X1,E,B,closed,,,,,,\n";
        Project.NetworkSpec spec = LineList.parse("nodes", nodes, "links", links, Catalog.bundled(), false);
        robot.interact(() -> {
            fx.window.network().load(Project.network("Booster (invented)", "water", "15 degC", "auto", spec), null);
            fx.window.showNetwork(true);
        });
        NetworkWorkspaceUiTest.solve(robot, fx);
        snap(robot, "network-devices");
    }
}
