package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code headway network} on the bundled invented line list: output keys, formats, --save and solve. */
class NetworkCommandTest {

    static final String NODES = "fluids-data/examples/network/hillcrest-nodes.csv";
    static final String LINKS = "fluids-data/examples/network/hillcrest-links.csv";

    @TempDir
    Path dir;

    @Test
    void jsonCarriesTheContractKeysAndBalances() throws Exception {
        CliRun run = CliRun.of("network", "--nodes", NODES, "--links", LINKS, "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode root = new ObjectMapper().readTree(run.out());
        assertTrue(root.get("converged").asBoolean());
        assertTrue(root.get("iterations").asInt() > 0);
        assertTrue(root.has("residuals") && root.get("residuals").has("energy_m"));
        assertTrue(root.get("cautions").size() > 0, "the standing design-review caution at least");
        double supplied = 0;
        double demanded = 0;
        for (JsonNode n : root.get("nodes")) {
            for (String key : new String[] {"id", "head_m", "pressure_pa", "elevation_m", "demand_m3_per_s"}) {
                assertTrue(n.has(key), key);
            }
            if (n.get("fixed_head").asBoolean()) {
                supplied -= n.get("demand_m3_per_s").asDouble();
            } else {
                demanded += n.get("demand_m3_per_s").asDouble();
            }
        }
        // Continuity over the whole network: the reservoir supplies the 15.3 L/s of demands in the list.
        assertEquals(0.0153, demanded, 1e-15);
        assertEquals(demanded, supplied, 1e-12);
        for (JsonNode l : root.get("links")) {
            for (String key : new String[] {"id", "kind", "flow_m3_per_s", "velocity_m_per_s", "head_loss_m"}) {
                assertTrue(l.has(key), key);
            }
            if (l.get("kind").asText().equals("pipe")) {
                assertTrue(l.get("friction_factor").asDouble() > 0);
            }
        }
    }

    @Test
    void savedProjectSolvesToTheSameNumbersAndCsvCarriesThem() throws Exception {
        Path project = dir.resolve("hillcrest.json");
        CliRun first = CliRun.of(
                "network", "--nodes", NODES, "--links", LINKS, "--format", "json", "--save", project.toString());
        assertEquals(0, first.exitCode(), first.err());
        CliRun again = CliRun.of("solve", project.toString(), "--format", "json");
        assertEquals(0, again.exitCode(), again.err());
        assertEquals(first.out(), again.out());
        CliRun refused = CliRun.of("network", "--nodes", NODES, "--links", LINKS, "--save", project.toString());
        assertEquals(2, refused.exitCode());
        assertTrue(refused.err().contains("already exists"), refused.err());
        CliRun csv = CliRun.of("solve", project.toString(), "--format", "csv");
        assertTrue(csv.out().startsWith(String.join(",", NetworkOutput.NODE_HEADER)), csv.out());
        assertTrue(csv.out().contains(String.join(",", NetworkOutput.LINK_HEADER)), csv.out());
        Path out = dir.resolve("out");
        CliRun files = CliRun.of("network", "--nodes", NODES, "--links", LINKS, "--output", out.toString());
        assertEquals(0, files.exitCode(), files.err());
        assertTrue(Files.readString(out.resolve("network-links.csv")).startsWith("id,kind,from,to,flow [m3/s]"));
        assertTrue(Files.exists(out.resolve("network.json")));
    }

    @Test
    void aBadCellIsReportedWithFileLineAndColumn() throws Exception {
        Path links = dir.resolve("links.csv");
        Files.writeString(
                links, Files.readString(Path.of(LINKS)).replace("P3,J2,J3,pipe,300,150", "P3,J2,J3,pipe,3OO,150"));
        CliRun run = CliRun.of("network", "--nodes", NODES, "--links", links.toString());
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("links.csv line 4, column length"), run.err());
    }
}
