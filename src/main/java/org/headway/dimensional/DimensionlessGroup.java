package org.headway.dimensional;

import java.util.Map;
import java.util.stream.Collectors;

/**
 * One Buckingham π group: a product of the variables raised to small integer exponents that is
 * dimensionless.
 *
 * @param name a familiar name when the group matches one (e.g. "Reynolds number"), else "π1", "π2"…
 * @param exponents exponent of each variable in the group, variables with exponent 0 left out, in
 *     the order the variables were given
 */
public record DimensionlessGroup(String name, Map<String, Integer> exponents) {

    public DimensionlessGroup {
        exponents = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(exponents));
    }

    /** The group written out, e.g. "rho^1 V^1 D^1 mu^-1" as "rho·V·D / mu". */
    public String formula() {
        String numerator = exponents.entrySet().stream()
                .filter(e -> e.getValue() > 0)
                .map(e -> e.getKey() + (e.getValue() == 1 ? "" : "^" + e.getValue()))
                .collect(Collectors.joining("·"));
        String denominator = exponents.entrySet().stream()
                .filter(e -> e.getValue() < 0)
                .map(e -> e.getKey() + (e.getValue() == -1 ? "" : "^" + (-e.getValue())))
                .collect(Collectors.joining("·"));
        if (numerator.isEmpty()) {
            numerator = "1";
        }
        if (denominator.isEmpty()) {
            return numerator;
        }
        return numerator + " / " + (denominator.contains("·") ? "(" + denominator + ")" : denominator);
    }
}
