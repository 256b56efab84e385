package org.headway.network;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.system.Element;
import org.headway.system.ElementResult;
import org.headway.system.FlowContext;
import org.headway.system.FlowControlValve;
import org.headway.system.Gravity;
import org.headway.system.PipeFlow;
import org.headway.system.PressureControlValve;
import org.headway.system.PumpElement;
import org.headway.system.Segment;

/**
 * Solves a network by the global gradient algorithm (Todini &amp; Pilati, "A gradient algorithm
 * for the analysis of pipe networks", in Coulbeck &amp; Orr (eds.), Computer Applications in Water
 * Supply, vol. 1, 1988, pp. 1–20): Newton's method on the link flows Q and junction heads H
 * together, with the flows eliminated so that each iteration solves one symmetric
 * positive-definite system for the head changes.
 *
 * <p>With link k from node f to node t, energy residual e_k = h_k(Q_k) − (H_f − H_t), slope g_k =
 * dh_k/dQ_k (the exact derivative of the element's law, for a pipe including the slope of its
 * friction factor with Reynolds number, as Simpson &amp; Elhay, "Jacobian matrix for solving water
 * distribution system equations with the Darcy–Weisbach head-loss model", J. Hydraul. Eng. 137(6),
 * 2011, show is needed for quadratic convergence) and continuity residual c_j = inflow − outflow −
 * demand at junction j, one iteration solves
 *
 * <pre>(B G⁻¹ Bᵀ) ΔH = c − B G⁻¹ e,   ΔQ = G⁻¹ (−e − Bᵀ ΔH)</pre>
 *
 * where B is the junction–link incidence (+1 where a link ends, −1 where it starts) and G =
 * diag(g). Step control: the step is halved (up to {@value #MAX_HALVINGS} times) until the merit
 * ½(Σ e² + Σ (w c)²) falls by the Armijo condition (Nocedal &amp; Wright, Numerical Optimization, 2nd
 * ed., 2006, §3.1, c₁ = 10⁻⁴), w a junction's mean link slope held fixed within the iteration; the
 * Newton step is a descent direction of that merit, so the solve starts cold from a velocity of
 * {@value #START_VELOCITY} m/s in every pipe.
 *
 * <p><b>Zero flow.</b> A quadratic law has zero slope at Q = 0, which would make G singular. Each
 * link's slope is bounded below by its secant slope h(Q_ε)/Q_ε at Q_ε = {@value #ZERO_FLOW} m³/s
 * (1 mL/s): below that flow the law is linearised, above it the exact slope is used, so quadratic
 * convergence is kept wherever a link carries a real flow. A pump's slope is bounded below by
 * 10⁻³ of its shut-off head per its largest data flow (a rising curve near shut-off would
 * otherwise give a negative slope).
 *
 * <p><b>Status.</b> A closed isolation valve is left out. A check valve or pump whose flow turns
 * negative is shut (left out); a shut check valve reopens when the heads would drive forward flow,
 * a shut pump when the head it must lift falls below its shut-off head. Statuses are checked after
 * each converged round and the solve repeats until none changes (at most {@value
 * #MAX_STATUS_ROUNDS} rounds). Junctions cut off by closed or shut links have no head; if they carry
 * demand the result is not converged and a serious caution names them.
 *
 * <p><b>Convergence</b> requires all three: largest head change ≤ the head tolerance (default
 * {@value #DEFAULT_HEAD_TOLERANCE} m), largest energy residual ≤ {@value #ENERGY_TOLERANCE_RATIO} of
 * the head tolerance, largest
 * continuity residual ≤ {@value #CONTINUITY_TOLERANCE} m³/s plus 10⁻¹² of the total demand. On
 * failure the best iterate (smallest energy residual) is returned marked not converged with a
 * serious caution.
 */
public final class NetworkSolver {

    /** Default largest head change at convergence (m). */
    public static final double DEFAULT_HEAD_TOLERANCE = 1e-6;

    /**
     * The energy residual must fall to this fraction of the head tolerance (10⁻⁹ m by default):
     * Newton converges quadratically, so the last iteration costs little and takes the flows to
     * near round-off.
     */
    public static final double ENERGY_TOLERANCE_RATIO = 1e-3;

    /** Default iteration limit. */
    public static final int DEFAULT_MAX_ITERATIONS = 200;

    /** Absolute continuity tolerance (m³/s). */
    public static final double CONTINUITY_TOLERANCE = 1e-10;

    /** Flow below which a link's law is linearised (m³/s). */
    public static final double ZERO_FLOW = 1e-6;

    /** Starting velocity in every pipe (m/s). */
    public static final double START_VELOCITY = 0.3;

    /** Step halvings allowed per iteration. */
    public static final int MAX_HALVINGS = 10;

    /**
     * Slope with which a check valve or pump that is still open resists reverse flow during the
     * iterations (m per m³/s): 10 m of head drives 10⁻⁷ m³/s back through it, and the status rule
     * then shuts it.
     */
    public static final double REVERSE_SLOPE = 1e8;

    /**
     * Smallest link slope used (m per m³/s): a link of no resistance (a zero-length pipe, a
     * negligible loss) is held at 10¹⁰ (m³/s)/m of conductance so that the head equations stay
     * finite; such a link then carries its flow with a head difference below 10⁻¹⁰ m per m³/s.
     */
    public static final double SLOPE_FLOOR = 1e-10;

    /** Weight of the pinning equation of an active pressure-control valve, relative to the largest diagonal. */
    static final double PIN_WEIGHT = 1e10;

    /** Status rounds allowed. */
    public static final int MAX_STATUS_ROUNDS = 20;

    private static final int OPEN = 0;
    private static final int CLOSED = 1;
    private static final int SHUT = 2;
    /** A flow-control valve holding its setting. */
    private static final int ACTIVE = 3;

    private final double headTolerance;
    private final int maxIterations;
    private final SolverFactory solvers;

    /** Makes the linear solver for a pattern. */
    interface SolverFactory {
        SpdSolver create(int n, int[] a, int[] b);
    }

