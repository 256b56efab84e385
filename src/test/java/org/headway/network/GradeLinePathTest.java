package org.headway.network;

import static org.headway.network.NetworkFixtures.link;
import static org.headway.network.NetworkFixtures.network;
import static org.headway.network.NetworkFixtures.pipe;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.headway.caution.InputException;
import org.headway.pipe.HazenWilliamsCoefficient;
import org.headway.system.IsolationValve;
import org.headway.system.LocalLoss;
import org.headway.system.Segment;
import org.junit.jupiter.api.Test;

/** The grade line along a chosen path of an invented, hand-built network. */
class GradeLinePathTest {

    /** Heads and losses come from the same solve; only rounding may separate them. */
    static final double SAME_SOLVE = 1e-12;

    /**
     * Heads against a hand calculation: the solver stops at a head change of 10⁻⁹ m and a continuity
     * residual of 10⁻¹⁰ m³/s (its own criteria), so a few 10⁻⁸ m covers both.
     */
    static final double SOLVER_HEAD = 5e-8;

    /**
     * An invented loop: reservoir R feeds A; from A two routes reach C, A–B–C (2 links, 600 m) and
     * A–D–E–C (3 links, 450 m); F hangs off C and B; a closed isolation valve joins A and C directly.
     */
    static Network loop() {
        List<Node> nodes = List.of(
                Node.fixedHead("R", 30, 52),
                Node.junction("A", 20, 0.002),
                Node.junction("B", 18, 0.003),
                Node.junction("C", 15, 0.004),
                Node.junction("D", 19, 0.001),
                Node.junction("E", 17, 0.002),
                Node.junction("F", 12, 0.003));
        List<Link> links = List.of(
                link(pipe("feed", 100, 0.2, 4.5e-5), "R", "A"),
                link(pipe("AB", 300, 0.15, 4.5e-5), "A", "B"),
                link(pipe("BC", 300, 0.1, 4.5e-5), "B", "C"),
                link(pipe("AD", 150, 0.125, 4.5e-5), "A", "D"),
                link(pipe("DE", 150, 0.1, 4.5e-5), "D", "E"),
                // Drawn against the usual flow so that a walk from A to C goes backwards through it.
                link(pipe("CE", 150, 0.1, 4.5e-5), "C", "E"),
                link(pipe("CF", 200, 0.08, 4.5e-5), "C", "F"),
                link(pipe("BF", 500, 0.08, 4.5e-5), "B", "F"),
                link(new IsolationValve("shortcut", "valve", false, LocalLoss.NONE), "A", "C"));
        return network("colebrook", nodes, links);
    }

    @Test
    void headsAreTheSolvedHeadsAndEachDropIsTheLinksHeadLoss() {
        Network net = loop();
        NetworkResult result = NetworkSolver.standard().solve(net);
        assertTrue(result.converged());
        for (GradeLinePath.Metric metric : GradeLinePath.Metric.values()) {
            GradeLinePath path = GradeLinePath.between(net, result, "R", "F", metric);
            assertEquals("R", path.stations().get(0).node());
            assertEquals("F", path.stations().get(path.stations().size() - 1).node());
            assertEquals(path.steps().size() + 1, path.stations().size());
            double distance = 0;
            for (int i = 0; i < path.steps().size(); i++) {
                GradeLinePath.Station a = path.stations().get(i);
                GradeLinePath.Station b = path.stations().get(i + 1);
                GradeLinePath.Step step = path.steps().get(i);
                NetworkResult.NodeResult solvedA = result.node(a.node()).orElseThrow();
                assertEquals(solvedA.head(), a.head(), 0, "head at " + a.node());
                assertEquals(solvedA.elevation(), a.elevation(), 0);
                NetworkResult.LinkResult l = result.link(step.link()).orElseThrow();
                // The link joins the two stations, in the direction the step says.
                assertEquals(step.forward() ? a.node() : b.node(), l.from());
                assertEquals(step.forward() ? b.node() : a.node(), l.to());
                double drop = a.head() - b.head();
                double loss = step.forward() ? l.headLoss() : -l.headLoss();
                assertEquals(loss, drop, SAME_SOLVE * Math.abs(loss), "drop over " + step.link());
                assertEquals(loss, step.headDrop(), 0);
                // Distances add up the typed pipe lengths.
                distance += typedLength(net, step.link());
                assertEquals(distance, b.distance(), 1e-12 * distance);
            }
            assertEquals(distance, path.length(), 0);
            assertTrue(path.steps().stream().noneMatch(s -> s.link().equals("shortcut")), "closed link not used");
        }
    }

