package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.units.UnitSystem;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The editor's view-model, without the toolkit. */
class ProjectEditorTest {

    @TempDir
    Path dir;

    private FakeDialogs dialogs;
    private ProjectEditor editor;
    private Path demo;

    @BeforeEach
    void openDemo() throws Exception {
        dialogs = new FakeDialogs();
        editor = new ProjectEditor(Catalog.bundled(), dialogs, new RecentFiles(dir.resolve("recent.txt")));
        demo = Demo.copyTo(dir);
        assertTrue(editor.openFile(demo));
    }

    /** Name of the segment the pump feeds (the first pipe after it in flow order). */
    private String segmentThePumpFeeds() {
        int upstream = editor.project().pump().orElseThrow().position();
        return editor.project().segments().get(upstream).name();
    }

    /**
     * The pump stays on the segment it feeds when segments move or go: the demo's pump feeds the
     * discharge header (the invented demo file's element order is the reference).
     */
    @Test
    void thePumpFollowsTheSegmentItFeeds() {
        String fed = segmentThePumpFeeds();
        String before = editor.pumpPositionText();
        int from = Integer.parseInt(before) - 1;
        assertEquals(from + 1, editor.moveSegment(from, +1));
        assertEquals(fed, segmentThePumpFeeds());
        assertEquals(String.valueOf(from + 2), editor.pumpPositionText());
        // moving a segment from upstream of the pump to below it moves the pump up one
        assertEquals(1, editor.moveSegment(0, +1));
        assertEquals(fed, segmentThePumpFeeds());
        // removing a segment upstream of the pump keeps it on the same segment
        int upstream = editor.project().pump().orElseThrow().position();
        assertTrue(upstream > 0);
        assertTrue(editor.removeSegment(0));
        assertEquals(fed, segmentThePumpFeeds());
        // removing the segment it feeds puts it on the next one down
        int at = editor.project().pump().orElseThrow().position();
        String next = editor.project().segments().get(at + 1).name();
        assertTrue(editor.removeSegment(at));
        assertEquals(next, segmentThePumpFeeds());
    }

    @Test
    void aBadQuantityIsRejectedWithAMessageAndThePreviousValueKept() {
        assertFalse(editor.setSegmentField(2, SegmentField.LENGTH, "420 kPa"));
        assertEquals("420 m", editor.project().segments().get(2).length());
        String message = editor.messages().get("segments[2].length");
        assertTrue(message.startsWith("length expected, got \"420 kPa\""), message);
        assertTrue(message.endsWith("still using 420 m"), message);
        assertFalse(editor.dirtyProperty().get(), "a rejected edit changes nothing");

        assertTrue(editor.setSegmentField(2, SegmentField.LENGTH, "400 m"));
        assertFalse(editor.messages().containsKey("segments[2].length"), "an accepted edit clears the message");
    }

    @Test
    void negativeLengthIsRejectedButAFallIsAccepted() {
        assertFalse(editor.setSegmentField(0, SegmentField.LENGTH, "-3 m"));
        assertTrue(editor.messages().get("segments[0].length").contains("must not be negative"));
        assertTrue(editor.setSegmentField(0, SegmentField.ELEVATION, "-1.5 m"));
        assertEquals("-1.5 m", editor.project().segments().get(0).elevationChange());
    }

    @Test
    void aBareNumberTakesTheUnitShown() {
        assertTrue(editor.setSegmentField(1, SegmentField.LENGTH, "20"));
        assertEquals("20 m", editor.project().segments().get(1).length());
        editor.unitSystemProperty().set(UnitSystem.US_CUSTOMARY);
        assertTrue(editor.setSegmentField(1, SegmentField.LENGTH, "20"));
        assertEquals("20 ft", editor.project().segments().get(1).length());
        assertTrue(editor.setFlow("150"));
        assertEquals("150 gpm", editor.project().flow());
    }

