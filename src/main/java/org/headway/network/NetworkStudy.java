package org.headway.network;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.system.DesignLimits;
import org.headway.system.PressureLimits;

/**
 * A network with its demand cases and the limits its results are checked against, solved in one
 * run: the network's own demands, then each case.
 *
 * @param network the network with its own demands
 * @param cases demand cases, names unique (may be empty)
 * @param pressureLimits gauge limits at junctions (either may be unset)
 * @param npshMargin margin NPSH available must exceed NPSH required by (m)
 */
public record NetworkStudy(Network network, List<DemandCase> cases, PressureLimits pressureLimits, double npshMargin) {

    /** Name of the solve with the network's own demands. */
    public static final String BASE_CASE = "base";

    public NetworkStudy {
        Objects.requireNonNull(network, "network");
        cases = List.copyOf(cases);
        DemandCase.requireUniqueNames(cases);
        pressureLimits = pressureLimits == null ? PressureLimits.NONE : pressureLimits;
        InputException.requireNonNegative("npshMargin", npshMargin);
        for (DemandCase c : cases) {
            // Refuse unknown nodes and categories before any solve starts.
            c.applyTo(network);
        }
    }

    /** A network alone: no cases, no limits, the usual NPSH margin. */
    public static NetworkStudy of(Network network) {
        return new NetworkStudy(network, List.of(), PressureLimits.NONE, DesignLimits.USUAL.npshMargin());
    }

    /**
     * The solved study.
     *
     * @param base the network's own demands
     * @param cases each demand case, in order
     * @param pressureCheck the pressure table over the cases (over the base solve when there are no
     *     cases), present when there are cases or limits
     */
    public record Result(CaseResult base, List<CaseResult> cases, Optional<PressureCheck> pressureCheck) {
        public Result {
            cases = List.copyOf(cases);
        }

        /** Whether every solve converged. */
        public boolean converged() {
            return base.result().converged()
                    && cases.stream().allMatch(c -> c.result().converged());
        }

        /**
         * The base solve's cautions, each case's solve cautions prefixed by the case name, and the
         * pressure check's, the standing review caution once at the end.
         */
        public List<Caution> cautions() {
            List<Caution> all = new ArrayList<>(base.cautions());
            all.remove(Caution.GENERAL_REVIEW);
            for (CaseResult c : cases) {
                for (Caution k : c.cautions()) {
                    if (!k.equals(Caution.GENERAL_REVIEW)) {
                        all.add(k.about("case " + c.name()));
                    }
                }
            }
            pressureCheck.ifPresent(p -> all.addAll(p.cautions()));
            List<Caution> unique = new ArrayList<>(new java.util.LinkedHashSet<>(all));
            unique.add(Caution.GENERAL_REVIEW);
            return unique;
        }
    }

    /** Solves the base and every case with a solver. */
    public Result solve(NetworkSolver solver) {
        CaseResult base = solveCase(BASE_CASE, network, solver);
        List<CaseResult> solved = new ArrayList<>();
        for (DemandCase c : cases) {
            solved.add(solveCase(c.name(), c.applyTo(network), solver));
        }
        Optional<PressureCheck> check = Optional.empty();
        if (!cases.isEmpty() || pressureLimits.isSet()) {
            check = Optional.of(PressureCheck.of(cases.isEmpty() ? List.of(base) : solved, pressureLimits));
        }
        return new Result(base, solved, check);
    }

    private CaseResult solveCase(String name, Network net, NetworkSolver solver) {
        NetworkResult r = solver.solve(net);
        return new CaseResult(name, net, r, PumpDuty.of(net, r, npshMargin), IndexCircuit.of(net, r));
    }
}
