package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.headway.correlation.FittedCorrelation;
import org.headway.fitting.FitForm;
import org.headway.fitting.FitResult;
import org.headway.fitting.LeastSquaresFitter;
import org.headway.fitting.Observations;
import org.headway.project.FittedCorrelationFile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code headway fit} end to end. */
class FitCommandTest {

    @TempDir
    Path dir;

    /** Misra1a data (NIST StRD, see nist-strd/SOURCE.md), first 8 points, as a user CSV. */
    private Path misraCsv() throws Exception {
        Path csv = dir.resolve("misra.csv");
        Files.writeString(
                csv,
                "y [-],x [-]\n10.07,77.6\n14.73,114.9\n17.94,141.1\n23.93,190.8\n29.61,239.9\n35.18,289.0\n"
                        + "40.02,332.8\n44.82,378.4\n");
        return csv;
    }

    @Test
    void expressionFitPrintsJsonThatMatchesTheEngineExactly() throws Exception {
        Path csv = misraCsv();
        CliRun run = CliRun.of(
                "fit",
                csv.toString(),
                "--y",
                "y",
                "--x",
                "x",
                "--expression",
                "b1*(1-exp(-b2*x))",
                "--start",
                "b1=500,b2=1e-4",
                "--format",
                "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        double[] x = {77.6, 114.9, 141.1, 190.8, 239.9, 289.0, 332.8, 378.4};
        double[] y = {10.07, 14.73, 17.94, 23.93, 29.61, 35.18, 40.02, 44.82};
        FitResult direct = new LeastSquaresFitter()
                .fit(
                        Observations.of("y", y, List.of("x"), x),
                        new FitForm.UserExpression("b1*(1-exp(-b2*x))", FitCommand.parseStart("b1=500,b2=1e-4")));
        // Shortest round-trip decimal: the JSON value parses back to the identical double.
        assertEquals(
                direct.parameters().get(0).value(),
                json.get("parameters").get(0).get("value").doubleValue(),
                0.0);
        assertEquals(
                direct.parameters().get(1).standardError(),
                json.get("parameters").get(1).get("standard_error").doubleValue(),
                0.0);
        for (String key : List.of(
                "residual_sum_of_squares",
                "residual_standard_deviation",
                "r_squared",
                "adjusted_r_squared",
                "degrees_of_freedom",
                "iterations",
                "converged",
                "cautions")) {
            assertTrue(json.has(key), key);
        }
        assertEquals(6, json.get("degrees_of_freedom").intValue());
        assertTrue(json.get("converged").booleanValue());
        assertTrue(json.get("parameters").get(0).has("ci95_low"));
    }

    @Test
    void compareRanksFormsAndSavesTheBest() throws Exception {
        Path csv = dir.resolve("blasius.csv");
        StringBuilder s = new StringBuilder("Re [-],f [-]\n");
        // Blasius (1913) f = 0.3164 Re^−0.25 (from memory), with a fixed ±1 % zig-zag.
        for (int i = 0; i < 15; i++) {
            double re = 4000 * Math.pow(25, i / 14.0);
            s.append(re)
                    .append(',')
                    .append(0.3164 * Math.pow(re, -0.25) * (1 + 0.01 * (i % 2 == 0 ? 1 : -1)))
                    .append('\n');
        }
        Files.writeString(csv, s.toString());
        Path saved = dir.resolve("fit.json");
        CliRun run = CliRun.of("fit", csv.toString(), "--y", "f", "--x", "Re", "--compare", "--save", saved.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("1    power"), run.out());
        FittedCorrelation fit = FittedCorrelationFile.load(saved);
        assertEquals("a*Re^b", fit.expressionText());
        assertEquals(-0.25, fit.parameters().get(1).value(), 0.01);
    }

    /**
     * Columns not named by --y, --x or --weights are not read, so text columns (a regime, a run
     * label) do not stop a fit. The data lie exactly on y = 3 + 2x, so the linear fit must return
     * those (closed form: a straight line through exact points is itself).
     */
    @Test
    void columnsNotNamedAreIgnoredEvenWhenTheyHoldText() throws Exception {
        Path csv = dir.resolve("rig-out.csv");
        Files.writeString(
                csv,
                "line,x [-],regime,y [-],dominant_f,run\n"
                        + "7,1,laminar,5,pressure drop,R01\n"
                        + "8,2,transitional,7,flow,R02\n"
                        + "9,4,turbulent,11,temperature,R03\n");
        CliRun run = CliRun.of("fit", csv.toString(), "--y", "y", "--x", "x", "--form", "linear", "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        assertEquals(3.0, json.get("parameters").get(0).get("value").doubleValue(), 1e-12);
        assertEquals(2.0, json.get("parameters").get(1).get("value").doubleValue(), 1e-12);
        // a text cell in a column that IS named is still refused, naming it
        CliRun bad = CliRun.of("fit", csv.toString(), "--y", "y", "--x", "regime", "--form", "linear");
        assertEquals(2, bad.exitCode());
        assertEquals(
                "headway: " + csv + " line 2, column regime: 'laminar' is not a number",
                bad.err().trim());
    }

    /** The bundled demo rig points (with a text "run" column) fit as they are. */
    @Test
    void bundledDemoRigPointsFit() {
        // surefire runs in the project folder, where fluids-data/ is the source of truth
        CliRun run = CliRun.of(
                "fit", "fluids-data/examples/demo-rig-points.csv", "--y", "dp", "--x", "flow", "--form", "power");
        assertEquals(0, run.exitCode(), run.err());
    }

    @Test
    void badCellNamesFileLineColumnAndValue() throws Exception {
        Path csv = dir.resolve("bad.csv");
        Files.writeString(csv, "Re,f\n4000,0.04\n8000,0.0x3\n");
        CliRun run = CliRun.of("fit", csv.toString(), "--y", "f", "--x", "Re", "--form", "linear");
        assertEquals(2, run.exitCode());
        assertEquals(
                "headway: " + csv + " line 3, column f: '0.0x3' is not a number",
                run.err().trim());
    }

    @Test
    void unknownColumnAndFormAreBadInput() throws Exception {
        Path csv = misraCsv();
        CliRun column = CliRun.of("fit", csv.toString(), "--y", "y", "--x", "Re", "--form", "linear");
        assertEquals(2, column.exitCode());
        assertTrue(column.err().contains("no column 'Re'"), column.err());
        CliRun form = CliRun.of("fit", csv.toString(), "--y", "y", "--x", "x", "--form", "cubic");
        assertEquals(2, form.exitCode());
        assertTrue(form.err().contains("unknown form 'cubic'"), form.err());
        CliRun expr = CliRun.of(
                "fit",
                csv.toString(),
                "--y",
                "y",
                "--x",
                "x",
                "--expression",
                "b1*(1-exp(-b2*x)",
                "--start",
                "b1=1,b2=1");
        assertEquals(2, expr.exitCode());
        assertTrue(expr.err().contains("expression column 17"), expr.err());
    }

    @Test
    void textOutputShowsParametersAndCautions() throws Exception {
        Path csv = misraCsv();
        CliRun run = CliRun.of("fit", csv.toString(), "--y", "y", "--x", "x", "--form", "power-log");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("Model: y = a*x^b"), run.out());
        assertTrue(run.out().contains("log-space-retransformation"), run.out());
        assertTrue(run.out().contains("Fitted range: x from 77.6000 to 378.400"), run.out());
    }

    @Test
    void exhaustedBudgetPrintsTheResultAndExitsOne() throws Exception {
        Path csv = misraCsv();
        CliRun run = CliRun.of(
                "fit",
                csv.toString(),
                "--y",
                "y",
                "--x",
                "x",
                "--expression",
                "b1*(1-exp(-b2*x))",
                "--start",
                "b1=500,b2=1e-4",
                "--max-iterations",
                "1");
        assertEquals(1, run.exitCode(), run.err());
        assertTrue(run.out().contains("converged: NO"), run.out());
        assertTrue(run.out().contains("fit-not-converged"), run.out());
    }

    @Test
    void weightsColumnIsUsed() throws Exception {
        // Weighted mean Σwy/Σw = (1·1 + 3·2 + 0.5·4)/4.5 (definition; common practice, no source).
        Path csv = dir.resolve("w.csv");
        Files.writeString(csv, "y,w\n1,1\n2,3\n4,0.5\n");
        CliRun run = CliRun.of(
                "fit", csv.toString(), "--y", "y", "--form", "constant", "--weights", "w", "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        assertEquals(9.0 / 4.5, json.get("parameters").get(0).get("value").doubleValue(), 1e-15);
        CliRun bad = CliRun.of("fit", csv.toString(), "--y", "y", "--form", "constant", "--weights", "y2");
        assertEquals(2, bad.exitCode());
    }
}
