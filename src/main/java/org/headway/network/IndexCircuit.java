package org.headway.network;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.headway.caution.Caution;
import org.headway.system.PumpElement;
import org.headway.system.Segment;

/**
 * The index circuit of a solved network: of the paths the flow takes from a source to each
 * terminal, the one that loses the most head.
 *
 * <p><b>Definitions.</b> A link <i>carries flow</i> when it is open (or an active control valve) and
 * |Q| exceeds {@value #FLOW_THRESHOLD} m³/s plus 10⁻⁹ of the largest link flow; it is then directed
 * the way its flow goes. A <b>source</b> is a fixed-head or reference node, or the discharge (to)
 * node of a pump that carries flow. Paths use links that carry flow other than pumps, so a path
 * starts at a reservoir or at a pump's discharge. A <b>terminal</b> is a junction with positive
 * demand out of which no link carries flow (the end of a branch, or the point where two flows of a
 * loop meet), or, in a closed circuit, the suction node of a running pump when it is the
 * circuit's pressure reference or a junction that no fixed-head (supply) node feeds. The links carrying flow, pumps left out, form a directed acyclic graph in a solved network
 * (the head falls along each of them); a cycle, which only a circulation through zero-loss links
 * could make, is reported and the nodes on it get no path.
 *
 * <p>A path's head loss is H_source − H_terminal: the heads telescope, so every flow path between
 * the same two nodes loses the same head, and a terminal's loss is the largest H_source −
 * H_terminal over the sources whose flow reaches it. The route named is the one that, walking
 * upstream from the terminal, takes at each node the inflow from that source with the largest
 * flow. The index circuit is the terminal path of largest loss (the first in node order on a tie).
 *
 * <p>Accuracy: the heads' (the solve's head tolerance); the loss is a difference of two solved
 * heads, and equals the sum of the path's link losses to round-off.
 *
 * @param paths one path per terminal that a source reaches, in node order
 * @param index the path of largest loss, if any terminal has one
 * @param cautions what could not be traced
 */
public record IndexCircuit(List<TerminalPath> paths, Optional<TerminalPath> index, List<Caution> cautions) {

    /** Flows at or below this (m³/s), plus 10⁻⁹ of the largest flow, count as no flow. */
    public static final double FLOW_THRESHOLD = 1e-9;

    public IndexCircuit {
        paths = List.copyOf(paths);
        cautions = List.copyOf(cautions);
    }

    /**
     * The route from a source to a terminal.
     *
     * @param terminal terminal node id
     * @param source source node id (a fixed-head node or a pump's discharge node)
     * @param nodes node ids from the source to the terminal
     * @param links link ids from the source to the terminal
     * @param headLoss H_source − H_terminal (m)
     * @param length cumulative pipe length along the route (m; other links count 0)
     */
    public record TerminalPath(
            String terminal, String source, List<String> nodes, List<String> links, double headLoss, double length) {
        public TerminalPath {
            nodes = List.copyOf(nodes);
            links = List.copyOf(links);
        }
    }

