package org.headway.rig;

/** The inputs of a rig point whose uncertainty is propagated to Re and f. */
public enum UncertaintySource {
    FLOW("flow"),
    PRESSURE_DROP("pressure drop"),
    TEMPERATURE("temperature"),
    INNER_DIAMETER("inner diameter"),
    TAP_SPACING("tap spacing"),
    DENSITY("density"),
    VISCOSITY("viscosity");

    private final String label;

    UncertaintySource(String label) {
        this.label = label;
    }

    /** Plain-words name, e.g. "inner diameter". */
    public String label() {
        return label;
    }
}
