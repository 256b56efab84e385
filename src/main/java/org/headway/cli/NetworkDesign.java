package org.headway.cli;

import java.util.ArrayList;
import java.util.List;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.network.Network;
import org.headway.network.design.Balancing;
import org.headway.network.design.BalancingResult;
import org.headway.network.design.FireFlow;
import org.headway.network.design.FireFlowResult;
import org.headway.network.design.NetworkSizing;
import org.headway.network.design.NetworkSizingResult;
import org.headway.network.design.NetworkUncertainty;
import org.headway.network.design.NetworkUncertaintyResult;
import org.headway.project.ProjectResolver;
import org.headway.units.Quantities;

/**
 * What {@code network} was asked to design besides the solve: balancing (with its minimum valve drop
 * and setting tables) and a fire-flow search. The options are checked here; the work is done in
 * {@code network.design}.
 *
 * @param balancing the balancing to run, or null
 * @param fireNode the junction for the fire flow, or null
 * @param residualPressure the residual pressure as typed, or null
 */
record NetworkDesign(
        Balancing balancing,
        String fireNode,
        String residualPressure,
        SizingRequest sizing,
        NetworkUncertainty.Spec uncertainty) {

    static final NetworkDesign NONE = new NetworkDesign(null, null, null, null, null);

    NetworkDesign(Balancing balancing, String fireNode, String residualPressure) {
        this(balancing, fireNode, residualPressure, null, null);
    }

    /** The same design with an uncertainty study. */
    NetworkDesign withUncertainty(NetworkUncertainty.Spec spec) {
        return new NetworkDesign(balancing, fireNode, residualPressure, sizing, spec);
    }

    /**
     * Reads {@code --demand-range LOW:HIGH} (multipliers on every junction demand, e.g. {@code
     * 0.9:1.1}); null gives 1:1 (roughness ranges only).
     */
    static NetworkUncertainty.Spec uncertaintySpec(String demandRange, Integer samples, Long seed) {
        NetworkUncertainty.Spec spec = NetworkUncertainty.Spec.ofDemandRange(demandRange, "--demand-range");
        if (samples != null) {
            spec = spec.withSamples(samples);
        }
        if (seed != null) {
            spec = spec.withSeed(seed);
        }
        return spec;
    }

    /** Default velocity limit of network sizing (m/s): common practice for water services, no source. */
    static final String DEFAULT_MAX_VELOCITY = "1.5 m/s";

    /** Default friction-gradient limit (m per 100 m): common practice for water services, no source. */
    static final String DEFAULT_MAX_GRADIENT = "4 m/100m";

    /**
     * Sizing as asked, the limits as typed (the gradient may be in Pa/m, parsed once the fluid is
     * known).
     *
     * @param maxVelocity velocity limit as typed
     * @param maxGradient gradient limit as typed
     * @param headBudget head budget as typed, or null
     * @param candidates candidate sizes of the catalog pipes
     */
    record SizingRequest(
            String maxVelocity,
            String maxGradient,
            String headBudget,
            String minDiameter,
            ProjectResolver.NetworkSizingCandidates candidates) {}

    /** The same design with sizing. */
    NetworkDesign withSizing(SizingRequest request) {
        return new NetworkDesign(balancing, fireNode, residualPressure, request, uncertainty);
    }

    /** The results, each null when not asked for. */
    record Results(
            BalancingResult balance,
            FireFlowResult fireFlow,
            NetworkSizingResult sizing,
            List<String> notSized,
            NetworkUncertaintyResult uncertainty) {

        static final Results NONE = new Results(null, null, null, List.of(), null);

        Results(BalancingResult balance, FireFlowResult fireFlow) {
            this(balance, fireFlow, null, List.of(), null);
        }

        boolean any() {
            return balance != null || fireFlow != null || sizing != null || uncertainty != null;
        }

        /** Cautions of the design runs, balancing first. */
        List<Caution> cautions() {
            List<Caution> all = new ArrayList<>();
            if (balance != null) {
                all.addAll(balance.cautions());
            }
            if (fireFlow != null) {
                all.addAll(fireFlow.cautions());
            }
            if (sizing != null) {
                all.addAll(sizing.cautions());
            }
            if (uncertainty != null) {
                all.addAll(uncertainty.cautions());
            }
            return all;
        }

        /** Whether each design run ended with an answer. */
        boolean complete() {
            return (balance == null || balance.converged())
                    && (fireFlow == null || fireFlow.found())
                    && (sizing == null || sizing.settled())
                    && (uncertainty == null || uncertainty.failedSolves() == 0);
        }
    }

    /** Checks that the options go together; the pressure is parsed when the network's site is known. */
    static NetworkDesign of(
            boolean balance, String minValveDrop, java.nio.file.Path valveSettings, String fireNode, String residual) {
        if (!balance && minValveDrop != null) {
            throw new InputException("--min-valve-drop", "applies to balancing; give --balance as well");
        }
        if (!balance && valveSettings != null) {
            throw new InputException("--valve-settings", "applies to balancing; give --balance as well");
        }
        if (fireNode != null && residual == null) {
            throw new InputException(
                    "--fire-flow", "needs --residual-pressure P, the least gauge pressure every junction must keep");
        }
        if (fireNode == null && residual != null) {
            throw new InputException("--residual-pressure", "applies to a fire-flow search; give --fire-flow NODE");
        }
        if (fireNode != null && fireNode.isBlank()) {
            throw new InputException("--fire-flow", "needs a junction id");
        }
        Balancing b = null;
        if (balance) {
            b = Balancing.standard();
            if (minValveDrop != null) {
                double drop =
                        Quantities.parse(minValveDrop, org.headway.units.QuantityKind.PRESSURE, "--min-valve-drop");
                if (drop < 0) {
                    throw new InputException(
                            "--min-valve-drop", "a pressure drop cannot be negative, got \"" + minValveDrop + "\"");
                }
                b = b.withMinimumValveDrop(drop);
            }
            if (valveSettings != null) {
                b = b.withSettingTables(org.headway.project.ValveSettingsFile.read(valveSettings));
            }
        }
        return new NetworkDesign(b, fireNode, residual, null, null);
    }

    /** Runs what was asked on the network. */
    Results run(Network network) {
        BalancingResult balance = null;
        if (balancing != null) {
            try {
                balance = balancing.balance(network);
            } catch (InputException e) {
                throw new InputException("--balance", e.problem(), e);
            }
        }
        FireFlowResult fire = null;
        if (fireNode != null) {
            double p = Quantities.parsePressure(residualPressure, "--residual-pressure")
                    .asGauge(network.site().pressure());
            if (!(p >= 0)) {
                throw new InputException(
                        "--residual-pressure",
                        "must be a gauge pressure of 0 or more, got \"" + residualPressure + "\" (" + p + " Pa gauge)");
            }
            try {
                fire = FireFlow.standard().search(network, fireNode, p);
            } catch (InputException e) {
                throw new InputException(
                        e.where().equals("fire flow node") ? "--fire-flow " + fireNode : "--residual-pressure",
                        e.problem(),
                        e);
            }
        }
        NetworkSizingResult sized = null;
        List<String> notSized = List.of();
        if (sizing != null) {
            double rhoG = network.context().fluid().density() * org.headway.system.Gravity.STANDARD;
            double v =
                    Quantities.parse(sizing.maxVelocity(), org.headway.units.QuantityKind.VELOCITY, "--max-velocity");
            double g = gradient(sizing.maxGradient(), rhoG);
            double budget = sizing.headBudget() == null
                    ? Double.POSITIVE_INFINITY
                    : Quantities.parse(sizing.headBudget(), org.headway.units.QuantityKind.HEAD, "--head-budget");
            double dMin = sizing.minDiameter() == null
                    ? 0
                    : Quantities.parse(sizing.minDiameter(), org.headway.units.QuantityKind.DIAMETER, "--min-diameter");
            if (sizing.candidates().candidates().isEmpty()) {
                throw new InputException(
                        "--size",
                        "no pipe link is given by a catalog material and size, so there is nothing to size (pipes"
                                + " with an explicit diameter keep it)");
            }
            sized = NetworkSizing.standard()
                    .size(network, sizing.candidates().candidates(), new NetworkSizing.Limits(v, g, budget, dMin));
            notSized = sizing.candidates().notSized();
        }
        NetworkUncertaintyResult spread = null;
        if (uncertainty != null) {
            spread = NetworkUncertainty.run(network, uncertainty, org.headway.network.NetworkSolver.standard());
        }
        return new Results(balance, fire, sized, notSized, spread);
    }

    /**
     * A friction-gradient limit with its unit, in metres of head per 100 m of pipe, read by the shared
     * gradient parser ({@code 4 m/100m}, {@code 4 m per 100 m}, {@code 4 ft/100ft}, {@code 400 Pa/m},
     * {@code 1.2 psi/100ft}); a pressure gradient is converted with the fluid's ρ g.
     */
    static double gradient(String text, double rhoG) {
        if (text != null && text.strip().matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?")) {
            throw new InputException(
                    "--max-gradient",
                    "a unit is needed, e.g. \"4 m/100m\" or \"400 Pa/m\"; got the bare number \"" + text + "\"");
        }
        double g = Quantities.parseGradient(text, "--max-gradient")
                .headPer100m(
                        rhoG / org.headway.system.Gravity.STANDARD,
                        org.headway.system.Gravity.STANDARD,
                        "--max-gradient");
        if (!(g > 0) || !Double.isFinite(g)) {
            throw new InputException("--max-gradient", "must be above zero, got \"" + text + "\"");
        }
        return g;
    }
}
