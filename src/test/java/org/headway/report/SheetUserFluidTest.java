package org.headway.report;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.headway.pipe.Catalog;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A fluid of the engineer's own (density and viscosity given) needs no temperature; the sheet must
 * then not print one "as given". Invented project; the check is the sheet's own text read back by
 * PDFBox's text stripper.
 */
class SheetUserFluidTest {

    private static final String PROJECT = """
            {
              "format": "headway-project", "version": 2, "title": "invented user-fluid line",
              "fluid": { "name": "brine-x" TEMPERATURE, "density": "1180 kg/m3", "viscosity": "2.1 cP" },
              "flow": "3 L/s",
              "elements": [ { "id": "main", "length": "40 m", "innerDiameter": "52.5 mm", "roughness": "0.045 mm" } ]
            }
            """;

    private static String pdfText(String temperature, Path dir) throws Exception {
        HeadLossSheet s = HeadLossSheet.of(
                ProjectResolver.resolve(
                        ProjectFile.parse(PROJECT.replace("TEMPERATURE", temperature)),
                        Catalog.bundled(),
                        Path.of(".")),
                "test");
        Path pdf = dir.resolve("sheet.pdf");
        PdfSheetWriter.write(s, pdf, true, UnitSystem.SI);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            return new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
    }

    @Test
    void noTemperatureIsPrintedWhenNoneWasGiven(@TempDir Path dir) throws Exception {
        String text = pdfText("", dir);
        assertFalse(text.contains("20.00 °C"), text);
        assertTrue(text.contains("Temperature not given"), text);
    }

    @Test
    void aGivenTemperatureIsPrintedAsGiven(@TempDir Path dir) throws Exception {
        String text = pdfText(", \"temperature\": \"15 degC\"", dir);
        assertTrue(text.contains("Temperature 15.00 °C as given"), text);
    }
}
