package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Text on the sheet prints as written or is refused naming the character and the text: no "?" in
 * place of a character, no mirrored right-to-left text.
 */
class SheetTextTest {

    @TempDir
    Path dir;

    private CliRun sheetWithTitle(String title, Path pdf) throws Exception {
        String text = Files.readString(Path.of("fluids-data", "examples", "gravity-spring-line.json"));
        String changed = text.replaceFirst(
                "\"title\"\\s*:\\s*\"[^\"]*\"",
                java.util.regex.Matcher.quoteReplacement("\"title\": \"" + title + "\""));
        Path p = dir.resolve("p.json");
        Files.writeString(p, changed);
        return CliRun.of("sheet", p.toString(), "--out", pdf.toString(), "--force");
    }

    @Test
    void charactersTheFontHasPrintAsWritten() throws Exception {
        String title = "Quellleitung Ü ß é ñ Ω Ж — spring \uD83D\uDE00"; // U+1F600 is in DejaVu Sans
        Path pdf = dir.resolve("ok.pdf");
        CliRun r = sheetWithTitle(title, pdf);
        assertEquals(0, r.exitCode(), r.err());
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String text = new PDFTextStripper().getText(doc);
            assertTrue(text.contains(title), "the title is extracted as written");
            assertFalse(text.contains("??"));
        }
    }

    @Test
    void rightToLeftTextIsRefusedNotMirrored() throws Exception {
        Path pdf = dir.resolve("rtl.pdf");
        CliRun r = sheetWithTitle("خط الينبوع", pdf);
        assertEquals(2, r.exitCode(), r.out());
        assertTrue(r.err().contains("U+062E") && r.err().contains("right-to-left"), r.err());
        assertTrue(r.err().contains("خط الينبوع"), "names the text");
        assertFalse(Files.exists(pdf), "nothing written");
    }

    @Test
    void aCharacterWithoutAGlyphIsRefusedNotPrintedAsAQuestionMark() throws Exception {
        Path pdf = dir.resolve("cjk.pdf");
        CliRun r = sheetWithTitle("水道 main", pdf); // DejaVu Sans has no CJK ideographs
        assertEquals(2, r.exitCode(), r.out());
        assertTrue(r.err().contains("U+6C34") && r.err().contains("no glyph"), r.err());
        assertFalse(Files.exists(pdf));
    }
}
