package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.headway.pipe.Catalog;
import org.headway.project.ProjectResolver;
import org.headway.report.HeadLossSheet;
import org.headway.report.PdfSheetWriter;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sheet's title block edited in the app: the project file keeps the existing {@code reference}
 * keys (read back here as plain JSON), the printed sheet carries the values (read back with PDFBox's
 * text extraction), one undo step each, bad text refused with the field named.
 */
class TitleBlockEditTest {

    @TempDir
    Path dir;

    private final FakeDialogs dialogs = new FakeDialogs();
    private ProjectEditor editor;

    @BeforeEach
    void openDemo() throws Exception {
        editor = new ProjectEditor(Catalog.bundled(), dialogs, new RecentFiles(dir.resolve("recent.txt")));
        editor.openFile(Demo.copyTo(dir));
    }

    @Test
    void fieldsGoToTheProjectFileUnderTheirKeysAndOntoTheSheet() throws Exception {
        String dateBefore = editor.titleBlockField("date");
        assertTrue(editor.setTitleBlockField("job", "HW-2026-031"));
        assertTrue(editor.setTitleBlockField("revision", "B"));
        assertTrue(editor.setTitleBlockField("preparedBy", "A. Okafor"));
        assertTrue(editor.setTitleBlockField("checkedBy", "  R. Lindqvist  "));
        assertTrue(editor.setTitleBlockField("date", "2026-12-03"));
        assertEquals("R. Lindqvist", editor.titleBlockField("checkedBy"), "stripped");

        Path saved = dir.resolve("titled.json");
        dialogs.files.add(saved);
        assertTrue(editor.saveAs());
        JsonNode ref = new ObjectMapper()
                .readTree(Files.readString(saved, StandardCharsets.UTF_8))
                .get("reference");
        assertEquals("HW-2026-031", ref.get("job").asText());
        assertEquals("B", ref.get("revision").asText());
        assertEquals("A. Okafor", ref.get("preparedBy").asText());
        assertEquals("R. Lindqvist", ref.get("checkedBy").asText());
        assertEquals("2026-12-03", ref.get("date").asText());

        HeadLossSheet sheet =
                HeadLossSheet.of(ProjectResolver.resolve(editor.project(), Catalog.bundled(), dir), "test");
        Path pdf = dir.resolve("sheet.pdf");
        PdfSheetWriter.write(sheet, pdf, false, UnitSystem.SI);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String text = new PDFTextStripper().getText(doc);
            for (String v : new String[] {"HW-2026-031", "A. Okafor", "R. Lindqvist", "2026-12-03"}) {
                assertTrue(text.contains(v), v + " on the sheet");
            }
        }

        // One undo step per field.
        assertTrue(editor.undo());
        assertEquals(dateBefore, editor.titleBlockField("date"));
        assertEquals("R. Lindqvist", editor.titleBlockField("checkedBy"));
    }

    @Test
    void textTheSheetCannotTakeIsRefusedWithTheFieldNamed() {
        String jobBefore = editor.titleBlockField("job");
        assertFalse(editor.setTitleBlockField("job", "x".repeat(ProjectEditor.TITLE_BLOCK_LIMIT + 1)));
        assertTrue(
                editor.messages().get("reference.job").contains("at most"),
                editor.messages().toString());
        assertFalse(editor.setTitleBlockField("notes", "tab\there"));
        assertTrue(editor.messages().containsKey("reference.notes"));
        assertEquals(jobBefore, editor.titleBlockField("job"), "the project keeps its value");
    }
}
