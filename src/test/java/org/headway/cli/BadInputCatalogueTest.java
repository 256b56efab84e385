package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.headway.caution.InputException;
import org.headway.fluid.UserFluidTable;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The catalogue of bad input in the README ("A catalogue of bad input"): each row there is one test here, with
 * the exact line Headway prints and its exit code. Paths in messages are shown relative to the
 * temporary folder the files live in.
 */
class BadInputCatalogueTest {

    @TempDir
    Path dir;

    private String project;

    @BeforeEach
    void demoProject() throws IOException {
        try (var in = getClass().getResourceAsStream("/org/headway/project/format1/gravity-spring-line.json")) {
            project = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    /** Runs the command line and returns "exit N: stderr" with the folder prefix removed. */
    private String run(String... args) {
        CliRun r = CliRun.of(args);
        return "exit " + r.exitCode() + ": " + r.err().strip().replace(dir + "/", "");
    }

    private String file(String name, String content) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, content, StandardCharsets.UTF_8);
        return p.toString();
    }

    @Test
    void projectWithATypoInAKey() throws IOException {
        String p = file("line.json", project.replace("\"flow\":", "\"flwo\":"));
        assertEquals(
                "exit 2: headway: line.json flwo: unknown key; expected one of format, version, title, reference, fluid, flow, flowUncertainty, friction, segments, ends, pump, limits, sizing, curve",
                run("solve", p));
    }

    @Test
    void projectThatIsNotJson() throws IOException {
        String p = file("line.json", project.substring(0, 200));
        assertEquals(
                "exit 2: headway: line.json line 5, column 62: not valid JSON: Unexpected end-of-input within/between Object entries",
                run("solve", p));
    }

    @Test
    void projectTemperatureWithAnAmbiguousUnit() throws IOException {
        String p = file("line.json", project.replace("\"8 degC\"", "\"46 F\""));
        assertEquals(
                "exit 2: headway: line.json: fluid.temperature: unit \"F\" in \"46 F\" is ambiguous (farad or Fahrenheit?): write °F or degF",
                run("solve", p));
    }

    @Test
    void projectLengthInTheWrongUnit() throws IOException {
        String p = file("line.json", project.replace("\"640 m\"", "\"640 L/s\""));
        assertEquals(
                "exit 2: headway: line.json: segments[1].length: length expected, got \"640 L/s\" (volumetric flow)",
                run("solve", p));
    }

    @Test
    void projectWithANegativeLength() throws IOException {
        String p = file("line.json", project.replace("\"640 m\"", "\"-640 m\""));
        assertEquals(
                "exit 2: headway: line.json: segments[1].length: must not be negative, got -640.0", run("solve", p));
    }

    @Test
    void unknownOption() {
        assertEquals(
                "exit 2: headway: Unknown options: '--rough', '0.001' (try 'headway friction --help')",
                run("friction", "--re", "1e5", "--rough", "0.001"));
    }

    @Test
    void optionValueThatIsNotANumber() {
        assertEquals(
                "exit 2: headway: Invalid value for option '--re': 'lots' is not a double (try 'headway friction --help')",
                run("friction", "--re", "lots", "--relative-roughness", "0.001"));
    }

    @Test
    void waterAboveItsBoilingPoint() {
        assertEquals(
                "exit 2: headway: pressure: water boils at 393.15 K (120 °C): pressure 101325 Pa is below the vapour pressure 198665 Pa",
                run("fluid", "water", "-t", "120degC"));
    }

    @Test
    void frictionBatchWithoutTheReynoldsColumn() throws IOException {
        String in = file("points.csv", "reynolds,relative_roughness\n1e5,0.001\n");
        assertEquals(
                "exit 2: headway: --input points.csv: the header row needs a column 're'; found: reynolds, relative_roughness",
                run("friction", "--input", in));
    }

    @Test
    void frictionBatchWithABadRow() throws IOException {
        String in = file("points.csv", "re,relative_roughness\n1e5,0.001\nNaN,0.001\n");
        assertEquals(
                "exit 1: headway: 1 of 2 rows failed (data rows 2; row 1 is the first after the header); see their error column",
                run(
                        "friction",
                        "--input",
                        in,
                        "--output",
                        dir.resolve("out.csv").toString()));
    }