    private NetworkSolver(double headTolerance, int maxIterations, SolverFactory solvers) {
        if (!(headTolerance > 0) || !Double.isFinite(headTolerance)) {
            throw new InputException("head tolerance", "must be a positive number, got " + headTolerance);
        }
        if (maxIterations < 1) {
            throw new InputException("iterations", "must be at least 1, got " + maxIterations);
        }
        this.headTolerance = headTolerance;
        this.maxIterations = maxIterations;
        this.solvers = solvers;
    }

    /** The solver with default tolerance and iteration limit. */
    public static NetworkSolver standard() {
        return new NetworkSolver(DEFAULT_HEAD_TOLERANCE, DEFAULT_MAX_ITERATIONS, NetworkSolver::defaultSolver);
    }

    /** The solver with a head tolerance (m) and an iteration limit. */
    public static NetworkSolver of(double headTolerance, int maxIterations) {
        return new NetworkSolver(headTolerance, maxIterations, NetworkSolver::defaultSolver);
    }

    static NetworkSolver withLinearSolver(SolverFactory factory) {
        return new NetworkSolver(DEFAULT_HEAD_TOLERANCE, DEFAULT_MAX_ITERATIONS, factory);
    }

    /** Dense Cholesky below this many junctions (cheaper to set up), the sparse factor above. */
    static final int DENSE_LIMIT = 60;

    private static SpdSolver defaultSolver(int n, int[] a, int[] b) {
        return n <= DENSE_LIMIT ? new DenseSpdSolver(n, a, b) : new SparseSpdSolver(n, a, b);
    }

    /** Solves the network. */
    public NetworkResult solve(Network network) {
        return new Run(network).solve();
    }

    /** The state of one solve. */
    private final class Run {
        final Network net;
        final FlowContext ctx;
        final int nNodes;
        final int nLinks;
        final int[] from;
        final int[] to;
        final Element[] element;
        final int[] junction; // node → junction index or −1
        final int nJunctions;
        final int[] slot; // link → pattern pair index or −1
        final int pairCount;
        final double[] demand;
        final double[] head;
        final double[] flow;
        final int[] status;
        final double[] minSlope;
        final double[] zeroFlowLoss;
        /** For a pressure-control valve, the node whose head it holds; −1 for other links. */
        final int[] pinNode;
        /** The head a pressure-control valve holds at its node (m). */
        final double[] pinHead;
        /**
         * For a pressure-control valve, its share of the flow when it and others hold one node at one
         * head: the flow its fully open law passes at 1 m of head.
         */
        final double[] shareWeight;
        /** A pressure-control valve shut because another holds its node at a different head. */
        final boolean[] setAside;

        final double totalDemand;
        /** The linear solver; let go before the results are built (its factor is the largest array). */
        SpdSolver linear;

        final List<Caution> cautions = new ArrayList<>();
        double lastHeadChange = Double.NaN;
        int iterations;

        Run(Network network) {
            this.net = network;
            this.ctx = network.context();
            nNodes = network.nodes().size();
            nLinks = network.links().size();
            Map<String, Integer> index = network.nodeIndex();
            from = new int[nLinks];
            to = new int[nLinks];
            element = new Element[nLinks];
            for (int k = 0; k < nLinks; k++) {
                Link l = network.links().get(k);
                from[k] = index.get(l.from());
                to[k] = index.get(l.to());
                element[k] = l.element();
            }
            junction = new int[nNodes];
            int nj = 0;
            head = new double[nNodes];
            demand = new double[nNodes];
            double fixedSum = 0;
            int fixedCount = 0;
            double total = 0;
            for (int i = 0; i < nNodes; i++) {
                Node n = network.nodes().get(i);
                if (n.headIsFixed()) {
                    junction[i] = -1;
                    head[i] = n.fixedHead().getAsDouble();
                    fixedSum += head[i];
                    fixedCount++;
                } else {
                    junction[i] = nj++;
                    demand[i] = n.totalDemand();
                    total += Math.abs(demand[i]);
                }
            }
            nJunctions = nj;
            totalDemand = total;
            if (fixedCount == 0) {
                throw new InputException(
                        "nodes",
                        "no node has a fixed head: give a reservoir, tank or fixed pressure, or for a closed loop a"
                                + " pressure reference point");
            }
            double start = fixedSum / fixedCount;
            for (int i = 0; i < nNodes; i++) {
                if (junction[i] >= 0) {
                    head[i] = start;
                }
            }
            status = new int[nLinks];
            flow = new double[nLinks];
            minSlope = new double[nLinks];
            zeroFlowLoss = new double[nLinks];
            pinNode = new int[nLinks];
            pinHead = new double[nLinks];
            java.util.Arrays.fill(pinNode, -1);
            shareWeight = new double[nLinks];
            setAside = new boolean[nLinks];
            Map<Integer, Integer> pinnedBy = new java.util.HashMap<>();
            slot = new int[nLinks];
            int pairs = 0;
            for (int k = 0; k < nLinks; k++) {
                slot[k] = junction[from[k]] >= 0 && junction[to[k]] >= 0 ? pairs++ : -1;
            }
            pairCount = pairs;
            int[] pa = new int[pairs];
            int[] pb = new int[pairs];
            for (int k = 0; k < nLinks; k++) {
                if (slot[k] >= 0) {
                    pa[slot[k]] = junction[from[k]];
                    pb[slot[k]] = junction[to[k]];
                }
            }
            // The ordering and symbolic factor depend on the topology alone: for a large network they are
            // computed on the other core while the element laws' floors and start flows are found here.
            java.util.concurrent.CompletableFuture<SpdSolver> analysis = nJunctions >= PARALLEL_LINKS
                    ? java.util.concurrent.CompletableFuture.supplyAsync(() -> solvers.create(nJunctions, pa, pb))
                    : null;
            for (int k = 0; k < nLinks; k++) {
                Element e = element[k];
                status[k] = e.isClosed()
                        ? CLOSED
                        : e instanceof FlowControlValve || e instanceof PressureControlValve ? ACTIVE : OPEN;
                if (e instanceof PressureControlValve pcv) {
                    int p = pcv.reducing() ? to[k] : from[k];
                    if (junction[p] < 0) {
                        throw new InputException(
                                e.id(),
                                "a " + e.kind() + " valve holds the pressure at node "
                                        + network.nodes().get(p).id()
                                        + ", which already has a fixed head; put a junction there");
                    }
                    Integer other = pinnedBy.put(p, k);
                    if (other != null && ((PressureControlValve) element[other]).reducing() != pcv.reducing()) {
                        throw new InputException(
                                e.id(),
                                "a reducing valve (" + element[pcv.reducing() ? other : k].id()
                                        + ") and a sustaining valve ("
                                        + element[pcv.reducing() ? k : other].id()
                                        + ") both hold the pressure at node "
                                        + network.nodes().get(p).id()
                                        + "; put a pipe or junction between them");
                    }
                    pinNode[k] = p;
                    shareWeight[k] = shareWeight(pcv);
                    Node node = network.nodes().get(p);
                    pinHead[k] = node.elevation() + pcv.setting() / (ctx.fluid().density() * Gravity.STANDARD);
                }
                flow[k] = status[k] == OPEN || e instanceof PressureControlValve
                        ? startFlow(e)
                        : status[k] == ACTIVE ? setting(k) : 0;
                minSlope[k] = slopeFloor(e);
                zeroFlowLoss[k] = e.blocksReverseFlow() ? e.headLoss(0, ctx) : 0;
            }
            requireEveryJunctionReachable();
            if (analysis == null) {
                linear = nJunctions == 0 ? null : solvers.create(nJunctions, pa, pb);
            } else {
                try {
                    linear = analysis.join();
                } catch (java.util.concurrent.CompletionException ex) {
                    if (ex.getCause() instanceof RuntimeException re) {
                        throw re;
                    }
                    throw ex;
                }
            }
        }

