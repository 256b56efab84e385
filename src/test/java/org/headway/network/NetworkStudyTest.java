package org.headway.network;

import static org.headway.network.NetworkFixtures.link;
import static org.headway.network.NetworkFixtures.network;
import static org.headway.network.NetworkFixtures.pipe;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.headway.caution.InputException;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.PressureLimits;
import org.headway.system.Segment;
import org.junit.jupiter.api.Test;

/** Demand cases, the pressure check over cases and the index circuit, each against a calculation in the test. */
class NetworkStudyTest {

    private static final NetworkSolver SOLVER = NetworkSolver.standard();

    /** g₀ (m/s²), CGPM 1901, written here so the hand calculations do not borrow the project's constant. */
    private static final double G = 9.80665;

    /**
     * Pressures from the solve against the hand heads: the solver's head tolerance 10⁻⁶ m is about
     * 0.01 Pa of water; five times that.
     */
    private static final double PRESSURE_TOLERANCE = 0.05;

    /** Head-loss coefficient of a Kv valve, h = c Q²: Δp = (ρ/ρ₀)(Q/Kv)² × 1 bar (IEC 60534-2-1), Q in m³/h. */
    static double kvResistance(double kv) {
        double ratio = 3600.0 / kv;
        return ratio * ratio * 1e5 / (1000.0 * G);
    }

    private static Node junction(String id, double z, Node.Demand... demands) {
        return new Node(
                id,
                id,
                Node.Kind.JUNCTION,
                z,
                List.of(demands),
                OptionalDouble.empty(),
                OptionalDouble.empty(),
                OptionalDouble.empty());
    }

