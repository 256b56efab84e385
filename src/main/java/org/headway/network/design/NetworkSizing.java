package org.headway.network.design;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.network.IndexCircuit;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.system.FlowContext;
import org.headway.system.Segment;
import org.headway.system.SizeSelector.CandidateSize;

/**
 * Sizes the pipes of a network: each pipe given a list of candidate sizes (its material's size table
 * in its schedule) gets the smallest that keeps its velocity and its friction gradient (friction loss
 * per 100 m) within the limits at its flow; the sized network is then checked against a head budget
 * on its index circuit.
 *
 * <p><b>Rounds.</b> In a tree fed from one source the pipe flows are fixed by the demands, so one
 * solve gives every pipe's flow and one choice per pipe is final; a second round confirms it. In a
 * looped network, or with pumps, the flows depend on the sizes, so the network is solved, every pipe
 * re-chosen at its new flow, and this repeated until a round changes no size: the sizes then meet the
 * limits at the flows they themselves produce. After {@value #FREE_ROUNDS} rounds without settling
 * (flows shifting round a loop from one round to the next) sizes may only grow, which must end since
 * the lists are finite; pipes held larger that way are marked and cautioned.
 *
 * <p><b>Head budget.</b> The loss along the index circuit (the highest source-to-terminal loss, see
 * {@link IndexCircuit}) must not exceed the budget. If it does, the sized pipe on the index circuit
 * with the largest loss is made one size larger and the network solved again, until the budget is met
 * or no pipe on the circuit can grow (a greedy step, common practice in hand sizing, no source; it is
 * not a least-cost optimisation).
 *
 * <p>Velocity and gradient are checked to a relative 10⁻¹² so that a limit met exactly is met.
 */
public final class NetworkSizing {

    /** Rounds in which sizes may grow or shrink freely. */
    public static final int FREE_ROUNDS = 10;

    /** Rounds in all before giving up settling. */
    public static final int MAX_ROUNDS = 40;

    /** Relative slack on the limits. */
    static final double SLACK = 1e-12;

    /**
     * The limits to size to.
     *
     * @param maximumVelocity largest mean velocity (m/s)
     * @param maximumGradient largest friction loss per 100 m of pipe (m)
     * @param headBudget largest loss from a source to any terminal (m); {@code
     *     Double.POSITIVE_INFINITY} for none
     * @param minimumDiameter smallest inner diameter allowed (m), 0 for none: the owner's least main or
     *     branch size, which keeps a loop-closing pipe that carries little flow from being sized to the
     *     smallest size in the table
     */
    public record Limits(double maximumVelocity, double maximumGradient, double headBudget, double minimumDiameter) {

        /** Limits without a least diameter. */
        public Limits(double maximumVelocity, double maximumGradient, double headBudget) {
            this(maximumVelocity, maximumGradient, headBudget, 0);
        }

        public Limits {
            if (!(minimumDiameter >= 0) || Double.isInfinite(minimumDiameter)) {
                throw new InputException("--min-diameter", "must be a diameter of 0 or more, got " + minimumDiameter);
            }
            if (!(maximumVelocity > 0)) {
                throw new InputException("--max-velocity", "must be a velocity above zero, got " + maximumVelocity);
            }
            if (!(maximumGradient > 0)) {
                throw new InputException(
                        "--max-gradient", "must be a head loss per 100 m above zero, got " + maximumGradient);
            }
            if (!(headBudget > 0)) {
                throw new InputException("--head-budget", "must be a head above zero, got " + headBudget);
            }
        }
    }

    private final NetworkSolver solver;

    private NetworkSizing(NetworkSolver solver) {
        this.solver = solver;
    }

    /** Sizing with the standard network solver. */
    public static NetworkSizing standard() {
        return new NetworkSizing(NetworkSolver.standard());
    }

    /** The same with another solver. */
    public NetworkSizing withSolver(NetworkSolver networkSolver) {
        return new NetworkSizing(networkSolver);
    }

