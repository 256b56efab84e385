package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.headway.Fuzz;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Command-line arguments fuzzed: 10,000 random argument vectors per run over every subcommand
 * (their own options with good, bad and nasty values, other commands' options, stray words,
 * control characters). The exit code is 0, 1 or 2; on 2 exactly one line goes to stderr; never an
 * "internal error" (the handler for bugs), never a stack trace, never a hang. Every file argument
 * points into a temporary folder, and {@code demo} and {@code sheet} always get an output folder
 * there too, so the fuzz writes nothing into the working tree.
 */
class CliArgumentsFuzzTest {

    static final int INPUTS = 10_000;
    static final long SEED = 8_707L;
    /** Per-vector budget (ms): a valid sheet run writes a PDF, which takes longer than a parse. */
    static final long PER_INPUT_BUDGET_MS = 15_000;

    private static final String[] COMMANDS = {
        "demo", "solve", "sheet", "friction", "fluid", "catalog", "fit", "groups", "help"
    };

    private static final String[] OPTIONS = {
        "--re",
        "--relative-roughness",
        "--method",
        "--format",
        "--input",
        "--output",
        "--list",
        "-t",
        "--temperature",
        "-p",
        "--pressure",
        "--units",
        "--filter",
        "--table",
        "--schedule",
        "--catalog",
        "--mode",
        "--available-head",
        "--curve",
        "--out",
        "--workbook",
        "--csv",
        "--force",
        "--y",
        "--x",
        "--form",
        "--expression",
        "--start",
        "--weights",
        "--max-iterations",
        "--compare",
        "--save",
        "--var",
        "--repeating",
        "--help",
        "-h",
        "--version",
        "-V",
        "--",
        "-",
        "--re=",
        "--nope",
        "-x"
    };

    private static final String[] WORDS = {
        "water",
        "seawater",
        "seawater:40",
        "ethylene-glycol-30",
        "materials",
        "sizes",
        "fittings",
        "asme-b36.10m",
        "40",
        "STD",
        "auto",
        "colebrook",
        "haaland",
        "blasius",
        "laminar",
        "nope",
        "text",
        "csv",
        "json",
        "si",
        "us",
        "headloss",
        "flow",
        "size",
        "25degC",
        "77degF",
        "298.15",
        "250kPa",
        "2.4bar",
        "35psi",
        "1 m",
        "12 L/s",
        "0 L/s:20 L/s:11",
        "0:1:0",
        "1:2:999999999",
        "a:b:c",
        "1e5",
        "0.0001",
        "0",
        "-1",
        "power",
        "linear",
        "polynomial:3",
        "polynomial:-1",
        "polynomial:99999",
        "power-product",
        "compare",
        "a*x^b",
        "a*exp(-b*x)+c",
        "a=1,b=0.1,c=0",
        "a=",
        "=1",
        "x",
        "y",
        "Re",
        "f",
        "rho:kg/m^3",
        "v:m/s",
        "D:m",
        "mu:Pa*s",
        "dp:Pa",
        "rho",
        "v",
        "D",
        "10",
        "1",
        "2",
        "100000000",
        "2147483648",
        "",
        " ",
        "\n",
        "\t",
        "\u0000",
        "é",
        "∞",
        "-1e309",
        "@nonexistent-args-file",
        "%n%s",
        "${env:HOME}",
        "..",
        "/"
    };

