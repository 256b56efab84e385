package org.headway.friction;

/**
 * Churchill's single equation for the Darcy friction factor across laminar, transitional and
 * turbulent flow.
 *
 * <p>Equation: f = 8 [(8/Re)¹² + (A + B)^(−3/2)]^(1/12), A = [2.457 ln(1/((7/Re)^0.9 + 0.27 ε/D))]¹⁶,
 * B = (37530/Re)¹⁶; f the Darcy friction factor (ratio), ε the roughness (m), D the bore (m), Re the
 * Reynolds number (ratio). Evaluated as f = (64/Re)·[1 + (Re/8)¹² (A + B)^(−3/2)]^(1/12) below
 * Re = 1, the same expression rearranged, so that (8/Re)¹² cannot overflow.
 *
 * <p>Validity: all regimes up to Re = 1e8, 0 ≤ ε/D ≤ 0.05 (from memory). In the transitional range
 * its value is an interpolation chosen by the author, not a measurement. Accuracy against
 * Colebrook–White in turbulent flow: no band stated that we can cite; we measure up to 3.2 % over
 * 4000 ≤ Re ≤ 1e8, 1e-6 ≤ ε/D ≤ 0.05 (test {@code Churchill1977Test}).
 *
 * <p>Citation: S. W. Churchill, "Friction-factor equation spans all fluid-flow regimes", Chemical
 * Engineering 84(24), 1977, 91–92.
 */
public final class Churchill1977 implements FrictionCorrelation {

    /** Leading factor and laminar numerator 8 (ratio). */
    public static final double EIGHT = 8.0;

    /** Exponent 12 of the laminar term and root 1/12 of the sum (ratio). */
    public static final double BLEND_EXPONENT = 12.0;

    /** Coefficient 2.457 of the logarithm in A (ratio). */
    public static final double A_LOG_COEFFICIENT = 2.457;

    /** Numerator 7 of the viscous term inside A (ratio). */
    public static final double A_VISCOUS_NUMERATOR = 7.0;

    /** Exponent 0.9 of the viscous term inside A (ratio). */
    public static final double A_VISCOUS_EXPONENT = 0.9;

    /** Roughness coefficient 0.27 inside A (ratio). */
    public static final double A_ROUGHNESS_COEFFICIENT = 0.27;

    /** Exponent 16 of A and B (ratio). */
    public static final double TURBULENT_EXPONENT = 16.0;

    /** Numerator 37530 of B (ratio). */
    public static final double B_NUMERATOR = 37530.0;

    /** Exponent −3/2 of (A + B) (ratio). */
    public static final double SUM_EXPONENT = -1.5;

    private static final ValidityRange VALIDITY =
            new ValidityRange(0.0, 1e8, 0.0, 0.05, "Churchill (1977), all flow regimes, from memory");

    @Override
    public String id() {
        return "churchill";
    }

    @Override
    public String displayName() {
        return "Churchill (1977)";
    }

    @Override
    public String citation() {
        return "S. W. Churchill, Friction-factor equation spans all fluid-flow regimes, Chemical Engineering"
                + " 84(24), 1977, 91–92";
    }

    @Override
    public String equation() {
        return "f = 8 [(8/Re)¹² + (A + B)^(−3/2)]^(1/12), A = [2.457 ln(1/((7/Re)^0.9 + 0.27 ε/D))]¹⁶,"
                + " B = (37530/Re)¹⁶";
    }

    @Override
    public ValidityRange validity() {
        return VALIDITY;
    }

    @Override
    public FrictionResult evaluate(double reynolds, double relativeRoughness) {
        return FrictionChecks.explicitResult(
                this, reynolds, relativeRoughness, frictionFactor(reynolds, relativeRoughness));
    }

    @Override
    public double frictionFactor(double reynolds, double relativeRoughness) {
        FrictionChecks.requireValid(reynolds, relativeRoughness);
        double logTerm = A_LOG_COEFFICIENT
                * Math.log(1.0
                        / (Math.pow(A_VISCOUS_NUMERATOR / reynolds, A_VISCOUS_EXPONENT)
                                + A_ROUGHNESS_COEFFICIENT * relativeRoughness));
        double a = Math.pow(logTerm, TURBULENT_EXPONENT);
        double b = Math.pow(B_NUMERATOR / reynolds, TURBULENT_EXPONENT);
        double turbulent = Math.pow(a + b, SUM_EXPONENT);
        double f;
        if (reynolds < 1.0) {
            double ratio = Math.pow(reynolds / EIGHT, BLEND_EXPONENT) * turbulent;
            f = EIGHT * (EIGHT / reynolds) * Math.pow(1.0 + ratio, 1.0 / BLEND_EXPONENT);
        } else {
            f = EIGHT * Math.pow(Math.pow(EIGHT / reynolds, BLEND_EXPONENT) + turbulent, 1.0 / BLEND_EXPONENT);
        }
        return FrictionChecks.requireUsable(displayName(), f, reynolds, relativeRoughness);
    }

    /**
     * True: as Re → 0 the (8/Re)¹² term dominates the sum and f → 8 · 8/Re = 64/Re, the laminar law,
     * so a pipe's head loss is proportional to flow as the flow tends to zero.
     */
    @Override
    public boolean laminarAtLowReynolds() {
        return true;
    }
}
