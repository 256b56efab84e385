package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code headway rig} on the bundled, INVENTED demo rig copied to a folder, and on bad input. */
class RigCommandTest {

    @TempDir
    Path dir;

    private Path rig;

    @BeforeEach
    void copyDemo() throws IOException {
        for (String name : List.of("demo-rig.json", "demo-rig-points.csv")) {
            try (InputStream in = getClass().getResourceAsStream("/fluids-data/examples/" + name)) {
                Files.copy(in, dir.resolve(name));
            }
        }
        rig = dir.resolve("demo-rig.json");
    }

    @Test
    void textShowsSummaryRoughnessUncertaintyAndCautions() {
        CliRun run = CliRun.of("rig", rig.toString());
        assertEquals(0, run.exitCode(), run.err());
        String out = run.out();
        assertTrue(out.contains("Summary: 25 points (5 laminar, 3 transitional, 17 turbulent)"), out);
        assertTrue(out.contains("Effective roughness (Colebrook–White fitted to 17 turbulent points):"), out);
        assertTrue(out.contains("dominant contributor to u(f): "), out);
        assertTrue(out.contains("[warning] 3 points lie in the transitional range"), out);
        assertEquals(
                25 + 1,
                out.lines()
                        .filter(l -> l.matches("\\s+\\d+\\s+[\\d.]+\\s.*|\\s+line\\s.*"))
                        .count(),
                out);
        assertEquals("", run.err());
    }

    @Test
    void jsonAgreesWithTheTextAndHoldsEveryPoint() throws IOException {
        CliRun run = CliRun.of("rig", rig.toString(), "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode root = new ObjectMapper().readTree(run.out());
        assertEquals(25, root.get("summary").get("points").asInt());
        assertEquals(25, root.get("points").size());
        assertEquals(0, root.get("points_omitted").asInt());
        JsonNode er = root.get("effective_roughness");
        assertEquals("determined", er.get("status").asText());
        // Generated truth of the INVENTED demo data: ε = 0.15 mm.
        assertTrue(er.get("ci95_low_m").asDouble() <= 0.15e-3
                && 0.15e-3 <= er.get("ci95_high_m").asDouble());
        JsonNode first = root.get("points").get(0);
        assertEquals(7, first.get("line").asInt());
        assertEquals("R01", first.get("carried").get("run").asText());
        double f = first.get("friction_factor").asDouble();
        assertEquals(
                f / first.get("reference_friction_factor").asDouble() - 1,
                first.get("deviation").asDouble(),
                1e-12);
    }

    @Test
    void csvWritesEveryRowAndTheSummaryAsComments() {
        CliRun run = CliRun.of("rig", rig.toString(), "--format", "csv");
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = run.out().lines().toList();
        assertTrue(lines.get(0).startsWith("line,flow [L/s],dp [kPa],T [°C],"), lines.get(0));
        assertTrue(lines.get(0).endsWith(",run"), lines.get(0));
        assertEquals(25, lines.stream().filter(l -> l.matches("\\d+,.*")).count());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("# effective roughness: ε = ")), run.out());
    }

    /**
     * The CSV gives back the flow, pressure drop and temperature exactly as the data file wrote
     * them (the input file itself is the reference): converting °C → K → °C must not print binary
     * noise such as 18.00999999999999.
     */
    @Test
    void csvEchoesTheMeasuredValuesWithoutConversionNoise() throws IOException {
        CliRun run = CliRun.of("rig", rig.toString(), "--format", "csv");
        assertEquals(0, run.exitCode(), run.err());
        List<String> in = Files.readAllLines(dir.resolve("demo-rig-points.csv")).stream()
                .filter(l -> !l.startsWith("#") && !l.startsWith("flow"))
                .toList();
        List<String> out = run.out().lines().filter(l -> l.matches("\\d+,.*")).toList();
        assertEquals(in.size(), out.size());
        for (int i = 0; i < in.size(); i++) {
            String[] given = in.get(i).split(",");
            String[] echoed = out.get(i).split(",");
            for (int c = 0; c < 3; c++) {
                assertEquals(Double.parseDouble(given[c]), Double.parseDouble(echoed[c + 1]), 0.0, out.get(i));
                assertTrue(echoed[c + 1].length() <= given[c].length() + 2, out.get(i));
            }
        }
    }

    @Test
    void longTablesAreCappedInTextButNotInCsv() throws IOException {
        StringBuilder csv = new StringBuilder("flow [L/s],dp [kPa]\n");
        for (int i = 0; i < 100; i++) {
            double q = 0.2 + 0.01 * i;
            csv.append(String.format(Locale.ROOT, "%.4f,%.4f%n", q, 2.0 * q * q));
        }
        Files.writeString(dir.resolve("many.csv"), csv);
        Path many = dir.resolve("many.json");
        Files.writeString(many, """
                { "format": "headway-rig", "version": 1, "data": "many.csv", "innerDiameter": "20.9 mm",
                  "tapSpacing": "2 m", "roughness": "0 mm", "fluid": { "name": "water", "temperature": "20 degC" } }
                """);
        CliRun text = CliRun.of("rig", many.toString());
        assertEquals(0, text.exitCode(), text.err());
        assertTrue(text.out().contains("… 60 more points; use --format csv for every point"), text.out());
        CliRun all = CliRun.of("rig", many.toString(), "--format", "csv");
        assertEquals(100, all.out().lines().filter(l -> l.matches("\\d+,.*")).count());
    }

    @Test
    void badInputIsOneLineAndExitTwo() throws IOException {
        Files.writeString(rig, Files.readString(rig).replace("\"tapSpacing\"", "\"tapSpaceing\""));
        CliRun run = CliRun.of("rig", rig.toString());
        assertEquals(2, run.exitCode());
        assertEquals(
                "headway: " + rig + ": $.tapSpaceing: unknown key; allowed keys are [columns, compareWith, data,"
                        + " fluid, format, innerDiameter, name, note, roughness, tapSpacing, uncertainty, version]",
                run.err().strip());
        assertEquals("", run.out());
    }

    @Test
    void usCustomaryUnitsInTheTable() {
        CliRun run = CliRun.of("rig", rig.toString(), "--units", "us");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("Q [gpm]"), run.out());
        assertTrue(run.out().contains("Δp [psi]"), run.out());
        assertTrue(run.out().contains("T [°F]"), run.out());
        // 20.9 mm = 0.8228 in (1 in = 25.4 mm exactly).
        assertTrue(run.out().contains("bore 0.8228 in"), run.out());
    }

    @Test
    void unknownFormatIsRefused() {
        CliRun run = CliRun.of("rig", rig.toString(), "--format", "xml");
        assertEquals(2, run.exitCode());
        assertEquals(
                "headway: --format: expected text, json or csv, got \"xml\"",
                run.err().strip());
    }
}
