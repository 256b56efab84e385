package org.headway.units;

/** The kinds of quantity Headway reads and writes, each with its SI unit in the core. */
public enum QuantityKind {
    LENGTH("length", "m"),
    DIAMETER("length", "m"),
    ROUGHNESS("length", "m"),
    VOLUMETRIC_FLOW("volumetric flow", "m³/s"),
    VELOCITY("velocity", "m/s"),
    PRESSURE("pressure", "Pa"),
    HEAD("length", "m"),
    TEMPERATURE("temperature", "K"),
    DENSITY("density", "kg/m³"),
    DYNAMIC_VISCOSITY("dynamic viscosity", "Pa·s"),
    KINEMATIC_VISCOSITY("kinematic viscosity", "m²/s"),
    DIMENSIONLESS("dimensionless", "");

    private final String dimensionName;
    private final String siSymbol;

    QuantityKind(String dimensionName, String siSymbol) {
        this.dimensionName = dimensionName;
        this.siSymbol = siSymbol;
    }

    /** Name of the physical dimension in plain words, e.g. "volumetric flow". */
    public String dimensionName() {
        return dimensionName;
    }

    /** Symbol of the SI unit the core uses for this kind. */
    public String siSymbol() {
        return siSymbol;
    }
}
