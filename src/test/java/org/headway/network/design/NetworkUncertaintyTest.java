package org.headway.network.design;

import static org.headway.network.design.DesignFixtures.WATER;
import static org.headway.network.design.DesignFixtures.dwPipe;
import static org.headway.network.design.DesignFixtures.hwPipe;
import static org.headway.network.design.DesignFixtures.link;
import static org.headway.network.design.DesignFixtures.network;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.SplittableRandom;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.caution.Severity;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.Node;
import org.headway.network.design.NetworkUncertainty.Method;
import org.headway.network.design.NetworkUncertainty.Spec;
import org.headway.network.design.NetworkUncertaintyResult.NodeRange;
import org.headway.network.design.NetworkUncertaintyResult.PumpRange;
import org.headway.system.CheckValve;
import org.headway.system.LocalLoss;
import org.headway.system.PumpCurve;
import org.headway.system.PumpElement;
import org.headway.system.Segment;
import org.junit.jupiter.api.Test;

/**
 * Network uncertainty against brute force and closed forms on invented networks: the corners of a
 * single-source tree against every combination of roughness ends and demand ends solved here; the
 * Monte Carlo of a looped network against a sampling loop written here with the documented seed
 * convention; a pump's flow range against the pump curve ∩ system curve found here by bisection with
 * the Colebrook–White friction factor solved here.
 */
class NetworkUncertaintyTest {

    /**
     * Brute force solves the same networks with the same solver, so agreement is to round-off; 10⁻⁹
     * relative is the brief's tolerance and leaves room for a different operation order.
     */
    private static final double BRUTE_FORCE_RELATIVE = 1e-9;

    /**
     * Interior points stay within the corners up to the solver's accuracy: energy residual ≤ 10⁻⁹ m
     * (NetworkSolver's documented criterion) is ~10⁻⁵ Pa; 10⁻⁹ of the pressure (~5·10⁻⁴ Pa) covers it.
     */
    private static final double INSIDE_RELATIVE = 1e-9;

    /**
     * Pump flow against the bisected closed form: the solver's energy residual ≤ 10⁻⁹ m over a
     * pump-minus-system slope of ~3·10³ m per m³/s moves Q by ~3·10⁻¹³ m³/s (2·10⁻¹¹ relative); the
     * Colebrook solver's tolerance is 10⁻¹⁴. 10⁻⁹ relative leaves margin.
     */
    private static final double PUMP_FLOW_RELATIVE = 1e-9;

    private static final NetworkSolver SOLVER = NetworkSolver.standard();

    // ---------------------------------------------------------------- fixtures

    /**
     * A branched tree from one reservoir: R → p1 → A; A → p2 → B; A → p3 → C; C → p4 → D. Roughness
     * ranges of the order published for new to aged steel and iron (invented values).
     */
    static Network tree() {
        return network(
                List.of(
                        Node.fixedHead("R", 40, 60),
                        Node.junction("A", 5, 0.004),
                        Node.junction("B", 8, 0.003),
                        Node.junction("C", 2, 0.005),
                        Node.junction("D", 10, 0.002)),
                List.of(
                        link(dwPipe("p1", 400, 0.15, 2e-4, 5e-5, 1e-3), "R", "A"),
                        link(dwPipe("p2", 250, 0.08, 4.5e-5, 1.5e-5, 3e-4), "A", "B"),
                        link(dwPipe("p3", 300, 0.1, 1.5e-4, 1e-4, 2e-3), "A", "C"),
                        link(dwPipe("p4", 200, 0.065, 5e-5, 1e-6, 5e-4), "C", "D")));
    }

    /** A looped main: R → p1 → A, then A, B, C, D joined by five pipes in two loops. */
    static Network looped() {
        return network(
                List.of(
                        Node.fixedHead("R", 45, 50),
                        Node.junction("A", 2, 0.003),
                        Node.junction("B", 4, 0.004),
                        Node.junction("C", 3, 0.002),
                        Node.junction("D", 6, 0.003)),
                List.of(
                        link(dwPipe("p1", 300, 0.2, 1e-4, 2e-5, 1e-3), "R", "A"),
                        link(dwPipe("p2", 400, 0.15, 5e-5, 1e-5, 5e-4), "A", "B"),
                        link(dwPipe("p3", 350, 0.15, 2e-4, 1e-4, 2e-3), "A", "C"),
                        link(dwPipe("p4", 300, 0.1, 1e-4, 5e-5, 1.5e-3), "B", "D"),
                        link(dwPipe("p5", 250, 0.1, 3e-5, 1e-6, 3e-4), "C", "D"),
                        link(dwPipe("p6", 200, 0.1, 1e-4, 1e-4, 1e-4), "B", "C")));
    }

