package org.headway.project;

import java.util.List;
import java.util.Optional;
import org.headway.system.DesignLimits;
import org.headway.system.PipeRun;
import org.headway.system.SizeSelector;

/**
 * A project with every quantity parsed and every catalog name looked up, ready to solve.
 *
 * @param project the project as written
 * @param run the pipe run in SI
 * @param sizingCandidates sizes sizing may choose from (empty without a {@code sizing} entry)
 * @param limits design limits (project values over the usual defaults)
 * @param curve system curve range, if the project gives one
 */
public record ResolvedProject(
        Project project,
        PipeRun run,
        List<SizeSelector.CandidateSize> sizingCandidates,
        DesignLimits limits,
        Optional<CurveRange> curve) {

    public ResolvedProject {
        sizingCandidates = List.copyOf(sizingCandidates);
    }

    /**
     * @param minimumFlow first flow (m³/s)
     * @param maximumFlow last flow (m³/s)
     * @param points number of points
     */
    public record CurveRange(double minimumFlow, double maximumFlow, int points) {}
}