    /** A small looped network whose junctions carry two named demand categories. */
    private static Network looped(double j1Domestic, double j1Trade, double j2Domestic, double j3Domestic) {
        return network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 60, 60),
                        junction("J1", 20, new Node.Demand("domestic", j1Domestic), new Node.Demand("trade", j1Trade)),
                        junction("J2", 15, new Node.Demand("domestic", j2Domestic)),
                        junction("J3", 18, new Node.Demand("domestic", j3Domestic))),
                List.of(
                        link(pipe("P1", 400, 0.2, 4.5e-5), "R", "J1"),
                        link(pipe("P2", 300, 0.15, 4.5e-5), "J1", "J2"),
                        link(pipe("P3", 250, 0.1, 4.5e-5), "J1", "J3"),
                        link(pipe("P4", 350, 0.1, 4.5e-5), "J2", "J3")));
    }

    @Test
    void eachCaseEqualsASeparateSolveWithTheDemandsScaledByHand() {
        Network base = looped(0.004, 0.003, 0.006, 0.005);
        DemandCase night = new DemandCase("night", 0.4, Map.of("domestic", 0.3), Map.of());
        DemandCase fire = new DemandCase("fire", 1.0, Map.of(), Map.of("J3", 0.02));
        DemandCase peak = DemandCase.scaled("peak", 1.8);
        NetworkStudy study = new NetworkStudy(base, List.of(night, fire, peak), PressureLimits.NONE, 1.0);
        NetworkStudy.Result r = study.solve(SOLVER);
        // Independent: the same network typed again with each case's demands worked by hand —
        // night: domestic × 0.4 × 0.3, trade × 0.4; fire: J3 alone 20 L/s; peak: everything × 1.8.
        Network[] byHand = {
            looped(0.004 * 0.4 * 0.3, 0.003 * 0.4, 0.006 * 0.4 * 0.3, 0.005 * 0.4 * 0.3),
            looped(0.004, 0.003, 0.006, 0.02),
            looped(0.004 * 1.8, 0.003 * 1.8, 0.006 * 1.8, 0.005 * 1.8)
        };
        for (int c = 0; c < 3; c++) {
            NetworkResult expected = SOLVER.solve(byHand[c]);
            NetworkResult got = r.cases().get(c).result();
            assertTrue(got.converged());
            for (int i = 0; i < expected.nodes().size(); i++) {
                assertEquals(expected.nodes().get(i).head(), got.nodes().get(i).head(), 1e-12);
                assertEquals(
                        expected.nodes().get(i).demand(), got.nodes().get(i).demand(), 1e-12 * 0.02);
            }
            for (int k = 0; k < expected.links().size(); k++) {
                assertEquals(expected.links().get(k).flow(), got.links().get(k).flow(), 1e-12 * 0.05);
            }
        }
        // The base solve carries the network's own demands (continuity: the reservoir supplies 18 L/s).
        assertEquals(-0.018, r.base().result().node("R").orElseThrow().demand(), 1e-12);
    }

    @Test
    void pressureTableOnAHandMadeTree() {
        // R (surface 50 m) → valve V1 (Kv 60) → J1 (z 10 m, 6 L/s) → valve V2 (Kv 30) → J2 (z 20 m, 4 L/s).
        double c1 = kvResistance(60);
        double c2 = kvResistance(30);
        double rho = NetworkFixtures.WATER.density();
        Network net = network(
                "colebrook",
                List.of(Node.fixedHead("R", 50, 50), Node.junction("J1", 10, 0.006), Node.junction("J2", 20, 0.004)),
                List.of(
                        link(FlowCoefficientValve.ofKv("V1", "", 60), "R", "J1"),
                        link(FlowCoefficientValve.ofKv("V2", "", 30), "J1", "J2")));
        List<DemandCase> cases = List.of(DemandCase.scaled("low", 0.5), DemandCase.scaled("high", 2.0));
        PressureLimits limits = new PressureLimits(250_000, 380_000);
        NetworkStudy.Result r = new NetworkStudy(net, cases, limits, 1.0).solve(SOLVER);
        PressureCheck check = r.pressureCheck().orElseThrow();
        // Hand: flows by continuity, H_J1 = 50 − c1 (q1+q2)², H_J2 = H_J1 − c2 q2², p = ρ g (H − z).
        double[] m = {0.5, 2.0};
        double[][] p = new double[2][2];
        for (int c = 0; c < 2; c++) {
            double q1 = 0.006 * m[c];
            double q2 = 0.004 * m[c];
            double h1 = 50 - c1 * (q1 + q2) * (q1 + q2);
            double h2 = h1 - c2 * q2 * q2;
            p[c][0] = rho * G * (h1 - 10);
            p[c][1] = rho * G * (h2 - 20);
        }
        assertEquals(2, check.ranges().size(), "junctions only");
        for (int i = 0; i < 2; i++) {
            PressureCheck.NodeRange range = check.ranges().get(i);
            assertEquals(p[1][i], range.minimumPressure(), PRESSURE_TOLERANCE);
            assertEquals("high", range.minimumCase());
            assertEquals(p[0][i], range.maximumPressure(), PRESSURE_TOLERANCE);
            assertEquals("low", range.maximumCase());
        }
        // Which pressures break the limits, worked from the hand values.
        List<String> expected = new java.util.ArrayList<>();
        for (int c = 0; c < 2; c++) {
            for (int i = 0; i < 2; i++) {
                String where = (i == 0 ? "J1" : "J2") + "/" + cases.get(c).name();
                if (p[c][i] < 250_000) {
                    expected.add(where + "/minimum");
                }
                if (p[c][i] > 380_000) {
                    expected.add(where + "/maximum");
                }
            }
        }
        List<String> got = check.violations().stream()
                .map(v -> v.node() + "/" + v.caseName() + "/" + v.bound())
                .toList();
        assertEquals(expected, got);
        assertTrue(expected.size() >= 2, "the limits were chosen so that both bounds are broken: " + expected);
        for (PressureCheck.Violation v : check.violations()) {
            assertEquals(v.bound().equals("minimum") ? 250_000 : 380_000, v.limit());
        }
        assertTrue(r.cautions().stream().anyMatch(c -> c.code().equals("pressure-below-minimum")));
        assertTrue(r.cautions().stream().anyMatch(c -> c.code().equals("pressure-above-maximum")));
    }

    @Test
    void indexCircuitOfATreeIsItsLargestSumOfPipeLosses() {
        // R → P1 → A; A → P2 → B (leaf); A → P3 → C; C → P4 → D (leaf); C → P5 → E (leaf).
        Segment p1 = pipe("P1", 500, 0.2, 4.5e-5);
        Segment p2 = pipe("P2", 300, 0.1, 4.5e-5);
        Segment p3 = pipe("P3", 400, 0.15, 4.5e-5);
        Segment p4 = pipe("P4", 250, 0.08, 4.5e-5);
        Segment p5 = pipe("P5", 350, 0.1, 4.5e-5);
        double qb = 0.006;
        double qd = 0.004;
        double qe = 0.005;
        double qa = 0.001;
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 70, 70),
                        Node.junction("A", 30, qa),
                        Node.junction("B", 25, qb),
                        Node.junction("C", 28, 0),
                        Node.junction("D", 20, qd),
                        Node.junction("E", 22, qe)),
                List.of(
                        link(p1, "R", "A"),
                        link(p2, "A", "B"),
                        link(p3, "A", "C"),
                        link(p4, "C", "D"),
                        link(p5, "C", "E")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged());
        IndexCircuit circuit = IndexCircuit.of(net, r);
        // Independent: flows from continuity on the tree, each loss from the pipe's own law h(Q), summed
        // along each root-to-leaf path.
        var ctx = net.context();
        double h1 = p1.headLoss(qa + qb + qd + qe, ctx);
        double h3 = p3.headLoss(qd + qe, ctx);
        double toB = h1 + p2.headLoss(qb, ctx);
        double toD = h1 + h3 + p4.headLoss(qd, ctx);
        double toE = h1 + h3 + p5.headLoss(qe, ctx);
        assertEquals(
                List.of("B", "D", "E"),
                circuit.paths().stream()
                        .map(IndexCircuit.TerminalPath::terminal)
                        .toList());
        double[] hand = {toB, toD, toE};
        for (int i = 0; i < 3; i++) {
            IndexCircuit.TerminalPath path = circuit.paths().get(i);
            assertEquals("R", path.source());
            // Against the hand sum: within the solve's head tolerance (10⁻⁶ m).
            assertEquals(hand[i], path.headLoss(), 1e-6);
            // Against the head difference source − terminal of the solve: the same to round-off.
            double dh = r.node("R").orElseThrow().head()
                    - r.node(path.terminal()).orElseThrow().head();
            assertEquals(dh, path.headLoss(), 1e-12);
            // And the sum of the solved link losses along the route.
            double sum = 0;
            for (String id : path.links()) {
                sum += r.link(id).orElseThrow().headLoss();
            }
            assertEquals(sum, path.headLoss(), 1e-12);
        }
        int worst = toB >= toD && toB >= toE ? 0 : toD >= toE ? 1 : 2;
        IndexCircuit.TerminalPath index = circuit.index().orElseThrow();
        assertEquals(circuit.paths().get(worst).terminal(), index.terminal());
        List<List<String>> routes = List.of(List.of("P1", "P2"), List.of("P1", "P3", "P4"), List.of("P1", "P3", "P5"));
        assertEquals(routes.get(worst), index.links());
        assertEquals(
                p1.length()
                        + routes.get(worst).stream()
                                .skip(1)
                                .mapToDouble(id -> switch (id) {
                                    case "P2" -> p2.length();
                                    case "P3" -> p3.length();
                                    case "P4" -> p4.length();
                                    default -> p5.length();
                                })
                                .sum(),
                index.length(),
                1e-12);
    }

    @Test
    void inALoopTheTerminalIsWhereTheFlowsMeet() {
        // R → A, then A → B → D and A → C → D; demand at B and D. D receives from both sides, B passes
        // flow on, so D alone is a terminal (definition in IndexCircuit).
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 40, 40),
                        Node.junction("A", 10, 0),
                        Node.junction("B", 10, 0.002),
                        Node.junction("C", 10, 0),
                        Node.junction("D", 10, 0.008)),
                List.of(
                        link(pipe("PA", 100, 0.15, 4.5e-5), "R", "A"),
                        link(pipe("AB", 200, 0.1, 4.5e-5), "A", "B"),
                        link(pipe("BD", 200, 0.1, 4.5e-5), "B", "D"),
                        link(pipe("AC", 150, 0.1, 4.5e-5), "A", "C"),
                        link(pipe("CD", 150, 0.1, 4.5e-5), "C", "D")));
        NetworkResult r = SOLVER.solve(net);
        IndexCircuit circuit = IndexCircuit.of(net, r);
        assertEquals(
                List.of("D"),
                circuit.paths().stream()
                        .map(IndexCircuit.TerminalPath::terminal)
                        .toList());
        IndexCircuit.TerminalPath d = circuit.index().orElseThrow();
        // Both routes lose H_R − H_D; the one named follows the larger inflow at D.
        double viaB = r.link("BD").orElseThrow().flow();
        double viaC = r.link("CD").orElseThrow().flow();
        assertEquals(viaC > viaB ? List.of("PA", "AC", "CD") : List.of("PA", "AB", "BD"), d.links());
        assertEquals(
                r.node("R").orElseThrow().head() - r.node("D").orElseThrow().head(), d.headLoss(), 1e-12);
    }

    @Test
    void demandCasesRefuseUnknownNodesCategoriesAndBadMultipliers() {
        Network base = looped(0.004, 0.003, 0.006, 0.005);
        InputException node = assertThrows(
                InputException.class,
                () -> new NetworkStudy(
                        base, List.of(new DemandCase("x", 1, Map.of(), Map.of("J9", 0.01))), PressureLimits.NONE, 1));
        assertTrue(
                node.getMessage().contains("J9") && node.getMessage().contains("not in the network"), node::getMessage);
        InputException fixed = assertThrows(
                InputException.class,
                () -> new NetworkStudy(
                        base, List.of(new DemandCase("x", 1, Map.of(), Map.of("R", 0.01))), PressureLimits.NONE, 1));
        assertTrue(fixed.getMessage().contains("fixed head"), fixed::getMessage);
        InputException category = assertThrows(
                InputException.class,
                () -> new NetworkStudy(
                        base,
                        List.of(new DemandCase("x", 1, Map.of("garden", 2.0), Map.of())),
                        PressureLimits.NONE,
                        1));
        assertTrue(
                category.getMessage().contains("\"garden\"")
                        && category.getMessage().contains("domestic, trade"),
                category::getMessage);
        assertThrows(InputException.class, () -> DemandCase.scaled("neg", -0.1));
        assertThrows(InputException.class, () -> DemandCase.scaled("nan", Double.NaN));
        InputException twice = assertThrows(
                InputException.class,
                () -> new NetworkStudy(
                        base, List.of(DemandCase.scaled("a", 1), DemandCase.scaled("a", 2)), PressureLimits.NONE, 1));
        assertTrue(twice.getMessage().contains("used twice"), twice::getMessage);
    }
}
