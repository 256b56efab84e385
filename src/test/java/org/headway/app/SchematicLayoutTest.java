package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javafx.beans.property.SimpleObjectProperty;
import org.headway.pipe.Catalog;
import org.headway.project.LineList;
import org.headway.project.Project;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.Test;

/** Where the schematic puts nodes, and what a point on it hits. */
class SchematicLayoutTest {

    private static NetworkEditor.Draft hillcrest(boolean withPositions) {
        Path examples = Path.of("fluids-data", "examples", "network");
        Project.NetworkSpec spec = LineList.read(
                examples.resolve("hillcrest-nodes.csv"),
                examples.resolve("hillcrest-links.csv"),
                Catalog.bundled(),
                false);
        NetworkEditor editor = new NetworkEditor(Catalog.bundled(), new SimpleObjectProperty<>(UnitSystem.SI));
        editor.load(Project.network("Hillcrest", "water", "15 degC", "auto", spec), null);
        NetworkEditor.Draft d = editor.draft();
        if (withPositions) {
            return d;
        }
        List<Map<String, String>> rows = new ArrayList<>();
        for (Map<String, String> r : d.nodes()) {
            Map<String, String> m = new LinkedHashMap<>(r);
            m.remove("x");
            m.remove("y");
            rows.add(m);
        }
        return d.withBoth(rows, d.links());
    }

    @Test
    void givenPositionsAreUsedWithNorthUp() {
        SchematicLayout l = SchematicLayout.of(hillcrest(true));
        assertEquals("given", l.how());
        // J1 at (150 m, 400 m), J4 at (450 m, 100 m): J4 is drawn lower on the screen.
        assertEquals(150, l.x()[1], 0);
        assertTrue(l.y()[4] > l.y()[1]);
    }

    @Test
    void loopsWithoutPositionsAreDrawnByStressWithoutCrossings() {
        SchematicLayout l = SchematicLayout.of(hillcrest(false));
        assertEquals("stress", l.how());
        int[] from = l.from();
        int[] to = l.to();
        assertEquals(0, SchematicLayout.crossings(from, to, l.x(), l.y()));
        // Every link about one unit long: stress majorisation's target for neighbours (within 40 %).
        for (int k = 0; k < from.length; k++) {
            double len = Math.hypot(l.x()[from[k]] - l.x()[to[k]], l.y()[from[k]] - l.y()[to[k]]);
            assertEquals(1, len, 0.4, "link " + k);
        }
        double[] b = l.bounds();
        assertTrue(b[1] - b[0] >= b[3] - b[2], "turned to lie across");
    }

    @Test
    void aTreeIsDrawnInLayersFromItsFixedHead() {
        NetworkEditor.Draft d = NetworkEditor.blank();
        List<Map<String, String>> nodes = new ArrayList<>(d.nodes());
        nodes.replaceAll(r -> {
            Map<String, String> m = new LinkedHashMap<>(r);
            m.remove("x");
            m.remove("y");
            return m;
        });
        nodes.add(NetworkEditor.cells("id", "N2", "demand", "1 L/s"));
        nodes.add(NetworkEditor.cells("id", "N3", "demand", "1 L/s"));
        List<Map<String, String>> links = new ArrayList<>(d.links());
        Map<String, String> l2 = new LinkedHashMap<>(links.get(0));
        l2.put("id", "L2");
        l2.put("from", "N1");
        l2.put("to", "N2");
        Map<String, String> l3 = new LinkedHashMap<>(l2);
        l3.put("id", "L3");
        l3.put("to", "N3");
        links.add(l2);
        links.add(l3);
        SchematicLayout l = SchematicLayout.of(d.withBoth(nodes, links));
        assertEquals("layers", l.how());
        assertEquals(0, l.x()[0], 0, "the reservoir in the first layer");
        assertEquals(1, l.x()[1], 0);
        assertEquals(2, l.x()[2], 0);
        assertEquals(2, l.x()[3], 0);
    }

    @Test
    void aPointHitsTheNodeOrLinkDrawnThere() {
        SchematicLayout l = SchematicLayout.of(hillcrest(true));
        SchematicPainter.View v = SchematicPainter.View.fit(l, 1000, 700);
        int j3 = 3;
        assertEquals(j3, SchematicPainter.nodeAt(l, v, v.sx(l.x()[j3]) + 3, v.sy(l.y()[j3]) - 2));
        // A quarter of the way along P5 (J3 → J5), off the nodes.
        int p5 = 4;
        double x = v.sx(0.75 * l.x()[l.from()[p5]] + 0.25 * l.x()[l.to()[p5]]);
        double y = v.sy(0.75 * l.y()[l.from()[p5]] + 0.25 * l.y()[l.to()[p5]]);
        assertEquals(-1, SchematicPainter.nodeAt(l, v, x, y));
        assertEquals(p5, SchematicPainter.linkAt(l, v, x + 2, y));
        assertEquals(-1, SchematicPainter.linkAt(l, v, x + 40, y), "nothing 40 px beside the link");
    }
}
