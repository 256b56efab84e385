package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.beans.property.SimpleObjectProperty;
import org.headway.caution.InputException;
import org.headway.cli.HeadwayCommand;
import org.headway.network.CaseResult;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.design.BalancingResult;
import org.headway.network.design.FireFlowResult;
import org.headway.network.design.NetworkSizingResult;
import org.headway.pipe.Catalog;
import org.headway.project.LineList;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The workspace's design studies against the command line on the same line lists ({@code headway
 * network --cases/--size/--balance/--fire-flow --format json}), and against checks computed here
 * outside the engine (bores from ASME B36.10M, a re-solve at the fire flow, continuity).
 */
class DesignStudiesTest {

    /**
     * Agreement asked of the app's study and the command line's: both run the same reader, resolver
     * and engine call, so anything above rounding says the app fed the engine something else.
     */
    static final double SAME_ENGINE = 1e-12;

    private static final Path EXAMPLES = Path.of("fluids-data", "examples", "network");

    @TempDir
    Path dir;

    private final NetworkEditor editor =
            new NetworkEditor(Catalog.bundled(), new SimpleObjectProperty<>(UnitSystem.SI));

    private static final NetworkSolution.Progress QUIET = (a, b, c) -> {};

    private DesignStudies.Input input() {
        return new DesignStudies.Input(editor, editor.draft(), Catalog.bundled(), dir);
    }

