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
import java.util.Optional;
import java.util.OptionalDouble;
import org.headway.caution.InputException;
import org.headway.system.CheckValve;
import org.headway.system.DesignLimits;
import org.headway.system.Element;
import org.headway.system.EndCondition;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.FlowContext;
import org.headway.system.HeadLossCalculator;
import org.headway.system.IsolationValve;
import org.headway.system.LocalLoss;
import org.headway.system.OperatingPoint;
import org.headway.system.PipeRun;
import org.headway.system.PumpCurve;
import org.headway.system.PumpElement;
import org.headway.system.RatedComponent;
import org.headway.system.RunResult;
import org.headway.system.Segment;
import org.headway.system.SiteAtmosphere;
import org.junit.jupiter.api.Test;

/**
 * The global gradient solver against things it does not compute itself: the series calculator on a
 * path, continuity on trees, an independent Hardy Cross loop balance, manufactured solutions, and
 * the series pump operating point. Networks are invented.
 */
class NetworkSolverTest {

    private static final NetworkSolver SOLVER = NetworkSolver.standard();

    /** Largest |inflow − outflow − demand| over junctions, recomputed here from the result. */
    private static double continuity(Network net, NetworkResult r) {
        java.util.Map<String, Double> balance = new java.util.HashMap<>();
        for (Node n : net.nodes()) {
            balance.put(n.id(), -n.totalDemand());
        }
        for (NetworkResult.LinkResult l : r.links()) {
            balance.merge(l.to(), l.flow(), Double::sum);
            balance.merge(l.from(), -l.flow(), Double::sum);
        }
        double max = 0;
        for (Node n : net.nodes()) {
            if (!n.headIsFixed()) {
                max = Math.max(max, Math.abs(balance.get(n.id())));
            }
        }
        return max;
    }

    /** Largest |h(Q) − (H_from − H_to)| over open links, with the element laws evaluated here. */
    private static double energy(Network net, NetworkResult r) {
        double max = 0;
        java.util.Map<String, Double> heads = new java.util.HashMap<>();
        for (NetworkResult.NodeResult n : r.nodes()) {
            heads.put(n.id(), n.head());
        }
        for (int k = 0; k < net.links().size(); k++) {
            Link l = net.links().get(k);
            NetworkResult.LinkResult lr = r.links().get(k);
            if (!lr.status().equals("open")) {
                continue;
            }
            double h = l.element().headLoss(lr.flow(), net.context());
            double dh = heads.get(l.from()) - heads.get(l.to());
            max = Math.max(max, Math.abs(h - dh));
        }
        return max;
    }

    private static void assertBalanced(Network net, NetworkResult r) {
        assertTrue(r.converged(), r.cautions()::toString);
        assertTrue(continuity(net, r) <= 1e-10 + 1e-12 * 10, "continuity " + continuity(net, r));
        assertTrue(energy(net, r) <= 1e-6, "energy " + energy(net, r));
    }

    /**
     * Nearly still pipes with the explicit approximations of Colebrook–White. Two equal parallel
     * routes joined by a bridge: by symmetry the bridge carries no flow (common practice, no source),
     * and on the grid with small demands most pipes run far below Re 2,000. Before the floor of
     * {@code FrictionChecks.EXPLICIT_FLOOR_REYNOLDS} Swamee–Jain and Haaland ran 200 iterations without
     * converging on such a grid and Serghides diverged (its nested logarithms fail near Re 12).
     */
    @Test
    void explicitApproximationsConvergeWithNearlyStillPipes() {
        for (String method : List.of("swamee-jain", "haaland", "serghides", "goudar-sonnad", "colebrook")) {
            List<Node> nodes = List.of(
                    Node.fixedHead("R", 0, 40),
                    Node.junction("A", 0, 0),
                    Node.junction("B", 0, 0),
                    Node.junction("C", 0, 0),
                    Node.junction("D", 0, 0.02));
            List<Link> links = List.of(
                    link(pipe("feed", 100, 0.2, 4.5e-5), "R", "A"),
                    link(pipe("AB", 300, 0.15, 4.5e-5), "A", "B"),
                    link(pipe("AC", 300, 0.15, 4.5e-5), "A", "C"),
                    link(pipe("BD", 250, 0.125, 4.5e-5), "B", "D"),
                    link(pipe("CD", 250, 0.125, 4.5e-5), "C", "D"),
                    link(pipe("bridge", 80, 0.1, 4.5e-5), "B", "C"));
            Network diamond = network(method, nodes, links);
            NetworkResult r = SOLVER.solve(diamond);
            assertBalanced(diamond, r);
            double total = r.link("feed").orElseThrow().flow();
            assertEquals(0.02, total, 1e-12, method);
            assertTrue(Math.abs(r.link("bridge").orElseThrow().flow()) <= 1e-9 * total, method);
            assertEquals(
                    r.link("AB").orElseThrow().flow(),
                    r.link("AC").orElseThrow().flow(),
                    1e-9 * total,
                    method);

            Network grid = NetworkFixtures.grid(12, 7, 60, 2e-5, method);
            NetworkResult g = SOLVER.solve(grid);
            assertBalanced(grid, g);
            assertTrue(g.iterations() <= 40, method + ": " + g.iterations() + " iterations");
            if (!method.equals("colebrook")) {
                assertTrue(
                        g.cautions().stream().anyMatch(c -> c.code().equals("friction-held-below-floor")),
                        method + " names the held pipes");
            }
        }
    }

