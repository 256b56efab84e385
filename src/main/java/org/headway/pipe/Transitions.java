package org.headway.pipe;

import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * Loss coefficients of sudden and gradual changes of pipe diameter in turbulent flow.
 *
 * <p>All formulas use β = d_small/d_large (ratio) and give K referred to the velocity in the
 * smaller pipe: the upstream pipe for an expansion, the downstream pipe for a contraction (each
 * result says so in {@link TransitionLoss#referredTo()}). K does not depend on Reynolds number in
 * these forms; they are meant for turbulent flow (Re above about 10⁴, common practice, no source).
 * Angles are the total included angle of the cone, in radians, 0 &lt; θ ≤ π (θ = π is a sudden
 * change).
 *
 * <p>Sources: Borda–Carnot (momentum and energy balance across a sudden expansion, exact for uniform
 * velocity profiles); Crane Co., Flow of Fluids Through Valves, Fittings, and Pipe, Technical Paper
 * No. 410 (1988), p. A-26, "Formulas 1 to 4" for gradual and sudden contractions and enlargements
 * (from memory). The Crane formulas carry no stated accuracy; measured losses scatter by tens of
 * percent around them.
 */
public final class Transitions {

    /** Borda–Carnot citation. */
    public static final String BORDA_CARNOT = "Borda–Carnot sudden-expansion loss, K = (1 − β²)²";
    /** Crane TP-410 citation. */
    public static final String CRANE_TP410 = "Crane TP-410 (1988) p. A-26, from memory";

    /** Reynolds number below which these turbulent-flow forms are flagged (common practice, no source). */
    public static final double TURBULENT_REYNOLDS = 1.0e4;

    private static final double HALF_TURN = Math.PI;
    private static final double CRANE_ANGLE_BREAK = Math.PI / 4.0;

    private Transitions() {}

    /**
     * Sudden expansion (Borda–Carnot): K = (1 − β²)², β = d₁/d₂, referred to the upstream (smaller
     * pipe) velocity. Equivalent to K = (1/β² − 1)² referred to the downstream velocity.
     *
     * @param upstreamDiameter inner diameter before the change d₁ (m), positive
     * @param downstreamDiameter inner diameter after the change d₂ (m), not smaller than d₁
     * @return K referred to the upstream velocity
     */
    public static TransitionLoss suddenExpansion(double upstreamDiameter, double downstreamDiameter) {
        double beta = expansionRatio(upstreamDiameter, downstreamDiameter);
        double opening = 1.0 - beta * beta;
        return new TransitionLoss(
                opening * opening, ReferenceSection.UPSTREAM, upstreamDiameter, downstreamDiameter, BORDA_CARNOT);
    }

    /**
     * Sudden contraction (Crane TP-410 form): K = 0.5 (1 − β²), β = d₂/d₁, referred to the
     * downstream (smaller pipe) velocity. Tends to the sharp-edged entrance value 0.5 as β → 0.
     *
     * @param upstreamDiameter inner diameter before the change d₁ (m), positive
     * @param downstreamDiameter inner diameter after the change d₂ (m), not larger than d₁
     * @return K referred to the downstream velocity
     */
    public static TransitionLoss suddenContraction(double upstreamDiameter, double downstreamDiameter) {
        return gradualContraction(upstreamDiameter, downstreamDiameter, HALF_TURN);
    }

    /**
     * Gradual expansion (Crane TP-410 form), β = d₁/d₂, θ the included cone angle, K referred to the
     * upstream (smaller pipe) velocity:
     *
     * <ul>
     *   <li>θ ≤ 45°: K = 2.6 sin(θ/2) (1 − β²)²
     *   <li>45° &lt; θ ≤ 180°: K = (1 − β²)² (the Borda–Carnot value)
     * </ul>
     *
     * @param upstreamDiameter inner diameter before the change d₁ (m), positive
     * @param downstreamDiameter inner diameter after the change d₂ (m), not smaller than d₁
     * @param includedAngle total included cone angle θ (rad), 0 &lt; θ ≤ π
     * @return K referred to the upstream velocity
     */
    public static TransitionLoss gradualExpansion(
            double upstreamDiameter, double downstreamDiameter, double includedAngle) {
        double beta = expansionRatio(upstreamDiameter, downstreamDiameter);
        requireAngle(includedAngle);
        double opening = 1.0 - beta * beta;
        double k = includedAngle <= CRANE_ANGLE_BREAK
                ? 2.6 * Math.sin(includedAngle / 2.0) * opening * opening
                : opening * opening;
        return new TransitionLoss(
                k,
                ReferenceSection.UPSTREAM,
                upstreamDiameter,
                downstreamDiameter,
                CRANE_TP410 + ", gradual enlargement");
    }

    /**
     * Gradual contraction (Crane TP-410 form), β = d₂/d₁, θ the included cone angle, K referred to
     * the downstream (smaller pipe) velocity:
     *
     * <ul>
     *   <li>θ ≤ 45°: K = 0.8 sin(θ/2) (1 − β²)
     *   <li>45° &lt; θ ≤ 180°: K = 0.5 (1 − β²) √sin(θ/2)
     * </ul>
     *
     * @param upstreamDiameter inner diameter before the change d₁ (m), positive
     * @param downstreamDiameter inner diameter after the change d₂ (m), not larger than d₁
     * @param includedAngle total included cone angle θ (rad), 0 &lt; θ ≤ π
     * @return K referred to the downstream velocity
     */
    public static TransitionLoss gradualContraction(
            double upstreamDiameter, double downstreamDiameter, double includedAngle) {
        InputException.requirePositive("upstreamDiameter", upstreamDiameter);
        InputException.requirePositive("downstreamDiameter", downstreamDiameter);
        if (downstreamDiameter > upstreamDiameter) {
            throw new InputException(
                    "downstreamDiameter",
                    "a contraction needs the downstream diameter (" + downstreamDiameter
                            + " m) not larger than the upstream diameter (" + upstreamDiameter + " m)");
        }
        requireAngle(includedAngle);
        double beta = downstreamDiameter / upstreamDiameter;
        double opening = 1.0 - beta * beta;
        double half = Math.sin(includedAngle / 2.0);
        double k = includedAngle <= CRANE_ANGLE_BREAK ? 0.8 * half * opening : 0.5 * opening * Math.sqrt(half);
        String basis = includedAngle == HALF_TURN
                ? CRANE_TP410 + ", sudden contraction K = 0.5 (1 − β²)"
                : CRANE_TP410 + ", gradual contraction";
        return new TransitionLoss(k, ReferenceSection.DOWNSTREAM, upstreamDiameter, downstreamDiameter, basis);
    }

    /**
     * What a reviewer should know about using these turbulent-flow coefficients at a Reynolds number.
     *
     * @param reynolds Reynolds number in the smaller pipe (ratio), positive
     * @return a warning below {@link #TURBULENT_REYNOLDS}, else empty
     */
    public static List<Caution> cautions(double reynolds) {
        InputException.requirePositive("reynolds", reynolds);
        if (reynolds < TURBULENT_REYNOLDS) {
            return List.of(Caution.warning(
                    "transition-low-reynolds",
                    String.format(
                            Locale.ROOT,
                            "diameter-change K values are turbulent-flow forms; at Re = %.0f the loss depends on Re"
                                    + " and may differ markedly.",
                            reynolds),
                    "common practice, no source"));
        }
        return List.of();
    }

    private static double expansionRatio(double upstreamDiameter, double downstreamDiameter) {
        InputException.requirePositive("upstreamDiameter", upstreamDiameter);
        InputException.requirePositive("downstreamDiameter", downstreamDiameter);
        if (downstreamDiameter < upstreamDiameter) {
            throw new InputException(
                    "downstreamDiameter",
                    "an expansion needs the downstream diameter (" + downstreamDiameter
                            + " m) not smaller than the upstream diameter (" + upstreamDiameter + " m)");
        }
        return upstreamDiameter / downstreamDiameter;
    }

    private static void requireAngle(double includedAngle) {
        InputException.requireFinite("includedAngle", includedAngle);
        if (includedAngle <= 0 || includedAngle > HALF_TURN) {
            throw new InputException(
                    "includedAngle", "the included cone angle must lie in (0, π] rad, got " + includedAngle + " rad");
        }
    }
}
