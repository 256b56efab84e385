package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code headway network --size} on an invented branched steel service: the chosen sizes against a
 * velocity-only choice made here from ASME B36.10M Schedule 40 bores, the output keys and files, the
 * head budget, and bad options.
 */
class NetworkSizingCommandTest {

    @TempDir
    Path dir;

    /** An invented branched service fed from a fixed head of 40 m. */
    static final String NODES = """
            id,elevation [m],demand [L/s],fixed_head [m]
            SRC,0,,40
            A,2,0.5,
            B,4,1.2,
            C,3,0.8,
            D,6,0.6,
            """;

    static final String LINKS = """
            id,from,to,kind,length [m],material,size,schedule,diameter [mm],roughness [mm]
            M1,SRC,A,pipe,40,steel-commercial-new,4,40,,
            M2,A,B,pipe,60,steel-commercial-new,4,40,,
            M3,A,C,pipe,35,steel-commercial-new,4,40,,
            M5,B,D,pipe,25,steel-commercial-new,4,40,,
            X1,C,D,pipe,30,,,,25,0.05
            """;

    /**
     * Schedule 40 bores (m) = OD − 2 × wall, ASME B36.10M Table 1 (from memory; the same values the
     * bundled table holds), NPS 3/4 to 4.
     */
    static final List<Map.Entry<String, Double>> SCH40 = List.of(
            Map.entry("NPS 3/4 Sch 40", (26.7 - 2 * 2.87) / 1000),
            Map.entry("NPS 1 Sch 40", (33.4 - 2 * 3.38) / 1000),
            Map.entry("NPS 1-1/4 Sch 40", (42.2 - 2 * 3.56) / 1000),
            Map.entry("NPS 1-1/2 Sch 40", (48.3 - 2 * 3.68) / 1000),
            Map.entry("NPS 2 Sch 40", (60.3 - 2 * 3.91) / 1000),
            Map.entry("NPS 2-1/2 Sch 40", (73.0 - 2 * 5.16) / 1000),
            Map.entry("NPS 3 Sch 40", (88.9 - 2 * 5.49) / 1000),
            Map.entry("NPS 4 Sch 40", (114.3 - 2 * 6.02) / 1000));

    private CliRun run(String... extra) throws Exception {
        Path nodes = dir.resolve("nodes.csv");
        Path links = dir.resolve("links.csv");
        Files.writeString(nodes, NODES);
        Files.writeString(links, LINKS);
        String[] base = {"network", "--nodes", nodes.toString(), "--links", links.toString()};
        String[] args = new String[base.length + extra.length];
        System.arraycopy(base, 0, args, 0, base.length);
        System.arraycopy(extra, 0, args, base.length, extra.length);
        return CliRun.of(args);
    }

    /** The smallest Schedule 40 bore whose mean velocity 4Q/(πD²) is at most v. */
    static Map.Entry<String, Double> byVelocity(double q, double v) {
        for (Map.Entry<String, Double> e : SCH40) {
            double d = e.getValue();
            if (Math.abs(q) / (Math.PI * d * d / 4) <= v) {
                return e;
            }
        }
        throw new AssertionError("no size");
    }

