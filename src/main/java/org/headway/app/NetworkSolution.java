package org.headway.app;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.headway.caution.InputException;
import org.headway.network.CaseResult;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.NetworkStudy;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.headway.project.ProjectResolver;
import org.headway.system.PressureLimits;

/**
 * One solve of the network workspace's line list, plain work with no toolkit (run off the FX
 * thread): the list read by the line-list reader, resolved as {@code headway solve} resolves a
 * network project, solved by the global gradient solver with its pumps and index circuit.
 *
 * @param draft the list solved
 * @param solved the network's own demands solved (the project's demand cases are not solved here)
 * @param nanos wall time of the solve (ns)
 * @param limits the project's gauge-pressure limits (for the grade line's band)
 */
public record NetworkSolution(NetworkEditor.Draft draft, CaseResult solved, long nanos, PressureLimits limits) {

    /** Reports how far the work is. */
    @FunctionalInterface
    interface Progress {
        /**
         * @param step steps done
         * @param steps steps in all
         * @param what the step starting
         */
        void at(int step, int steps, String what);
    }

    public NetworkResult result() {
        return solved.result();
    }

    /** A node's result by id. */
    public Optional<NetworkResult.NodeResult> node(String id) {
        return result().node(id);
    }

    /** A link's result by id. */
    public Optional<NetworkResult.LinkResult> link(String id) {
        return result().link(id);
    }

    /** Link ids of the index circuit, empty when the engine finds none. */
    public List<String> indexLinks() {
        return solved.circuit().index().map(p -> p.links()).orElse(List.of());
    }

    /**
     * Solves a draft.
     *
     * @throws InputException the line list's or the resolver's problem, located
     */
    static NetworkSolution solve(
            NetworkEditor editor, NetworkEditor.Draft draft, Catalog catalog, Path baseFolder, Progress progress) {
        long t0 = System.nanoTime();
        progress.at(0, 3, "Reading the line list");
        Project project = editor.project(draft);
        progress.at(1, 3, "Resolving nodes and links");
        NetworkStudy study = ProjectResolver.resolveNetworkStudy(project, catalog, baseFolder);
        progress.at(
                2,
                3,
                "Solving " + study.network().nodes().size() + " nodes and "
                        + study.network().links().size() + " links");
        NetworkStudy base = new NetworkStudy(study.network(), List.of(), study.pressureLimits(), study.npshMargin());
        CaseResult solved = base.solve(NetworkSolver.standard()).base();
        progress.at(3, 3, "Solved");
        return new NetworkSolution(draft, solved, System.nanoTime() - t0, study.pressureLimits());
    }
}
