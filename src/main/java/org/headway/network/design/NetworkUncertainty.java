package org.headway.network.design;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.Node;
import org.headway.system.CheckValve;
import org.headway.system.FlowControlValve;
import org.headway.system.PressureControlValve;
import org.headway.system.PumpElement;
import org.headway.system.Segment;
import org.headway.system.UncertaintyBand.Band;

/**
 * The range of every node's pressure and head and every pump's duty (flow, head) when each pipe's
 * absolute roughness ε lies anywhere in its material's published range [ε_low, ε_high] and every
 * junction demand is scaled by a multiplier m in [m_low, m_high].
 *
 * <p><b>Corners</b>, when they provably bound: the network is a tree over its open links (L = N − 1
 * and connected), it has exactly one fixed-head node, no pumps, no flow- or pressure-control valves,
 * no junction takes an inflow (every total demand ≥ 0), and every check valve faces away from the
 * source with demand downstream of it. Then each link carries the demand downstream of it, m Σ d,
 * away from the source whatever the roughness, and a node's head is H_source − Σ h_k(Q_k) along its
 * one path. Each loss h_k rises with |Q_k| (every element law here does) and a Darcy–Weisbach
 * pipe's with ε (the Colebrook–White friction factor rises with ε/D: C. F. Colebrook, J. Inst. Civ.
 * Eng. 11 (1939) 133–156, eq. 10; laminar friction does not depend on ε), so every pressure falls
 * monotonically with each roughness and with m. The low corner (every ε at ε_high, demands × m_high)
 * gives every node's lowest pressure; the high corner (ε_low, demands × m_low) its highest. Both
 * bound the combinations exactly — also when each junction's demand had its own multiplier in the
 * range — for the modelled laws. Two solves and the nominal.
 *
 * <p><b>Monte Carlo</b> otherwise (loops, several fixed heads, pumps, control valves, inflows, a
 * check valve that could shut): in a loop or with a pump a rougher pipe moves flow elsewhere and can
 * raise a pressure, so corners need not bound. The convention, which a caller can reproduce: a
 * {@link SplittableRandom} made from the seed is split once per sample, in sample order; from its
 * sample's stream each sample draws first one demand multiplier m = m_low + (m_high − m_low) u for
 * the whole network, then for each pipe ({@link Segment} link) in link order ε = ε_low + (ε_high −
 * ε_low) u, u = {@code nextDouble()} uniform in [0, 1). One multiplier for all junctions models an
 * uncertain level of demand that moves together (the demands' ends are then exactly the corners);
 * demands that vary independently junction by junction are not sampled. The two corners and the
 * nominal are solved as well, so the ranges always contain them. The ranges are the sampled
 * extremes — not bounds, not a confidence interval.
 *
 * <p>Hazen–Williams pipes carry a C and no range of it; their loss is held. Solves that do not
 * converge are left out of every range and counted. Samples are solved on up to {@value
 * #DEFAULT_THREADS} threads; each sample's numbers depend on its own stream only and ties between
 * solves are broken by sample order, so the result is the same whatever the threads' timing.
 */
public final class NetworkUncertainty {

    /** Random samples drawn by default. */
    public static final int DEFAULT_SAMPLES = 200;

    /** Seed used by default. */
    public static final long DEFAULT_SEED = 1;

    /** Most random samples accepted. */
    public static final int MAX_SAMPLES = 100_000;

    /** Threads used by {@link #run(Network, Spec, NetworkSolver)} (fewer on a machine with fewer cores). */
    public static final int DEFAULT_THREADS = 2;

    /**
     * Relative slack of the corners' self-check (ratio): a solve other than the expected corner may
     * beat it by this much of the pressure plus {@value #ORDER_SLACK_PRESSURE} Pa — the solver's
     * converged heads (energy residual ≤ 10⁻⁹ m) differ from the exact ones by far less — before a
     * caution says the corners did not come out in order.
     */
    static final double ORDER_SLACK_RATIO = 1e-9;

    /** Absolute slack of the corners' self-check (Pa). */
    static final double ORDER_SLACK_PRESSURE = 1e-3;

    /** Solve labels listed in full in a caution before the rest are counted. */
    private static final int LISTED = 5;

    /** Solve index of the low corner; the order is also the tie-break order. */
    static final int LOW_CORNER = 0;

    /** Solve index of the high corner. */
    static final int HIGH_CORNER = 1;

    /** Solve index of the nominal; random sample k (from 1) has index NOMINAL + k. */
    static final int NOMINAL = 2;

    private NetworkUncertainty() {}