        double setting(int k) {
            return ((FlowControlValve) element[k]).setting();
        }

        double startFlow(Element e) {
            if (e instanceof Segment s) {
                return START_VELOCITY * Math.PI * s.innerDiameter() * s.innerDiameter() / 4;
            }
            if (e instanceof PumpElement p) {
                return 0.5 * p.speedRatio() * p.curve().maximumDataFlow();
            }
            return 1e-3;
        }

        double slopeFloor(Element e) {
            if (e instanceof PumpElement p) {
                double shutoff = Math.abs(p.head(0));
                double qmax = p.speedRatio() * p.curve().maximumDataFlow();
                return Math.max(1e-3 * shutoff / Math.max(qmax, ZERO_FLOW), 1e-12);
            }
            if (e.isClosed()) {
                return 1;
            }
            double secant;
            try {
                secant = e.headLoss(ZERO_FLOW, ctx) / ZERO_FLOW;
            } catch (InputException ex) {
                // A method that refuses so small a flow (e.g. Colebrook–White below Re 1 in a wide pipe):
                // the laminar law's slope at that flow stands in.
                secant = Double.NaN;
            }
            if (!(secant > 0) || !Double.isFinite(secant)) {
                secant = laminarSlope(e);
            }
            return Math.max(secant, SLOPE_FLOOR);
        }

        /** Hagen–Poiseuille slope 128 μ L / (π ρ g D⁴) of a pipe; a small positive number otherwise. */
        double laminarSlope(Element e) {
            if (e instanceof Segment s) {
                double d = s.innerDiameter();
                return 128
                        * ctx.fluid().dynamicViscosity()
                        * Math.max(s.length(), d)
                        / (Math.PI * ctx.fluid().density() * Gravity.STANDARD * d * d * d * d);
            }
            return 1e-6;
        }

        /**
         * Head loss of an open link at a flow. Below {@link #ZERO_FLOW} a passive element's law is its
         * secant line through zero; an element that blocks reverse flow resists reverse flow with the
         * steep line of {@link #REVERSE_SLOPE} until its status is shut.
         */
        double law(int k, double q) {
            Element e = element[k];
            if (q < 0 && e.blocksReverseFlow()) {
                return zeroFlowLoss[k] + REVERSE_SLOPE * q;
            }
            if (Math.abs(q) < ZERO_FLOW && !(e instanceof PumpElement)) {
                return minSlope[k] * q;
            }
            return e.headLoss(q, ctx);
        }

        double slope(int k, double q) {
            Element e = element[k];
            if (q < 0 && e.blocksReverseFlow()) {
                return REVERSE_SLOPE;
            }
            if (Math.abs(q) < ZERO_FLOW && !(e instanceof PumpElement)) {
                return minSlope[k];
            }
            double g = e.headLossSlope(q, ctx);
            return Double.isFinite(g) ? Math.max(g, minSlope[k]) : minSlope[k];
        }

        void requireEveryJunctionReachable() {
            boolean[] reached = reach(k -> status[k] == OPEN || element[k].blocksReverseFlow());
            List<String> cut = new ArrayList<>();
            for (int i = 0; i < nNodes; i++) {
                if (!reached[i]) {
                    cut.add(net.nodes().get(i).id());
                }
            }
            if (!cut.isEmpty()) {
                throw new InputException(
                        "nodes",
                        cut.size() + " node(s) have no path to a fixed head or pressure reference: "
                                + String.join(", ", cut.subList(0, Math.min(20, cut.size())))
                                + (cut.size() > 20 ? ", …" : "")
                                + " (connect them, or give one of them a fixed head)");
            }
        }

        /**
         * Runs a per-link step that writes only its own link's entries: on both cores for a large
         * network (the element laws are pure), in order otherwise.
         */
        void forEachLink(java.util.function.IntConsumer step) {
            if (nLinks >= PARALLEL_LINKS) {
                java.util.stream.IntStream.range(0, nLinks).parallel().forEach(step);
            } else {
                for (int k = 0; k < nLinks; k++) {
                    step.accept(k);
                }
            }
        }