    @Test
    void frictionBatchWithAnEndlessLine() throws IOException {
        Path in = dir.resolve("points.csv");
        try (Writer w = Files.newBufferedWriter(in)) {
            w.write("re,relative_roughness\n");
            for (int i = 0; i < 11; i++) {
                w.write("9".repeat(100_000));
            }
        }
        assertEquals(
                "exit 2: headway: --input points.csv line 2: line is longer than 1000000 characters; is this a CSV file with one record per line?",
                run("friction", "--input", in.toString()));
    }

    @Test
    void catalogFittingWithAnUnknownMethod() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("catalog"));
        Files.writeString(
                folder.resolve("fittings.csv"),
                "# source: our test rig\nid,description,method,k,k1,k_inf,k_d,source\n"
                        + "strainer,Y strainer,4-k,,,,,rig\n");
        assertEquals(
                "exit 2: headway: catalog/fittings.csv line 3, column method: unknown method '4-k'; expected one of fixed, 2-k, 3-k",
                run("catalog", "fittings", "--catalog", folder.toString()));
    }

    @Test
    void catalogWithADuplicateId() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("catalog"));
        Files.writeString(
                folder.resolve("fittings.csv"),
                "# source: our test rig\nid,description,method,k,k1,k_inf,k_d,source\n"
                        + "strainer,Y strainer,fixed,2,,,,rig\nstrainer,Y strainer,fixed,3,,,,rig\n");
        assertEquals(
                "exit 2: headway: catalog/fittings.csv line 4: duplicate id 'strainer', first given on line 3",
                run("catalog", "fittings", "--catalog", folder.toString()));
    }

    @Test
    void fluidTableWithTemperaturesOutOfOrder() throws IOException {
        Path table = dir.resolve("brine.csv");
        Files.writeString(table, UserFluidTable.CELSIUS_HEADER + "\n10, 1030, 2.0\n5, 1031, 2.4\n");
        InputException e =
                org.junit.jupiter.api.Assertions.assertThrows(InputException.class, () -> UserFluidTable.load(table));
        assertEquals(
                "brine.csv line 3, column temperature: temperatures must increase row by row, got 5",
                e.getMessage().replace(dir + "/", ""));
    }

    @Test
    void fitWithAnUnknownForm() throws IOException {
        String data = file("rig.csv", "Re,f\n4000,0.04\n10000,0.031\n40000,0.022\n");
        assertEquals(
                "exit 2: headway: --form: unknown form 'cubic'; use constant, linear, through-origin, log, power, power-log, exponential, polynomial:N or power-product",
                run("fit", data, "--y", "f", "--x", "Re", "--form", "cubic"));
    }

    @Test
    void fitWithAnExpressionThatDoesNotParse() throws IOException {
        String data = file("rig.csv", "Re,f\n4000,0.04\n10000,0.031\n40000,0.022\n");
        assertEquals(
                "exit 2: headway: expression column 8: expected ')' to close the '(' at column 6 but found the end of the expression in \"a*Re^(b\"",
                run("fit", data, "--y", "f", "--x", "Re", "--expression", "a*Re^(b", "--start", "a=0.3,b=-0.25"));
    }

    @Test
    void fitDataWithTextInANumberColumn() throws IOException {
        String data = file("rig.csv", "Re,f\n4000,0.04\n10000,n/a\n40000,0.022\n");
        assertEquals(
                "exit 2: headway: rig.csv line 3, column f: 'n/a' is not a number",
                run("fit", data, "--y", "f", "--x", "Re", "--form", "power"));
    }

    @Test
    void fittedCorrelationFileThatIsNotJson() throws IOException {
        String fit = file("rig-fit.json", "{\"format\": \"headway-fitted-correlation\",");
        String p =
                file("line.json", project.replace("\"friction\": \"auto\"", "\"friction\": \"fitted:rig-fit.json\""));
        assertEquals(
                "exit 2: headway: line.json: friction: rig-fit.json line 1, column 41: not valid JSON: Unexpected end-of-input within/between Object entries",
                run("solve", p));
    }
}