    /** How the ranges are found. */
    public enum Method {
        /** The two corners, which bound the ranges. */
        CORNERS("corners"),
        /** Seeded Monte Carlo sampling with the corners and the nominal; sampled extremes. */
        MONTE_CARLO("monte-carlo");

        private final String id;

        Method(String id) {
            this.id = id;
        }

        /** The method's name in output: {@code corners} or {@code monte-carlo}. */
        public String id() {
            return id;
        }
    }

    /**
     * What to vary and how much to sample.
     *
     * @param demandLow multiplier on every junction demand at the low end (ratio), 0 &lt; m_low ≤ 1
     * @param demandHigh multiplier at the high end (ratio), 1 ≤ m_high (the network as given, m = 1,
     *     is the nominal and lies in the range; to study another demand level, scale the network first)
     * @param samples random samples for Monte Carlo, 1 to {@value #MAX_SAMPLES} (unused by corners)
     * @param seed seed of the random samples
     */
    public record Spec(double demandLow, double demandHigh, int samples, long seed) {

        /** Largest multiplier accepted (ratio): ten times the demand is no longer an uncertainty. */
        public static final double MAX_MULTIPLIER = 10;

        public Spec {
            if (!Double.isFinite(demandLow) || !Double.isFinite(demandHigh)) {
                throw new InputException(
                        "--demand-range", "both ends must be finite numbers, got " + demandLow + " and " + demandHigh);
            }
            if (!(demandLow > 0) || demandLow > 1) {
                throw new InputException(
                        "--demand-range",
                        "the low multiplier must be above 0 and at most 1 (the nominal), got " + demandLow);
            }
            if (demandHigh < 1 || demandHigh > MAX_MULTIPLIER) {
                throw new InputException(
                        "--demand-range",
                        "the high multiplier must be at least 1 (the nominal) and at most " + MAX_MULTIPLIER + ", got "
                                + demandHigh);
            }
            if (samples < 1 || samples > MAX_SAMPLES) {
                throw new InputException(
                        "--samples", "must be a whole number from 1 to " + MAX_SAMPLES + ", got " + samples);
            }
        }

        /** A demand range with the default samples and seed. */
        public static Spec of(double demandLow, double demandHigh) {
            return new Spec(demandLow, demandHigh, DEFAULT_SAMPLES, DEFAULT_SEED);
        }

        /**
         * A demand range typed as {@code LOW:HIGH} multipliers on every junction demand (e.g. {@code
         * 0.9:1.1}), default samples and seed; null gives 1:1 (roughness ranges only).
         *
         * @param where the field or option the text came from, named in any error
         */
        public static Spec ofDemandRange(String text, String where) {
            if (text == null) {
                return roughnessOnly();
            }
            String[] parts = text.strip().split(":", -1);
            if (parts.length != 2) {
                throw new InputException(
                        where, "expected LOW:HIGH multipliers on the demands, e.g. \"0.9:1.1\", got \"" + text + "\"");
            }
            double low;
            double high;
            try {
                low = org.headway.units.Decimals.parseDecimal(parts[0].strip());
                high = org.headway.units.Decimals.parseDecimal(parts[1].strip());
            } catch (RuntimeException e) {
                throw new InputException(
                        where, "expected two plain numbers LOW:HIGH, e.g. \"0.9:1.1\", got \"" + text + "\"");
            }
            return of(low, high);
        }

        /** Roughness only (demands as given), default samples and seed. */
        public static Spec roughnessOnly() {
            return of(1, 1);
        }

        /** The same with another number of samples. */
        public Spec withSamples(int newSamples) {
            return new Spec(demandLow, demandHigh, newSamples, seed);
        }

        /** The same with another seed. */
        public Spec withSeed(long newSeed) {
            return new Spec(demandLow, demandHigh, samples, newSeed);
        }
    }

    /**
     * The method a network gets and why.
     *
     * @param method corners or Monte Carlo
     * @param reason the network's property that decided it, in words
     */
    public record Choice(Method method, String reason) {}

