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
record NetworkDesign(Balancing balancing, String fireNode, String residualPressure) {

    static final NetworkDesign NONE = new NetworkDesign(null, null, null);

    /** The results, each null when not asked for. */
    record Results(BalancingResult balance, FireFlowResult fireFlow) {

        static final Results NONE = new Results(null, null);

        boolean any() {
            return balance != null || fireFlow != null;
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
            return all;
        }

        /** Whether each design run ended with an answer. */
        boolean complete() {
            return (balance == null || balance.converged()) && (fireFlow == null || fireFlow.found());
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
        return new NetworkDesign(b, fireNode, residual);
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
        return new Results(balance, fire);
    }
}