    @Test
    void zeroFlowAndUnknownFluidAreRejected() {
        assertFalse(editor.setFlow("0 L/s"));
        assertEquals("9 L/s", editor.project().flow());
        assertFalse(editor.setFluid("treacle"));
        assertTrue(
                editor.messages().get("fluid").contains("treacle"),
                editor.messages().get("fluid"));
        assertEquals("water", editor.project().fluid().name());
    }

    @Test
    void undoAndRedoWalkThroughEdits() {
        Project original = editor.project();
        editor.setSegmentField(2, SegmentField.LENGTH, "500 m");
        editor.setFlow("10 L/s");
        assertTrue(editor.dirtyProperty().get());
        assertTrue(editor.undo());
        assertEquals("9 L/s", editor.project().flow());
        assertEquals("500 m", editor.project().segments().get(2).length());
        assertTrue(editor.undo());
        assertEquals(original, editor.project());
        assertFalse(editor.dirtyProperty().get(), "undoing every edit gives back the saved project");
        assertFalse(editor.undo());
        assertTrue(editor.redo());
        assertTrue(editor.redo());
        assertEquals("10 L/s", editor.project().flow());
        assertFalse(editor.redo());
        editor.undo();
        editor.setTitle("Another title");
        assertFalse(editor.canRedoProperty().get(), "a new edit drops the redo steps");
    }

    @Test
    void segmentsAreAddedRemovedAndReordered() {
        editor.addSegment();
        assertEquals(5, editor.project().segments().size());
        Project.SegmentSpec added = editor.project().segments().get(4);
        assertEquals("Segment 5", added.name());
        assertEquals(editor.project().segments().get(3).pipe(), added.pipe(), "a new segment copies the last pipe");
        assertEquals(0, editor.moveSegment(1, -1));
        assertEquals("Pump discharge header", editor.project().segments().get(0).name());
        assertEquals(0, editor.moveSegment(0, -1), "the first segment cannot move up");
        assertTrue(editor.removeSegment(4));
        assertEquals(4, editor.project().segments().size());
    }

    @Test
    void theLastSegmentCannotBeRemoved() {
        editor.newProject();
        assertFalse(editor.removeSegment(0));
        assertEquals(1, editor.project().segments().size());
    }

    @Test
    void anotherMaterialKeepsTheNearestBore() {
        // PVC NPS 3 Sch 40 to commercial steel: ASME B36.10M has NPS 3 Sch 40 too, so the size stays.
        assertTrue(editor.setSegmentField(2, SegmentField.MATERIAL, "steel-commercial-new"));
        Project.PipeSpec pipe = editor.project().segments().get(2).pipe().orElseThrow();
        assertEquals(new Project.PipeSpec("steel-commercial-new", "3", "40"), pipe);
    }

    @Test
    void explicitBoreStartsFromTheCatalogPipe() {
        assertTrue(editor.setSegmentField(0, SegmentField.MATERIAL, ""));
        Project.SegmentSpec s = editor.project().segments().get(0);
        assertTrue(s.pipe().isEmpty());
        // NPS 4 Sch 40: OD 114.3 mm, wall 6.02 mm, bore 102.26 mm (ASME B36.10M, from memory).
        assertEquals("102.3 mm", s.innerDiameter());
        assertFalse(s.roughness().isEmpty());
        assertFalse(editor.setSegmentField(0, SegmentField.BORE, ""), "an explicit bore cannot be blank");
    }

    @Test
    void aScheduleWithoutTheSizeMovesToTheNearestBore() {
        assertTrue(editor.setSegmentField(0, SegmentField.SCHEDULE, "80"));
        Project.PipeSpec pipe = editor.project().segments().get(0).pipe().orElseThrow();
        assertEquals("80", pipe.schedule());
        assertEquals("4", pipe.size());
        assertFalse(editor.setSegmentField(0, SegmentField.SIZE, "3.3"));
        assertTrue(editor.messages().get("segments[0].pipe.size").contains("3.3"));
    }