    /**
     * Decides between corners and Monte Carlo for a network (no solve).
     *
     * @param network the network
     * @return the method and the reason in words (without the sampling convention)
     */
    public static Choice choose(Network network) {
        List<String> against = new ArrayList<>();
        List<Node> nodes = network.nodes();
        List<Link> links = network.links();
        int source = -1;
        int fixedCount = 0;
        for (int i = 0; i < nodes.size(); i++) {
            if (nodes.get(i).headIsFixed()) {
                fixedCount++;
                source = i;
            }
        }
        if (fixedCount > 1) {
            against.add(fixedCount + " fixed-head nodes");
        }
        List<String> pumps = new ArrayList<>();
        List<String> controls = new ArrayList<>();
        for (Link l : links) {
            if (l.element() instanceof PumpElement) {
                pumps.add(l.id());
            } else if (l.element() instanceof FlowControlValve || l.element() instanceof PressureControlValve) {
                controls.add(l.id());
            }
        }
        if (!pumps.isEmpty()) {
            against.add("pumps (" + listed(pumps) + ")");
        }
        if (!controls.isEmpty()) {
            against.add("control valves (" + listed(controls) + ")");
        }
        List<String> inflows = new ArrayList<>();
        for (Node n : nodes) {
            if (!n.headIsFixed() && n.totalDemand() < 0) {
                inflows.add(n.id());
            }
        }
        if (!inflows.isEmpty()) {
            against.add("inflows (negative demands) at " + listed(inflows));
        }
        if (fixedCount == 1) {
            Tree tree = Tree.of(network, source);
            if (!tree.connected) {
                against.add("nodes cut off from the source by closed links");
            } else if (tree.openLinks != nodes.size() - 1) {
                against.add(String.format(
                        Locale.ROOT,
                        "loops (%d open links on %d nodes; a tree has %d)",
                        tree.openLinks,
                        nodes.size(),
                        nodes.size() - 1));
            } else {
                List<String> checks = new ArrayList<>();
                for (int k = 0; k < links.size(); k++) {
                    if (links.get(k).element() instanceof CheckValve && !tree.passesForward(k)) {
                        checks.add(links.get(k).id());
                    }
                }
                if (!checks.isEmpty()) {
                    against.add("check valves that face the source or carry no flow (" + listed(checks) + ")");
                }
            }
        }
        if (against.isEmpty()) {
            return new Choice(
                    Method.CORNERS,
                    "single-source tree without pumps or control valves, every demand an outflow and any check"
                            + " valve passing flow away from the source: each link carries the demand beyond it, so"
                            + " every pressure falls monotonically with each pipe's roughness and with the demand"
                            + " multiplier, and the two corners bound them");
        }
        return new Choice(Method.MONTE_CARLO, String.join(", ", against) + ": corners need not bound");
    }

    /**
     * The ranges with up to {@value #DEFAULT_THREADS} threads.
     *
     * @param network the network at its nominal roughness and demands
     * @param spec demand range, samples and seed
     * @param solver the network solver used for every solve
     */
    public static NetworkUncertaintyResult run(Network network, Spec spec, NetworkSolver solver) {
        return run(
                network,
                spec,
                solver,
                Math.min(DEFAULT_THREADS, Runtime.getRuntime().availableProcessors()));
    }

    /**
     * The ranges on a number of threads; the result does not depend on it.
     *
     * @param network the network at its nominal roughness and demands
     * @param spec demand range, samples and seed
     * @param solver the network solver used for every solve
     * @param threads threads solving samples, ≥ 1
     */
    public static NetworkUncertaintyResult run(Network network, Spec spec, NetworkSolver solver, int threads) {
        if (threads < 1) {
            throw new InputException("threads", "must be at least 1, got " + threads);
        }
        Choice choice = choose(network);
        Setup setup = new Setup(network, spec, choice.method());
        int total = setup.solveCount();
        NetworkResult nominal = solver.solve(network);
        Extremes all = new Extremes(setup, total);
        all.add(NOMINAL, nominal);
        NetworkResult[] corners = new NetworkResult[2];
        List<Integer> rest = new ArrayList<>();
        for (int i = 0; i < total; i++) {
            if (i != NOMINAL) {
                rest.add(i);
            }
        }
        int workers = Math.min(threads, rest.size());
        if (workers <= 1) {
            for (int i : rest) {
                NetworkResult r = solver.solve(setup.networkAt(i));
                if (i < NOMINAL) {
                    corners[i] = r;
                }
                all.add(i, r);
            }
        } else {
            AtomicInteger next = new AtomicInteger();
            ExecutorService pool = Executors.newFixedThreadPool(workers, task -> {
                Thread t = new Thread(task, "headway-uncertainty");
                t.setDaemon(true);
                return t;
            });
            try {
                List<Future<Extremes>> parts = new ArrayList<>();
                for (int w = 0; w < workers; w++) {
                    parts.add(pool.submit(() -> {
                        Extremes part = new Extremes(setup, total);
                        int j;
                        while ((j = next.getAndIncrement()) < rest.size()) {
                            int i = rest.get(j);
                            NetworkResult r = solver.solve(setup.networkAt(i));
                            if (i < NOMINAL) {
                                corners[i] = r;
                            }
                            part.add(i, r);
                        }
                        return part;
                    }));
                }
                for (Future<Extremes> f : parts) {
                    all.merge(f.get());
                }
            } catch (ExecutionException e) {
                if (e.getCause() instanceof RuntimeException re) {
                    throw re;
                }
                throw new IllegalStateException(e.getCause());
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("uncertainty run interrupted", e);
            } finally {
                pool.shutdownNow();
            }
        }
        return all.result(choice, spec, nominal, corners);
    }