    /**
     * Sizes the pipes that have candidates.
     *
     * @param network the network with its given sizes
     * @param candidates candidate sizes by link id (any order); links not named keep their size
     * @param limits the limits
     * @throws InputException for a candidate list naming a link that is not a pipe, or an empty list
     */
    public NetworkSizingResult size(Network network, Map<String, List<CandidateSize>> candidates, Limits limits) {
        List<Link> links = network.links();
        int n = links.size();
        FlowContext context = network.context();
        List<Integer> sizedLinks = new ArrayList<>();
        List<List<CandidateSize>> lists = new ArrayList<>();
        Set<String> known = new HashSet<>();
        for (int i = 0; i < n; i++) {
            Link l = links.get(i);
            known.add(l.id());
            List<CandidateSize> c = candidates.get(l.id());
            if (c == null) {
                continue;
            }
            if (!(l.element() instanceof Segment)) {
                throw new InputException(
                        "sizing " + l.id(), "link \"" + l.id() + "\" is a " + l.kind() + ", only pipes are sized");
            }
            if (c.isEmpty()) {
                throw new InputException("sizing " + l.id(), "no candidate sizes for pipe \"" + l.id() + "\"");
            }
            Segment s = (Segment) l.element();
            List<CandidateSize> sorted = new ArrayList<>();
            for (CandidateSize size : c) {
                // A bore at or below the roughness cannot be built (Segment refuses it).
                if (size.innerDiameter() > s.roughnessHigh()) {
                    sorted.add(size);
                }
            }
            sorted.sort(Comparator.comparingDouble(CandidateSize::innerDiameter));
            if (sorted.isEmpty()) {
                throw new InputException("sizing " + l.id(), "no candidate size is larger than the pipe's roughness");
            }
            sizedLinks.add(i);
            lists.add(sorted);
        }
        for (String id : candidates.keySet()) {
            if (!known.contains(id)) {
                throw new InputException(
                        "sizing", "candidate sizes name link \"" + id + "\", which is not in the network");
            }
        }
        List<Caution> cautions = new ArrayList<>();
        cautions.add(Caution.warning(
                "network-sizing-basis",
                String.format(
                        Locale.ROOT,
                        "pipes sized to a velocity of at most %.3g m/s and a friction loss of at most %.3g m per 100 m"
                                + " at the modelled demands; the limits are the engineer's (common practice, no"
                                + " single source): check them against the owner's standard, noise, erosion, water"
                                + " hammer and surge, and local codes",
                        limits.maximumVelocity(),
                        limits.maximumGradient()),
                "common practice, no source"));
        int m = sizedLinks.size();
        int[] choice = new int[m];
        Network current = network;
        NetworkResult solved = null;
        boolean settled = false;
        int rounds = 0;
        int solves = 0;
        boolean[] held = new boolean[m];
        boolean unconverged = false;
        while (rounds < MAX_ROUNDS) {
            rounds++;
            solved = solver.solve(current);
            solves++;
            unconverged |= !solved.converged();
            int[] next = new int[m];
            for (int k = 0; k < m; k++) {
                Segment s = (Segment) links.get(sizedLinks.get(k)).element();
                double q = Math.abs(solved.links().get(sizedLinks.get(k)).flow());
                next[k] = smallestMeeting(s, lists.get(k), q, limits, context);
                if (rounds > FREE_ROUNDS && next[k] < choice[k]) {
                    next[k] = choice[k];
                    held[k] = true;
                }
            }
            if (rounds > 1 && Arrays.equals(next, choice)) {
                settled = true;
                break;
            }
            choice = next;
            current = apply(network, sizedLinks, lists, choice);
        }
        if (!settled) {
            // The last choice was applied but not solved.
            solved = solver.solve(current);
            solves++;
            cautions.add(Caution.serious(
                    "network-sizing-unsettled",
                    "sizes still changed after " + MAX_ROUNDS + " rounds; the last sizes are reported, solved once"
                            + " more, and need the engineer's review",
                    "network sizing"));
        }
        // Head budget along the index circuit.
        boolean[] budgetGrown = new boolean[m];
        IndexCircuit circuit = IndexCircuit.of(current, solved);
        Optional<IndexCircuit.TerminalPath> index = circuit.index();
        boolean withinBudget = index.isEmpty() || index.get().headLoss() <= limits.headBudget() * (1 + SLACK);
        int position[] = new int[n];
        Arrays.fill(position, -1);
        for (int k = 0; k < m; k++) {
            position[sizedLinks.get(k)] = k;
        }
        java.util.Map<String, Integer> linkIndex = new java.util.HashMap<>();
        for (int i = 0; i < n; i++) {
            linkIndex.put(links.get(i).id(), i);
        }
        while (!withinBudget) {
            int best = -1;
            double bestLoss = -1;
            for (String id : index.get().links()) {
                int k = position[linkIndex.get(id)];
                if (k < 0 || choice[k] == lists.get(k).size() - 1) {
                    continue;
                }
                double loss = Math.abs(solved.links().get(sizedLinks.get(k)).headLoss());
                if (loss > bestLoss) {
                    bestLoss = loss;
                    best = k;
                }
            }
            if (best < 0) {
                break;
            }
            choice[best]++;
            budgetGrown[best] = true;
            current = apply(network, sizedLinks, lists, choice);
            solved = solver.solve(current);
            solves++;
            unconverged |= !solved.converged();
            circuit = IndexCircuit.of(current, solved);
            index = circuit.index();
            withinBudget = index.isEmpty() || index.get().headLoss() <= limits.headBudget() * (1 + SLACK);
        }
        if (!withinBudget) {
            cautions.add(Caution.serious(
                    "network-sizing-over-budget",
                    String.format(
                            Locale.ROOT,
                            "the index circuit to %s loses %.4g m, above the head budget of %.4g m, with every sized"
                                    + " pipe on it at its largest candidate: the budget cannot be met by pipe size"
                                    + " alone",
                            index.get().terminal(),
                            index.get().headLoss(),
                            limits.headBudget()),
                    "network sizing"));
        }
        if (unconverged) {
            cautions.add(Caution.serious(
                    "network-sizing-unconverged",
                    "a network solve during sizing did not converge; sizes chosen from its best iterate need review",
                    "network solver"));
        }
        List<NetworkSizingResult.LinkSizing> out = new ArrayList<>();
        List<String> failing = new ArrayList<>();
        List<String> heldIds = new ArrayList<>();
        for (int k = 0; k < m; k++) {
            int i = sizedLinks.get(k);
            Segment given = (Segment) links.get(i).element();
            List<CandidateSize> list = lists.get(k);
            double q = solved.links().get(i).flow();
            List<NetworkSizingResult.CandidateCheck> checks = new ArrayList<>();
            for (CandidateSize size : list) {
                checks.add(check(given, size, Math.abs(q), limits, context));
            }
            NetworkSizingResult.CandidateCheck chosen = checks.get(choice[k]);
            NetworkSizingResult.Basis basis;
            if (budgetGrown[k]) {
                basis = NetworkSizingResult.Basis.HEAD_BUDGET;
            } else if (!chosen.accepted()) {
                basis = NetworkSizingResult.Basis.NONE_MEETS_LIMITS;
                failing.add(given.id());
            } else if (held[k] && choice[k] > 0 && checks.get(choice[k] - 1).accepted()) {
                basis = NetworkSizingResult.Basis.HELD;
                heldIds.add(given.id());
            } else {
                basis = NetworkSizingResult.Basis.SMALLEST_MEETING_LIMITS;
            }
            out.add(new NetworkSizingResult.LinkSizing(
                    given.id(),
                    givenLabel(given, list),
                    given.innerDiameter(),
                    chosen.size(),
                    chosen.innerDiameter(),
                    q,
                    chosen.velocity(),
                    chosen.gradient(),
                    chosen.accepted(),
                    basis,
                    checks));
        }
        if (!failing.isEmpty()) {
            cautions.add(Caution.serious(
                    "network-sizing-no-size",
                    "no candidate size meets the limits for " + failing.size() + " pipe(s): " + names(failing)
                            + "; the largest size is kept: give a larger size table, another schedule or material, or"
                            + " split the flow",
                    "network sizing"));
        }
        if (!heldIds.isEmpty()) {
            cautions.add(Caution.warning(
                    "network-sizing-held",
                    "loop flows kept shifting between rounds, so sizes were held from shrinking after " + FREE_ROUNDS
                            + " rounds; " + heldIds.size() + " pipe(s) are a size larger than their flow needs: "
                            + names(heldIds),
                    "network sizing"));
        }
        return new NetworkSizingResult(
                limits.maximumVelocity(),
                limits.maximumGradient(),
                limits.headBudget(),
                settled,
                rounds,
                solves,
                out,
                current,
                solved,
                index,
                withinBudget,
                cautions);
    }

