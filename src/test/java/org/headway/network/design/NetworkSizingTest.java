package org.headway.network.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.headway.caution.InputException;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.Node;
import org.headway.system.Gravity;
import org.headway.system.Segment;
import org.headway.system.SizeSelector.CandidateSize;
import org.junit.jupiter.api.Test;

/**
 * Network sizing against a brute-force scan: every combination of candidate sizes is solved, each
 * pipe's velocity and friction gradient computed here independently (Darcy–Weisbach with the
 * Colebrook–White equation iterated in the test; Colebrook 1939), and the scan's answer compared
 * with the sizing's. The networks and sizes are invented.
 */
class NetworkSizingTest {

    /** Invented bores (m), labelled by their millimetres. */
    static final double[] BORES = {0.040, 0.050, 0.065, 0.080, 0.100, 0.125};

    /** Roughness of the invented pipes (m). */
    static final double EPS = 4.5e-5;

    static final double V_MAX = 1.5;
    static final double GRADIENT_MAX = 4.0;

    static List<CandidateSize> sizes() {
        List<CandidateSize> list = new ArrayList<>();
        for (double d : BORES) {
            list.add(new CandidateSize("D" + Math.round(d * 1000), d));
        }
        return list;
    }

    static Segment pipe(String id, double length, double diameter) {
        return Segment.builder(id).id(id).length(length).bore(diameter, EPS).build();
    }

    /**
     * Darcy friction factor by the Colebrook–White equation 1/√f = −2 log10(ε/(3.7 D) + 2.51/(Re √f))
     * (Colebrook 1939), iterated here from f = 0.02 to a fixed point; 64/Re below Re 2000.
     */
    static double colebrook(double re, double relRough) {
        if (re < 2000) {
            return 64 / re;
        }
        double x = 1 / Math.sqrt(0.02);
        for (int i = 0; i < 100; i++) {
            x = -2 * Math.log10(relRough / 3.7 + 2.51 * x / re);
        }
        return 1 / (x * x);
    }

    /** Friction loss per 100 m of a bore at a flow (m). */
    static double gradient(double d, double q) {
        double v = q / (Math.PI * d * d / 4);
        double re = DesignFixtures.WATER.density() * v * d / DesignFixtures.WATER.dynamicViscosity();
        if (q == 0) {
            return 0;
        }
        return colebrook(re, EPS / d) / d * v * v / (2 * Gravity.STANDARD) * 100;
    }

    static boolean meets(double d, double q) {
        double v = Math.abs(q) / (Math.PI * d * d / 4);
        return v <= V_MAX * (1 + 1e-9) && gradient(d, Math.abs(q)) <= GRADIENT_MAX * (1 + 1e-9);
    }

    /** The network with the bores of a combination (indices into BORES). */
    static Network withBores(Network base, String[] ids, int[] combo) {
        List<Link> links = new ArrayList<>();
        for (Link l : base.links()) {
            int k = java.util.Arrays.asList(ids).indexOf(l.id());
            Segment s = (Segment) l.element();
            links.add(k < 0 ? l : new Link(pipe(s.id(), s.length(), BORES[combo[k]]), l.from(), l.to()));
        }
        return base.withLinks(links);
    }

    /** Every combination of bores with whether each pipe meets the limits at its own solved flows. */
    static List<int[]> feasibleCombinations(Network base, String[] ids) {
        List<int[]> feasible = new ArrayList<>();
        int total = (int) Math.pow(BORES.length, ids.length);
        NetworkSolver solver = NetworkSolver.standard();
        for (int code = 0; code < total; code++) {
            int[] combo = new int[ids.length];
            int c = code;
            for (int k = 0; k < ids.length; k++) {
                combo[k] = c % BORES.length;
                c /= BORES.length;
            }
            NetworkResult r = solver.solve(withBores(base, ids, combo));
            assertTrue(r.converged());
            boolean ok = true;
            for (int k = 0; k < ids.length && ok; k++) {
                ok = meets(BORES[combo[k]], r.link(ids[k]).orElseThrow().flow());
            }
            if (ok) {
                feasible.add(combo);
            }
        }
        return feasible;
    }

    static Map<String, List<CandidateSize>> allSized(String... ids) {
        Map<String, List<CandidateSize>> m = new HashMap<>();
        for (String id : ids) {
            m.put(id, sizes());
        }
        return m;
    }

    static int[] chosen(NetworkSizingResult r, String[] ids) {
        int[] out = new int[ids.length];
        for (int k = 0; k < ids.length; k++) {
            String id = ids[k];
            double d = r.links().stream()
                    .filter(l -> l.id().equals(id))
                    .findFirst()
                    .orElseThrow()
                    .chosenDiameter();
            out[k] = java.util.Arrays.binarySearch(BORES, d);
        }
        return out;
    }

