package org.headway.network.design;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.Node;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.FlowContext;
import org.headway.system.Gravity;

/**
 * Balances a network's valves to their design flows: every valve link given by K_v or C_v (kind
 * {@code valve}) that has a design flow gets the K_v that makes it carry exactly that flow at the
 * network's fixed heads and pumps.
 *
 * <p><b>Method.</b> Each such valve is replaced by its design flow held between its two nodes (a
 * flow Q_d taken out at its from-node and put in at its to-node, the valve's link removed) — the
 * fixed-flow form of a flow-control valve that is never allowed to open fully — and the network
 * is solved once. The valve's head drop is then h = H_from − H_to, and its K_v follows from the
 * IEC 60534-2-1 relation K_v = Q[m³/h] · √((ρ/ρ₀) / (Δp / 1 bar)) with Δp = ρ g h, ρ₀ = 1000 kg/m³
 * ({@link FlowCoefficientValve#flowCoefficientFor}). Because the network with those K_v values has
 * the held-flow state as its solution, solving it again returns the design flows; that check is
 * run and reported ({@link BalancingResult#largestFlowError()}).
 *
 * <p><b>Short branches.</b> A valve's given K_v is taken as its fully open K_v. Where h is below the
 * valve's fully open loss at Q_d (h_open = (Q_d/K_v,open)² × 1 bar/(ρ₀ g)), no setting reaches the
 * design flow: the branch is named with the extra head it needs, h_open − h, the head that would
 * have to be added in series with it (a bigger valve, a booster) with every other valve at its
 * design flow. The other valves' K_v values assume that it is added.
 *
 * <p><b>Branch and authority.</b> A valve's branch is the chain of links in series with it: from the
 * valve, links are followed through junctions that have no demand and exactly two links that are
 * not closed, until a node that is not such a pass-through (a tee on a header, a fixed-head node, a
 * junction with demand). The chain's first and last nodes are the branch's supply and return nodes,
 * and H_supply − H_return (with every valve at its design flow) is the differential available to the
 * branch. Authority = the valve's head drop / that differential: the share of the branch's
 * differential the valve takes at design flow. This is the usual ratio of a valve's drop to the
 * drop across the circuit it controls, as defined for control valves in hydronic practice (e.g.
 * R. Petitjean, Balancing of Control Loops, Tour &amp; Andersson manual no. 1, appendix A — the
 * definition recalled from memory); applying it to a balancing valve's branch is common practice,
 * no source.
 *
 * <p><b>Index valve and source head.</b> Each valve needs at least its required drop, the larger of
 * the minimum valve drop (default {@value #DEFAULT_MINIMUM_VALVE_DROP} Pa, enough differential for a
 * reliable flow measurement across a balancing valve's test points: common practice, no source) and
 * its fully open loss. The valve with the least spare head (drop less required drop) is the index
 * valve. When the network has one source — one fixed-head node that supplies flow and no running
 * pump, or one running pump and no supplying fixed-head node — the source head needed is the
 * source's head (for a pump the head it adds at its flow) less that spare. It is exact when the
 * source's head moves every branch differential by the same amount, as in a circuit whose branches
 * all lie between one source's flow and return; for a fixed-head source it is checked by a solve
 * with the source at that head, and a caution says when the index valve's drop then misses its
 * required drop by more than {@value #SOURCE_CHECK_TOLERANCE} m.
 *
 * <p><b>Accuracy.</b> The drops carry the solver's accuracy (head change ≤ 10⁻⁶ m at the last Newton
 * step, energy residual ≤ 10⁻⁹ m), so K_v is found to about ½ × 10⁻⁹ m / h relative, and the check
 * solve returns the design flows to better than 10⁻⁶ relative in the tests.
 */
public final class Balancing {

    /** Default least pressure drop across a balancing valve at design flow (Pa): common practice, no source. */
    public static final double DEFAULT_MINIMUM_VALVE_DROP = 3000.0;

    /** A drop within this of the fully open loss counts as reached (m): the solver's head tolerance. */
    public static final double REACH_TOLERANCE = 1e-6;

    /** Allowed miss of the index valve's required drop in the source-head check (m). */
    public static final double SOURCE_CHECK_TOLERANCE = 1e-6;

    /** Largest pressure drop accepted as the minimum valve drop (Pa): 10 bar, beyond any balancing valve. */
    public static final double MAX_MINIMUM_VALVE_DROP = 1e6;

    private final double minimumValveDrop;
    private final List<ValveSettingTable> tables;
    private final NetworkSolver solver;

