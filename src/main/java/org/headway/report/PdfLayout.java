package org.headway.report;

import java.awt.Color;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.util.Matrix;

/**
 * A small flowing layout on A4 pages: headings, wrapped paragraphs, tables that repeat their header
 * after a page break, boxed notes and vector charts. Fonts (DejaVu Sans) are embedded so every
 * character — ε, Δ, ³, √ — prints and the file reads the same everywhere.
 */
final class PdfLayout implements AutoCloseable {

    static final float MARGIN = 48f;
    static final float FOOTER = 30f;
    private static final Color INK = new Color(0x1E2B3A);
    private static final Color RULE = new Color(0x9AA7B4);
    private static final Color HEAD_FILL = new Color(0xE6ECF2);
    private static final Color NOTE_FILL = new Color(0xFFF4DA);

    final PDDocument doc;
    final PDFont regular;
    final PDFont bold;
    private PDPage page;
    private PDPageContentStream out;
    private float y;
    private final List<PDPage> pages = new ArrayList<>();

    PdfLayout() throws IOException {
        doc = new PDDocument();
        regular = load("DejaVuSans.ttf");
        bold = load("DejaVuSans-Bold.ttf");
        newPage();
    }

    private PDFont load(String name) throws IOException {
        try (InputStream in = PdfLayout.class.getResourceAsStream("fonts/" + name)) {
            if (in == null) {
                throw new IOException("font resource missing: " + name);
            }
            return PDType0Font.load(doc, in, true);
        }
    }

    float width() {
        return PDRectangle.A4.getWidth() - 2 * MARGIN;
    }

    void newPage() throws IOException {
        if (out != null) {
            out.close();
        }
        page = new PDPage(PDRectangle.A4);
        doc.addPage(page);
        pages.add(page);
        out = new PDPageContentStream(doc, page);
        y = PDRectangle.A4.getHeight() - MARGIN;
    }

    void ensure(float height) throws IOException {
        if (y - height < MARGIN + FOOTER) {
            newPage();
        }
    }

    void space(float points) {
        y -= points;
    }

    void heading(String text, float size) throws IOException {
        heading(text, size, 60f);
    }

    /** A heading kept on the same page as at least {@code keepWith} points of what follows it. */
    void heading(String text, float size, float keepWith) throws IOException {
        ensure(size * 2.2f + keepWith);
        y -= size * 0.6f;
        write(text, bold, size, MARGIN, y - size, INK);
        y -= size * 1.5f;
        out.setStrokingColor(RULE);
        out.setLineWidth(0.5f);
        out.moveTo(MARGIN, y + size * 0.2f);
        out.lineTo(MARGIN + width(), y + size * 0.2f);
        out.stroke();
        y -= 2;
    }

    void paragraph(String text, float size) throws IOException {
        paragraph(text, regular, size, MARGIN, width());
    }

    void paragraph(String text, PDFont font, float size, float x, float maxWidth) throws IOException {
        for (String line : wrap(text, font, size, maxWidth)) {
            ensure(size * 1.35f);
            write(line, font, size, x, y - size, INK);
            y -= size * 1.35f;
        }
    }

    /** A paragraph in a shaded box that is never split across pages. */
    void note(String text, float size) throws IOException {
        List<String> lines = wrap(text, bold, size, width() - 12);
        float h = lines.size() * size * 1.35f + 10;
        ensure(h + 4);
        out.setNonStrokingColor(NOTE_FILL);
        out.addRect(MARGIN, y - h, width(), h);
        out.fill();
        out.setStrokingColor(new Color(0xC4922D));
        out.setLineWidth(0.8f);
        out.addRect(MARGIN, y - h, width(), h);
        out.stroke();
        float ty = y - 5;
        for (String line : lines) {
            write(line, bold, size, MARGIN + 6, ty - size, INK);
            ty -= size * 1.35f;
        }
        y -= h + 6;
    }

    /**
     * A table with wrapped cells.
     *
     * @param header column titles
     * @param rows cell texts
     * @param widths column widths as fractions of the text width
     * @param size font size
     */
    void table(String[] header, List<String[]> rows, float[] widths, float size) throws IOException {
        float[] cols = new float[widths.length];
        for (int i = 0; i < widths.length; i++) {
            cols[i] = widths[i] * width();
        }
        drawRow(header, cols, size, true);
        for (String[] row : rows) {
            float h = rowHeight(row, cols, size, regular);
            if (y - h < MARGIN + FOOTER) {
                newPage();
                drawRow(header, cols, size, true);
            }
            drawRow(row, cols, size, false);
        }
        y -= 4;
    }

    private float rowHeight(String[] cells, float[] cols, float size, PDFont font) throws IOException {
        int lines = 1;
        for (int i = 0; i < cells.length; i++) {
            lines = Math.max(lines, wrap(cells[i], font, size, cols[i] - 4).size());
        }
        return lines * size * 1.3f + 4;
    }

