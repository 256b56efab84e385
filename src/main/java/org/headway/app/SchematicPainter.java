package org.headway.app;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.awt.geom.RoundRectangle2D;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.headway.network.NetworkResult;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/**
 * Draws the network workspace's schematic with Java 2D: on the screen through FXGraphics2D, into
 * PNG and SVG files the same way. Our own symbols: a fixed head is a tank (a box with its water
 * line), a pressure reference a triangle standing on its point, a junction a ring; a pump a disc
 * with its arrow, a valve two triangles point to point (a check valve with a bar, a control valve
 * with a stem), a rated component a small box; closed links dashed. Line width grows with the
 * square root of the flow; the index circuit runs under an amber band; the selection has a
 * vermilion halo.
 */
final class SchematicPainter {

    static final Color PAPER = new Color(0xF6F8FA);
    static final Color INK = new Color(0x2F4B6E);
    static final Color PIPE = new Color(0x5E7285);
    static final Color TEAL = new Color(0x1F8A83);
    static final Color WATER = new Color(0xCFE7E4);
    static final Color INDEX = new Color(0xE7B75A);
    static final Color HALO = new Color(0xD9472B);
    static final Color MUTED = new Color(0x6B7B8C);

    /** Nodes labelled at most; beyond, labels show only once zoomed in far enough to have room. */
    static final int LABEL_LIMIT = 80;

    /** Least screen length of a link (px) that gets its flow written beside it. */
    static final double LINK_LABEL_ROOM = 70;

    private SchematicPainter() {}

    /** World to screen: screen = world × scale + offset. */
    record View(double scale, double ox, double oy) {

        /** The view that fits the layout into a box with a margin. */
        static View fit(SchematicLayout layout, double width, double height) {
            double[] b = layout.bounds();
            // Room for the labels right of the nodes, above the top ones and for the key along the bottom.
            double padLeft = 40;
            double padRight = 120;
            double padTop = 40;
            double padBottom = 40 + keyHeight(width);
            double spanX = Math.max(b[1] - b[0], 1e-9);
            double spanY = Math.max(b[3] - b[2], 1e-9);
            double usableX = Math.max(width - padLeft - padRight, 20);
            double usableY = Math.max(height - padTop - padBottom, 20);
            double scale = Math.min(usableX / spanX, usableY / spanY);
            if (b[1] - b[0] < 1e-9 && b[3] - b[2] < 1e-9) {
                scale = 1;
            }
            scale = Math.max(scale, 1e-9);
            double ox = padLeft + (usableX - spanX * scale) / 2 - b[0] * scale;
            double oy = padTop + (usableY - spanY * scale) / 2 - b[2] * scale;
            return new View(scale, ox, oy);
        }

        double sx(double x) {
            return x * scale + ox;
        }

        double sy(double y) {
            return y * scale + oy;
        }

        /** The same view zoomed by a factor about a screen point. */
        View zoomed(double factor, double px, double py) {
            return new View(scale * factor, px - (px - ox) * factor, py - (py - oy) * factor);
        }

        View panned(double dx, double dy) {
            return new View(scale, ox + dx, oy + dy);
        }
    }

    /** The node under a screen point (within 10 px), else −1. */
    static int nodeAt(SchematicLayout layout, View v, double px, double py) {
        int best = -1;
        double bestD = 10;
        for (int i = 0; i < layout.x().length; i++) {
            double d = Math.hypot(v.sx(layout.x()[i]) - px, v.sy(layout.y()[i]) - py);
            if (d <= bestD) {
                bestD = d;
                best = i;
            }
        }
        return best;
    }

    /** The link under a screen point (within 6 px of its line), else −1. */
    static int linkAt(SchematicLayout layout, View v, double px, double py) {
        int best = -1;
        double bestD = 6;
        for (int k = 0; k < layout.from().length; k++) {
            int a = layout.from()[k];
            int b = layout.to()[k];
            if (a < 0 || b < 0) {
                continue;
            }
            double d = Line2D.ptSegDist(
                    v.sx(layout.x()[a]), v.sy(layout.y()[a]), v.sx(layout.x()[b]), v.sy(layout.y()[b]), px, py);
            if (d <= bestD) {
                bestD = d;
                best = k;
            }
        }
        return best;
    }

