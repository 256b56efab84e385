package org.headway.system;

import java.util.List;
import java.util.OptionalDouble;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.headway.caution.InputException;

/**
 * A pump's head–flow curve from the maker's points, fitted by least squares as a polynomial H(Q) =
 * a₀ + a₁ Q + a₂ Q² (quadratic by default) through a QR decomposition.
 *
 * <p>A quadratic is the usual shape of a centrifugal pump curve near its duty range (common
 * practice, no source); with exactly three points it interpolates them and R² = 1 says nothing.
 */
public final class PumpCurve {

    /**
     * A maker's point.
     *
     * @param flow volumetric flow (m³/s)
     * @param head head (m)
     */
    public record Point(double flow, double head) {}

    private final List<Point> points;
    private final double[] coefficients;
    private final double rSquared;
    private final OptionalDouble npshRequired;
    private final List<Point> npshCurve;
    private final String name;

    private PumpCurve(String name, List<Point> points, double[] coefficients, double rSquared, OptionalDouble npshr) {
        this.name = name;
        this.points = points;
        this.coefficients = coefficients;
        this.rSquared = rSquared;
        this.npshRequired = npshr;
        this.npshCurve = List.of();
    }

    private PumpCurve(PumpCurve base, List<Point> npshCurve) {
        this.name = base.name;
        this.points = base.points;
        this.coefficients = base.coefficients;
        this.rSquared = base.rSquared;
        this.npshRequired = base.npshRequired;
        this.npshCurve = List.copyOf(npshCurve);
    }

    /**
     * The same head curve with the maker's NPSH-required curve: NPSH required against flow, read
     * between the points by straight lines (the maker's curve is smooth and rising; between
     * published points a straight line is the reading an engineer makes from the chart, common
     * practice, no source). Outside the points the end value is held and {@link
     * #npshRequiredOutsideCurve} says so.
     *
     * @param npshPoints (flow, NPSH required) pairs, at least two, flows strictly ascending, values
     *     ≥ 0 (m³/s, m)
     */
    public PumpCurve withNpshCurve(List<Point> npshPoints) {
        if (npshPoints.size() < 2) {
            throw new InputException(
                    "pump.npshRequired", "an NPSH-required curve needs at least two points, got " + npshPoints.size());
        }
        for (int i = 0; i < npshPoints.size(); i++) {
            Point pt = npshPoints.get(i);
            InputException.requireFinite("pump.points[" + i + "].npshRequired", pt.head());
            InputException.requireNonNegative("pump.points[" + i + "].npshRequired", pt.head());
            if (i > 0 && !(pt.flow() > npshPoints.get(i - 1).flow())) {
                throw new InputException(
                        "pump.points[" + i + "].flow", "NPSH-required points must have strictly ascending flows");
            }
        }
        return new PumpCurve(this, npshPoints);
    }

    /** The NPSH-required curve as (flow, NPSH required) points; empty when only one value is given. */
    public List<Point> npshCurve() {
        return npshCurve;
    }

    /**
     * NPSH required at a flow at the curve's own speed: read from the curve when there is one, else
     * the single value given.
     *
     * @param flow volumetric flow (m³/s)
     * @return NPSH required (m), empty when unknown
     */
    public OptionalDouble npshRequiredAt(double flow) {
        if (npshCurve.isEmpty()) {
            return npshRequired;
        }
        Point first = npshCurve.get(0);
        Point last = npshCurve.get(npshCurve.size() - 1);
        if (flow <= first.flow()) {
            return OptionalDouble.of(first.head());
        }
        if (flow >= last.flow()) {
            return OptionalDouble.of(last.head());
        }
        for (int i = 1; i < npshCurve.size(); i++) {
            Point b = npshCurve.get(i);
            if (flow <= b.flow()) {
                Point a = npshCurve.get(i - 1);
                double t = (flow - a.flow()) / (b.flow() - a.flow());
                return OptionalDouble.of(a.head() + t * (b.head() - a.head()));
            }
        }
        return OptionalDouble.of(last.head());
    }

    /** Whether a flow lies outside the NPSH-required curve's points (the end value was held). */
    public boolean npshRequiredOutsideCurve(double flow) {
        return !npshCurve.isEmpty()
                && (flow < npshCurve.get(0).flow() * (1 - 1e-12)
                        || flow > npshCurve.get(npshCurve.size() - 1).flow() * (1 + 1e-12));
    }

