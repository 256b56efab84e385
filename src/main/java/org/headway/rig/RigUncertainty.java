package org.headway.rig;

import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;

/**
 * The standard uncertainty of every input of a rig analysis. The inputs are taken as uncorrelated.
 * Density and viscosity are the property model's own uncertainty; their change with an uncertain
 * temperature is carried separately through {@link RigFluidProperties}' temperature slopes.
 *
 * @param flow of each measured volumetric flow (m³/s or ratio)
 * @param pressureDrop of each measured pressure drop (Pa or ratio)
 * @param temperature of each measured or stated temperature (K)
 * @param innerDiameter of the bore (m or ratio)
 * @param tapSpacing of the length between the pressure taps (m or ratio)
 * @param density of the fluid density at a point (kg/m³ or ratio)
 * @param viscosity of the fluid viscosity at a point (Pa·s or ratio)
 */
public record RigUncertainty(
        InstrumentUncertainty flow,
        InstrumentUncertainty pressureDrop,
        InstrumentUncertainty temperature,
        InstrumentUncertainty innerDiameter,
        InstrumentUncertainty tapSpacing,
        InstrumentUncertainty density,
        InstrumentUncertainty viscosity) {

    /** Nothing stated: expanded uncertainties come out as zero. */
    public static final RigUncertainty NONE = new RigUncertainty(
            InstrumentUncertainty.NONE,
            InstrumentUncertainty.NONE,
            InstrumentUncertainty.NONE,
            InstrumentUncertainty.NONE,
            InstrumentUncertainty.NONE,
            InstrumentUncertainty.NONE,
            InstrumentUncertainty.NONE);

    public RigUncertainty {
        Objects.requireNonNull(flow, "flow");
        Objects.requireNonNull(pressureDrop, "pressureDrop");
        Objects.requireNonNull(temperature, "temperature");
        Objects.requireNonNull(innerDiameter, "innerDiameter");
        Objects.requireNonNull(tapSpacing, "tapSpacing");
        Objects.requireNonNull(density, "density");
        Objects.requireNonNull(viscosity, "viscosity");
    }

    /**
     * Builds from a map, missing sources taken as not stated.
     *
     * @param bySource stated uncertainties
     * @return the full set
     */
    public static RigUncertainty of(Map<UncertaintySource, InstrumentUncertainty> bySource) {
        Map<UncertaintySource, InstrumentUncertainty> m = new EnumMap<>(UncertaintySource.class);
        m.putAll(bySource);
        return new RigUncertainty(
                m.getOrDefault(UncertaintySource.FLOW, InstrumentUncertainty.NONE),
                m.getOrDefault(UncertaintySource.PRESSURE_DROP, InstrumentUncertainty.NONE),
                m.getOrDefault(UncertaintySource.TEMPERATURE, InstrumentUncertainty.NONE),
                m.getOrDefault(UncertaintySource.INNER_DIAMETER, InstrumentUncertainty.NONE),
                m.getOrDefault(UncertaintySource.TAP_SPACING, InstrumentUncertainty.NONE),
                m.getOrDefault(UncertaintySource.DENSITY, InstrumentUncertainty.NONE),
                m.getOrDefault(UncertaintySource.VISCOSITY, InstrumentUncertainty.NONE));
    }

    /** The stated uncertainty of one source. */
    public InstrumentUncertainty of(UncertaintySource source) {
        return switch (source) {
            case FLOW -> flow;
            case PRESSURE_DROP -> pressureDrop;
            case TEMPERATURE -> temperature;
            case INNER_DIAMETER -> innerDiameter;
            case TAP_SPACING -> tapSpacing;
            case DENSITY -> density;
            case VISCOSITY -> viscosity;
        };
    }

    /** Whether anything at all is stated. */
    public boolean isStated() {
        for (UncertaintySource s : UncertaintySource.values()) {
            if (of(s).isStated()) {
                return true;
            }
        }
        return false;
    }
}