    static void paint(
            Graphics2D g,
            NetworkEditor.Draft draft,
            SchematicLayout layout,
            NetworkSolution solution,
            boolean stale,
            NetworkEditor.Selection selection,
            UnitSystem units,
            View v,
            double width,
            double height) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(PAPER);
        g.fill(new Rectangle2D.Double(0, 0, width, height));
        int n = layout.x().length;
        double[] sx = new double[n];
        double[] sy = new double[n];
        for (int i = 0; i < n; i++) {
            sx[i] = v.sx(layout.x()[i]);
            sy[i] = v.sy(layout.y()[i]);
        }
        Set<String> index = new HashSet<>(solution == null ? List.of() : solution.indexLinks());
        // Results by id once per drawing (a search per element is quadratic at 10⁴ elements).
        Map<String, NetworkResult.LinkResult> linkResults = new HashMap<>();
        Map<String, NetworkResult.NodeResult> nodeResults = new HashMap<>();
        if (solution != null) {
            for (NetworkResult.LinkResult l : solution.result().links()) {
                linkResults.putIfAbsent(l.id(), l);
            }
            for (NetworkResult.NodeResult r : solution.result().nodes()) {
                nodeResults.putIfAbsent(r.id(), r);
            }
        }
        // Elements wholly outside the pane (with a margin for strokes, symbols and labels) are not drawn.
        double margin = 60;
        double clipLeft = -margin;
        double clipTop = -margin;
        double clipRight = width + margin;
        double clipBottom = height + margin;
        double qMax = 0;
        double headScale = 0;
        if (solution != null) {
            for (NetworkResult.LinkResult l : solution.result().links()) {
                qMax = Math.max(qMax, Math.abs(l.flow()));
            }
            for (NetworkResult.NodeResult r : solution.result().nodes()) {
                if (Double.isFinite(r.head())) {
                    headScale = Math.max(headScale, Math.abs(r.head()) + Math.abs(r.elevation()));
                }
            }
        }
        Font small = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
        Font bold = new Font(Font.SANS_SERIF, Font.BOLD, 11);
        List<Map<String, String>> links = draft.links();
        List<double[]> linkLabels = new java.util.ArrayList<>();
        List<String> linkTexts = new java.util.ArrayList<>();
        List<Rectangle2D> taken = new java.util.ArrayList<>();
        // Index circuit band, under everything.
        for (int k = 0; k < links.size() && k < layout.from().length; k++) {
            int a = layout.from()[k];
            int b = layout.to()[k];
            if (a >= 0
                    && b >= 0
                    && !outside(sx[a], sy[a], sx[b], sy[b], clipLeft, clipTop, clipRight, clipBottom)
                    && index.contains(links.get(k).getOrDefault("id", ""))) {
                g.setColor(INDEX);
                g.setStroke(new BasicStroke(9f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                g.draw(new Line2D.Double(sx[a], sy[a], sx[b], sy[b]));
            }
        }
        // Selection halo.
        if (selection.row() >= 0) {
            g.setColor(HALO);
            if (selection.part() == NetworkEditor.Part.LINK && selection.row() < layout.from().length) {
                int a = layout.from()[selection.row()];
                int b = layout.to()[selection.row()];
                if (a >= 0 && b >= 0) {
                    g.setStroke(new BasicStroke(9f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                    g.draw(new Line2D.Double(sx[a], sy[a], sx[b], sy[b]));
                }
            } else if (selection.part() == NetworkEditor.Part.NODE && selection.row() < n) {
                int i = selection.row();
                g.setStroke(new BasicStroke(3f));
                g.draw(new Ellipse2D.Double(sx[i] - 11, sy[i] - 11, 22, 22));
            }
        }
        g.setFont(small);
        FontMetrics fm = g.getFontMetrics();
        for (int k = 0; k < links.size() && k < layout.from().length; k++) {
            int a = layout.from()[k];
            int b = layout.to()[k];
            if (a < 0 || b < 0 || outside(sx[a], sy[a], sx[b], sy[b], clipLeft, clipTop, clipRight, clipBottom)) {
                continue;
            }
            Map<String, String> row = links.get(k);
            String id = row.getOrDefault("id", "");
            String kind = row.getOrDefault("kind", "pipe");
            NetworkResult.LinkResult r = linkResults.get(id);
            boolean closed = kind.equals("closed")
                    || (r != null && (r.status().equals("closed") || r.status().equals("shut")));
            double share = r != null && qMax > 0 ? Math.sqrt(Math.abs(r.flow()) / qMax) : 0.3;
            float w = (float) (1.2 + 3.6 * share);
            g.setColor(PIPE);
            g.setStroke(
                    closed
                            ? new BasicStroke(
                                    1.3f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 4, new float[] {5, 4}, 0)
                            : new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.draw(new Line2D.Double(sx[a], sy[a], sx[b], sy[b]));
            double dx = sx[b] - sx[a];
            double dy = sy[b] - sy[a];
            double len = Math.hypot(dx, dy);
            if (len < 1e-9) {
                continue;
            }
            double ux = dx / len;
            double uy = dy / len;
            double mx = (sx[a] + sx[b]) / 2;
            double my = (sy[a] + sy[b]) / 2;
            symbol(g, kind, mx, my, ux, uy);
            if (r != null && !closed && Quantities.withoutNoise(r.flow(), qMax) != 0 && len > 30) {
                double dir = r.flow() < 0 ? -1 : 1;
                double at = kind.equals("pipe") ? 0 : 16;
                arrow(g, mx + dir * ux * (at + 2), my + dir * uy * (at + 2), dir * ux, dir * uy, index.contains(id));
            }
            if (len >= LINK_LABEL_ROOM && (n <= LABEL_LIMIT || len > 110)) {
                String text = id;
                if (r != null) {
                    text = id + "  "
                            + Quantities.format(
                                    Math.abs(Quantities.withoutNoise(r.flow(), qMax)),
                                    QuantityKind.VOLUMETRIC_FLOW,
                                    units);
                }
                // The nodes' own labels take about 45 px at each end; a link too short for its flow
                // beside them shows its id only (the tables and the form give the flow).
                if (len < fm.stringWidth(text) + 2 * 45) {
                    text = id;
                }
                // Beside the line, on its upper side, clear of the symbol.
                double nx = uy;
                double ny = -ux;
                if (ny > 0 || (ny == 0 && nx < 0)) {
                    nx = -nx;
                    ny = -ny;
                }
                linkLabels.add(new double[] {mx, my, nx, ny, k});
                linkTexts.add(text);
            }
        }
        boolean labels = n <= LABEL_LIMIT || v.scale() > 40;
        for (int i = 0; i < n; i++) {
            if (outside(sx[i], sy[i], sx[i], sy[i], clipLeft, clipTop, clipRight, clipBottom)) {
                continue;
            }
            Map<String, String> row = draft.nodes().get(i);
            boolean fixedHead = row.containsKey("fixed_head") || row.containsKey("fixed_pressure");
            boolean reference = "yes".equalsIgnoreCase(row.getOrDefault("reference", ""));
            node(g, reference ? 2 : fixedHead ? 1 : 0, sx[i], sy[i]);
            if (labels) {
                String id = row.getOrDefault("id", "");
                g.setFont(bold);
                FontMetrics bm = g.getFontMetrics();
                taken.add(label(g, id, sx[i] + 9, sy[i] - 7, INK, bm));
                g.setFont(small);
                NetworkResult.NodeResult r = nodeResults.get(id);
                if (r != null && Double.isFinite(r.pressure())) {
                    String text = fixedHead
                            ? Quantities.format(r.head(), QuantityKind.HEAD, units) + " head"
                            : Quantities.format(
                                    Quantities.withoutNoise(r.pressure(), 1000 * 9.81 * headScale),
                                    QuantityKind.PRESSURE,
                                    units);
                    // Below right of the node as a rule; where a neighbour's label is already there
                    // (a tank's head beside its outlet junction), below left, then centred a line lower.
                    double w = fm.stringWidth(text);
                    double base = sy[i] + 6 + fm.getAscent();
                    double[][] spots = {{sx[i] + 9, base}, {sx[i] - 9 - w, base}, {sx[i] - w / 2, base + fm.getHeight()}
                    };
                    double[] at = spots[0];
                    for (double[] spot : spots) {
                        Rectangle2D box =
                                new Rectangle2D.Double(spot[0] - 2, spot[1] - fm.getAscent(), w + 4, fm.getHeight());
                        if (taken.stream().noneMatch(box::intersects)) {
                            at = spot;
                            break;
                        }
                    }
                    taken.add(label(g, text, at[0], at[1], INK, fm));
                }
            }
        }
        // Link labels last, each on the first side of its line where it overlaps no label already
        // placed (the nodes' first); one that fits nowhere is left to the tables.
        g.setFont(small);
        for (int j = 0; j < linkLabels.size(); j++) {
            double[] a = linkLabels.get(j);
            String text = linkTexts.get(j);
            int tw = fm.stringWidth(text);
            for (int side : new int[] {1, -1}) {
                double nx = a[2] * side;
                double ny = a[3] * side;
                double tx = a[0] + nx * 12;
                double ty = a[1] + ny * 12;
                double left = nx < -0.3 ? tx - tw : Math.abs(nx) <= 0.3 ? tx - tw / 2.0 : tx;
                double base = ty + (ny < -0.3 ? 0 : ny > 0.3 ? fm.getAscent() : fm.getAscent() / 2.0);
                Rectangle2D box = new Rectangle2D.Double(left - 2, base - fm.getAscent(), tw + 4, fm.getHeight());
                if (taken.stream().noneMatch(box::intersects)) {
                    taken.add(label(g, text, left, base, TEAL, fm));
                    break;
                }
            }
        }
        legend(g, solution != null, stale, width, height);
    }

    /** Whether the segment's bounding box misses the rectangle. */
    private static boolean outside(
            double x0, double y0, double x1, double y1, double left, double top, double right, double bottom) {
        return Math.max(x0, x1) < left
                || Math.min(x0, x1) > right
                || Math.max(y0, y1) < top
                || Math.min(y0, y1) > bottom;
    }

    private static Rectangle2D label(Graphics2D g, String text, double x, double y, Color colour, FontMetrics fm) {
        int w = fm.stringWidth(text);
        g.setColor(new Color(246, 248, 250, 215));
        g.fill(new RoundRectangle2D.Double(x - 2, y - fm.getAscent(), w + 4, fm.getAscent() + fm.getDescent(), 4, 4));
        g.setColor(colour);
        g.drawString(text, (float) x, (float) y);
        return new Rectangle2D.Double(x - 2, y - fm.getAscent(), w + 4, fm.getHeight());
    }

    /** kind 0 junction, 1 fixed head, 2 pressure reference. */
    private static void node(Graphics2D g, int kind, double x, double y) {
        g.setStroke(new BasicStroke(1.4f));
        if (kind == 1) {
            Rectangle2D box = new Rectangle2D.Double(x - 8, y - 7, 16, 14);
            g.setColor(Color.WHITE);
            g.fill(box);
            g.setColor(WATER);
            g.fill(new Rectangle2D.Double(x - 8, y - 2, 16, 9));
            g.setColor(INK);
            g.draw(box);
            g.draw(new Line2D.Double(x - 8, y - 2, x + 8, y - 2));
        } else if (kind == 2) {
            Path2D t = new Path2D.Double();
            t.moveTo(x - 7, y - 6);
            t.lineTo(x + 7, y - 6);
            t.lineTo(x, y + 7);
            t.closePath();
            g.setColor(WATER);
            g.fill(t);
            g.setColor(INK);
            g.draw(t);
        } else {
            Ellipse2D c = new Ellipse2D.Double(x - 4.5, y - 4.5, 9, 9);
            g.setColor(Color.WHITE);
            g.fill(c);
            g.setColor(INK);
            g.draw(c);
        }
    }

    private static void symbol(Graphics2D g, String kind, double mx, double my, double ux, double uy) {
        double px = -uy;
        double py = ux;
        g.setStroke(new BasicStroke(1.3f));
        switch (kind) {
            case "pump" -> {
                Ellipse2D c = new Ellipse2D.Double(mx - 8, my - 8, 16, 16);
                g.setColor(Color.WHITE);
                g.fill(c);
                g.setColor(INK);
                g.draw(c);
                Path2D t = new Path2D.Double();
                t.moveTo(mx + ux * 6, my + uy * 6);
                t.lineTo(mx - ux * 4 + px * 4, my - uy * 4 + py * 4);
                t.lineTo(mx - ux * 4 - px * 4, my - uy * 4 - py * 4);
                t.closePath();
                g.fill(t);
            }
            case "component" -> {
                Path2D b = new Path2D.Double();
                b.moveTo(mx - ux * 7 + px * 4, my - uy * 7 + py * 4);
                b.lineTo(mx + ux * 7 + px * 4, my + uy * 7 + py * 4);
                b.lineTo(mx + ux * 7 - px * 4, my + uy * 7 - py * 4);
                b.lineTo(mx - ux * 7 - px * 4, my - uy * 7 - py * 4);
                b.closePath();
                g.setColor(Color.WHITE);
                g.fill(b);
                g.setColor(INK);
                g.draw(b);
            }
            case "pipe" -> {}
            default -> {
                Path2D bow = new Path2D.Double();
                bow.moveTo(mx - ux * 7 + px * 5, my - uy * 7 + py * 5);
                bow.lineTo(mx + ux * 7 - px * 5, my + uy * 7 - py * 5);
                bow.lineTo(mx + ux * 7 + px * 5, my + uy * 7 + py * 5);
                bow.lineTo(mx - ux * 7 - px * 5, my - uy * 7 - py * 5);
                bow.closePath();
                g.setColor(kind.equals("closed") ? INK : Color.WHITE);
                g.fill(bow);
                g.setColor(INK);
                g.draw(bow);
                if (kind.equals("check-valve")) {
                    g.setStroke(new BasicStroke(2f));
                    g.draw(new Line2D.Double(
                            mx + ux * 7 + px * 6, my + uy * 7 + py * 6, mx + ux * 7 - px * 6, my + uy * 7 - py * 6));
                } else if (kind.startsWith("pressure") || kind.equals("flow-control")) {
                    g.draw(new Line2D.Double(mx, my, mx + px * 10, my + py * 10));
                    g.draw(new Line2D.Double(
                            mx + px * 10 - ux * 4,
                            my + py * 10 - uy * 4,
                            mx + px * 10 + ux * 4,
                            my + py * 10 + uy * 4));
                }
            }
        }
    }

    private static void arrow(Graphics2D g, double x, double y, double ux, double uy, boolean onIndex) {
        Path2D a = new Path2D.Double();
        a.moveTo(x + ux * 6, y + uy * 6);
        a.lineTo(x - ux * 4 - uy * 4.5, y - uy * 4 + ux * 4.5);
        a.lineTo(x - ux * 4 + uy * 4.5, y - uy * 4 - ux * 4.5);
        a.closePath();
        g.setColor(onIndex ? new Color(0x8A5A0B) : INK);
        g.fill(a);
    }

    private static final String[] KEY = {
        "tank or fixed head",
        "pressure reference",
        "junction",
        "pump",
        "valve (bar: check, stem: control)",
        "rated component",
        "closed or shut (a closed valve filled)",
        "index circuit",
    };

    private static final Font KEY_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 11);

    /** Width of one key entry (px): symbol, gap, words, space after. */
    private static int keyWidth(FontMetrics fm, String text) {
        return 30 + fm.stringWidth(text) + 18;
    }

    /** Height of the key strip along the bottom at a drawing width (px). */
    static double keyHeight(double width) {
        java.awt.image.BufferedImage scratch =
                new java.awt.image.BufferedImage(1, 1, java.awt.image.BufferedImage.TYPE_INT_RGB);
        Graphics2D g = scratch.createGraphics();
        try {
            return keyHeight(g.getFontMetrics(KEY_FONT), width);
        } finally {
            g.dispose();
        }
    }

    private static double keyHeight(FontMetrics fm, double width) {
        int rows = 1;
        double x = 12;
        for (String k : KEY) {
            int w = keyWidth(fm, k);
            if (x + w > width - 12 && x > 12) {
                rows++;
                x = 12;
            }
            x += w;
        }
        return 10 + rows * 18 + 2 * 15 + 6;
    }

    /** The key as a strip along the bottom: symbols in rows as wide as the drawing, then two notes. */
    private static void legend(Graphics2D g, boolean solved, boolean stale, double width, double height) {
        g.setFont(KEY_FONT);
        FontMetrics fm = g.getFontMetrics();
        double h = keyHeight(fm, width);
        double top = height - h;
        g.setColor(new Color(255, 255, 255, 235));
        g.fill(new Rectangle2D.Double(0, top, width, h));
        g.setColor(new Color(0xD5DCE3));
        g.setStroke(new BasicStroke(1f));
        g.draw(new Line2D.Double(0, top, width, top));
        double x = 12;
        double y = top + 10 + 9;
        for (int i = 0; i < KEY.length; i++) {
            int w = keyWidth(fm, KEY[i]);
            if (x + w > width - 12 && x > 12) {
                x = 12;
                y += 18;
            }
            double sx = x + 12;
            double cy = y - 4;
            switch (i) {
                case 0 -> node(g, 1, sx, cy);
                case 1 -> node(g, 2, sx, cy);
                case 2 -> node(g, 0, sx, cy);
                case 6 -> {
                    g.setColor(PIPE);
                    g.setStroke(new BasicStroke(
                            1.3f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 4, new float[] {5, 4}, 0));
                    g.draw(new Line2D.Double(sx - 12, cy, sx + 12, cy));
                }
                case 7 -> {
                    g.setColor(INDEX);
                    g.setStroke(new BasicStroke(9f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                    g.draw(new Line2D.Double(sx - 8, cy, sx + 8, cy));
                    g.setColor(PIPE);
                    g.setStroke(new BasicStroke(2f));
                    g.draw(new Line2D.Double(sx - 12, cy, sx + 12, cy));
                }
                default -> {
                    g.setColor(PIPE);
                    g.setStroke(new BasicStroke(2f));
                    g.draw(new Line2D.Double(sx - 12, cy, sx + 12, cy));
                    symbol(g, i == 3 ? "pump" : i == 4 ? "valve" : "component", sx, cy, 1, 0);
                }
            }
            g.setColor(INK);
            g.drawString(KEY[i], (float) (x + 30), (float) y);
            x += w;
        }
        String note = solved
                ? "Beside a link: its id and flow; under a junction: its gauge pressure (at a fixed head: the head)."
                : "Not solved yet: ids only.";
        g.setColor(MUTED);
        g.drawString(note, 12f, (float) (y + 17));
        g.drawString(
                "Line width grows with the square root of the flow; arrows point with the flow. Drag to pan, wheel"
                        + " to zoom, double-click to fit.",
                12f,
                (float) (y + 32));
        if (stale) {
            String s = "Edited since the solve: solve again.";
            g.setColor(HALO);
            g.drawString(s, (float) (width - 12 - fm.stringWidth(s)), (float) (y + 17));
        }
    }
}
