package org.headway.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.system.RunResult;
import org.headway.system.SegmentResult;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The head-loss sheet, checked by reading back what was written with independent readers. */
class SheetTest {

    /** Formula cells must reproduce the engine to this relative tolerance (issue requirement). */
    private static final double FORMULA_TOLERANCE = 1e-9;

    private static String demoJson;

    @BeforeAll
    static void readDemo() throws Exception {
        try (InputStream in = SheetTest.class.getResourceAsStream("/fluids-data/examples/demo-orchard-booster.json")) {
            demoJson = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private static HeadLossSheet sheet(String json) {
        Project p = ProjectFile.parse(json);
        return HeadLossSheet.of(ProjectResolver.resolve(p, Catalog.bundled(), Path.of(".")), "test");
    }

    @Test
    void pdfCarriesTotalsCitationsAndCautionsWithEmbeddedFonts(@TempDir Path dir) throws Exception {
        HeadLossSheet s = sheet(demoJson);
        Path pdf = dir.resolve("sheet.pdf");
        PdfSheetWriter.write(s, pdf, false, UnitSystem.SI);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            int pages = doc.getNumberOfPages();
            assertTrue(pages >= 3 && pages <= 12, "page count " + pages);
            String text = new PDFTextStripper().getText(doc);
            String flat = text.replaceAll("\\s+", " ");
            RunResult r = s.result();
            for (double total : new double[] {
                r.totals().frictionHeadLoss(),
                r.totals().minorHeadLoss(),
                r.totals().totalHead()
            }) {
                String printed = Quantities.format(total, QuantityKind.HEAD, UnitSystem.SI);
                assertTrue(flat.contains(printed), "total " + printed + " missing");
            }
            assertTrue(
                    flat.contains(Quantities.format(r.totals().pressureDrop(), QuantityKind.PRESSURE, UnitSystem.SI)));
            for (Method m : s.methods()) {
                String start =
                        m.citation().substring(0, Math.min(40, m.citation().length()));
                assertTrue(flat.contains(start), "citation missing: " + start);
            }
            for (Caution c : s.cautions()) {
                String start = c.message().substring(0, Math.min(50, c.message().length()));
                assertTrue(flat.contains(start), "caution missing: " + start);
            }
            assertTrue(flat.contains("page 1 of " + pages));
            assertTrue(flat.contains(s.inputHash().substring(0, 16)));
            for (PDPage page : doc.getPages()) {
                for (var name : page.getResources().getFontNames()) {
                    PDFont font = page.getResources().getFont(name);
                    assertTrue(font.isEmbedded(), "font not embedded: " + font.getName());
                }
            }
        }
    }

    @Test
    void pdfRendersWithPoppler(@TempDir Path dir) throws Exception {
        Path pdf = dir.resolve("sheet.pdf");
        PdfSheetWriter.write(sheet(demoJson), pdf, false, UnitSystem.SI);
        // pdftoppm (poppler-utils) is installed by .ci/run; an independent renderer must accept the file.
        Process p = new ProcessBuilder(
                        "pdftoppm",
                        "-png",
                        "-r",
                        "30",
                        "-f",
                        "1",
                        "-l",
                        "1",
                        pdf.toString(),
                        dir.resolve("page").toString())
                .redirectErrorStream(true)
                .start();
        String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue(), output);
        assertTrue(output.isBlank(), "pdftoppm complained: " + output);
        assertTrue(Files.size(dir.resolve("page-1.png")) > 1000);
    }

