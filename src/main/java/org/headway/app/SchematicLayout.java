package org.headway.app;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.headway.caution.InputException;
import org.headway.report.NetworkSchematic;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;

/**
 * Where the schematic puts the nodes of a line list: at their {@code x}, {@code y} when every node
 * has them; otherwise a tree in layers from its fixed heads (the PDF sheet's layout, {@link
 * NetworkSchematic#layered}) and a network with loops by stress majorisation from that start
 * (Gansner, Koren &amp; North 2004: graph distances in links, weights 1/d², a fixed number of
 * rounds; a few seeded starts, the one with the fewest crossed links kept), which draws each loop
 * open instead of folding it onto a layer.
 *
 * @param nodeIds node ids in row order
 * @param x x per node (drawing units, east)
 * @param y y per node (drawing units, downwards on the screen)
 * @param from each link's from-node index, −1 when the id names no node
 * @param to each link's to-node index, −1 when the id names no node
 * @param how {@code given}, {@code layers} or {@code stress}
 */
record SchematicLayout(List<String> nodeIds, double[] x, double[] y, int[] from, int[] to, String how) {

    /** Rounds of stress majorisation: plenty for the few hundred nodes drawn this way. */
    static final int STRESS_ROUNDS = 300;

    /** Above this many nodes loops are drawn in layers too (stress majorisation is O(n²) a round). */
    static final int STRESS_LIMIT = 200;

    /** Starts of stress majorisation tried while links still cross. */
    static final int STARTS = 6;

    /** Pairs of links that cross (links sharing a node do not count). */
    static int crossings(int[] ef, int[] et, double[] x, double[] y) {
        int count = 0;
        for (int a = 0; a < ef.length; a++) {
            for (int b = a + 1; b < ef.length; b++) {
                if (ef[a] == ef[b] || ef[a] == et[b] || et[a] == ef[b] || et[a] == et[b]) {
                    continue;
                }
                if (java.awt.geom.Line2D.linesIntersect(
                        x[ef[a]], y[ef[a]], x[et[a]], y[et[a]], x[ef[b]], y[ef[b]], x[et[b]], y[et[b]])) {
                    count++;
                }
            }
        }
        return count;
    }

