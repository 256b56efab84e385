package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Random;
import org.headway.caution.InputException;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.pipe.Catalog;
import org.junit.jupiter.api.Test;

/** The line list: units in column names, blank cells, located errors, and a fuzz of 10,000 inputs. */
class LineListTest {

    static final String NODES = """
            id,elevation [m],demand [L/s],fixed_head [m],x,y
            R,,,50,0,0
            A,10,2,,100,0
            B,12,3,,200,0
            """;
    static final String LINKS = """
            id,from,to,kind,length [m],diameter [mm],roughness [mm],kv,rated_pressure_drop [kPa],rated_flow [L/s],pump_curve
            p1,R,A,,300,150,0.045,,,,
            p2,A,B,pipe,200,100,0.045,,,,
            v1,A,B,valve,,,,25,,,
            c1,R,B,component,,,,,40,3,
            """;

    private static Project.NetworkSpec parse(String nodes, String links) {
        return LineList.parse("nodes.csv", nodes, "links.csv", links, Catalog.bundled(), false);
    }

    private static Network resolve(Project.NetworkSpec spec) {
        Project p = Project.network("", "water", "15 degC", "auto", spec);
        return ProjectResolver.resolveNetwork(p, Catalog.bundled(), Path.of("."));
    }

    @Test
    void unitsInColumnNamesAreAppliedAndBlankCellsAreNotGiven() {
        Project.NetworkSpec spec = parse(NODES, LINKS);
        assertEquals("2 L/s", spec.nodes().get(1).demand());
        assertEquals("", spec.nodes().get(0).elevation());
        assertEquals("150 mm", ((Project.SegmentSpec) spec.links().get(0).element()).innerDiameter());
        Network net = resolve(spec);
        // A reservoir given by its level alone sits at that level (gauge zero at its surface).
        assertEquals(50, net.nodes().get(0).elevation(), 0);
        assertEquals(0.002, net.nodes().get(1).totalDemand(), 1e-15);
        NetworkResult r = NetworkSolver.standard().solve(net);
        assertTrue(r.converged());
        // Continuity at the reservoir: it supplies the total demand, 5 L/s.
        assertEquals(-0.005, r.node("R").orElseThrow().demand(), 1e-13);
    }

    @Test
    void projectRoundTripKeepsTheNetwork() {
        Project.NetworkSpec spec = parse(NODES, LINKS);
        Project p = Project.network("t", "water", "15 degC", "auto", spec);
        Project again = ProjectFile.parse(ProjectFile.toJson(p));
        assertEquals(p.network(), again.network());
    }

    @Test
    void badCellsNameFileLineAndColumn() {
        InputException e = assertThrows(InputException.class, () -> parse(NODES.replace("A,10,2", "A,ten,2"), LINKS));
        assertTrue(e.getMessage().startsWith("nodes.csv line 3, column elevation"), e.getMessage());
        InputException unit = assertThrows(
                InputException.class, () -> parse(NODES, LINKS.replace("p2,A,B,pipe,200,100", "p2,A,B,pipe,200,4 in")));
        assertTrue(unit.getMessage().contains("links.csv line 3, column diameter"), unit.getMessage());
        assertTrue(unit.getMessage().contains("plain number"), unit.getMessage());
        InputException column =
                assertThrows(InputException.class, () -> parse(NODES.replace("fixed_head", "fixed_hed"), LINKS));
        assertTrue(column.getMessage().contains("unknown column \"fixed_hed"), column.getMessage());
        InputException kind =
                assertThrows(InputException.class, () -> parse(NODES, LINKS.replace("v1,A,B,valve", "v1,A,B,gate")));
        assertTrue(kind.getMessage().contains("line 4, column kind"), kind.getMessage());
        InputException curve =
                assertThrows(InputException.class, () -> parse(NODES, LINKS + "pu,R,A,pump,,,,,,,0:40;5:36;10:25\n"));
        assertTrue(curve.getMessage().contains("give each point's units"), curve.getMessage());
        InputException node =
                assertThrows(InputException.class, () -> resolve(parse(NODES, LINKS.replace("p2,A,B", "p2,A,C"))));
        assertTrue(node.getMessage().contains("unknown node \"C\""), node.getMessage());
    }

    @Test
    void aPumpCurveAndAnExcelBomAreRead() {
        Project.NetworkSpec spec =
                parse("\uFEFF" + NODES, LINKS + "pu,R,A,pump,,,,,,,\"0 L/s:40 m; 5 L/s:36 m; 10 L/s:25 m\"\n");
        Project.PumpSpec pump = (Project.PumpSpec) spec.links().get(4).element();
        assertEquals(3, pump.points().size());
        assertEquals("5 L/s", pump.points().get(1).flow());
    }

    /**
     * 10,000 mutated line lists (cells replaced by nasty values, columns and lines dropped or
     * duplicated, quotes and separators inserted): each gives a solved network or an InputException
     * with a place; never another exception, never a non-finite head at a live node.
     */
    @Test
    void fuzzedLineListsGiveAResultOrALocatedError() {
        String[] nasty = {
            "",
            "NaN",
            "-1",
            "0",
            "1e308",
            "-inf",
            "abc",
            "\"",
            ",",
            "12 L/s",
            "5 m",
            "1e-300",
            "R",
            "A",
            "B",
            "valve",
            "pump",
            "closed",
            "check-valve",
            "0 L/s:40 m; 5 L/s:36 m; 10 L/s:25 m",
            "4 in",
            "yes",
            "∞",
            "9".repeat(40)
        };
        Random random = new Random(20261202L);
        int solved = 0;
        int refused = 0;
        for (int i = 0; i < 10_000; i++) {
            String nodes = mutate(NODES, random, nasty);
            String links = mutate(LINKS, random, nasty);
            try {
                NetworkResult r = NetworkSolver.of(1e-6, 60).solve(resolve(parse(nodes, links)));
                for (NetworkResult.NodeResult n : r.nodes()) {
                    assertTrue(
                            !Double.isInfinite(n.head()),
                            "case " + i + " " + r.converged() + "\n" + nodes + "\n" + links + r.nodes());
                }
                solved++;
            } catch (InputException e) {
                assertTrue(e.getMessage() != null && !e.getMessage().isBlank(), "case " + i);
                refused++;
            } catch (RuntimeException e) {
                throw new AssertionError("case " + i + " threw " + e + "\n" + nodes + "\n" + links, e);
            }
        }
        org.headway.Fuzz.summary("line-list fuzz: 10000 inputs, " + solved + " solved, " + refused + " refused");
        assertTrue(solved > 100 && refused > 100, solved + " / " + refused);
    }

    private static String mutate(String text, Random random, String[] nasty) {
        String[] lines = text.split("\n");
        StringBuilder out = new StringBuilder();
        for (int l = 0; l < lines.length; l++) {
            String line = lines[l];
            if (l > 0 && random.nextInt(20) == 0) {
                continue;
            }
            String[] cells = line.split(",", -1);
            for (int c = 0; c < cells.length; c++) {
                if (l > 0 && random.nextInt(45) == 0) {
                    cells[c] = nasty[random.nextInt(nasty.length)];
                }
            }
            out.append(String.join(",", cells)).append('\n');
            if (l > 0 && random.nextInt(40) == 0) {
                out.append(line).append('\n');
            }
        }
        return out.toString();
    }
}
