package org.headway.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Deque;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.headway.network.IndexCircuit;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.Node;
import org.headway.system.PumpElement;
import org.headway.system.Segment;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/**
 * A schematic of a solved network drawn with Java 2D (vector in the PDF): nodes where the line list
 * places them ({@code x}, {@code y}), otherwise in layers by link count from the fixed-head nodes;
 * pipes as lines whose width grows with the square root of their flow, an arrow for the flow's
 * direction, the index circuit in the accent colour; fixed heads as squares, pressure references as
 * diamonds, pumps as rings and other components as small bars across the line.
 */
public final class NetworkSchematic {

    static final Color INK = new Color(0x1E2B3A);
    static final Color LINE = new Color(0x5B6B7C);
    static final Color ACCENT = new Color(0xC4922D);
    static final Color FILL = new Color(0xE6ECF2);

    /** Most nodes that are labelled; beyond, labels would overlap into a blot. */
    static final int MAX_LABELLED = 60;

    private NetworkSchematic() {}

    /** Node positions in drawing units: the line list's where every node has them, else layers. */
    static double[][] positions(Network network) {
        List<Node> nodes = network.nodes();
        int n = nodes.size();
        double[][] p = new double[n][2];
        boolean all = nodes.stream().allMatch(x -> x.x().isPresent() && x.y().isPresent());
        if (all) {
            for (int i = 0; i < n; i++) {
                p[i][0] = nodes.get(i).x().getAsDouble();
                // Line-list y grows upwards (as on a plan); the drawing's grows downwards.
                p[i][1] = -nodes.get(i).y().getAsDouble();
            }
            return p;
        }
        Map<String, Integer> index = network.nodeIndex();
        int[] from = new int[network.links().size()];
        int[] to = new int[from.length];
        boolean[] fixed = new boolean[n];
        for (int k = 0; k < from.length; k++) {
            from[k] = index.get(network.links().get(k).from());
            to[k] = index.get(network.links().get(k).to());
        }
        for (int i = 0; i < n; i++) {
            fixed[i] = nodes.get(i).headIsFixed();
        }
        return layered(n, from, to, fixed);
    }

