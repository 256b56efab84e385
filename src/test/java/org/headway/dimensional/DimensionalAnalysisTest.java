package org.headway.dimensional;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.fraction.BigFraction;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;

/** Buckingham π analysis on worked problems of fluid-mechanics texts. */
class DimensionalAnalysisTest {

    private static final DimensionalVariable DP = DimensionalVariable.of("dp", 1, -1, -2);
    private static final DimensionalVariable RHO = DimensionalVariable.of("rho", 1, -3, 0);
    private static final DimensionalVariable V = DimensionalVariable.of("V", 0, 1, -1);
    private static final DimensionalVariable D = DimensionalVariable.of("D", 0, 1, 0);
    private static final DimensionalVariable MU = DimensionalVariable.of("mu", 1, -1, -1);
    private static final DimensionalVariable EPS = DimensionalVariable.of("eps", 0, 1, 0);
    private static final DimensionalVariable L = DimensionalVariable.of("L", 0, 1, 0);

    /** Every group is dimensionless and the exponent vectors are linearly independent. */
    private static void assertValidGroups(GroupAnalysis a) {
        for (DimensionlessGroup g : a.groups()) {
            for (Dimension d : Dimension.values()) {
                int sum = 0;
                for (DimensionalVariable v : a.variables()) {
                    sum += g.exponents().getOrDefault(v.name(), 0) * v.exponent(d);
                }
                assertEquals(0, sum, g.name() + " " + g.exponents() + " has dimension " + d);
            }
        }
        List<BigFraction[]> vectors = new ArrayList<>();
        for (DimensionlessGroup g : a.groups()) {
            BigFraction[] c = new BigFraction[a.variables().size()];
            for (int j = 0; j < c.length; j++) {
                c[j] = new BigFraction(
                        g.exponents().getOrDefault(a.variables().get(j).name(), 0));
            }
            vectors.add(c);
        }
        assertEquals(a.groups().size(), DimensionalAnalysis.rank(vectors), "group exponent vectors independent");
        assertEquals(a.variables().size() - a.rank(), a.groups().size(), "Buckingham: n − r groups");
    }

    private static DimensionlessGroup named(GroupAnalysis a, String name) {
        return a.groups().stream()
                .filter(g -> g.name().equals(name))
                .findFirst()
                .orElseThrow(() -> new AssertionError("no group named " + name + " in " + a.groups()));
    }

    @Test
    void pipePressureDropGivesFourGroupsFromSevenVariables() {
        // Δp = F(ρ, V, D, μ, ε, L): 7 variables, rank 3, 4 groups Δp/(ρV²) = F(ρVD/μ, ε/D, L/D).
        // White, F. M., Fluid Mechanics, ch. 5 and ch. 6 (pipe flow), from memory; same result in
        // Munson, Young and Okiishi, Fundamentals of Fluid Mechanics, ch. 8, from memory.
        GroupAnalysis a = DimensionalAnalysis.analyse(List.of(DP, RHO, V, D, MU, EPS, L), List.of());
        assertEquals(3, a.rank());
        assertEquals(List.of("rho", "V", "D"), a.repeating());
        assertValidGroups(a);
        assertEquals(
                Map.of("dp", 1, "rho", -1, "V", -2), named(a, "Euler number").exponents());
        assertEquals(
                Map.of("rho", 1, "V", 1, "D", 1, "mu", -1),
                named(a, "Reynolds number").exponents());
        assertEquals(Map.of("eps", 1, "D", -1), named(a, "relative roughness").exponents());
        assertEquals(Map.of("L", 1, "D", -1), named(a, "length ratio").exponents());
    }

    @Test
    void dragOnASphereGivesTwoGroups() {
        // F = F(D, V, ρ, μ): F/(ρV²D²) = φ(ρVD/μ). White, Fluid Mechanics, ch. 5, from memory.
        DimensionalVariable force = DimensionalVariable.of("F", 1, 1, -2);
        GroupAnalysis a = DimensionalAnalysis.analyse(List.of(force, D, V, RHO, MU), List.of());
        assertEquals(3, a.rank());
        assertValidGroups(a);
        assertEquals(2, a.groups().size());
        assertEquals(
                Map.of("F", 1, "rho", -1, "V", -2, "D", -2),
                named(a, "drag (force) coefficient-like group F/(ρV²L²)").exponents());
        named(a, "Reynolds number");
    }

    @Test
    void pumpSimilarityGivesFlowHeadPowerAndReynoldsGroups() {
        // gH, P = F(Q, ρ, μ, N, D): flow coefficient Q/(ND³), head coefficient gH/(N²D²), power
        // coefficient P/(ρN³D⁵) and ρND²/μ. White, Fluid Mechanics, ch. 11 (pump similarity
        // rules), from memory.
        DimensionalVariable q = DimensionalVariable.of("Q", 0, 3, -1);
        DimensionalVariable gh = DimensionalVariable.of("gH", 0, 2, -2);
        DimensionalVariable power = DimensionalVariable.of("P", 1, 2, -3);
        DimensionalVariable speed = DimensionalVariable.of("N", 0, 0, -1);
        GroupAnalysis a =
                DimensionalAnalysis.analyse(List.of(q, gh, power, RHO, MU, speed, D), List.of("rho", "N", "D"));
        assertEquals(3, a.rank());
        assertValidGroups(a);
        assertEquals(4, a.groups().size());
        assertEquals(
                Map.of("Q", 1, "N", -1, "D", -3),
                named(a, "flow coefficient Q/(ND³)").exponents());
        assertEquals(
                Map.of("gH", 1, "N", -2, "D", -2),
                named(a, "head coefficient gH/(N²D²)").exponents());
        assertEquals(
                Map.of("P", 1, "rho", -1, "N", -3, "D", -5),
                named(a, "power coefficient P/(ρN³D⁵)").exponents());
        assertEquals(
                Map.of("rho", 1, "N", 1, "D", 2, "mu", -1),
                named(a, "Reynolds number (rotational, ρND²/μ)").exponents());
    }

