package org.headway.network;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.PriorityQueue;
import org.headway.caution.InputException;
import org.headway.system.Gravity;
import org.headway.system.Segment;

/**
 * The hydraulic grade line of a solved network along a path between two chosen nodes: the solved
 * head and the node elevation at each node of the path against the cumulative distance.
 *
 * <p>The path is the shortest between the two nodes through links that pass flow (open, or an
 * active control valve): fewest links, or least pipe length (links other than pipes count 0 m),
 * ties broken by fewer links and then by the earlier link in the network's order. Direction of
 * flow does not matter, so a path may run against the flow in some links (the grade then rises).
 * Closed links and links the solve shut carry no head relation between their ends and are not
 * used.
 *
 * <p>Heads are the solve's node heads (energy heads with the velocity head at nodes neglected, as
 * {@link Network} states), so the drop over a step is the link's head loss, H_from − H_to, with
 * the sign of the direction walked.
 *
 * @param metric what the path minimises
 * @param stations one per node of the path, from the start node to the end node
 * @param steps one per link of the path, in walking order
 */
public record GradeLinePath(Metric metric, List<Station> stations, List<Step> steps) {

    /** What "shortest" means. */
    public enum Metric {
        /** Fewest links. */
        LINK_COUNT,
        /** Least pipe length. */
        LENGTH
    }

    /**
     * A node on the path.
     *
     * @param node node id
     * @param distance cumulative pipe length from the start node (m)
     * @param head solved head (m)
     * @param elevation node elevation (m)
     * @param pressure solved gauge pressure (Pa)
     */
    public record Station(String node, double distance, double head, double elevation, double pressure) {}

    /**
     * A link walked on the path.
     *
     * @param link link id
     * @param kind element kind
     * @param forward whether the walk goes from the link's from-node to its to-node
     * @param length pipe length (m); 0 for links other than pipes
     * @param headDrop head of the station before minus head of the station after (m): the link's
     *     head loss, negated when walked backwards
     */
    public record Step(String link, String kind, boolean forward, double length, double headDrop) {}

    public GradeLinePath {
        Objects.requireNonNull(metric, "metric");
        stations = List.copyOf(stations);
        steps = List.copyOf(steps);
    }

    /** Total pipe length of the path (m). */
    public double length() {
        return stations.get(stations.size() - 1).distance();
    }

    /**
     * The path between two nodes of a solved network.
     *
     * @param network the network solved
     * @param result its solve
     * @param start start node id
     * @param end end node id
     * @param metric what the path minimises
     * @throws InputException an unknown node, or no path through links that pass flow
     */
    public static GradeLinePath between(
            Network network, NetworkResult result, String start, String end, Metric metric) {
        Map<String, Integer> index = network.nodeIndex();
        Integer s = index.get(start);
        if (s == null) {
            throw new InputException("grade line start", "no node \"" + start + "\" in the network");
        }
        Integer e = index.get(end);
        if (e == null) {
            throw new InputException("grade line end", "no node \"" + end + "\" in the network");
        }
        int n = network.nodes().size();
        int m = network.links().size();
        if (result.links().size() != m || result.nodes().size() != n) {
            throw new IllegalArgumentException("the result is not this network's");
        }
        // Adjacency as arrays: a 10⁴-link network takes milliseconds.
        int[] degree = new int[n];
        int[] from = new int[m];
        int[] to = new int[m];
        double[] length = new double[m];
        boolean[] usable = new boolean[m];
        for (int k = 0; k < m; k++) {
            Link l = network.links().get(k);
            NetworkResult.LinkResult r = result.links().get(k);
            from[k] = index.get(l.from());
            to[k] = index.get(l.to());
            length[k] = l.element() instanceof Segment seg ? seg.length() : 0;
            usable[k] = (r.status().equals("open") || r.status().equals("active")) && Double.isFinite(r.headLoss());
            if (usable[k]) {
                degree[from[k]]++;
                degree[to[k]]++;
            }
        }
        int[][] adjacent = new int[n][];
        for (int i = 0; i < n; i++) {
            adjacent[i] = new int[degree[i]];
        }
        int[] fill = new int[n];
        for (int k = 0; k < m; k++) {
            if (usable[k]) {
                adjacent[from[k]][fill[from[k]]++] = k;
                adjacent[to[k]][fill[to[k]]++] = k;
            }
        }
        // Dijkstra on (cost, links, last link index) — lexicographic, so ties are deterministic.
        double[] cost = new double[n];
        int[] hops = new int[n];
        int[] via = new int[n];
        Arrays.fill(cost, Double.POSITIVE_INFINITY);
        Arrays.fill(via, -1);
        boolean[] done = new boolean[n];
        cost[s] = 0;
        PriorityQueue<double[]> queue = new PriorityQueue<>((a, b) -> {
            int c = Double.compare(a[0], b[0]);
            if (c != 0) {
                return c;
            }
            c = Double.compare(a[1], b[1]);
            return c != 0 ? c : Double.compare(a[2], b[2]);
        });
        queue.add(new double[] {0, 0, -1, s});
        while (!queue.isEmpty()) {
            double[] top = queue.poll();
            int u = (int) top[3];
            if (done[u]) {
                continue;
            }
            done[u] = true;
            if (u == e) {
                break;
            }
            for (int k : adjacent[u]) {
                int v = from[k] == u ? to[k] : from[k];
                if (done[v]) {
                    continue;
                }
                double c = cost[u] + (metric == Metric.LENGTH ? length[k] : 1);
                int h = hops[u] + 1;
                if (c < cost[v] || (c == cost[v] && (h < hops[v] || (h == hops[v] && k < via[v])))) {
                    cost[v] = c;
                    hops[v] = h;
                    via[v] = k;
                    queue.add(new double[] {c, h, k, v});
                }
            }
        }
        if (!done[e]) {
            throw new InputException(
                    "grade line",
                    "no path from node \"" + start + "\" to node \"" + end
                            + "\" through links that pass flow (closed and shut links are left out)");
        }
        List<Integer> walk = new ArrayList<>();
        for (int v = e; v != s; ) {
            int k = via[v];
            walk.add(k);
            v = from[k] == v ? to[k] : from[k];
        }
        Collections.reverse(walk);
        List<Station> stations = new ArrayList<>(walk.size() + 1);
        List<Step> steps = new ArrayList<>(walk.size());
        int at = s;
        double distance = 0;
        stations.add(station(result, at, distance));
        for (int k : walk) {
            boolean forward = from[k] == at;
            NetworkResult.LinkResult r = result.links().get(k);
            steps.add(new Step(r.id(), r.kind(), forward, length[k], forward ? r.headLoss() : -r.headLoss()));
            at = forward ? to[k] : from[k];
            distance += length[k];
            stations.add(station(result, at, distance));
        }
        return new GradeLinePath(metric, stations, steps);
    }

    private static Station station(NetworkResult result, int node, double distance) {
        NetworkResult.NodeResult r = result.nodes().get(node);
        return new Station(r.id(), distance, r.head(), r.elevation(), r.pressure());
    }

    /**
     * The head at which the gauge pressure at an elevation is a given value, z + p / (ρ g).
     *
     * @param elevation elevation (m)
     * @param gaugePressure gauge pressure (Pa)
     * @param density fluid density (kg/m³)
     * @return head (m)
     */
    public static double headAtPressure(double elevation, double gaugePressure, double density) {
        return elevation + gaugePressure / (density * Gravity.STANDARD);
    }
}