    private static String names(List<String> ids) {
        int shown = Math.min(ids.size(), 10);
        String s = String.join(", ", ids.subList(0, shown));
        return ids.size() > shown ? s + " and " + (ids.size() - shown) + " more" : s;
    }

    /** Index of the smallest candidate meeting both limits at a flow, else the largest. */
    static int smallestMeeting(
            Segment pipe, List<CandidateSize> sizes, double flow, Limits limits, FlowContext context) {
        for (int j = 0; j < sizes.size(); j++) {
            if (check(pipe, sizes.get(j), flow, limits, context).accepted()) {
                return j;
            }
        }
        return sizes.size() - 1;
    }

    static NetworkSizingResult.CandidateCheck check(
            Segment pipe, CandidateSize size, double flow, Limits limits, FlowContext context) {
        double d = size.innerDiameter();
        double velocity = flow / (Math.PI * d * d / 4);
        Segment trial = resized(pipe, size);
        double gradient = pipe.length() > 0 ? trial.flowAt(flow, context).majorHeadLoss() / pipe.length() * 100 : 0;
        List<String> reasons = new ArrayList<>();
        if (d < limits.minimumDiameter() * (1 - SLACK)) {
            reasons.add(String.format(
                    Locale.ROOT, "bore %.4g mm below the least %.4g mm", d * 1000, limits.minimumDiameter() * 1000));
        }
        if (velocity > limits.maximumVelocity() * (1 + SLACK)) {
            reasons.add(
                    String.format(Locale.ROOT, "velocity %.3g m/s above %.3g m/s", velocity, limits.maximumVelocity()));
        }
        if (gradient > limits.maximumGradient() * (1 + SLACK)) {
            reasons.add(String.format(
                    Locale.ROOT, "friction loss %.3g m per 100 m above %.3g m", gradient, limits.maximumGradient()));
        }
        return new NetworkSizingResult.CandidateCheck(size.label(), d, velocity, gradient, reasons.isEmpty(), reasons);
    }