    @Test
    void rectangularWeirNeedsSmallIntegerExponents() {
        // Q = F(g, H, b): only L and T occur, rank 2, groups Q²/(g H⁵) (from Q/(√g H^{5/2}) with the
        // denominators cleared) and b/H (common practice, no source).
        DimensionalVariable q = DimensionalVariable.of("Q", 0, 3, -1);
        DimensionalVariable g = DimensionalVariable.of("g", 0, 1, -2);
        DimensionalVariable h = DimensionalVariable.of("H", 0, 1, 0);
        DimensionalVariable b = DimensionalVariable.of("b", 0, 1, 0);
        GroupAnalysis a = DimensionalAnalysis.analyse(List.of(q, g, h, b), List.of("g", "H"));
        assertEquals(2, a.rank());
        assertValidGroups(a);
        assertEquals(
                Map.of("Q", 2, "g", -1, "H", -5),
                named(a, "weir discharge group squared Q²/(gH⁵)").exponents());
        assertEquals(Map.of("b", 1, "H", -1), named(a, "length ratio").exponents());
    }

    @Test
    void froudeNumberAppearsSquaredWithIntegerExponents() {
        // V/√(gL) becomes V²/(gL) after clearing denominators (common practice, no source).
        DimensionalVariable g = DimensionalVariable.of("g", 0, 1, -2);
        GroupAnalysis a = DimensionalAnalysis.analyse(List.of(V, g, L), List.of("g", "L"));
        assertValidGroups(a);
        assertEquals(
                Map.of("V", 2, "g", -1, "L", -1),
                named(a, "Froude number squared (V²/(gL))").exponents());
    }

    @Test
    void dependentRepeatingVariablesAreExplained() {
        InputException e = assertThrows(
                InputException.class,
                () -> DimensionalAnalysis.analyse(List.of(DP, RHO, V, D, MU, EPS, L), List.of("rho", "D", "L")));
        assertEquals("repeating", e.where());
        assertTrue(e.problem().contains("not independent"), e.getMessage());
        assertTrue(e.problem().contains("'L' (L) can be made from rho, D"), e.getMessage());
    }

    @Test
    void tooFewRepeatingVariablesDoNotSpanTheDimensions() {
        InputException e = assertThrows(
                InputException.class, () -> DimensionalAnalysis.analyse(List.of(DP, RHO, V, D, MU), List.of("V", "D")));
        assertTrue(e.problem().contains("do not span the dimensions"), e.getMessage());
        assertTrue(e.problem().contains("rank 3"), e.getMessage());
    }

    @Test
    void unknownRepeatingNameIsRejected() {
        InputException e = assertThrows(
                InputException.class,
                () -> DimensionalAnalysis.analyse(List.of(DP, RHO, V, D), List.of("nu", "V", "D")));
        assertTrue(e.problem().contains("no variable named 'nu'"), e.getMessage());
    }

    @Test
    void temperatureOnlyInOneVariableRaisesTheRank() {
        // With a temperature difference and a thermal expansion coefficient (Θ⁻¹), Θ is a fourth
        // independent dimension: β·ΔT is a group (common practice, no source).
        DimensionalVariable beta = new DimensionalVariable("beta", Map.of(Dimension.TEMPERATURE, -1));
        DimensionalVariable dt = new DimensionalVariable("dT", Map.of(Dimension.TEMPERATURE, 1));
        GroupAnalysis a = DimensionalAnalysis.analyse(List.of(DP, RHO, V, D, beta, dt), List.of());
        assertEquals(4, a.rank());
        assertValidGroups(a);
        assertTrue(
                a.groups().stream().anyMatch(g -> g.exponents().equals(Map.of("beta", 1, "dT", 1))),
                a.groups().toString());
    }

    @Test
    void darcyLikeGroupIsRecognisedInEitherOrientation() {
        // Δp·D/(ρV²L): the Darcy friction factor up to the factor 2 (White, Fluid Mechanics, ch. 6,
        // from memory). The method of repeating variables gives Euler number and L/D instead; the
        // name is recognised when the product is formed.
        List<DimensionalVariable> vars = List.of(DP, RHO, V, D, L);
        assertEquals(
                "Darcy friction factor-like group (Δp·D/(ρV²L))",
                FamiliarGroups.name(vars, new int[] {1, -1, -2, 1, -1}));
        assertEquals(null, FamiliarGroups.name(vars, new int[] {-1, 1, 2, -1, 1}));
        assertEquals("Euler number", FamiliarGroups.name(vars, new int[] {1, -1, -2, 0, 0}));
    }
}