    /**
     * Nodes in layers by link count from the fixed-head nodes (x = layer, y = place in the layer,
     * each layer centred on the widest); a part with no fixed head starts from its first node. The
     * desktop schematic uses it for trees.
     *
     * @param n number of nodes
     * @param from each link's from-node index
     * @param to each link's to-node index
     * @param fixed whether each node's head is fixed
     * @return x, y per node in drawing units (y grows downwards)
     */
    public static double[][] layered(int n, int[] from, int[] to, boolean[] fixed) {
        double[][] p = new double[n][2];
        List<List<Integer>> adjacent = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            adjacent.add(new ArrayList<>());
        }
        for (int k = 0; k < from.length; k++) {
            adjacent.get(from[k]).add(to[k]);
            adjacent.get(to[k]).add(from[k]);
        }
        int[] layer = new int[n];
        Arrays.fill(layer, -1);
        Deque<Integer> queue = new ArrayDeque<>();
        for (int i = 0; i < n; i++) {
            if (fixed[i]) {
                layer[i] = 0;
                queue.add(i);
            }
        }
        if (queue.isEmpty() && n > 0) {
            layer[0] = 0;
            queue.add(0);
        }
        int deepest = 0;
        while (true) {
            while (!queue.isEmpty()) {
                int i = queue.poll();
                for (int j : adjacent.get(i)) {
                    if (layer[j] < 0) {
                        layer[j] = layer[i] + 1;
                        deepest = Math.max(deepest, layer[j]);
                        queue.add(j);
                    }
                }
            }
            int unplaced = -1;
            for (int i = 0; i < n; i++) {
                if (layer[i] < 0) {
                    unplaced = i;
                    break;
                }
            }
            if (unplaced < 0) {
                break;
            }
            layer[unplaced] = 0;
            queue.add(unplaced);
        }
        int[] count = new int[deepest + 1];
        for (int i = 0; i < n; i++) {
            p[i][0] = layer[i];
            p[i][1] = count[layer[i]]++;
        }
        // Centre each layer on the widest one.
        int widest = Arrays.stream(count).max().orElse(1);
        for (int i = 0; i < n; i++) {
            p[i][1] += (widest - count[layer[i]]) / 2.0;
        }
        return p;
    }

    /** Draws the schematic into a box of the given size. */
    static void draw(
            Graphics2D g,
            Network network,
            NetworkResult result,
            IndexCircuit circuit,
            UnitSystem u,
            double width,
            double height) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        double legend = 34;
        double[][] p = positions(network);
        double[] extent = bounds(p);
        double minX = extent[0];
        double maxX = extent[1];
        double minY = extent[2];
        double maxY = extent[3];
        double pad = 30;
        double spanX = Math.max(maxX - minX, 1e-9);
        double spanY = Math.max(maxY - minY, 1e-9);
        // Room on the right for the labels of the right-most nodes.
        double labelRoom = 45;
        double scale = Math.min((width - 2 * pad - labelRoom) / spanX, (height - legend - 2 * pad) / spanY);
        if (maxX - minX < 1e-9 && maxY - minY < 1e-9) {
            scale = 1;
        }
        double ox = pad + ((width - 2 * pad - labelRoom) - spanX * scale) / 2 - minX * scale;
        double oy = pad + ((height - legend - 2 * pad) - spanY * scale) / 2 - minY * scale;
        double[][] s = new double[p.length][2];
        for (int i = 0; i < p.length; i++) {
            s[i][0] = ox + p[i][0] * scale;
            s[i][1] = oy + p[i][1] * scale;
        }
        Map<String, Integer> index = network.nodeIndex();
        Set<String> indexLinks = new HashSet<>(
                circuit.index().map(IndexCircuit.TerminalPath::links).orElse(List.of()));
        double qMax = 0;
        for (NetworkResult.LinkResult l : result.links()) {
            qMax = Math.max(qMax, Math.abs(l.flow()));
        }
        boolean labels = network.nodes().size() <= MAX_LABELLED;
        Font small = new Font(Font.SANS_SERIF, Font.PLAIN, 7);
        g.setFont(small);
        for (int k = 0; k < network.links().size(); k++) {
            Link l = network.links().get(k);
            NetworkResult.LinkResult r = result.links().get(k);
            double[] a = s[index.get(l.from())];
            double[] b = s[index.get(l.to())];
            double share = qMax > 0 ? Math.sqrt(Math.abs(r.flow()) / qMax) : 0;
            float w = (float) (0.6 + 2.4 * share);
            boolean onIndex = indexLinks.contains(l.id());
            boolean closed = !r.status().equals("open");
            g.setColor(onIndex ? ACCENT : LINE);
            g.setStroke(
                    closed
                            ? new BasicStroke(
                                    0.8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 4, new float[] {3, 2}, 0)
                            : new BasicStroke(
                                    onIndex ? Math.max(w, 1.8f) : w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.draw(new Line2D.Double(a[0], a[1], b[0], b[1]));
            double mx = (a[0] + b[0]) / 2;
            double my = (a[1] + b[1]) / 2;
            double dx = b[0] - a[0];
            double dy = b[1] - a[1];
            double len = Math.hypot(dx, dy);
            if (len < 1e-9) {
                continue;
            }
            double ux = dx / len;
            double uy = dy / len;
            if (r.flow() < 0) {
                ux = -ux;
                uy = -uy;
            }
            g.setStroke(new BasicStroke(0.8f));
            if (l.element() instanceof PumpElement) {
                g.setColor(Color.WHITE);
                g.fill(new Ellipse2D.Double(mx - 5, my - 5, 10, 10));
                g.setColor(INK);
                g.draw(new Ellipse2D.Double(mx - 5, my - 5, 10, 10));
            } else if (!(l.element() instanceof Segment)) {
                // A component: a short bar across the line.
                g.setColor(INK);
                g.setStroke(new BasicStroke(2f));
                g.draw(new Line2D.Double(mx - uy * 4, my + ux * 4, mx + uy * 4, my - ux * 4));
            }
            if (!closed && Math.abs(r.flow()) > 0 && len > 14) {
                // Flow arrow a little past the middle.
                double ax = mx + ux * 6;
                double ay = my + uy * 6;
                Path2D arrow = new Path2D.Double();
                arrow.moveTo(ax + ux * 3.5, ay + uy * 3.5);
                arrow.lineTo(ax - ux * 2 - uy * 2.5, ay - uy * 2 + ux * 2.5);
                arrow.lineTo(ax - ux * 2 + uy * 2.5, ay - uy * 2 - ux * 2.5);
                arrow.closePath();
                g.setColor(onIndex ? ACCENT : INK);
                g.fill(arrow);
            }
        }
        for (int i = 0; i < network.nodes().size(); i++) {
            Node node = network.nodes().get(i);
            double x = s[i][0];
            double y = s[i][1];
            g.setStroke(new BasicStroke(0.8f));
            if (node.kind() == Node.Kind.FIXED_HEAD) {
                Rectangle2D box = new Rectangle2D.Double(x - 4.5, y - 4.5, 9, 9);
                g.setColor(FILL);
                g.fill(box);
                g.setColor(INK);
                g.draw(box);
            } else if (node.kind() == Node.Kind.REFERENCE) {
                Path2D d = new Path2D.Double();
                d.moveTo(x, y - 5);
                d.lineTo(x + 5, y);
                d.lineTo(x, y + 5);
                d.lineTo(x - 5, y);
                d.closePath();
                g.setColor(FILL);
                g.fill(d);
                g.setColor(INK);
                g.draw(d);
            } else {
                g.setColor(INK);
                g.fill(new Ellipse2D.Double(x - 2, y - 2, 4, 4));
            }
            if (labels) {
                NetworkResult.NodeResult nr = result.nodes().get(i);
                g.setColor(INK);
                g.drawString(node.id(), (float) (x + 5), (float) (y - 3));
                if (!node.headIsFixed() && Double.isFinite(nr.pressure())) {
                    g.setColor(LINE);
                    g.drawString(Quantities.format(nr.pressure(), QuantityKind.PRESSURE, u), (float) (x + 5), (float)
                            (y + 7));
                }
            }
        }
        // Legend along the bottom.
        double ly = height - legend + 10;
        g.setFont(small);
        g.setStroke(new BasicStroke(0.8f));
        double lx = pad;
        Rectangle2D box = new Rectangle2D.Double(lx, ly - 4.5, 9, 9);
        g.setColor(FILL);
        g.fill(box);
        g.setColor(INK);
        g.draw(box);
        g.drawString("fixed head", (float) (lx + 13), (float) (ly + 3));
        lx += 70;
        g.fill(new Ellipse2D.Double(lx, ly - 2, 4, 4));
        g.drawString("junction" + (labels ? " (gauge pressure below its id)" : ""), (float) (lx + 8), (float) (ly + 3));
        lx += labels ? 150 : 60;
        g.draw(new Ellipse2D.Double(lx, ly - 5, 10, 10));
        g.drawString("pump", (float) (lx + 14), (float) (ly + 3));
        lx += 45;
        g.setStroke(new BasicStroke(2f));
        g.draw(new Line2D.Double(lx + 3, ly - 4, lx + 3, ly + 4));
        g.setStroke(new BasicStroke(0.8f));
        g.drawString("valve or component", (float) (lx + 10), (float) (ly + 3));
        lx += 95;
        g.setColor(ACCENT);
        g.setStroke(new BasicStroke(2f));
        g.draw(new Line2D.Double(lx, ly, lx + 18, ly));
        g.setColor(INK);
        g.drawString("index circuit", (float) (lx + 22), (float) (ly + 3));
        lx += 75;
        g.setColor(LINE);
        g.setStroke(new BasicStroke(0.8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 4, new float[] {3, 2}, 0));
        g.draw(new Line2D.Double(lx, ly, lx + 18, ly));
        g.setColor(INK);
        g.drawString("closed or shut", (float) (lx + 22), (float) (ly + 3));
        g.drawString(
                "Line width grows with the square root of the flow; arrows point with the flow.", (float) pad, (float)
                        (ly + 12));
    }

    /** minX, maxX, minY, maxY of the positions. */
    private static double[] bounds(double[][] p) {
        double[] b = {
            Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY
        };
        for (double[] xy : p) {
            b[0] = Math.min(b[0], xy[0]);
            b[1] = Math.max(b[1], xy[0]);
            b[2] = Math.min(b[2], xy[1]);
            b[3] = Math.max(b[3], xy[1]);
        }
        return b;
    }

    /** A drawing height that fits the layout's aspect at the given width, between a third and 3/4 of it. */
    static float preferredHeight(Network network, float width) {
        double[] box = bounds(positions(network));
        double spanX = Math.max(box[1] - box[0], 1e-9);
        double spanY = Math.max(box[3] - box[2], 0);
        double h = (width - 105) * spanY / spanX + 60 + 34;
        return (float) Math.max(width / 3, Math.min(width * 0.75, h));
    }
}
