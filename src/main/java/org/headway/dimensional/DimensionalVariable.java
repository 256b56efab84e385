package org.headway.dimensional;

import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;
import java.util.stream.Collectors;
import org.headway.caution.InputException;

/**
 * A physical variable in a dimensional analysis, with the exponent of each base dimension, e.g.
 * dynamic viscosity M¹L⁻¹T⁻¹.
 *
 * @param name the variable's name as the user writes it (e.g. {@code mu})
 * @param exponents exponent of each base dimension; absent dimensions have exponent 0
 */
public record DimensionalVariable(String name, Map<Dimension, Integer> exponents) {

    public DimensionalVariable {
        Objects.requireNonNull(name, "name");
        if (name.isBlank()) {
            throw new InputException("variable", "a variable needs a name");
        }
        EnumMap<Dimension, Integer> copy = new EnumMap<>(Dimension.class);
        exponents.forEach((d, e) -> {
            if (e != 0) {
                copy.put(d, e);
            }
        });
        exponents = java.util.Collections.unmodifiableMap(copy);
    }

    /**
     * Convenience for the mechanical dimensions.
     *
     * @param name variable name
     * @param mass exponent of M
     * @param length exponent of L
     * @param time exponent of T
     * @return the variable
     */
    public static DimensionalVariable of(String name, int mass, int length, int time) {
        EnumMap<Dimension, Integer> e = new EnumMap<>(Dimension.class);
        e.put(Dimension.MASS, mass);
        e.put(Dimension.LENGTH, length);
        e.put(Dimension.TIME, time);
        return new DimensionalVariable(name, e);
    }

    /**
     * From exponents listed in the order of {@link Dimension} (mass, length, time, temperature,
     * current, amount, luminous intensity), as a unit parser gives them.
     *
     * @param name variable name
     * @param exponents one exponent per base dimension, at most {@code Dimension.values().length}
     * @return the variable
     */
    public static DimensionalVariable ofExponents(String name, int[] exponents) {
        Dimension[] dims = Dimension.values();
        if (exponents.length > dims.length) {
            throw new InputException(
                    "variable " + name, "has " + exponents.length + " dimension exponents, at most " + dims.length);
        }
        EnumMap<Dimension, Integer> e = new EnumMap<>(Dimension.class);
        for (int i = 0; i < exponents.length; i++) {
            e.put(dims[i], exponents[i]);
        }
        return new DimensionalVariable(name, e);
    }

    /** Exponent of one dimension (0 if absent). */
    public int exponent(Dimension d) {
        return exponents.getOrDefault(d, 0);
    }

    /** Whether the variable is itself dimensionless. */
    public boolean dimensionless() {
        return exponents.isEmpty();
    }

    /** Dimension formula such as "M L^-1 T^-1", or "1" when dimensionless. */
    public String formula() {
        if (exponents.isEmpty()) {
            return "1";
        }
        return exponents.entrySet().stream()
                .map(e -> e.getKey().symbol() + (e.getValue() == 1 ? "" : "^" + e.getValue()))
                .collect(Collectors.joining(" "));
    }
}
