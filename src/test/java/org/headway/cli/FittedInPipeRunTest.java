package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.headway.correlation.FittedCorrelation;
import org.headway.project.FittedCorrelationFile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The engineer's own correlations feed the pipe-run engine: a friction power law and a K(Re) for a
 * component are fitted with {@code headway fit}, saved, and named in a project; {@code headway
 * solve} then uses them and flags use beyond the fitted range.
 */
class FittedInPipeRunTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        out.getBuffer().setLength(0);
        err.getBuffer().setLength(0);
        CommandLine cl = HeadwayCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void fittedFrictionAndComponentLossAreUsedAndFlaggedOutsideTheirRange() throws Exception {
        // Invented rig data: f from a Blasius-like law with a small wiggle, K of a strainer falling with Re.
        StringBuilder csv = new StringBuilder("Re,f,K\n");
        for (int i = 0; i < 20; i++) {
            double re = 5e3 * Math.pow(10, i * 0.1);
            csv.append(String.format(
                    Locale.ROOT,
                    "%s,%s,%s%n",
                    re,
                    0.316 * Math.pow(re, -0.25) * (1 + 0.01 * Math.sin(i)),
                    0.3 + 150 / re));
        }
        Path data = dir.resolve("rig.csv");
        Files.writeString(data, csv);
        assertEquals(
                0,
                run(
                        "fit",
                        data.toString(),
                        "--y",
                        "f",
                        "--x",
                        "Re",
                        "--form",
                        "power",
                        "--save",
                        dir.resolve("pipe-fit.json").toString()),
                err::toString);
        assertEquals(
                0,
                run(
                        "fit",
                        data.toString(),
                        "--y",
                        "K",
                        "--x",
                        "Re",
                        "--expression",
                        "a + b/Re",
                        "--start",
                        "a=0.5,b=100",
                        "--save",
                        dir.resolve("strainer.json").toString()),
                err::toString);

        String project = """
                {
                  "format": "headway-project", "version": 1, "title": "fitted",
                  "fluid": { "name": "water", "temperature": "20 degC" },
                  "flow": "FLOW",
                  "friction": "fitted:pipe-fit.json",
                  "segments": [ { "name": "test line", "length": "30 m", "innerDiameter": "50 mm",
                                  "roughness": "0 mm",
                                  "fittings": [ { "kind": "fitted:strainer.json", "count": 1 } ] } ]
                }
                """;
        Path file = dir.resolve("p.json");
        Files.writeString(file, project.replace("FLOW", "2 L/s")); // Re ≈ 5.1e4, inside 5e3–4e5
        assertEquals(0, run("solve", file.toString(), "--format", "json"), err::toString);
        JsonNode json = new ObjectMapper().readTree(out.toString());
        JsonNode seg = json.get("segments").get(0);
        double re = seg.get("reynolds").asDouble();
        FittedCorrelation f = FittedCorrelationFile.load(dir.resolve("pipe-fit.json"));
        FittedCorrelation k = FittedCorrelationFile.load(dir.resolve("strainer.json"));
        assertEquals(f.evaluate(re), seg.get("friction_factor").asDouble(), 1e-15 * f.evaluate(re) * 4);
        assertEquals(k.evaluate(re), seg.get("loss_coefficient_total").asDouble(), 1e-12);
        assertTrue(out.toString().indexOf("extrapolat") < 0, "no extrapolation inside the range");

        Files.writeString(file, project.replace("FLOW", "40 L/s")); // Re ≈ 1e6, beyond the fitted range
        assertEquals(0, run("solve", file.toString(), "--format", "json"), err::toString);
        assertTrue(out.toString().contains("extrapolat"), out::toString);
    }
}
