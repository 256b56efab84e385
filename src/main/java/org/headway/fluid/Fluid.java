package org.headway.fluid;

/** A liquid whose properties Headway can evaluate. */
public interface Fluid {

    /** Stable id used on the command line and in project files, e.g. {@code water}, {@code seawater}. */
    String id();

    /** Plain-words name, e.g. "Water (IAPWS)". */
    String displayName();

    /**
     * Properties at a state. Outside the model's range: an {@link org.headway.caution.InputException}
     * when no sensible value exists (frozen, boiling at this pressure), a caution when the value is
     * an extrapolation.
     *
     * @param temperature temperature (K)
     * @param pressure absolute pressure (Pa)
     * @return the state with sources and cautions
     */
    FluidState state(double temperature, double pressure);
}
