package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.junit.jupiter.api.Test;

/**
 * A large line list's two tables are read at once on two threads: the network read must equal the
 * in-order reading, its links must name their ends with the nodes' own strings, and the error
 * reported must be the one the in-order reading reports (a node line's before a link line's).
 */
class LineListTwoThreadsTest {

    /** An invented k × k looped grid with a reservoir at one corner, as line-list text. */
    private static String[] grid(int k, long seed) {
        Random random = new Random(seed);
        StringBuilder nodes = new StringBuilder("id,elevation [m],demand [L/s],fixed_head [m]\n");
        StringBuilder links = new StringBuilder("id,from,to,length [m],diameter [mm],roughness [mm]\n");
        nodes.append("R,0,,60\n");
        int p = 0;
        for (int i = 0; i < k * k; i++) {
            nodes.append(String.format(Locale.ROOT, "n%d,%.3f,%.2f,%n", i, 10 * random.nextDouble(), 0.1));
            if (i % k + 1 < k) {
                links.append(String.format(
                        Locale.ROOT, "p%d,n%d,n%d,%.2f,150,0.045%n", p++, i, i + 1, 100 + 90 * random.nextDouble()));
            }
            if (i + k < k * k) {
                links.append(String.format(
                        Locale.ROOT, "p%d,n%d,n%d,%.2f,200,0.045%n", p++, i, i + k, 100 + 90 * random.nextDouble()));
            }
        }
        links.append("feed,R,n0,50,300,0.045\n");
        return new String[] {nodes.toString(), links.toString()};
    }

    private static Project.NetworkSpec read(String nodes, String links, boolean twoThreads) {
        return LineList.parse("nodes.csv", nodes, "links.csv", links, Catalog.bundled(), false, twoThreads);
    }

    @Test
    void twoThreadsReadTheSameNetworkAsInOrder() {
        String[] g = grid(150, 3);
        assertTrue(g[0].length() + g[1].length() > LineList.PARALLEL_TEXT, "the grid should be large");
        Project.NetworkSpec inOrder = read(g[0], g[1], false);
        Project.NetworkSpec twoThreads = read(g[0], g[1], true);
        assertEquals(inOrder, twoThreads);
        assertEquals(150 * 150 + 1, twoThreads.nodes().size());
        assertEquals(2 * 150 * 149 + 1, twoThreads.links().size());
        Map<String, String> ids = new HashMap<>();
        for (Project.NodeSpec n : twoThreads.nodes()) {
            ids.put(n.id(), n.id());
        }
        for (Project.LinkSpec l : twoThreads.links()) {
            assertSame(ids.get(l.from()), l.from());
            assertSame(ids.get(l.to()), l.to());
        }
    }

    @Test
    void theErrorIsTheOneReadingInOrderReports() {
        String[] g = grid(20, 4);
        String badNode = g[0].replaceFirst("\nn9,[^,]*,", "\nn9,high,");
        String badLink = g[1].replaceFirst("\np11,([^,]*),([^,]*),[^,]*,", "\np11,$1,$2,-5 m,");
        for (String[] pair : new String[][] {{badNode, g[1]}, {g[0], badLink}, {badNode, badLink}}) {
            InputException inOrder = assertThrows(InputException.class, () -> read(pair[0], pair[1], false));
            InputException twoThreads = assertThrows(InputException.class, () -> read(pair[0], pair[1], true));
            assertEquals(inOrder.getMessage(), twoThreads.getMessage());
        }
        InputException both = assertThrows(InputException.class, () -> read(badNode, badLink, true));
        assertTrue(both.getMessage().startsWith("nodes.csv line 12, column elevation"), both.getMessage());
        InputException link = assertThrows(InputException.class, () -> read(g[0], badLink, true));
        assertTrue(link.getMessage().startsWith("links.csv line 13, column length"), link.getMessage());
    }
}
