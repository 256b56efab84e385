package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import javafx.beans.property.SimpleObjectProperty;
import org.headway.caution.InputException;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.pipe.Catalog;
import org.headway.project.LineList;
import org.headway.project.Project;
import org.headway.project.ProjectResolver;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The network workspace's view-model, without the toolkit. */
class NetworkEditorTest {

    private static final Path EXAMPLES = Path.of("fluids-data", "examples", "network");

    private final NetworkEditor editor =
            new NetworkEditor(Catalog.bundled(), new SimpleObjectProperty<>(UnitSystem.SI));

    private static Project.NetworkSpec hillcrest() {
        return LineList.read(
                EXAMPLES.resolve("hillcrest-nodes.csv"),
                EXAMPLES.resolve("hillcrest-links.csv"),
                Catalog.bundled(),
                false);
    }

    @Test
    void anOpenedNetworkSolvesAsTheEngineSolvesTheProject() {
        Project p = Project.network("Hillcrest", "water", "15 degC", "auto", hillcrest());
        editor.load(p, null);
        assertEquals(8, editor.draft().nodes().size());
        assertEquals(10, editor.draft().links().size());
        Path here = Path.of("").toAbsolutePath();
        NetworkResult direct =
                NetworkSolver.standard().solve(ProjectResolver.resolveNetwork(p, Catalog.bundled(), here));
        NetworkSolution app = NetworkSolution.solve(editor, editor.draft(), Catalog.bundled(), here, (a, b, c) -> {});
        // Same engine on the same list; the roughness shown in mm (0.0015 mm for 1.5E-6 m) may differ
        // from the reader's metres in the last binary digit, far below this.
        for (NetworkResult.LinkResult l : direct.links()) {
            double shown = app.link(l.id()).orElseThrow().flow();
            assertEquals(l.flow(), shown, 1e-12 * Math.abs(l.flow()), l.id());
        }
    }

    @Test
    void aRejectedCellKeepsItsValueAndNamesRowAndField() {
        NetworkEditor.Draft before = editor.draft();
        assertFalse(editor.setCell(NetworkEditor.Part.NODE, 1, "elevation", "4 kPa"));
        assertEquals(before, editor.draft());
        String m = editor.messages().get("nodes[1].elevation");
        assertTrue(m.startsWith("node row 2 (N1), elevation: "), m);
        assertTrue(m.endsWith("still using 10 m"), m);
        assertFalse(editor.canUndoProperty().get());
        assertFalse(editor.setCell(NetworkEditor.Part.LINK, 0, "kind", "sluice"));
        assertTrue(editor.messages().get("links[0].kind").contains("unknown kind \"sluice\""));
        assertFalse(editor.setCell(NetworkEditor.Part.NODE, 1, "id", "R1"));
        assertTrue(editor.messages().get("nodes[1].id").contains("used by row 1"));
    }

    @Test
    void aKindChangeClearsTheOldKindsCellsAndSaysWhatTheNewOneNeeds() {
        assertTrue(editor.setCell(NetworkEditor.Part.LINK, 0, "kind", "Valve"));
        assertEquals("valve", editor.cell(NetworkEditor.Part.LINK, 0, "kind"));
        assertEquals("", editor.cell(NetworkEditor.Part.LINK, 0, "length"));
        assertEquals("", editor.cell(NetworkEditor.Part.LINK, 0, "diameter"));
        assertTrue(
                editor.problemProperty().get().startsWith("link row 1 (L1), kv: "),
                editor.problemProperty().get());
        assertTrue(editor.setCell(NetworkEditor.Part.LINK, 0, "kv", "40"));
        assertEquals("", editor.problemProperty().get());
    }

    @Test
    void aRenamedNodeTakesItsLinksAlongAndUndoBringsBothBack() {
        assertTrue(editor.setCell(NetworkEditor.Part.NODE, 1, "id", "Hill"));
        assertEquals("Hill", editor.cell(NetworkEditor.Part.LINK, 0, "to"));
        assertTrue(editor.undo());
        assertEquals("N1", editor.cell(NetworkEditor.Part.NODE, 1, "id"));
        assertEquals("N1", editor.cell(NetworkEditor.Part.LINK, 0, "to"));
        assertTrue(editor.redo());
        assertEquals("Hill", editor.cell(NetworkEditor.Part.LINK, 0, "to"));
    }

