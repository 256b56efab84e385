package org.headway.app;

import java.nio.file.Path;
import java.util.List;
import org.headway.caution.InputException;
import org.headway.network.Network;
import org.headway.network.NetworkSolver;
import org.headway.network.NetworkStudy;
import org.headway.network.design.Balancing;
import org.headway.network.design.BalancingResult;
import org.headway.network.design.FireFlow;
import org.headway.network.design.FireFlowResult;
import org.headway.network.design.NetworkSizing;
import org.headway.network.design.NetworkSizingResult;
import org.headway.network.design.NetworkUncertainty;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.headway.project.ProjectResolver;
import org.headway.system.Gravity;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;

/**
 * The network workspace's design studies, plain work with no toolkit (run off the FX thread): demand
 * cases with the pressure-limits check, sizing, balancing and a fire-flow search, each on the line
 * list as the workspace holds it, read, resolved and run the way {@code headway network} runs them
 * (same reader, resolver, defaults and engine calls), so that the app and the command line agree.
 */
final class DesignStudies {

    /** Default velocity limit of sizing, the command line's: common practice for water services, no source. */
    static final String DEFAULT_MAX_VELOCITY = "1.5 m/s";

    /** Default friction-gradient limit, the command line's: common practice for water services, no source. */
    static final String DEFAULT_MAX_GRADIENT = "4 m/100m";

    /** Default least valve drop shown in the balancing field: the engine's {@code Balancing.standard()}. */
    static final String DEFAULT_MIN_VALVE_DROP = "3 kPa";

    private DesignStudies() {}

    /** What the workspace gives every study: its editor, the draft, the catalog and the project folder. */
    record Input(NetworkEditor editor, NetworkEditor.Draft draft, Catalog catalog, Path baseFolder) {}

    /** The demand cases solved, with the study that was solved. */
    record Cases(NetworkStudy study, NetworkStudy.Result result, long nanos) {}

    /** Sizing's answer and the pipes kept as given. */
    record Sizing(NetworkSizingResult result, List<String> notSized, long nanos) {}

    /** Balancing's answer. */
    record Balance(BalancingResult result, long nanos) {}

    /** The fire-flow search's answer. */
    record Fire(FireFlowResult result, long nanos) {}

    /** The pressure and pump-duty ranges of an uncertainty study, and how long it took. */
    record Spread(org.headway.network.design.NetworkUncertaintyResult result, long nanos) {}

    private static NetworkStudy study(Input in, Project project, NetworkSolution.Progress progress) {
        progress.at(0, 3, "Reading the line list");
        progress.at(1, 3, "Resolving nodes and links");
        return ProjectResolver.resolveNetworkStudy(project, in.catalog(), in.baseFolder());
    }

    private static void checkCancel() {
        if (Thread.currentThread().isInterrupted()) {
            throw new java.util.concurrent.CancellationException("cancelled");
        }
    }

    /**
     * Solves the network's own demands and every demand case of the project, checking the junction
     * pressures against the limits typed (blank: the project's own).
     *
     * @param minimumPressure least gauge pressure as typed, or blank
     * @param maximumPressure greatest gauge pressure as typed, or blank
     */
    static Cases cases(Input in, String minimumPressure, String maximumPressure, NetworkSolution.Progress progress) {
        long t0 = System.nanoTime();
        Project project = in.editor().project(in.draft());
        String min = blankToEmpty(minimumPressure);
        String max = blankToEmpty(maximumPressure);
        if (!min.isEmpty() || !max.isEmpty()) {
            if (!min.isEmpty()) {
                Quantities.parsePressure(min, "least pressure");
            }
            if (!max.isEmpty()) {
                Quantities.parsePressure(max, "greatest pressure");
            }
            project = project.withPressureLimits(new Project.PressureLimitsSpec(min, max));
        }
        NetworkStudy study = study(in, project, progress);
        checkCancel();
        progress.at(2, 3, "Solving the network's demands and " + study.cases().size() + " demand case(s)");
        NetworkStudy.Result result = study.solve(NetworkSolver.standard());
        progress.at(3, 3, "Solved");
        return new Cases(study, result, System.nanoTime() - t0);
    }

