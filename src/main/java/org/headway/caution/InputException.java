package org.headway.caution;

/**
 * The one error type for bad input anywhere in Headway.
 *
 * <p>The message always names where the value came from (file, line, column, JSON path, option or
 * field), the offending value and what was expected, e.g. {@code points.csv line 4, column re:
 * Reynolds number must be positive, got -3}. Callers that know more context wrap the location with
 * {@link #at(String)}.
 */
public final class InputException extends RuntimeException {

    private final String where;
    private final String problem;

    /**
     * @param where location of the bad value (field name, JSON path, "file line n, column c")
     * @param problem what is wrong, with the value and the expectation
     */
    public InputException(String where, String problem) {
        super(compose(where, problem));
        this.where = where == null ? "" : where;
        this.problem = problem;
    }

    /**
     * @param where location of the bad value
     * @param problem what is wrong
     * @param cause underlying parser error
     */
    public InputException(String where, String problem, Throwable cause) {
        super(compose(where, problem), cause);
        this.where = where == null ? "" : where;
        this.problem = problem;
    }

    private static String compose(String where, String problem) {
        return where == null || where.isEmpty() ? problem : where + ": " + problem;
    }

    /** Location of the bad value, possibly empty. */
    public String where() {
        return where;
    }

    /** The problem without its location. */
    public String problem() {
        return problem;
    }

    /**
     * The same error located inside an outer context: {@code at("segments[3]")} turns {@code
     * length: …} into {@code segments[3].length: …}; an outer context ending in a space or colon is
     * joined as written.
     */
    public InputException at(String outer) {
        String joined;
        if (where.isEmpty()) {
            joined = outer;
        } else if (outer.endsWith(" ") || outer.endsWith(",") || outer.endsWith(":")) {
            joined = outer + where;
        } else if (where.startsWith("[")) {
            joined = outer + where;
        } else {
            joined = outer + "." + where;
        }
        return new InputException(joined, problem, this);
    }

    /** Checks that a value is finite, else throws naming the field. */
    public static double requireFinite(String field, double value) {
        if (!Double.isFinite(value)) {
            throw new InputException(field, "must be a finite number, got " + value);
        }
        return value;
    }

    /** Checks that a value is finite and strictly positive, else throws naming the field. */
    public static double requirePositive(String field, double value) {
        requireFinite(field, value);
        if (value <= 0) {
            throw new InputException(field, "must be greater than zero, got " + value);
        }
        return value;
    }

    /** Checks that a value is finite and not negative, else throws naming the field. */
    public static double requireNonNegative(String field, double value) {
        requireFinite(field, value);
        if (value < 0) {
            throw new InputException(field, "must not be negative, got " + value);
        }
        return value;
    }
}
