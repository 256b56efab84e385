package org.headway.friction;

import java.util.ArrayList;
import java.util.List;
import org.headway.caution.Caution;

/**
 * The default method: picks the friction factor by flow regime.
 *
 * <p>Laminar (Re &lt; 2300): f = 64/Re ({@link HagenPoiseuille}). Turbulent (Re ≥ 4000): the
 * Colebrook–White equation ({@link Colebrook1939}). Transitional (2300 ≤ Re &lt; 4000): a straight
 * line in Re from the laminar value at Re = 2300 to the Colebrook–White value at Re = 4000,
 * f = f_lam(2300) + (Re − 2300)/(4000 − 2300) · (f_CW(4000) − f_lam(2300)).
 *
 * <p>Why a straight line: it is continuous at both limits, so a system-curve or operating-point
 * solve never meets a jump, and it rises monotonically through the range as measured friction
 * factors do (common practice, no source). It is not the conservative choice: the turbulent branch extended down
 * (Colebrook–White at the same Re) is larger: at Re = 2300 by
 * 70 % for smooth pipes and 190 % at ε/D = 0.05 (computed here). That value is
 * therefore stated in the "transitional-flow" caution so that a reviewer can design against it.
 * Both limits are "common practice, no source" (see {@link FlowRegimes}).
 */
public final class AutoFriction implements FrictionCorrelation {

    /** Method id reported for a point in the transitional range. */
    public static final String TRANSITIONAL_METHOD = "transitional-blend";

    private static final HagenPoiseuille LAMINAR = new HagenPoiseuille();

    private static final ValidityRange VALIDITY = new ValidityRange(
            0.0,
            1e8,
            0.0,
            FrictionChecks.CHART_MAX_RELATIVE_ROUGHNESS,
            "laminar: exact; turbulent: range of the Moody (1944) chart for Colebrook–White, common practice;"
                    + " transitional: interpolated, " + FlowRegimes.BASIS);

    private final Colebrook1939 colebrook;

    /** Auto selection with the default Colebrook–White solver. */
    public AutoFriction() {
        this(Colebrook1939.solver());
    }

    /**
     * Auto selection with a given Colebrook–White solver.
     *
     * @param colebrook solver for the turbulent branch
     */
    public AutoFriction(Colebrook1939 colebrook) {
        this.colebrook = colebrook;
    }

    @Override
    public String id() {
        return "auto";
    }

    @Override
    public String displayName() {
        return "Auto (laminar 64/Re, Colebrook–White, straight-line blend between Re "
                + Math.round(FlowRegimes.LAMINAR_LIMIT) + " and " + Math.round(FlowRegimes.TURBULENT_LIMIT) + ")";
    }

    @Override
    public String citation() {
        return LAMINAR.citation() + "; " + colebrook.citation() + "; regime limits: " + FlowRegimes.BASIS;
    }

    @Override
    public String equation() {
        return "Re < 2300: f = 64/Re; Re ≥ 4000: " + colebrook.equation()
                + "; between: straight line in Re from f(2300) laminar to f(4000) Colebrook–White";
    }

    @Override
    public ValidityRange validity() {
        return VALIDITY;
    }

    @Override
    public FrictionResult evaluate(double reynolds, double relativeRoughness) {
        FrictionChecks.requireValid(reynolds, relativeRoughness);
        FlowRegime regime = FlowRegimes.of(reynolds);
        if (regime == FlowRegime.LAMINAR) {
            return LAMINAR.evaluate(reynolds, relativeRoughness);
        }
        if (regime == FlowRegime.TURBULENT) {
            return colebrook.evaluate(reynolds, relativeRoughness);
        }
        ColebrookSolution upperEnd = colebrook.solve(FlowRegimes.TURBULENT_LIMIT, relativeRoughness);
        double f = blend(reynolds, upperEnd.frictionFactor());
        double turbulentBranch = colebrook.frictionFactor(reynolds, relativeRoughness);
        double laminarBranch = HagenPoiseuille.LAMINAR_CONSTANT / reynolds;
        List<Caution> cautions = new ArrayList<>(2);
        cautions.add(FrictionChecks.transitional(
                reynolds,
                "; used " + FrictionChecks.format(f) + " (straight line between the laminar value at Re 2300 and"
                        + " Colebrook–White at Re 4000); at this Re the laminar law gives "
                        + FrictionChecks.format(laminarBranch) + " and Colebrook–White "
                        + FrictionChecks.format(turbulentBranch) + " (the conservative value for head loss)"));
        if (relativeRoughness > FrictionChecks.CHART_MAX_RELATIVE_ROUGHNESS) {
            cautions.add(FrictionChecks.beyondChart(relativeRoughness));
        }
        return new FrictionResult(
                f, reynolds, relativeRoughness, regime, TRANSITIONAL_METHOD, upperEnd.iterations(), cautions);
    }

    @Override
    public double frictionFactor(double reynolds, double relativeRoughness) {
        FrictionChecks.requireValid(reynolds, relativeRoughness);
        if (reynolds < FlowRegimes.LAMINAR_LIMIT) {
            return LAMINAR.frictionFactor(reynolds, relativeRoughness);
        }
        if (reynolds >= FlowRegimes.TURBULENT_LIMIT) {
            return colebrook.frictionFactor(reynolds, relativeRoughness);
        }
        return blend(reynolds, colebrook.frictionFactor(FlowRegimes.TURBULENT_LIMIT, relativeRoughness));
    }

    private static double blend(double reynolds, double turbulentEnd) {
        double laminarEnd = HagenPoiseuille.LAMINAR_CONSTANT / FlowRegimes.LAMINAR_LIMIT;
        double share =
                (reynolds - FlowRegimes.LAMINAR_LIMIT) / (FlowRegimes.TURBULENT_LIMIT - FlowRegimes.LAMINAR_LIMIT);
        return laminarEnd + share * (turbulentEnd - laminarEnd);
    }

    /**
     * df/dRe of the branch in use: −64/Re² below Re 2300, the slope of the straight-line blend
     * between 2300 and 4000, Colebrook–White's implicit slope above. At the two limits the slope
     * jumps (the blend is continuous, not smooth); the value of the branch that holds there is
     * returned.
     */
    @Override
    public double frictionFactorSlope(double reynolds, double relativeRoughness) {
        FrictionChecks.requireValid(reynolds, relativeRoughness);
        if (reynolds < FlowRegimes.LAMINAR_LIMIT) {
            return LAMINAR.frictionFactorSlope(reynolds, relativeRoughness);
        }
        if (reynolds >= FlowRegimes.TURBULENT_LIMIT) {
            return colebrook.frictionFactorSlope(reynolds, relativeRoughness);
        }
        double laminarEnd = HagenPoiseuille.LAMINAR_CONSTANT / FlowRegimes.LAMINAR_LIMIT;
        double turbulentEnd = colebrook.frictionFactor(FlowRegimes.TURBULENT_LIMIT, relativeRoughness);
        return (turbulentEnd - laminarEnd) / (FlowRegimes.TURBULENT_LIMIT - FlowRegimes.LAMINAR_LIMIT);
    }

    @Override
    public boolean laminarAtLowReynolds() {
        return true;
    }
}