        /** Nodes reachable from a fixed-head node through links passing the test (breadth first, int arrays). */
        boolean[] reach(java.util.function.IntPredicate usable) {
            return reach(usable, new boolean[nNodes]);
        }

        boolean[] reach(java.util.function.IntPredicate usable, boolean[] seed) {
            buildAdjacency();
            boolean[] reached = new boolean[nNodes];
            int[] queue = new int[nNodes];
            int head = 0;
            int tail = 0;
            for (int i = 0; i < nNodes; i++) {
                if (junction[i] < 0 || seed[i]) {
                    reached[i] = true;
                    queue[tail++] = i;
                }
            }
            while (head < tail) {
                int n = queue[head++];
                for (int p = adjacencyStart[n]; p < adjacencyStart[n + 1]; p++) {
                    int k = adjacencyLink[p];
                    if (!usable.test(k)) {
                        continue;
                    }
                    int other = from[k] == n ? to[k] : from[k];
                    if (!reached[other]) {
                        reached[other] = true;
                        queue[tail++] = other;
                    }
                }
            }
            return reached;
        }

        /** Links at each node in compressed rows: node n's links are adjacencyLink[start[n] .. start[n+1]). */
        int[] adjacencyStart;

        int[] adjacencyLink;

        void buildAdjacency() {
            if (adjacencyStart != null) {
                return;
            }
            adjacencyStart = new int[nNodes + 1];
            for (int k = 0; k < nLinks; k++) {
                adjacencyStart[from[k] + 1]++;
                adjacencyStart[to[k] + 1]++;
            }
            for (int i = 0; i < nNodes; i++) {
                adjacencyStart[i + 1] += adjacencyStart[i];
            }
            adjacencyLink = new int[2 * nLinks];
            int[] fill = java.util.Arrays.copyOf(adjacencyStart, nNodes);
            for (int k = 0; k < nLinks; k++) {
                adjacencyLink[fill[from[k]]++] = k;
                adjacencyLink[fill[to[k]]++] = k;
            }
        }

        NetworkResult solve() {
            boolean converged = false;
            settleSharedHolds();
            boolean[] live = liveNodes();
            int rounds = 0;
            while (true) {
                converged = newton(live);
                rounds++;
                if (!converged) {
                    break;
                }
                List<String> changed = updateStatuses();
                changed.addAll(settleSharedHolds());
                if (changed.isEmpty()) {
                    break;
                }
                live = liveNodes();
                if (rounds >= MAX_STATUS_ROUNDS) {
                    converged = false;
                    cautions.add(Caution.serious(
                            "status-cycling",
                            "check valves or pumps kept opening and shutting (" + String.join(", ", changed)
                                    + "); the last state is shown and is not a solution",
                            "solver"));
                    break;
                }
            }
            List<String> stranded = new ArrayList<>();
            for (int i = 0; i < nNodes; i++) {
                if (!live[i] && demand[i] != 0) {
                    stranded.add(net.nodes().get(i).id());
                }
            }
            if (!stranded.isEmpty()) {
                converged = false;
                cautions.add(Caution.serious(
                        "demand-cut-off",
                        "demand at " + String.join(", ", stranded.subList(0, Math.min(20, stranded.size())))
                                + " cannot be supplied: every path to a fixed head passes a closed valve or a"
                                + " check valve or pump that would run backwards",
                        "continuity"));
            }
            linear = null;
            return result(converged, live);
        }

        /** Junctions connected to a fixed head through links that are open now. */
        boolean[] liveNodes() {
            boolean[] seed = new boolean[nNodes];
            for (int k = 0; k < nLinks; k++) {
                if (status[k] == ACTIVE && pinNode[k] >= 0) {
                    seed[pinNode[k]] = true;
                }
            }
            return reach(k -> status[k] == OPEN, seed);
        }

