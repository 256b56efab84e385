package org.headway.fitting;

import java.util.List;
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

    private final String text;
    private final List<String> variables;
    private final List<String> parameters;
    // The stages, one class each: ExpressionLexer (tokens), ExpressionParser (syntax tree of
    // ExpressionNode, constants folded), ExpressionCompiler (post-order Instruction program),
    // ExpressionEvaluator with Operations (the loops). This class holds the checks and the API.
    private final ExpressionEvaluator evaluator;

    private Expression(String text, List<String> variables, List<String> parameters, ExpressionEvaluator evaluator) {
        this.text = text;
        this.variables = variables;
        this.parameters = parameters;
        this.evaluator = evaluator;
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
        List<String> variableNames = List.copyOf(variables);
        List<String> parameterNames = List.copyOf(parameters);
        ExpressionNode root = new ExpressionParser(text, variableNames, parameterNames).parseAll();
        Instruction[] program = ExpressionCompiler.compile(root);
        return new Expression(
                text, variableNames, parameterNames, new ExpressionEvaluator(program, parameterNames.size()));
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
        return k >= 0 && (evaluator.dependencies() & (1L << k)) != 0;
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
        return evaluator.evaluateColumns(columns, parameterValues, values, withGradient);
    }

    /** Points evaluated a block at a time by {@link #evaluateColumns} when there are more. */
    static final int BLOCK = 2048;

    @Override
    public String toString() {
        return text;
    }
}