    private Balancing(double minimumValveDrop, List<ValveSettingTable> tables, NetworkSolver solver) {
        if (!(minimumValveDrop >= 0) || minimumValveDrop > MAX_MINIMUM_VALVE_DROP) {
            throw new InputException(
                    "minimum valve drop",
                    "must be a pressure from 0 to " + MAX_MINIMUM_VALVE_DROP + " Pa, got " + minimumValveDrop + " Pa");
        }
        this.minimumValveDrop = minimumValveDrop;
        this.tables = List.copyOf(tables);
        this.solver = solver;
    }

    /** Balancing with the default minimum valve drop, no setting tables and the standard solver. */
    public static Balancing standard() {
        return new Balancing(DEFAULT_MINIMUM_VALVE_DROP, List.of(), NetworkSolver.standard());
    }

    /** The same with another minimum valve drop (Pa, ≥ 0). */
    public Balancing withMinimumValveDrop(double pressureDrop) {
        return new Balancing(pressureDrop, tables, solver);
    }

    /** The same with tables of K_v against setting (at most one per valve and one for all). */
    public Balancing withSettingTables(List<ValveSettingTable> settingTables) {
        Set<String> seen = new HashSet<>();
        for (ValveSettingTable t : settingTables) {
            if (!seen.add(t.valve())) {
                throw new InputException(
                        t.source(),
                        t.appliesToAll()
                                ? "two tables apply to all valves; give at most one without a valve name"
                                : "two tables are given for valve " + t.valve());
            }
        }
        return new Balancing(minimumValveDrop, settingTables, solver);
    }

    /** The same with another network solver. */
    public Balancing withSolver(NetworkSolver networkSolver) {
        return new Balancing(minimumValveDrop, tables, networkSolver);
    }

    /** The least drop allowed across a balancing valve at design flow (Pa). */
    public double minimumValveDrop() {
        return minimumValveDrop;
    }

    /** Whether a link is balanced: a K_v/C_v valve with a design flow. */
    public static boolean isBalanced(Link link) {
        return link.element() instanceof FlowCoefficientValve && link.hasDesignFlow();
    }

