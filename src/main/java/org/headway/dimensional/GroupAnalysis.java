package org.headway.dimensional;

import java.util.List;

/**
 * Result of a dimensional analysis.
 *
 * @param variables the variables analysed, in the order given
 * @param dimensions the base dimensions that occur (rows of the dimension matrix)
 * @param rank rank r of the dimension matrix (exact rational arithmetic)
 * @param repeating the r repeating variables used to form the groups
 * @param groups the n − r dimensionless groups (Buckingham π theorem)
 * @param explanation one paragraph on how the groups were formed, for the report
 */
public record GroupAnalysis(
        List<DimensionalVariable> variables,
        List<Dimension> dimensions,
        int rank,
        List<String> repeating,
        List<DimensionlessGroup> groups,
        String explanation) {

    public GroupAnalysis {
        variables = List.copyOf(variables);
        dimensions = List.copyOf(dimensions);
        repeating = List.copyOf(repeating);
        groups = List.copyOf(groups);
    }
}