    /**
     * A main from a high reservoir R to junction J and on to a lower tank T that J fills, with a
     * branch J → K: a rougher filling pipe b keeps more head at J, a rougher feed a less, so J's
     * extremes lie away from both corners.
     */
    static Network twoSources() {
        return network(
                List.of(
                        Node.fixedHead("R", 60, 60),
                        Node.junction("J", 10, 0.004),
                        Node.fixedHead("T", 40, 40),
                        Node.junction("K", 12, 0.002)),
                List.of(
                        link(dwPipe("a", 800, 0.15, 1e-4, 2e-5, 1e-3), "R", "J"),
                        link(dwPipe("b", 600, 0.1, 1e-4, 2e-5, 1e-3), "J", "T"),
                        link(dwPipe("c", 300, 0.08, 5e-5, 1e-5, 5e-4), "J", "K")));
    }

    /** Maker's points of an invented pump: on H = 40 − 20 000 Q². */
    private static final double[][] PUMP_POINTS = {{0, 40}, {0.01, 38}, {0.02, 32}};

    private static PumpElement pump() {
        List<PumpCurve.Point> points = new ArrayList<>();
        for (double[] p : PUMP_POINTS) {
            points.add(new PumpCurve.Point(p[0], p[1]));
        }
        return new PumpElement("P", PumpCurve.fit("invented", points, OptionalDouble.empty()));
    }

    private static final double LOW_LEVEL = 10;
    private static final double HIGH_LEVEL = 30;
    private static final double MAIN_LENGTH = 500;
    private static final double MAIN_BORE = 0.1;
    private static final double MAIN_LOW = 1e-5;
    private static final double MAIN_HIGH = 5e-4;

    /** Low reservoir → pump P → J (no demand) → main → high reservoir. */
    static Network pumped() {
        return network(
                List.of(
                        Node.fixedHead("L", LOW_LEVEL, LOW_LEVEL),
                        Node.junction("J", 0, 0),
                        Node.fixedHead("H", HIGH_LEVEL, HIGH_LEVEL)),
                List.of(
                        link(pump(), "L", "J"),
                        link(dwPipe("main", MAIN_LENGTH, MAIN_BORE, 5e-5, MAIN_LOW, MAIN_HIGH), "J", "H")));
    }

    /** The network with pipe roughness eps[s] for the s-th pipe in link order and demands × m, built here. */
    static Network variant(Network net, double[] eps, double m) {
        List<Link> links = new ArrayList<>();
        int s = 0;
        for (Link l : net.links()) {
            if (l.element() instanceof Segment seg) {
                links.add(new Link(seg.withRoughness(eps[s++]), l.from(), l.to(), l.designFlow()));
            } else {
                links.add(l);
            }
        }
        List<Node> nodes = new ArrayList<>();
        for (Node n : net.nodes()) {
            List<Node.Demand> d = new ArrayList<>();
            for (Node.Demand x : n.demands()) {
                d.add(new Node.Demand(x.name(), x.flow() * m));
            }
            nodes.add(n.headIsFixed() ? n : n.withDemands(d));
        }
        return new Network(net.title(), net.context(), nodes, links, net.site());
    }

    static List<Segment> pipes(Network net) {
        return net.links().stream()
                .map(Link::element)
                .filter(Segment.class::isInstance)
                .map(Segment.class::cast)
                .toList();
    }

    private static void assertRelative(double expected, double actual, double relative, String what) {
        assertEquals(expected, actual, relative * Math.abs(expected), what);
    }

    // ---------------------------------------------------------------- (1) tree: corners, brute force

