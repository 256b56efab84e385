package org.headway.network.design;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.Node;
import org.headway.system.FlowControlValve;
import org.headway.system.Gravity;
import org.headway.system.PressureControlValve;

/**
 * The fire flow available at a junction: the largest extra demand Q_f there for which every junction
 * of the network — the fire-flow junction included — keeps at least a residual gauge pressure P.
 * Fixed-head and reference nodes are not junctions and are not checked.
 *
 * <p>This is the residual-pressure criterion of fire-flow analysis (AWWA Manual M31, Distribution
 * System Requirements for Fire Protection, 4th ed., 2008): the fire flow is the flow the system
 * delivers while the pressure in the distribution system stays at or above a stated residual
 * pressure, commonly 20 psi (about 140 kPa) (the 20 psi figure from memory). The authority having
 * jurisdiction sets the required flow, its duration and the residual pressure.
 *
 * <p><b>Search.</b> m(Q_f) = min over junctions of (H_j − z_j) − P/(ρ g), in metres of head, each
 * value from a network solve with Q_f added to the junction's demands. For networks of pipes,
 * passive components and pumps with falling curves, and without control valves, m falls
 * monotonically as Q_f grows (more outflow lowers every head: common practice, no source), so it
 * has one root. From m(0) the trial flow starts at {@value #FIRST_TRIAL} m³/s and doubles until m is
 * negative (at most {@value #MAX_EXTRA_FLOW} m³/s), then a safeguarded bracketing root finder
 * (Brent's method with higher-order inverse interpolation, Commons Math's {@code
 * BracketingNthOrderBrentSolver}; R. P. Brent, Algorithms for Minimization without Derivatives,
 * Prentice-Hall, 1973, ch. 4) closes the bracket until both ends are within {@value
 * #HEAD_ACCURACY} m of the residual head, and the end on the safe side (m ≥ 0) is returned: the
 * limiting junction is at P to within 10⁻⁶ m of head (about 0.01 Pa), above it, never below. With
 * control valves in the network the function may not be monotone; a caution says so.
 *
 * <p>If m(0) &lt; 0 — the base demands alone break the residual pressure — the fire flow is 0 and a
 * serious caution says so.
 */
public final class FireFlow {

    /** Head accuracy of the limiting junction at the residual pressure (m). */
    public static final double HEAD_ACCURACY = 1e-6;

    /** First trial extra flow of the bracket (m³/s), 10 L/s. */
    public static final double FIRST_TRIAL = 0.01;

    /** Largest extra flow tried (m³/s): beyond any hydrant or main. */
    public static final double MAX_EXTRA_FLOW = 1e3;

    /** Solves allowed to the root search after the bracket. */
    public static final int MAX_ROOT_SOLVES = 60;

    /** The residual pressure often required, 20 psi (Pa): AWWA M31 (4th ed., 2008), the value from memory. */
    public static final double COMMON_RESIDUAL_PRESSURE = 20 * 6894.757293168361;

    /** Largest residual pressure accepted (Pa): 100 bar, far above any distribution system. */
    public static final double MAX_RESIDUAL_PRESSURE = 1e7;

    private final NetworkSolver solver;

    private FireFlow(NetworkSolver solver) {
        this.solver = solver;
    }

    /** The search with the standard network solver. */
    public static FireFlow standard() {
        return new FireFlow(NetworkSolver.standard());
    }

    /** The same with another network solver. */
    public FireFlow withSolver(NetworkSolver networkSolver) {
        return new FireFlow(networkSolver);
    }

    /** One solve of the network with an extra flow drawn at the fire-flow junction. */
    private record Trial(double extraFlow, boolean converged, double margin, String limiting, double pressure) {}

    /** A failed solve inside the root search. */
    private static final class SolveFailed extends RuntimeException {
        private static final long serialVersionUID = 1L;
        final double extraFlow;

        SolveFailed(double extraFlow) {
            super(null, null, false, false);
            this.extraFlow = extraFlow;
        }
    }

