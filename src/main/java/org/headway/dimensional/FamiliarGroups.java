package org.headway.dimensional;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Recognises familiar dimensionless groups by the kinds of quantity they combine (density,
 * velocity, length…), judged from each variable's dimensions. Definitions of the groups: White,
 * F. M., Fluid Mechanics, ch. 5, table of dimensionless groups (from memory); pump coefficients
 * as in the pump similarity rules of the same text, ch. 11 (from memory).
 *
 * <p>Matching by kind alone would call any group of the right dimensions by a familiar name: with a
 * pipe diameter D, Q²/(gD⁵) has the kinds of the weir discharge group Q²/(gH⁵), which is defined on
 * the head H over the crest. Where a group is defined on one particular length (the head of a weir,
 * the impeller diameter of a pump), its template says so and the variable's name must read as that
 * length (H, h, head…; D, d, diameter, impeller…); otherwise the group stays unnamed (π1, π2…).
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

    /** Which length a template term stands for. */
    enum Role {
        ANY,
        HEAD,
        DIAMETER
    }

    private record Term(Kind kind, int exponent, Role role) {
        Term(Kind kind, int exponent) {
            this(kind, exponent, Role.ANY);
        }
    }

    /** A term of the group being named: kind, exponent and the variable's name. */
    private record Observed(Kind kind, int exponent, String variable) {}

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
                    Role.DIAMETER,
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
            template("flow coefficient Q/(ND³)", Kind.FLOW_RATE, 1, Kind.ROTATIONAL_SPEED, -1, Role.DIAMETER, -3),
            template(
                    "head coefficient gH/(N²D²)",
                    Kind.SPECIFIC_ENERGY,
                    1,
                    Kind.ROTATIONAL_SPEED,
                    -2,
                    Role.DIAMETER,
                    -2),
            template(
                    "power coefficient P/(ρN³D⁵)",
                    Kind.POWER,
                    1,
                    Kind.DENSITY,
                    -1,
                    Kind.ROTATIONAL_SPEED,
                    -3,
                    Role.DIAMETER,
                    -5),
            template("weir discharge group squared Q²/(gH⁵)", Kind.FLOW_RATE, 2, Kind.ACCELERATION, -1, Role.HEAD, -5),
            template(
                    "weir discharge group squared q²/(gH³)",
                    Kind.FLOW_PER_WIDTH,
                    2,
                    Kind.ACCELERATION,
                    -1,
                    Role.HEAD,
                    -3));

    /** Pairs of a kind (or a length role) and its exponent. */
    private static Template template(String name, Object... kindsAndExponents) {
        List<Term> terms = new ArrayList<>();
        for (int i = 0; i < kindsAndExponents.length; i += 2) {
            int exponent = (Integer) kindsAndExponents[i + 1];
            if (kindsAndExponents[i] instanceof Role role) {
                terms.add(new Term(Kind.LENGTH, exponent, role));
            } else {
                terms.add(new Term((Kind) kindsAndExponents[i], exponent));
            }
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
        List<Observed> terms = new ArrayList<>();
        List<Integer> involved = new ArrayList<>();
        for (int j = 0; j < exponents.length; j++) {
            if (exponents[j] != 0) {
                terms.add(new Observed(
                        kind(variables.get(j)), exponents[j], variables.get(j).name()));
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

    /** Every template term matched by its own observed term (kind, exponent, role), with backtracking. */
    private static boolean sameBag(List<Term> template, List<Observed> observed) {
        if (template.size() != observed.size()) {
            return false;
        }
        return match(template, 0, observed, new boolean[observed.size()]);
    }

    private static boolean match(List<Term> template, int next, List<Observed> observed, boolean[] used) {
        if (next == template.size()) {
            return true;
        }
        Term t = template.get(next);
        for (int i = 0; i < observed.size(); i++) {
            Observed o = observed.get(i);
            if (!used[i] && o.kind == t.kind && o.exponent == t.exponent && fills(t.role, o.variable)) {
                used[i] = true;
                if (match(template, next + 1, observed, used)) {
                    return true;
                }
                used[i] = false;
            }
        }
        return false;
    }

    private static boolean fills(Role role, String variable) {
        return switch (role) {
            case ANY -> true;
            case HEAD -> looksLikeHead(variable);
            case DIAMETER -> looksLikeDiameter(variable);
        };
    }

    /** H, h, H1, h_w, head…: the head of a weir or a pump as engineers name it (common practice, no source). */
    static boolean looksLikeHead(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.matches("h(\\d+|_.*)?") || n.startsWith("head");
    }

    /** D, d, D2, d_i, diameter, impeller…: a diameter as engineers name it (common practice, no source). */
    static boolean looksLikeDiameter(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.matches("d(\\d+|_.*|n|i)?") || n.startsWith("diam") || n.startsWith("impeller");
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
