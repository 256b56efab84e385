package org.headway.rig;

/**
 * First-order propagation of input uncertainties to Re and f at a rig point.
 *
 * <p>Model: V = 4Q/(πD²); Re = ρVD/μ = 4ρQ/(πμD); f = 2ΔpD/(ρV²L) = π²ΔpD⁵/(8ρQ²L), with Q the
 * flow (m³/s), Δp the pressure drop between taps (Pa), D the bore (m), L the tap spacing (m), ρ the
 * density (kg/m³), μ the viscosity (Pa·s). Both are products of powers, so the relative sensitivity
 * coefficients are the exponents: for f, Δp +1, D +5, ρ −1, Q −2, L −1; for Re, ρ +1, Q +1, μ −1,
 * D −1. A temperature uncertainty u(T) acts through the fluid property model: its relative
 * sensitivities are −(dρ/dT)/ρ for f and (dρ/dT)/ρ − (dμ/dT)/μ for Re (K⁻¹).
 *
 * <p>The combined relative standard uncertainty is u_c(y)/y = √(Σ (cᵢ·uᵢ/xᵢ)²), the law of
 * propagation of uncertainty for uncorrelated inputs (JCGM 100:2008, Evaluation of measurement
 * data — Guide to the expression of uncertainty in measurement (ISO/IEC Guide 98-3), 5.1.2, Eq.
 * (10), in its relative form 5.1.6, Eq. (12)); the expanded uncertainty is U = k·u_c with k = 2
 * (GUM 6.2.1, 6.3.3; ASME PTC 19.1-2018, Test Uncertainty, uses the same first-order sensitivity
 * form and a 95 % expanded uncertainty — from memory). Accuracy: first order; against a Monte Carlo
 * propagation (JCGM 101:2008) the standard uncertainties agree within 2 % for relative input
 * uncertainties up to a few per cent (tested). Because f goes as D⁵, a diameter uncertainty of
 * 0.2 % alone gives 1 % in f.
 */
public final class RigUncertaintyPropagation {

    /** Coverage factor for about 95 % coverage of a normal distribution (ratio). */
    public static final double COVERAGE_FACTOR = 2.0;

    /** Exponent of Δp in f (ratio). */
    static final double FRICTION_PRESSURE_EXPONENT = 1.0;
    /** Exponent of D in f (ratio). */
    static final double FRICTION_DIAMETER_EXPONENT = 5.0;
    /** Exponent of ρ in f (ratio). */
    static final double FRICTION_DENSITY_EXPONENT = -1.0;
    /** Exponent of Q in f (ratio). */
    static final double FRICTION_FLOW_EXPONENT = -2.0;
    /** Exponent of L in f (ratio). */
    static final double FRICTION_LENGTH_EXPONENT = -1.0;

    private static final UncertaintySource[] SOURCES = UncertaintySource.values();

    private RigUncertaintyPropagation() {}

    /**
     * Relative variance contributions (cᵢuᵢ/xᵢ)² of every source to f and to Re, indexed by {@link
     * UncertaintySource#ordinal()}.
     *
     * @param point the point
     * @param description the rig
     * @param frictionShares receives the contributions to (u(f)/f)² (ratio), length 7
     * @param reynoldsShares receives the contributions to (u(Re)/Re)² (ratio), length 7
     */
    static void contributions(
            RigPoint point, RigDescription description, double[] frictionShares, double[] reynoldsShares) {
        RigUncertainty u = description.uncertainty();
        RigFluidProperties fluid = point.fluid();
        double uq = u.flow().relativeAt(point.flow());
        double udp = u.pressureDrop().relativeAt(point.pressureDrop());
        double ud = u.innerDiameter().relativeAt(description.innerDiameter());
        double ul = u.tapSpacing().relativeAt(description.tapSpacing());
        double urho = u.density().relativeAt(fluid.density());
        double umu = u.viscosity().relativeAt(fluid.dynamicViscosity());
        // Temperature acts through the property model; without a temperature it has no effect.
        double ut = point.temperature().isPresent()
                ? u.temperature().relativeAt(point.temperature().getAsDouble())
                        * point.temperature().getAsDouble()
                : 0.0;
        double rhoPerKelvin = fluid.densityTemperatureSlope() / fluid.density();
        double muPerKelvin = fluid.viscosityTemperatureSlope() / fluid.dynamicViscosity();

        frictionShares[UncertaintySource.FLOW.ordinal()] = square(FRICTION_FLOW_EXPONENT * uq);
        frictionShares[UncertaintySource.PRESSURE_DROP.ordinal()] = square(FRICTION_PRESSURE_EXPONENT * udp);
        frictionShares[UncertaintySource.TEMPERATURE.ordinal()] = square(FRICTION_DENSITY_EXPONENT * rhoPerKelvin * ut);
        frictionShares[UncertaintySource.INNER_DIAMETER.ordinal()] = square(FRICTION_DIAMETER_EXPONENT * ud);
        frictionShares[UncertaintySource.TAP_SPACING.ordinal()] = square(FRICTION_LENGTH_EXPONENT * ul);
        frictionShares[UncertaintySource.DENSITY.ordinal()] = square(FRICTION_DENSITY_EXPONENT * urho);
        frictionShares[UncertaintySource.VISCOSITY.ordinal()] = 0.0;

        reynoldsShares[UncertaintySource.FLOW.ordinal()] = square(uq);
        reynoldsShares[UncertaintySource.PRESSURE_DROP.ordinal()] = 0.0;
        reynoldsShares[UncertaintySource.TEMPERATURE.ordinal()] = square((rhoPerKelvin - muPerKelvin) * ut);
        reynoldsShares[UncertaintySource.INNER_DIAMETER.ordinal()] = square(ud);
        reynoldsShares[UncertaintySource.TAP_SPACING.ordinal()] = 0.0;
        reynoldsShares[UncertaintySource.DENSITY.ordinal()] = square(urho);
        reynoldsShares[UncertaintySource.VISCOSITY.ordinal()] = square(umu);
    }

    static PointUncertainty summarise(double[] fShares, double[] reShares, double reynolds, double frictionFactor) {
        double fVariance = 0;
        double reVariance = 0;
        int fDominant = 0;
        int reDominant = 0;
        for (int i = 0; i < SOURCES.length; i++) {
            fVariance += fShares[i];
            reVariance += reShares[i];
            if (fShares[i] > fShares[fDominant]) {
                fDominant = i;
            }
            if (reShares[i] > reShares[reDominant]) {
                reDominant = i;
            }
        }
        double fRelative = Math.sqrt(fVariance);
        double reRelative = Math.sqrt(reVariance);
        double share = fVariance > 0 ? fShares[fDominant] / fVariance : 0.0;
        return new PointUncertainty(
                reRelative,
                fRelative,
                COVERAGE_FACTOR,
                COVERAGE_FACTOR * reRelative * reynolds,
                COVERAGE_FACTOR * fRelative * frictionFactor,
                SOURCES[fDominant],
                share,
                SOURCES[reDominant]);
    }

    private static double square(double x) {
        return x * x;
    }
}