    /**
     * Sizes every catalog pipe (material and size, no bore of its own) as {@code network --size}
     * does.
     *
     * @param maxVelocity velocity limit as typed (blank: {@value #DEFAULT_MAX_VELOCITY})
     * @param maxGradient gradient limit as typed, per 100 m or a pressure per length (blank: {@value
     *     #DEFAULT_MAX_GRADIENT})
     * @param headBudget head budget as typed, blank for none
     * @param minDiameter least inner diameter as typed, blank for none
     */
    static Sizing sizing(
            Input in,
            String maxVelocity,
            String maxGradient,
            String headBudget,
            String minDiameter,
            NetworkSolution.Progress progress) {
        long t0 = System.nanoTime();
        Project project = in.editor().project(in.draft());
        String v = orDefault(maxVelocity, DEFAULT_MAX_VELOCITY);
        String g = orDefault(maxGradient, DEFAULT_MAX_GRADIENT);
        double velocity = Quantities.parse(v, QuantityKind.VELOCITY, "max velocity");
        ProjectResolver.NetworkSizingCandidates candidates =
                ProjectResolver.networkSizingCandidates(project.network().orElseThrow(), in.catalog());
        NetworkStudy study = study(in, project, progress);
        Network network = study.network();
        double gradient = gradient(g, network.context().fluid().density() * Gravity.STANDARD);
        double budget = blankToEmpty(headBudget).isEmpty()
                ? Double.POSITIVE_INFINITY
                : Quantities.parse(headBudget, QuantityKind.HEAD, "head budget");
        double dMin = blankToEmpty(minDiameter).isEmpty()
                ? 0
                : Quantities.parse(minDiameter, QuantityKind.DIAMETER, "least diameter");
        if (candidates.candidates().isEmpty()) {
            throw new InputException(
                    "sizing",
                    "no pipe link is given by a catalog material and size, so there is nothing to size (pipes"
                            + " with an explicit diameter keep it)");
        }
        checkCancel();
        progress.at(2, 3, "Sizing " + candidates.candidates().size() + " pipes");
        NetworkSizingResult sized = NetworkSizing.standard()
                .size(network, candidates.candidates(), new NetworkSizing.Limits(velocity, gradient, budget, dMin));
        progress.at(3, 3, "Sized");
        return new Sizing(sized, candidates.notSized(), System.nanoTime() - t0);
    }

    /**
     * Balances every valve with a design flow as {@code network --balance} does.
     *
     * @param minValveDrop least drop across the index valve as typed, blank for the engine's default
     */
    static Balance balancing(Input in, String minValveDrop, NetworkSolution.Progress progress) {
        long t0 = System.nanoTime();
        Balancing b = Balancing.standard();
        if (!blankToEmpty(minValveDrop).isEmpty()) {
            double drop = Quantities.parse(minValveDrop, QuantityKind.PRESSURE, "least valve drop");
            if (drop < 0) {
                throw new InputException(
                        "least valve drop", "a pressure drop cannot be negative, got \"" + minValveDrop + "\"");
            }
            b = b.withMinimumValveDrop(drop);
        }
        NetworkStudy study = study(in, in.editor().project(in.draft()), progress);
        checkCancel();
        progress.at(2, 3, "Balancing the valves");
        BalancingResult result = b.balance(study.network());
        progress.at(3, 3, "Balanced");
        return new Balance(result, System.nanoTime() - t0);
    }

