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

    /**
     * A gravity line with a pump whose ends give more than the losses: the sheet must not call the
     * negative total head "what the pump must supply" (energy balance: H < 0 is a surplus).
     */
    @Test
    void negativeTotalHeadIsASurplusEvenWithAPump(@TempDir Path dir) throws Exception {
        String json = """
                {
                  "format": "headway-project", "version": 2, "title": "invented falling line with a booster",
                  "fluid": { "name": "water", "temperature": "10 degC" },
                  "flow": "2 L/s",
                  "elements": [
                    { "id": "pump", "kind": "pump", "points": [ { "flow": "0 L/s", "head": "20 m" },
                      { "flow": "3 L/s", "head": "15 m" }, { "flow": "6 L/s", "head": "5 m" } ] },
                    { "id": "main", "length": "200 m", "innerDiameter": "52.5 mm", "roughness": "0.045 mm",
                      "elevationChange": "-40 m" } ]
                }
                """;
        HeadLossSheet s = HeadLossSheet.of(
                ProjectResolver.resolve(ProjectFile.parse(json), Catalog.bundled(), Path.of(".")), "test");
        assertTrue(s.result().totals().totalHead() < 0, "the project must be a surplus case");
        Path pdf = dir.resolve("sheet.pdf");
        PdfSheetWriter.write(s, pdf, true, UnitSystem.SI);
        String text;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
        assertFalse(text.contains("what the pump must supply"), text);
        assertTrue(text.contains("surplus head"), text);
    }
}