    /** The spanning tree of a single-source network over its open links, from the source. */
    private static final class Tree {
        boolean connected;
        int openLinks;
        int[] parentLink;
        int[] parentNode;
        double[] downstreamDemand;
        int[] from;
        int[] to;

        static Tree of(Network network, int source) {
            Tree t = new Tree();
            int n = network.nodes().size();
            List<Link> links = network.links();
            Map<String, Integer> index = network.nodeIndex();
            t.from = new int[links.size()];
            t.to = new int[links.size()];
            int[] degree = new int[n];
            for (int k = 0; k < links.size(); k++) {
                t.from[k] = index.get(links.get(k).from());
                t.to[k] = index.get(links.get(k).to());
                if (!links.get(k).element().isClosed()) {
                    t.openLinks++;
                    degree[t.from[k]]++;
                    degree[t.to[k]]++;
                }
            }
            int[][] adjacent = new int[n][];
            for (int i = 0; i < n; i++) {
                adjacent[i] = new int[degree[i]];
            }
            int[] fill = new int[n];
            for (int k = 0; k < links.size(); k++) {
                if (!links.get(k).element().isClosed()) {
                    adjacent[t.from[k]][fill[t.from[k]]++] = k;
                    adjacent[t.to[k]][fill[t.to[k]]++] = k;
                }
            }
            t.parentLink = new int[n];
            t.parentNode = new int[n];
            Arrays.fill(t.parentLink, -2);
            t.parentLink[source] = -1;
            t.parentNode[source] = -1;
            int[] order = new int[n];
            int reached = 0;
            ArrayDeque<Integer> queue = new ArrayDeque<>();
            queue.add(source);
            while (!queue.isEmpty()) {
                int i = queue.poll();
                order[reached++] = i;
                for (int k : adjacent[i]) {
                    int other = t.from[k] == i ? t.to[k] : t.from[k];
                    if (t.parentLink[other] == -2) {
                        t.parentLink[other] = k;
                        t.parentNode[other] = i;
                        queue.add(other);
                    }
                }
            }
            t.connected = reached == n;
            t.downstreamDemand = new double[n];
            if (t.connected) {
                for (int j = n - 1; j >= 0; j--) {
                    int i = order[j];
                    Node node = network.nodes().get(i);
                    t.downstreamDemand[i] += node.headIsFixed() ? 0 : node.totalDemand();
                    if (t.parentNode[i] >= 0) {
                        t.downstreamDemand[t.parentNode[i]] += t.downstreamDemand[i];
                    }
                }
            }
            return t;
        }

        /** Whether link k (a tree link) points away from the source and has demand beyond it. */
        boolean passesForward(int k) {
            int child = parentLink[to[k]] == k ? to[k] : parentLink[from[k]] == k ? from[k] : -1;
            return child == to[k] && downstreamDemand[child] > 0;
        }
    }

    /** The network's pipes and demands, and how to build the network of each solve. */
    private static final class Setup {
        final Network network;
        final Spec spec;
        final Method method;
        /** Link indices of the pipes, in link order. */
        final int[] pipes;
        /** Link indices of the pumps, in link order. */
        final int[] pumps;

        final int hazenWilliamsPipes;
        final int rangedPipes;
        /** One stream per random sample, split from the seed in sample order. */
        final SplittableRandom[] streams;

        Setup(Network network, Spec spec, Method method) {
            this.network = network;
            this.spec = spec;
            this.method = method;
            List<Integer> p = new ArrayList<>();
            List<Integer> q = new ArrayList<>();
            int hw = 0;
            int ranged = 0;
            for (int k = 0; k < network.links().size(); k++) {
                var e = network.links().get(k).element();
                if (e instanceof Segment s) {
                    p.add(k);
                    if (s.hazenWilliams().isPresent()) {
                        hw++;
                    } else if (s.roughnessHigh() > s.roughnessLow()) {
                        ranged++;
                    }
                } else if (e instanceof PumpElement) {
                    q.add(k);
                }
            }
            pipes = p.stream().mapToInt(Integer::intValue).toArray();
            pumps = q.stream().mapToInt(Integer::intValue).toArray();
            hazenWilliamsPipes = hw;
            rangedPipes = ranged;
            int n = method == Method.MONTE_CARLO ? spec.samples() : 0;
            streams = new SplittableRandom[n];
            SplittableRandom master = new SplittableRandom(spec.seed());
            for (int i = 0; i < n; i++) {
                streams[i] = master.split();
            }
        }