    static SchematicLayout of(NetworkEditor.Draft d) {
        int n = d.nodes().size();
        List<String> ids = new ArrayList<>();
        Map<String, Integer> index = new HashMap<>();
        boolean[] fixed = new boolean[n];
        double[] gx = new double[n];
        double[] gy = new double[n];
        boolean all = n > 0;
        for (int i = 0; i < n; i++) {
            Map<String, String> r = d.nodes().get(i);
            String id = r.getOrDefault("id", "");
            ids.add(id);
            index.putIfAbsent(id, i);
            fixed[i] = r.containsKey("fixed_head") || r.containsKey("fixed_pressure");
            try {
                gx[i] = Quantities.parse(r.getOrDefault("x", ""), QuantityKind.LENGTH);
                // Line-list y grows northwards, as on a plan; the screen's grows downwards.
                gy[i] = -Quantities.parse(r.getOrDefault("y", ""), QuantityKind.LENGTH);
            } catch (InputException e) {
                all = false;
            }
        }
        int m = d.links().size();
        int[] from = new int[m];
        int[] to = new int[m];
        List<int[]> edges = new ArrayList<>();
        for (int k = 0; k < m; k++) {
            from[k] = index.getOrDefault(d.links().get(k).getOrDefault("from", ""), -1);
            to[k] = index.getOrDefault(d.links().get(k).getOrDefault("to", ""), -1);
            if (from[k] >= 0 && to[k] >= 0 && from[k] != to[k]) {
                edges.add(new int[] {from[k], to[k]});
            }
        }
        if (all) {
            return new SchematicLayout(ids, gx, gy, from, to, "given");
        }
        int[] ef = edges.stream().mapToInt(e -> e[0]).toArray();
        int[] et = edges.stream().mapToInt(e -> e[1]).toArray();
        double[][] p = NetworkSchematic.layered(n, ef, et, fixed);
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = p[i][0];
            y[i] = p[i][1];
        }
        if (components(n, ef, et) + edges.size() == n || n > STRESS_LIMIT) {
            return new SchematicLayout(ids, x, y, from, to, "layers");
        }
        // Stress has local minima with crossed links; a few seeded starts, the fewest crossings kept.
        double[] bestX = null;
        double[] bestY = null;
        int bestCrossings = Integer.MAX_VALUE;
        java.util.Random random = new java.util.Random(1);
        for (int attempt = 0; attempt < STARTS && bestCrossings > 0; attempt++) {
            double[] tx = x.clone();
            double[] ty = y.clone();
            if (attempt > 0) {
                for (int i = 0; i < n; i++) {
                    ty[i] += (random.nextDouble() - 0.5) * n * 0.5;
                    tx[i] += (random.nextDouble() - 0.5);
                }
            }
            stress(n, ef, et, tx, ty);
            int c = crossings(ef, et, tx, ty);
            if (c < bestCrossings) {
                bestCrossings = c;
                bestX = tx;
                bestY = ty;
            }
        }
        levelMainAxis(bestX, bestY);
        return new SchematicLayout(ids, bestX, bestY, from, to, "stress");
    }

    private static List<List<Integer>> adjacency(int n, int[] ef, int[] et) {
        List<List<Integer>> adj = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            adj.add(new ArrayList<>());
        }
        for (int k = 0; k < ef.length; k++) {
            adj.get(ef[k]).add(et[k]);
            adj.get(et[k]).add(ef[k]);
        }
        return adj;
    }

    private static int components(int n, int[] ef, int[] et) {
        List<List<Integer>> adj = adjacency(n, ef, et);
        boolean[] seen = new boolean[n];
        int count = 0;
        for (int s = 0; s < n; s++) {
            if (seen[s]) {
                continue;
            }
            count++;
            ArrayDeque<Integer> q = new ArrayDeque<>(List.of(s));
            seen[s] = true;
            while (!q.isEmpty()) {
                for (int j : adj.get(q.poll())) {
                    if (!seen[j]) {
                        seen[j] = true;
                        q.add(j);
                    }
                }
            }
        }
        return count;
    }

    /**
     * Turns the drawing so that its longest extent runs across (stress fixes shape, not turn), the
     * way a screen and a sheet are wider than tall; the first node stays on the left.
     */
    private static void levelMainAxis(double[] x, double[] y) {
        int n = x.length;
        double mx = Arrays.stream(x).average().orElse(0);
        double my = Arrays.stream(y).average().orElse(0);
        double sxx = 0;
        double syy = 0;
        double sxy = 0;
        for (int i = 0; i < n; i++) {
            sxx += (x[i] - mx) * (x[i] - mx);
            syy += (y[i] - my) * (y[i] - my);
            sxy += (x[i] - mx) * (y[i] - my);
        }
        double angle = 0.5 * Math.atan2(2 * sxy, sxx - syy);
        double c = Math.cos(-angle);
        double s = Math.sin(-angle);
        for (int i = 0; i < n; i++) {
            double dx = x[i] - mx;
            double dy = y[i] - my;
            x[i] = c * dx - s * dy;
            y[i] = s * dx + c * dy;
        }
        if (n > 0 && x[0] > 0) {
            for (int i = 0; i < n; i++) {
                x[i] = -x[i];
            }
        }
    }

    /** Stress majorisation in place; nodes in separate parts sit a few links apart. */
    private static void stress(int n, int[] ef, int[] et, double[] x, double[] y) {
        List<List<Integer>> adj = adjacency(n, ef, et);
        double[][] dist = new double[n][n];
        double longest = 1;
        for (int s = 0; s < n; s++) {
            double[] d = dist[s];
            Arrays.fill(d, -1);
            d[s] = 0;
            ArrayDeque<Integer> q = new ArrayDeque<>(List.of(s));
            while (!q.isEmpty()) {
                int i = q.poll();
                for (int j : adj.get(i)) {
                    if (d[j] < 0) {
                        d[j] = d[i] + 1;
                        longest = Math.max(longest, d[j]);
                        q.add(j);
                    }
                }
            }
        }
        for (double[] d : dist) {
            for (int j = 0; j < n; j++) {
                if (d[j] < 0) {
                    d[j] = longest + 2;
                }
            }
        }
        // A small deterministic nudge so that nodes stacked on one layer position can move apart.
        for (int i = 0; i < n; i++) {
            y[i] += 0.01 * Math.sin(1.7 * i);
        }
        for (int round = 0; round < STRESS_ROUNDS; round++) {
            for (int i = 0; i < n; i++) {
                double sx = 0;
                double sy = 0;
                double sw = 0;
                for (int j = 0; j < n; j++) {
                    if (i == j) {
                        continue;
                    }
                    double dij = dist[i][j];
                    double w = 1 / (dij * dij);
                    double dx = x[i] - x[j];
                    double dy = y[i] - y[j];
                    double len = Math.hypot(dx, dy);
                    double f = len > 1e-12 ? dij / len : 0;
                    sx += w * (x[j] + f * dx);
                    sy += w * (y[j] + f * dy);
                    sw += w;
                }
                if (sw > 0) {
                    x[i] = sx / sw;
                    y[i] = sy / sw;
                }
            }
        }
    }

    /** The box around the nodes: minX, maxX, minY, maxY. */
    double[] bounds() {
        double[] b = {
            Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY
        };
        for (int i = 0; i < x.length; i++) {
            b[0] = Math.min(b[0], x[i]);
            b[1] = Math.max(b[1], x[i]);
            b[2] = Math.min(b[2], y[i]);
            b[3] = Math.max(b[3], y[i]);
        }
        if (x.length == 0) {
            return new double[] {0, 1, 0, 1};
        }
        return b;
    }
}
