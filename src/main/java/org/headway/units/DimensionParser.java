package org.headway.units;

import java.util.Map;
import org.headway.caution.InputException;

/**
 * Reads a unit written as text (e.g. {@code kg/m^3}, {@code Pa*s}, {@code m/s}, {@code N·m},
 * {@code m³/h}) into the exponents of the SI base dimensions, for dimensional analysis. Only the
 * dimension matters, so prefixes are accepted and ignored.
 *
 * <p>Symbols: m, g, s, K, mol, A, cd (base); N, Pa, J, W, Hz, L (litre), bar, min, h, rad, rpm;
 * {@code 1} or {@code -} for dimensionless. Prefixes Y Z E P T G M k h da d c m µ u n p f a z y.
 * Operators {@code *} {@code ·} {@code /} (left to right: {@code kg/m/s} is kg·m⁻¹·s⁻¹), {@code ^}
 * with an integer exponent (also {@code ^(-1)}, and the superscripts ⁻¹²³⁴), a digit written
 * straight after a symbol as projects write it ({@code m3/h}, {@code kg/m3}, {@code mm2/s}), and
 * parentheses.
 *
 * <p>Lives at the edge with the other unit text so that both the command line and the desktop app
 * can read the units engineers type; it returns plain exponents so that {@code units} stays free of
 * the correlation engine.
 */
public final class DimensionParser {

    /** Number of SI base dimensions, the length of the array {@link #parse} returns. */
    public static final int BASE_DIMENSIONS = 7;

    private static final Map<String, int[]> SYMBOLS = Map.ofEntries(
            // exponents of M, L, T, Θ, I, N, J
            Map.entry("m", new int[] {0, 1, 0, 0, 0, 0, 0}),
            Map.entry("g", new int[] {1, 0, 0, 0, 0, 0, 0}),
            Map.entry("s", new int[] {0, 0, 1, 0, 0, 0, 0}),
            Map.entry("K", new int[] {0, 0, 0, 1, 0, 0, 0}),
            Map.entry("A", new int[] {0, 0, 0, 0, 1, 0, 0}),
            Map.entry("mol", new int[] {0, 0, 0, 0, 0, 1, 0}),
            Map.entry("cd", new int[] {0, 0, 0, 0, 0, 0, 1}),
            Map.entry("N", new int[] {1, 1, -2, 0, 0, 0, 0}),
            Map.entry("Pa", new int[] {1, -1, -2, 0, 0, 0, 0}),
            Map.entry("bar", new int[] {1, -1, -2, 0, 0, 0, 0}),
            Map.entry("J", new int[] {1, 2, -2, 0, 0, 0, 0}),
            Map.entry("W", new int[] {1, 2, -3, 0, 0, 0, 0}),
            Map.entry("Hz", new int[] {0, 0, -1, 0, 0, 0, 0}),
            Map.entry("rpm", new int[] {0, 0, -1, 0, 0, 0, 0}),
            Map.entry("L", new int[] {0, 3, 0, 0, 0, 0, 0}),
            Map.entry("min", new int[] {0, 0, 1, 0, 0, 0, 0}),
            Map.entry("h", new int[] {0, 0, 1, 0, 0, 0, 0}),
            Map.entry("rad", new int[] {0, 0, 0, 0, 0, 0, 0}));

    private static final String[] PREFIXES = {
        "da", "Y", "Z", "E", "P", "T", "G", "M", "k", "h", "d", "c", "m", "µ", "μ", "u", "n", "p", "f", "a", "z", "y"
    };

    /** Largest exponent magnitude accepted, in a factor or in the result: far beyond any physical unit. */
    public static final int MAX_EXPONENT = 100;

    /** Deepest nesting of parentheses accepted. */
    public static final int MAX_DEPTH = 20;

    /** Longest unit text accepted (characters). */
    public static final int MAX_LENGTH = 200;

    private final String text;
    private final String where;
    private int pos;
    private int depth;

    private DimensionParser(String text, String where) {
        this.text = text;
        this.where = where;
    }

    /**
     * @param unit the unit text
     * @param where what to name in an error message, e.g. {@code --var rho}
     * @return exponent of each SI base dimension in the order mass, length, time, temperature,
     *     current, amount of substance, luminous intensity (the order of {@code
     *     org.headway.dimensional.Dimension})
     * @throws InputException naming the character position and the unknown symbol or bad syntax
     */
    public static int[] parse(String unit, String where) {
        String t = unit.trim();
        if (t.isEmpty() || t.equals("1") || t.equals("-")) {
            return new int[BASE_DIMENSIONS];
        }
        if (t.length() > MAX_LENGTH) {
            throw new InputException(
                    where, "a unit of " + t.length() + " characters is longer than the " + MAX_LENGTH + " accepted");
        }
        DimensionParser p = new DimensionParser(t, where);
        int[] e = p.product();
        if (p.pos < t.length()) {
            throw p.error("unexpected '" + t.charAt(p.pos) + "'");
        }
        return e;
    }