        int solveCount() {
            return NOMINAL + 1 + streams.length;
        }

        String label(int index) {
            return switch (index) {
                case LOW_CORNER -> "low corner";
                case HIGH_CORNER -> "high corner";
                case NOMINAL -> "nominal";
                default -> "sample " + (index - NOMINAL);
            };
        }

        /** The network of a solve; the links and nodes that do not change are shared, not copied. */
        Network networkAt(int index) {
            if (index == NOMINAL) {
                return network;
            }
            double multiplier;
            double[] roughness = new double[pipes.length];
            if (index == LOW_CORNER || index == HIGH_CORNER) {
                boolean low = index == LOW_CORNER;
                multiplier = low ? spec.demandHigh() : spec.demandLow();
                for (int s = 0; s < pipes.length; s++) {
                    Segment seg = (Segment) network.links().get(pipes[s]).element();
                    roughness[s] = low ? seg.roughnessHigh() : seg.roughnessLow();
                }
            } else {
                SplittableRandom rng = streams[index - NOMINAL - 1];
                multiplier = draw(rng, spec.demandLow(), spec.demandHigh());
                for (int s = 0; s < pipes.length; s++) {
                    Segment seg = (Segment) network.links().get(pipes[s]).element();
                    roughness[s] = draw(rng, seg.roughnessLow(), seg.roughnessHigh());
                }
            }
            return at(network, pipes, roughness, multiplier);
        }
    }

    /** A uniform draw in [low, high): low + (high − low) u; exactly low when the range is empty. */
    static double draw(SplittableRandom rng, double low, double high) {
        return low + (high - low) * rng.nextDouble();
    }

    /**
     * The network with pipe {@code pipes[s]} at roughness {@code roughness[s]} and every junction
     * demand multiplied by a multiplier.
     */
    static Network at(Network network, int[] pipes, double[] roughness, double multiplier) {
        List<Link> links = new ArrayList<>(network.links());
        for (int s = 0; s < pipes.length; s++) {
            Link l = links.get(pipes[s]);
            Segment seg = (Segment) l.element();
            if (roughness[s] != seg.roughness()) {
                links.set(pipes[s], new Link(seg.withRoughness(roughness[s]), l.from(), l.to(), l.designFlow()));
            }
        }
        List<Node> nodes = network.nodes();
        if (multiplier != 1) {
            nodes = new ArrayList<>(nodes);
            for (int i = 0; i < nodes.size(); i++) {
                Node n = nodes.get(i);
                if (!n.headIsFixed() && !n.demands().isEmpty()) {
                    List<Node.Demand> scaled = new ArrayList<>(n.demands().size());
                    for (Node.Demand d : n.demands()) {
                        scaled.add(new Node.Demand(d.name(), d.flow() * multiplier));
                    }
                    nodes.set(i, n.withDemands(scaled));
                }
            }
        }
        return new Network(network.title(), network.context(), nodes, links, network.site());
    }

    /**
     * Running extremes over solves. On equal values the earlier solve index wins, so merging parts
     * gives the same result in any order.
     */
    private static final class Extremes {
        final Setup setup;
        final int nodeCount;
        final double[] lowPressure;
        final double[] highPressure;
        final double[] lowHead;
        final double[] highHead;
        final int[] lowAt;
        final int[] highAt;
        final int[] withoutHead;
        final double[] lowFlow;
        final double[] highFlow;
        final int[] lowFlowAt;
        final int[] highFlowAt;
        final double[] lowPumpHead;
        final double[] highPumpHead;
        final int[] lowPumpHeadAt;
        final int[] highPumpHeadAt;
        final int[] shut;
        /** Whether each solve failed to converge; each index is written by the one worker that solved it. */
        final boolean[] failed;