    @Test
    void fittingsAreEditedAsText() {
        assertTrue(editor.setSegmentField(2, SegmentField.FITTINGS, "elbow-45-long-radius ×6, exit"));
        var fittings = editor.project().segments().get(2).fittings();
        assertEquals(2, fittings.size());
        assertEquals(6, fittings.get(0).count());
        assertFalse(editor.setSegmentField(2, SegmentField.FITTINGS, "elbow-46"));
        assertTrue(editor.messages().get("segments[2].fittings").contains("elbow-46"));
        assertEquals(2, editor.project().segments().get(2).fittings().size());
    }

    @Test
    void saveAsWritesTheFileAtomicallyAndClearsDirty() throws Exception {
        editor.setSegmentField(2, SegmentField.LENGTH, "415 m");
        Path target = dir.resolve("copy");
        dialogs.files.add(target);
        assertTrue(editor.saveAs());
        Path written = dir.resolve("copy.json");
        assertTrue(Files.isRegularFile(written), "the extension is added");
        assertEquals(editor.project(), ProjectFile.load(written));
        assertFalse(editor.dirtyProperty().get());
        assertEquals(written.toAbsolutePath(), editor.recentFiles().entries().get(0));
        assertEquals("copy", editor.displayName());
    }

    @Test
    void unsavedChangesAreAskedAbout() {
        editor.setFlow("10 L/s");
        dialogs.answers.add(Dialogs.UnsavedAnswer.CANCEL);
        assertFalse(editor.newProject());
        assertEquals("10 L/s", editor.project().flow());
        dialogs.answers.add(Dialogs.UnsavedAnswer.DISCARD);
        assertTrue(editor.newProject());
        assertEquals(ProjectEditor.blankProject(), editor.project());
        assertEquals(2, dialogs.unsavedAsked);
        assertTrue(editor.newProject(), "nothing unsaved: no question");
        assertEquals(2, dialogs.unsavedAsked);
    }

    @Test
    void saveAnswerWritesBeforeGoingOn() throws Exception {
        editor.setFlow("10 L/s");
        dialogs.answers.add(Dialogs.UnsavedAnswer.SAVE);
        assertTrue(editor.newProject());
        assertEquals("10 L/s", ProjectFile.load(demo).flow());
    }

