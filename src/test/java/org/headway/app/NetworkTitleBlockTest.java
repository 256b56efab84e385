package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import javafx.beans.property.SimpleObjectProperty;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.report.NetworkPdfWriter;
import org.headway.report.NetworkSheet;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The title block of a network project edited in the workspace: saved under the project file's
 * {@code reference} keys (read back as plain JSON), printed on the network sheet (read back with
 * PDFBox's text extraction), one undo step each, bad text refused with the field named.
 */
class NetworkTitleBlockTest {

    @TempDir
    Path dir;

    @Test
    void fieldsAreSavedUnderTheirKeysAndPrintedOnTheNetworkSheet() throws Exception {
        NetworkEditor editor = new NetworkEditor(Catalog.bundled(), new SimpleObjectProperty<>(UnitSystem.SI));
        editor.newNetwork();
        assertTrue(editor.setTitleBlockField("job", "NW-2026-117"));
        assertTrue(editor.setTitleBlockField("preparedBy", "  M. Haddad "));
        assertTrue(editor.setTitleBlockField("checkedBy", "T. Varga"));
        assertEquals("M. Haddad", editor.titleBlockField("preparedBy"), "stripped");
        assertTrue(editor.dirtyProperty().get(), "an edit to save");

        Path saved = dir.resolve("network.json");
        editor.save(saved);
        JsonNode ref = new ObjectMapper()
                .readTree(Files.readString(saved, StandardCharsets.UTF_8))
                .get("reference");
        assertEquals("NW-2026-117", ref.get("job").asText());
        assertEquals("M. Haddad", ref.get("preparedBy").asText());
        assertEquals("T. Varga", ref.get("checkedBy").asText());

        // Opened again, the workspace shows them.
        NetworkEditor again = new NetworkEditor(Catalog.bundled(), new SimpleObjectProperty<>(UnitSystem.SI));
        Project read = ProjectFile.load(saved);
        again.load(read, saved);
        assertEquals("NW-2026-117", again.titleBlockField("job"));

        NetworkSheet sheet =
                NetworkSheet.of(read, ProjectResolver.resolveNetworkStudy(read, Catalog.bundled(), dir), "test");
        Path pdf = dir.resolve("sheet.pdf");
        NetworkPdfWriter.write(sheet, pdf, false, UnitSystem.SI);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String text = new PDFTextStripper().getText(doc);
            for (String v : new String[] {"NW-2026-117", "M. Haddad", "T. Varga"}) {
                assertTrue(text.contains(v), v + " on the network sheet");
            }
        }

        // One undo step per field; the node and link rows untouched.
        var rows = editor.draft().nodes();
        assertTrue(editor.undo());
        assertEquals("", editor.titleBlockField("checkedBy"));
        assertEquals("M. Haddad", editor.titleBlockField("preparedBy"));
        assertEquals(rows, editor.draft().nodes());
    }

    @Test
    void textTheSheetCannotTakeIsRefusedWithTheFieldNamed() {
        NetworkEditor editor = new NetworkEditor(Catalog.bundled(), new SimpleObjectProperty<>(UnitSystem.SI));
        editor.newNetwork();
        assertFalse(editor.setTitleBlockField("job", "x".repeat(ProjectEditor.TITLE_BLOCK_LIMIT + 1)));
        assertTrue(
                editor.messages().get("reference.job").contains("at most"),
                editor.messages().toString());
        assertFalse(editor.setTitleBlockField("notes", "tab\there"));
        assertTrue(editor.messages().containsKey("reference.notes"));
        assertEquals("", editor.titleBlockField("job"), "the project keeps its value");
        assertFalse(editor.canUndoProperty().get(), "a refused edit is no step");
    }
}