        Extremes(Setup setup, int total) {
            this.setup = setup;
            nodeCount = setup.network.nodes().size();
            lowPressure = filled(nodeCount, Double.NaN);
            highPressure = filled(nodeCount, Double.NaN);
            lowHead = filled(nodeCount, Double.NaN);
            highHead = filled(nodeCount, Double.NaN);
            lowAt = new int[nodeCount];
            highAt = new int[nodeCount];
            Arrays.fill(lowAt, -1);
            Arrays.fill(highAt, -1);
            withoutHead = new int[nodeCount];
            int m = setup.pumps.length;
            lowFlow = filled(m, Double.NaN);
            highFlow = filled(m, Double.NaN);
            lowPumpHead = filled(m, Double.NaN);
            highPumpHead = filled(m, Double.NaN);
            lowFlowAt = filled(m);
            highFlowAt = filled(m);
            lowPumpHeadAt = filled(m);
            highPumpHeadAt = filled(m);
            shut = new int[m];
            failed = new boolean[total];
        }

        private static double[] filled(int n, double v) {
            double[] a = new double[n];
            Arrays.fill(a, v);
            return a;
        }

        private static int[] filled(int n) {
            int[] a = new int[n];
            Arrays.fill(a, -1);
            return a;
        }

        /** Whether (v, at) beats the held (held, heldAt) as a low (sign +1) or high (sign −1). */
        private static boolean beats(double v, int at, double held, int heldAt, int sign) {
            if (heldAt < 0) {
                return true;
            }
            double d = sign * (v - held);
            return d < 0 || (d == 0 && at < heldAt);
        }

        void add(int index, NetworkResult r) {
            if (!r.converged()) {
                failed[index] = true;
                return;
            }
            for (int i = 0; i < nodeCount; i++) {
                NetworkResult.NodeResult n = r.nodes().get(i);
                if (!Double.isFinite(n.head())) {
                    withoutHead[i]++;
                    continue;
                }
                takeNode(i, n.pressure(), n.head(), index);
            }
            for (int p = 0; p < setup.pumps.length; p++) {
                NetworkResult.LinkResult l = r.links().get(setup.pumps[p]);
                if (l.status().equals("shut")) {
                    shut[p]++;
                }
                takePump(p, l.flow(), index, -l.headLoss(), index);
            }
        }

        private void takeNode(int i, double pressure, double head, int index) {
            if (beats(pressure, index, lowPressure[i], lowAt[i], 1)) {
                lowPressure[i] = pressure;
                lowHead[i] = head;
                lowAt[i] = index;
            }
            if (beats(pressure, index, highPressure[i], highAt[i], -1)) {
                highPressure[i] = pressure;
                highHead[i] = head;
                highAt[i] = index;
            }
        }

        private void takePump(int p, double flow, int flowAt, double head, int headAt) {
            if (flowAt >= 0 && beats(flow, flowAt, lowFlow[p], lowFlowAt[p], 1)) {
                lowFlow[p] = flow;
                lowFlowAt[p] = flowAt;
            }
            if (flowAt >= 0 && beats(flow, flowAt, highFlow[p], highFlowAt[p], -1)) {
                highFlow[p] = flow;
                highFlowAt[p] = flowAt;
            }
            if (headAt >= 0 && beats(head, headAt, lowPumpHead[p], lowPumpHeadAt[p], 1)) {
                lowPumpHead[p] = head;
                lowPumpHeadAt[p] = headAt;
            }
            if (headAt >= 0 && beats(head, headAt, highPumpHead[p], highPumpHeadAt[p], -1)) {
                highPumpHead[p] = head;
                highPumpHeadAt[p] = headAt;
            }
        }

        void merge(Extremes o) {
            for (int i = 0; i < nodeCount; i++) {
                withoutHead[i] += o.withoutHead[i];
                if (o.lowAt[i] >= 0) {
                    takeNode(i, o.lowPressure[i], o.lowHead[i], o.lowAt[i]);
                }
                if (o.highAt[i] >= 0) {
                    takeNode(i, o.highPressure[i], o.highHead[i], o.highAt[i]);
                }
            }
            for (int p = 0; p < shut.length; p++) {
                shut[p] += o.shut[p];
                takePump(p, o.lowFlow[p], o.lowFlowAt[p], o.lowPumpHead[p], o.lowPumpHeadAt[p]);
                takePump(p, o.highFlow[p], o.highFlowAt[p], o.highPumpHead[p], o.highPumpHeadAt[p]);
            }
            for (int i = 0; i < failed.length; i++) {
                failed[i] |= o.failed[i];
            }
        }