    @Test
    void aSingleSourceTreeGetsCornersThatEqualTheExtremesOfEveryEndCombination() {
        Network net = tree();
        Spec spec = Spec.of(0.8, 1.25);
        NetworkUncertaintyResult r = NetworkUncertainty.run(net, spec, SOLVER);
        assertEquals(Method.CORNERS, r.method());
        assertTrue(r.reason().contains("tree"), r.reason());
        assertEquals(3, r.solves());
        assertEquals(0, r.failedSolves());
        List<Segment> pipes = pipes(net);
        int n = pipes.size();
        int nodes = net.nodes().size();
        double[] min = new double[nodes];
        double[] max = new double[nodes];
        java.util.Arrays.fill(min, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(max, Double.NEGATIVE_INFINITY);
        // Brute force: all 2^n roughness-end combinations × both demand ends (2^(n+1) = 32 solves).
        for (int mask = 0; mask < (1 << (n + 1)); mask++) {
            double[] eps = new double[n];
            for (int s = 0; s < n; s++) {
                eps[s] = (mask >> s & 1) == 1
                        ? pipes.get(s).roughnessHigh()
                        : pipes.get(s).roughnessLow();
            }
            double m = (mask >> n & 1) == 1 ? spec.demandHigh() : spec.demandLow();
            NetworkResult sol = SOLVER.solve(variant(net, eps, m));
            assertTrue(sol.converged());
            for (int i = 0; i < nodes; i++) {
                min[i] = Math.min(min[i], sol.nodes().get(i).pressure());
                max[i] = Math.max(max[i], sol.nodes().get(i).pressure());
            }
        }
        double rhoG = WATER.density() * 9.80665; // standard gravity (CGPM 1901)
        for (int i = 0; i < nodes; i++) {
            NodeRange nr = r.nodes().get(i);
            assertRelative(min[i], nr.pressure().low(), BRUTE_FORCE_RELATIVE, nr.id() + " low");
            assertRelative(max[i], nr.pressure().high(), BRUTE_FORCE_RELATIVE, nr.id() + " high");
            double z = net.nodes().get(i).elevation();
            assertRelative(min[i] / rhoG + z, nr.head().low(), BRUTE_FORCE_RELATIVE, nr.id() + " head low");
            assertTrue(nr.pressure().low() <= nr.pressure().nominal()
                    && nr.pressure().nominal() <= nr.pressure().high());
            if (!nr.fixed()) {
                assertEquals("low corner", nr.lowAt());
                assertEquals("high corner", nr.highAt());
                assertTrue(nr.pressure().high() - nr.pressure().low() > 1000, nr.id() + " has a real spread");
            }
        }
        assertTrue(r.cautions().stream().noneMatch(c -> c.code().equals("corners-out-of-order")));
        assertTrue(r.cautions().stream().anyMatch(c -> c.code().equals("uncertainty-corners")));
        assertTrue(r.cautions().contains(Caution.GENERAL_REVIEW));
    }

    @Test
    void aDenseGridOfInteriorPointsOfTheTreeStaysWithinTheCorners() {
        Network net = tree();
        Spec spec = Spec.of(0.9, 1.1);
        NetworkUncertaintyResult r = NetworkUncertainty.run(net, spec, SOLVER);
        List<Segment> pipes = pipes(net);
        int n = pipes.size();
        double[] levels = {0.05, 0.3, 0.5, 0.7, 0.95};
        int combos = (int) Math.pow(levels.length, n + 1); // 5^5 = 3125 interior points
        int checked = 0;
        for (int c = 0; c < combos; c += 7) { // every 7th: 447 solves, every level of every variable still met
            int code = c;
            double[] eps = new double[n];
            for (int s = 0; s < n; s++) {
                double u = levels[code % levels.length];
                code /= levels.length;
                eps[s] = pipes.get(s).roughnessLow()
                        + u * (pipes.get(s).roughnessHigh() - pipes.get(s).roughnessLow());
            }
            double m = spec.demandLow() + levels[code % levels.length] * (spec.demandHigh() - spec.demandLow());
            NetworkResult sol = SOLVER.solve(variant(net, eps, m));
            for (int i = 0; i < net.nodes().size(); i++) {
                double p = sol.nodes().get(i).pressure();
                NodeRange nr = r.nodes().get(i);
                double slack = INSIDE_RELATIVE * Math.abs(p);
                assertTrue(
                        p >= nr.pressure().low() - slack && p <= nr.pressure().high() + slack,
                        nr.id() + " at grid point " + c + ": " + p + " outside " + nr.pressure());
            }
            checked++;
        }
        assertTrue(checked > 400);
    }

    // ---------------------------------------------------------------- (2) loops: Monte Carlo

    @Test
    void aLoopedNetworkGetsASeededMonteCarloThatAnIndependentLoopReproducesExactly() {
        Network net = looped();
        Spec spec = new Spec(0.85, 1.2, 40, 7);
        NetworkUncertaintyResult r = NetworkUncertainty.run(net, spec, SOLVER);
        assertEquals(Method.MONTE_CARLO, r.method());
        assertTrue(r.reason().contains("loops") && r.reason().contains("seed 7"), r.reason());
        assertEquals(43, r.solves());
        assertEquals(40, r.randomSamples());

        // The documented convention, written out here: split once per sample from the seed; from each
        // sample's stream one multiplier, then each pipe's roughness in link order.
        List<Segment> pipes = pipes(net);
        int nodes = net.nodes().size();
        double[] min = new double[nodes];
        double[] max = new double[nodes];
        java.util.Arrays.fill(min, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(max, Double.NEGATIVE_INFINITY);
        List<Network> solves = new ArrayList<>();
        double[] high = pipes.stream().mapToDouble(Segment::roughnessHigh).toArray();
        double[] low = pipes.stream().mapToDouble(Segment::roughnessLow).toArray();
        double[] nominal = pipes.stream().mapToDouble(Segment::roughness).toArray();
        solves.add(variant(net, high, spec.demandHigh()));
        solves.add(variant(net, low, spec.demandLow()));
        solves.add(variant(net, nominal, 1));
        SplittableRandom master = new SplittableRandom(spec.seed());
        for (int k = 0; k < spec.samples(); k++) {
            SplittableRandom rng = master.split();
            double m = spec.demandLow() + (spec.demandHigh() - spec.demandLow()) * rng.nextDouble();
            double[] eps = new double[pipes.size()];
            for (int s = 0; s < eps.length; s++) {
                Segment seg = pipes.get(s);
                eps[s] = seg.roughnessLow() + (seg.roughnessHigh() - seg.roughnessLow()) * rng.nextDouble();
            }
            solves.add(variant(net, eps, m));
        }
        List<NetworkResult> corners = new ArrayList<>();
        for (Network v : solves) {
            NetworkResult sol = SOLVER.solve(v);
            assertTrue(sol.converged());
            if (corners.size() < 2) {
                corners.add(sol);
            }
            for (int i = 0; i < nodes; i++) {
                min[i] = Math.min(min[i], sol.nodes().get(i).pressure());
                max[i] = Math.max(max[i], sol.nodes().get(i).pressure());
            }
        }
        for (int i = 0; i < nodes; i++) {
            NodeRange nr = r.nodes().get(i);
            // Same networks, same solver: bit for bit.
            assertEquals(min[i], nr.pressure().low(), 0.0, nr.id() + " low");
            assertEquals(max[i], nr.pressure().high(), 0.0, nr.id() + " high");
            assertTrue(nr.pressure().low() <= nr.pressure().nominal()
                    && nr.pressure().nominal() <= nr.pressure().high());
            for (NetworkResult c : corners) {
                double p = c.nodes().get(i).pressure();
                assertTrue(nr.pressure().low() <= p && p <= nr.pressure().high());
            }
        }
        assertTrue(r.cautions().stream()
                .anyMatch(c -> c.code().equals("uncertainty-sampled-extremes") && c.severity() == Severity.WARNING));
    }

    @Test
    void theSameSeedGivesTheSameRangesOnOneOrTwoThreadsAndAnotherSeedOthers() {
        Network net = twoSources();
        Spec spec = new Spec(0.9, 1.1, 30, 11);
        NetworkUncertaintyResult one = NetworkUncertainty.run(net, spec, SOLVER, 1);
        NetworkUncertaintyResult two = NetworkUncertainty.run(net, spec, SOLVER, 2);
        NetworkUncertaintyResult again = NetworkUncertainty.run(net, spec, SOLVER, 2);
        assertEquals(one.nodes(), two.nodes());
        assertEquals(two.nodes(), again.nodes());
        assertEquals(one.reason(), two.reason());
        NetworkUncertaintyResult other = NetworkUncertainty.run(net, spec.withSeed(12), SOLVER);
        assertNotEquals(one.nodes(), other.nodes());
    }

    @Test
    void withTwoFixedHeadsTheSampledRangeReachesBeyondBothCorners() {
        Network net = twoSources();
        NetworkUncertaintyResult r = NetworkUncertainty.run(net, Spec.of(0.9, 1.1), SOLVER);
        assertEquals(Method.MONTE_CARLO, r.method());
        assertTrue(r.reason().contains("2 fixed-head nodes"), r.reason());
        List<Segment> pipes = pipes(net);
        double[] high = pipes.stream().mapToDouble(Segment::roughnessHigh).toArray();
        double[] low = pipes.stream().mapToDouble(Segment::roughnessLow).toArray();
        double lowCorner =
                SOLVER.solve(variant(net, high, 1.1)).node("J").orElseThrow().pressure();
        double highCorner =
                SOLVER.solve(variant(net, low, 0.9)).node("J").orElseThrow().pressure();
        NodeRange j = r.node("J").orElseThrow();
        // Why corners are not used here: the sampled range is wider than the corners' on both sides.
        assertTrue(j.pressure().low() < Math.min(lowCorner, highCorner), j.toString());
        assertTrue(j.pressure().high() > Math.max(lowCorner, highCorner), j.toString());
        assertTrue(j.lowAt().startsWith("sample ") && j.highAt().startsWith("sample "), j.toString());
    }

    @Test
    void moreSamplesFromTheSameSeedOnlyWidenTheRanges() {
        // The first N streams split from a seed are the same whatever is split after them, so the
        // solves of 20 samples are among those of 60.
        Network net = twoSources();
        Spec spec = new Spec(0.9, 1.1, 20, 3);
        NetworkUncertaintyResult few = NetworkUncertainty.run(net, spec, SOLVER);
        NetworkUncertaintyResult many = NetworkUncertainty.run(net, spec.withSamples(60), SOLVER);
        for (int i = 0; i < few.nodes().size(); i++) {
            NodeRange a = few.nodes().get(i);
            NodeRange b = many.nodes().get(i);
            assertTrue(b.pressure().low() <= a.pressure().low()
                    && b.pressure().high() >= a.pressure().high());
        }
    }

    // ---------------------------------------------------------------- (3) pump duty

    /**
     * Colebrook–White, 1/√f = −2 log₁₀(ε/(3.7 D) + 2.51/(Re √f)) (Colebrook, J. Inst. Civ. Eng. 11,
     * 1939, eq. 10), by fixed-point iteration on 1/√f here.
     */
    private static double colebrook(double reynolds, double relativeRoughness) {
        double x = 8;
        for (int i = 0; i < 200; i++) {
            x = -2 * Math.log10(relativeRoughness / 3.7 + 2.51 * x / reynolds);
        }
        return 1 / (x * x);
    }

    /** Darcy–Weisbach h = f (L/D) V²/(2 g), g = 9.80665 m/s² (standard gravity). */
    private static double mainLoss(double flow, double roughness) {
        double area = Math.PI * MAIN_BORE * MAIN_BORE / 4;
        double v = flow / area;
        double re = WATER.density() * v * MAIN_BORE / WATER.dynamicViscosity();
        return colebrook(re, roughness / MAIN_BORE) * MAIN_LENGTH / MAIN_BORE * v * v / (2 * 9.80665);
    }

    /** The quadratic through the maker's three points, Lagrange form written here. */
    private static double pumpHead(double q) {
        double sum = 0;
        for (int i = 0; i < 3; i++) {
            double term = PUMP_POINTS[i][1];
            for (int j = 0; j < 3; j++) {
                if (j != i) {
                    term *= (q - PUMP_POINTS[j][0]) / (PUMP_POINTS[i][0] - PUMP_POINTS[j][0]);
                }
            }
            sum += term;
        }
        return sum;
    }

    /** Pump curve ∩ system curve: L + H_p(Q) − h(Q) = H, by bisection (the left side falls with Q). */
    private static double dutyFlow(double roughness) {
        double lo = 1e-6;
        double hi = 0.03;
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            if (LOW_LEVEL + pumpHead(mid) - mainLoss(mid, roughness) - HIGH_LEVEL > 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    @Test
    void aPumpsFlowRangeRunsFromTheRoughEndToTheSmoothEndOfItsMain() {
        Network net = pumped();
        NetworkUncertaintyResult r =
                NetworkUncertainty.run(net, Spec.roughnessOnly().withSamples(50), SOLVER);
        assertEquals(Method.MONTE_CARLO, r.method());
        assertTrue(r.reason().contains("pumps (P)") && r.reason().contains("2 fixed-head nodes"), r.reason());
        PumpRange p = r.pump("P").orElseThrow();
        // One pipe, no demand: the flow falls monotonically with the main's roughness, so the sampled
        // extremes are the corners, which the study always solves.
        double qRough = dutyFlow(MAIN_HIGH);
        double qSmooth = dutyFlow(MAIN_LOW);
        assertRelative(qRough, p.flow().low(), PUMP_FLOW_RELATIVE, "low flow");
        assertRelative(qSmooth, p.flow().high(), PUMP_FLOW_RELATIVE, "high flow");
        assertRelative(dutyFlow(5e-5), p.flow().nominal(), PUMP_FLOW_RELATIVE, "nominal flow");
        assertEquals("low corner", p.lowFlowAt());
        assertEquals("high corner", p.highFlowAt());
        // Head across the pump: its curve at those flows (the head is highest at the lowest flow).
        assertEquals(pumpHead(qSmooth), p.head().low(), 1e-7);
        assertEquals(pumpHead(qRough), p.head().high(), 1e-7);
        assertTrue(qSmooth - qRough > 1e-3, "the roughness range matters: " + qRough + " … " + qSmooth);
        assertEquals(0, p.shutSolves());
    }

    // ---------------------------------------------------------------- choice of method

    @Test
    void cornersOnlyWhereMonotonicityIsShown() {
        LocalLoss open = LocalLoss.ofLossCoefficient(2.0, 0.1);
        Network forward = network(
                List.of(Node.fixedHead("R", 30, 30), Node.junction("A", 0, 0.002), Node.junction("B", 0, 0.001)),
                List.of(link(hwPipe("p", 100, 0.1, 120), "R", "A"), link(new CheckValve("cv", "cv", open), "A", "B")));
        assertEquals(Method.CORNERS, NetworkUncertainty.choose(forward).method());
        Network backward = network(
                forward.nodes(),
                List.of(link(hwPipe("p", 100, 0.1, 120), "R", "A"), link(new CheckValve("cv", "cv", open), "B", "A")));
        assertTrue(NetworkUncertainty.choose(backward).reason().contains("check valves"));
        Network inflow = network(
                List.of(Node.fixedHead("R", 30, 30), Node.junction("A", 0, 0.002), Node.junction("B", 0, -0.001)),
                forward.links());
        assertEquals(Method.MONTE_CARLO, NetworkUncertainty.choose(inflow).method());
        assertTrue(NetworkUncertainty.choose(inflow).reason().contains("inflows"));
        assertEquals(Method.MONTE_CARLO, NetworkUncertainty.choose(looped()).method());
        assertEquals(Method.CORNERS, NetworkUncertainty.choose(tree()).method());
    }

    @Test
    void hazenWilliamsPipesAreHeldAndSaidSo() {
        Network net = network(
                List.of(Node.fixedHead("R", 30, 30), Node.junction("A", 0, 0.002)),
                List.of(link(hwPipe("p", 100, 0.1, 120), "R", "A")));
        NetworkUncertaintyResult r = NetworkUncertainty.run(net, Spec.roughnessOnly(), SOLVER);
        NodeRange a = r.node("A").orElseThrow();
        assertEquals(a.pressure().nominal(), a.pressure().low(), 0.0);
        assertEquals(a.pressure().nominal(), a.pressure().high(), 0.0);
        assertTrue(r.cautions().stream().anyMatch(c -> c.code().equals("hazen-williams-held")));
        assertTrue(r.cautions().stream().anyMatch(c -> c.code().equals("nothing-varies")));
    }

    // ---------------------------------------------------------------- (4) bad spec

    @Test
    void badSpecsNameTheOption() {
        for (double[] range :
                new double[][] {{0, 1.1}, {-0.5, 1}, {1.05, 1.2}, {0.9, 0.95}, {0.9, Double.NaN}, {0.9, 11}}) {
            InputException e = assertThrows(InputException.class, () -> Spec.of(range[0], range[1]));
            assertEquals("--demand-range", e.where());
        }
        InputException zero = assertThrows(InputException.class, () -> new Spec(0.9, 1.1, 0, 1));
        assertEquals("--samples", zero.where());
        assertTrue(zero.getMessage().contains("got 0"));
        InputException many = assertThrows(InputException.class, () -> new Spec(0.9, 1.1, 100_001, 1));
        assertEquals("--samples", many.where());
        InputException low = assertThrows(InputException.class, () -> Spec.of(1.05, 1.2));
        assertTrue(low.getMessage().contains("1.05"), low.getMessage());
        assertThrows(InputException.class, () -> NetworkUncertainty.run(tree(), Spec.roughnessOnly(), SOLVER, 0));
    }
}