    /** Traces the terminal paths of a solved network. */
    public static IndexCircuit of(Network network, NetworkResult result) {
        int nNodes = network.nodes().size();
        int nLinks = network.links().size();
        Map<String, Integer> index = network.nodeIndex();
        double largest = 0;
        for (NetworkResult.LinkResult l : result.links()) {
            if (Double.isFinite(l.flow())) {
                largest = Math.max(largest, Math.abs(l.flow()));
            }
        }
        double threshold = FLOW_THRESHOLD + 1e-9 * largest;
        double[] head = new double[nNodes];
        for (int i = 0; i < nNodes; i++) {
            head[i] = result.nodes().get(i).head();
        }
        int[] up = new int[nLinks];
        int[] down = new int[nLinks];
        boolean[] edge = new boolean[nLinks];
        boolean[] source = new boolean[nNodes];
        boolean[] outflow = new boolean[nNodes];
        List<int[]> runningPumps = new ArrayList<>();
        for (int i = 0; i < nNodes; i++) {
            source[i] = network.nodes().get(i).headIsFixed() && Double.isFinite(head[i]);
        }
        for (int k = 0; k < nLinks; k++) {
            Link link = network.links().get(k);
            NetworkResult.LinkResult lr = result.links().get(k);
            int f = index.get(link.from());
            int t = index.get(link.to());
            boolean flowing = (lr.status().equals("open") || lr.status().equals("active"))
                    && Double.isFinite(lr.flow())
                    && Math.abs(lr.flow()) > threshold
                    && Double.isFinite(head[f])
                    && Double.isFinite(head[t]);
            if (!flowing) {
                continue;
            }
            up[k] = lr.flow() > 0 ? f : t;
            down[k] = lr.flow() > 0 ? t : f;
            outflow[up[k]] = true;
            if (link.element() instanceof PumpElement) {
                source[down[k]] = true;
                runningPumps.add(new int[] {up[k], down[k]});
            } else {
                edge[k] = true;
            }
        }
        // Kahn's topological order over the links that carry flow.
        // Out-links of each node in compressed rows (int arrays: networks of 10⁶ nodes stay small).
        int[] indegree = new int[nNodes];
        int[] outStart = new int[nNodes + 1];
        for (int k = 0; k < nLinks; k++) {
            if (edge[k]) {
                indegree[down[k]]++;
                outStart[up[k] + 1]++;
            }
        }
        for (int i = 0; i < nNodes; i++) {
            outStart[i + 1] += outStart[i];
        }
        int[] outLink = new int[outStart[nNodes]];
        int[] fill = java.util.Arrays.copyOf(outStart, nNodes);
        for (int k = 0; k < nLinks; k++) {
            if (edge[k]) {
                outLink[fill[up[k]]++] = k;
            }
        }
        int[] order = new int[nNodes];
        int head0 = 0;
        int tail = 0;
        for (int i = 0; i < nNodes; i++) {
            if (indegree[i] == 0) {
                order[tail++] = i;
            }
        }
        double[] best = new double[nNodes];
        int[] bestSource = new int[nNodes];
        int[] pred = new int[nNodes];
        boolean[] fedByFixed = new boolean[nNodes];
        java.util.Arrays.fill(best, Double.NEGATIVE_INFINITY);
        java.util.Arrays.fill(bestSource, -1);
        java.util.Arrays.fill(pred, -1);
        for (int i = 0; i < nNodes; i++) {
            if (source[i]) {
                best[i] = head[i];
                bestSource[i] = i;
            }
            fedByFixed[i] = network.nodes().get(i).kind() == Node.Kind.FIXED_HEAD;
        }
        double[] predFlow = new double[nNodes];
        while (head0 < tail) {
            int u = order[head0++];
            for (int a = outStart[u]; a < outStart[u + 1]; a++) {
                int k = outLink[a];
                int v = down[k];
                fedByFixed[v] |= fedByFixed[u];
                double q = Math.abs(result.links().get(k).flow());
                if (bestSource[u] >= 0
                        && (best[u] > best[v] || (best[u] == best[v] && pred[v] >= 0 && q > predFlow[v]))) {
                    best[v] = best[u];
                    bestSource[v] = bestSource[u];
                    pred[v] = k;
                    predFlow[v] = q;
                }
                if (--indegree[v] == 0) {
                    order[tail++] = v;
                }
            }
        }
        List<Caution> cautions = new ArrayList<>();
        boolean[] onCycle = new boolean[nNodes];
        if (tail < nNodes) {
            List<String> cyc = new ArrayList<>();
            for (int i = 0; i < nNodes; i++) {
                if (indegree[i] > 0) {
                    onCycle[i] = true;
                    cyc.add(network.nodes().get(i).id());
                }
            }
            cautions.add(Caution.warning(
                    "flow-circulates",
                    "the flow circulates through " + String.join(", ", cyc.subList(0, Math.min(20, cyc.size())))
                            + " without a pump; no terminal path is traced through these nodes",
                    "index circuit definition"));
        }
        boolean[] terminal = new boolean[nNodes];
        for (int i = 0; i < nNodes; i++) {
            Node n = network.nodes().get(i);
            terminal[i] = !n.headIsFixed() && n.totalDemand() > 0 && !outflow[i];
        }
        for (int[] pump : runningPumps) {
            int suction = pump[0];
            Node.Kind kind = network.nodes().get(suction).kind();
            if (kind == Node.Kind.REFERENCE || (kind == Node.Kind.JUNCTION && !fedByFixed[suction])) {
                terminal[suction] = true;
            }
        }
        List<TerminalPath> paths = new ArrayList<>();
        for (int i = 0; i < nNodes; i++) {
            if (!terminal[i] || onCycle[i] || bestSource[i] < 0 || bestSource[i] == i) {
                continue;
            }
            List<String> nodes = new ArrayList<>();
            List<String> links = new ArrayList<>();
            double length = 0;
            int at = i;
            nodes.add(network.nodes().get(at).id());
            while (at != bestSource[i]) {
                int k = pred[at];
                Link link = network.links().get(k);
                links.add(link.id());
                if (link.element() instanceof Segment s) {
                    length += s.length();
                }
                at = up[k];
                nodes.add(network.nodes().get(at).id());
            }
            Collections.reverse(nodes);
            Collections.reverse(links);
            paths.add(new TerminalPath(
                    network.nodes().get(i).id(),
                    network.nodes().get(bestSource[i]).id(),
                    nodes,
                    links,
                    best[i] - head[i],
                    length));
        }
        Optional<TerminalPath> worst = Optional.empty();
        for (TerminalPath p : paths) {
            if (worst.isEmpty() || p.headLoss() > worst.get().headLoss()) {
                worst = Optional.of(p);
            }
        }
        if (paths.isEmpty()) {
            cautions.add(Caution.note(
                    "no-terminal",
                    String.format(
                            Locale.ROOT,
                            "no terminal was found (a junction with demand that passes no flow on, or a closed"
                                    + " circuit's pump suction), so there is no index circuit"),
                    "index circuit definition"));
        }
        return new IndexCircuit(paths, worst, cautions);
    }
}
