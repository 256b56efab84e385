package org.headway.pipe;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;

/**
 * A fitting or valve with its loss-coefficient method (fixed K, 2-K or 3-K).
 *
 * <p>{@link #lossCoefficient} gives K referred to the velocity in the pipe the fitting sits in.
 */
public interface Fitting {

    /** Stable id used in project files, e.g. {@code elbow-90-standard}. */
    String id();

    /** Plain-words description. */
    String description();

    /** Method name, e.g. "fixed K", "2-K (Hooper 1981)", "3-K (Darby 2001)". */
    String method();

    /** Source of the coefficients (publication, table). */
    String source();

    /**
     * Loss coefficient.
     *
     * @param reynolds Reynolds number in the pipe (ratio), positive
     * @param innerDiameter pipe inner diameter (m), positive
     * @return K (ratio), finite and non-negative
     */
    double lossCoefficient(double reynolds, double innerDiameter);

    /**
     * What a reviewer should know about using this fitting's K at the given conditions, e.g. a
     * fixed K used in laminar flow. Empty when the conditions lie inside the method's stated range.
     *
     * @param reynolds Reynolds number in the pipe (ratio), positive
     * @param innerDiameter pipe inner diameter (m), positive
     * @return cautions, possibly empty, never null
     */
    default List<Caution> cautions(double reynolds, double innerDiameter) {
        return List.of();
    }

    /**
     * Slope of K with Reynolds number at fixed bore, dK/dRe, for the exact derivative of a pipe's
     * head loss with flow. The default is a fourth-order centred difference with step 10⁻⁴ Re;
     * the catalog methods override it with their closed form.
     *
     * @param reynolds Reynolds number in the pipe (ratio), positive
     * @param innerDiameter pipe inner diameter (m), positive
     * @return dK/dRe (per unit Reynolds number)
     */
    default double lossCoefficientSlope(double reynolds, double innerDiameter) {
        double h = 1e-4 * reynolds;
        return (-lossCoefficient(reynolds + 2 * h, innerDiameter)
                        + 8 * lossCoefficient(reynolds + h, innerDiameter)
                        - 8 * lossCoefficient(reynolds - h, innerDiameter)
                        + lossCoefficient(reynolds - 2 * h, innerDiameter))
                / (12 * h);
    }

    /**
     * The part of K that varies as 1/Re (K₁ of the 2-K and 3-K methods), which makes the fitting's
     * loss proportional to flow as the flow tends to zero; 0 for a fixed K.
     *
     * @return K₁ (ratio)
     */
    default double laminarCoefficient() {
        return 0;
    }

    /**
     * The same fitting in a pipe of the given nominal size. Only methods published on the nominal
     * size (Darby's 3-K) use it; the others return themselves.
     *
     * @param nominalDiameter nominal diameter of the pipe (m; NPS × 0.0254, DN × 0.001), empty when
     *     unknown
     * @return the fitting bound to that size
     */
    default Fitting atNominalSize(OptionalDouble nominalDiameter) {
        return this;
    }
}
