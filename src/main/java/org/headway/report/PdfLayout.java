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
        List<String> lines = wrap(text, bold, size, width());
        ensure(size * 2.2f + keepWith + (Math.min(lines.size(), 20) - 1) * size * 1.25f);
        y -= size * 0.6f;
        for (int i = 0; i < lines.size(); i++) {
            if (i > 0) {
                y -= size * 1.25f;
                ensure(size * 2);
            }
            write(lines.get(i), bold, size, MARGIN, y - size, INK);
        }
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
        List<String> all = wrap(text, bold, size, width() - 12);
        int perPage = (int) Math.floor((PDRectangle.A4.getHeight() - 2 * MARGIN - FOOTER - 16) / (size * 1.35f));
        for (int from = 0; from < all.size(); from += perPage) {
            noteBox(all.subList(from, Math.min(all.size(), from + perPage)), size);
        }
    }

    private void noteBox(List<String> lines, float size) throws IOException {
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
        List<List<String>> head = wrapCells(header, cols, size, bold);
        drawLines(head, cols, size, true, 0, lineCount(head));
        float lineHeight = size * 1.3f;
        float pageRoom = PDRectangle.A4.getHeight() - 2 * MARGIN - FOOTER - headerHeight(head, size) - 4;
        for (String[] row : rows) {
            List<List<String>> cells = wrapCells(row, cols, size, regular);
            int n = lineCount(cells);
            float h = n * lineHeight + 4;
            if (y - h < MARGIN + FOOTER && h <= pageRoom) {
                // The row fits on a fresh page: move it whole.
                newPage();
                drawLines(head, cols, size, true, 0, lineCount(head));
            }
            // A row taller than a page is split between pages, its lines never running into the footer.
            int from = 0;
            while (from < n) {
                int fit = (int) Math.floor((y - (MARGIN + FOOTER) - 4) / lineHeight);
                if (fit < 1) {
                    newPage();
                    drawLines(head, cols, size, true, 0, lineCount(head));
                    continue;
                }
                int take = Math.min(fit, n - from);
                drawLines(cells, cols, size, false, from, take);
                from += take;
            }
        }
        y -= 4;
    }

    private float headerHeight(List<List<String>> head, float size) {
        return lineCount(head) * size * 1.3f + 4;
    }

    private List<List<String>> wrapCells(String[] cells, float[] cols, float size, PDFont font) throws IOException {
        List<List<String>> out = new ArrayList<>(cells.length);
        for (int i = 0; i < cells.length; i++) {
            out.add(wrap(cells[i], font, size, cols[i] - 4));
        }
        return out;
    }

    private static int lineCount(List<List<String>> cells) {
        int lines = 1;
        for (List<String> c : cells) {
            lines = Math.max(lines, c.size());
        }
        return lines;
    }

    /** Draws lines [from, from + count) of a row's wrapped cells as one band. */
    private void drawLines(List<List<String>> cells, float[] cols, float size, boolean header, int from, int count)
            throws IOException {
        PDFont font = header ? bold : regular;
        float h = count * size * 1.3f + 4;
        ensure(h);
        if (header) {
            out.setNonStrokingColor(HEAD_FILL);
            out.addRect(MARGIN, y - h, width(), h);
            out.fill();
        }
        float x = MARGIN;
        for (int i = 0; i < cells.size(); i++) {
            float ty = y - 2;
            List<String> lines = cells.get(i);
            for (int k = from; k < Math.min(lines.size(), from + count); k++) {
                write(lines.get(k), font, size, x + 2, ty - size, INK);
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

    /**
     * A character the sheet cannot print faithfully: refused, naming the character and the text it is
     * in, rather than printed as "?" or mirrored. Nothing is written (sheets are written whole or not).
     */
    private static org.headway.caution.InputException undrawable(String text, int cp, String why) {
        String shown = text.length() > 60 ? text.substring(0, 57) + "…" : text;
        return new org.headway.caution.InputException(
                "sheet text \"" + shown + "\"",
                String.format(
                        java.util.Locale.ROOT,
                        "cannot print '%s' (U+%04X): %s; write that name or note in Latin, Greek or Cyrillic"
                                + " letters, digits and common symbols",
                        new String(Character.toChars(cp)),
                        cp,
                        why));
    }

    /** The text as drawn: tabs as spaces, control characters dropped; undrawable characters refused. */
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
            byte dir = Character.getDirectionality(cp);
            if (dir == Character.DIRECTIONALITY_RIGHT_TO_LEFT || dir == Character.DIRECTIONALITY_RIGHT_TO_LEFT_ARABIC) {
                throw undrawable(
                        text,
                        cp,
                        "right-to-left text is not laid out by the sheet (it would print mirrored"
                                + " and, for Arabic, unjoined)");
            }
            try {
                byte[] code = font.encode(ch);
                // The embedded fonts are encoded Identity-H: the code is the glyph id, and 0 is .notdef,
                // the empty box a font draws for a character it lacks.
                boolean notdef = true;
                for (byte x : code) {
                    notdef &= x == 0;
                }
                if (notdef) {
                    throw new IllegalArgumentException("no glyph");
                }
                b.append(ch);
            } catch (IllegalArgumentException | IOException e) {
                throw undrawable(text, cp, "the sheet's embedded font (DejaVu Sans) has no glyph for it");
            }
        });
        return b.toString();
    }

    /**
     * Greedy line breaking at spaces in time linear in the text: each character's width is looked up
     * once per font (glyph widths add up, so a word's width is the sum of its characters'), and a
     * word longer than the line is cut into pieces that fit.
     */
    List<String> wrap(String text, PDFont font, float size, float maxWidth) throws IOException {
        List<String> lines = new ArrayList<>();
        // Refuses an undrawable character naming the whole text, not just the character.
        printable(text == null ? "" : text, font);
        float max = maxWidth * 1000f / size;
        float space = charWidth(font, ' ');
        for (String para : (text == null ? "" : text).split("\n", -1)) {
            StringBuilder line = new StringBuilder();
            float lineWidth = 0;
            for (String word : para.split(" ", -1)) {
                float w = 0;
                for (int i = 0; i < word.length(); ) {
                    int cp = word.codePointAt(i);
                    w += charWidth(font, cp);
                    i += Character.charCount(cp);
                }
                if (line.length() > 0 && lineWidth + space + w <= max) {
                    line.append(' ').append(word);
                    lineWidth += space + w;
                    continue;
                }
                if (line.length() > 0) {
                    lines.add(line.toString());
                    line.setLength(0);
                    lineWidth = 0;
                }
                if (w <= max) {
                    line.append(word);
                    lineWidth = w;
                    continue;
                }
                // Cut a word wider than the line.
                for (int i = 0; i < word.length(); ) {
                    int cp = word.codePointAt(i);
                    float cw = charWidth(font, cp);
                    if (line.length() > 0 && lineWidth + cw > max) {
                        lines.add(line.toString());
                        line.setLength(0);
                        lineWidth = 0;
                    }
                    line.appendCodePoint(cp);
                    lineWidth += cw;
                    i += Character.charCount(cp);
                }
            }
            lines.add(line.toString());
        }
        return lines;
    }

    private final java.util.Map<PDFont, java.util.Map<Integer, Float>> charWidths = new java.util.HashMap<>();

    /** Width of one character as drawn (after {@link #printable}), in font units per 1000 em. */
    private float charWidth(PDFont font, int cp) throws IOException {
        java.util.Map<Integer, Float> cache = charWidths.computeIfAbsent(font, f -> new java.util.HashMap<>());
        Float w = cache.get(cp);
        if (w == null) {
            String drawn = printable(new String(Character.toChars(cp)), font);
            w = drawn.isEmpty() ? 0f : font.getStringWidth(drawn);
            cache.put(cp, w);
        }
        return w;
    }

    float widthOf(String text, PDFont font, float size) throws IOException {
        return font.getStringWidth(printable(text, font)) / 1000f * size;
    }

    /**
     * Sets the document's title, creator and subject (the input hash) and a fixed creation date, so
     * that a sheet made again from the same project is the same file.
     */
    void documentInfo(String title, String version, String inputHash) {
        org.apache.pdfbox.pdmodel.PDDocumentInformation info = doc.getDocumentInformation();
        info.setTitle(title);
        info.setCreator("Headway " + version);
        info.setSubject("input hash " + inputHash);
        java.util.Calendar epoch =
                java.util.Calendar.getInstance(java.util.TimeZone.getTimeZone("UTC"), java.util.Locale.ROOT);
        epoch.setTimeInMillis(0);
        info.setCreationDate(epoch);
    }

    /** The title block with blank lines to sign, its notes, and the standing caution in a box. */
    void titleBlock(org.headway.project.Project.TitleBlock t, String version, float body, float small)
            throws IOException {
        List<String[]> title = new ArrayList<>();
        title.add(new String[] {"Job / reference", blank(t.job()), "Revision", blank(t.revision())});
        title.add(new String[] {"Prepared by", blank(t.preparedBy()), "Checked by", blank(t.checkedBy())});
        title.add(new String[] {"Date", blank(t.date()), "Headway version", version});
        table(new String[] {"Title block", "", "", ""}, title, new float[] {0.18f, 0.32f, 0.18f, 0.32f}, body);
        if (!t.notes().isEmpty()) {
            paragraph("Notes: " + t.notes(), small);
        }
        space(4);
        note("CAUTION — " + org.headway.caution.Caution.GENERAL_REVIEW.message(), body);
    }

    private static String blank(String s) {
        return s == null || s.isEmpty() ? "______________________" : s;
    }

    /** The methods section: each method's name, equation and citation. */
    void methods(List<Method> methods, float body, float small) throws IOException {
        heading("Methods", 12);
        for (Method m : methods) {
            paragraph(m.name(), bold, body, MARGIN, width());
            paragraph("    " + m.equation(), regular, body, MARGIN + 8, width() - 8);
            paragraph("    " + m.citation(), regular, small, MARGIN + 8, width() - 8);
            space(3);
        }
    }

    /** The cautions section, each in the chosen unit system with its severity and basis. */
    void cautions(List<org.headway.caution.Caution> cautions, org.headway.units.UnitSystem u, float body)
            throws IOException {
        heading("Cautions", 12);
        for (org.headway.caution.Caution c : cautions) {
            paragraph(
                    "• [" + c.severity().name().toLowerCase(java.util.Locale.ROOT) + "] "
                            + org.headway.units.Quantities.inSystem(c.message(), u) + " (basis: " + c.basis() + ")",
                    body);
        }
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