    @Test
    void pathNetworkReproducesTheSeriesCalculator() {
        List<Element> elements = List.of(
                pipe("a", 120, 0.1, 4.5e-5),
                FlowCoefficientValve.ofKv("v", "valve", 60),
                pipe("b", 80, 0.08, 4.5e-5),
                new RatedComponent("hx", "exchanger", 35_000, 0.012, 2),
                pipe("c", 40, 0.1, 4.5e-5));
        double q = 0.011;
        PipeRun run = PipeRun.of(
                        "t",
                        NetworkFixtures.WATER,
                        NetworkFixtures.context("colebrook").friction(),
                        List.of((Segment) elements.get(0)),
                        EndCondition.OPEN_AT_PIPE_END,
                        EndCondition.OPEN_AT_PIPE_END,
                        Optional.empty(),
                        0,
                        SiteAtmosphere.SEA_LEVEL_PRESSURE,
                        q,
                        0,
                        DesignLimits.USUAL)
                .withElements(elements);
        RunResult series = HeadLossCalculator.solve(run, q);
        double seriesLoss = series.totals().frictionHeadLoss() + series.totals().minorHeadLoss();

        List<Node> nodes = new ArrayList<>();
        nodes.add(Node.fixedHead("S", 0, 80));
        for (int i = 1; i < elements.size(); i++) {
            nodes.add(Node.junction("j" + i, 0, 0));
        }
        nodes.add(Node.junction("end", 0, q));
        List<Link> links = new ArrayList<>();
        for (int i = 0; i < elements.size(); i++) {
            links.add(link(elements.get(i), i == 0 ? "S" : "j" + i, i == elements.size() - 1 ? "end" : "j" + (i + 1)));
        }
        Network net = network("colebrook", nodes, links);
        NetworkResult r = SOLVER.solve(net);
        assertBalanced(net, r);
        for (NetworkResult.LinkResult l : r.links()) {
            assertEquals(q, l.flow(), q * 1e-12, l.id());
            double seriesElement = series.element(l.id()).orElseThrow().result().headLoss();
            assertEquals(seriesElement, l.headLoss(), 1e-9 * seriesLoss, l.id());
        }
        assertEquals(80 - seriesLoss, r.node("end").orElseThrow().head(), 1e-9 * seriesLoss);
    }

    @Test
    void treeFlowsFollowFromContinuity() {
        // A tree: each pipe carries the sum of the demands beyond it (continuity, no loops).
        List<Node> nodes = List.of(
                Node.fixedHead("R", 30, 60),
                Node.junction("a", 10, 0.002),
                Node.junction("b", 12, 0.003),
                Node.junction("c", 8, 0.0015),
                Node.junction("d", 5, 0.004),
                Node.junction("e", 9, 0.0005));
        List<Link> links = List.of(
                link(pipe("Ra", 300, 0.15, 1e-4), "R", "a"),
                link(pipe("ab", 200, 0.1, 1e-4), "a", "b"),
                link(pipe("bc", 150, 0.05, 1e-4), "b", "c"),
                link(pipe("ad", 250, 0.1, 1e-4), "a", "d"),
                link(pipe("ed", 100, 0.04, 1e-4), "e", "d")); // reversed on purpose: flow comes out negative
        Network net = network("colebrook", nodes, links);
        NetworkResult r = SOLVER.solve(net);
        assertBalanced(net, r);
        assertEquals(0.011, r.link("Ra").orElseThrow().flow(), 1e-14);
        assertEquals(0.0045, r.link("ab").orElseThrow().flow(), 1e-14);
        assertEquals(0.0015, r.link("bc").orElseThrow().flow(), 1e-14);
        assertEquals(0.0045, r.link("ad").orElseThrow().flow(), 1e-14);
        assertEquals(-0.0005, r.link("ed").orElseThrow().flow(), 1e-14);
        assertEquals(-0.011, r.node("R").orElseThrow().demand(), 1e-14, "the reservoir supplies the total");
        double rho = NetworkFixtures.WATER.density();
        var c = r.node("c").orElseThrow();
        assertEquals(rho * 9.80665 * (c.head() - 8), c.pressure(), 1e-9 * Math.abs(c.pressure()));
    }