    /**
     * Balances the network.
     *
     * @throws InputException when no valve has a design flow, or when the held flows leave a node's
     *     head undetermined (two balanced valves in series, or one alone feeding a dead end)
     */
    public BalancingResult balance(Network network) {
        FlowContext ctx = network.context();
        double rhoG = ctx.fluid().density() * Gravity.STANDARD;
        List<Link> links = network.links();
        List<Integer> balanced = new ArrayList<>();
        for (int k = 0; k < links.size(); k++) {
            if (isBalanced(links.get(k))) {
                balanced.add(k);
            }
        }
        if (balanced.isEmpty()) {
            throw new InputException(
                    "balancing",
                    "no valve link (kind valve, by kv or cv) has a design_flow; give the design flow of each valve"
                            + " to balance");
        }
        Set<Integer> held = new HashSet<>(balanced);
        Network heldNetwork = heldFlowNetwork(network, held);
        requireHeadsDetermined(network, heldNetwork, held);
        List<Caution> cautions = new ArrayList<>();
        cautions.add(Caution.warning(
                "balancing-commissioning",
                "balancing Kv values and settings are calculated for the design flows on the modelled pipework"
                        + " and components; set the valves and then measure and adjust every flow at commissioning,"
                        + " since makers' setting tables are nominal and the installed system differs from the model",
                "common practice, no source"));
        NetworkResult r = solver.solve(heldNetwork);
        int solves = 1;
        if (!r.converged()) {
            cautions.add(Caution.serious(
                    "balancing-not-converged",
                    "the solve with every balanced valve at its design flow did not converge; no Kv values are given",
                    "solver"));
            cautions.addAll(r.cautions());
            return new BalancingResult(
                    List.of(),
                    minimumValveDrop,
                    Optional.empty(),
                    Double.NaN,
                    Optional.empty(),
                    "",
                    Double.NaN,
                    Double.NaN,
                    solves,
                    false,
                    cautions);
        }
        Map<String, Double> heads = new HashMap<>();
        for (NetworkResult.NodeResult n : r.nodes()) {
            heads.put(n.id(), n.head());
        }
        Series series = new Series(network, held);
        double requiredMinimum = minimumValveDrop / rhoG;
        List<BalancingResult.BalancedValve> valves = new ArrayList<>();
        String index = null;
        double indexSpare = Double.POSITIVE_INFINITY;
        Set<String> tableUsed = new HashSet<>();
        for (int k : balanced) {
            Link link = links.get(k);
            FlowCoefficientValve valve = (FlowCoefficientValve) link.element();
            double q = link.designFlow();
            double drop = heads.get(link.from()) - heads.get(link.to());
            double open = valve.headLoss(q, ctx);
            boolean reached = drop > 0 && drop >= open - REACH_TOLERANCE;
            double kv = reached ? FlowCoefficientValve.flowCoefficientFor(q, drop) : Double.NaN;
            double extra = reached ? 0 : open - drop;
            String supply = series.end(series.index(link.from()), k);
            String ret = series.end(series.index(link.to()), k);
            double differential = heads.get(supply) - heads.get(ret);
            double authority = reached && differential > 0 ? drop / differential : Double.NaN;
            double spare = drop - Math.max(requiredMinimum, open);
            if (spare < indexSpare) {
                indexSpare = spare;
                index = link.id();
            }
            double setting = Double.NaN;
            if (reached) {
                ValveSettingTable table = tableFor(link);
                if (table != null) {
                    tableUsed.add(table.valve());
                    OptionalDouble s = table.settingFor(kv);
                    if (s.isPresent()) {
                        setting = s.getAsDouble();
                    } else {
                        cautions.add(Caution.warning(
                                        "kv-outside-setting-table",
                                        String.format(
                                                Locale.ROOT,
                                                "the Kv %.4g m³/h it needs lies outside its setting table (Kv %.4g to"
                                                        + " %.4g, %s); no setting is given: choose another valve size",
                                                kv,
                                                table.minimumFlowCoefficient(),
                                                table.maximumFlowCoefficient(),
                                                table.source()),
                                        "valve settings table")
                                .about(link.id()));
                    }
                }
            }
            if (!reached) {
                cautions.add(Caution.serious(
                                "branch-short",
                                String.format(
                                        Locale.ROOT,
                                        "cannot carry its design flow of %.4g L/s even fully open (Kv %.4g m³/h): its"
                                                + " branch %s → %s needs %.4g m (%.4g kPa) more head; the other valves'"
                                                + " Kv values assume the branch gets it",
                                        q * 1000,
                                        valve.flowCoefficient(),
                                        supply,
                                        ret,
                                        extra,
                                        extra * rhoG / 1000),
                                "network solve with the design flows held")
                        .about(link.id()));
            } else if (drop * rhoG < minimumValveDrop) {
                cautions.add(Caution.warning(
                                "valve-drop-below-minimum",
                                String.format(
                                        Locale.ROOT,
                                        "drops only %.3g kPa at design flow, less than the %.3g kPa minimum for a"
                                                + " reliable flow measurement; the source head needs raising (see the"
                                                + " index valve) or a smaller valve",
                                        drop * rhoG / 1000,
                                        minimumValveDrop / 1000),
                                "common practice, no source")
                        .about(link.id()));
            }
            valves.add(new BalancingResult.BalancedValve(
                    link.id(),
                    link.from(),
                    link.to(),
                    q,
                    valve.flowCoefficient(),
                    drop,
                    drop * rhoG,
                    kv,
                    reached,
                    extra,
                    supply,
                    ret,
                    differential,
                    authority,
                    setting));
        }
        for (ValveSettingTable t : tables) {
            if (!tableUsed.contains(t.valve()) && !t.appliesToAll()) {
                cautions.add(Caution.note(
                        "setting-table-unused",
                        "the setting table for \"" + t.valve() + "\" (" + t.source()
                                + ") names no balanced valve by id or name",
                        "valve settings table"));
            }
        }
        // The single source, if there is one.
        List<String> suppliers = new ArrayList<>();
        for (NetworkResult.NodeResult n : r.nodes()) {
            Node node = network.nodes().get(series.index(n.id()));
            if (node.kind() == Node.Kind.FIXED_HEAD && n.demand() < -NetworkSolver.CONTINUITY_TOLERANCE) {
                suppliers.add(n.id());
            }
        }
        List<NetworkResult.LinkResult> pumps = r.links().stream()
                .filter(l -> l.kind().equals("pump") && l.status().equals("open") && l.flow() > 0)
                .toList();
        Optional<String> source = Optional.empty();
        String sourceKind = "";
        double headNeeded = Double.NaN;
        if (pumps.isEmpty() && suppliers.size() == 1) {
            source = Optional.of(suppliers.get(0));
            sourceKind = "fixed-head";
            headNeeded = heads.get(suppliers.get(0)) - indexSpare;
            Network moved = withFixedHead(heldNetwork, suppliers.get(0), headNeeded);
            NetworkResult check = solver.solve(moved);
            solves++;
            String indexId = index;
            Link il = network.links().stream()
                    .filter(l -> l.id().equals(indexId))
                    .findFirst()
                    .orElseThrow();
            double required = requiredDrop(il, requiredMinimum, ctx);
            double miss = check.converged()
                    ? check.node(il.from()).orElseThrow().head()
                            - check.node(il.to()).orElseThrow().head()
                            - required
                    : Double.NaN;
            if (!(Math.abs(miss) <= SOURCE_CHECK_TOLERANCE)) {
                cautions.add(Caution.warning(
                        "source-head-approximate",
                        String.format(
                                Locale.ROOT,
                                "with %s at the source head needed the index valve %s drops %.4g m more than it"
                                        + " needs: other fixed heads or loops share the change, so the figure is an"
                                        + " estimate",
                                suppliers.get(0),
                                il.id(),
                                miss),
                        "network solve at the source head needed"));
            }
        } else if (suppliers.isEmpty() && pumps.size() == 1) {
            NetworkResult.LinkResult p = pumps.get(0);
            source = Optional.of(p.id());
            sourceKind = "pump";
            headNeeded = -p.headLoss() - indexSpare;
        } else {
            cautions.add(Caution.note(
                    "no-single-source",
                    String.format(
                            Locale.ROOT,
                            "the network has %d supplying fixed-head node(s) and %d running pump(s), so no single"
                                    + " source head is given; the index valve %s has %.4g m of spare head",
                            suppliers.size(),
                            pumps.size(),
                            index,
                            indexSpare),
                    "balancing"));
        }
        double largestError = Double.NaN;
        if (valves.stream().allMatch(BalancingResult.BalancedValve::reached)) {
            List<Link> set = new ArrayList<>(links);
            Map<String, BalancingResult.BalancedValve> byId = new LinkedHashMap<>();
            for (BalancingResult.BalancedValve v : valves) {
                byId.put(v.id(), v);
            }
            for (int k : balanced) {
                Link l = links.get(k);
                BalancingResult.BalancedValve v = byId.get(l.id());
                set.set(
                        k,
                        new Link(
                                FlowCoefficientValve.ofKv(l.id(), l.element().name(), v.flowCoefficient()),
                                l.from(),
                                l.to(),
                                l.designFlow()));
            }
            NetworkResult check = solver.solve(network.withLinks(set));
            solves++;
            if (check.converged()) {
                largestError = 0;
                for (BalancingResult.BalancedValve v : valves) {
                    double q = check.link(v.id()).orElseThrow().flow();
                    largestError = Math.max(largestError, Math.abs(q - v.designFlow()) / v.designFlow());
                }
            } else {
                cautions.add(Caution.serious(
                        "balancing-check-failed",
                        "the network with the balancing Kv values did not converge, so the design flows could not be"
                                + " confirmed",
                        "solver"));
            }
        } else {
            cautions.add(Caution.note(
                    "balancing-check-skipped",
                    "with a short branch the Kv values cannot all be set, so the re-solve check is not made",
                    "balancing"));
        }
        return new BalancingResult(
                valves,
                minimumValveDrop,
                Optional.ofNullable(index),
                indexSpare,
                source,
                sourceKind,
                headNeeded,
                largestError,
                solves,
                true,
                cautions);
    }

