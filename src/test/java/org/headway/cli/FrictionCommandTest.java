package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** {@code headway friction}: exit codes and output, single point and batch. */
class FrictionCommandTest {

    @TempDir
    Path folder;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = HeadwayCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void onePointAsText() {
        int code = run("friction", "--re", "1e5", "--relative-roughness", "1e-4", "--method", "colebrook");
        assertEquals(0, code, err::toString);
        // The printed value must parse back to exactly the engine's double (Double.toString round trip);
        // the engine's accuracy itself is checked in Colebrook1939Test against 60-digit values.
        String text = out.toString();
        assertTrue(text.startsWith("Darcy friction factor f = 0.018513866077471"), text);
        double printed =
                Double.parseDouble(text.lines().findFirst().orElseThrow().substring(26));
        assertEquals(
                org.headway.friction.Colebrook1939.solver().evaluate(1e5, 1e-4).frictionFactor(), printed, 0.0);
        assertTrue(text.contains("flow regime           turbulent"), text);
        assertTrue(text.contains("Cautions: none"), text);
        assertEquals("", err.toString());
    }

    @Test
    void textShowsTheCautions() {
        int code = run("friction", "--re", "3000", "--relative-roughness", "0.001");
        assertEquals(0, code, err::toString);
        assertTrue(
                out.toString().contains("[warning] transitional-flow: Re = 3000 is in the transitional range"),
                out::toString);
        assertTrue(out.toString().contains("basis: common practice, no source"), out::toString);
    }

    @Test
    void onePointAsJsonAndCsv() throws IOException {
        assertEquals(
                0, run("friction", "--re", "2000", "--relative-roughness", "0", "--format", "json"), err::toString);
        JsonNode node = new ObjectMapper().readTree(out.toString());
        assertEquals(64.0 / 2000, node.get("friction_factor").asDouble(), 0.0); // Hagen–Poiseuille 64/Re
        assertEquals("laminar", node.get("regime").asText());
        assertEquals(0, node.get("cautions").size());

        out.getBuffer().setLength(0);
        assertEquals(0, run("friction", "--re", "2000", "--relative-roughness", "0", "--format", "csv"));
        assertEquals(
                List.of(
                        "re,relative_roughness,friction_factor,regime,method,cautions,error",
                        "2000.0,0.0,0.032,laminar,laminar,,"),
                out.toString().lines().toList());
    }

    @Test
    void badValueIsExitTwoWithOneLine() {
        assertEquals(2, run("friction", "--re", "-5", "--relative-roughness", "0"));
        assertEquals(
                "headway: reynolds: must be greater than zero, got -5.0",
                err.toString().strip());
        assertEquals("", out.toString());
    }

    @Test
    void unknownMethodIsExitTwo() {
        assertEquals(2, run("friction", "--re", "1e5", "--relative-roughness", "0", "--method", "moody"));
        assertTrue(
                err.toString().startsWith("headway: method: unknown friction method 'moody'; known: auto, laminar,"),
                err::toString);
    }

    @Test
    void missingOptionIsExitTwo() {
        assertEquals(2, run("friction", "--re", "1e5"));
        assertTrue(
                err.toString().startsWith("headway: give both --re and --relative-roughness, or --input FILE"),
                err::toString);
        assertEquals(2, run("friction", "--re", "abc", "--relative-roughness", "0"));
    }

    @Test
    void batchKeepsColumnsMarksTheBadRowAndExitsOne() throws IOException {
        Path input = folder.resolve("points.csv");
        Files.writeString(
                input,
                "tag,re,relative_roughness\n" + "a,1e5,1e-4\n" + "b,-7,1e-4\n" + "c,1500,0\n" + "d,abc,0\n",
                StandardCharsets.UTF_8);
        Path output = folder.resolve("out.csv");
        int code = run("friction", "--input", input.toString(), "--output", output.toString(), "--method", "auto");
        assertEquals(1, code);
        assertEquals(
                "headway: 2 of 4 rows failed (data rows 2, 4; row 1 is the first after the header); see their error column",
                err.toString().strip());
        List<String> lines = Files.readAllLines(output);
        assertEquals("tag,re,relative_roughness,friction_factor,regime,method,cautions,error", lines.get(0));
        assertEquals(
                "a,1e5,1e-4,"
                        + org.headway.friction.Colebrook1939.solver()
                                .evaluate(1e5, 1e-4)
                                .frictionFactor() + ",turbulent,colebrook,,",
                lines.get(1));
        assertEquals("b,-7,1e-4,,,auto,,\"row 2, reynolds: must be greater than zero, got -7.0\"", lines.get(2));
        assertEquals("c,1500,0," + (64.0 / 1500) + ",laminar,laminar,,", lines.get(3)); // Hagen–Poiseuille 64/Re
        assertEquals("d,abc,0,,,auto,,\"row 4, column re: not a number: 'abc'\"", lines.get(4));
        try (Stream<Path> files = Files.list(folder)) {
            assertEquals(2, files.count(), "no temporary file left behind");
        }
    }

    @Test
    void batchToStandardOutputSucceeds() throws IOException {
        Path input = folder.resolve("p.csv");
        Files.writeString(input, "relative_roughness,re\n0.05,3000\n", StandardCharsets.UTF_8);
        assertEquals(0, run("friction", "--input", input.toString()), err::toString);
        List<String> lines = out.toString().lines().toList();
        assertEquals(2, lines.size());
        assertTrue(lines.get(1).endsWith(",transitional,transitional-blend,transitional-flow,"), lines.get(1));
    }

    @Test
    void batchWithoutTheColumnsIsExitTwoAndWritesNothing() throws IOException {
        Path input = folder.resolve("p.csv");
        Files.writeString(input, "reynolds,rr\n1e5,0\n", StandardCharsets.UTF_8);
        Path output = folder.resolve("o.csv");
        assertEquals(2, run("friction", "--input", input.toString(), "--output", output.toString()));
        assertEquals(
                "headway: --input " + input + ": the header row needs a column 're'; found: reynolds, rr",
                err.toString().strip());
        assertFalse(Files.exists(output));
        try (Stream<Path> files = Files.list(folder)) {
            assertEquals(1, files.count(), "no temporary file left behind");
        }
    }

    @Test
    void missingInputFileIsExitTwo() {
        assertEquals(2, run("friction", "--input", folder.resolve("none.csv").toString()));
        assertTrue(err.toString().startsWith("headway: --input: cannot read file"), err::toString);
    }
}