    @Test
    void aFileThatDoesNotLoadLeavesTheProjectAlone() throws Exception {
        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, "{\"format\": \"headway-project\", \"version\": 1, \"flow\": 3}");
        Project before = editor.project();
        assertFalse(editor.openFile(bad));
        assertEquals(before, editor.project());
        assertEquals(1, dialogs.errors.size());
        assertTrue(dialogs.errors.get(0).contains("bad.json"), dialogs.errors.get(0));
    }

    @Test
    void windowTitleMarksUnsavedChanges() {
        assertEquals(
                "demo-orchard-booster — Headway", editor.windowTitleProperty().get());
        editor.setFlow("10 L/s");
        assertEquals(
                "• demo-orchard-booster — Headway", editor.windowTitleProperty().get());
    }

    @Test
    void slugMakesAFileName() {
        assertEquals("alder-creek-orchard-booster", ProjectEditor.slug("Alder Creek — orchard booster!"));
        assertEquals("pipe-run", ProjectEditor.slug("  "));
    }

    @Test
    void tableSummariesShowBoreInTheChosenUnits() {
        var rows = editor.summaries();
        assertEquals(4, rows.size());
        assertEquals("102.3 mm", rows.get(0).bore());
        assertEquals("3 fittings", rows.get(0).fittings());
        editor.unitSystemProperty().set(UnitSystem.US_CUSTOMARY);
        // 102.26 mm / 25.4 = 4.026 in, the tabulated bore of NPS 4 Sch 40 (from memory).
        assertEquals("4.026 in", editor.summaries().get(0).bore());
        assertNotEquals(rows, editor.summaries());
    }

    @Test
    void endsAndLimitsAreEditedAndCleared() {
        assertTrue(editor.setRunField(ProjectEditor.RunField.DELIVERY_PRESSURE, "35"));
        assertEquals("35 kPa", editor.project().ends().delivery().pressure());
        // an end pressure may be a gauge or absolute reading; the project converts it with the site
        assertTrue(editor.setRunField(ProjectEditor.RunField.DELIVERY_PRESSURE, "1.5 bara"));
        assertEquals("1.5 bara", editor.project().ends().delivery().pressure());
        assertFalse(editor.setRunField(ProjectEditor.RunField.DELIVERY_PRESSURE, "1.5 m(g)"));
        assertTrue(editor.setRunField(ProjectEditor.RunField.DELIVERY_PRESSURE, "35"));
        assertEquals("2 m", editor.project().ends().source().level(), "the other end is untouched");
        assertFalse(editor.setRunField(ProjectEditor.RunField.MAXIMUM_VELOCITY, "-1 m/s"));
        String message = editor.messages().get("limits.maximumVelocity");
        assertTrue(message.endsWith("still using 2.5 m/s"), message);
        assertFalse(editor.setRunField(ProjectEditor.RunField.HEAD_BUDGET, "55 kPa"));
        assertTrue(editor.setRunField(ProjectEditor.RunField.HEAD_BUDGET, ""));
        assertEquals("", editor.project().limits().headBudget());
        assertEquals("5 m per 100 m", editor.runField(ProjectEditor.RunField.MAXIMUM_FRICTION_LOSS));
        // The friction limit is a gradient: a bare number is written out in the shown system, a head alone refused.
        assertTrue(editor.setRunField(ProjectEditor.RunField.MAXIMUM_FRICTION_LOSS, "4"));
        assertEquals("4 m per 100 m", editor.project().limits().maximumFrictionLossPer100m());
        assertFalse(editor.setRunField(ProjectEditor.RunField.MAXIMUM_FRICTION_LOSS, "4 ft"));
        assertTrue(
                editor.messages().get("limits.maximumFrictionLossPer100m").contains("write \"4 ft per 100 ft\""),
                editor.messages().get("limits.maximumFrictionLossPer100m"));
        editor.unitSystemProperty().set(UnitSystem.US_CUSTOMARY);
        assertTrue(editor.setRunField(ProjectEditor.RunField.MAXIMUM_FRICTION_LOSS, "4"));
        assertEquals("4 ft per 100 ft", editor.project().limits().maximumFrictionLossPer100m());
    }

    @Test
    void thePumpCurveIsEditedAsTextAndCanBeRemoved() {
        assertEquals("0 L/s: 58 m; 5 L/s: 56 m; 10 L/s: 50 m; 14 L/s: 41 m; 18 L/s: 28 m", editor.pumpPointsText());
        assertEquals("2", editor.pumpPositionText());
        assertTrue(editor.setPumpPoints("0 L/s: 60 m; 10 L/s: 52; 20 L/s: 30 m"));
        var pump = editor.project().pump().orElseThrow();
        assertEquals(
                new org.headway.project.Project.PumpPointSpec("10 L/s", "52 m"),
                pump.points().get(1));
        assertEquals("End-suction pump (invented curve)", pump.name(), "the name stays");
        assertFalse(editor.setPumpPoints("0 L/s: 60 m; 10 L/s 52 m; 20 L/s: 30 m"));
        assertTrue(editor.messages().get("pump.points").startsWith("pump point 2: expected \"flow: head\""));
        assertFalse(editor.setPumpPoints("0 L/s: 60 m; 10 L/s: 52 m"));
        assertFalse(editor.setPumpPosition("5"));
        assertTrue(editor.messages().get("pump.position").contains("from 1 to 4"));
        assertTrue(editor.setPumpPosition("1"));
        assertEquals(0, editor.project().pump().orElseThrow().position());
        assertTrue(editor.setPumpPoints(""));
        assertTrue(editor.project().pump().isEmpty());
        assertFalse(editor.setPumpPosition("1"), "no pump to move");
    }
}