    @Test
    void workbookFormulasReproduceTheEngine(@TempDir Path dir) throws Exception {
        HeadLossSheet s = sheet(demoJson);
        Path xlsx = dir.resolve("sheet.xlsx");
        WorkbookSheetWriter.write(s, xlsx, false);
        try (XSSFWorkbook wb = new XSSFWorkbook(xlsx.toFile())) {
            FormulaEvaluator eval = wb.getCreationHelper().createFormulaEvaluator();
            Sheet results = wb.getSheet("Results");
            RunResult r = s.result();
            int formulas = 0;
            for (int i = 0; i < r.segments().size(); i++) {
                Row row = results.getRow(WorkbookSheetWriter.FIRST_RESULT_ROW + i);
                SegmentResult sr = r.segments().get(i);
                formulas += check(eval, row.getCell(1), sr.velocity());
                formulas += check(eval, row.getCell(2), sr.reynolds());
                formulas += check(eval, row.getCell(3), sr.relativeRoughness());
                formulas += check(eval, row.getCell(6), sr.majorHeadLoss());
                formulas += check(eval, row.getCell(7), sr.minorHeadLoss());
                // Swamee–Jain check column: within its published ~1 % of Colebrook (Swamee & Jain 1976).
                double sj = eval.evaluate(row.getCell(5)).getNumberValue();
                assertEquals(sr.frictionFactor(), sj, sr.frictionFactor() * 0.02);
            }
            int t = WorkbookSheetWriter.FIRST_RESULT_ROW + r.segments().size() + 2;
            formulas += check(eval, results.getRow(t).getCell(2), r.totals().frictionHeadLoss());
            formulas += check(eval, results.getRow(t + 1).getCell(2), r.totals().minorHeadLoss());
            formulas += check(eval, results.getRow(t + 2).getCell(2), r.totals().staticHead());
            formulas += check(eval, results.getRow(t + 3).getCell(2), r.totals().totalHead());
            formulas += check(eval, results.getRow(t + 4).getCell(2), r.totals().pressureDrop());
            assertEquals(5 * r.segments().size() + 5, formulas);
        }
    }