    /**
     * Searches the fire flow.
     *
     * @param network the network at its base demands
     * @param nodeId the junction the fire flow is drawn at
     * @param residualPressure the least gauge pressure every junction must keep (Pa), ≥ 0
     * @throws InputException for an unknown node, a node that is not a junction, or a bad pressure
     */
    public FireFlowResult search(Network network, String nodeId, double residualPressure) {
        Map<String, Integer> index = network.nodeIndex();
        Integer at = index.get(nodeId);
        if (at == null) {
            throw new InputException(
                    "fire flow node", "no node \"" + nodeId + "\" in the network (node ids are case-sensitive)");
        }
        Node fireNode = network.nodes().get(at);
        if (fireNode.headIsFixed()) {
            throw new InputException(
                    "fire flow node",
                    "node \"" + nodeId + "\" is a "
                            + (fireNode.kind() == Node.Kind.REFERENCE ? "pressure reference" : "fixed-head")
                            + " node; a fire flow is drawn at a junction");
        }
        if (!Double.isFinite(residualPressure) || residualPressure < 0) {
            throw new InputException(
                    "residual pressure", "must be a gauge pressure of 0 or more, got " + residualPressure + " Pa");
        }
        if (residualPressure > MAX_RESIDUAL_PRESSURE) {
            throw new InputException(
                    "residual pressure",
                    "value " + residualPressure + " Pa is beyond the plausible limit of " + MAX_RESIDUAL_PRESSURE
                            + " Pa; check the unit");
        }
        double rhoG = network.context().fluid().density() * Gravity.STANDARD;
        double residualHead = residualPressure / rhoG;
        List<Caution> cautions = new ArrayList<>();
        cautions.add(Caution.serious(
                "fire-flow-estimate",
                String.format(
                        Locale.ROOT,
                        "the fire flow at %s is an estimate from the network model at its base demands, drawn at the"
                                + " node itself (hydrant branch, hydrant and hose losses not included); the authority"
                                + " having jurisdiction and the local fire code govern the required fire flow, its"
                                + " duration and residual pressure: confirm it by a hydrant flow test and a qualified"
                                + " fire-protection review",
                        nodeId),
                "AWWA Manual M31, 4th ed. (2008); common practice"));
        if (residualPressure < COMMON_RESIDUAL_PRESSURE * (1 - 1e-3)) {
            cautions.add(Caution.warning(
                    "residual-below-common",
                    String.format(
                            Locale.ROOT,
                            "the residual pressure %.4g kPa is below the 20 psi (about 138 kPa) often required",
                            residualPressure / 1000),
                    "AWWA Manual M31, 4th ed. (2008), value from memory"));
        }
        boolean controlValves = network.links().stream()
                .map(Link::element)
                .anyMatch(e -> e instanceof FlowControlValve || e instanceof PressureControlValve);
        if (controlValves) {
            cautions.add(Caution.warning(
                    "fire-flow-control-valves",
                    "the network has control valves, so the least pressure need not fall steadily with the fire flow;"
                            + " the search finds one crossing of the residual pressure, which may not be the only one",
                    "fire-flow search"));
        }
        Map<Double, Trial> trials = new HashMap<>();
        int[] solves = {0};
        java.util.function.DoubleFunction<Trial> trial = q -> trials.computeIfAbsent(q, x -> {
            solves[0]++;
            return solve(network, at, x, residualHead, rhoG);
        });
        Trial base = trial.apply(0.0);
        if (!base.converged()) {
            return failed(nodeId, residualPressure, base, base, solves[0], cautions, "at the base demands");
        }
        if (base.margin() < 0) {
            cautions.add(Caution.serious(
                    "residual-broken-at-base",
                    String.format(
                            Locale.ROOT,
                            "even without a fire flow the pressure at %s is %.4g kPa, below the residual %.4g kPa: the"
                                    + " fire flow is 0 and the network cannot meet the criterion as modelled",
                            base.limiting(),
                            base.pressure() / 1000,
                            residualPressure / 1000),
                    "AWWA Manual M31, 4th ed. (2008), residual-pressure criterion"));
            return new FireFlowResult(
                    nodeId,
                    residualPressure,
                    true,
                    0,
                    base.limiting(),
                    base.pressure(),
                    base.pressure(),
                    base.limiting(),
                    solves[0],
                    cautions);
        }
        double lo = 0;
        double hi = FIRST_TRIAL;
        Trial high;
        while (true) {
            high = trial.apply(hi);
            if (!high.converged()) {
                return failed(
                        nodeId,
                        residualPressure,
                        base,
                        high,
                        solves[0],
                        cautions,
                        String.format(Locale.ROOT, "at a trial fire flow of %.4g L/s", hi * 1000));
            }
            if (high.margin() < 0) {
                break;
            }
            lo = hi;
            hi *= 2;
            if (hi > MAX_EXTRA_FLOW) {
                cautions.add(Caution.serious(
                        "fire-flow-unbounded",
                        String.format(
                                Locale.ROOT,
                                "every junction keeps the residual pressure up to %.4g m³/s of extra flow at %s; the"
                                        + " network as modelled sets no limit (is the node next to a fixed head with"
                                        + " little resistance?)",
                                lo,
                                nodeId),
                        "fire-flow search"));
                return new FireFlowResult(
                        nodeId,
                        residualPressure,
                        false,
                        Double.NaN,
                        "",
                        Double.NaN,
                        base.pressure(),
                        base.limiting(),
                        solves[0],
                        cautions);
            }
        }
        if (high.margin() == 0) {
            lo = hi;
        } else {
            BracketingNthOrderBrentSolver root = new BracketingNthOrderBrentSolver(1e-14, 1e-15, HEAD_ACCURACY, 5);
            try {
                lo = root.solve(
                        MAX_ROOT_SOLVES,
                        x -> {
                            Trial t = trial.apply(x);
                            if (!t.converged()) {
                                throw new SolveFailed(x);
                            }
                            return t.margin();
                        },
                        lo,
                        hi,
                        AllowedSolution.ABOVE_SIDE);
            } catch (SolveFailed e) {
                return failed(
                        nodeId,
                        residualPressure,
                        base,
                        trials.get(e.extraFlow),
                        solves[0],
                        cautions,
                        String.format(Locale.ROOT, "at a trial fire flow of %.4g L/s", e.extraFlow * 1000));
            } catch (TooManyEvaluationsException e) {
                cautions.add(Caution.serious(
                        "fire-flow-not-found",
                        "the root search did not close within " + MAX_ROOT_SOLVES + " solves",
                        "fire-flow search"));
                return new FireFlowResult(
                        nodeId,
                        residualPressure,
                        false,
                        Double.NaN,
                        "",
                        Double.NaN,
                        base.pressure(),
                        base.limiting(),
                        solves[0],
                        cautions);
            }
        }
        Trial end = trial.apply(lo);
        return new FireFlowResult(
                nodeId,
                residualPressure,
                true,
                lo,
                end.limiting(),
                end.pressure(),
                base.pressure(),
                base.limiting(),
                solves[0],
                cautions);
    }