    /** A branched main: reservoir R → A, A → B and A → C, B → D (invented). */
    static Network tree() {
        return DesignFixtures.network(
                List.of(
                        Node.fixedHead("R", 30, 45),
                        Node.junction("A", 20, 0.002),
                        Node.junction("B", 18, 0.004),
                        Node.junction("C", 15, 0.0015),
                        Node.junction("D", 16, 0.0025)),
                List.of(
                        new Link(pipe("P1", 120, 0.1), "R", "A"),
                        new Link(pipe("P2", 80, 0.1), "A", "B"),
                        new Link(pipe("P3", 60, 0.1), "A", "C"),
                        new Link(pipe("P4", 90, 0.1), "B", "D")));
    }

    @Test
    void treeSizingEqualsTheBruteForceScan() {
        String[] ids = {"P1", "P2", "P3", "P4"};
        Network net = tree();
        NetworkSizingResult r = NetworkSizing.standard()
                .size(net, allSized(ids), new NetworkSizing.Limits(V_MAX, GRADIENT_MAX, Double.POSITIVE_INFINITY));
        assertTrue(r.settled());
        assertEquals(2, r.rounds(), "a tree settles on the second round (its flows do not depend on sizes)");
        List<int[]> feasible = feasibleCombinations(net, ids);
        assertFalse(feasible.isEmpty());
        // In a tree each pipe's flow is fixed by the demands, so the feasible set has a least element:
        // the componentwise minimum over it, which must itself be feasible.
        int[] least = feasible.get(0).clone();
        for (int[] f : feasible) {
            for (int k = 0; k < ids.length; k++) {
                least[k] = Math.min(least[k], f[k]);
            }
        }
        int[] finalLeast = least;
        assertTrue(feasible.stream().anyMatch(f -> java.util.Arrays.equals(f, finalLeast)));
        assertEquals(java.util.Arrays.toString(least), java.util.Arrays.toString(chosen(r, ids)));
        // Each pipe's flows: the sum of the demands downstream (continuity), to solver tolerance.
        assertEquals(0.01, r.links().get(0).flow(), 1e-9);
        assertEquals(0.0065, r.links().get(1).flow(), 1e-9);
        // The figures reported for the chosen size against those computed here.
        for (NetworkSizingResult.LinkSizing l : r.links()) {
            double d = l.chosenDiameter();
            assertEquals(l.flow() / (Math.PI * d * d / 4), l.velocity(), 1e-12 * l.velocity());
            assertEquals(gradient(d, Math.abs(l.flow())), l.gradient(), 1e-9 * l.gradient());
            assertTrue(l.meetsLimits());
            assertEquals(NetworkSizingResult.Basis.SMALLEST_MEETING_LIMITS, l.basis());
            // Every smaller candidate is rejected with a reason, every larger one accepted.
            for (NetworkSizingResult.CandidateCheck c : l.candidates()) {
                assertEquals(c.innerDiameter() >= d, c.accepted(), l.id() + " " + c.size());
                assertEquals(c.accepted(), c.reasons().isEmpty());
            }
        }
    }

    /** A looped main: R → A, then A–B, A–C and B–C close a loop, demands at B and C (invented). */
    static Network loop() {
        return DesignFixtures.network(
                List.of(
                        Node.fixedHead("R", 30, 50),
                        Node.junction("A", 20, 0.0),
                        Node.junction("B", 17, 0.005),
                        Node.junction("C", 14, 0.004)),
                List.of(
                        new Link(pipe("P1", 150, 0.1), "R", "A"),
                        new Link(pipe("P2", 100, 0.1), "A", "B"),
                        new Link(pipe("P3", 220, 0.1), "A", "C"),
                        new Link(pipe("P4", 70, 0.1), "B", "C")));
    }

    @Test
    void loopSizingIsFeasibleAndNoFeasibleCombinationIsSmallerInEveryPipe() {
        String[] ids = {"P1", "P2", "P3", "P4"};
        Network net = loop();
        NetworkSizingResult r = NetworkSizing.standard()
                .size(net, allSized(ids), new NetworkSizing.Limits(V_MAX, GRADIENT_MAX, Double.POSITIVE_INFINITY));
        assertTrue(r.settled());
        int[] ours = chosen(r, ids);
        List<int[]> feasible = feasibleCombinations(net, ids);
        // Ours is among the combinations the scan finds feasible at their own flows...
        assertTrue(feasible.stream().anyMatch(f -> java.util.Arrays.equals(f, ours)), java.util.Arrays.toString(ours));
        // ...and no feasible combination is at most ours in every pipe and smaller in one (Pareto-least).
        for (int[] f : feasible) {
            boolean atMost = true;
            boolean smaller = false;
            for (int k = 0; k < ids.length; k++) {
                atMost &= f[k] <= ours[k];
                smaller |= f[k] < ours[k];
            }
            assertFalse(atMost && smaller, "feasible " + java.util.Arrays.toString(f) + " is smaller than ours");
        }
        // Each pipe at its chosen size is the smallest meeting the limits at the sized network's flows.
        for (NetworkSizingResult.LinkSizing l : r.links()) {
            for (NetworkSizingResult.CandidateCheck c : l.candidates()) {
                assertEquals(meets(c.innerDiameter(), l.flow()), c.accepted(), l.id() + " " + c.size());
            }
            assertTrue(l.candidates().stream()
                    .filter(NetworkSizingResult.CandidateCheck::accepted)
                    .allMatch(c -> c.innerDiameter() >= l.chosenDiameter()));
        }
    }

