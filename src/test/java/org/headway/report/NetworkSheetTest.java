package org.headway.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.headway.cli.HeadwayCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The network sheet of the bundled (invented) village main, read back with independent readers —
 * PDFBox's text extraction for the PDF, Apache POI with its own formula evaluator for the workbook —
 * against the engine's JSON output of the same line list.
 */
class NetworkSheetTest {

    @TempDir
    Path dir;

    private static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = HeadwayCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void theSheetAndWorkbookCarryTheEnginesNumbers() throws Exception {
        Path project = dir.resolve("hillcrest.json");
        String[] saved = run(
                "network",
                "--nodes",
                "fluids-data/examples/network/hillcrest-nodes.csv",
                "--links",
                "fluids-data/examples/network/hillcrest-links.csv",
                "--title",
                "Hillcrest test",
                "--format",
                "json",
                "--save",
                project.toString());
        assertEquals("0", saved[0], saved[2]);
        JsonNode engine = new ObjectMapper().readTree(saved[1]);
        Path pdf = dir.resolve("hill.pdf");
        String[] sheet = run("sheet", project.toString(), "--out", pdf.toString(), "--workbook");
        assertEquals("0", sheet[0], sheet[2]);

        String text;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            text = new PDFTextStripper().getText(doc);
        }
        assertTrue(text.contains("Network head-loss sheet"));
        assertTrue(text.contains("Hillcrest test"));
        assertTrue(text.contains("Todini"), "the method is cited");
        assertTrue(text.contains("local codes"), "the standing caution is printed");
        // Every junction's pressure as the sheet prints it: the engine's, in kPa to 4 significant digits.
        for (JsonNode n : engine.get("nodes")) {
            if (n.get("fixed_head").asBoolean()) {
                continue;
            }
            String kPa = new java.math.BigDecimal(n.get("pressure_pa").asDouble() / 1000)
                    .round(new java.math.MathContext(4))
                    .toPlainString();
            assertTrue(
                    text.contains(n.get("id").asText()) && text.contains(kPa),
                    n.get("id").asText() + " " + kPa);
        }
        String index = engine.get("index_circuit").get("terminal").asText();
        assertTrue(text.contains("Index circuit") && text.contains("→ " + index + ","), text);

        Map<String, JsonNode> links = new HashMap<>();
        engine.get("links").forEach(l -> links.put(l.get("id").asText(), l));
        try (XSSFWorkbook wb = new XSSFWorkbook(dir.resolve("hill.xlsx").toFile())) {
            FormulaEvaluator eval = wb.getCreationHelper().createFormulaEvaluator();
            Sheet ls = wb.getSheet("Links");
            int pipes = 0;
            for (Row row : ls) {
                if (row.getRowNum() == 0) {
                    continue;
                }
                JsonNode l = links.get(row.getCell(0).getStringCellValue());
                assertEquals(l.get("flow_m3_per_s").asDouble(), row.getCell(7).getNumericCellValue(), 0);
                assertEquals(l.get("head_loss_m").asDouble(), row.getCell(9).getNumericCellValue(), 0);
                if (!l.get("kind").asText().equals("pipe")) {
                    continue;
                }
                pipes++;
                Cell v = row.getCell(10);
                // V = Q/(πD²/4) evaluated by POI from the sheet's own cells.
                assertEquals(
                        l.get("velocity_m_per_s").asDouble(),
                        eval.evaluate(v).getNumberValue(),
                        1e-12 * Math.abs(l.get("velocity_m_per_s").asDouble()));
                // The village main's pipes carry no fittings: Darcy–Weisbach with the engine's f is the loss.
                Cell h = row.getCell(12);
                if (h != null && l.get("law").asText().contains("Darcy")) {
                    assertEquals(
                            l.get("head_loss_m").asDouble(),
                            eval.evaluate(h).getNumberValue(),
                            1e-9 * Math.abs(l.get("head_loss_m").asDouble()) + 1e-15);
                }
            }
            assertTrue(pipes > 5);
            Sheet ns = wb.getSheet("Nodes");
            for (Row row : ns) {
                if (row.getRowNum() == 0 || row.getCell(6) == null) {
                    continue;
                }
                // p = ρ g (H − z) recomputed by POI equals the engine's pressure.
                double p = row.getCell(5).getNumericCellValue();
                assertEquals(p, eval.evaluate(row.getCell(6)).getNumberValue(), 1e-9 * Math.abs(p) + 1e-9);
            }
        }
        // The sheet refuses to replace itself without --force.
        assertEquals("2", run("sheet", project.toString(), "--out", pdf.toString())[0]);
        assertTrue(Files.size(pdf) > 10_000);
    }
}