    private static JsonNode cli(String... args) throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        var cli = HeadwayCommand.commandLine();
        cli.setOut(new PrintWriter(out));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute(args);
        assertEquals(0, code, err.toString());
        return new ObjectMapper().readTree(out.toString());
    }

    static double relative(double a, double b) {
        return a == b ? 0 : Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b));
    }

    private void hillcrest() {
        editor.importLineList(EXAMPLES.resolve("hillcrest-nodes.csv"), EXAMPLES.resolve("hillcrest-links.csv"));
        editor.setCases(LineList.readCases(EXAMPLES.resolve("hillcrest-cases.csv"), editor.readDraft()));
    }

    @Test
    void demandCasesGiveTheCommandLinesPressuresAndLimitsCheck() throws Exception {
        hillcrest();
        DesignStudies.Cases app = DesignStudies.cases(input(), "200 kPa", "500 kPa", QUIET);
        JsonNode json = cli(
                "network",
                "--nodes",
                EXAMPLES.resolve("hillcrest-nodes.csv").toString(),
                "--links",
                EXAMPLES.resolve("hillcrest-links.csv").toString(),
                "--cases",
                EXAMPLES.resolve("hillcrest-cases.csv").toString(),
                "--min-pressure",
                "200 kPa",
                "--max-pressure",
                "500 kPa",
                "--format",
                "json");
        assertEquals(3, app.result().cases().size());
        double worst = 0;
        int compared = 0;
        for (JsonNode c : json.get("cases")) {
            CaseResult mine = app.result().cases().stream()
                    .filter(x -> x.name().equals(c.get("name").asText()))
                    .findFirst()
                    .orElseThrow();
            for (JsonNode n : c.get("nodes")) {
                double p =
                        mine.result().node(n.get("id").asText()).orElseThrow().pressure();
                worst = Math.max(worst, relative(n.get("pressure_pa").asDouble(), p));
                compared++;
            }
        }
        assertTrue(compared > 0, "no pressures compared");
        assertTrue(
                worst <= SAME_ENGINE,
                "design cases vs command line: " + compared + " pressures, largest relative difference " + worst);
        JsonNode v = json.get("pressure_checks").get("violations");
        var mine = app.result().pressureCheck().orElseThrow().violations();
        assertEquals(v.size(), mine.size());
        for (int i = 0; i < v.size(); i++) {
            assertEquals(v.get(i).get("node").asText(), mine.get(i).node());
            assertEquals(v.get(i).get("case").asText(), mine.get(i).caseName());
        }
        // Outside the engine: the peak case scales every demand by the cases file's 1.8, so the
        // reservoir main P1 carries 1.8 × the 15.3 L/s of the junction demands (continuity).
        CaseResult peak = app.result().cases().get(0);
        assertEquals("peak", peak.name());
        assertEquals(1.8 * 15.3e-3, peak.result().link("P1").orElseThrow().flow(), 1e-9);
    }

    /** The steel branch of {@code NetworkSizingCommandTest}: invented, fed from a fixed head of 40 m. */
    private void steelBranch() throws Exception {
        Path nodes = dir.resolve("steel-nodes.csv");
        Path links = dir.resolve("steel-links.csv");
        Files.writeString(nodes, """
                id,elevation [m],demand [L/s],fixed_head [m]
                SRC,0,,40
                A,2,0.5,
                B,4,1.2,
                C,3,0.8,
                D,6,0.6,
                """);
        Files.writeString(links, """
                id,from,to,kind,length [m],material,size,schedule,diameter [mm],roughness [mm]
                M1,SRC,A,pipe,40,steel-commercial-new,4,40,,
                M2,A,B,pipe,60,steel-commercial-new,4,40,,
                M3,A,C,pipe,35,steel-commercial-new,4,40,,
                M5,B,D,pipe,25,steel-commercial-new,4,40,,
                X1,C,D,pipe,30,,,,25,0.05
                """);
        editor.importLineList(nodes, links);
    }

    @Test
    void sizingChoosesTheCommandLinesSizesWithTheirReasons() throws Exception {
        steelBranch();
        DesignStudies.Sizing app = DesignStudies.sizing(input(), "1.5 m/s", "4 m/100m", "", "20 mm", QUIET);
        JsonNode s = cli(
                        "network",
                        "--nodes",
                        dir.resolve("steel-nodes.csv").toString(),
                        "--links",
                        dir.resolve("steel-links.csv").toString(),
                        "--size",
                        "--max-velocity",
                        "1.5 m/s",
                        "--max-gradient",
                        "4 m/100m",
                        "--min-diameter",
                        "20 mm",
                        "--format",
                        "json")
                .get("sizing");
        assertEquals(List.of("X1"), app.notSized());
        assertEquals(s.get("links").size(), app.result().links().size());
        for (int i = 0; i < s.get("links").size(); i++) {
            JsonNode l = s.get("links").get(i);
            NetworkSizingResult.LinkSizing mine = app.result().links().get(i);
            assertEquals(l.get("id").asText(), mine.id());
            assertEquals(l.get("chosen_size").asText(), mine.chosenSize(), mine.id());
            assertEquals(l.get("basis").asText(), mine.basis().key(), mine.id());
            assertTrue(relative(l.get("chosen_diameter_m").asDouble(), mine.chosenDiameter()) <= SAME_ENGINE);
            assertTrue(relative(l.get("velocity_m_per_s").asDouble(), mine.velocity()) <= SAME_ENGINE);
            assertTrue(relative(l.get("gradient_m_per_100m").asDouble(), mine.gradient()) <= SAME_ENGINE);
        }
        // Outside the engine: M1 carries all 3.1 L/s of demand; its chosen bore keeps it within
        // 1.5 m/s and the next Schedule 40 bore down would not, or would break the gradient
        // (bores from ASME B36.10M Table 1, from memory, as NetworkSizingCommandTest holds them).
        NetworkSizingResult.LinkSizing m1 = app.result().links().get(0);
        assertEquals(3.1e-3, m1.flow(), 1e-9);
        double d = m1.chosenDiameter();
        assertTrue(3.1e-3 / (Math.PI * d * d / 4) <= 1.5);
        // The reason shown names the basis and what ruled out the next size down.
        String why = DesignPane.reason(m1);
        assertTrue(why.startsWith(m1.basis().words()), why);
        int at = -1;
        for (int i = 0; i < m1.candidates().size(); i++) {
            if (m1.candidates().get(i).size().equals(m1.chosenSize())) {
                at = i;
            }
        }
        if (at > 0) {
            assertTrue(why.contains(m1.candidates().get(at - 1).size()), why);
        }
    }

    /**
     * The chosen sizes written back into the links: every sized pipe's size cell becomes the chosen
     * size, the pipe with its own bore (X1) is left alone, the step undoes as one, and the written-back
     * network re-solved by the CLI's line-list reader carries in M1 the velocity the study reported for
     * the chosen bore (to the engine's own precision).
     */
    @Test
    void chosenSizesAreWrittenBackAsOneUndoableStep() throws Exception {
        steelBranch();
        DesignStudies.Sizing app = DesignStudies.sizing(input(), "1.5 m/s", "4 m/100m", "", "20 mm", QUIET);
        java.util.Map<String, String> chosen = new java.util.LinkedHashMap<>();
        app.result().links().forEach(l -> chosen.put(l.id(), l.chosenSize()));
        chosen.put("X1", "DN50");
        NetworkEditor.Draft before = editor.draft();
        List<String> changed = editor.applySizes(chosen);
        assertTrue(!changed.isEmpty(), "nothing was resized");
        assertTrue(!changed.contains("X1"), changed.toString());
        for (java.util.Map<String, String> link : editor.draft().links()) {
            String id = link.get("id");
            if (id.equals("X1")) {
                assertEquals("", link.getOrDefault("size", ""));
            } else if (chosen.containsKey(id)) {
                // The cell holds the nominal; read back through the catalog it is the size the study chose.
                Catalog c = Catalog.bundled();
                var size =
                        c.size(c.material(link.get("material")), link.get("size"), link.getOrDefault("schedule", ""));
                assertEquals(chosen.get(id), org.headway.project.ProjectResolver.candidateLabel(size), id);
            }
        }
        Path nodes = dir.resolve("applied-nodes.csv");
        Path links = dir.resolve("applied-links.csv");
        editor.exportLineList(nodes, links);
        JsonNode solved = cli("network", "--nodes", nodes.toString(), "--links", links.toString(), "--format", "json");
        NetworkSizingResult.LinkSizing m1 = app.result().links().get(0);
        for (JsonNode l : solved.get("links")) {
            if (l.get("id").asText().equals(m1.id())) {
                assertTrue(relative(l.get("velocity_m_per_s").asDouble(), m1.velocity()) <= 1e-9, l.toString());
            }
        }
        assertTrue(editor.undo());
        assertEquals(before, editor.draft());
        // Applying a link's own size again changes nothing and makes no undo step.
        Catalog c = Catalog.bundled();
        java.util.Map<String, String> m1Row = before.links().get(0);
        String ownLabel = org.headway.project.ProjectResolver.candidateLabel(
                c.size(c.material(m1Row.get("material")), m1Row.get("size"), m1Row.getOrDefault("schedule", "")));
        assertEquals(List.of(), editor.applySizes(java.util.Map.of("M1", ownLabel)));
        assertEquals(before, editor.draft());
    }

    /**
     * Pressure ranges in the app equal {@code network --uncertainty} on the same line list with the
     * same demand range, samples and seed: method, solve count and every junction's nominal, low and
     * high pressure (the same engine and seed, so to 1e-12 relative), and the nominal pressure equals
     * a plain solve's. Bad multipliers are refused naming the field.
     */
    @Test
    void pressureRangesGiveTheCommandLinesRanges() throws Exception {
        hillcrest();
        editor.setCases(List.of());
        DesignStudies.Spread app = DesignStudies.uncertainty(input(), "0.9:1.1", "40", "3", QUIET);
        JsonNode u = cli(
                        "network",
                        "--nodes",
                        EXAMPLES.resolve("hillcrest-nodes.csv").toString(),
                        "--links",
                        EXAMPLES.resolve("hillcrest-links.csv").toString(),
                        "--uncertainty",
                        "--demand-range",
                        "0.9:1.1",
                        "--samples",
                        "40",
                        "--seed",
                        "3",
                        "--format",
                        "json")
                .get("uncertainty");
        assertEquals(u.get("method").asText(), app.result().method().id());
        assertEquals(u.get("solves").asInt(), app.result().solves());
        int compared = 0;
        for (JsonNode n : u.get("nodes")) {
            var mine = app.result().node(n.get("id").asText()).orElseThrow();
            if (mine.fixed()) {
                continue;
            }
            assertTrue(relative(
                            n.get("pressure_nominal_pa").asDouble(),
                            mine.pressure().nominal())
                    <= 1e-12);
            assertTrue(relative(
                            n.get("pressure_low_pa").asDouble(), mine.pressure().low())
                    <= 1e-12);
            assertTrue(relative(
                            n.get("pressure_high_pa").asDouble(),
                            mine.pressure().high())
                    <= 1e-12);
            // Outside the study: demands ×0.9 to ×1.1 and rougher or smoother pipes spread the pressure
            // around the nominal, never inverting the band.
            assertTrue(mine.pressure().low() <= mine.pressure().nominal() + 1e-9);
            assertTrue(mine.pressure().nominal() <= mine.pressure().high() + 1e-9);
            compared++;
        }
        assertTrue(compared > 5, "junctions compared: " + compared);
        InputException bad = org.junit.jupiter.api.Assertions.assertThrows(
                InputException.class, () -> DesignStudies.uncertainty(input(), "0.9-1.1", "", "", QUIET));
        assertTrue(bad.getMessage().startsWith("demand range"), bad.getMessage());
        InputException badSamples = org.junit.jupiter.api.Assertions.assertThrows(
                InputException.class, () -> DesignStudies.uncertainty(input(), "", "many", "", QUIET));
        assertTrue(badSamples.getMessage().startsWith("samples"), badSamples.getMessage());
    }

    /** The invented two-pipe circuit of {@code NetworkDesignCommandTest}: supply at 30 m, return at 18 m. */
    private void circuit() throws Exception {
        Path nodes = dir.resolve("circuit-nodes.csv");
        Path links = dir.resolve("circuit-links.csv");
        StringBuilder n = new StringBuilder("id,elevation [m],fixed_head [m],demand [L/s]\nS,0,30,\nR,0,18,\n");
        for (String id : List.of("s1", "s2", "s3", "m1", "m2", "m3", "r1", "r2", "r3")) {
            n.append(id).append(",0,,\n");
        }
        Files.writeString(nodes, n.toString());
        Files.writeString(links, """
                id,from,to,kind,length [m],diameter [mm],hw_c,rated_pressure_drop [kPa],rated_flow [L/s],kv,design_flow [L/s]
                fh1,S,s1,pipe,20,80,130,,,,
                fh2,s1,s2,pipe,15,65,130,,,,
                fh3,s2,s3,pipe,15,50,130,,,,
                rh1,r1,R,pipe,20,80,130,,,,
                rh2,r2,r1,pipe,15,65,130,,,,
                rh3,r3,r2,pipe,15,50,130,,,,
                c1,s1,m1,component,,,,20,2,,
                c2,s2,m2,component,,,,25,1.5,,
                c3,s3,m3,component,,,,30,1,,
                V1,m1,r1,valve,,,,,,16,2
                V2,m2,r2,valve,,,,,,16,1.5
                V3,m3,r3,valve,,,,,,16,1
                """);
        editor.setRunField("friction", "hazen-williams");
        editor.importLineList(nodes, links);
    }

    @Test
    void balancingGivesTheCommandLinesKvAndAuthority() throws Exception {
        circuit();
        DesignStudies.Balance app = DesignStudies.balancing(input(), "", QUIET);
        JsonNode b = cli(
                        "network",
                        "--nodes",
                        dir.resolve("circuit-nodes.csv").toString(),
                        "--links",
                        dir.resolve("circuit-links.csv").toString(),
                        "--friction",
                        "hazen-williams",
                        "--balance",
                        "--format",
                        "json")
                .get("balance");
        BalancingResult mine = app.result();
        assertTrue(mine.converged());
        assertEquals(b.get("index_valve").asText(), mine.indexValve().orElseThrow());
        assertTrue(relative(b.get("source_head_needed_m").asDouble(), mine.sourceHeadNeeded()) <= SAME_ENGINE);
        assertEquals(3, mine.valves().size());
        for (int i = 0; i < 3; i++) {
            JsonNode v = b.get("valves").get(i);
            BalancingResult.BalancedValve x = mine.valves().get(i);
            assertEquals(v.get("id").asText(), x.id());
            assertTrue(relative(v.get("kv").asDouble(), x.flowCoefficient()) <= SAME_ENGINE, x.id());
            assertTrue(relative(v.get("authority").asDouble(), x.authority()) <= SAME_ENGINE, x.id());
        }
        // Outside the engine: Kv = Q √(Δp₀/Δp) by IEC 60534-2-1 (water, ρ/ρ₀ ≈ 1 at 15 °C), with Q
        // in m³/h and Δp in bar, from each valve's own design flow and drop.
        for (BalancingResult.BalancedValve x : mine.valves()) {
            double rho = 999.1; // water at 15 °C, kg/m³, IAPWS-IF97 (from memory, 4 digits)
            double kv = x.designFlow() * 3600 * Math.sqrt(rho / 1000 / (x.pressureDrop() / 1e5));
            assertEquals(kv, x.flowCoefficient(), 1e-3 * kv, x.id());
        }
        // Minimum-drop option: an unreadable value is refused with the field named.
        InputException e = assertThrows(InputException.class, () -> DesignStudies.balancing(input(), "-2 kPa", QUIET));
        assertEquals("least valve drop", e.where());
    }

    @Test
    void fireFlowFindsTheCommandLinesFlowAndLimitingJunction() throws Exception {
        hillcrest();
        DesignStudies.Fire app = DesignStudies.fireFlow(input(), "J6", "140 kPa", QUIET);
        JsonNode f = cli(
                        "network",
                        "--nodes",
                        EXAMPLES.resolve("hillcrest-nodes.csv").toString(),
                        "--links",
                        EXAMPLES.resolve("hillcrest-links.csv").toString(),
                        "--fire-flow",
                        "J6",
                        "--residual-pressure",
                        "140 kPa",
                        "--format",
                        "json")
                .get("fire_flow");
        FireFlowResult mine = app.result();
        assertTrue(mine.found());
        assertTrue(relative(f.get("fire_flow_m3_per_s").asDouble(), mine.fireFlow()) <= SAME_ENGINE);
        assertEquals(f.get("limiting_node").asText(), mine.limitingNode());
        assertTrue(mine.fireFlow() > 0);
        // Outside the search: the network solved with the fire flow added at J6 keeps every
        // junction at or above 140 kPa, and the limiting one within 1 kPa of it.
        var network = org.headway.project.ProjectResolver.resolveNetwork(editor.project(), Catalog.bundled(), dir);
        List<org.headway.network.Node> nodes = new ArrayList<>();
        for (var n : network.nodes()) {
            nodes.add(n.id().equals("J6") ? n.withDemands(addTo(n.demands(), mine.fireFlow())) : n);
        }
        NetworkResult r = NetworkSolver.standard().solve(network.withNodes(nodes));
        for (NetworkResult.NodeResult n : r.nodes()) {
            if (!n.id().equals("TANK")) {
                assertTrue(n.pressure() >= 140e3 - 1, n.id() + " " + n.pressure());
            }
        }
        assertEquals(140e3, r.node(mine.limitingNode()).orElseThrow().pressure(), 1000);
        assertThrows(InputException.class, () -> DesignStudies.fireFlow(input(), "J6", "", QUIET));
    }

    private static List<org.headway.network.Node.Demand> addTo(
            List<org.headway.network.Node.Demand> demands, double extra) {
        List<org.headway.network.Node.Demand> out = new ArrayList<>(demands);
        out.add(new org.headway.network.Node.Demand("fire", extra));
        return out;
    }
}
