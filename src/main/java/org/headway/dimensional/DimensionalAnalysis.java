package org.headway.dimensional;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.apache.commons.math3.fraction.BigFraction;
import org.headway.caution.InputException;

/**
 * Buckingham π analysis: from n variables with their dimensions, the rank r of the dimension
 * matrix and n − r independent dimensionless groups formed with r repeating variables.
 *
 * <p>Method (Buckingham, E. (1914), On physically similar systems, Phys. Rev. 4(4), 345–376; the
 * method of repeating variables as in White, F. M., Fluid Mechanics, ch. 5, from memory). The rank
 * and the exponents are computed in exact rational arithmetic (Commons Math {@link BigFraction}),
 * then each group's exponents are scaled to the smallest integers (denominators cleared, common
 * factor removed). Sign convention: the non-repeating variable of each group has a positive
 * exponent, unless the inverse is a familiar group (Reynolds number ρVD/μ rather than μ/(ρVD)).
 *
 * <p>Default repeating variables, when none are chosen: the first independent set taken in the
 * order density (M L⁻³), velocity (L T⁻¹), a length (names starting with D or d first), then the
 * remaining variables as given, the first variable (taken to be the dependent one) last.
 */
public final class DimensionalAnalysis {

    private DimensionalAnalysis() {}

    /**
     * Forms the π groups.
     *
     * @param variables the variables, the dependent one first by convention
     * @param repeating the repeating variables by name, or empty to choose them by the default rule
     * @return rank, repeating variables and groups
     * @throws InputException if names repeat or are unknown, or the chosen repeating variables are
     *     not r in number, are not independent, or do not span the dimensions — with an explanation
     */
    public static GroupAnalysis analyse(List<DimensionalVariable> variables, List<String> repeating) {
        if (variables.size() < 2) {
            throw new InputException("variables", "give at least two variables, got " + variables.size());
        }
        List<String> names = new ArrayList<>();
        for (DimensionalVariable v : variables) {
            if (names.contains(v.name())) {
                throw new InputException("variables", "the name '" + v.name() + "' is used twice");
            }
            names.add(v.name());
        }
        Set<Dimension> present = EnumSet.noneOf(Dimension.class);
        variables.forEach(v -> present.addAll(v.exponents().keySet()));
        List<Dimension> dimensions = new ArrayList<>(present);
        BigFraction[][] columns = new BigFraction[variables.size()][];
        for (int j = 0; j < variables.size(); j++) {
            columns[j] = column(variables.get(j), dimensions);
        }
        int rank = rank(List.of(columns));
        List<Integer> chosen = repeating.isEmpty()
                ? defaultRepeating(variables, columns, rank)
                : checkedRepeating(variables, names, columns, rank, repeating, dimensions);
        List<DimensionlessGroup> groups = new ArrayList<>();
        int unnamed = 0;
        for (int q = 0; q < variables.size(); q++) {
            if (chosen.contains(q)) {
                continue;
            }
            int[] exponents = groupExponents(columns, chosen, q, variables.size());
            String name = FamiliarGroups.name(variables, exponents);
            if (name == null) {
                int[] inverse = negate(exponents);
                String inverseName = FamiliarGroups.name(variables, inverse);
                if (inverseName != null) {
                    exponents = inverse;
                    name = inverseName;
                }
            }
            if (name == null) {
                unnamed++;
                name = "π" + unnamed;
            }
            Map<String, Integer> map = new LinkedHashMap<>();
            for (int j = 0; j < exponents.length; j++) {
                if (exponents[j] != 0) {
                    map.put(names.get(j), exponents[j]);
                }
            }
            groups.add(new DimensionlessGroup(name, map));
        }
        List<String> repeatingNames = chosen.stream().map(names::get).collect(Collectors.toList());
        String explanation = String.format(
                Locale.ROOT,
                "%d variables in %d base dimension(s) (%s); the dimension matrix has rank %d, so there are %d − %d = %d"
                        + " dimensionless group(s) (Buckingham π theorem). Repeating variables: %s%s.",
                variables.size(),
                dimensions.size(),
                dimensions.stream().map(Dimension::symbol).collect(Collectors.joining(", ")),
                rank,
                variables.size(),
                rank,
                variables.size() - rank,
                String.join(", ", repeatingNames),
                repeating.isEmpty() ? " (chosen by the default rule)" : " (as chosen)");
        return new GroupAnalysis(variables, dimensions, rank, repeatingNames, groups, explanation);
    }