    @Test
    void aHeadBudgetGrowsPipesOnTheIndexCircuitUntilItIsMet() {
        String[] ids = {"P1", "P2", "P3", "P4"};
        Network net = tree();
        NetworkSizing.Limits free = new NetworkSizing.Limits(V_MAX, GRADIENT_MAX, Double.POSITIVE_INFINITY);
        NetworkSizingResult unlimited = NetworkSizing.standard().size(net, allSized(ids), free);
        double loss = unlimited.indexLoss();
        assertTrue(loss > 0);
        // The index loss is H_source − H_terminal along the path (telescoping heads), checked here.
        String terminal = unlimited.indexPath().orElseThrow().terminal();
        assertEquals(45 - unlimited.solved().node(terminal).orElseThrow().head(), loss, 1e-9, "index loss telescopes");
        double budget = 0.8 * loss;
        NetworkSizingResult r = NetworkSizing.standard()
                .size(net, allSized(ids), new NetworkSizing.Limits(V_MAX, GRADIENT_MAX, budget));
        assertTrue(r.withinBudget());
        assertTrue(r.indexLoss() <= budget);
        assertTrue(r.links().stream().anyMatch(l -> l.basis() == NetworkSizingResult.Basis.HEAD_BUDGET));
        // Only pipes are grown, never shrunk below the limits' choice.
        for (int k = 0; k < ids.length; k++) {
            assertTrue(r.links().get(k).chosenDiameter()
                    >= unlimited.links().get(k).chosenDiameter());
        }
        // A budget no size can meet is named with a serious caution.
        NetworkSizingResult impossible =
                NetworkSizing.standard().size(net, allSized(ids), new NetworkSizing.Limits(V_MAX, GRADIENT_MAX, 1e-3));
        assertFalse(impossible.withinBudget());
        assertTrue(impossible.cautions().stream().anyMatch(c -> c.code().equals("network-sizing-over-budget")));
    }

    @Test
    void aFlowNoSizeCanCarryKeepsTheLargestAndSaysSo() {
        Network net = DesignFixtures.network(
                List.of(Node.fixedHead("R", 0, 60), Node.junction("J", 0, 0.05)),
                List.of(new Link(pipe("P", 100, 0.1), "R", "J")));
        NetworkSizingResult r = NetworkSizing.standard()
                .size(net, allSized("P"), new NetworkSizing.Limits(V_MAX, GRADIENT_MAX, Double.POSITIVE_INFINITY));
        NetworkSizingResult.LinkSizing l = r.links().get(0);
        assertEquals(0.125, l.chosenDiameter());
        assertFalse(l.meetsLimits());
        assertEquals(NetworkSizingResult.Basis.NONE_MEETS_LIMITS, l.basis());
        assertTrue(r.cautions().stream().anyMatch(c -> c.code().equals("network-sizing-no-size")));
        // 50 L/s in 125 mm: V = 4.07 m/s, computed here.
        assertEquals(0.05 / (Math.PI * 0.125 * 0.125 / 4), l.velocity(), 1e-12);
    }

    @Test
    void badCandidatesAreRefusedByName() {
        Network net = tree();
        NetworkSizing.Limits limits = new NetworkSizing.Limits(V_MAX, GRADIENT_MAX, Double.POSITIVE_INFINITY);
        InputException unknown = assertThrows(
                InputException.class, () -> NetworkSizing.standard().size(net, allSized("P9"), limits));
        assertTrue(unknown.getMessage().contains("P9"));
        Map<String, List<CandidateSize>> empty = new HashMap<>();
        empty.put("P1", List.of());
        assertThrows(InputException.class, () -> NetworkSizing.standard().size(net, empty, limits));
        assertThrows(InputException.class, () -> new NetworkSizing.Limits(0, 1, 1));
        assertThrows(InputException.class, () -> new NetworkSizing.Limits(1, Double.NaN, 1));
        assertThrows(InputException.class, () -> new NetworkSizing.Limits(1, 1, -2));
    }
}
