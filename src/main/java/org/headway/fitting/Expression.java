package org.headway.fitting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.headway.caution.InputException;

/**
 * A user model written as text over named data columns and named parameters, compiled for fast
 * evaluation with exact derivatives with respect to the parameters.
 *
 * <p>Grammar: numbers ({@code 2}, {@code .5}, {@code 1.2e-3}); names of columns and parameters
 * (letters, digits, underscore, not starting with a digit); infix {@code + - * /}; power {@code ^}
 * (also written {@code **}), right-associative and binding tighter than unary minus, so {@code
 * -x^2} is −(x²); parentheses; the functions {@code exp}, {@code log} and {@code ln} (both the
 * natural logarithm), {@code log10}, {@code sqrt}, {@code sin}, {@code cos}, {@code tan} (radians),
 * {@code atan}, {@code abs}; the constant {@code pi}.
 *
 * <p>Derivatives are exact: each operation carries the chain rule forward (forward-mode
 * differentiation, one tangent per parameter the sub-expression depends on), so no finite
 * differences are involved. Evaluation is vectorised: every operation runs as one loop over all
 * points, which keeps interpretation overhead independent of the number of points. An expression is
 * immutable and thread-safe; each evaluation allocates its own work arrays.
 */
public final class Expression {

    /** Most parameters one expression may carry (derivative bookkeeping uses a 64-bit mask). */
    public static final int MAX_PARAMETERS = 64;

    /**
     * Longest expression text accepted (characters). Compilation recurses over the expression tree,
     * so the length bounds the stack a pasted wall of text could need; real models are a line long.
     */
    public static final int MAX_LENGTH = 2_000;

    /** Deepest nesting of brackets, signs, powers and function calls accepted. */
    public static final int MAX_NESTING = 100;

    private static final List<String> FUNCTIONS =
            List.of("exp", "log", "ln", "log10", "sqrt", "sin", "cos", "tan", "atan", "abs");

    private final String text;
    private final List<String> variables;
    private final List<String> parameters;
    private final Instruction[] program;

    private Expression(String text, List<String> variables, List<String> parameters, Instruction[] program) {
        this.text = text;
        this.variables = variables;
        this.parameters = parameters;
        this.program = program;
    }

    /**
     * Parses and compiles an expression.
     *
     * @param text the expression, e.g. {@code a*exp(-b*x) + c}
     * @param variables names of the data columns it may use, in the order values are supplied
     * @param parameters names of the parameters it may use, in the order values are supplied
     * @return the compiled expression
     * @throws InputException naming the character position and the token when the text is not a
     *     valid expression or uses a name that is neither a column nor a parameter
     */
    public static Expression parse(String text, List<String> variables, List<String> parameters) {
        if (text == null || text.isBlank()) {
            throw new InputException("expression", "is empty; write a model such as a*x^b");
        }
        if (text.length() > MAX_LENGTH) {
            throw new InputException(
                    "expression", "is " + text.length() + " characters long; at most " + MAX_LENGTH + " are accepted");
        }
        if (parameters.size() > MAX_PARAMETERS) {
            throw new InputException(
                    "expression", "at most " + MAX_PARAMETERS + " parameters are supported, got " + parameters.size());
        }
        for (String name : parameters) {
            if (variables.contains(name)) {
                throw new InputException(
                        "expression", "'" + name + "' is both a data column and a parameter; rename one of them");
            }
        }
        Parser parser = new Parser(text, List.copyOf(variables), List.copyOf(parameters));
        Node root = parser.parseAll();
        List<Instruction> program = new ArrayList<>();
        root.emit(program);
        return new Expression(
                text, List.copyOf(variables), List.copyOf(parameters), program.toArray(new Instruction[0]));
    }

    /** The expression as the user wrote it. */
    public String text() {
        return text;
    }

    /** Names of the data columns, in the order their values are supplied. */
    public List<String> variables() {
        return variables;
    }

    /** Names of the parameters, in the order their values are supplied. */
    public List<String> parameters() {
        return parameters;
    }

    /** Whether the expression depends on the named parameter at all. */
    public boolean dependsOn(String parameter) {
        int k = parameters.indexOf(parameter);
        return k >= 0 && (program[program.length - 1].mask & (1L << k)) != 0;
    }