    private static FireFlowResult failed(
            String nodeId,
            double residualPressure,
            Trial base,
            Trial bad,
            int solves,
            List<Caution> cautions,
            String where) {
        cautions.add(Caution.serious(
                "fire-flow-solve-failed",
                "the network solve did not converge " + where + ", so no fire flow is given",
                "network solver"));
        return new FireFlowResult(
                nodeId,
                residualPressure,
                false,
                Double.NaN,
                "",
                Double.NaN,
                base.converged() ? base.pressure() : Double.NaN,
                base.converged() ? base.limiting() : "",
                solves,
                cautions);
    }

    private Trial solve(Network network, int at, double extra, double residualHead, double rhoG) {
        Network drawn = network;
        if (extra != 0) {
            List<Node> nodes = new ArrayList<>(network.nodes());
            Node n = nodes.get(at);
            List<Node.Demand> demands = new ArrayList<>(n.demands());
            demands.add(new Node.Demand("fire flow", extra));
            nodes.set(at, n.withDemands(demands));
            drawn = network.withNodes(nodes);
        }
        NetworkResult r = solver.solve(drawn);
        if (!r.converged()) {
            return new Trial(extra, false, Double.NaN, "", Double.NaN);
        }
        double least = Double.POSITIVE_INFINITY;
        String limiting = "";
        for (NetworkResult.NodeResult n : r.nodes()) {
            if (n.fixed() || !Double.isFinite(n.head())) {
                continue;
            }
            double h = n.head() - n.elevation();
            if (h < least) {
                least = h;
                limiting = n.id();
            }
        }
        return new Trial(extra, true, least - residualHead, limiting, least * rhoG);
    }
}
