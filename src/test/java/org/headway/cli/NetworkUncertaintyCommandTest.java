package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code headway network --uncertainty} end to end on an invented branched steel service: the low
 * corner of a tree equals a plain solve of the same line list with every pipe at the high end of its
 * material's roughness range (0.09 mm for new commercial steel in the bundled catalog) and every
 * demand × the high multiplier; keys, files and bad options.
 */
class NetworkUncertaintyCommandTest {

    @TempDir
    Path dir;

    static final String NODES = """
            id,elevation [m],demand [L/s],fixed_head [m]
            SRC,0,,40
            A,2,0.5,
            B,4,1.2,
            C,3,0.8,
            """;

    static final String LINKS = """
            id,from,to,kind,length [m],material,size,schedule
            M1,SRC,A,pipe,140,steel-commercial-new,2,40
            M2,A,B,pipe,160,steel-commercial-new,1-1/2,40
            M3,A,C,pipe,135,steel-commercial-new,1-1/4,40
            """;

    /** The same pipes by explicit bore (ASME B36.10M Sch 40 OD − 2 wall, from memory) and a roughness. */
    static String explicit(String roughnessMm) {
        return "id,from,to,kind,length [m],diameter [mm],roughness [mm]\n"
                + "M1,SRC,A,pipe,140," + (60.3 - 2 * 3.91) + "," + roughnessMm + "\n"
                + "M2,A,B,pipe,160," + (48.3 - 2 * 3.68) + "," + roughnessMm + "\n"
                + "M3,A,C,pipe,135," + (42.2 - 2 * 3.56) + "," + roughnessMm + "\n";
    }

    private CliRun run(String nodes, String links, String... extra) throws Exception {
        Path n = dir.resolve("n-" + Math.abs(nodes.hashCode()) + ".csv");
        Path l = dir.resolve("l-" + Math.abs(links.hashCode()) + ".csv");
        Files.writeString(n, nodes);
        Files.writeString(l, links);
        String[] base = {"network", "--nodes", n.toString(), "--links", l.toString()};
        String[] args = new String[base.length + extra.length];
        System.arraycopy(base, 0, args, 0, base.length);
        System.arraycopy(extra, 0, args, base.length, extra.length);
        return CliRun.of(args);
    }

    @Test
    void theLowCornerOfATreeIsThePlainSolveAtTheRoughEndAndHighDemand() throws Exception {
        CliRun r = run(NODES, LINKS, "--uncertainty", "--demand-range", "0.9:1.2", "--format", "json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode u = new ObjectMapper().readTree(r.out()).get("uncertainty");
        assertEquals("corners", u.get("method").asText());
        assertEquals(3, u.get("solves").asInt());
        String scaled = NODES.replace("0.5,", "0.6,").replace("1.2,", "1.44,").replace("0.8,", "0.96,");
        CliRun rough = run(scaled, explicit("0.09"), "--format", "json");
        assertEquals(0, rough.exitCode(), rough.err());
        JsonNode plain = new ObjectMapper().readTree(rough.out());
        for (JsonNode n : u.get("nodes")) {
            String id = n.get("id").asText();
            if (n.get("fixed_head").asBoolean()) {
                continue;
            }
            double expected = 0;
            for (JsonNode p : plain.get("nodes")) {
                if (p.get("id").asText().equals(id)) {
                    expected = p.get("pressure_pa").asDouble();
                }
            }
            // Solver head tolerance 1e-6 m ≈ 0.01 Pa.
            assertEquals(expected, n.get("pressure_low_pa").asDouble(), 0.05, id);
            assertEquals("low corner", n.get("low_at").asText());
            assertTrue(n.get("pressure_high_pa").asDouble()
                    > n.get("pressure_nominal_pa").asDouble());
        }
        assertTrue(u.get("cautions").toString().contains("uncertainty-corners"));
    }

    @Test
    void aLoopGetsASeededMonteCarloThatRepeatsWithItsSeed() throws Exception {
        String loop = LINKS + "M4,B,C,pipe,90,steel-commercial-new,1,40\n";
        CliRun a = run(NODES, loop, "--uncertainty", "--samples", "12", "--seed", "7", "--format", "json");
        CliRun b = run(NODES, loop, "--uncertainty", "--samples", "12", "--seed", "7", "--format", "json");
        assertEquals(0, a.exitCode(), a.err());
        JsonNode ua = new ObjectMapper().readTree(a.out()).get("uncertainty");
        assertEquals("monte-carlo", ua.get("method").asText());
        assertEquals(15, ua.get("solves").asInt(), "12 samples, the nominal and two corners");
        assertEquals(ua, new ObjectMapper().readTree(b.out()).get("uncertainty"));
        CliRun text = run(
                NODES,
                loop,
                "--uncertainty",
                "--samples",
                "12",
                "--output",
                dir.resolve("o").toString());
        assertEquals(0, text.exitCode(), text.err());
        assertTrue(text.out().contains("Uncertainty (monte-carlo"), text.out());
        List<String> csv = Files.readAllLines(dir.resolve("o").resolve("network-uncertainty.csv"));
        assertEquals(String.join(",", NetworkOutput.UNCERTAINTY_NODE_HEADER), csv.get(0));
        assertEquals(4, csv.size(), "one row per junction");
    }

    @Test
    void badUncertaintyOptionsNameTheOption() throws Exception {
        CliRun noFlag = run(NODES, LINKS, "--samples", "5");
        assertEquals(2, noFlag.exitCode());
        assertTrue(noFlag.err().contains("--samples") && noFlag.err().contains("--uncertainty"), noFlag.err());
        CliRun badRange = run(NODES, LINKS, "--uncertainty", "--demand-range", "1.1");
        assertEquals(2, badRange.exitCode());
        assertTrue(badRange.err().contains("--demand-range"), badRange.err());
        CliRun inverted = run(NODES, LINKS, "--uncertainty", "--demand-range", "1.2:0.8");
        assertEquals(2, inverted.exitCode());
        assertTrue(inverted.err().contains("--demand-range"), inverted.err());
        CliRun zero = run(NODES, LINKS, "--uncertainty", "--samples", "0");
        assertEquals(2, zero.exitCode());
        assertTrue(zero.err().contains("--samples"), zero.err());
    }
}
