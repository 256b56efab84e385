package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javafx.geometry.Point2D;
import javafx.stage.Stage;
import org.headway.cli.HeadwayCommand;
import org.headway.network.GradeLinePath;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The grade-line tab end to end through the real window, headless under Monocle. */
@ExtendWith(ApplicationExtension.class)
class GradeLineUiTest {

    static {
        WindowFixture.prepareScreen();
    }

    private WindowFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new WindowFixture(stage);
        fx.window.showNetwork(true);
    }

    private void clickNode(FxRobot robot, int row) {
        SchematicView s = fx.window.networkView().schematic();
        double[] p = s.nodePoint(row);
        Point2D screen = s.localToScreen(p[0], p[1]);
        robot.clickOn(screen);
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void aPathPickedOnTheDrawingFollowsTheCommandLinesHeads(FxRobot robot) throws Exception {
        NetworkWorkspaceUiTest.buildLoop(robot);
        NetworkSolution s = NetworkWorkspaceUiTest.solve(robot, fx);
        assertTrue(s.result().converged());
        robot.interact(() -> fx.window.networkView().showGrade());
        WaitForAsyncUtils.waitForFxEvents();
        GradeLinePane pane = fx.window.networkView().grade();
        assertEquals(
                "Choose the start and end nodes (or pick them on the drawing).",
                pane.summary().getText());
        robot.clickOn("#grade-pick");
        // Reservoir R1 (row 0), then N4 (row 3) on the drawing.
        clickNode(robot, 0);
        clickNode(robot, 3);
        assertEquals("R1", pane.start().getValue());
        assertEquals("N4", pane.end().getValue());
        PathGrade shown = pane.shown();
        assertNotNull(shown, pane.summary().getText());
        // R1–N1 then N1–N4 through L4 (drawn N4 → N1, so walked against its direction): 2 links and
        // 450 m, shorter both ways than R1–N1–N3–N4 (3 links, 580 m).
        List<String> route =
                shown.path().steps().stream().map(GradeLinePath.Step::link).toList();
        assertEquals(List.of("L1", "L4"), route);
        assertFalse(shown.path().steps().get(1).forward());
        assertEquals(450, shown.path().length(), 1e-9);
        assertTrue(
                pane.summary().getText().startsWith("R1 → N4: 2 links, 450"),
                pane.summary().getText());

        // Independent of the app: the command line on the exported list.
        Path nodes = fx.dir.resolve("grade-nodes.csv");
        fx.dialogs.files.add(nodes);
        robot.clickOn("#line-list-export");
        WaitForAsyncUtils.waitForFxEvents();
        Path links = fx.dir.resolve("grade-links.csv");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        var cli = HeadwayCommand.commandLine();
        cli.setOut(new PrintWriter(out));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute("network", "--nodes", nodes.toString(), "--links", links.toString(), "--format", "json");
        assertEquals(0, code, err.toString());
        JsonNode json = new ObjectMapper().readTree(out.toString());
        Map<String, Double> head = new HashMap<>();
        json.get("nodes")
                .forEach(n -> head.put(n.get("id").asText(), n.get("head_m").asDouble()));
        Map<String, Double> loss = new HashMap<>();
        json.get("links")
                .forEach(
                        l -> loss.put(l.get("id").asText(), l.get("head_loss_m").asDouble()));
        double worst = 0;
        for (GradeLinePath.Station st : shown.path().stations()) {
            worst = Math.max(worst, relative(head.get(st.node()), st.head()));
        }
        for (GradeLinePath.Step step : shown.path().steps()) {
            double cliDrop = step.forward() ? loss.get(step.link()) : -loss.get(step.link());
            worst = Math.max(worst, relative(cliDrop, step.headDrop()));
        }
        assertTrue(worst <= NetworkWorkspaceUiTest.SAME_ENGINE, "largest relative difference " + worst);

        // The chart drawn holds those heads: the first series (energy grade, the node heads) at each
        // end of each link.
        XYPlot plot = (XYPlot) pane.chartView().viewer().getChart().getPlot();
        XYDataset grade = plot.getDataset(0);
        assertEquals(4, grade.getItemCount(0));
        assertEquals(head.get("R1"), grade.getYValue(0, 0), 1e-9);
        assertEquals(head.get("N1"), grade.getYValue(0, 1), 1e-9);
        assertEquals(head.get("N4"), grade.getYValue(0, 3), 1e-9);
        assertEquals(450, grade.getXValue(0, 3), 1e-9);

        // By fewest links from the lists: the same route here; then an unreachable choice says so.
        robot.interact(() -> {
            pane.route().setValue(GradeLinePane.FEWEST_LINKS);
            pane.choose("N3", "R1");
        });
        assertEquals(
                List.of("L2", "L1"),
                pane.shown().path().steps().stream()
                        .map(GradeLinePath.Step::link)
                        .toList());
    }

    private static double relative(double a, double b) {
        double scale = Math.max(Math.abs(a), Math.abs(b));
        return scale == 0 ? 0 : Math.abs(a - b) / scale;
    }
}
