package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code headway network --cases/--min-pressure/--max-pressure/--index-chart} and demand cases in {@code solve}. */
class NetworkStudyCommandTest {

    static final String NODES = NetworkCommandTest.NODES;
    static final String LINKS = NetworkCommandTest.LINKS;
    static final String CASES = "fluids-data/examples/network/hillcrest-cases.csv";

    @TempDir
    Path dir;

    private static JsonNode json(CliRun run) throws Exception {
        return new ObjectMapper().readTree(run.out());
    }

    @Test
    void casesCarryTheirKeysAndEqualARunWithTheDemandsScaledInTheFile() throws Exception {
        CliRun run = CliRun.of(
                "network",
                "--nodes",
                NODES,
                "--links",
                LINKS,
                "--cases",
                CASES,
                "--min-pressure",
                "300 kPa",
                "--max-pressure",
                "4.8 bar",
                "--format",
                "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode root = json(run);
        JsonNode cases = root.get("cases");
        assertEquals(3, cases.size());
        assertEquals("peak", cases.get(0).get("name").asText());
        for (JsonNode c : cases) {
            assertTrue(c.get("converged").asBoolean());
            assertTrue(c.get("iterations").asInt() > 0);
            for (String key : new String[] {"id", "head_m", "pressure_pa", "demand_m3_per_s"}) {
                assertTrue(c.get("nodes").get(1).has(key), key);
            }
            for (String key : new String[] {"id", "flow_m3_per_s", "velocity_m_per_s", "head_loss_m"}) {
                assertTrue(c.get("links").get(0).has(key), key);
            }
        }
        // Independent: the night case (×0.4) against a plain run of a nodes file whose demands were
        // multiplied by 0.4 here, cell by cell.
        List<String> lines = Files.readAllLines(Path.of(NODES));
        List<String> scaled = new ArrayList<>();
        scaled.add(lines.get(0));
        for (String line : lines.subList(1, lines.size())) {
            String[] cells = line.split(",", -1);
            if (!cells[3].isEmpty()) {
                cells[3] = Double.toString(Double.parseDouble(cells[3]) * 0.4);
            }
            scaled.add(String.join(",", cells));
        }
        Path night = dir.resolve("night-nodes.csv");
        Files.write(night, scaled);
        JsonNode plain = json(CliRun.of("network", "--nodes", night.toString(), "--links", LINKS, "--format", "json"));
        JsonNode nightCase = cases.get(1);
        assertEquals("night", nightCase.get("name").asText());
        for (int i = 0; i < plain.get("nodes").size(); i++) {
            double expected = plain.get("nodes").get(i).get("pressure_pa").asDouble();
            assertEquals(
                    expected, nightCase.get("nodes").get(i).get("pressure_pa").asDouble(), 1e-12 * expected);
        }
        // The pressure table: each node's minimum is the least of its pressures over the cases.
        JsonNode checks = root.get("pressure_checks");
        assertEquals(300_000, checks.get("minimum_pa").asDouble());
        assertEquals(480_000, checks.get("maximum_pa").asDouble(), 1e-9);
        int violations = 0;
        for (JsonNode n : checks.get("nodes")) {
            int i = indexOf(root.get("nodes"), n.get("id").asText());
            double least = Double.POSITIVE_INFINITY;
            String which = "";
            for (JsonNode c : cases) {
                double p = c.get("nodes").get(i).get("pressure_pa").asDouble();
                if (p < least) {
                    least = p;
                    which = c.get("name").asText();
                }
                violations += (p < 300_000 ? 1 : 0) + (p > 480_000 ? 1 : 0);
            }
            assertEquals(least, n.get("minimum_pressure_pa").asDouble());
            assertEquals(which, n.get("minimum_case").asText());
        }
        assertEquals(violations, checks.get("violations").size());
        assertTrue(violations > 0, "the example limits are chosen so that some pressures break them");
        JsonNode v = checks.get("violations").get(0);
        for (String key : new String[] {"node", "case", "pressure_pa", "limit_pa", "bound"}) {
            assertTrue(v.has(key), key);
        }
        JsonNode index = root.get("index_circuit");
        assertEquals("TANK", index.get("source").asText());
        assertTrue(index.get("links").size() > 0 && index.get("head_loss_m").asDouble() > 0);
        assertTrue(root.get("terminal_paths").size() >= 1);
        assertEquals(0, root.get("pumps").size());
    }

    private static int indexOf(JsonNode nodes, String id) {
        for (int i = 0; i < nodes.size(); i++) {
            if (nodes.get(i).get("id").asText().equals(id)) {
                return i;
            }
        }
        throw new AssertionError(id);
    }

    @Test
    void withoutCasesTheKeysOfOneSolveStayAndNoCaseKeysAppear() throws Exception {
        JsonNode root = json(CliRun.of("network", "--nodes", NODES, "--links", LINKS, "--format", "json"));
        List<String> keys = new ArrayList<>();
        root.fieldNames().forEachRemaining(keys::add);
        assertEquals(
                List.of(
                        "title",
                        "fluid",
                        "density_kg_per_m3",
                        "dynamic_viscosity_pa_s",
                        "friction",
                        "barometric_pressure_pa",
                        "converged",
                        "iterations",
                        "residuals",
                        "nodes",
                        "links",
                        "cautions",
                        "pumps",
                        "index_circuit",
                        "terminal_paths"),
                keys);
        CliRun csv = CliRun.of("network", "--nodes", NODES, "--links", LINKS, "--format", "csv");
        assertFalse(csv.out().contains("case,node"), "no case table without cases");
    }

    @Test
    void csvTextAndOutputFilesCarryTheCases() throws Exception {
        CliRun csv = CliRun.of(
                "network",
                "--nodes",
                NODES,
                "--links",
                LINKS,
                "--cases",
                CASES,
                "--min-pressure",
                "300 kPa",
                "--format",
                "csv");
        assertEquals(0, csv.exitCode(), csv.err());
        assertTrue(csv.out().contains(String.join(",", NetworkStudyOutput.CASE_NODE_HEADER)), csv.out());
        assertTrue(csv.out().contains("fire,J6,"), csv.out());
        assertTrue(csv.out().contains("below minimum"), csv.out());
        CliRun text =
                CliRun.of("network", "--nodes", NODES, "--links", LINKS, "--cases", CASES, "--min-pressure", "300 kPa");
        assertTrue(text.out().contains("Junction pressures [kPa] by case"), text.out());
        assertTrue(text.out().contains("Index circuit: TANK →"), text.out());
        Path out = dir.resolve("out");
        Path chart = dir.resolve("index.png");
        CliRun files = CliRun.of(
                "network",
                "--nodes",
                NODES,
                "--links",
                LINKS,
                "--cases",
                CASES,
                "--min-pressure",
                "300 kPa",
                "--output",
                out.toString(),
                "--index-chart",
                chart.toString());
        assertEquals(0, files.exitCode(), files.err());
        for (String f : new String[] {
            "network-cases-nodes.csv",
            "network-cases-links.csv",
            "network-pressure-checks.csv",
            "network-terminal-paths.csv"
        }) {
            assertTrue(Files.exists(out.resolve(f)), f);
        }
        byte[] png = Files.readAllBytes(chart);
        // PNG signature (ISO/IEC 15948, §5.2).
        assertEquals((byte) 0x89, png[0]);
        assertEquals("PNG", new String(png, 1, 3, java.nio.charset.StandardCharsets.US_ASCII));
        CliRun again = CliRun.of("network", "--nodes", NODES, "--links", LINKS, "--index-chart", chart.toString());
        assertEquals(2, again.exitCode(), "an existing chart is not replaced without --force");
    }

    @Test
    void aSavedProjectKeepsItsCasesAndLimitsAndSolvesToTheSameNumbers() throws Exception {
        Path project = dir.resolve("hillcrest.json");
        CliRun first = CliRun.of(
                "network",
                "--nodes",
                NODES,
                "--links",
                LINKS,
                "--cases",
                CASES,
                "--min-pressure",
                "300 kPa",
                "--format",
                "json",
                "--save",
                project.toString());
        assertEquals(0, first.exitCode(), first.err());
        String saved = Files.readString(project);
        assertTrue(saved.contains("\"demandCases\"") && saved.contains("\"nodeDemands\""), saved);
        assertTrue(saved.contains("\"pressureLimits\""), saved);
        CliRun again = CliRun.of("solve", project.toString(), "--format", "json");
        assertEquals(0, again.exitCode(), again.err());
        assertEquals(first.out(), again.out());
    }

    @Test
    void aProjectsNamedDemandsAndCategoryMultipliers() throws Exception {
        Path project = dir.resolve("zone.json");
        Files.writeString(project, """
                {"format": "headway-project", "version": 2, "title": "invented zone",
                 "fluid": {"name": "water", "temperature": "15 degC"},
                 "nodes": [
                   {"id": "R", "fixedHead": "60 m"},
                   {"id": "A", "elevation": "20 m", "demand": "2 L/s", "demands": {"trade": "3 L/s"}}],
                 "links": [{"id": "P", "from": "R", "to": "A", "length": "500 m",
                            "innerDiameter": "150 mm", "roughness": "0.045 mm"}],
                 "demandCases": [
                   {"name": "night", "multiplier": 0.5, "demandMultipliers": {"trade": 0.2}},
                   {"name": "fire", "nodeDemands": {"A": "20 L/s"}}]}
                """);
        JsonNode root = json(CliRun.of("solve", project.toString(), "--format", "json"));
        JsonNode cases = root.get("cases");
        // Hand: night = 0.5 × (2 + 0.2 × 3) L/s = 1.3 L/s; fire = 20 L/s at A.
        assertEquals(
                0.0013, cases.get(0).get("nodes").get(1).get("demand_m3_per_s").asDouble(), 1e-15);
        assertEquals(
                0.020, cases.get(1).get("nodes").get(1).get("demand_m3_per_s").asDouble(), 1e-15);
        assertEquals(0.005, root.get("nodes").get(1).get("demand_m3_per_s").asDouble(), 1e-15);
        Files.writeString(project, Files.readString(project).replace("{\"trade\": 0.2}", "{\"garden\": 0.2}"));
        CliRun bad = CliRun.of("solve", project.toString());
        assertEquals(2, bad.exitCode());
        assertTrue(bad.err().contains("demandCases[0] (night)") && bad.err().contains("\"garden\""), bad.err());
    }

    @Test
    void aLineListsNamedDemandColumnsAreScaledByCategory() throws Exception {
        Path nodes = dir.resolve("nodes.csv");
        Files.writeString(
                nodes, "id,elevation [m],demand [L/s],demand_trade [L/s],fixed_head [m]\nR,,,,60\nA,20,2,3,\n");
        Path links = dir.resolve("links.csv");
        Files.writeString(links, "id,from,to,length [m],diameter [mm],roughness [mm]\nP,R,A,500,150,0.045\n");
        Path cases = dir.resolve("cases.csv");
        Files.writeString(cases, "case,multiplier,demand\nnight,0.5,\nnight,0.2,trade\nday,,\n");
        JsonNode root = json(CliRun.of(
                "network",
                "--nodes",
                nodes.toString(),
                "--links",
                links.toString(),
                "--cases",
                cases.toString(),
                "--format",
                "json"));
        // Hand: night = 0.5 × 2 + 0.5 × 0.2 × 3 = 1.3 L/s; day, declared alone, keeps 5 L/s.
        assertEquals(
                0.0013,
                root.get("cases")
                        .get(0)
                        .get("nodes")
                        .get(1)
                        .get("demand_m3_per_s")
                        .asDouble(),
                1e-15);
        assertEquals(
                0.005,
                root.get("cases")
                        .get(1)
                        .get("nodes")
                        .get(1)
                        .get("demand_m3_per_s")
                        .asDouble(),
                1e-15);
    }

    @Test
    void badCaseCellsAreRefusedWithFileLineAndColumn() throws Exception {
        String[][] bad = {
            {"case,multiplier\npeak,1.8\nnight,lots\n", "line 3, column multiplier"},
            {"case,node,value [L/s]\nfire,J99,16\n", "line 2, column node"},
            {"case,node,value [L/s]\nfire,J6,\n", "line 2, column value"},
            {"case,demand,multiplier\nnight,garden,0.5\n", "line 2, column demand"},
            {"case,multiplier\npeak,1.8\npeak,2\n", "line 3, column multiplier"},
            {"case,multiplier,colour\npeak,1.8,red\n", "header, column 3"},
            {"case,node,value\nfire,TANK,10 L/s\n", "line 2, column node"},
            {"case,multiplier\n,1.8\n", "line 2, column case"},
            {"case,multiplier\npeak,-1\n", "line 2, column multiplier"}
        };
        for (String[] b : bad) {
            Path cases = dir.resolve("cases.csv");
            Files.writeString(cases, b[0]);
            CliRun run = CliRun.of("network", "--nodes", NODES, "--links", LINKS, "--cases", cases.toString());
            assertEquals(2, run.exitCode(), b[0]);
            assertTrue(
                    run.err().contains("cases.csv " + b[1]) || run.err().contains("cases.csv" + " " + b[1]),
                    b[0] + " → " + run.err());
        }
        CliRun unit = CliRun.of("network", "--nodes", NODES, "--links", LINKS, "--min-pressure", "300 kg");
        assertEquals(2, unit.exitCode());
        assertTrue(unit.err().contains("--min-pressure"), unit.err());
    }
}
