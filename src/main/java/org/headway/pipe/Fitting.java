package org.headway.pipe;

import java.util.List;
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
}