        NetworkUncertaintyResult result(Choice choice, Spec spec, NetworkResult nominal, NetworkResult[] corners) {
            Network network = setup.network;
            boolean carlo = choice.method() == Method.MONTE_CARLO;
            int random = setup.streams.length;
            String reason = choice.reason();
            if (carlo) {
                reason += String.format(
                        Locale.ROOT,
                        "; seeded Monte Carlo: one demand multiplier for the whole network uniform in [%s, %s] and each"
                                + " pipe's roughness uniform in its own range, independently, %d samples from seed %d,"
                                + " the nominal and the two corners solved as well",
                        number(spec.demandLow()),
                        number(spec.demandHigh()),
                        random,
                        spec.seed());
            }
            boolean nominalOk = nominal.converged();
            List<NetworkUncertaintyResult.NodeRange> nodes = new ArrayList<>(nodeCount);
            List<String> outOfOrder = new ArrayList<>();
            List<String> cutOff = new ArrayList<>();
            for (int i = 0; i < nodeCount; i++) {
                NetworkResult.NodeResult n = nominal.nodes().get(i);
                double pn = nominalOk ? n.pressure() : Double.NaN;
                double hn = nominalOk ? n.head() : Double.NaN;
                nodes.add(new NetworkUncertaintyResult.NodeRange(
                        n.id(),
                        n.fixed(),
                        new Band(pn, lowPressure[i], highPressure[i]),
                        new Band(hn, lowHead[i], highHead[i]),
                        lowAt[i] < 0 ? "" : setup.label(lowAt[i]),
                        highAt[i] < 0 ? "" : setup.label(highAt[i]),
                        withoutHead[i]));
                if (withoutHead[i] > 0) {
                    cutOff.add(n.id());
                }
                if (!carlo && !n.fixed() && lowAt[i] >= 0) {
                    if (beyond(corners[LOW_CORNER], i, lowPressure[i], 1)
                            || beyond(corners[HIGH_CORNER], i, highPressure[i], -1)) {
                        outOfOrder.add(n.id());
                    }
                }
            }
            List<NetworkUncertaintyResult.PumpRange> pumps = new ArrayList<>(setup.pumps.length);
            List<String> shutPumps = new ArrayList<>();
            for (int p = 0; p < setup.pumps.length; p++) {
                NetworkResult.LinkResult l = nominal.links().get(setup.pumps[p]);
                double qn = nominalOk ? l.flow() : Double.NaN;
                double hn = nominalOk ? -l.headLoss() : Double.NaN;
                pumps.add(new NetworkUncertaintyResult.PumpRange(
                        l.id(),
                        new Band(qn, lowFlow[p], highFlow[p]),
                        new Band(hn, lowPumpHead[p], highPumpHead[p]),
                        lowFlowAt[p] < 0 ? "" : setup.label(lowFlowAt[p]),
                        highFlowAt[p] < 0 ? "" : setup.label(highFlowAt[p]),
                        shut[p]));
                if (shut[p] > 0) {
                    shutPumps.add(l.id() + " (" + shut[p] + ")");
                }
            }
            int failedCount = 0;
            List<String> failedLabels = new ArrayList<>();
            for (int i = 0; i < failed.length; i++) {
                if (failed[i]) {
                    failedCount++;
                    failedLabels.add(setup.label(i));
                }
            }
            List<Caution> cautions =
                    cautions(carlo, spec, random, nominalOk, failedCount, failedLabels, outOfOrder, cutOff, shutPumps);
            return new NetworkUncertaintyResult(
                    choice.method(),
                    reason,
                    spec.demandLow(),
                    spec.demandHigh(),
                    random,
                    spec.seed(),
                    failed.length,
                    failedCount,
                    nodes,
                    pumps,
                    nominal,
                    cautions);
        }

        /** Whether a solve other than the expected corner went past it by more than the slack. */
        private static boolean beyond(NetworkResult corner, int i, double extreme, int sign) {
            if (corner == null || !corner.converged()) {
                return false;
            }
            double atCorner = corner.nodes().get(i).pressure();
            if (!Double.isFinite(atCorner)) {
                return false;
            }
            double slack = ORDER_SLACK_RATIO * Math.abs(atCorner) + ORDER_SLACK_PRESSURE;
            return sign * (atCorner - extreme) > slack;
        }