    @Test
    void theRouteIsTheShortestOfEverySimplePath() {
        Network net = loop();
        NetworkResult result = NetworkSolver.standard().solve(net);
        String[] ends = {"R", "A", "B", "C", "D", "E", "F"};
        for (String a : ends) {
            for (String b : ends) {
                if (a.equals(b)) {
                    continue;
                }
                for (GradeLinePath.Metric metric : GradeLinePath.Metric.values()) {
                    GradeLinePath path = GradeLinePath.between(net, result, a, b, metric);
                    double[] best = bruteForce(net, a, b, metric);
                    double cost = metric == GradeLinePath.Metric.LENGTH
                            ? path.length()
                            : path.steps().size();
                    assertEquals(best[0], cost, 1e-9, a + "→" + b + " " + metric);
                    assertEquals(
                            best[1], path.steps().size(), 0, a + "→" + b + " " + metric + " fewest links on a tie");
                }
            }
        }
        // A to C: fewest links is A–B–C; least length is A–D–E–C, walking CE backwards.
        GradeLinePath byCount = GradeLinePath.between(net, result, "A", "C", GradeLinePath.Metric.LINK_COUNT);
        assertEquals(
                List.of("AB", "BC"),
                byCount.steps().stream().map(GradeLinePath.Step::link).toList());
        GradeLinePath byLength = GradeLinePath.between(net, result, "A", "C", GradeLinePath.Metric.LENGTH);
        assertEquals(
                List.of("AD", "DE", "CE"),
                byLength.steps().stream().map(GradeLinePath.Step::link).toList());
        assertFalse(byLength.steps().get(2).forward());
        // The heads telescope: either route loses H_A − H_C.
        double sumCount = byCount.steps().stream()
                .mapToDouble(GradeLinePath.Step::headDrop)
                .sum();
        double sumLength = byLength.steps().stream()
                .mapToDouble(GradeLinePath.Step::headDrop)
                .sum();
        assertEquals(sumCount, sumLength, 1e-12 * Math.abs(sumCount));
    }

    /**
     * A tree of Hazen–Williams pipes: the flows follow from continuity alone, so the heads along a
     * path follow by hand from the SI form of the formula, V = 0.849 C R^0.63 S^0.54 with R = D/4
     * (Williams &amp; Hazen, Hydraulic Tables, 1905; the SI constant as commonly printed).
     */
    @Test
    void onATreeTheGradeLineIsTheHandCalculation() {
        List<Node> nodes = List.of(
                Node.fixedHead("R", 40, 45),
                Node.junction("A", 30, 0.004),
                Node.junction("B", 25, 0.003),
                Node.junction("C", 22, 0.005),
                Node.junction("D", 24, 0.002));
        double[][] pipes = { // length, diameter, C
            {400, 0.2, 130}, {350, 0.15, 120}, {250, 0.1, 110}, {300, 0.08, 100}
        };
        List<Link> links = List.of(
                link(hw("RA", pipes[0]), "R", "A"),
                link(hw("AB", pipes[1]), "A", "B"),
                link(hw("BC", pipes[2]), "B", "C"),
                link(hw("BD", pipes[3]), "B", "D"));
        Network net = network("colebrook", nodes, links);
        NetworkResult result = NetworkSolver.standard().solve(net);
        assertTrue(result.converged());
        GradeLinePath path = GradeLinePath.between(net, result, "R", "C", GradeLinePath.Metric.LENGTH);
        double[] flows = {0.014, 0.010, 0.005};
        double head = 45;
        assertEquals(head, path.stations().get(0).head(), 0);
        for (int i = 0; i < 3; i++) {
            double[] p = pipes[i];
            double v = flows[i] / (Math.PI * p[1] * p[1] / 4);
            head -= p[0] * Math.pow(v / (0.849 * p[2] * Math.pow(p[1] / 4, 0.63)), 1 / 0.54);
            assertEquals(head, path.stations().get(i + 1).head(), SOLVER_HEAD, "head at station " + (i + 1));
        }
        assertEquals(1000, path.length(), 1e-9);
        // Gauge pressure at C from its head: ρ g (H − z).
        GradeLinePath.Station c = path.stations().get(3);
        double rho = net.context().fluid().density();
        assertEquals(c.head(), GradeLinePath.headAtPressure(c.elevation(), c.pressure(), rho), 1e-9);
    }

