package org.headway.network;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * An independent loop-flow balance for tests: the Hardy Cross method (Cross, "Analysis of flow in
 * networks of conduits or conductors", Univ. Illinois Eng. Exp. Station Bull. 286, 1936), for a
 * network with one fixed-head node. Flows start from a spanning tree that satisfies continuity;
 * each fundamental loop is then corrected by ΔQ = −Σ s h(Q) / Σ |dh/dQ|, with dh/dQ by a centred
 * difference of the element law (not the element's own slope), until no correction exceeds
 * 10⁻¹⁶ m³/s.
 */
final class HardyCross {

    private final Network net;
    private final int n;
    private final int[] from;
    private final int[] to;

    HardyCross(Network net) {
        this.net = net;
        this.n = net.nodes().size();
        Map<String, Integer> index = net.nodeIndex();
        from = new int[net.links().size()];
        to = new int[net.links().size()];
        for (int k = 0; k < from.length; k++) {
            from[k] = index.get(net.links().get(k).from());
            to[k] = index.get(net.links().get(k).to());
        }
    }

    double[] solve() {
        int root = -1;
        for (int i = 0; i < n; i++) {
            if (net.nodes().get(i).headIsFixed()) {
                root = i;
            }
        }
        List<List<Integer>> adj = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            adj.add(new ArrayList<>());
        }
        for (int k = 0; k < from.length; k++) {
            adj.get(from[k]).add(k);
            adj.get(to[k]).add(k);
        }
        int[] parentLink = new int[n];
        int[] parent = new int[n];
        int[] depth = new int[n];
        java.util.Arrays.fill(parent, -2);
        List<Integer> order = new ArrayList<>();
        boolean[] tree = new boolean[from.length];
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        queue.add(root);
        parent[root] = -1;
        parentLink[root] = -1;
        while (!queue.isEmpty()) {
            int u = queue.poll();
            order.add(u);
            for (int k : adj.get(u)) {
                int v = from[k] == u ? to[k] : from[k];
                if (parent[v] == -2) {
                    parent[v] = u;
                    parentLink[v] = k;
                    depth[v] = depth[u] + 1;
                    tree[k] = true;
                    queue.add(v);
                }
            }
        }
        double[] q = new double[from.length];
        double[] subtree = new double[n];
        for (int i = 0; i < n; i++) {
            subtree[i] =
                    net.nodes().get(i).headIsFixed() ? 0 : net.nodes().get(i).totalDemand();
        }
        for (int idx = order.size() - 1; idx > 0; idx--) {
            int v = order.get(idx);
            int k = parentLink[v];
            // The tree link carries the subtree's demand towards v.
            q[k] = to[k] == v ? subtree[v] : -subtree[v];
            subtree[parent[v]] += subtree[v];
        }
        List<int[]> loops = new ArrayList<>();
        List<int[]> signs = new ArrayList<>();
        for (int k = 0; k < from.length; k++) {
            if (tree[k]) {
                continue;
            }
            // Loop: chord from → to, then the tree path to → … → from.
            List<Integer> links = new ArrayList<>();
            List<Integer> sg = new ArrayList<>();
            links.add(k);
            sg.add(1);
            int a = to[k];
            int b = from[k];
            List<Integer> tailA = new ArrayList<>();
            List<Integer> tailASign = new ArrayList<>();
            List<Integer> tailB = new ArrayList<>();
            List<Integer> tailBSign = new ArrayList<>();
            while (a != b) {
                if (depth[a] >= depth[b]) {
                    int l = parentLink[a];
                    tailA.add(l);
                    tailASign.add(from[l] == a ? 1 : -1); // walking a → parent
                    a = parent[a];
                } else {
                    int l = parentLink[b];
                    tailB.add(l);
                    tailBSign.add(to[l] == b ? 1 : -1); // walking parent → b (reversed later)
                    b = parent[b];
                }
            }
            links.addAll(tailA);
            sg.addAll(tailASign);
            for (int i = tailB.size() - 1; i >= 0; i--) {
                links.add(tailB.get(i));
                sg.add(tailBSign.get(i));
            }
            loops.add(links.stream().mapToInt(Integer::intValue).toArray());
            signs.add(sg.stream().mapToInt(Integer::intValue).toArray());
        }
        for (int sweep = 0; sweep < 100_000; sweep++) {
            double largest = 0;
            for (int l = 0; l < loops.size(); l++) {
                int[] links = loops.get(l);
                int[] sg = signs.get(l);
                double sum = 0;
                double slope = 0;
                for (int i = 0; i < links.length; i++) {
                    var e = net.links().get(links[i]).element();
                    double qk = q[links[i]];
                    sum += sg[i] * e.headLoss(qk, net.context());
                    double d = Math.max(Math.abs(qk) * 1e-6, 1e-9);
                    slope +=
                            Math.abs((e.headLoss(qk + d, net.context()) - e.headLoss(qk - d, net.context())) / (2 * d));
                }
                double dq = -sum / slope;
                for (int i = 0; i < links.length; i++) {
                    q[links[i]] += sg[i] * dq;
                }
                largest = Math.max(largest, Math.abs(dq));
            }
            if (largest < 1e-16) {
                break;
            }
        }
        return q;
    }
}