        private List<Caution> cautions(
                boolean carlo,
                Spec spec,
                int random,
                boolean nominalOk,
                int failedCount,
                List<String> failedLabels,
                List<String> outOfOrder,
                List<String> cutOff,
                List<String> shutPumps) {
            List<Caution> cautions = new ArrayList<>();
            if (carlo) {
                cautions.add(Caution.warning(
                        "uncertainty-sampled-extremes",
                        String.format(
                                Locale.ROOT,
                                "the ranges are the lowest and highest values over %d solves (%d random samples, the"
                                        + " nominal and the two corners): sampled extremes, not bounds and not a"
                                        + " confidence interval; a combination not sampled can give a lower or higher"
                                        + " pressure or another pump duty, and more samples can only widen the ranges",
                                failed.length,
                                random),
                        "seeded Monte Carlo sampling; common practice, no source"));
                if (spec.demandLow() != spec.demandHigh()) {
                    cautions.add(Caution.note(
                            "demand-multiplier-shared",
                            "one demand multiplier moves every junction's demand together; demands that vary"
                                    + " independently from junction to junction were not sampled",
                            "sampling convention of this study"));
                }
            } else {
                cautions.add(Caution.note(
                        "uncertainty-corners",
                        String.format(
                                Locale.ROOT,
                                "the ranges are the two corners (every roughness high with demands × %s; every"
                                        + " roughness low with demands × %s): they bound every node's pressure for the"
                                        + " modelled element laws with each roughness and each junction's demand"
                                        + " multiplier within its range; they are bounds of a model, not a probability"
                                        + " statement",
                                number(spec.demandHigh()),
                                number(spec.demandLow())),
                        "head loss rises with roughness (Colebrook 1939) and with flow; common practice"));
            }
            cautions.add(Caution.note(
                    "roughness-ranges-published",
                    String.format(
                            Locale.ROOT,
                            "%d pipes vary over their material's published roughness range from the catalog (or the"
                                    + " range given); aged, scaled or tuberculated pipe can be rougher than any published"
                                    + " range, and the range says nothing about a particular pipe",
                            setup.rangedPipes),
                    "pipe catalog"));
            if (setup.hazenWilliamsPipes > 0) {
                cautions.add(Caution.note(
                        "hazen-williams-held",
                        setup.hazenWilliamsPipes
                                + " pipes are computed with a Hazen–Williams C, which carries no range here; their C is"
                                + " held at its value",
                        "Hazen–Williams method"));
            }
            if (setup.rangedPipes == 0 && spec.demandLow() == spec.demandHigh()) {
                cautions.add(Caution.warning(
                        "nothing-varies",
                        "no pipe has a roughness range and the demand range is a single value, so the ranges are the"
                                + " nominal",
                        "input"));
            }
            if (!nominalOk) {
                cautions.add(Caution.serious(
                        "uncertainty-nominal-not-converged",
                        "the solve of the network as given did not converge; its values are not given and the ranges"
                                + " rest on the other solves only",
                        "network solver"));
            }
            if (failedCount > 0) {
                boolean cornerFailed = failed[LOW_CORNER] || failed[HIGH_CORNER];
                String message = String.format(
                        Locale.ROOT,
                        "%d of %d solves did not converge (%s) and are left out of the ranges%s",
                        failedCount,
                        failed.length,
                        listed(failedLabels),
                        !carlo && cornerFailed ? "; with a corner missing the ranges are no longer bounds" : "");
                cautions.add(
                        cornerFailed
                                ? Caution.serious("uncertainty-solves-failed", message, "network solver")
                                : Caution.warning("uncertainty-solves-failed", message, "network solver"));
            }
            if (!outOfOrder.isEmpty()) {
                cautions.add(Caution.warning(
                        "corners-out-of-order",
                        "at " + listed(outOfOrder) + " a solve other than the expected corner gave the extreme"
                                + " pressure: an element law does not rise steadily with flow or roughness there, and"
                                + " the corners may not bound",
                        "monotonicity check of this study"));
            }
            if (!cutOff.isEmpty()) {
                cautions.add(Caution.warning(
                        "nodes-without-head",
                        "in some solves " + listed(cutOff) + " had no head (cut off by shut or closed links); those"
                                + " solves are left out of their ranges",
                        "network solver"));
            }
            if (!shutPumps.isEmpty()) {
                cautions.add(Caution.warning(
                        "pumps-shut-in-samples",
                        "pumps shut in some solves (count): " + listed(shutPumps) + "; their flow range then reaches 0",
                        "pump status rule"));
            }
            cautions.add(Caution.warning(
                    "uncertainty-review",
                    "check the low pressures against the minimum service and fire-fighting pressures and the high"
                            + " pressures against the ratings of pipes, fittings and appliances that the local codes"
                            + " and the utility require; the ranges cover only roughness and demand level, not"
                            + " diameters, elevations, pump wear, valve settings or transients",
                    "common practice, no source"));
            cautions.add(Caution.GENERAL_REVIEW);
            return cautions;
        }
    }

    /** The first few items, then a count of the rest. */
    private static String listed(List<String> items) {
        if (items.size() <= LISTED) {
            return String.join(", ", items);
        }
        return String.join(", ", items.subList(0, LISTED)) + " and " + (items.size() - LISTED) + " more";
    }

    private static String number(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
