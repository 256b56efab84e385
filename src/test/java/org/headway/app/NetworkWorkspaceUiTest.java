package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import javafx.geometry.Point2D;
import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.image.WritableImage;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.headway.cli.HeadwayCommand;
import org.headway.network.NetworkResult;
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

/** The network workspace end to end through the real window, headless under Monocle. */
@ExtendWith(ApplicationExtension.class)
class NetworkWorkspaceUiTest {

    /**
     * Agreement asked of the app's solve and the command line's on the same exported list: both
     * run the same reader, resolver and solver, so anything above rounding says the app fed the
     * engine something else.
     */
    static final double SAME_ENGINE = 1e-12;

    /** Continuity at a junction from the shown flows, m³/s: the solver's own criterion is 10⁻¹⁰. */
    static final double CONTINUITY = 1e-9;

    static {
        WindowFixture.prepareScreen();
    }

    private WindowFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new WindowFixture(stage);
        fx.window.showNetwork(true);
    }

    /** Double-clicks a table cell, types into it and commits with Enter. */
    static void typeCell(FxRobot robot, String table, String column, int row, String text) {
        TableView<?> t = robot.lookup("#" + table).queryAs(TableView.class);
        robot.interact(() -> {
            t.getSelectionModel().clearAndSelect(row);
            t.scrollTo(row);
            t.getColumns().stream()
                    .flatMap(
                            c -> java.util.stream.Stream.concat(java.util.stream.Stream.of(c), c.getColumns().stream()))
                    .filter(c -> column.equals(c.getId()))
                    .findFirst()
                    .ifPresent(c -> ((TableView) t).scrollToColumn(c));
        });
        WaitForAsyncUtils.waitForFxEvents();
        TableCell<?, ?> cell = robot.lookup("#" + table + " .table-cell")
                .match((TableCell<?, ?> c) -> c.getIndex() == row
                        && c.isVisible()
                        && c.getTableRow() != null
                        && c.getTableRow().isVisible()
                        && c.getTableColumn() != null
                        && column.equals(c.getTableColumn().getId()))
                .queryAs(TableCell.class);
        robot.doubleClickOn(cell);
        WaitForAsyncUtils.waitForFxEvents();
        TextField field = robot.lookup("#" + table + " .text-field").queryAs(TextField.class);
        robot.interact(field::selectAll);
        robot.write(text);
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
    }

    /**
     * Builds, through the buttons and cells, a loop N1–N3–N4 fed from reservoir R1 over L1 (the
     * blank network's two nodes and pipe are the start).
     */
    static void buildLoop(FxRobot robot) {
        robot.clickOn("#add-node");
        typeCell(robot, "node-table", "node-elevation", 2, "12 m");
        typeCell(robot, "node-table", "node-demand", 2, "1.5 L/s");
        typeCell(robot, "node-table", "node-x", 2, "400 m");
        typeCell(robot, "node-table", "node-y", 2, "0 m");
        robot.clickOn("#add-node");
        typeCell(robot, "node-table", "node-elevation", 3, "8 m");
        typeCell(robot, "node-table", "node-demand", 3, "2.5 L/s");
        typeCell(robot, "node-table", "node-x", 3, "300 m");
        typeCell(robot, "node-table", "node-y", 3, "-150 m");
        // Links: each new one copies the selected pipe and runs from the last node but one to the last.
        robot.interact(() -> robot.lookup("#link-table")
                .queryAs(TableView.class)
                .getSelectionModel()
                .select(0));
        robot.clickOn("#add-link");
        typeCell(robot, "link-table", "link-from", 1, "N1");
        typeCell(robot, "link-table", "link-to", 1, "N3");
        robot.clickOn("#add-link");
        typeCell(robot, "link-table", "link-length", 2, "180 m");
        robot.clickOn("#add-link");
        typeCell(robot, "link-table", "link-from", 3, "N4");
        typeCell(robot, "link-table", "link-to", 3, "N1");
        typeCell(robot, "link-table", "link-diameter", 3, "80 mm");
        typeCell(robot, "link-table", "link-length", 3, "250 m");
    }

    static NetworkSolution solve(FxRobot robot, WindowFixture fx) throws Exception {
        NetworkSolution before = fx.window.network().solutionProperty().get();
        robot.clickOn("#network-solve");
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> {
            NetworkSolution s = fx.window.network().solutionProperty().get();
            return s != null && s != before;
        });
        WaitForAsyncUtils.waitForFxEvents();
        return fx.window.network().solutionProperty().get();
    }

    private static double relative(double a, double b) {
        double scale = Math.max(Math.abs(a), Math.abs(b));
        return scale == 0 ? 0 : Math.abs(a - b) / scale;
    }

    @Test
    void aLoopTypedInTheWindowSolvesAsTheCommandLineSolvesItsExportedList(FxRobot robot) throws Exception {
        buildLoop(robot);
        assertEquals("", fx.window.network().problemProperty().get());
        NetworkSolution s = solve(robot, fx);
        NetworkResult app = s.result();
        assertTrue(app.converged());
        assertEquals(4, app.nodes().size());
        assertEquals(4, app.links().size());

        Path nodes = fx.dir.resolve("loop-nodes.csv");
        fx.dialogs.files.add(nodes);
        robot.clickOn("#line-list-export");
        WaitForAsyncUtils.waitForFxEvents();
        Path links = fx.dir.resolve("loop-links.csv");
        assertTrue(Files.isRegularFile(nodes) && Files.isRegularFile(links));

        // Independent of the app: the command line on the exported files (its defaults are the
        // workspace's: water at 15 °C, friction auto).
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        var cli = HeadwayCommand.commandLine();
        cli.setOut(new PrintWriter(out));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute("network", "--nodes", nodes.toString(), "--links", links.toString(), "--format", "json");
        assertEquals(0, code, err.toString());
        JsonNode json = new ObjectMapper().readTree(out.toString());
        double worst = 0;
        for (JsonNode n : json.get("nodes")) {
            NetworkResult.NodeResult r = app.node(n.get("id").asText()).orElseThrow();
            worst = Math.max(worst, relative(n.get("head_m").asDouble(), r.head()));
        }
        for (JsonNode l : json.get("links")) {
            NetworkResult.LinkResult r = app.link(l.get("id").asText()).orElseThrow();
            worst = Math.max(worst, relative(l.get("flow_m3_per_s").asDouble(), r.flow()));
            worst = Math.max(worst, relative(l.get("head_loss_m").asDouble(), r.headLoss()));
        }
        org.headway.Fuzz.summary("network workspace vs command line: largest relative difference " + worst);
        assertTrue(worst <= SAME_ENGINE, "largest relative difference " + worst);

        // Continuity at each junction from the flows shown (mass balance, no engine involved).
        Map<String, Double> net = new HashMap<>();
        for (NetworkResult.LinkResult l : app.links()) {
            net.merge(l.from(), -l.flow(), Double::sum);
            net.merge(l.to(), l.flow(), Double::sum);
        }
        Map<String, Double> demand = Map.of("N1", 2e-3, "N3", 1.5e-3, "N4", 2.5e-3);
        demand.forEach((id, q) -> assertEquals(q, net.get(id), CONTINUITY, "continuity at " + id));
        // The reservoir supplies the total demand, 6 L/s.
        assertEquals(6e-3, app.link("L1").orElseThrow().flow(), CONTINUITY);

        // The table shows the solved flow in the chosen units, display-rounded.
        String shown = fx.window.networkView().linkText(0, "flow");
        assertEquals("6.000 L/s", shown);

        // An edit after the solve marks the results as older than the list.
        assertFalse(fx.window.network().staleProperty().get());
        typeCell(robot, "node-table", "node-demand", 3, "2.6 L/s");
        assertTrue(fx.window.network().staleProperty().get());
        robot.interact(() -> fx.window.network().undo());
        assertFalse(fx.window.network().staleProperty().get(), "back to the list solved");
        // The exported list reads back through the line-list reader as the workspace holds it.
        Project.NetworkSpec back = LineList.read(nodes, links, Catalog.bundled(), false);
        assertEquals(fx.window.network().project().network().orElseThrow(), back);
    }

    @Test
    void aBadCellNamesItsRowAndFieldAndKeepsTheValue(FxRobot robot) throws Exception {
        typeCell(robot, "node-table", "node-elevation", 1, "10 kPa");
        Label message = robot.lookup("#node-message").queryAs(Label.class);
        assertTrue(message.getText().startsWith("node row 2 (N1), elevation:"), message.getText());
        assertTrue(message.getText().endsWith("still using 10 m"), message.getText());
        assertEquals("10 m", fx.window.network().cell(NetworkEditor.Part.NODE, 1, "elevation"));
        // The selected link's fields: a bad length is refused beside its field; a good one is taken
        // and Tab moves on to the next field.
        robot.interact(() ->
                fx.window.network().selectionProperty().set(new NetworkEditor.Selection(NetworkEditor.Part.LINK, 0)));
        WaitForAsyncUtils.waitForFxEvents();
        TextField length = robot.lookup("#form-length").queryAs(TextField.class);
        robot.clickOn(length);
        robot.interact(length::selectAll);
        robot.write("3 kPa");
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        String beside =
                robot.lookup("#form-length-message").queryAs(Label.class).getText();
        assertTrue(beside.startsWith("link row 1 (L1), length:") && beside.endsWith("still using 200 m"), beside);
        assertTrue(length.getStyleClass().contains("rejected"));
        robot.interact(length::selectAll);
        robot.write("240 m");
        robot.type(KeyCode.TAB);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("240 m", fx.window.network().cell(NetworkEditor.Part.LINK, 0, "length"));
        assertTrue(
                robot.lookup("#form-diameter").queryAs(TextField.class).isFocused(),
                "Tab keeps the keyboard in the form");
        robot.interact(() -> fx.window.network().undo());
        // A valve without its Kv is accepted as a step, and the list says what it still needs.
        typeCell(robot, "link-table", "link-kind", 0, "valve");
        assertEquals("valve", fx.window.network().cell(NetworkEditor.Part.LINK, 0, "kind"));
        assertEquals("", fx.window.network().cell(NetworkEditor.Part.LINK, 0, "length"), "pipe cells cleared");
        Label problem = robot.lookup("#network-problem").queryAs(Label.class);
        assertTrue(problem.getText().contains("link row 1 (L1), kv"), problem.getText());
        // Undo with the keyboard goes back to the pipe.
        robot.press(KeyCode.CONTROL).press(KeyCode.Z).release(KeyCode.Z).release(KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("pipe", fx.window.network().cell(NetworkEditor.Part.LINK, 0, "kind"));
        assertEquals("200 m", fx.window.network().cell(NetworkEditor.Part.LINK, 0, "length"));
    }

    /** Pixels of a colour (within a small distance) in an image. */
    static int count(BufferedImage image, java.awt.Color colour) {
        int n = 0;
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                int rgb = image.getRGB(x, y);
                int dr = ((rgb >> 16) & 0xFF) - colour.getRed();
                int dg = ((rgb >> 8) & 0xFF) - colour.getGreen();
                int db = (rgb & 0xFF) - colour.getBlue();
                if (dr * dr + dg * dg + db * db < 300) {
                    n++;
                }
            }
        }
        return n;
    }

    private BufferedImage schematicSnapshot(FxRobot robot) {
        WritableImage[] image = new WritableImage[1];
        robot.interact(() -> image[0] = fx.window.networkView().schematic().snapshot(null, null));
        return javafx.embed.swing.SwingFXUtils.fromFXImage(image[0], null);
    }

    @Test
    void theSchematicAndTheTablesSelectTogetherAndTheDrawingExports(FxRobot robot) throws Exception {
        buildLoop(robot);
        solve(robot, fx);
        SchematicView view = fx.window.networkView().schematic();
        // The wheel zooms about the cursor; a click still finds the node where it is now drawn.
        double before = view.nodePoint(3)[0] - view.nodePoint(1)[0];
        robot.moveTo(view);
        robot.scroll(3, javafx.geometry.VerticalDirection.UP);
        WaitForAsyncUtils.waitForFxEvents();
        double after = view.nodePoint(3)[0] - view.nodePoint(1)[0];
        assertTrue(Math.abs(after) != Math.abs(before), "zoomed: " + before + " → " + after);
        robot.interact(view::fit);
        // Click on node N3 in the drawing: its table row is selected.
        double[] p = view.nodePoint(2);
        Point2D screen = view.localToScreen(p[0], p[1]);
        robot.clickOn(screen);
        WaitForAsyncUtils.waitForFxEvents();
        TableView<?> nodes = robot.lookup("#node-table").queryAs(TableView.class);
        assertEquals(2, nodes.getSelectionModel().getSelectedIndex());
        // Click on link L4: the link row, and the node table lets go.
        double[] q = view.linkPoint(3);
        robot.clickOn(view.localToScreen(q[0], q[1]));
        WaitForAsyncUtils.waitForFxEvents();
        TableView<?> links = robot.lookup("#link-table").queryAs(TableView.class);
        assertEquals(3, links.getSelectionModel().getSelectedIndex());
        assertEquals(-1, nodes.getSelectionModel().getSelectedIndex());
        assertTrue(robot.lookup("#form-heading").queryAs(Label.class).getText().startsWith("Link L4"));
        // Selecting a row in a table draws the halo on the drawing; no selection, no halo.
        robot.interact(() -> links.getSelectionModel().clearAndSelect(1));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(
                new NetworkEditor.Selection(NetworkEditor.Part.LINK, 1),
                fx.window.network().selectionProperty().get());
        int halo = count(schematicSnapshot(robot), SchematicPainter.HALO);
        assertTrue(halo > 50, "halo pixels " + halo);
        robot.interact(() ->
                fx.window.network().selectionProperty().set(new NetworkEditor.Selection(NetworkEditor.Part.NODE, -1)));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(0, count(schematicSnapshot(robot), SchematicPainter.HALO));

        // PNG and SVG, read back.
        Path png = fx.dir.resolve("loop.png");
        fx.dialogs.files.add(png);
        robot.clickOn("#schematic-export");
        WaitForAsyncUtils.waitForFxEvents();
        BufferedImage image = ImageIO.read(png.toFile());
        assertNotNull(image);
        assertEquals(SchematicView.EXPORT_WIDTH, image.getWidth());
        assertEquals(SchematicView.EXPORT_HEIGHT, image.getHeight());
        assertTrue(count(image, SchematicPainter.INDEX) > 100, "index circuit drawn");
        Path svg = fx.dir.resolve("loop.svg");
        fx.dialogs.files.add(svg);
        robot.clickOn("#schematic-export");
        WaitForAsyncUtils.waitForFxEvents();
        String text = Files.readString(svg, StandardCharsets.UTF_8);
        assertTrue(text.startsWith("<svg") || text.contains("<svg "), "an SVG document");
        assertTrue(text.contains("N4") && text.contains("L/s"), "labels in the SVG");
        assertFalse(text.contains("E-1"), "no exponent noise in the labels");
    }

    @Test
    void aNetworkProjectOpensInTheWorkspace(FxRobot robot) throws Exception {
        Path examples = Path.of("fluids-data", "examples", "network");
        Project.NetworkSpec spec = LineList.read(
                examples.resolve("hillcrest-nodes.csv"),
                examples.resolve("hillcrest-links.csv"),
                Catalog.bundled(),
                false);
        Path file = fx.dir.resolve("hillcrest.json");
        ProjectFile.save(Project.network("Hillcrest", "water", "15 degC", "auto", spec), file);
        robot.interact(() -> {
            fx.window.showNetwork(false);
            fx.editor.openFile(file);
        });
        WaitForAsyncUtils.waitForFxEvents();
        assertNotNull(robot.lookup("#network-workspace").tryQuery().orElse(null));
        assertEquals(
                8,
                robot.lookup("#node-table").queryAs(TableView.class).getItems().size());
        assertEquals(
                10,
                robot.lookup("#link-table").queryAs(TableView.class).getItems().size());
        assertEquals(
                spec.nodes(),
                fx.window.network().project().network().orElseThrow().nodes());
        // The catalog roughness the reader wrote (1.5E-6 m) is shown in millimetres, exactly.
        assertEquals("0.0015 mm", fx.window.network().cell(NetworkEditor.Part.LINK, 3, "roughness"));
        NetworkSolution s = solve(robot, fx);
        assertTrue(s.result().converged());
        // The engine on the example list as the command line reads it, outside the app.
        NetworkResult direct = org.headway.network.NetworkSolver.standard()
                .solve(org.headway.project.ProjectResolver.resolveNetwork(
                        Project.network("Hillcrest", "water", "15 degC", "auto", spec), Catalog.bundled(), fx.dir));
        for (NetworkResult.LinkResult l : direct.links()) {
            assertTrue(
                    relative(l.flow(), s.link(l.id()).orElseThrow().flow()) <= SAME_ENGINE,
                    l.id() + " " + l.flow() + " vs "
                            + s.link(l.id()).orElseThrow().flow());
        }
        for (NetworkResult.NodeResult n : direct.nodes()) {
            assertTrue(relative(n.head(), s.node(n.id()).orElseThrow().head()) <= SAME_ENGINE, n.id());
        }
    }

    @Test
    void aSolveShowsItsProgressAndCancelKeepsThePreviousResults(FxRobot robot) throws Exception {
        NetworkSolution first = solve(robot, fx);
        java.util.concurrent.CountDownLatch release = new java.util.concurrent.CountDownLatch(1);
        java.util.concurrent.atomic.AtomicBoolean interrupted = new java.util.concurrent.atomic.AtomicBoolean();
        fx.window.networkView().useSolveWork((editor, draft, catalog, base, progress) -> {
            progress.at(1, 3, "Resolving nodes and links");
            try {
                release.await(20, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                interrupted.set(true);
            }
            return NetworkSolution.solve(editor, draft, catalog, base, (a, b, c) -> {});
        });
        robot.clickOn("#network-solve");
        WaitForAsyncUtils.waitFor(
                10,
                TimeUnit.SECONDS,
                () -> fx.window.networkView().cancelButton().isVisible()
                        && fx.window.networkView().statusLabel().getText().startsWith("Resolving"));
        assertTrue(robot.lookup(".progress-bar").tryQuery().isPresent());
        robot.clickOn("#network-cancel");
        WaitForAsyncUtils.waitFor(
                10,
                TimeUnit.SECONDS,
                () -> fx.window.networkView().statusLabel().getText().startsWith("Solve cancelled"));
        release.countDown();
        Thread.sleep(300);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(interrupted.get(), "the cancel interrupts the worker");
        assertEquals(first, fx.window.network().solutionProperty().get(), "the earlier results stay");
        assertFalse(fx.window.networkView().cancelButton().isVisible());
    }
}