    private static double requiredDrop(Link link, double requiredMinimum, FlowContext ctx) {
        return Math.max(requiredMinimum, link.element().headLoss(link.designFlow(), ctx));
    }

    private ValveSettingTable tableFor(Link link) {
        ValveSettingTable all = null;
        ValveSettingTable byName = null;
        for (ValveSettingTable t : tables) {
            if (t.valve().equals(link.id())) {
                return t;
            }
            if (t.valve().equals(link.element().name())) {
                byName = t;
            }
            if (t.appliesToAll()) {
                all = t;
            }
        }
        return byName != null ? byName : all;
    }

    /** The network with each balanced valve replaced by its design flow taken out at from and put in at to. */
    static Network heldFlowNetwork(Network network, Set<Integer> held) {
        Map<String, List<Node.Demand>> added = new HashMap<>();
        List<Link> kept = new ArrayList<>();
        for (int k = 0; k < network.links().size(); k++) {
            Link l = network.links().get(k);
            if (!held.contains(k)) {
                kept.add(l);
                continue;
            }
            added.computeIfAbsent(l.from(), x -> new ArrayList<>())
                    .add(new Node.Demand("held flow of " + l.id(), l.designFlow()));
            added.computeIfAbsent(l.to(), x -> new ArrayList<>())
                    .add(new Node.Demand("held flow of " + l.id(), -l.designFlow()));
        }
        List<Node> nodes = new ArrayList<>(network.nodes().size());
        for (Node n : network.nodes()) {
            List<Node.Demand> extra = added.get(n.id());
            if (extra == null || n.headIsFixed()) {
                // A fixed-head node supplies or absorbs the held flow itself.
                nodes.add(n);
            } else {
                List<Node.Demand> all = new ArrayList<>(n.demands());
                all.addAll(extra);
                nodes.add(n.withDemands(all));
            }
        }
        return new Network(network.title(), network.context(), nodes, kept, network.site());
    }