    @Test
    void withOnlyTheVelocityBindingEachPipeGetsTheSmallestBoreThatKeepsIt() throws Exception {
        // The gradient limit set far off so that velocity alone decides, which the test can compute.
        // The least bore 20 mm leaves NPS 3/4 (20.96 mm) the smallest candidate, as in the list here.
        CliRun r = run(
                "--size",
                "--max-velocity",
                "1.5 m/s",
                "--max-gradient",
                "1000 m/100m",
                "--min-diameter",
                "20 mm",
                "--format",
                "json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode s = new ObjectMapper().readTree(r.out()).get("sizing");
        assertTrue(s.get("settled").asBoolean());
        assertEquals(1.5, s.get("max_velocity_m_per_s").asDouble(), 0);
        assertEquals(4, s.get("links").size());
        assertEquals("X1", s.get("not_sized").get(0).asText());
        for (JsonNode l : s.get("links")) {
            double q = l.get("flow_m3_per_s").asDouble();
            Map.Entry<String, Double> want = byVelocity(q, 1.5);
            assertEquals(
                    want.getKey(), l.get("chosen_size").asText(), l.get("id").asText());
            assertEquals(want.getValue(), l.get("chosen_diameter_m").asDouble(), 1e-12);
            double d = want.getValue();
            assertEquals(
                    Math.abs(q) / (Math.PI * d * d / 4),
                    l.get("velocity_m_per_s").asDouble(),
                    1e-9);
            assertEquals("NPS 4 Sch 40", l.get("given_size").asText());
            assertEquals("smallest-meeting-limits", l.get("basis").asText());
        }
        // X1 closes a loop C–D, so the flows depend on the sizes (each size above is checked at the sized
        // network's flows); M1's is fixed by continuity: every junction demand passes through it.
        assertEquals(3.1e-3, s.get("links").get(0).get("flow_m3_per_s").asDouble(), 1e-9);
    }

    @Test
    void aHeadBudgetIsReportedAndMetAlongTheIndexCircuit() throws Exception {
        CliRun free = run("--size", "--format", "json");
        assertEquals(0, free.exitCode(), free.err());
        double loss = new ObjectMapper()
                .readTree(free.out())
                .get("sizing")
                .get("index_loss_m")
                .asDouble();
        String budget = (0.7 * loss) + " m";
        CliRun r = run(
                "--size",
                "--head-budget",
                budget,
                "--format",
                "json",
                "--output",
                dir.resolve("out").toString());
        assertEquals(0, r.exitCode(), r.err());
        JsonNode s = new ObjectMapper().readTree(r.out()).get("sizing");
        assertTrue(s.get("within_budget").asBoolean());
        assertTrue(s.get("index_loss_m").asDouble() <= 0.7 * loss * (1 + 1e-9));
        boolean grown = false;
        for (JsonNode l : s.get("links")) {
            grown |= l.get("basis").asText().equals("head-budget");
        }
        assertTrue(grown);
        List<String> csv = Files.readAllLines(dir.resolve("out").resolve("network-sizing.csv"));
        assertEquals(String.join(",", NetworkOutput.SIZING_HEADER).replace("[m3/s]", "[m3/s]"), csv.get(0));
        assertEquals(5, csv.size());
        assertTrue(Files.readString(dir.resolve("out").resolve("network-design.csv"))
                .contains("sizing.within_budget,true"));
    }

    @Test
    void textListsTheSizesWithTheReasonTheNextSizeDownWasRefused() throws Exception {
        CliRun r = run("--size", "--max-gradient", "400 Pa/m");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("Sizing: velocity at most 1.500 m/s"), r.out());
        assertTrue(r.out().contains("above"), r.out());
        assertTrue(r.out().contains("Kept as given"), r.out());
        assertTrue(r.out().contains("local codes"), r.out());
    }

    @Test
    void badSizingOptionsNameTheOption() throws Exception {
        CliRun noSize = run("--max-velocity", "2 m/s");
        assertEquals(2, noSize.exitCode());
        assertTrue(noSize.err().contains("--max-velocity"), noSize.err());
        CliRun bare = run("--size", "--max-gradient", "4");
        assertEquals(2, bare.exitCode());
        assertTrue(bare.err().contains("--max-gradient") && bare.err().contains("unit"), bare.err());
        CliRun negative = run("--size", "--max-velocity", "-1 m/s");
        assertEquals(2, negative.exitCode());
        assertTrue(negative.err().contains("--max-velocity"), negative.err());
        CliRun unknownUnit = run("--size", "--max-gradient", "4 furlongs");
        assertEquals(2, unknownUnit.exitCode());
        assertTrue(unknownUnit.err().contains("furlongs"), unknownUnit.err());
    }
}