    /**
     * The largest extra demand at a junction with every junction at or above a residual pressure, as
     * {@code network --fire-flow NODE --residual-pressure P} finds it.
     *
     * @param node the junction's id
     * @param residualPressure the residual gauge pressure as typed
     */
    static Fire fireFlow(Input in, String node, String residualPressure, NetworkSolution.Progress progress) {
        long t0 = System.nanoTime();
        if (blankToEmpty(node).isEmpty()) {
            throw new InputException("fire-flow node", "choose the junction the fire flow is drawn at");
        }
        if (blankToEmpty(residualPressure).isEmpty()) {
            throw new InputException(
                    "residual pressure", "give the least gauge pressure every junction must keep, e.g. 140 kPa");
        }
        NetworkStudy study = study(in, in.editor().project(in.draft()), progress);
        Network network = study.network();
        double p = Quantities.parsePressure(residualPressure, "residual pressure")
                .asGauge(network.site().pressure());
        if (!(p >= 0)) {
            throw new InputException(
                    "residual pressure", "must be a gauge pressure of 0 or more, got \"" + residualPressure + "\"");
        }
        checkCancel();
        progress.at(2, 3, "Searching for the fire flow at " + node.strip());
        FireFlowResult result = FireFlow.standard().search(network, node.strip(), p);
        progress.at(3, 3, "Found");
        return new Fire(result, System.nanoTime() - t0);
    }

    /**
     * Every node's pressure range and every pump's duty range over the pipes' roughness ranges and a
     * demand range, as {@code network --uncertainty --demand-range LOW:HIGH --samples N --seed S}
     * finds them (corners where they bound, otherwise a seeded Monte Carlo).
     *
     * @param demandRange LOW:HIGH multipliers on every junction demand; blank for 1:1
     * @param samples random samples when corners do not bound; blank for the engine's default
     * @param seed the random seed; blank for the engine's default
     */
    static Spread uncertainty(
            Input in, String demandRange, String samples, String seed, NetworkSolution.Progress progress) {
        long t0 = System.nanoTime();
        NetworkUncertainty.Spec spec = NetworkUncertainty.Spec.ofDemandRange(
                blankToEmpty(demandRange).isEmpty() ? null : demandRange, "demand range");
        if (!blankToEmpty(samples).isEmpty()) {
            try {
                spec = spec.withSamples(Integer.parseInt(samples.strip()));
            } catch (NumberFormatException e) {
                throw new InputException("samples", "expected a whole number, got \"" + samples.strip() + "\"");
            }
        }
        if (!blankToEmpty(seed).isEmpty()) {
            try {
                spec = spec.withSeed(Long.parseLong(seed.strip()));
            } catch (NumberFormatException e) {
                throw new InputException("seed", "expected a whole number, got \"" + seed.strip() + "\"");
            }
        }
        NetworkStudy study = study(in, in.editor().project(in.draft()), progress);
        checkCancel();
        progress.at(2, 3, "Solving the corners or samples");
        var result = NetworkUncertainty.run(study.network(), spec, NetworkSolver.standard());
        progress.at(3, 3, "Ranges found");
        return new Spread(result, System.nanoTime() - t0);
    }

    /**
     * A friction-gradient limit in metres of head per 100 m, read by the shared gradient parser
     * (a pressure gradient converted with the fluid's ρ g); a bare number is refused.
     */
    static double gradient(String text, double rhoG) {
        if (text != null && text.strip().matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?")) {
            throw new InputException(
                    "max gradient",
                    "a unit is needed, e.g. \"4 m/100m\" or \"400 Pa/m\"; got the bare number \"" + text + "\"");
        }
        double g = Quantities.parseGradient(text, "max gradient")
                .headPer100m(rhoG / Gravity.STANDARD, Gravity.STANDARD, "max gradient");
        if (!(g > 0) || !Double.isFinite(g)) {
            throw new InputException("max gradient", "must be above zero, got \"" + text + "\"");
        }
        return g;
    }

    private static String blankToEmpty(String s) {
        return s == null ? "" : s.strip();
    }

    private static String orDefault(String s, String otherwise) {
        return blankToEmpty(s).isEmpty() ? otherwise : s.strip();
    }
}