    private static String resource(String path) throws Exception {
        try (InputStream in = SheetTest.class.getResourceAsStream(path)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    /**
     * The coil branch carries a valve by Kv, two rated components, two reducers and isolation
     * valves. The Elements sheet's check formulas are the defining laws written independently of the
     * engine (Kv: IEC 60534-2-1 turbulent liquid sizing equation; rated component: the power law of
     * a maker's rating, common practice, no source), and Σh_m on the Results sheet must now count the
     * components too.
     */
    @Test
    void workbookElementsSheetChecksComponentLawsAndCountsThemInTheMinorLoss(@TempDir Path dir) throws Exception {
        HeadLossSheet s = sheet(resource("/fluids-data/examples/coil-branch.json"));
        Path xlsx = dir.resolve("branch.xlsx");
        WorkbookSheetWriter.write(s, xlsx, false);
        RunResult r = s.result();
        try (XSSFWorkbook wb = new XSSFWorkbook(xlsx.toFile())) {
            FormulaEvaluator eval = wb.getCreationHelper().createFormulaEvaluator();
            Sheet elements = wb.getSheet("Elements");
            int checked = 0;
            double components = 0;
            for (int i = 0; i < r.elements().size(); i++) {
                Row row = elements.getRow(WorkbookSheetWriter.FIRST_ELEMENT_ROW + i);
                var ep = r.elements().get(i);
                assertEquals(ep.id(), row.getCell(0).getStringCellValue());
                if (ep.kind().equals("valve") || ep.kind().equals("component")) {
                    checked += check(eval, row.getCell(6), ep.result().headLoss());
                }
                if (!ep.kind().equals("pipe")) {
                    components += ep.result().headLoss();
                }
                double lowestAbsolute = eval.evaluate(row.getCell(10)).getNumberValue();
                assertEquals(
                        Math.min(ep.inletPressure(), ep.outletPressure())
                                + s.run().site().pressure(),
                        lowestAbsolute,
                        1e-9 * lowestAbsolute);
            }
            assertEquals(3, checked, "one valve and two rated components");
            assertTrue(components > 0);
            Sheet results = wb.getSheet("Results");
            int t = WorkbookSheetWriter.FIRST_RESULT_ROW + r.segments().size() + 2;
            check(eval, results.getRow(t + 1).getCell(2), r.totals().minorHeadLoss());
            check(eval, results.getRow(t + 3).getCell(2), r.totals().totalHead());
        }
    }

    @Test
    void pdfAndCsvShowElementsPressuresAndTheSiteAtmosphere(@TempDir Path dir) throws Exception {
        HeadLossSheet s = sheet(resource("/fluids-data/examples/coil-branch.json"));
        Path pdf = dir.resolve("branch.pdf");
        PdfSheetWriter.write(s, pdf, false, UnitSystem.SI);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String flat = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(flat.contains("Pressures along the run"), "pressure table missing");
            assertTrue(flat.contains("Site atmosphere"));
            assertTrue(flat.contains("standard atmosphere at 240"), "site basis missing");
            for (var ep : s.result().elements()) {
                assertTrue(flat.contains(ep.id()), "element id missing: " + ep.id());
            }
            assertTrue(flat.contains("IEC 60534-2-1"), "the Kv law's standard is cited");
        }
        Path csv = dir.resolve("branch.csv");
        CsvSheetWriter.write(s, csv, false);
        List<String> lines = Files.readAllLines(csv);
        assertTrue(lines.get(0)
                .endsWith(",id,inlet_gauge_pressure [Pa],outlet_gauge_pressure [Pa],"
                        + "high_point_gauge_pressure [Pa]"));
        assertEquals(1 + s.result().segments().size(), lines.size());
        var first = s.result().element("branch-flow").orElseThrow();
        String row = lines.stream()
                .filter(l -> l.contains(",branch-flow,"))
                .findFirst()
                .orElseThrow();
        assertTrue(row.contains("," + first.inletPressure() + "," + first.outletPressure() + ","), row);
    }

    private static int check(FormulaEvaluator eval, Cell cell, double expected) {
        assertEquals(CellType.FORMULA, cell.getCellType(), "not a formula: " + cell.getAddress());
        double value = eval.evaluate(cell).getNumberValue();
        assertEquals(
                expected,
                value,
                Math.abs(expected) * FORMULA_TOLERANCE + 1e-300,
                cell.getAddress().toString());
        return 1;
    }

    @Test
    void userTextStartingLikeAFormulaIsStoredAsText(@TempDir Path dir) throws Exception {
        String json = demoJson.replace("\"Sump suction\"", "\"=HYPERLINK(\\\"http://x\\\")\"")
                .replace("\"Tank inlet\"", "\"@SUM(1)\"");
        HeadLossSheet s = sheet(json);
        Path xlsx = dir.resolve("s.xlsx");
        WorkbookSheetWriter.write(s, xlsx, false);
        try (XSSFWorkbook wb = new XSSFWorkbook(xlsx.toFile())) {
            Sheet inputs = wb.getSheet("Inputs");
            Cell first = inputs.getRow(WorkbookSheetWriter.FIRST_SEGMENT_ROW).getCell(0);
            assertEquals(CellType.STRING, first.getCellType());
            assertTrue(first.getStringCellValue().startsWith("'="));
        }
        Path csv = dir.resolve("s.csv");
        CsvSheetWriter.write(s, csv, false);
        String text = Files.readString(csv);
        assertFalse(text.contains("\n=HYPERLINK"));
        assertTrue(text.contains("'@SUM(1)"));
        assertEquals("'-x", SafeText.cell("-x"));
        assertEquals("'+1", SafeText.cell("+1"));
        assertEquals("'\tx", SafeText.cell("\tx"));
    }

    @Test
    void sameProjectGivesTheSameHashAndAChangeGivesAnother() {
        assertEquals(sheet(demoJson).inputHash(), sheet(demoJson).inputHash());
        assertFalse(sheet(demoJson)
                .inputHash()
                .equals(sheet(demoJson.replace("\"9 L/s\"", "\"9.5 L/s\"")).inputHash()));
    }

    @Test
    void existingFilesAreKeptWithoutOverwrite(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("keep.csv");
        Files.writeString(csv, "precious");
        HeadLossSheet s = sheet(demoJson);
        InputException e = assertThrows(InputException.class, () -> CsvSheetWriter.write(s, csv, false));
        assertTrue(e.getMessage().contains("already exists"));
        assertEquals("precious", Files.readString(csv));
    }

    @Test
    void fileStemsCannotLeaveTheFolder() {
        assertEquals("etc-passwd", SafeText.fileStem("../../etc/passwd"));
        assertEquals("sheet", SafeText.fileStem("...."));
        assertEquals("a.b", SafeText.fileStem("a.b"));
    }
}
