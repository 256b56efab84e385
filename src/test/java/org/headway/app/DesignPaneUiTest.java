package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.stage.Stage;
import org.headway.network.NetworkSolver;
import org.headway.network.NetworkStudy;
import org.headway.network.design.FireFlow;
import org.headway.pipe.Catalog;
import org.headway.project.LineList;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The workspace's design studies through the real window, headless under Monocle, on the invented Hillcrest list. */
@ExtendWith(ApplicationExtension.class)
class DesignPaneUiTest {

    static {
        WindowFixture.prepareScreen();
    }

    private static final Path EXAMPLES = Path.of("fluids-data", "examples", "network");

    private WindowFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new WindowFixture(stage);
    }

    private Project hillcrest() {
        Project.NetworkSpec spec = LineList.read(
                EXAMPLES.resolve("hillcrest-nodes.csv"),
                EXAMPLES.resolve("hillcrest-links.csv"),
                Catalog.bundled(),
                false);
        spec = spec.withDemandCases(LineList.readCases(EXAMPLES.resolve("hillcrest-cases.csv"), spec));
        return Project.network("Hillcrest (invented demo)", "water", "15 degC", "auto", spec)
                .withPressureLimits(new Project.PressureLimitsSpec("250 kPa", "450 kPa"));
    }

    private DesignPane open(FxRobot robot) throws Exception {
        Path file = fx.dir.resolve("hillcrest.json");
        ProjectFile.save(hillcrest(), file);
        robot.interact(() -> {
            fx.editor.openFile(file);
            fx.window.networkView().showDesign(true);
        });
        WaitForAsyncUtils.waitForFxEvents();
        return fx.window.networkView().design();
    }

    private static void awaitDone(DesignPane pane) throws Exception {
        WaitForAsyncUtils.waitFor(
                20,
                TimeUnit.SECONDS,
                () -> pane.running() != null && pane.running().isDone());
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void fireFlowAndDemandCasesShowTheEnginesAnswerInTheChosenUnits(FxRobot robot) throws Exception {
        DesignPane pane = open(robot);
        assertTrue(robot.lookup("#design-cases-list")
                .queryAs(Label.class)
                .getText()
                .contains("peak, night, fire"));

        robot.clickOn("Fire flow");
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn("#design-fire-node").write("J6");
        robot.clickOn("#design-residual-pressure").write("140 kPa");
        robot.clickOn("#design-run-fire");
        awaitDone(pane);
        // The engine outside the app, on the project as saved.
        var network = ProjectResolver.resolveNetwork(hillcrest(), Catalog.bundled(), fx.dir);
        var direct = FireFlow.standard().search(network, "J6", 140e3);
        var shown = pane.fireResult().result();
        assertEquals(direct.fireFlow(), shown.fireFlow(), 1e-12 * direct.fireFlow());
        assertEquals(direct.limitingNode(), shown.limitingNode());
        String text = robot.lookup("#design-fire-summary").queryAs(Label.class).getText();
        String flow = Quantities.format(direct.fireFlow(), QuantityKind.VOLUMETRIC_FLOW, UnitSystem.SI);
        assertTrue(text.contains(flow) && text.contains("Limiting junction " + direct.limitingNode()), text);

        robot.interact(() -> pane.expand("design-cases"));
        robot.clickOn("#design-run-cases");
        awaitDone(pane);
        NetworkStudy.Result study = ProjectResolver.resolveNetworkStudy(hillcrest(), Catalog.bundled(), fx.dir)
                .solve(NetworkSolver.standard());
        @SuppressWarnings("unchecked")
        TableView<List<String>> table = robot.lookup("#design-cases-table").queryAs(TableView.class);
        assertEquals(7, table.getItems().size(), "the seven junctions, the reservoir left out");
        assertEquals(
                List.of("Junction", "base", "peak", "night", "fire", "Lowest (case)", "Limits"),
                table.getColumns().stream().map(c -> c.getText()).toList());
        List<String> j5 = table.getItems().stream()
                .filter(r -> r.get(0).equals("J5"))
                .findFirst()
                .orElseThrow();
        double peakJ5 = study.cases().get(0).result().node("J5").orElseThrow().pressure();
        assertEquals(
                Quantities.format(Quantities.withoutNoise(peakJ5, 1e5), QuantityKind.PRESSURE, UnitSystem.SI),
                j5.get(2));
        long outside = study.pressureCheck().orElseThrow().violations().size();
        assertTrue(robot.lookup("#design-cases-summary")
                .queryAs(Label.class)
                .getText()
                .contains(outside == 0 ? "every junction within" : outside + " junction pressure(s) outside"));

        // US customary: the same answers redrawn in psi and gpm.
        robot.interact(() -> fx.editor.unitSystemProperty().set(UnitSystem.US_CUSTOMARY));
        WaitForAsyncUtils.waitForFxEvents();
        String us = robot.lookup("#design-fire-summary").queryAs(Label.class).getText();
        assertTrue(
                us.contains(
                        Quantities.format(direct.fireFlow(), QuantityKind.VOLUMETRIC_FLOW, UnitSystem.US_CUSTOMARY)),
                us);
        assertTrue(us.contains("psi"), us);
    }

    @Test
    void aStudyShowsItsProgressAndCancelKeepsTheEarlierAnswer(FxRobot robot) throws Exception {
        DesignPane pane = open(robot);
        CountDownLatch release = new CountDownLatch(1);
        pane.beforeWork = p -> {
            p.at(1, 3, "waiting");
            try {
                release.await(20, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        };
        robot.clickOn("#design-run-cases");
        WaitForAsyncUtils.waitFor(
                10,
                TimeUnit.SECONDS,
                () -> robot.lookup("#design-cancel").query().isVisible()
                        && pane.statusLabel().getText().startsWith("Demand cases: waiting"));
        robot.clickOn("#design-cancel");
        WaitForAsyncUtils.waitFor(
                10, TimeUnit.SECONDS, () -> pane.statusLabel().getText().contains("cancelled"));
        release.countDown();
        WaitForAsyncUtils.waitForFxEvents();
        assertNull(pane.cases(), "nothing shown from a cancelled study");
        assertFalse(robot.lookup("#design-cancel").query().isVisible());
        // Bad input is refused with the field named, in the status line.
        pane.beforeWork = p -> {};
        robot.interact(() -> pane.expand("design-fire"));
        robot.clickOn("#design-run-fire");
        awaitDone(pane);
        assertTrue(
                pane.statusLabel().getText().contains("fire-flow node"),
                pane.statusLabel().getText());
        assertNotNull(robot.lookup("#design-sizing").tryQuery().orElse(null));
    }

    /**
     * Pressure ranges through the window: typed multipliers, samples and seed give the engine's own
     * study (NetworkUncertainty on the same network and spec) in the table, one row per junction,
     * with the low and high pressures shown in the chosen units.
     */
    @Test
    void pressureRangesShowTheEnginesBands(FxRobot robot) throws Exception {
        DesignPane pane = open(robot);
        robot.interact(() -> pane.expand("design-uncertainty"));
        WaitForAsyncUtils.waitForFxEvents();
        robot.doubleClickOn("#design-demand-range").write("0.9:1.1");
        robot.doubleClickOn("#design-samples").write("30");
        robot.doubleClickOn("#design-seed").write("5");
        robot.clickOn("#design-run-uncertainty");
        awaitDone(pane);
        DesignStudies.Spread shown = pane.spreadResult();
        assertNotNull(shown, pane.statusLabel().getText());
        assertEquals(0.9, shown.result().demandLow(), 0);
        assertEquals(1.1, shown.result().demandHigh(), 0);
        var engine = org.headway.network.design.NetworkUncertainty.run(
                ProjectResolver.resolveNetwork(hillcrest(), Catalog.bundled(), fx.dir),
                org.headway.network.design.NetworkUncertainty.Spec.of(0.9, 1.1)
                        .withSamples(30)
                        .withSeed(5),
                NetworkSolver.standard());
        TableView<?> table = robot.lookup("#design-uncertainty-table").queryAs(TableView.class);
        long junctions = engine.nodes().stream().filter(n -> !n.fixed()).count();
        assertEquals(junctions, table.getItems().size());
        for (var n : engine.nodes()) {
            var mine = shown.result().node(n.id()).orElseThrow();
            assertEquals(
                    n.pressure().low(),
                    mine.pressure().low(),
                    1e-9 * Math.abs(n.pressure().low()));
            assertEquals(
                    n.pressure().high(),
                    mine.pressure().high(),
                    1e-9 * Math.abs(n.pressure().high()));
        }
        String firstLow = ((List<?>) table.getItems().get(0)).get(2).toString();
        assertTrue(firstLow.endsWith("kPa"), firstLow);
    }

    @Test
    void balancingShowsTheEnginesKvAndAuthority(FxRobot robot) throws Exception {
        // The invented two-pipe circuit of NetworkDesignCommandTest: supply at 30 m, return at 18 m.
        StringBuilder nodes = new StringBuilder("id,elevation [m],fixed_head [m],demand [L/s]\nS,0,30,\nR,0,18,\n");
        for (String id : List.of("s1", "s2", "s3", "m1", "m2", "m3", "r1", "r2", "r3")) {
            nodes.append(id).append(",0,,\n");
        }
        String links = "id,from,to,kind,length [m],diameter [mm],hw_c,rated_pressure_drop [kPa],rated_flow [L/s],kv,"
                + "design_flow [L/s]\n"
                + "fh1,S,s1,pipe,20,80,130,,,,\nfh2,s1,s2,pipe,15,65,130,,,,\nfh3,s2,s3,pipe,15,50,130,,,,\n"
                + "rh1,r1,R,pipe,20,80,130,,,,\nrh2,r2,r1,pipe,15,65,130,,,,\nrh3,r3,r2,pipe,15,50,130,,,,\n"
                + "c1,s1,m1,component,,,,20,2,,\nc2,s2,m2,component,,,,25,1.5,,\nc3,s3,m3,component,,,,30,1,,\n"
                + "V1,m1,r1,valve,,,,,,16,2\nV2,m2,r2,valve,,,,,,16,1.5\nV3,m3,r3,valve,,,,,,16,1\n";
        Project circuit = Project.network(
                "Circuit (invented)",
                "water",
                "15 degC",
                "hazen-williams",
                LineList.parse("nodes", nodes.toString(), "links", links, Catalog.bundled(), true));
        robot.interact(() -> {
            fx.window.network().load(circuit, null);
            fx.window.showNetwork(true);
            fx.window.networkView().showDesign(true);
        });
        DesignPane pane = fx.window.networkView().design();
        robot.interact(() -> pane.expand("design-balancing"));
        robot.clickOn("#design-run-balancing");
        awaitDone(pane);
        var direct = org.headway.network.design.Balancing.standard()
                .balance(ProjectResolver.resolveNetwork(circuit, Catalog.bundled(), fx.dir));
        @SuppressWarnings("unchecked")
        TableView<List<String>> table = robot.lookup("#design-balance-table").queryAs(TableView.class);
        assertEquals(3, table.getItems().size());
        for (int i = 0; i < 3; i++) {
            var v = direct.valves().get(i);
            assertEquals(v.id(), table.getItems().get(i).get(0));
            assertEquals(
                    Quantities.formatNumber(v.flowCoefficient()),
                    table.getItems().get(i).get(3),
                    v.id());
            assertEquals(
                    Quantities.formatNumber(v.authority()),
                    table.getItems().get(i).get(4),
                    v.id());
        }
        assertTrue(robot.lookup("#design-balance-summary")
                .queryAs(Label.class)
                .getText()
                .contains("index valve " + direct.indexValve().orElseThrow()));
    }
}