        /** Newton iterations with the statuses as they are; true when converged. */
        boolean newton(boolean[] live) {
            int nj = nJunctions;
            double[] diag = new double[nj];
            double[] off = new double[pairCount];
            double[] rhs = new double[nj];
            double[] h = new double[nLinks];
            double[] g = new double[nLinks];
            double[] e = new double[nLinks];
            for (int k = 0; k < nLinks; k++) {
                if (status[k] == ACTIVE && pinNode[k] < 0) {
                    flow[k] = setting(k);
                } else if (status[k] != OPEN && status[k] != ACTIVE) {
                    flow[k] = 0;
                }
            }
            for (int i = 0; i < nNodes; i++) {
                if (!live[i] && junction[i] >= 0) {
                    head[i] = Double.NaN;
                } else if (junction[i] >= 0 && Double.isNaN(head[i])) {
                    head[i] = firstFixedHead();
                }
            }
            double energy = energyResidual(h, e);
            double bestEnergy = Double.POSITIVE_INFINITY;
            double[] bestHead = head.clone();
            double[] bestFlow = flow.clone();
            for (int iter = 0; iter < maxIterations; iter++) {
                iterations++;
                java.util.Arrays.fill(diag, 0);
                java.util.Arrays.fill(off, 0);
                forEachLink(k -> {
                    if (status[k] == OPEN) {
                        g[k] = slope(k, flow[k]);
                    }
                });
                for (int i = 0; i < nNodes; i++) {
                    int j = junction[i];
                    if (j >= 0) {
                        rhs[j] = live[i] ? -demand[i] : 0;
                    }
                }
                for (int k = 0; k < nLinks; k++) {
                    if (status[k] == ACTIVE) {
                        // A held flow: it enters continuity as a known flow and couples no heads.
                        int jfa = junction[from[k]];
                        int jta = junction[to[k]];
                        if (jta >= 0) {
                            rhs[jta] += flow[k];
                        }
                        if (jfa >= 0) {
                            rhs[jfa] -= flow[k];
                        }
                        continue;
                    }
                    if (status[k] != OPEN) {
                        continue;
                    }
                    double w = 1 / g[k];
                    int jf = junction[from[k]];
                    int jt = junction[to[k]];
                    // continuity: inflow at t, outflow at f
                    if (jt >= 0) {
                        rhs[jt] += flow[k] - e[k] * w;
                        diag[jt] += w;
                    }
                    if (jf >= 0) {
                        rhs[jf] += -flow[k] + e[k] * w;
                        diag[jf] += w;
                    }
                    if (slot[k] >= 0) {
                        off[slot[k]] -= w;
                    }
                }
                double largest = 1;
                for (int j = 0; j < nj; j++) {
                    largest = Math.max(largest, diag[j]);
                }
                for (int k = 0; k < nLinks; k++) {
                    if (status[k] == ACTIVE && pinNode[k] >= 0) {
                        // The held head replaces continuity at the controlled node ("big number" pinning);
                        // the valve's flow follows from that node's continuity after the step.
                        int jp = junction[pinNode[k]];
                        double big = PIN_WEIGHT * largest;
                        diag[jp] += big;
                        rhs[jp] += big * (pinHead[k] - head[pinNode[k]]);
                    }
                }
                for (int i = 0; i < nNodes; i++) {
                    int j = junction[i];
                    if (j >= 0 && !live[i]) {
                        diag[j] = 1;
                        rhs[j] = 0;
                    }
                }
                double[] dH;
                try {
                    dH = nj == 0 ? new double[0] : linear.solve(diag, off, rhs);
                } catch (IllegalStateException | ArithmeticException singular) {
                    restore(bestHead, bestFlow);
                    cautions.add(Caution.serious(
                            "network-singular",
                            "the head equations could not be solved (" + singular.getMessage() + "); check for links"
                                    + " of absurd size or resistance; the best iterate is shown and is not a solution",
                            "solver"));
                    return false;
                }
                double[] dQ = new double[nLinks];
                for (int k = 0; k < nLinks; k++) {
                    if (status[k] != OPEN) {
                        continue;
                    }
                    double dhf = junction[from[k]] >= 0 ? dH[junction[from[k]]] : 0;
                    double dht = junction[to[k]] >= 0 ? dH[junction[to[k]]] : 0;
                    dQ[k] = (-e[k] - (dht - dhf)) / g[k];
                }
                double[] oldHead = head.clone();
                double[] oldFlow = flow.clone();
                // Merit ½‖W F‖² with F = (e, c) and W converting a junction's flow residual to head by the
                // mean slope of its links, held fixed for this iteration: the Newton direction descends it
                // for any fixed W, so halving the step until it decreases (Armijo, c₁ = 10⁻⁴) is safe.
                double[] weight = junctionWeights(g);
                double merit0 = merit(e, live, weight);
                double alpha = 1;
                double newEnergy = Double.NaN;
                for (int halving = 0; halving <= MAX_HALVINGS; halving++) {
                    for (int i = 0; i < nNodes; i++) {
                        int j = junction[i];
                        if (j >= 0 && live[i]) {
                            head[i] = oldHead[i] + alpha * dH[j];
                        }
                    }
                    for (int k = 0; k < nLinks; k++) {
                        if (status[k] == OPEN) {
                            flow[k] = oldFlow[k] + alpha * dQ[k];
                        }
                    }
                    assignControlledFlows();
                    newEnergy = energyResidual(h, e);
                    double merit = merit(e, live, weight);
                    if (merit <= (1 - 1e-4 * alpha) * merit0 || halving == MAX_HALVINGS) {
                        break;
                    }
                    alpha /= 2;
                }
                double maxDh = 0;
                for (int i = 0; i < nNodes; i++) {
                    int j = junction[i];
                    if (j >= 0 && live[i]) {
                        maxDh = Math.max(maxDh, Math.abs(alpha * dH[j]));
                    }
                }
                lastHeadChange = maxDh;
                energy = newEnergy;
                // A held head that makes its valve run backwards cannot be the answer: shut it at once
                // rather than iterate towards a state the status rules would reject (EPANET checks its
                // control valves during the iterations too, Rossman 2000 Appendix D).
                boolean shut = false;
                for (int k = 0; k < nLinks; k++) {
                    if (status[k] == ACTIVE && pinNode[k] >= 0 && flow[k] < 0) {
                        status[k] = SHUT;
                        flow[k] = 0;
                        shut = true;
                    }
                }
                if (shut) {
                    boolean[] now = liveNodes();
                    System.arraycopy(now, 0, live, 0, nNodes);
                    for (int i = 0; i < nNodes; i++) {
                        if (junction[i] >= 0 && live[i] && Double.isNaN(head[i])) {
                            head[i] = firstFixedHead();
                        }
                    }
                    energy = energyResidual(h, e);
                    bestEnergy = Double.POSITIVE_INFINITY;
                    continue;
                }
                if (!Double.isFinite(energy) || !Double.isFinite(maxDh)) {
                    restore(bestHead, bestFlow);
                    cautions.add(Caution.serious(
                            "network-diverged",
                            "the network solve diverged (a head or flow became infinite); the best iterate is shown"
                                    + " and is not a solution; check units, lengths, diameters and pump curves",
                            "solver"));
                    return false;
                }
                if (energy < bestEnergy) {
                    bestEnergy = energy;
                    System.arraycopy(head, 0, bestHead, 0, nNodes);
                    System.arraycopy(flow, 0, bestFlow, 0, nLinks);
                }
                if (maxDh <= headTolerance
                        && energy <= ENERGY_TOLERANCE_RATIO * headTolerance
                        && continuityResidual(live) <= continuityTolerance()) {
                    return true;
                }
            }
            if (bestEnergy < energy) {
                restore(bestHead, bestFlow);
            }
            cautions.add(Caution.serious(
                    "not-converged",
                    String.format(
                            Locale.ROOT,
                            "the network solve did not converge in %d iterations (last head change %.3g m, energy"
                                    + " residual %.3g m); the results are the last iterate and are not a solution",
                            maxIterations,
                            lastHeadChange,
                            energy),
                    "solver"));
            return false;
        }

