package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code sheet --mode flow|size} reports the run at the flow or size {@code solve} finds in that mode. */
class SheetModeTest {

    @TempDir
    Path dir;

    private static String text(Path pdf) throws Exception {
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            return new PDFTextStripper().getText(doc).replace("\uFB02", "fl").replace("\uFB01", "fi");
        }
    }

    @Test
    void flowModeSheetIsAtTheFlowTheSolveFinds() throws Exception {
        String project = "fluids-data/examples/gravity-spring-line.json";
        CliRun solve = CliRun.of("solve", project, "--mode", "flow", "--format", "json");
        assertEquals(0, solve.exitCode(), solve.err());
        double flow =
                new ObjectMapper().readTree(solve.out()).get("flow_m3_per_s").asDouble();
        Path pdf = dir.resolve("flow.pdf");
        CliRun sheet = CliRun.of("sheet", project, "--mode", "flow", "--out", pdf.toString());
        assertEquals(0, sheet.exitCode(), sheet.err());
        String t = text(pdf);
        assertTrue(t.contains("Flow mode"), t);
        // The design-flow row of the inputs shows the solved flow (L/s, 4 significant digits).
        String litres = new java.math.BigDecimal(flow * 1000)
                .round(new java.math.MathContext(4))
                .toPlainString();
        assertTrue(t.contains(litres + " L/s"), litres + " in\n" + t);
    }

    @Test
    void sizeModeSheetIsAtTheChosenSizeWithEveryCandidate() throws Exception {
        String project = "fluids-data/examples/demo-orchard-booster.json";
        CliRun solve = CliRun.of("solve", project, "--mode", "size");
        assertEquals(0, solve.exitCode(), solve.err());
        Path pdf = dir.resolve("size.pdf");
        CliRun sheet = CliRun.of("sheet", project, "--mode", "size", "--out", pdf.toString());
        assertEquals(0, sheet.exitCode(), sheet.err());
        String t = text(pdf);
        java.util.regex.Matcher m = java.util.regex.Pattern.compile(
                        "smallest size meeting the limits: (NPS [^ ]+ Sch \\d+)")
                .matcher(solve.out());
        assertTrue(m.find(), solve.out());
        assertTrue(t.contains("Size mode") && t.contains(m.group(1)), t);
        assertTrue(t.contains("meets the limits") && t.contains("NPS 1/8 Sch 40"), "every candidate listed");
        CliRun noHead = CliRun.of(
                "sheet",
                project,
                "--available-head",
                "5 m",
                "--out",
                dir.resolve("x.pdf").toString());
        assertEquals(2, noHead.exitCode());
    }
}
