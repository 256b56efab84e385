package org.headway.pipe;

import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * A change of bore at a pipe's outlet, to the bore of whatever follows — a reducer or an enlarger
 * written as one of the pipe's fittings — with the loss of {@link Transitions} referred to the
 * velocity in this pipe: K_pipe = K_ref (D/d_ref)⁴, so h = K_pipe V²/(2 g) with V this pipe's mean
 * velocity.
 *
 * <p>Enlargement (d &gt; D): Borda–Carnot K = (1 − β²)², β = D/d, or Crane TP-410's gradual form for a
 * cone; it is already referred to this (upstream) pipe. Contraction (d &lt; D): Crane TP-410, K = 0.5
 * (1 − β²) √sin(θ/2) or 0.8 sin(θ/2)(1 − β²), β = d/D, referred to the smaller bore and converted.
 * Turbulent-flow forms; a caution below Re 10⁴ in the smaller bore.
 *
 * @param id the fitting id as written ({@code bore-change})
 * @param outletDiameter bore after the change d (m), positive
 * @param includedAngle total included cone angle θ (rad), 0 &lt; θ ≤ π; π for a sudden change
 */
public record BoreChange(String id, double outletDiameter, double includedAngle) implements Fitting {

    /** The kind a project file and the fittings text use for it. */
    public static final String KIND = "bore-change";

    public BoreChange {
        InputException.requirePositive("toDiameter", outletDiameter);
        InputException.requireFinite("includedAngleDegrees", includedAngle);
        if (!(includedAngle > 0 && includedAngle <= Math.PI)) {
            throw new InputException(
                    "includedAngleDegrees",
                    "the included cone angle must lie in (0°, 180°], got " + Math.toDegrees(includedAngle) + "°");
        }
    }

    /** The transition from a pipe of the given bore to {@link #outletDiameter}. */
    public TransitionLoss transition(double innerDiameter) {
        if (outletDiameter >= innerDiameter) {
            return includedAngle == Math.PI
                    ? Transitions.suddenExpansion(innerDiameter, outletDiameter)
                    : Transitions.gradualExpansion(innerDiameter, outletDiameter, includedAngle);
        }
        return Transitions.gradualContraction(innerDiameter, outletDiameter, includedAngle);
    }

    @Override
    public String description() {
        return String.format(
                Locale.ROOT,
                "bore change at the outlet to %.4g mm%s",
                outletDiameter * 1000.0,
                includedAngle == Math.PI
                        ? ", sudden"
                        : String.format(Locale.ROOT, ", cone %.3g°", Math.toDegrees(includedAngle)));
    }

    @Override
    public String method() {
        return "diameter change, referred to this pipe's velocity";
    }

    @Override
    public String source() {
        return Transitions.BORDA_CARNOT + "; " + Transitions.CRANE_TP410;
    }

    @Override
    public double lossCoefficient(double reynolds, double innerDiameter) {
        return transition(innerDiameter).lossCoefficientReferredTo(ReferenceSection.UPSTREAM);
    }

    @Override
    public double lossCoefficientSlope(double reynolds, double innerDiameter) {
        return 0;
    }

    @Override
    public List<Caution> cautions(double reynolds, double innerDiameter) {
        // Re scales as 1/d at a fixed flow
        double smallBore = Math.min(innerDiameter, outletDiameter);
        return Transitions.cautions(reynolds * innerDiameter / smallBore);
    }
}
