package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import javafx.beans.property.SimpleObjectProperty;
import org.headway.chart.FrictionChart;
import org.headway.cli.HeadwayCommand;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The rig-data view-model on the bundled (invented) demo rig, without the toolkit. */
class RigDataModelTest {

    /**
     * The demo rig's points were generated at ε = 0.15 mm (the data file's header says so); the
     * fitted 95 % interval should contain it.
     */
    static final double GENERATING_ROUGHNESS = 0.15e-3;

    @TempDir
    Path dir;

    private Path rig;
    private RigDataModel model;
    private FakeDialogs dialogs;

    static Path copyDemoRig(Path dir) throws Exception {
        for (String name : new String[] {"demo-rig.json", "demo-rig-points.csv"}) {
            try (InputStream in = RigDataModelTest.class.getResourceAsStream("/fluids-data/examples/" + name)) {
                Files.copy(in, dir.resolve(name));
            }
        }
        return dir.resolve("demo-rig.json");
    }

    @BeforeEach
    void setUp() throws Exception {
        rig = copyDemoRig(dir);
        dialogs = new FakeDialogs();
        model = new RigDataModel(dialogs, new SimpleObjectProperty<>(UnitSystem.SI));
    }

    @Test
    void eachPointShowsTheCommandLinesReynoldsNumberFrictionFactorAndDeviation() throws Exception {
        assertTrue(model.open(rig), model.problemProperty().get());
        CommandLine cl = HeadwayCommand.commandLine();
        StringWriter out = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(new StringWriter()));
        assertEquals(0, cl.execute("rig", rig.toString(), "--format", "json"));
        JsonNode cli = new ObjectMapper().readTree(out.toString());
        JsonNode points = cli.get("points");
        assertEquals(points.size(), model.points().size());
        for (int i = 0; i < points.size(); i++) {
            JsonNode p = points.get(i);
            RigDataModel.PointRow row = model.points().get(i);
            assertEquals(p.get("line").asLong(), row.line());
            assertEquals(String.format(Locale.ROOT, "%,.0f", p.get("reynolds").asDouble()), row.reynolds());
            assertEquals(
                    String.format(Locale.ROOT, "%.5f", p.get("friction_factor").asDouble()), row.frictionFactor());
            if (p.has("deviation")) {
                assertEquals(
                        String.format(
                                Locale.ROOT,
                                "%+.2f %%",
                                100 * p.get("deviation").asDouble()),
                        row.deviation());
            } else {
                assertEquals("—", row.deviation());
            }
        }
        assertEquals(
                cli.get("summary").get("points").asLong(),
                model.reportProperty().get().summary().pointCount());
    }

    @Test
    void theEffectiveRoughnessIntervalHoldsTheGeneratingRoughness() {
        model.open(rig);
        var r = model.reportProperty().get().roughness();
        assertTrue(r.ci95Low() <= GENERATING_ROUGHNESS && GENERATING_ROUGHNESS <= r.ci95High(), r.toString());
        assertTrue(
                model.roughnessProperty().get().startsWith("Effective roughness ε = "),
                model.roughnessProperty().get());
        assertTrue(
                model.roughnessProperty().get().contains("95 % CI"),
                model.roughnessProperty().get());
    }

    @Test
    void thePointsGoOnTheFrictionChartWithTheirUncertaintyBars() {
        model.open(rig);
        FrictionOverlay o = model.frictionOverlay();
        assertEquals(model.points().size(), o.rigPoints().size());
        for (FrictionChart.RigPoint p : o.rigPoints()) {
            assertTrue(p.frictionUncertainty() > 0 && p.reynoldsUncertainty() > 0, p.toString());
        }
    }

    @Test
    void aRigFileThatDoesNotLoadIsExplainedAndThePreviousResultsStay() throws Exception {
        model.open(rig);
        int before = model.points().size();
        Path bad = Files.writeString(dir.resolve("bad-rig.json"), "{\"format\": \"headway-rig\", \"version\": 1}");
        assertFalse(model.open(bad));
        assertFalse(model.problemProperty().get().isEmpty());
        assertEquals(before, model.points().size());
    }

    @Test
    void aCancelStopsTheAnalysis() {
        assertThrows(CancellationException.class, () -> RigDataModel.analyse(rig, () -> true));
    }
}