        /**
         * Active pressure-control valves carry what their controlled node's continuity leaves. Where
         * several hold one node at one head (valves in parallel, equal settings) the physics does not
         * fix their split (Deuerlein, Simpson &amp; Dempe 2009); they share it in proportion to their
         * fully open capacity, {@link #shareWeight}.
         */
        void assignControlledFlows() {
            for (int k = 0; k < nLinks; k++) {
                if (status[k] != ACTIVE || pinNode[k] < 0) {
                    continue;
                }
                int p = pinNode[k];
                double balance = -demand[p];
                double weights = 0;
                int start = adjacencyStart[p];
                for (int a = start; a < adjacencyStart[p + 1]; a++) {
                    int l = adjacencyLink[a];
                    if (status[l] == ACTIVE && pinNode[l] == p) {
                        weights += shareWeight[l];
                        continue;
                    }
                    if (to[l] == p) {
                        balance += flow[l];
                    }
                    if (from[l] == p) {
                        balance -= flow[l];
                    }
                }
                double share = weights > 0 ? shareWeight[k] / weights : 1;
                // Reducing valve: it flows into p and must make up the deficit; sustaining: it drains the surplus.
                flow[k] = (to[k] == p ? -balance : balance) * share;
            }
        }

        /** The flow a valve's fully open law passes at 1 m of head (m³/s), by bisection on that law. */
        double shareWeight(PressureControlValve pcv) {
            double lo = 0;
            double hi = 1;
            while (pcv.headLoss(hi, ctx) < 1 && hi < 1e6) {
                hi *= 10;
            }
            for (int i = 0; i < 100; i++) {
                double q = 0.5 * (lo + hi);
                if (pcv.headLoss(q, ctx) < 1) {
                    lo = q;
                } else {
                    hi = q;
                }
            }
            return Math.max(0.5 * (lo + hi), Double.MIN_NORMAL);
        }

        /**
         * Of several active valves holding one node, only those holding the dominant head can stay
         * active: a reducing valve set below the head another holds sees its outlet above its setting
         * and closes, a sustaining valve set above the head another holds sees its inlet below its
         * setting and closes. Those are shut here and set aside: when the valve holding the node opens
         * or shuts they are made active again, and the status rules sort them as they would any valve.
         * Returns the ids whose status changed.
         */
        List<String> settleSharedHolds() {
            List<String> shut = new ArrayList<>();
            // A node whose holding valve has opened or shut falls back on the valves set aside for it.
            java.util.Set<Integer> held = new java.util.HashSet<>();
            for (int k = 0; k < nLinks; k++) {
                if (status[k] == ACTIVE && pinNode[k] >= 0) {
                    held.add(pinNode[k]);
                }
            }
            for (int k = 0; k < nLinks; k++) {
                if (setAside[k] && status[k] == SHUT && !held.contains(pinNode[k])) {
                    status[k] = ACTIVE;
                    setAside[k] = false;
                    shut.add(element[k].id());
                }
            }
            Map<Integer, Double> dominant = new java.util.HashMap<>();
            for (int k = 0; k < nLinks; k++) {
                if (status[k] == ACTIVE && pinNode[k] >= 0) {
                    boolean reducing = ((PressureControlValve) element[k]).reducing();
                    dominant.merge(pinNode[k], pinHead[k], reducing ? Math::max : Math::min);
                }
            }
            for (int k = 0; k < nLinks; k++) {
                if (status[k] == ACTIVE && pinNode[k] >= 0) {
                    if (Math.abs(dominant.get(pinNode[k]) - pinHead[k]) > headTolerance) {
                        status[k] = SHUT;
                        flow[k] = 0;
                        setAside[k] = true;
                        shut.add(element[k].id());
                    }
                }
            }
            return shut;
        }

        /** Mean slope of the open links at each node (m per m³/s), 0 where none. */
        double[] junctionWeights(double[] g) {
            double[] sum = new double[nNodes];
            int[] count = new int[nNodes];
            for (int k = 0; k < nLinks; k++) {
                if (status[k] == OPEN) {
                    sum[from[k]] += g[k];
                    sum[to[k]] += g[k];
                    count[from[k]]++;
                    count[to[k]]++;
                }
            }
            for (int i = 0; i < nNodes; i++) {
                sum[i] = count[i] == 0 ? 0 : sum[i] / count[i];
            }
            return sum;
        }

        /** ½ (Σ e² + Σ (w c)²) at the current state, e already filled. */
        double merit(double[] e, boolean[] live, double[] weight) {
            double m = 0;
            for (int k = 0; k < nLinks; k++) {
                if (status[k] == OPEN) {
                    m += e[k] * e[k];
                }
            }
            double[] c = new double[nNodes];
            for (int i = 0; i < nNodes; i++) {
                c[i] = -demand[i];
            }
            for (int k = 0; k < nLinks; k++) {
                c[to[k]] += flow[k];
                c[from[k]] -= flow[k];
            }
            for (int i = 0; i < nNodes; i++) {
                if (junction[i] >= 0 && live[i]) {
                    double wc = weight[i] * c[i];
                    m += wc * wc;
                }
            }
            return Double.isNaN(m) ? Double.POSITIVE_INFINITY : 0.5 * m;
        }

        void restore(double[] bestHead, double[] bestFlow) {
            System.arraycopy(bestHead, 0, head, 0, nNodes);
            System.arraycopy(bestFlow, 0, flow, 0, nLinks);
        }

        /** Start head for a junction that has none yet: the first fixed head's. */
        double firstFixedHead() {
            for (int i = 0; i < nNodes; i++) {
                if (junction[i] < 0) {
                    return head[i];
                }
            }
            return 0;
        }

        double continuityTolerance() {
            return CONTINUITY_TOLERANCE + 1e-12 * totalDemand;
        }

        /** Fills h and e for open links; returns the largest |e|. */
        double energyResidual(double[] h, double[] e) {
            forEachLink(k -> {
                if (status[k] != OPEN) {
                    e[k] = 0;
                    return;
                }
                double hk;
                try {
                    hk = law(k, flow[k]);
                } catch (InputException ex) {
                    hk = Double.POSITIVE_INFINITY;
                }
                h[k] = hk;
                e[k] = hk - (head[from[k]] - head[to[k]]);
            });
            double max = 0;
            for (int k = 0; k < nLinks; k++) {
                double a = Math.abs(e[k]);
                if (!(a <= max)) {
                    max = a;
                }
            }
            return max;
        }