    private static Segment resized(Segment pipe, CandidateSize size) {
        double low = Math.min(pipe.roughnessLow(), pipe.roughness());
        double high = Math.min(pipe.roughnessHigh(), size.innerDiameter() * 0.999);
        return pipe.withPipe(
                size.innerDiameter(),
                Math.min(pipe.roughness(), high),
                Math.min(low, high),
                high,
                size.label(),
                size.nominalDiameter());
    }

    private static Network apply(
            Network network, List<Integer> sizedLinks, List<List<CandidateSize>> lists, int[] choice) {
        List<Link> links = new ArrayList<>(network.links());
        for (int k = 0; k < sizedLinks.size(); k++) {
            int i = sizedLinks.get(k);
            Link l = links.get(i);
            Segment s = (Segment) l.element();
            links.set(i, new Link(resized(s, lists.get(k).get(choice[k])), l.from(), l.to(), l.designFlow()));
        }
        return network.withLinks(links);
    }

    private static String givenLabel(Segment given, List<CandidateSize> list) {
        for (CandidateSize c : list) {
            if (Math.abs(c.innerDiameter() - given.innerDiameter()) <= 1e-9) {
                return c.label();
            }
        }
        return String.format(Locale.ROOT, "bore %.1f mm", given.innerDiameter() * 1000);
    }
}