    @Test
    void unknownNodesAndCutOffNodesAreRefusedByName() {
        Network net = loop();
        NetworkResult result = NetworkSolver.standard().solve(net);
        InputException unknown = assertThrows(
                InputException.class, () -> GradeLinePath.between(net, result, "R", "Z9", GradeLinePath.Metric.LENGTH));
        assertTrue(unknown.getMessage().contains("\"Z9\""), unknown.getMessage());
        // Two halves, each fed by its own reservoir, joined only by a closed valve: no path.
        Network cut = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 0, 10),
                        Node.junction("J", 0, 0.001),
                        Node.junction("K", 0, 0.001),
                        Node.fixedHead("S", 0, 12)),
                List.of(
                        link(pipe("p", 100, 0.1, 4.5e-5), "R", "J"),
                        link(new IsolationValve("v", "valve", false, LocalLoss.NONE), "J", "K"),
                        link(pipe("q", 100, 0.1, 4.5e-5), "S", "K")));
        NetworkResult cutResult = NetworkSolver.standard().solve(cut);
        InputException none = assertThrows(
                InputException.class,
                () -> GradeLinePath.between(cut, cutResult, "R", "K", GradeLinePath.Metric.LINK_COUNT));
        assertTrue(none.getMessage().contains("no path from node \"R\" to node \"K\""), none.getMessage());
    }

    private static Segment hw(String id, double[] p) {
        return Segment.builder(id)
                .id(id)
                .length(p[0])
                .bore(p[1], 1.5e-6)
                .hazenWilliams(new HazenWilliamsCoefficient(p[2], "invented"))
                .build();
    }

    private static double typedLength(Network net, String link) {
        return net.links().stream()
                .filter(l -> l.id().equals(link))
                .map(l -> ((Segment) l.element()).length())
                .findFirst()
                .orElseThrow();
    }

    /** Every simple path by depth-first search over the open links: the least {cost, links}. */
    private static double[] bruteForce(Network net, String a, String b, GradeLinePath.Metric metric) {
        double[] best = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        List<Link> open = new ArrayList<>();
        for (Link l : net.links()) {
            if (!(l.element() instanceof IsolationValve v) || v.open()) {
                open.add(l);
            }
        }
        walk(open, a, b, new ArrayList<>(List.of(a)), 0, 0, metric, best);
        return best;
    }

    private static void walk(
            List<Link> links,
            String at,
            String goal,
            List<String> visited,
            double cost,
            int hops,
            GradeLinePath.Metric metric,
            double[] best) {
        if (at.equals(goal)) {
            if (cost < best[0] - 1e-9 || (Math.abs(cost - best[0]) <= 1e-9 && hops < best[1])) {
                best[0] = cost;
                best[1] = hops;
            }
            return;
        }
        for (Link l : links) {
            String next = l.from().equals(at) ? l.to() : l.to().equals(at) ? l.from() : null;
            if (next == null || visited.contains(next)) {
                continue;
            }
            double step = metric == GradeLinePath.Metric.LENGTH ? ((Segment) l.element()).length() : 1;
            visited.add(next);
            walk(links, next, goal, visited, cost + step, hops + 1, metric, best);
            visited.remove(visited.size() - 1);
        }
    }
}
