package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.headway.caution.InputException;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.pipe.Catalog;
import org.junit.jupiter.api.Test;

/** A reducer as a network link from a line list, its loss against the published formula. */
class LineListReducerTest {

    /** Standard acceleration of gravity, 9.80665 m/s² (3rd CGPM, 1901). */
    private static final double G = 9.80665;

    private static final String NODES = """
            id,elevation [m],demand [L/s],fixed_head [m]
            R,,,30
            A,0,,
            B,0,6,
            """;

    private static Network network(String links) {
        Project.NetworkSpec spec = LineList.parse("nodes.csv", NODES, "links.csv", links, Catalog.bundled(), false);
        return ProjectResolver.resolveNetwork(
                Project.network("invented", "water", "15 degC", "auto", spec), Catalog.bundled(), Path.of("."));
    }

    @Test
    void reducerLinkLosesTheCraneContraction() {
        Network net = network("""
                id,from,to,kind,length [m],diameter [mm],roughness [mm],inlet_diameter [mm],outlet_diameter [mm]
                p1,R,A,pipe,100,90,0.007,,
                r1,A,B,reducer,,,,90,73.6
                """);
        NetworkResult result = NetworkSolver.standard().solve(net);
        assertTrue(result.converged());
        double q = 0.006;
        double vSmall = q / (Math.PI * 0.0736 * 0.0736 / 4);
        double beta2 = (0.0736 / 0.090) * (0.0736 / 0.090);
        // Crane TP-410 (1988) p. A-26, sudden contraction K = 0.5 (1 − β²) on the small-pipe velocity (from memory)
        double expected = 0.5 * (1 - beta2) * vSmall * vSmall / (2 * G);
        double drop = result.node("A").orElseThrow().head()
                - result.node("B").orElseThrow().head();
        assertEquals(q, result.link("r1").orElseThrow().flow(), 1e-12);
        assertEquals(expected, drop, 1e-7);
    }

    @Test
    void reducerLinkWithoutABoreIsRefusedWithItsCell() {
        InputException e = assertThrows(InputException.class, () -> network("""
                id,from,to,kind,length [m],diameter [mm],material,inlet_diameter [mm],outlet_diameter [mm]
                p1,R,A,pipe,100,90,hdpe,,
                r1,A,B,reducer,,,,90,
                """));
        assertTrue(e.getMessage().contains("links.csv line 3, column outlet_diameter"), e.getMessage());
        InputException unused = assertThrows(InputException.class, () -> network("""
                id,from,to,kind,length [m],diameter [mm],material,inlet_diameter [mm],outlet_diameter [mm],kv
                p1,R,A,pipe,100,90,hdpe,,,
                r1,A,B,reducer,,,,90,73.6,20
                """));
        assertTrue(unused.getMessage().contains("column kv"), unused.getMessage());
    }
}
