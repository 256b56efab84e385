package org.headway.correlation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Recognises familiar dimensionless groups by the kinds of quantity they combine (density,
 * velocity, length…), judged from each variable's dimensions. Definitions of the groups: White,
 * F. M., Fluid Mechanics, ch. 5, table of dimensionless groups (from memory); pump coefficients
 * as in the pump similarity rules of the same text, ch. 11 (from memory).
 */
final class FamiliarGroups {

    private FamiliarGroups() {}

    /** Kinds of quantity by their M, L, T exponents. */
    enum Kind {
        DENSITY(1, -3, 0),
        VELOCITY(0, 1, -1),
        LENGTH(0, 1, 0),
        DYNAMIC_VISCOSITY(1, -1, -1),
        KINEMATIC_VISCOSITY(0, 2, -1),
        PRESSURE(1, -1, -2),
        FORCE(1, 1, -2),
        POWER(1, 2, -3),
        FLOW_RATE(0, 3, -1),
        FLOW_PER_WIDTH(0, 2, -1),
        ROTATIONAL_SPEED(0, 0, -1),
        ACCELERATION(0, 1, -2),
        SPECIFIC_ENERGY(0, 2, -2),
        SURFACE_TENSION(1, 0, -2),
        OTHER(99, 99, 99);

        final int mass;
        final int length;
        final int time;

        Kind(int mass, int length, int time) {
            this.mass = mass;
            this.length = length;
            this.time = time;
        }
    }

    private record Term(Kind kind, int exponent) {}

    private record Template(String name, List<Term> terms) {}

    private static final List<Template> TEMPLATES = List.of(
            template("Reynolds number", Kind.DENSITY, 1, Kind.VELOCITY, 1, Kind.LENGTH, 1, Kind.DYNAMIC_VISCOSITY, -1),
            template("Reynolds number", Kind.VELOCITY, 1, Kind.LENGTH, 1, Kind.KINEMATIC_VISCOSITY, -1),
            template(
                    "Reynolds number (rotational, ρND²/μ)",
                    Kind.DENSITY,
                    1,
                    Kind.ROTATIONAL_SPEED,
                    1,
                    Kind.LENGTH,
                    2,
                    Kind.DYNAMIC_VISCOSITY,
                    -1),
            template("Euler number", Kind.PRESSURE, 1, Kind.DENSITY, -1, Kind.VELOCITY, -2),
            template(
                    "Darcy friction factor-like group (Δp·D/(ρV²L))",
                    Kind.PRESSURE,
                    1,
                    Kind.LENGTH,
                    1,
                    Kind.LENGTH,
                    -1,
                    Kind.DENSITY,
                    -1,
                    Kind.VELOCITY,
                    -2),
            template("Froude number squared (V²/(gL))", Kind.VELOCITY, 2, Kind.ACCELERATION, -1, Kind.LENGTH, -1),
            template("Weber number", Kind.DENSITY, 1, Kind.VELOCITY, 2, Kind.LENGTH, 1, Kind.SURFACE_TENSION, -1),
            template(
                    "drag (force) coefficient-like group F/(ρV²L²)",
                    Kind.FORCE,
                    1,
                    Kind.DENSITY,
                    -1,
                    Kind.VELOCITY,
                    -2,
                    Kind.LENGTH,
                    -2),
            template("flow coefficient Q/(ND³)", Kind.FLOW_RATE, 1, Kind.ROTATIONAL_SPEED, -1, Kind.LENGTH, -3),
            template("head coefficient gH/(N²D²)", Kind.SPECIFIC_ENERGY, 1, Kind.ROTATIONAL_SPEED, -2, Kind.LENGTH, -2),
            template(
                    "power coefficient P/(ρN³D⁵)",
                    Kind.POWER,
                    1,
                    Kind.DENSITY,
                    -1,
                    Kind.ROTATIONAL_SPEED,
                    -3,
                    Kind.LENGTH,
                    -5),
            template(
                    "weir discharge group squared Q²/(gH⁵)", Kind.FLOW_RATE, 2, Kind.ACCELERATION, -1, Kind.LENGTH, -5),
            template(
                    "weir discharge group squared q²/(gH³)",
                    Kind.FLOW_PER_WIDTH,
                    2,
                    Kind.ACCELERATION,
                    -1,
                    Kind.LENGTH,
                    -3));

    private static Template template(String name, Object... kindsAndExponents) {
        List<Term> terms = new ArrayList<>();
        for (int i = 0; i < kindsAndExponents.length; i += 2) {
            terms.add(new Term((Kind) kindsAndExponents[i], (Integer) kindsAndExponents[i + 1]));
        }
        return new Template(name, terms);
    }

    /** The kind of a variable from its dimensions (only M, L, T quantities have kinds). */
    static Kind kind(DimensionalVariable v) {
        for (Dimension d : v.exponents().keySet()) {
            if (d != Dimension.MASS && d != Dimension.LENGTH && d != Dimension.TIME) {
                return Kind.OTHER;
            }
        }
        for (Kind k : Kind.values()) {
            if (k.mass == v.exponent(Dimension.MASS)
                    && k.length == v.exponent(Dimension.LENGTH)
                    && k.time == v.exponent(Dimension.TIME)) {
                return k;
            }
        }
        return Kind.OTHER;
    }

    /** A familiar name for the group with these exponents (in this orientation), or null. */
    static String name(List<DimensionalVariable> variables, int[] exponents) {
        List<Term> terms = new ArrayList<>();
        List<Integer> involved = new ArrayList<>();
        for (int j = 0; j < exponents.length; j++) {
            if (exponents[j] != 0) {
                terms.add(new Term(kind(variables.get(j)), exponents[j]));
                involved.add(j);
            }
        }
        if (terms.size() == 2
                && terms.get(0).exponent == -terms.get(1).exponent
                && Math.abs(terms.get(0).exponent) == 1) {
            int up = terms.get(0).exponent == 1 ? 0 : 1;
            Kind kind = terms.get(0).kind;
            if (kind != terms.get(1).kind || kind == Kind.OTHER) {
                return null;
            }
            String upper = variables.get(involved.get(up)).name();
            String lower = variables.get(involved.get(1 - up)).name();
            if (kind == Kind.LENGTH) {
                return looksLikeRoughness(upper) ? "relative roughness" : "length ratio";
            }
            if (kind == Kind.VELOCITY) {
                return looksLikeSoundSpeed(lower) ? "Mach number" : "velocity ratio";
            }
            return null;
        }
        for (Template t : TEMPLATES) {
            if (sameBag(t.terms, terms)) {
                return t.name;
            }
        }
        return null;
    }

    private static boolean sameBag(List<Term> a, List<Term> b) {
        if (a.size() != b.size()) {
            return false;
        }
        List<Term> rest = new ArrayList<>(b);
        for (Term t : a) {
            if (!rest.remove(t)) {
                return false;
            }
        }
        return true;
    }

    private static boolean looksLikeRoughness(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.startsWith("eps")
                || n.startsWith("ε")
                || n.startsWith("rough")
                || n.equals("k")
                || n.equals("ks")
                || n.equals("e");
    }

    private static boolean looksLikeSoundSpeed(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.equals("c") || n.equals("a") || n.equals("c0") || n.contains("sound");
    }
}
