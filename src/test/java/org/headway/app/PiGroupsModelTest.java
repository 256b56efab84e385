package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The π-groups view-model, without the toolkit. */
class PiGroupsModelTest {

    /**
     * Pipe friction: Δp/L, ρ, V, D, μ, ε are 6 variables in M, L, T of rank 3, so 3 groups — the
     * friction group, the Reynolds number and the relative roughness (the classic result, e.g.
     * White, Fluid Mechanics, ch. 5 and 6; from memory).
     */
    @Test
    void pipeFrictionGivesThreeGroupsWithTheirFamiliarNames() {
        PiGroupsModel m = new PiGroupsModel();
        assertEquals("", m.problemProperty().get());
        assertEquals(3, m.rankProperty().get());
        assertEquals(3, m.groups().size());
        List<String> names =
                m.groups().stream().map(PiGroupsModel.GroupRow::name).toList();
        assertTrue(names.stream().anyMatch(n -> n.startsWith("Reynolds number")), names.toString());
        assertTrue(names.stream().anyMatch(n -> n.startsWith("relative roughness")), names.toString());
        assertEquals("M L^-3", m.variables().get(1).dimensions());
        assertTrue(
                m.explanationProperty().get().contains("rank 3"),
                m.explanationProperty().get());
    }

    @Test
    void dependentRepeatingVariablesAreExplained() {
        PiGroupsModel m = new PiGroupsModel();
        m.repeatingProperty().set("rho, D, eps");
        assertFalse(m.analyse());
        String why = m.problemProperty().get();
        assertTrue(why.startsWith("repeating: the repeating variables [rho, D, eps] are not independent"), why);
        assertTrue(why.contains("'eps'"), why);
        assertTrue(m.groups().isEmpty(), "no stale groups stay on screen");
        m.repeatingProperty().set("rho, V, D");
        assertTrue(m.analyse());
        assertEquals(3, m.groups().size());
    }

    @Test
    void anUnknownUnitNamesTheVariableAndThePosition() {
        PiGroupsModel m = new PiGroupsModel();
        m.put("Q", "furlong/s");
        assertFalse(m.problemProperty().get().isEmpty());
        assertTrue(
                m.problemProperty().get().startsWith("unit of Q: unknown unit symbol 'furlong' at character 1"),
                m.problemProperty().get());
        assertEquals("?", m.variables().get(6).dimensions());
        m.put("Q", "m^3/s");
        assertEquals("", m.problemProperty().get());
        assertEquals(7, m.variables().size());
        assertEquals(4, m.groups().size(), "one more variable, one more group");
        m.remove(6);
        assertEquals(3, m.groups().size());
    }
}