    /**
     * Evaluates at one point.
     *
     * @param variableValues one value per variable (units of the data columns)
     * @param parameterValues one value per parameter
     * @return the value (units of the response); may be non-finite if the model is undefined there
     */
    public double evaluate(double[] variableValues, double[] parameterValues) {
        double[][] columns = new double[variableValues.length][];
        for (int v = 0; v < columns.length; v++) {
            columns[v] = new double[] {variableValues[v]};
        }
        double[] out = new double[1];
        evaluate(columns, parameterValues, out, null);
        return out[0];
    }

    /**
     * Evaluates at many points, with the derivatives with respect to every parameter.
     *
     * @param columns one array per variable, all of the same length n (units of the data)
     * @param parameterValues one value per parameter
     * @param values receives n model values
     * @param jacobian receives ∂value/∂parameter as {@code jacobian[point][parameter]}, or null to
     *     skip derivatives
     */
    public void evaluate(double[][] columns, double[] parameterValues, double[] values, double[][] jacobian) {
        double[][] gradient = evaluateColumns(columns, parameterValues, values, jacobian != null);
        if (jacobian != null) {
            int n = values.length;
            int p = parameters.size();
            for (int j = 0; j < n; j++) {
                double[] row = jacobian[j];
                for (int k = 0; k < p; k++) {
                    row[k] = gradient[k][j];
                }
            }
        }
    }

    /**
     * Evaluates at many points, with the derivatives laid out by parameter (the layout a QR
     * factorisation by columns wants).
     *
     * @param columns one array per variable, all of the same length n (units of the data)
     * @param parameterValues one value per parameter
     * @param values receives n model values
     * @param withGradient whether to compute derivatives
     * @return ∂value/∂parameter as {@code gradient[parameter][point]} (fresh arrays, zeros for a
     *     parameter the expression does not use), or null without derivatives
     */
    public double[][] evaluateColumns(
            double[][] columns, double[] parameterValues, double[] values, boolean withGradient) {
        if (columns.length != variables.size()) {
            throw new IllegalArgumentException("expected " + variables.size() + " columns, got " + columns.length);
        }
        if (parameterValues.length != parameters.size()) {
            throw new IllegalArgumentException(
                    "expected " + parameters.size() + " parameters, got " + parameterValues.length);
        }
        int n = values.length;
        int p = parameters.size();
        if (n <= BLOCK) {
            return evaluateBlock(columns, parameterValues, values, withGradient, n, p);
        }
        // Points in blocks: the program's intermediate arrays stay small and in cache, whatever n.
        double[][] out = withGradient ? new double[p][n] : null;
        double[][] blockColumns = new double[columns.length][BLOCK];
        double[] blockValues = new double[BLOCK];
        for (int start = 0; start < n; start += BLOCK) {
            int length = Math.min(BLOCK, n - start);
            double[][] view = blockColumns;
            double[] viewValues = blockValues;
            if (length < BLOCK) {
                view = new double[columns.length][length];
                viewValues = new double[length];
            }
            for (int c = 0; c < columns.length; c++) {
                System.arraycopy(columns[c], start, view[c], 0, length);
            }
            double[][] g = evaluateBlock(view, parameterValues, viewValues, withGradient, length, p);
            System.arraycopy(viewValues, 0, values, start, length);
            if (withGradient) {
                for (int k = 0; k < p; k++) {
                    System.arraycopy(g[k], 0, out[k], start, length);
                }
            }
        }
        return out;
    }

    /** Points evaluated a block at a time by {@link #evaluateColumns} when there are more. */
    static final int BLOCK = 2048;

    private double[][] evaluateBlock(
            double[][] columns, double[] parameterValues, double[] values, boolean withGradient, int n, int p) {
        double[][] val = new double[program.length][];
        double[][][] grad = new double[program.length][][];
        double[] ones = null;
        for (int i = 0; i < program.length; i++) {
            Instruction in = program[i];
            double[] v;
            double[][] g = withGradient && in.mask != 0 ? new double[p][] : null;
            switch (in.op) {
                case CONSTANT -> {
                    v = new double[n];
                    Arrays.fill(v, in.constant);
                }
                case VARIABLE -> v = columns[in.index];
                case PARAMETER -> {
                    v = new double[n];
                    Arrays.fill(v, parameterValues[in.index]);
                    if (g != null) {
                        if (ones == null) {
                            ones = new double[n];
                            Arrays.fill(ones, 1.0);
                        }
                        g[in.index] = ones;
                    }
                }
                default -> {
                    v = new double[n];
                    Operations.apply(in, val, grad, v, g, n);
                }
            }
            val[i] = v;
            grad[i] = g;
        }
        int last = program.length - 1;
        System.arraycopy(val[last], 0, values, 0, n);
        if (!withGradient) {
            return null;
        }
        double[][] out = new double[p][];
        double[][] g = grad[last];
        for (int k = 0; k < p; k++) {
            double[] column = g == null ? null : g[k];
            // Leaves share arrays (a parameter's tangent of ones, a column's values): copy those.
            out[k] = column == null ? new double[n] : column == ones ? column.clone() : column;
        }
        return out;
    }

