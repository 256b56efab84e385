package org.headway.fluid;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.headway.caution.InputException;

/**
 * The built-in fluids by id, and user fluids of constant properties.
 *
 * <p>Ids: {@code water}; {@code seawater} (35 g/kg) or {@code seawater:S} with S in g/kg; {@code
 * ethylene-glycol-N} and {@code propylene-glycol-N} for N = 20, 30, 40, 50 % by mass (tables in
 * {@code fluids-data/fluids/}); {@code hydraulic-oil-vg46}.
 */
public final class Fluids {

    /** Glycol concentrations with a table, % by mass. */
    public static final List<Integer> GLYCOL_CONCENTRATIONS = List.of(20, 30, 40, 50);

    private static final List<String> GLYCOLS = List.of("ethylene-glycol", "propylene-glycol");
    private static final String RESOURCE_FOLDER = "/fluids-data/fluids/";
    private static final Map<String, TabulatedFluid> TABLES = new ConcurrentHashMap<>();
    private static final Water WATER = new Water();

    private Fluids() {}

    /** Every built-in id, seawater at its default salinity. */
    public static List<String> ids() {
        List<String> ids = new ArrayList<>();
        ids.add(Water.ID);
        ids.add(Seawater.ID);
        for (String glycol : GLYCOLS) {
            for (int c : GLYCOL_CONCENTRATIONS) {
                ids.add(glycol + "-" + c);
            }
        }
        ids.add(MineralOil.isoVg46().id());
        return Collections.unmodifiableList(ids);
    }

    /**
     * @param id a fluid id, e.g. {@code water}, {@code seawater:40}, {@code ethylene-glycol-30}
     * @return the fluid
     * @throws InputException for an unknown id, listing the known ones
     */
    public static Fluid byId(String id) {
        if (id == null || id.isBlank()) {
            throw new InputException("fluid", "a fluid id is required; known: " + String.join(", ", ids()));
        }
        String key = id.strip().toLowerCase(Locale.ROOT);
        if (key.equals(Water.ID)) {
            return WATER;
        }
        if (key.equals(Seawater.ID)) {
            return new Seawater();
        }
        if (key.startsWith(Seawater.ID + ":")) {
            String salinity = key.substring(Seawater.ID.length() + 1);
            double value;
            try {
                value = Double.parseDouble(salinity);
            } catch (NumberFormatException e) {
                throw new InputException(
                        "fluid", "seawater salinity must be a number in g/kg (e.g. seawater:40), got \"" + id + "\"");
            }
            try {
                return new Seawater(value);
            } catch (InputException e) {
                throw e.at("fluid " + id + ", ");
            }
        }
        if (key.equals("hydraulic-oil-vg46")) {
            return MineralOil.isoVg46();
        }
        for (String glycol : GLYCOLS) {
            for (int c : GLYCOL_CONCENTRATIONS) {
                if (key.equals(glycol + "-" + c)) {
                    return TABLES.computeIfAbsent(key, Fluids::loadTable);
                }
            }
        }
        throw new InputException(
                "fluid",
                "unknown fluid \"" + id + "\"; known: " + String.join(", ", ids())
                        + " (seawater:S sets the salinity S in g/kg)");
    }

    /** Every built-in fluid, seawater at 35 g/kg. */
    public static List<Fluid> all() {
        List<Fluid> fluids = new ArrayList<>();
        for (String id : ids()) {
            fluids.add(byId(id));
        }
        return Collections.unmodifiableList(fluids);
    }

    /**
     * A user fluid of constant properties.
     *
     * @param name the user's name, used as its id
     * @param density ρ (kg/m³), positive
     * @param dynamicViscosity μ (Pa·s), positive
     * @return the fluid
     */
    public static Fluid constant(String name, double density, double dynamicViscosity) {
        if (name == null || name.isBlank()) {
            throw new InputException("fluid name", "must not be empty");
        }
        InputException.requirePositive("density", density);
        InputException.requirePositive("dynamic viscosity", dynamicViscosity);
        return new ConstantFluid(name.strip(), density, dynamicViscosity);
    }

    private static TabulatedFluid loadTable(String id) {
        String resource = RESOURCE_FOLDER + id + ".csv";
        try (InputStream in = Fluids.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("built-in fluid table missing from the build: " + resource);
            }
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            return UserFluidTable.parse(
                    text, "fluids-data/fluids/" + id + ".csv", id, "fluids-data/fluids/" + id + ".csv");
        } catch (IOException e) {
            throw new IllegalStateException("cannot read built-in fluid table " + resource, e);
        }
    }
}