    private int[] product() {
        int[] result = power();
        while (pos < text.length()) {
            char c = text.charAt(pos);
            if (c == '*' || c == '·' || c == '.' || c == ' ') {
                pos++;
                skipSpaces();
                add(result, power(), 1);
            } else if (c == '/') {
                pos++;
                skipSpaces();
                add(result, power(), -1);
            } else {
                break;
            }
        }
        return result;
    }

    private void skipSpaces() {
        while (pos < text.length() && text.charAt(pos) == ' ') {
            pos++;
        }
    }

    private int[] power() {
        int before = pos;
        int[] base = factor();
        boolean symbol = Character.isLetter(text.charAt(before)) || text.charAt(before) == 'µ';
        int exponent = 1;
        if (symbol && pos < text.length() && text.charAt(pos) >= '2' && text.charAt(pos) <= '9') {
            // m3, kg/m3: one digit after a symbol is its power, as in the project's unit text
            exponent = text.charAt(pos) - '0';
            pos++;
            if (pos < text.length() && Character.isDigit(text.charAt(pos))) {
                throw error("a power written after a symbol is one digit 2–9");
            }
        } else if (pos < text.length() && text.charAt(pos) == '^') {
            pos++;
            boolean paren = pos < text.length() && text.charAt(pos) == '(';
            if (paren) {
                pos++;
            }
            int start = pos;
            if (pos < text.length() && (text.charAt(pos) == '-' || text.charAt(pos) == '+')) {
                pos++;
            }
            while (pos < text.length() && Character.isDigit(text.charAt(pos))) {
                pos++;
            }
            String digits = text.substring(start, pos);
            if (digits.isEmpty() || digits.equals("-") || digits.equals("+")) {
                throw error("expected an integer exponent after '^'");
            }
            String magnitude = digits.replaceFirst("^[+-]", "").replaceFirst("^0+(?=\\d)", "");
            if (magnitude.length() > 3 || Integer.parseInt(magnitude) > MAX_EXPONENT) {
                throw error("exponent " + digits + " is beyond ±" + MAX_EXPONENT);
            }
            exponent = Integer.parseInt(digits);
            if (paren) {
                if (pos >= text.length() || text.charAt(pos) != ')') {
                    throw error("expected ')' after the exponent");
                }
                pos++;
            }
        } else if (pos < text.length() && "⁻¹²³⁴⁵⁶".indexOf(text.charAt(pos)) >= 0) {
            int sign = 1;
            if (text.charAt(pos) == '⁻') {
                sign = -1;
                pos++;
            }
            int index = pos < text.length() ? "⁰¹²³⁴⁵⁶".indexOf(text.charAt(pos)) : -1;
            if (index < 0) {
                throw error("expected a superscript digit");
            }
            pos++;
            exponent = sign * index;
        }
        int[] out = new int[base.length];
        add(out, base, exponent);
        return out;
    }

    private int[] factor() {
        if (pos >= text.length()) {
            throw error("the unit ends where a symbol is expected");
        }
        char c = text.charAt(pos);
        if (c == '(') {
            if (++depth > MAX_DEPTH) {
                throw error("parentheses nested deeper than " + MAX_DEPTH);
            }
            pos++;
            int[] inner = product();
            depth--;
            if (pos >= text.length() || text.charAt(pos) != ')') {
                throw error("expected ')'");
            }
            pos++;
            return inner;
        }
        if (c == '1') {
            pos++;
            return new int[7];
        }
        int start = pos;
        while (pos < text.length() && (Character.isLetter(text.charAt(pos)) || text.charAt(pos) == 'µ')) {
            pos++;
        }
        String symbol = text.substring(start, pos);
        if (symbol.isEmpty()) {
            throw error("unexpected '" + c + "'");
        }
        int[] e = SYMBOLS.get(symbol);
        if (e != null) {
            return e.clone();
        }
        for (String prefix : PREFIXES) {
            if (symbol.startsWith(prefix) && SYMBOLS.containsKey(symbol.substring(prefix.length()))) {
                return SYMBOLS.get(symbol.substring(prefix.length())).clone();
            }
        }
        pos = start;
        InputException located = error("unknown unit symbol '" + symbol + "'");
        throw new InputException(
                where,
                located.problem() + "; known symbols: m, g, s, K, A, mol, cd, N, Pa, bar, J, W, Hz, rpm, L, min, h,"
                        + " rad, with SI prefixes");
    }

    private void add(int[] into, int[] e, int times) {
        for (int i = 0; i < into.length; i++) {
            // Each term is bounded by MAX_EXPONENT², so neither step can overflow an int.
            into[i] += times * e[i];
            if (Math.abs(into[i]) > MAX_EXPONENT) {
                throw error("a dimension's exponent reaches " + into[i] + ", beyond ±" + MAX_EXPONENT);
            }
        }
    }

    private InputException error(String problem) {
        return new InputException(where, problem + " at character " + (pos + 1) + " of unit '" + text + "'");
    }
}