        double continuityResidual(boolean[] live) {
            double[] c = new double[nNodes];
            for (int i = 0; i < nNodes; i++) {
                c[i] = -demand[i];
            }
            for (int k = 0; k < nLinks; k++) {
                c[to[k]] += flow[k];
                c[from[k]] -= flow[k];
            }
            double max = 0;
            for (int i = 0; i < nNodes; i++) {
                if (junction[i] >= 0 && live[i]) {
                    max = Math.max(max, Math.abs(c[i]));
                }
            }
            return max;
        }

        /** Applies the status rules; returns the ids of links whose status changed. */
        List<String> updateStatuses() {
            List<String> changed = new ArrayList<>();
            for (int k = 0; k < nLinks; k++) {
                Element e = element[k];
                if (e instanceof PressureControlValve pcv) {
                    String change = pressureControlStatus(k, pcv);
                    if (change != null) {
                        changed.add(change);
                    }
                    continue;
                }
                if (e instanceof FlowControlValve fcv) {
                    double hf = head[from[k]];
                    double ht = head[to[k]];
                    if (status[k] == ACTIVE && !Double.isNaN(hf) && !Double.isNaN(ht)) {
                        // The heads cannot drive the setting even fully open: the valve opens.
                        if (hf - ht < e.headLoss(fcv.setting(), ctx) - headTolerance) {
                            status[k] = OPEN;
                            changed.add(e.id());
                        }
                        continue;
                    }
                    if (status[k] == OPEN && flow[k] > fcv.setting() * (1 + 1e-9)) {
                        status[k] = ACTIVE;
                        flow[k] = fcv.setting();
                        changed.add(e.id());
                        continue;
                    }
                }
                if (status[k] == CLOSED || !e.blocksReverseFlow()) {
                    continue;
                }
                if (status[k] == OPEN && flow[k] < 0) {
                    status[k] = SHUT;
                    flow[k] = 0;
                    changed.add(e.id());
                } else if (status[k] == SHUT) {
                    double hf = head[from[k]];
                    double ht = head[to[k]];
                    if (Double.isNaN(hf) || Double.isNaN(ht)) {
                        continue;
                    }
                    // Forward flow would follow if the heads, less the loss at zero flow (−shut-off head for a
                    // pump), drive it.
                    if (hf - ht > zeroFlowLoss[k] + headTolerance) {
                        status[k] = OPEN;
                        flow[k] = ZERO_FLOW;
                        changed.add(e.id());
                    }
                }
            }
            return changed;
        }

        /**
         * The pressure-control status rules (Rossman 2000, Appendix D), with one more: an active valve
         * whose ends differ by less than its fully open loss at its flow opens, since no throttling
         * could pass that flow (a small valve beside a large one, or a valve too small for the
         * demand). Returns the id when the status changed. H_f, H_t are the heads at the valve's ends,
         * H_s the held head.
         */
        String pressureControlStatus(int k, PressureControlValve pcv) {
            double hf = head[from[k]];
            double ht = head[to[k]];
            double hs = pinHead[k];
            double tol = headTolerance;
            if (Double.isNaN(hf) || Double.isNaN(ht)) {
                return null;
            }
            int before = status[k];
            int after = before;
            if (before == ACTIVE) {
                if (flow[k] < 0) {
                    after = SHUT;
                } else if (pcv.reducing() ? hf < hs - tol : ht > hs + tol) {
                    after = OPEN;
                } else if (hf - ht < pcv.headLoss(flow[k], ctx) - tol) {
                    // Holding its head would take less loss than the valve has fully open: it cannot pass
                    // that flow, so it is fully open and the held head gives way.
                    after = OPEN;
                }
            } else if (before == OPEN) {
                if (flow[k] < 0) {
                    after = SHUT;
                } else if (pcv.reducing() ? ht > hs + tol : hf < hs - tol) {
                    after = ACTIVE;
                }
            } else if (before == SHUT) {
                if (hf > hs + tol && ht < hs - tol) {
                    after = ACTIVE;
                } else if (hf > ht + tol && (pcv.reducing() ? hf < hs : ht > hs)) {
                    after = OPEN;
                }
            }
            if (after == before) {
                return null;
            }
            status[k] = after;
            flow[k] = after == OPEN ? ZERO_FLOW : after == SHUT ? 0 : Math.max(flow[k], 0);
            return pcv.id();
        }