    private static Network withFixedHead(Network network, String id, double head) {
        List<Node> nodes = new ArrayList<>();
        for (Node n : network.nodes()) {
            nodes.add(
                    n.id().equals(id)
                            ? new Node(
                                    n.id(),
                                    n.name(),
                                    n.kind(),
                                    n.elevation(),
                                    n.demands(),
                                    OptionalDouble.of(head),
                                    n.x(),
                                    n.y())
                            : n);
        }
        return network.withNodes(nodes);
    }

    /** Every junction must still reach a fixed head through links that are not held or closed. */
    private static void requireHeadsDetermined(Network network, Network heldNetwork, Set<Integer> held) {
        Map<String, Integer> index = heldNetwork.nodeIndex();
        int n = heldNetwork.nodes().size();
        List<List<Integer>> adjacent = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            adjacent.add(new ArrayList<>(2));
        }
        for (Link l : heldNetwork.links()) {
            if (l.element().isClosed()) {
                continue;
            }
            int a = index.get(l.from());
            int b = index.get(l.to());
            adjacent.get(a).add(b);
            adjacent.get(b).add(a);
        }
        boolean[] reached = new boolean[n];
        int[] queue = new int[n];
        int tail = 0;
        for (int i = 0; i < n; i++) {
            if (heldNetwork.nodes().get(i).headIsFixed()) {
                reached[i] = true;
                queue[tail++] = i;
            }
        }
        for (int head = 0; head < tail; head++) {
            for (int j : adjacent.get(queue[head])) {
                if (!reached[j]) {
                    reached[j] = true;
                    queue[tail++] = j;
                }
            }
        }
        List<String> cut = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (!reached[i]) {
                cut.add(heldNetwork.nodes().get(i).id());
            }
        }
        if (!cut.isEmpty()) {
            List<String> valves = new ArrayList<>();
            Set<String> cutSet = new HashSet<>(cut);
            for (int k : held) {
                Link l = network.links().get(k);
                if (cutSet.contains(l.from()) || cutSet.contains(l.to())) {
                    valves.add(l.id());
                }
            }
            throw new InputException(
                    "balancing",
                    "with the valves " + String.join(", ", valves.subList(0, Math.min(10, valves.size())))
                            + " held at their design flows, node(s) "
                            + String.join(", ", cut.subList(0, Math.min(10, cut.size())))
                            + (cut.size() > 10 ? ", …" : "")
                            + " are joined to no fixed head except through them, so their drops are not"
                            + " determined (two balanced valves in series, or one alone feeding a dead end): give a"
                            + " design_flow to only one valve of each series path");
        }
    }

    /** Walks series chains: junctions without demand and with exactly two links that are not closed. */
    private static final class Series {
        final Network network;
        final Set<Integer> held;
        final Map<String, Integer> index;
        final List<List<Integer>> linksAt;

        Series(Network network, Set<Integer> held) {
            this.network = network;
            this.held = held;
            this.index = network.nodeIndex();
            int n = network.nodes().size();
            linksAt = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                linksAt.add(new ArrayList<>(2));
            }
            for (int k = 0; k < network.links().size(); k++) {
                Link l = network.links().get(k);
                if (l.element().isClosed()) {
                    continue;
                }
                linksAt.get(index.get(l.from())).add(k);
                linksAt.get(index.get(l.to())).add(k);
            }
        }

        int index(String id) {
            return index.get(id);
        }

        boolean passThrough(int node) {
            Node n = network.nodes().get(node);
            return !n.headIsFixed() && n.totalDemand() == 0 && linksAt.get(node).size() == 2;
        }

        /** The id of the node where the chain through {@code node}, entered by link {@code came}, ends. */
        String end(int node, int came) {
            Set<Integer> visited = new HashSet<>();
            int at = node;
            int link = came;
            while (passThrough(at) && visited.add(at)) {
                List<Integer> here = linksAt.get(at);
                int next = here.get(0) == link ? here.get(1) : here.get(0);
                if (held.contains(next)) {
                    break;
                }
                Link l = network.links().get(next);
                at = index.get(l.from()) == at ? index.get(l.to()) : index.get(l.from());
                link = next;
            }
            return network.nodes().get(at).id();
        }
    }
}