    private void drawRow(String[] cells, float[] cols, float size, boolean header) throws IOException {
        PDFont font = header ? bold : regular;
        float h = rowHeight(cells, cols, size, font);
        ensure(h);
        if (header) {
            out.setNonStrokingColor(HEAD_FILL);
            out.addRect(MARGIN, y - h, width(), h);
            out.fill();
        }
        float x = MARGIN;
        for (int i = 0; i < cells.length; i++) {
            float ty = y - 2;
            for (String line : wrap(cells[i], font, size, cols[i] - 4)) {
                write(line, font, size, x + 2, ty - size, INK);
                ty -= size * 1.3f;
            }
            x += cols[i];
        }
        out.setStrokingColor(RULE);
        out.setLineWidth(0.3f);
        out.moveTo(MARGIN, y - h);
        out.lineTo(MARGIN + width(), y - h);
        out.stroke();
        y -= h;
    }

    /** Draws a vector form (a chart) at full text width, scaled to the given height. */
    void form(PDFormXObject form, float formWidth, float formHeight) throws IOException {
        float scale = width() / formWidth;
        float h = formHeight * scale;
        ensure(h + 6);
        out.saveGraphicsState();
        out.transform(Matrix.getTranslateInstance(MARGIN, y - h));
        out.transform(Matrix.getScaleInstance(scale, scale));
        out.drawForm(form);
        out.restoreGraphicsState();
        y -= h + 6;
    }

    void write(String text, PDFont font, float size, float x, float baseline, Color color) throws IOException {
        out.beginText();
        out.setNonStrokingColor(color);
        out.setFont(font, size);
        out.newLineAtOffset(x, baseline);
        out.showText(printable(text, font));
        out.endText();
    }

    /** Replaces characters the font cannot draw, so a stray symbol never aborts a sheet. */
    private static String printable(String text, PDFont font) {
        StringBuilder b = new StringBuilder(text.length());
        text.codePoints().forEach(cp -> {
            String ch = new String(Character.toChars(cp));
            if (cp == '\t') {
                b.append(' ');
                return;
            }
            if (Character.isISOControl(cp)) {
                return;
            }
            try {
                font.encode(ch);
                b.append(ch);
            } catch (IllegalArgumentException | IOException e) {
                b.append('?');
            }
        });
        return b.toString();
    }

    List<String> wrap(String text, PDFont font, float size, float maxWidth) throws IOException {
        List<String> lines = new ArrayList<>();
        for (String para : (text == null ? "" : text).split("\n", -1)) {
            StringBuilder line = new StringBuilder();
            for (String word : para.split(" ")) {
                String trial = line.length() == 0 ? word : line + " " + word;
                if (widthOf(trial, font, size) <= maxWidth || line.length() == 0) {
                    line.setLength(0);
                    line.append(trial);
                    // A single word longer than the column is cut into pieces that fit.
                    while (widthOf(line.toString(), font, size) > maxWidth && line.length() > 1) {
                        int cut = line.length() - 1;
                        while (cut > 1 && widthOf(line.substring(0, cut), font, size) > maxWidth) {
                            cut--;
                        }
                        lines.add(line.substring(0, cut));
                        String rest = line.substring(cut);
                        line.setLength(0);
                        line.append(rest);
                    }
                } else {
                    lines.add(line.toString());
                    line.setLength(0);
                    line.append(word);
                }
            }
            lines.add(line.toString());
        }
        return lines;
    }

    float widthOf(String text, PDFont font, float size) throws IOException {
        return font.getStringWidth(printable(text, font)) / 1000f * size;
    }

    /** Writes "page n of m" and a footer line on every page; call once, after all content. */
    void footers(String left) throws IOException {
        out.close();
        out = null;
        int total = pages.size();
        for (int i = 0; i < total; i++) {
            try (PDPageContentStream s =
                    new PDPageContentStream(doc, pages.get(i), PDPageContentStream.AppendMode.APPEND, true, true)) {
                PDPageContentStream saved = out;
                out = s;
                float baseline = MARGIN - 14;
                out.setStrokingColor(RULE);
                out.setLineWidth(0.4f);
                out.moveTo(MARGIN, baseline + 10);
                out.lineTo(MARGIN + width(), baseline + 10);
                out.stroke();
                write(left, regular, 7f, MARGIN, baseline, INK);
                String right = "page " + (i + 1) + " of " + total;
                write(right, regular, 8f, MARGIN + width() - widthOf(right, regular, 8f), baseline, INK);
                out = saved;
            }
        }
    }

    @Override
    public void close() throws IOException {
        if (out != null) {
            out.close();
        }
        doc.close();
    }

    static void check(boolean ok, String what) {
        if (!ok) {
            throw new UncheckedIOException(new IOException(what));
        }
    }
}
