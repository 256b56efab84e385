package org.headway.friction;

import java.util.List;
import org.headway.caution.Caution;

/**
 * Darcy friction factor at one point, with how it was obtained.
 *
 * @param frictionFactor Darcy friction factor f (ratio), finite and positive
 * @param reynolds Reynolds number it was evaluated at (ratio)
 * @param relativeRoughness ε/D it was evaluated at (ratio)
 * @param regime flow regime at this Reynolds number
 * @param method id of the correlation actually used (for {@code auto}, the one chosen)
 * @param iterations iterations of an implicit solve, 0 for an explicit formula
 * @param cautions what a reviewer should know (outside validity range, transitional flow…)
 */
public record FrictionResult(
        double frictionFactor,
        double reynolds,
        double relativeRoughness,
        FlowRegime regime,
        String method,
        int iterations,
        List<Caution> cautions) {

    public FrictionResult {
        cautions = List.copyOf(cautions);
    }
}