    @Test
    void everyArgumentVectorExitsCleanly(@TempDir Path dir) throws Exception {
        Files.copy(resource("/fluids-data/examples/demo-orchard-booster.json"), dir.resolve("project.json"));
        Files.writeString(dir.resolve("points.csv"), "re,relative_roughness\n1e5,1e-4\n2000,0\n");
        StringBuilder fit = new StringBuilder("x,y,w\n");
        for (int i = 1; i <= 12; i++) {
            fit.append(i)
                    .append(',')
                    .append(2.0 * Math.pow(i, 0.7) + 0.01 * (i % 3))
                    .append(",1\n");
        }
        Files.writeString(dir.resolve("data.csv"), fit.toString());
        Files.writeString(dir.resolve("bad.json"), "{\"format\": 1");
        Path catalog = Files.createDirectory(dir.resolve("catalog"));
        Files.writeString(
                catalog.resolve("fittings.csv"),
                "# source: test\nid,description,method,k,k1,k_inf,k_d,source\n"
                        + "my-valve,My valve,fixed,2.5,,,,test\n");
        Files.createDirectory(dir.resolve("empty"));
        String[] paths = {
            dir.resolve("project.json").toString(),
            dir.resolve("points.csv").toString(),
            dir.resolve("data.csv").toString(),
            dir.resolve("bad.json").toString(),
            dir.resolve("missing.csv").toString(),
            catalog.toString(),
            dir.resolve("empty").toString(),
            dir.toString(),
            dir.resolve("out.csv").toString(),
            dir.resolve("fit.json").toString(),
            dir.resolve("sheet.pdf").toString(),
            dir.resolve("no-such-folder").resolve("x.pdf").toString()
        };
        Random random = new Random(SEED);
        CommandLine cl = HeadwayCommand.commandLine();
        int[] exits = new int[3];
        for (int i = 0; i < INPUTS; i++) {
            List<String> args = generate(random, paths);
            guardOutputs(args, dir);
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            cl.setOut(new PrintWriter(out));
            cl.setErr(new PrintWriter(err));
            long start = System.nanoTime();
            int code = cl.execute(args.toArray(String[]::new));
            long ms = (System.nanoTime() - start) / 1_000_000;
            String e = err.toString();
            String m = "case " + i + " (seed " + SEED + ") args " + show(args) + " exit " + code + ", stderr:\n" + e;
            assertTrue(ms < PER_INPUT_BUDGET_MS, m + "\ntook " + ms + " ms");
            assertTrue(code >= 0 && code <= 2, m);
            assertFalse(e.contains("internal error") || e.contains("\tat "), m);
            if (code == 2) {
                assertEquals(1, e.lines().count(), m);
                assertTrue(e.startsWith("headway: "), m);
            }
            exits[code]++;
        }
        org.headway.Fuzz.summary("CLI arguments fuzz: " + INPUTS + " argument vectors, " + exits[2]
                + " rejected (exit 2, one located line), " + exits[1] + " exit 1, " + exits[0] + " exit 0");
        assertTrue(exits[0] > 0 && exits[2] > 0, "both outcomes must be exercised");
    }

    private static List<String> generate(Random random, String[] paths) {
        List<String> args = new ArrayList<>();
        int lead = random.nextInt(20);
        if (lead == 0) {
            args.add(WORDS[random.nextInt(WORDS.length)]);
        } else if (lead > 1) {
            args.add(COMMANDS[random.nextInt(COMMANDS.length)]);
        }
        // A bare "demo" writes a whole sheet; give it something to parse most of the time.
        int n = random.nextInt(9) + (args.contains("demo") && random.nextInt(10) > 0 ? 1 : 0);
        for (int k = 0; k < n; k++) {
            switch (random.nextInt(10)) {
                case 0, 1, 2 -> args.add(OPTIONS[random.nextInt(OPTIONS.length)]);
                case 3, 4 -> args.add(WORDS[random.nextInt(WORDS.length)]);
                case 5, 6 -> args.add(paths[random.nextInt(paths.length)]);
                case 7 -> args.add(Fuzz.nastyNumber(random));
                case 8 -> args.add(OPTIONS[random.nextInt(OPTIONS.length)] + "=" + WORDS[random.nextInt(WORDS.length)]);
                default -> args.add(Fuzz.randomText(random, "-=abcxyz019.:/ \n", 12));
            }
        }
        return args;
    }

    /** Sends every output (and the default outputs of demo and sheet) into the temporary folder. */
    private static void guardOutputs(List<String> args, Path dir) {
        args.removeIf(a -> a.startsWith("--reports"));
        String safe = dir.resolve("written").toString();
        for (int k = 0; k < args.size(); k++) {
            String a = args.get(k);
            for (String option : new String[] {"--out", "--output", "--save"}) {
                if (a.equals(option) && k + 1 < args.size() && !args.get(k + 1).startsWith(dir.toString())) {
                    args.set(k + 1, safe);
                } else if (a.startsWith(option + "=") && !a.startsWith(option + "=" + dir)) {
                    args.set(k, option + "=" + safe);
                }
            }
        }
        int demo = args.indexOf("demo");
        if (demo >= 0) {
            args.add(demo + 1, "--reports");
            args.add(demo + 2, dir.resolve("reports").toString());
        }
        int sheet = args.indexOf("sheet");
        if (sheet >= 0 && !args.contains("--out")) {
            args.add(sheet + 1, "--out");
            args.add(sheet + 2, dir.resolve("sheet-default.pdf").toString());
        }
    }

    private static String show(List<String> args) {
        List<String> shown = new ArrayList<>();
        for (String a : args) {
            shown.add("'" + a.replace("\n", "\\n") + "'");
        }
        return shown.toString();
    }

    private static InputStream resource(String name) {
        InputStream in = CliArgumentsFuzzTest.class.getResourceAsStream(name);
        if (in == null) {
            throw new IllegalStateException("missing test resource " + name);
        }
        return in;
    }
}