    /**
     * Fits a quadratic to the points.
     *
     * @param name pump name for messages
     * @param points at least three (flow, head) points, flows ascending, heads positive
     * @param npshRequired NPSH required by the pump at duty (m), empty if unknown
     */
    public static PumpCurve fit(String name, List<Point> points, OptionalDouble npshRequired) {
        return fit(name, points, 2, npshRequired);
    }

    /**
     * Fits a polynomial of the given degree to the points.
     *
     * @param degree 1, 2 or 3
     */
    public static PumpCurve fit(String name, List<Point> points, int degree, OptionalDouble npshRequired) {
        if (degree < 1 || degree > 3) {
            throw new InputException("pump.degree", "must be 1, 2 or 3, got " + degree);
        }
        if (points.size() < degree + 1) {
            throw new InputException(
                    "pump.points",
                    "a degree-" + degree + " curve needs at least " + (degree + 1) + " points, got " + points.size());
        }
        double previous = -1;
        for (int i = 0; i < points.size(); i++) {
            Point p = points.get(i);
            String where = "pump.points[" + i + "]";
            InputException.requireNonNegative(where + ".flow", p.flow());
            InputException.requireFinite(where + ".head", p.head());
            if (p.head() < 0) {
                throw new InputException(where + ".head", "must not be negative, got " + p.head() + " m");
            }
            if (p.flow() <= previous) {
                throw new InputException(
                        where + ".flow",
                        "flows must increase from point to point, got " + p.flow() + " m³/s after " + previous
                                + " m³/s");
            }
            previous = p.flow();
        }
        if (npshRequired.isPresent()) {
            InputException.requireNonNegative("pump.npshRequired", npshRequired.getAsDouble());
        }
        int n = points.size();
        // Scale flow to the largest point so that the Vandermonde columns are of similar size.
        double scale = points.get(n - 1).flow();
        double[][] a = new double[n][degree + 1];
        double[] h = new double[n];
        for (int i = 0; i < n; i++) {
            double x = points.get(i).flow() / scale;
            double xp = 1;
            for (int j = 0; j <= degree; j++) {
                a[i][j] = xp;
                xp *= x;
            }
            h[i] = points.get(i).head();
        }
        RealVector solution;
        try {
            solution = new QRDecomposition(new Array2DRowRealMatrix(a, false))
                    .getSolver()
                    .solve(new ArrayRealVector(h, false));
        } catch (org.apache.commons.math3.linear.SingularMatrixException e) {
            throw new InputException(
                    "pump.points", "the points do not determine a curve: their flows are too close together");
        }
        double[] coefficients = new double[degree + 1];
        double factor = 1;
        for (int j = 0; j <= degree; j++) {
            coefficients[j] = solution.getEntry(j) / factor;
            factor *= scale;
        }
        double mean = 0;
        for (double v : h) {
            mean += v / n;
        }
        double ssTot = 0;
        double ssRes = 0;
        for (int i = 0; i < n; i++) {
            double r = h[i] - evaluate(coefficients, points.get(i).flow());
            ssRes += r * r;
            ssTot += (h[i] - mean) * (h[i] - mean);
        }
        double r2 = ssTot == 0 ? 1.0 : 1.0 - ssRes / ssTot;
        for (double c : coefficients) {
            if (!Double.isFinite(c)) {
                throw new InputException(
                        "pump.points", "the points do not determine a curve: their flows span too small a range");
            }
        }
        return new PumpCurve(name, List.copyOf(points), coefficients, r2, npshRequired);
    }

    private static double evaluate(double[] c, double q) {
        double sum = 0;
        for (int j = c.length - 1; j >= 0; j--) {
            sum = sum * q + c[j];
        }
        return sum;
    }

    /**
     * Head from the fitted curve.
     *
     * @param flow volumetric flow (m³/s)
     * @return head (m); may be negative beyond run-out
     */
    public double head(double flow) {
        return evaluate(coefficients, flow);
    }

    /** Fitted coefficients a₀, a₁, … of H(Q) in SI (m, m/(m³/s), …). */
    public double[] coefficients() {
        return coefficients.clone();
    }

    /** Coefficient of determination of the fit (ratio). */
    public double rSquared() {
        return rSquared;
    }

    /** The maker's points. */
    public List<Point> points() {
        return points;
    }

    /** Largest flow among the points (m³/s). */
    public double maximumDataFlow() {
        return points.get(points.size() - 1).flow();
    }

    /** NPSH required (m), if given. */
    public OptionalDouble npshRequired() {
        return npshRequired;
    }

    /** Name of the pump. */
    public String name() {
        return name;
    }
}