    private static BigFraction[] column(DimensionalVariable v, List<Dimension> dimensions) {
        BigFraction[] c = new BigFraction[dimensions.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = new BigFraction(v.exponent(dimensions.get(i)));
        }
        return c;
    }

    /** Rank of the matrix whose columns are given, by exact Gaussian elimination. */
    static int rank(List<BigFraction[]> columns) {
        if (columns.isEmpty() || columns.get(0).length == 0) {
            return 0;
        }
        int rows = columns.get(0).length;
        int cols = columns.size();
        BigFraction[][] m = new BigFraction[rows][cols];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < cols; j++) {
                m[i][j] = columns.get(j)[i];
            }
        }
        int rank = 0;
        for (int j = 0; j < cols && rank < rows; j++) {
            int pivot = -1;
            for (int i = rank; i < rows; i++) {
                if (!m[i][j].equals(BigFraction.ZERO)) {
                    pivot = i;
                    break;
                }
            }
            if (pivot < 0) {
                continue;
            }
            BigFraction[] t = m[pivot];
            m[pivot] = m[rank];
            m[rank] = t;
            for (int i = rank + 1; i < rows; i++) {
                if (m[i][j].equals(BigFraction.ZERO)) {
                    continue;
                }
                BigFraction f = m[i][j].divide(m[rank][j]);
                for (int k = j; k < cols; k++) {
                    m[i][k] = m[i][k].subtract(f.multiply(m[rank][k]));
                }
            }
            rank++;
        }
        return rank;
    }

    private static List<Integer> defaultRepeating(
            List<DimensionalVariable> variables, BigFraction[][] columns, int rank) {
        List<Integer> order = new ArrayList<>();
        addKind(order, variables, FamiliarGroups.Kind.DENSITY, false);
        addKind(order, variables, FamiliarGroups.Kind.VELOCITY, false);
        addKind(order, variables, FamiliarGroups.Kind.LENGTH, true);
        for (int j = 1; j < variables.size(); j++) {
            if (!order.contains(j)) {
                order.add(j);
            }
        }
        if (!order.contains(0)) {
            order.add(0);
        }
        List<Integer> chosen = new ArrayList<>();
        List<BigFraction[]> chosenColumns = new ArrayList<>();
        for (int j : order) {
            if (chosen.size() == rank) {
                break;
            }
            if (variables.get(j).dimensionless()) {
                continue;
            }
            chosenColumns.add(columns[j]);
            if (rank(chosenColumns) == chosen.size() + 1) {
                chosen.add(j);
            } else {
                chosenColumns.remove(chosenColumns.size() - 1);
            }
        }
        chosen.sort(Integer::compare);
        return chosen;
    }

    private static void addKind(
            List<Integer> order, List<DimensionalVariable> variables, FamiliarGroups.Kind kind, boolean diameterFirst) {
        List<Integer> matches = new ArrayList<>();
        for (int j = 1; j < variables.size(); j++) {
            if (FamiliarGroups.kind(variables.get(j)) == kind) {
                matches.add(j);
            }
        }
        if (diameterFirst) {
            matches.sort((a, b) -> Boolean.compare(
                    !looksLikeDiameter(variables.get(a).name()),
                    !looksLikeDiameter(variables.get(b).name())));
        }
        order.addAll(matches);
    }

    private static boolean looksLikeDiameter(String name) {
        return name.startsWith("D")
                || name.startsWith("d")
                || name.toLowerCase(Locale.ROOT).contains("diam");
    }

    private static List<Integer> checkedRepeating(
            List<DimensionalVariable> variables,
            List<String> names,
            BigFraction[][] columns,
            int rank,
            List<String> repeating,
            List<Dimension> dimensions) {
        List<Integer> chosen = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (String r : repeating) {
            int j = names.indexOf(r);
            if (j < 0) {
                throw new InputException(
                        "repeating", "there is no variable named '" + r + "'; the variables are " + names);
            }
            if (!seen.add(r)) {
                throw new InputException("repeating", "'" + r + "' is listed twice");
            }
            chosen.add(j);
        }
        List<BigFraction[]> sofar = new ArrayList<>();
        List<String> sofarNames = new ArrayList<>();
        for (int j : chosen) {
            sofar.add(columns[j]);
            if (rank(sofar) < sofar.size()) {
                String why = variables.get(j).dimensionless()
                        ? "'" + names.get(j) + "' is itself dimensionless"
                        : "the dimensions of '" + names.get(j) + "' ("
                                + variables.get(j).formula()
                                + ") can be made from "
                                + (sofarNames.isEmpty() ? "nothing" : String.join(", ", sofarNames))
                                + " alone";
                throw new InputException(
                        "repeating",
                        "the repeating variables " + repeating + " are not independent: " + why
                                + ". Choose repeating variables none of whose dimensions can be built from the others.");
            }
            sofarNames.add(names.get(j));
        }
        if (chosen.size() != rank) {
            String problem = chosen.size() < rank
                    ? "do not span the dimensions: " + repeating + " cover only " + chosen.size() + " independent"
                            + " combination(s) of "
                            + dimensions.stream().map(Dimension::symbol).collect(Collectors.joining(", "))
                            + " but the dimension matrix has rank " + rank + ", so " + rank + " repeating variables are"
                            + " needed (together they must involve every base dimension the variables use)"
                    : "are too many: the dimension matrix has rank " + rank + ", so exactly " + rank
                            + " repeating variables are used, got " + chosen.size();
            throw new InputException("repeating", "the repeating variables " + problem);
        }
        chosen.sort(Integer::compare);
        return chosen;
    }

    /** Exponents of q·Π repeatingⱼ^aⱼ that make it dimensionless, as smallest integers. */
    private static int[] groupExponents(BigFraction[][] columns, List<Integer> repeating, int q, int n) {
        int rows = columns[q].length;
        int r = repeating.size();
        // Solve Σ aⱼ·D[:, repⱼ] = −D[:, q] by elimination on the augmented matrix (consistent: rank r).
        BigFraction[][] m = new BigFraction[rows][r + 1];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < r; j++) {
                m[i][j] = columns[repeating.get(j)][i];
            }
            m[i][r] = columns[q][i].negate();
        }
        int[] pivotColumnOfRow = new int[rows];
        int row = 0;
        for (int j = 0; j < r && row < rows; j++) {
            int pivot = -1;
            for (int i = row; i < rows; i++) {
                if (!m[i][j].equals(BigFraction.ZERO)) {
                    pivot = i;
                    break;
                }
            }
            if (pivot < 0) {
                continue;
            }
            BigFraction[] t = m[pivot];
            m[pivot] = m[row];
            m[row] = t;
            BigFraction p = m[row][j];
            for (int k = j; k <= r; k++) {
                m[row][k] = m[row][k].divide(p);
            }
            for (int i = 0; i < rows; i++) {
                if (i != row && !m[i][j].equals(BigFraction.ZERO)) {
                    BigFraction f = m[i][j];
                    for (int k = j; k <= r; k++) {
                        m[i][k] = m[i][k].subtract(f.multiply(m[row][k]));
                    }
                }
            }
            pivotColumnOfRow[row] = j;
            row++;
        }
        BigFraction[] exponents = new BigFraction[n];
        java.util.Arrays.fill(exponents, BigFraction.ZERO);
        exponents[q] = BigFraction.ONE;
        for (int i = 0; i < row; i++) {
            exponents[repeating.get(pivotColumnOfRow[i])] = m[i][r];
        }
        BigInteger lcm = BigInteger.ONE;
        for (BigFraction e : exponents) {
            BigInteger d = e.getDenominator();
            lcm = lcm.divide(lcm.gcd(d)).multiply(d);
        }
        BigInteger[] integers = new BigInteger[n];
        BigInteger gcd = BigInteger.ZERO;
        for (int j = 0; j < n; j++) {
            integers[j] = exponents[j].multiply(new BigFraction(lcm)).getNumerator();
            gcd = gcd.gcd(integers[j]);
        }
        int[] out = new int[n];
        for (int j = 0; j < n; j++) {
            BigInteger v = integers[j].divide(gcd);
            if (v.bitLength() > 30) {
                throw new InputException("variables", "a group exponent is too large to state: " + v);
            }
            out[j] = v.intValue();
        }
        return out;
    }

    private static int[] negate(int[] v) {
        int[] out = new int[v.length];
        for (int j = 0; j < v.length; j++) {
            out[j] = -v[j];
        }
        return out;
    }
}
