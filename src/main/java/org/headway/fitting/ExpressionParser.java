package org.headway.fitting;

import java.util.List;
import org.headway.caution.InputException;
import org.headway.fitting.ExpressionLexer.Kind;
import org.headway.fitting.ExpressionLexer.Token;
import org.headway.fitting.Instruction.Op;

/**
 * Recursive descent over the grammar in {@link Expression}'s class comment, from the lexer's tokens
 * to a syntax tree with the names resolved to column and parameter indexes.
 */
final class ExpressionParser {

    private static final List<String> FUNCTIONS =
            List.of("exp", "log", "ln", "log10", "sqrt", "sin", "cos", "tan", "atan", "abs");

    private final String text;
    private final List<String> variables;
    private final List<String> parameters;
    private final List<Token> tokens;
    private int next;
    private int depth;

    ExpressionParser(String text, List<String> variables, List<String> parameters) {
        this.text = text;
        this.variables = variables;
        this.parameters = parameters;
        this.tokens = ExpressionLexer.tokenize(text);
    }

    ExpressionNode parseAll() {
        ExpressionNode node = sum();
        Token t = peek();
        if (t.kind() != Kind.END) {
            throw error(t, "unexpected " + describe(t) + " after a complete expression");
        }
        return node;
    }

    private ExpressionNode sum() {
        ExpressionNode node = product();
        while (isSymbol("+") || isSymbol("-")) {
            Op op = take().text().equals("+") ? Op.ADD : Op.SUBTRACT;
            node = ExpressionNode.make(op, node, product());
        }
        return node;
    }

    private ExpressionNode product() {
        ExpressionNode node = unary();
        while (isSymbol("*") || isSymbol("/")) {
            Op op = take().text().equals("*") ? Op.MULTIPLY : Op.DIVIDE;
            node = ExpressionNode.make(op, node, unary());
        }
        return node;
    }

    private ExpressionNode unary() {
        Token t = peek();
        enter(t);
        try {
            if (isSymbol("-")) {
                take();
                return ExpressionNode.make(Op.NEGATE, unary(), null);
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
        if (++depth > Expression.MAX_NESTING) {
            throw new InputException(
                    "expression column " + (t.position() + 1),
                    "nested more than " + Expression.MAX_NESTING + " levels deep (brackets, signs, powers, calls)");
        }
    }

    private ExpressionNode power() {
        ExpressionNode base = primary();
        if (isSymbol("^")) {
            take();
            return ExpressionNode.make(Op.POWER, base, unary());
        }
        return base;
    }

    private ExpressionNode primary() {
        Token t = take();
        switch (t.kind()) {
            case NUMBER:
                return new ExpressionNode.Leaf(Op.CONSTANT, t.number(), -1);
            case NAME:
                return name(t);
            case SYMBOL:
                if (t.text().equals("(")) {
                    ExpressionNode inner = sum();
                    expect(")", t);
                    return inner;
                }
                throw error(t, "expected a number, a name or '(' but found " + describe(t));
            default:
                throw error(t, "found the end of the expression where a number, a name or '(' is expected");
        }
    }

    private ExpressionNode name(Token t) {
        if (isSymbol("(")) {
            Token open = take();
            Op op = function(t);
            ExpressionNode argument = sum();
            expect(")", open);
            return ExpressionNode.make(op, argument, null);
        }
        int v = variables.indexOf(t.text());
        if (v >= 0) {
            return new ExpressionNode.Leaf(Op.VARIABLE, 0.0, v);
        }
        int p = parameters.indexOf(t.text());
        if (p >= 0) {
            return new ExpressionNode.Leaf(Op.PARAMETER, 0.0, p);
        }
        if (t.text().equals("pi")) {
            return new ExpressionNode.Leaf(Op.CONSTANT, Math.PI, -1);
        }
        if (FUNCTIONS.contains(t.text())) {
            throw error(t, "function '" + t.text() + "' must be followed by '(' and its argument");
        }
        throw error(t, "unknown name '" + t.text() + "'; columns are " + variables + ", parameters are " + parameters);
    }

    private Op function(Token t) {
        return switch (t.text()) {
            case "exp" -> Op.EXP;
            case "log", "ln" -> Op.LOG;
            case "log10" -> Op.LOG10;
            case "sqrt" -> Op.SQRT;
            case "sin" -> Op.SIN;
            case "cos" -> Op.COS;
            case "tan" -> Op.TAN;
            case "atan" -> Op.ATAN;
            case "abs" -> Op.ABS;
            default -> throw error(t, "unknown function '" + t.text() + "'; known functions are " + FUNCTIONS);
        };
    }

    private void expect(String symbol, Token opened) {
        Token t = peek();
        if (t.kind() == Kind.SYMBOL && t.text().equals(symbol)) {
            take();
            return;
        }
        throw error(
                t,
                "expected '" + symbol + "' to close the '" + opened.text() + "' at column " + (opened.position() + 1)
                        + " but found " + describe(t));
    }

    private boolean isSymbol(String symbol) {
        Token t = peek();
        return t.kind() == Kind.SYMBOL && t.text().equals(symbol);
    }

    private Token peek() {
        return tokens.get(next);
    }

    private Token take() {
        Token t = tokens.get(next);
        if (t.kind() != Kind.END) {
            next++;
        }
        return t;
    }

    private InputException error(Token t, String problem) {
        return new InputException("expression column " + (t.position() + 1), problem + " in \"" + text + "\"");
    }

    private static String describe(Token t) {
        return t.kind() == Kind.END ? "the end of the expression" : "'" + t.text() + "'";
    }
}
