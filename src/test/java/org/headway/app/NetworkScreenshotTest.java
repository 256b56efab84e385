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

    private static void awaitStudy(DesignPane pane) throws Exception {
        WaitForAsyncUtils.waitFor(
                20,
                java.util.concurrent.TimeUnit.SECONDS,
                () -> pane.running() != null && pane.running().isDone());
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** The design studies tab on the invented demo network: demand cases, fire flow, then sizing. */
    @Test
    void theDesignStudiesAreWritten(FxRobot robot) throws Exception {
        Files.createDirectories(ScreenshotTest.FOLDER);
        Path examples = Path.of("fluids-data", "examples", "network");
        Project.NetworkSpec read = LineList.read(
                examples.resolve("hillcrest-nodes.csv"),
                examples.resolve("hillcrest-links.csv"),
                Catalog.bundled(),
                false);
        Project.NetworkSpec spec =
                read.withDemandCases(LineList.readCases(examples.resolve("hillcrest-cases.csv"), read));
        Path file = fx.dir.resolve("hillcrest.json");
        ProjectFile.save(
                Project.network("Hillcrest (invented demo)", "water", "15 degC", "auto", spec)
                        .withPressureLimits(new Project.PressureLimitsSpec("250 kPa", "450 kPa")),
                file);
        robot.interact(() -> {
            fx.editor.openFile(file);
            fx.window.networkView().showDesign(true);
        });
        DesignPane pane = fx.window.networkView().design();
        NetworkWorkspaceUiTest.solve(robot, fx);
        robot.interact(pane::runCases);
        awaitStudy(pane);
        snap(robot, "network-design-cases");
        robot.interact(() -> {
            pane.expand("design-fire");
            ((javafx.scene.control.ComboBox<?>)
                            robot.lookup("#design-fire-node").query())
                    .getEditor()
                    .setText("J6");
            robot.lookup("#design-residual-pressure")
                    .queryAs(javafx.scene.control.TextField.class)
                    .setText("140 kPa");
            pane.runFire();
        });
        awaitStudy(pane);
        snap(robot, "network-design-fire");
        // An invented steel branch given by catalog sizes, for sizing.
        String nodes = "id,elevation [m],demand [L/s],fixed_head [m],x [m],y [m]\n"
                + "SRC,0,,40,0,0\nA,2,0.5,,100,0\nB,4,1.2,,200,0\nC,3,0.8,,100,-80\nD,6,0.6,,200,-80\n";
        String links = "id,from,to,kind,length [m],material,size,schedule\n"
                + "M1,SRC,A,pipe,40,steel-commercial-new,4,40\n"
                + "M2,A,B,pipe,60,steel-commercial-new,4,40\n"
                + "M3,A,C,pipe,35,steel-commercial-new,4,40\n"
                + "M5,B,D,pipe,25,steel-commercial-new,4,40\n"
                + "M6,C,D,pipe,30,steel-commercial-new,4,40\n";
        Project.NetworkSpec steel = LineList.parse("nodes", nodes, "links", links, Catalog.bundled(), false);
        robot.interact(() -> {
            fx.window
                    .network()
                    .load(Project.network("Steel branch (invented)", "water", "15 degC", "auto", steel), null);
            pane.expand("design-sizing");
            robot.lookup("#design-head-budget")
                    .queryAs(javafx.scene.control.TextField.class)
                    .setText("3 m");
            pane.runSizing();
        });
        awaitStudy(pane);
        snap(robot, "network-design-sizing");
        robot.interact(() -> {
            pane.expand("design-uncertainty");
            robot.lookup("#design-demand-range")
                    .queryAs(javafx.scene.control.TextField.class)
                    .setText("0.9:1.1");
            pane.runUncertainty();
        });
        awaitStudy(pane);
        snap(robot, "network-design-ranges");
    }

    /** The grade-line tab on the invented demo network, with its pressure limits as a band. */
    @Test
    void theGradeLineIsWritten(FxRobot robot) throws Exception {
        Files.createDirectories(ScreenshotTest.FOLDER);
        Path examples = Path.of("fluids-data", "examples", "network");
        Project.NetworkSpec spec = LineList.read(
                examples.resolve("hillcrest-nodes.csv"),
                examples.resolve("hillcrest-links.csv"),
                Catalog.bundled(),
                false);
        Path file = fx.dir.resolve("hillcrest.json");
        ProjectFile.save(
                Project.network("Hillcrest (invented demo)", "water", "15 degC", "auto", spec)
                        .withPressureLimits(new Project.PressureLimitsSpec("250 kPa", "450 kPa")),
                file);
        robot.interact(() -> {
            fx.editor.openFile(file);
            fx.window.networkView().showGrade();
        });
        NetworkWorkspaceUiTest.solve(robot, fx);
        robot.interact(() -> fx.window.networkView().grade().choose("TANK", "J7"));
        assertTrue(fx.window.networkView().grade().shown() != null);
        snap(robot, "network-grade-line");
    }

    /** The searchable material list over the network form (the popup drawn on its own). */
    @Test
    void theCatalogPickerIsWritten(FxRobot robot) throws Exception {
        Files.createDirectories(ScreenshotTest.FOLDER);
        robot.interact(() -> {
            fx.window.showNetwork(true);
            fx.window.network().selectionProperty().set(new NetworkEditor.Selection(NetworkEditor.Part.LINK, 0));
        });
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn("#form-material-find");
        WaitForAsyncUtils.waitForFxEvents();
        robot.write("steel");
        WaitForAsyncUtils.waitForFxEvents();
        Path file = ScreenshotTest.FOLDER.resolve("catalog-picker.png");
        WritableImage[] image = new WritableImage[1];
        robot.interact(
                () -> image[0] = CatalogPicker.lastShown.getScene().getRoot().snapshot(null, null));
        ImageIO.write(SwingFXUtils.fromFXImage(image[0], null), "png", file.toFile());
        assertTrue(Files.size(file) > 5_000, file + " holds a drawn list");
    }
}
