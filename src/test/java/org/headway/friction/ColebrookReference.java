package org.headway.friction;

/**
 * An independent Colebrook–White solve for tests: plain fixed-point iteration of
 * x ← −2 log₁₀(ε/(3.7 D) + 2.51 x/Re), which contracts by a factor (2/ln 10)/x &lt; 0.3 a step in
 * turbulent flow, so 200 steps reach the double-precision fixed point. Slow and simple on purpose.
 */
final class ColebrookReference {

    private ColebrookReference() {}

    static double inverseRoot(double reynolds, double relativeRoughness) {
        double x = 8.0;
        for (int i = 0; i < 200; i++) {
            x = -2.0 * Math.log10(relativeRoughness / 3.7 + 2.51 * x / reynolds);
        }
        return x;
    }

    static double frictionFactor(double reynolds, double relativeRoughness) {
        double x = inverseRoot(reynolds, relativeRoughness);
        return 1.0 / (x * x);
    }
}