    @Test
    void addDuplicateAndRemoveKeepIdsUnique() {
        int n = editor.add(NetworkEditor.Part.NODE);
        assertEquals("N3", editor.cell(NetworkEditor.Part.NODE, n, "id"));
        int d = editor.duplicate(NetworkEditor.Part.NODE, n);
        assertEquals("N4", editor.cell(NetworkEditor.Part.NODE, d, "id"));
        int l = editor.add(NetworkEditor.Part.LINK);
        assertEquals("L2", editor.cell(NetworkEditor.Part.LINK, l, "id"));
        assertEquals("N3", editor.cell(NetworkEditor.Part.LINK, l, "from"));
        assertEquals("N4", editor.cell(NetworkEditor.Part.LINK, l, "to"));
        assertEquals("200 m", editor.cell(NetworkEditor.Part.LINK, l, "length"), "a new link copies the pipe");
        assertTrue(editor.remove(NetworkEditor.Part.LINK, l));
        assertEquals(1, editor.draft().links().size());
        assertFalse(editor.remove(NetworkEditor.Part.LINK, 0), "the last link stays");
        for (int i = 0; i < 4; i++) {
            assertTrue(editor.undo());
        }
        assertEquals(NetworkEditor.blank(), editor.draft());
        assertFalse(editor.undo());
    }

    @Test
    void theExportedLineListReadsBackAsTheCommandLineReadsIt(@TempDir Path dir) throws Exception {
        editor.load(Project.network("Hillcrest", "water", "15 degC", "auto", hillcrest()), null);
        Path nodes = dir.resolve("n.csv");
        Path links = dir.resolve("l.csv");
        editor.exportLineList(nodes, links);
        assertEquals(editor.read(editor.draft()), LineList.read(nodes, links, Catalog.bundled(), false));
        assertTrue(Files.readString(links).startsWith("id,name,from,to,kind,length"));
        Project.NetworkSpec exported = editor.read(editor.draft());
        editor.newNetwork();
        editor.importLineList(nodes, links);
        assertEquals(exported, editor.read(editor.draft()), "imported as exported");
        assertTrue(editor.undo(), "an import is one undo step");
        assertEquals(NetworkEditor.blank(), editor.draft());
        Files.writeString(links, "id,from,to,length\nP1,TANK,J1,12 kPa\n");
        InputException e = assertThrows(InputException.class, () -> editor.importLineList(nodes, links));
        assertTrue(e.getMessage().contains("line 2, column length"), e.getMessage());
    }

    /**
     * One pipe from a reservoir to a junction: the flow is the junction's demand (continuity) and
     * the loss is Darcy–Weisbach with Colebrook–White computed here on its own.
     */
    @Test
    void aSinglePipeLosesWhatDarcyWeisbachAndColebrookGive() {
        Path here = Path.of("").toAbsolutePath();
        NetworkSolution s = NetworkSolution.solve(editor, editor.draft(), Catalog.bundled(), here, (a, b, c) -> {});
        NetworkResult.LinkResult l = s.link("L1").orElseThrow();
        assertEquals(2e-3, l.flow(), 1e-12);
        double d = 0.1;
        double q = 2e-3;
        double v = q / (Math.PI * d * d / 4);
        // Water at 15 °C: ν = 1.1386e-6 m²/s (IAPWS 2008 viscosity over IF97 density; from memory).
        double re = v * d / 1.1386e-6;
        double f = 0.02;
        for (int i = 0; i < 50; i++) {
            f = Math.pow(-2 * Math.log10(0.05e-3 / (3.7 * d) + 2.51 / (re * Math.sqrt(f))), -2);
        }
        double loss = f * 200 / d * v * v / (2 * 9.80665);
        // 0.2 %: the viscosity recalled to 5 digits moves f by far less.
        assertEquals(loss, l.headLoss(), 0.002 * loss);
        assertEquals(40 - loss, s.node("N1").orElseThrow().head(), 0.002 * loss);
    }

    @Test
    void aNetworkProjectOpenedBeforeTheWindowIsHandedToTheWorkspace(@TempDir Path dir) {
        Path file = dir.resolve("hillcrest.json");
        org.headway.project.ProjectFile.save(
                Project.network("Hillcrest", "water", "15 degC", "auto", hillcrest()), file);
        ProjectEditor runs =
                new ProjectEditor(Catalog.bundled(), new FakeDialogs(), new RecentFiles(dir.resolve("recent.txt")));
        Project before = runs.project();
        assertTrue(runs.openFile(file));
        assertEquals(before, runs.project(), "the series run is left as it was");
        java.util.List<Path> handed = new java.util.ArrayList<>();
        runs.onNetworkProject((p, f) -> {
            editor.load(p, f);
            return handed.add(f);
        });
        assertEquals(java.util.List.of(file.toAbsolutePath()), handed);
        assertEquals(8, editor.draft().nodes().size());
    }
}
