package org.headway.fitting;

import java.util.LinkedHashMap;
import java.util.Map;
import org.headway.caution.InputException;

/**
 * A model form to fit: the built-in forms engineers reach for, or a user expression.
 *
 * <p>Forms linear in their parameters (constant, linear, through-origin, logarithmic, polynomial,
 * and power fitted in log space) are solved directly by Householder QR; the others by
 * Levenberg–Marquardt. With x₁…xₖ the explanatory columns:
 *
 * <ul>
 *   <li>{@link Constant}: y = a (the weighted mean, one or no column)
 *   <li>{@link Linear}: y = a + b₁x₁ + … + bₖxₖ
 *   <li>{@link ThroughOrigin}: y = b₁x₁ + … + bₖxₖ (no intercept; R² is then the uncentred one)
 *   <li>{@link Logarithmic}: y = a + b ln x
 *   <li>{@link Power}: y = a·x^b (nonlinear by default; optionally in log space)
 *   <li>{@link Exponential}: y = a·exp(b x)
 *   <li>{@link Polynomial}: y = c₀ + c₁x + … + cₙxⁿ
 *   <li>{@link PowerProduct}: y = C·x₁^n₁·x₂^n₂·…
 *   <li>{@link UserExpression}: any {@link Expression} with starting values for its parameters
 * </ul>
 */
public sealed interface FitForm
        permits FitForm.Constant,
                FitForm.Linear,
                FitForm.ThroughOrigin,
                FitForm.Logarithmic,
                FitForm.Power,
                FitForm.Exponential,
                FitForm.Polynomial,
                FitForm.PowerProduct,
                FitForm.UserExpression {

    /** Short id, as used on the command line ({@code linear}, {@code polynomial:3}, …). */
    String id();

    /** The form in words with its equation. */
    String description();

    /**
     * Calls the visitor's method for this form. Every form implements it and a visitor has one
     * method per form, so code that treats each form in its own way cannot leave one out unnoticed:
     * a new form does not compile until every visitor handles it.
     *
     * @param visitor what to do for each form
     * @param <R> what the visitor returns
     * @return the visitor's result for this form
     */
    <R> R accept(Visitor<R> visitor);

    /**
     * One method per form, for {@link #accept}.
     *
     * @param <R> what each method returns
     */
    interface Visitor<R> {
        R constant(Constant form);

        R linear(Linear form);

        R throughOrigin(ThroughOrigin form);

        R logarithmic(Logarithmic form);

        R power(Power form);

        R exponential(Exponential form);

        R polynomial(Polynomial form);

        R powerProduct(PowerProduct form);

        R userExpression(UserExpression form);
    }

    /** y = a. */
    record Constant() implements FitForm {
        @Override
        public String id() {
            return "constant";
        }

        @Override
        public String description() {
            return "constant: y = a (weighted mean)";
        }

        @Override
        public <R> R accept(Visitor<R> visitor) {
            return visitor.constant(this);
        }
    }

    /** y = a + Σ bᵢxᵢ. */
    record Linear() implements FitForm {
        @Override
        public String id() {
            return "linear";
        }

        @Override
        public String description() {
            return "linear: y = a + b·x (one slope per column)";
        }

        @Override
        public <R> R accept(Visitor<R> visitor) {
            return visitor.linear(this);
        }
    }

    /** y = Σ bᵢxᵢ. */
    record ThroughOrigin() implements FitForm {
        @Override
        public String id() {
            return "through-origin";
        }

        @Override
        public String description() {
            return "linear through the origin: y = b·x (one slope per column)";
        }

        @Override
        public <R> R accept(Visitor<R> visitor) {
            return visitor.throughOrigin(this);
        }
    }

    /** y = a + b ln x. */
    record Logarithmic() implements FitForm {
        @Override
        public String id() {
            return "log";
        }

        @Override
        public String description() {
            return "logarithmic: y = a + b·ln x";
        }

        @Override
        public <R> R accept(Visitor<R> visitor) {
            return visitor.logarithmic(this);
        }
    }

    /**
     * y = a·x^b.
     *
     * @param logSpace fit ln y = ln a + b ln x by linear least squares instead (biased on
     *     retransformation; a caution says by how much)
     */
    record Power(boolean logSpace) implements FitForm {
        @Override
        public String id() {
            return logSpace ? "power-log" : "power";
        }

        @Override
        public String description() {
            return logSpace
                    ? "power, fitted in log space: ln y = ln a + b·ln x"
                    : "power: y = a·x^b (nonlinear least squares)";
        }

        @Override
        public <R> R accept(Visitor<R> visitor) {
            return visitor.power(this);
        }
    }

    /** y = a·exp(b x). */
    record Exponential() implements FitForm {
        @Override
        public String id() {
            return "exponential";
        }

        @Override
        public String description() {
            return "exponential: y = a·exp(b·x)";
        }

        @Override
        public <R> R accept(Visitor<R> visitor) {
            return visitor.exponential(this);
        }
    }

    /**
     * y = c₀ + c₁x + … + cₙxⁿ.
     *
     * @param degree n, 1 to 10
     */
    record Polynomial(int degree) implements FitForm {
        public Polynomial {
            if (degree < 1 || degree > 10) {
                throw new InputException("polynomial degree", "must be between 1 and 10, got " + degree);
            }
        }

        @Override
        public String id() {
            return "polynomial:" + degree;
        }

        @Override
        public String description() {
            return "polynomial of degree " + degree + ": y = c0 + c1·x + … + c" + degree + "·x^" + degree;
        }

        @Override
        public <R> R accept(Visitor<R> visitor) {
            return visitor.polynomial(this);
        }
    }

    /** y = C·Π xᵢ^nᵢ, the usual form of a correlation between dimensionless groups. */
    record PowerProduct() implements FitForm {
        @Override
        public String id() {
            return "power-product";
        }

        @Override
        public String description() {
            return "power product: y = C·x1^n1·x2^n2·…";
        }

        @Override
        public <R> R accept(Visitor<R> visitor) {
            return visitor.powerProduct(this);
        }
    }

    /**
     * A user expression.
     *
     * @param expression model text over column names and parameter names (see {@link Expression})
     * @param start starting value of every parameter, in the order parameters are reported
     */
    record UserExpression(String expression, Map<String, Double> start) implements FitForm {
        public UserExpression {
            if (start.isEmpty()) {
                throw new InputException("start", "give a starting value for each parameter, e.g. b1=1,b2=0.1");
            }
            start.forEach((name, value) -> InputException.requireFinite("start value of " + name, value));
            start = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(start));
        }

        @Override
        public String id() {
            return "expression";
        }

        @Override
        public String description() {
            return "user expression: y = " + expression;
        }

        @Override
        public <R> R accept(Visitor<R> visitor) {
            return visitor.userExpression(this);
        }
    }
}