        NetworkResult result(boolean converged, boolean[] live) {
            double rho = ctx.fluid().density();
            double g0 = Gravity.STANDARD;
            double[] net = new double[nNodes];
            for (int k = 0; k < nLinks; k++) {
                net[to[k]] += flow[k];
                net[from[k]] -= flow[k];
            }
            List<NetworkResult.NodeResult> nodes = new ArrayList<>(nNodes);
            double vapour = ctx.fluid().vapourPressure().orElse(Double.NaN);
            double air = NetworkSolver.Run.this.net.site().pressure();
            List<String> belowVapour = new ArrayList<>();
            List<String> subAtmospheric = new ArrayList<>();
            for (int i = 0; i < nNodes; i++) {
                Node n = NetworkSolver.Run.this.net.nodes().get(i);
                double hd = head[i];
                double p = rho * g0 * (hd - n.elevation());
                boolean fixed = junction[i] < 0;
                // At a fixed-head node the "demand" is what it takes from the network (negative: supplies).
                double d = fixed ? net[i] : demand[i];
                nodes.add(new NetworkResult.NodeResult(n.id(), hd, p, n.elevation(), d, fixed));
                if (Double.isFinite(p) && !fixed) {
                    if (Double.isFinite(vapour) && p + air < vapour) {
                        belowVapour.add(n.id());
                    } else if (p < -10) {
                        subAtmospheric.add(n.id());
                    }
                }
                if (n.kind() == Node.Kind.REFERENCE && Math.abs(net[i]) > 1e3 * continuityTolerance()) {
                    cautions.add(Caution.serious(
                                    "reference-exchanges-flow",
                                    String.format(
                                            Locale.ROOT,
                                            "the pressure reference %s exchanges %.4g L/s with the network; a"
                                                    + " closed loop's demands must balance, so check them",
                                            n.id(),
                                            net[i] * 1000),
                                    "continuity")
                            .about(n.id()));
                }
            }
            if (!belowVapour.isEmpty()) {
                cautions.add(Caution.serious(
                        "below-vapour-pressure",
                        "absolute pressure below the vapour pressure at "
                                + String.join(", ", belowVapour.subList(0, Math.min(20, belowVapour.size())))
                                + ": the liquid would boil or the column separate there, and the solution is not"
                                + " physical",
                        "vapour pressure of the fluid model"));
            }
            if (!subAtmospheric.isEmpty()) {
                cautions.add(Caution.warning(
                        "sub-atmospheric",
                        "gauge pressure below atmospheric at "
                                + String.join(", ", subAtmospheric.subList(0, Math.min(20, subAtmospheric.size())))
                                + "; air may be drawn in at joints and air valves",
                        "common practice, no source"));
            }
            // Each link's report depends on its own state only, so the reports are made on both cores
            // for a large network and gathered in link order.
            LinkReport[] reports = new LinkReport[nLinks];
            forEachLink(k -> reports[k] = report(k));
            List<NetworkResult.LinkResult> links = new ArrayList<>(nLinks);
            double maxEnergy = 0;
            for (LinkReport rep : reports) {
                links.add(rep.result());
                cautions.addAll(rep.cautions());
                maxEnergy = Math.max(maxEnergy, rep.energy());
            }
            List<Caution> all = new ArrayList<>(dedupe(cautions));
            all.add(Caution.GENERAL_REVIEW);
            return new NetworkResult(
                    nodes, links, iterations, converged, lastHeadChange, maxEnergy, continuityResidual(live), all);
        }

        /** One link's report: its result, its element's cautions and |h(Q) − ΔH| when open. */
        record LinkReport(NetworkResult.LinkResult result, List<Caution> cautions, double energy) {}

        LinkReport report(int k) {
            Element e = element[k];
            double q = flow[k];
            double loss = head[from[k]] - head[to[k]];
            double velocity = Double.NaN;
            double friction = Double.NaN;
            double energyError = 0;
            List<Caution> own = List.of();
            Optional<ElementResult> er = Optional.empty();
            String st = status[k] == OPEN
                    ? "open"
                    : status[k] == CLOSED ? "closed" : status[k] == ACTIVE ? "active" : "shut";
            if (status[k] == ACTIVE) {
                er = Optional.of(e.evaluate(Math.max(q, 0), ctx));
            }
            if (status[k] == OPEN && Double.isFinite(q)) {
                if (e instanceof Segment s) {
                    velocity = q / (Math.PI * s.innerDiameter() * s.innerDiameter() / 4);
                }
                energyError = Math.abs(law(k, q) - loss);
                // Below the zero-flow threshold the law was linearised; a method such as Colebrook–White
                // may refuse so small a Reynolds number, and there is nothing to report about it anyway.
                if (Math.abs(q) >= ZERO_FLOW || e instanceof PumpElement) {
                    try {
                        double evalFlow = q < 0 && e.blocksReverseFlow() ? 0 : q;
                        ElementResult r;
                        if (e instanceof Segment s) {
                            Element.requireFiniteFlow(s, q);
                            PipeFlow pf = s.flowAt(Math.abs(q), ctx);
                            friction = pf.frictionFactor();
                            r = s.evaluate(q, pf, ctx);
                        } else {
                            r = e.evaluate(evalFlow, ctx);
                        }
                        er = Optional.of(r);
                        own = r.cautions();
                    } catch (InputException ex) {
                        own = List.of(Caution.serious("element-failed", ex.getMessage(), "element law")
                                .about(e.id()));
                    }
                }
            }
            return new LinkReport(
                    new NetworkResult.LinkResult(
                            e.id(),
                            e.kind(),
                            net.nodes().get(from[k]).id(),
                            net.nodes().get(to[k]).id(),
                            status[k] == OPEN || status[k] == ACTIVE ? q : 0,
                            velocity,
                            loss,
                            friction,
                            st,
                            er),
                    own,
                    energyError);
        }
    }

    /** Links from which per-link work (element laws, slopes, reports) is shared among the cores. */
    static final int PARALLEL_LINKS = 20_000;

    /** Cautions of one code shown in full before the rest are counted in one summary line. */
    static final int CAUTIONS_PER_CODE = 5;

    /**
     * Equal cautions once each; of one code at most {@value #CAUTIONS_PER_CODE} in full and a count
     * of the rest, so that a network of 10⁵ laminar pipes does not print 10⁵ lines.
     */
    private static List<Caution> dedupe(List<Caution> cautions) {
        java.util.Map<String, Integer> shown = new java.util.HashMap<>();
        java.util.Map<String, Caution> firstOfCode = new java.util.LinkedHashMap<>();
        java.util.Map<String, Integer> hidden = new java.util.LinkedHashMap<>();
        List<Caution> out = new ArrayList<>();
        for (Caution c : new java.util.LinkedHashSet<>(cautions)) {
            int n = shown.merge(c.code(), 1, Integer::sum);
            firstOfCode.putIfAbsent(c.code(), c);
            if (n <= CAUTIONS_PER_CODE) {
                out.add(c);
            } else {
                hidden.merge(c.code(), 1, Integer::sum);
            }
        }
        for (var e : hidden.entrySet()) {
            Caution first = firstOfCode.get(e.getKey());
            out.add(new Caution(
                    e.getKey(),
                    first.severity(),
                    String.format(
                            Locale.ROOT,
                            "… and %d more elements with the caution \"%s\" (the first %d are listed above)",
                            e.getValue(),
                            e.getKey(),
                            CAUTIONS_PER_CODE),
                    first.basis()));
        }
        return out;
    }
}