    /** Flow through one element for a given head loss, by bisection on its law (independent of the solver). */
    private static double flowFor(Element e, FlowContext ctx, double dh) {
        double lo = -10;
        double hi = 10;
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            if (e.headLoss(mid, ctx) < dh) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    @Test
    void parallelPipesEachCarryTheFlowTheirOwnLawGivesForTheCommonHeadLoss() {
        Segment a = pipe("a", 500, 0.2, 4.5e-5);
        Segment b = pipe("b", 300, 0.1, 1.5e-4);
        Segment c = pipe("c", 800, 0.25, 2.6e-4);
        Network net = network(
                "colebrook",
                List.of(Node.fixedHead("up", 0, 40), Node.fixedHead("down", 0, 28)),
                List.of(link(a, "up", "down"), link(b, "up", "down"), link(c, "down", "up")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged());
        FlowContext ctx = net.context();
        assertEquals(flowFor(a, ctx, 12), r.link("a").orElseThrow().flow(), 1e-9 * flowFor(a, ctx, 12));
        assertEquals(flowFor(b, ctx, 12), r.link("b").orElseThrow().flow(), 1e-9 * flowFor(b, ctx, 12));
        assertEquals(-flowFor(c, ctx, 12), r.link("c").orElseThrow().flow(), 1e-9 * flowFor(c, ctx, 12));
    }

    @Test
    void parallelPairEqualsItsEquivalentInAJunctionNetwork() {
        // Two pipes in parallel between j1 and j2 behave as one element whose flow for a head loss is the sum.
        Segment a = pipe("a", 400, 0.15, 4.5e-5);
        Segment b = pipe("b", 400, 0.1, 4.5e-5);
        Network net = network(
                "colebrook",
                List.of(Node.fixedHead("R", 0, 50), Node.junction("j1", 0, 0), Node.junction("j2", 0, 0.03)),
                List.of(link(pipe("feed", 100, 0.2, 4.5e-5), "R", "j1"), link(a, "j1", "j2"), link(b, "j1", "j2")));
        NetworkResult r = SOLVER.solve(net);
        assertBalanced(net, r);
        double dh =
                r.node("j1").orElseThrow().head() - r.node("j2").orElseThrow().head();
        double sum = flowFor(a, net.context(), dh) + flowFor(b, net.context(), dh);
        assertEquals(0.03, sum, 1e-9 * 0.03);
    }

    @Test
    void manufacturedSolutionIsRecovered() {
        manufacturedSolutionIsRecovered(6, 7, 30);
    }

    /**
     * The same on a 145 × 145 grid (21,025 junctions, more than {@link NetworkSolver#PARALLEL_LINKS}): large enough that the ordering runs beside the
     * set-up, the element laws on both cores and the factor's large updates split between two cores.
     */
    @Test
    void manufacturedSolutionIsRecoveredOnALargeGrid() {
        manufacturedSolutionIsRecovered(145, 7, 2);
    }

    /** Junction heads are drawn from 60 m + [0, spread) m. */
    private static void manufacturedSolutionIsRecovered(int k, long seed, double spread) {
        // Choose every junction head, derive each link's flow from its own law, set the demands to balance,
        // then solve from cold and recover the heads and flows.
        Network template = NetworkFixtures.grid(k, seed, 100, 0);
        java.util.Random random = new java.util.Random(11);
        java.util.Map<String, Double> heads = new java.util.HashMap<>();
        for (Node n : template.nodes()) {
            heads.put(n.id(), n.headIsFixed() ? n.fixedHead().getAsDouble() : 60 + spread * random.nextDouble());
        }
        java.util.Map<String, Double> demand = new java.util.HashMap<>();
        java.util.Map<String, Double> flows = new java.util.HashMap<>();
        for (Link l : template.links()) {
            double q = flowFor(l.element(), template.context(), heads.get(l.from()) - heads.get(l.to()));
            flows.put(l.id(), q);
            demand.merge(l.to(), q, Double::sum);
            demand.merge(l.from(), -q, Double::sum);
        }
        List<Node> nodes = new ArrayList<>();
        for (Node n : template.nodes()) {
            nodes.add(n.headIsFixed() ? n : Node.junction(n.id(), n.elevation(), demand.getOrDefault(n.id(), 0.0)));
        }
        Network net = template.withNodes(nodes);
        NetworkResult r = SOLVER.solve(net);
        assertBalanced(net, r);
        for (NetworkResult.NodeResult n : r.nodes()) {
            assertEquals(heads.get(n.id()), n.head(), 1e-7, n.id());
        }
        for (NetworkResult.LinkResult l : r.links()) {
            double q = flows.get(l.id());
            assertEquals(q, l.flow(), 1e-7 * Math.abs(q) + 1e-12, l.id());
        }
        assertTrue(r.iterations() < 30, "iterations " + r.iterations());
    }

    @Test
    void agreesWithAnIndependentHardyCrossBalance() {
        // "auto": laminar below Re 2000, so the loop balance may pass through zero flow in a chord.
        Network net = NetworkFixtures.grid(4, 3, 80, 0.002, "auto");
        NetworkResult r = SOLVER.solve(net);
        assertBalanced(net, r);
        HardyCross hc = new HardyCross(net);
        double[] q = hc.solve();
        for (int k = 0; k < net.links().size(); k++) {
            double expected = q[k];
            assertEquals(
                    expected,
                    r.links().get(k).flow(),
                    1e-9 * Math.max(Math.abs(expected), 1e-3),
                    net.links().get(k).id());
        }
    }

    @Test
    void sparseFactorAgreesWithDenseCholeskyOnALargerGrid() {
        // 15 × 15 junctions: above the dense limit, so the default solver uses the sparse L D Lᵀ.
        Network net = NetworkFixtures.grid(15, 5, 90, 0.0005);
        NetworkResult sparse = SOLVER.solve(net);
        NetworkResult dense =
                NetworkSolver.withLinearSolver(DenseSpdSolver::new).solve(net);
        assertBalanced(net, sparse);
        for (int i = 0; i < sparse.nodes().size(); i++) {
            assertEquals(dense.nodes().get(i).head(), sparse.nodes().get(i).head(), 1e-9);
        }
        for (int k = 0; k < sparse.links().size(); k++) {
            double q = dense.links().get(k).flow();
            assertEquals(q, sparse.links().get(k).flow(), 1e-9 * Math.abs(q) + 1e-13);
        }
    }

    @Test
    void checkValveAgainstTheGradientShutsAndCarriesNothing() {
        Network net = network(
                "colebrook",
                List.of(Node.fixedHead("low", 0, 10), Node.junction("j", 0, 0), Node.fixedHead("high", 0, 30)),
                List.of(
                        link(pipe("p1", 50, 0.1, 4.5e-5), "low", "j"),
                        link(new CheckValve("nrv", "non-return", LocalLoss.ofLossCoefficient(2, 0.1)), "j", "high"),
                        link(pipe("p2", 50, 0.1, 4.5e-5), "high", "j")));
        // With the check valve shut, p2 carries flow from high to j and on to low.
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        NetworkResult.LinkResult nrv = r.link("nrv").orElseThrow();
        assertEquals("shut", nrv.status());
        assertEquals(0, nrv.flow(), 0);
        assertBalanced(net, r);
        assertEquals(
                -r.link("p2").orElseThrow().flow(), r.link("p1").orElseThrow().flow(), 1e-12);
        assertTrue(r.link("p1").orElseThrow().flow() < 0, "flow goes from j to low");
    }

    @Test
    void closedIsolationValveCuttingOffADemandIsSerious() {
        Network net = network(
                "colebrook",
                List.of(Node.fixedHead("R", 0, 30), Node.junction("a", 0, 0), Node.junction("b", 0, 0.001)),
                List.of(
                        link(pipe("p", 50, 0.1, 4.5e-5), "R", "a"),
                        link(new IsolationValve("iso", "valve", false, LocalLoss.NONE), "a", "b")));
        InputException e = assertThrows(InputException.class, () -> SOLVER.solve(net));
        assertTrue(e.getMessage().contains("b"), e.getMessage());
        assertTrue(e.getMessage().contains("no path to a fixed head"), e.getMessage());
    }

    @Test
    void pumpedNetworkMatchesTheSeriesOperatingPoint() {
        PumpCurve curve = PumpCurve.fit(
                "p",
                List.of(new PumpCurve.Point(0, 45), new PumpCurve.Point(0.01, 41), new PumpCurve.Point(0.02, 30)),
                OptionalDouble.empty());
        Segment suction = pipe("s", 10, 0.1, 4.5e-5);
        Segment discharge = pipe("d", 300, 0.08, 4.5e-5);
        PipeRun run = PipeRun.of(
                "t",
                NetworkFixtures.WATER,
                NetworkFixtures.context("colebrook").friction(),
                List.of(suction, discharge),
                new EndCondition(0, 0),
                new EndCondition(0, 0),
                Optional.of(curve),
                1,
                SiteAtmosphere.SEA_LEVEL_PRESSURE,
                0.01,
                0,
                DesignLimits.USUAL);
        // The run rises 20 m from source surface to delivery surface.
        run = run.withSegments(List.of(
                Segment.builder("s").id("s").length(10).bore(0.1, 4.5e-5).build(),
                Segment.builder("d")
                        .id("d")
                        .length(300)
                        .bore(0.08, 4.5e-5)
                        .elevationChange(20)
                        .build()));
        OperatingPoint op = OperatingPoint.find(run);
        assertTrue(op.found());
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("sump", 0, 0),
                        Node.junction("suction", 0, 0),
                        Node.junction("discharge", 0, 0),
                        Node.fixedHead("tank", 20, 20)),
                List.of(
                        link(suction, "sump", "suction"),
                        link(new PumpElement("pump", curve, 1.0), "suction", "discharge"),
                        link(discharge, "discharge", "tank")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals(op.flow(), r.link("pump").orElseThrow().flow(), 1e-7 * op.flow());
    }

    @Test
    void closedLoopWithAReferencePointExchangesNoFlow() {
        PumpCurve curve = PumpCurve.fit(
                "circ",
                List.of(new PumpCurve.Point(0, 18), new PumpCurve.Point(0.004, 16), new PumpCurve.Point(0.008, 11)),
                OptionalDouble.empty());
        Network net = network(
                "colebrook",
                List.of(
                        Node.reference("fill", 0, 25),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 12, 0),
                        Node.junction("c", 12, 0)),
                List.of(
                        link(new PumpElement("pump", curve, 1.0), "fill", "a"),
                        link(pipe("riser", 40, 0.065, 4.5e-5), "a", "b"),
                        link(new RatedComponent("coil", "coil", 30_000, 0.005, 2), "b", "c"),
                        link(pipe("return", 40, 0.065, 4.5e-5), "c", "fill")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals(0, r.node("fill").orElseThrow().demand(), 1e-12);
        assertFalse(r.cautions().stream().anyMatch(c -> c.code().equals("reference-exchanges-flow")));
        // Around the loop the pump's head equals the losses (energy balance).
        double q = r.link("pump").orElseThrow().flow();
        double losses = 0;
        for (String id : new String[] {"riser", "coil", "return"}) {
            losses += net.links().stream()
                    .filter(l -> l.id().equals(id))
                    .findFirst()
                    .orElseThrow()
                    .element()
                    .headLoss(q, net.context());
        }
        assertEquals(new PumpElement("pump", curve, 1.0).head(q), losses, 1e-6);
    }

    @Test
    void anIterationLimitTooLowGivesTheBestIterateMarkedNotConverged() {
        Network net = NetworkFixtures.grid(5, 1, 80, 0.002);
        NetworkResult r = NetworkSolver.of(1e-6, 2).solve(net);
        assertFalse(r.converged());
        assertTrue(r.cautions().stream().anyMatch(c -> c.code().equals("not-converged")));
        assertEquals(5 * 5 + 1, r.nodes().size());
    }

    @Test
    void noFixedHeadIsRefused() {
        Network net = network(
                "colebrook",
                List.of(Node.junction("a", 0, 0), Node.junction("b", 0, 0)),
                List.of(link(pipe("p", 1, 0.1, 0), "a", "b")));
        InputException e = assertThrows(InputException.class, () -> SOLVER.solve(net));
        assertTrue(e.getMessage().contains("fixed head"), e.getMessage());
    }
}
