package org.headway.report;

import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import java.awt.Graphics2D;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;

/** A drawing that fails half-way reports its own error, not the graphics' complaint on disposal. */
class DisposeAfterFailureTest {

    @Test
    void theRealErrorSurvivesTheDisposal() throws Exception {
        try (PDDocument doc = new PDDocument()) {
            PdfBoxGraphics2D g = new PdfBoxGraphics2D(doc, 100, 100);
            OutOfMemoryError real = new OutOfMemoryError("Java heap space (test)");
            OutOfMemoryError thrown = assertThrows(
                    OutOfMemoryError.class,
                    () -> PdfSheetWriter.drawThenDispose(g, () -> {
                        // A child graphics left undisposed, as a drawing stopped half-way leaves it: the
                        // parent's disposal then finds its save counter off zero.
                        Graphics2D child = (Graphics2D) g.create();
                        child.drawLine(0, 0, 10, 10);
                        throw real;
                    }));
            assertSame(real, thrown);
        }
    }
}