    @Override
    public String toString() {
        return text;
    }

    // ---------------------------------------------------------------- compiled form

    enum Op {
        CONSTANT,
        VARIABLE,
        PARAMETER,
        ADD,
        SUBTRACT,
        MULTIPLY,
        DIVIDE,
        POWER,
        NEGATE,
        EXP,
        LOG,
        LOG10,
        SQRT,
        SIN,
        COS,
        TAN,
        ATAN,
        ABS
    }

    /** One step of the post-order program; operands are indexes of earlier steps. */
    record Instruction(Op op, double constant, int index, int left, int right, long mask) {}

    /** The loops of each operation, value and tangents. */
    private static final class Operations {
        private Operations() {}

        static void apply(Instruction in, double[][] val, double[][][] grad, double[] v, double[][] g, int n) {
            double[] a = val[in.left];
            double[] b = in.right >= 0 ? val[in.right] : null;
            double[][] ga = grad[in.left];
            double[][] gb = in.right >= 0 ? grad[in.right] : null;
            switch (in.op) {
                case ADD, SUBTRACT -> {
                    double sign = in.op == Op.ADD ? 1.0 : -1.0;
                    for (int j = 0; j < n; j++) {
                        v[j] = a[j] + sign * b[j];
                    }
                    if (g != null) {
                        for (int k = 0; k < g.length; k++) {
                            double[] da = ga == null ? null : ga[k];
                            double[] db = gb == null ? null : gb[k];
                            if (da == null && db == null) {
                                continue;
                            }
                            double[] d = new double[n];
                            for (int j = 0; j < n; j++) {
                                d[j] = (da == null ? 0.0 : da[j]) + sign * (db == null ? 0.0 : db[j]);
                            }
                            g[k] = d;
                        }
                    }
                }
                case MULTIPLY -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = a[j] * b[j];
                    }
                    if (g != null) {
                        for (int k = 0; k < g.length; k++) {
                            double[] da = ga == null ? null : ga[k];
                            double[] db = gb == null ? null : gb[k];
                            if (da == null && db == null) {
                                continue;
                            }
                            double[] d = new double[n];
                            if (db == null) {
                                for (int j = 0; j < n; j++) {
                                    d[j] = da[j] * b[j];
                                }
                            } else if (da == null) {
                                for (int j = 0; j < n; j++) {
                                    d[j] = a[j] * db[j];
                                }
                            } else {
                                for (int j = 0; j < n; j++) {
                                    d[j] = da[j] * b[j] + a[j] * db[j];
                                }
                            }
                            g[k] = d;
                        }
                    }
                }
                case DIVIDE -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = a[j] / b[j];
                    }
                    if (g != null) {
                        // d(a/b) = (da − (a/b)·db) / b
                        for (int k = 0; k < g.length; k++) {
                            double[] da = ga == null ? null : ga[k];
                            double[] db = gb == null ? null : gb[k];
                            if (da == null && db == null) {
                                continue;
                            }
                            double[] d = new double[n];
                            for (int j = 0; j < n; j++) {
                                double num = (da == null ? 0.0 : da[j]) - (db == null ? 0.0 : v[j] * db[j]);
                                d[j] = num / b[j];
                            }
                            g[k] = d;
                        }
                    }
                }
                case POWER -> power(a, b, ga, gb, v, g, n);
                case NEGATE -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = -a[j];
                    }
                    if (g != null) {
                        for (int k = 0; k < g.length; k++) {
                            if (ga[k] != null) {
                                double[] d = new double[n];
                                for (int j = 0; j < n; j++) {
                                    d[j] = -ga[k][j];
                                }
                                g[k] = d;
                            }
                        }
                    }
                }
                default -> unary(in.op, a, ga, v, g, n);
            }
        }

        private static void power(
                double[] a, double[] b, double[][] ga, double[][] gb, double[] v, double[][] g, int n) {
            for (int j = 0; j < n; j++) {
                v[j] = Math.pow(a[j], b[j]);
            }
            if (g == null) {
                return;
            }
            // d(a^b) = b·a^(b−1)·da + a^b·ln(a)·db ; the first form also holds for a ≤ 0 when b is fixed.
            double[] base = null;
            double[] logTerm = null;
            for (int k = 0; k < g.length; k++) {
                double[] da = ga == null ? null : ga[k];
                double[] db = gb == null ? null : gb[k];
                if (da == null && db == null) {
                    continue;
                }
                if (da != null && base == null) {
                    base = new double[n];
                    for (int j = 0; j < n; j++) {
                        base[j] = b[j] == 0.0 ? 0.0 : b[j] * Math.pow(a[j], b[j] - 1.0);
                    }
                }
                if (db != null && logTerm == null) {
                    logTerm = new double[n];
                    for (int j = 0; j < n; j++) {
                        logTerm[j] = v[j] == 0.0 ? 0.0 : v[j] * Math.log(a[j]);
                    }
                }
                double[] d = new double[n];
                for (int j = 0; j < n; j++) {
                    d[j] = (da == null ? 0.0 : base[j] * da[j]) + (db == null ? 0.0 : logTerm[j] * db[j]);
                }
                g[k] = d;
            }
        }

        private static void unary(Op op, double[] a, double[][] ga, double[] v, double[][] g, int n) {
            double[] slope = g == null ? null : new double[n];
            switch (op) {
                case EXP -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = Math.exp(a[j]);
                    }
                    if (slope != null) {
                        System.arraycopy(v, 0, slope, 0, n);
                    }
                }
                case LOG -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = Math.log(a[j]);
                    }
                    if (slope != null) {
                        for (int j = 0; j < n; j++) {
                            slope[j] = 1.0 / a[j];
                        }
                    }
                }
                case LOG10 -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = Math.log10(a[j]);
                    }
                    if (slope != null) {
                        double ln10 = Math.log(10.0);
                        for (int j = 0; j < n; j++) {
                            slope[j] = 1.0 / (a[j] * ln10);
                        }
                    }
                }
                case SQRT -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = Math.sqrt(a[j]);
                    }
                    if (slope != null) {
                        for (int j = 0; j < n; j++) {
                            slope[j] = 0.5 / v[j];
                        }
                    }
                }
                case SIN -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = Math.sin(a[j]);
                    }
                    if (slope != null) {
                        for (int j = 0; j < n; j++) {
                            slope[j] = Math.cos(a[j]);
                        }
                    }
                }
                case COS -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = Math.cos(a[j]);
                    }
                    if (slope != null) {
                        for (int j = 0; j < n; j++) {
                            slope[j] = -Math.sin(a[j]);
                        }
                    }
                }
                case TAN -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = Math.tan(a[j]);
                    }
                    if (slope != null) {
                        for (int j = 0; j < n; j++) {
                            slope[j] = 1.0 + v[j] * v[j];
                        }
                    }
                }
                case ATAN -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = Math.atan(a[j]);
                    }
                    if (slope != null) {
                        for (int j = 0; j < n; j++) {
                            slope[j] = 1.0 / (1.0 + a[j] * a[j]);
                        }
                    }
                }
                case ABS -> {
                    for (int j = 0; j < n; j++) {
                        v[j] = Math.abs(a[j]);
                    }
                    if (slope != null) {
                        for (int j = 0; j < n; j++) {
                            slope[j] = Math.signum(a[j]);
                        }
                    }
                }
                default -> throw new IllegalStateException("not a function: " + op);
            }
            if (g != null) {
                for (int k = 0; k < g.length; k++) {
                    if (ga[k] != null) {
                        double[] d = new double[n];
                        for (int j = 0; j < n; j++) {
                            d[j] = slope[j] * ga[k][j];
                        }
                        g[k] = d;
                    }
                }
            }
        }
    }

    // ---------------------------------------------------------------- syntax tree

    /** Tree node; constant sub-trees are folded while parsing. */
    private abstract static class Node {
        abstract long mask();

        abstract boolean isConstant();

        abstract double constantValue();

        abstract int emit(List<Instruction> out);
    }

    private static final class Leaf extends Node {
        final Op op;
        final double constant;
        final int index;

        Leaf(Op op, double constant, int index) {
            this.op = op;
            this.constant = constant;
            this.index = index;
        }

        @Override
        long mask() {
            return op == Op.PARAMETER ? 1L << index : 0L;
        }

        @Override
        boolean isConstant() {
            return op == Op.CONSTANT;
        }

        @Override
        double constantValue() {
            return constant;
        }

        @Override
        int emit(List<Instruction> out) {
            out.add(new Instruction(op, constant, index, -1, -1, mask()));
            return out.size() - 1;
        }
    }

    private static final class Apply extends Node {
        final Op op;
        final Node left;
        final Node right;

        Apply(Op op, Node left, Node right) {
            this.op = op;
            this.left = left;
            this.right = right;
        }

        @Override
        long mask() {
            return left.mask() | (right == null ? 0L : right.mask());
        }

        @Override
        boolean isConstant() {
            return false;
        }

        @Override
        double constantValue() {
            throw new IllegalStateException();
        }

        @Override
        int emit(List<Instruction> out) {
            int l = left.emit(out);
            int r = right == null ? -1 : right.emit(out);
            out.add(new Instruction(op, 0.0, -1, l, r, mask()));
            return out.size() - 1;
        }
    }

    private static Node make(Op op, Node left, Node right) {
        if (left.isConstant() && (right == null || right.isConstant())) {
            double[] a = {left.constantValue()};
            double[] b = {right == null ? 0.0 : right.constantValue()};
            double[] v = new double[1];
            Instruction in = new Instruction(op, 0.0, -1, 0, right == null ? -1 : 1, 0L);
            Operations.apply(in, new double[][] {a, b}, new double[2][][], v, null, 1);
            return new Leaf(Op.CONSTANT, v[0], -1);
        }
        return new Apply(op, left, right);
    }

    // ---------------------------------------------------------------- parser

    private record Token(Kind kind, String text, double number, int position) {}

    private enum Kind {
        NUMBER,
        NAME,
        SYMBOL,
        END
    }

    /** Recursive descent over the grammar in the class comment. */
    private static final class Parser {
        private final String text;
        private final List<String> variables;
        private final List<String> parameters;
        private final List<Token> tokens;
        private int next;
        private int depth;

        Parser(String text, List<String> variables, List<String> parameters) {
            this.text = text;
            this.variables = variables;
            this.parameters = parameters;
            this.tokens = tokenize(text);
        }

        Node parseAll() {
            Node node = sum();
            Token t = peek();
            if (t.kind != Kind.END) {
                throw error(t, "unexpected " + describe(t) + " after a complete expression");
            }
            return node;
        }

        private Node sum() {
            Node node = product();
            while (isSymbol("+") || isSymbol("-")) {
                Op op = take().text.equals("+") ? Op.ADD : Op.SUBTRACT;
                node = make(op, node, product());
            }
            return node;
        }

        private Node product() {
            Node node = unary();
            while (isSymbol("*") || isSymbol("/")) {
                Op op = take().text.equals("*") ? Op.MULTIPLY : Op.DIVIDE;
                node = make(op, node, unary());
            }
            return node;
        }

        private Node unary() {
            Token t = peek();
            enter(t);
            try {
                if (isSymbol("-")) {
                    take();
                    return make(Op.NEGATE, unary(), null);
                }
                if (isSymbol("+")) {
                    take();
                    return unary();
                }
                return power();
            } finally {
                depth--;
            }
        }

        /** Bounds the recursion: each sign, power, bracket and call nests one level deeper. */
        private void enter(Token t) {
            if (++depth > MAX_NESTING) {
                throw new InputException(
                        "expression column " + (t.position + 1),
                        "nested more than " + MAX_NESTING + " levels deep (brackets, signs, powers, calls)");
            }
        }

        private Node power() {
            Node base = primary();
            if (isSymbol("^")) {
                take();
                return make(Op.POWER, base, unary());
            }
            return base;
        }

        private Node primary() {
            Token t = take();
            switch (t.kind) {
                case NUMBER:
                    return new Leaf(Op.CONSTANT, t.number, -1);
                case NAME:
                    return name(t);
                case SYMBOL:
                    if (t.text.equals("(")) {
                        Node inner = sum();
                        expect(")", t);
                        return inner;
                    }
                    throw error(t, "expected a number, a name or '(' but found " + describe(t));
                default:
                    throw error(t, "found the end of the expression where a number, a name or '(' is expected");
            }
        }

        private Node name(Token t) {
            if (isSymbol("(")) {
                Token open = take();
                Op op = function(t);
                Node argument = sum();
                expect(")", open);
                return make(op, argument, null);
            }
            int v = variables.indexOf(t.text);
            if (v >= 0) {
                return new Leaf(Op.VARIABLE, 0.0, v);
            }
            int p = parameters.indexOf(t.text);
            if (p >= 0) {
                return new Leaf(Op.PARAMETER, 0.0, p);
            }
            if (t.text.equals("pi")) {
                return new Leaf(Op.CONSTANT, Math.PI, -1);
            }
            if (FUNCTIONS.contains(t.text)) {
                throw error(t, "function '" + t.text + "' must be followed by '(' and its argument");
            }
            throw error(
                    t, "unknown name '" + t.text + "'; columns are " + variables + ", parameters are " + parameters);
        }

        private Op function(Token t) {
            return switch (t.text) {
                case "exp" -> Op.EXP;
                case "log", "ln" -> Op.LOG;
                case "log10" -> Op.LOG10;
                case "sqrt" -> Op.SQRT;
                case "sin" -> Op.SIN;
                case "cos" -> Op.COS;
                case "tan" -> Op.TAN;
                case "atan" -> Op.ATAN;
                case "abs" -> Op.ABS;
                default -> throw error(t, "unknown function '" + t.text + "'; known functions are " + FUNCTIONS);
            };
        }

        private void expect(String symbol, Token opened) {
            Token t = peek();
            if (t.kind == Kind.SYMBOL && t.text.equals(symbol)) {
                take();
                return;
            }
            throw error(
                    t,
                    "expected '" + symbol + "' to close the '" + opened.text + "' at column " + (opened.position + 1)
                            + " but found " + describe(t));
        }

        private boolean isSymbol(String symbol) {
            Token t = peek();
            return t.kind == Kind.SYMBOL && t.text.equals(symbol);
        }

        private Token peek() {
            return tokens.get(next);
        }

        private Token take() {
            Token t = tokens.get(next);
            if (t.kind != Kind.END) {
                next++;
            }
            return t;
        }

        private InputException error(Token t, String problem) {
            return new InputException("expression column " + (t.position + 1), problem + " in \"" + text + "\"");
        }

        private static String describe(Token t) {
            return t.kind == Kind.END ? "the end of the expression" : "'" + t.text + "'";
        }

        private List<Token> tokenize(String s) {
            List<Token> out = new ArrayList<>();
            int i = 0;
            while (i < s.length()) {
                char c = s.charAt(i);
                if (Character.isWhitespace(c)) {
                    i++;
                } else if (Character.isDigit(c)
                        || (c == '.' && i + 1 < s.length() && Character.isDigit(s.charAt(i + 1)))) {
                    int start = i;
                    while (i < s.length() && (Character.isDigit(s.charAt(i)) || s.charAt(i) == '.')) {
                        i++;
                    }
                    if (i < s.length() && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
                        int mark = i;
                        i++;
                        if (i < s.length() && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                            i++;
                        }
                        if (i < s.length() && Character.isDigit(s.charAt(i))) {
                            while (i < s.length() && Character.isDigit(s.charAt(i))) {
                                i++;
                            }
                        } else {
                            i = mark;
                        }
                    }
                    String number = s.substring(start, i);
                    try {
                        out.add(new Token(Kind.NUMBER, number, Double.parseDouble(number), start));
                    } catch (NumberFormatException e) {
                        throw new InputException(
                                "expression column " + (start + 1),
                                "'" + number + "' is not a number in \"" + s + "\"");
                    }
                } else if (Character.isLetter(c) || c == '_') {
                    int start = i;
                    while (i < s.length() && (Character.isLetterOrDigit(s.charAt(i)) || s.charAt(i) == '_')) {
                        i++;
                    }
                    out.add(new Token(Kind.NAME, s.substring(start, i), 0.0, start));
                } else if (c == '*' && i + 1 < s.length() && s.charAt(i + 1) == '*') {
                    out.add(new Token(Kind.SYMBOL, "^", 0.0, i));
                    i += 2;
                } else if ("+-*/^()".indexOf(c) >= 0) {
                    out.add(new Token(Kind.SYMBOL, String.valueOf(c), 0.0, i));
                    i++;
                } else {
                    throw new InputException(
                            "expression column " + (i + 1),
                            String.format(Locale.ROOT, "unexpected character '%c' in \"%s\"", c, s));
                }
            }
            out.add(new Token(Kind.END, "", 0.0, s.length()));
            return out;
        }
    }
}
