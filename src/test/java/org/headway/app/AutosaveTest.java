package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.List;
import org.headway.pipe.Catalog;
import org.headway.project.AtomicFiles;
import org.headway.project.ProjectFile;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Autosave, restore after a crash, and saves that fail: the view-models without the toolkit. */
class AutosaveTest {

    @TempDir
    Path dir;

    private Path demo;
    private Path copies;

    @BeforeEach
    void setUp() throws Exception {
        demo = Demo.copyTo(dir);
        copies = dir.resolve("data").resolve("autosave");
    }

    /** A fresh start of the app on the demo project: a new editor and autosave over the same folders. */
    private record Session(FakeDialogs dialogs, ProjectEditor editor, Autosave autosave) {}

    private Session start() {
        FakeDialogs dialogs = new FakeDialogs();
        ProjectEditor editor =
                new ProjectEditor(Catalog.bundled(), dialogs, new RecentFiles(dir.resolve("recent.txt")));
        assertTrue(editor.openFile(demo));
        return new Session(dialogs, editor, new Autosave(editor, dialogs, copies));
    }

    @Test
    void afterACrashTheUnsavedWorkIsOfferedAndRestoredAsUnsavedChanges() throws Exception {
        Session before = start();
        before.editor().setFlow("11.5 L/s");
        assertTrue(
                before.autosave().saveNow(), before.autosave().problemProperty().get());
        Path copy = before.autosave().fileFor(demo.toAbsolutePath());
        assertTrue(Files.isRegularFile(copy));
        assertEquals("11.5 L/s", ProjectFile.load(copy).flow());
        assertTrue(Files.readString(
                        copy.resolveSibling(copy.getFileName().toString().replace(".json", ".txt")))
                .contains(demo.getFileName().toString()));
        // The JVM ends here without a save or a clean exit: nothing removes the copy.

        Session after = start();
        after.dialogs().restoreAnswers.add(true);
        assertTrue(after.autosave().offerRestore());
        assertEquals(List.of("demo-orchard-booster"), after.dialogs().restoreAsked);
        assertEquals("11.5 L/s", after.editor().project().flow());
        assertTrue(after.editor().dirtyProperty().get(), "restored work is unsaved until saved");
        assertFalse(
                "11.5 L/s".equals(ProjectFile.load(demo).flow()),
                "the project file itself is untouched by the restore");
        assertTrue(after.editor().undo(), "undo goes back to the file's version");
        assertEquals(ProjectFile.load(demo), after.editor().project());
        assertTrue(after.editor().redo());

        assertTrue(after.editor().save());
        assertFalse(Files.exists(copy), "a clean save removes the copy");
        assertEquals("11.5 L/s", ProjectFile.load(demo).flow());
    }

    @Test
    void declinedRestoreDeletesTheCopyAndKeepsTheFile() throws Exception {
        Session before = start();
        before.editor().setFlow("11.5 L/s");
        before.autosave().saveNow();
        Session after = start();
        after.dialogs().restoreAnswers.add(false);
        assertFalse(after.autosave().offerRestore());
        assertEquals(ProjectFile.load(demo), after.editor().project());
        assertFalse(Files.exists(after.autosave().fileFor(demo.toAbsolutePath())));
        Session third = start();
        assertFalse(third.autosave().offerRestore(), "nothing left to offer (a question would fail the fake)");
    }

    @Test
    void aCopyOlderThanTheProjectFileIsNotOffered() throws Exception {
        Session before = start();
        before.editor().setFlow("11.5 L/s");
        before.autosave().saveNow();
        Path copy = before.autosave().fileFor(demo.toAbsolutePath());
        Files.setLastModifiedTime(copy, FileTime.from(Instant.now().minusSeconds(3600)));
        Files.setLastModifiedTime(demo, FileTime.from(Instant.now()));
        Session after = start();
        assertFalse(after.autosave().offerRestore());
        assertTrue(after.dialogs().restoreAsked.isEmpty());
        assertFalse(Files.exists(copy));
    }

    @Test
    void noUnsavedChangesNoCopyAndACleanExitRemovesIt() {
        Session s = start();
        assertFalse(s.autosave().saveNow(), "nothing to keep");
        s.editor().setFlow("11.5 L/s");
        assertTrue(s.autosave().saveNow());
        Path copy = s.autosave().fileFor(demo.toAbsolutePath());
        assertTrue(Files.exists(copy));
        s.autosave().discard();
        assertFalse(Files.exists(copy));
    }

    @Test
    void openingAnotherProjectLeavesThatProjectsCopyForItsNextStart() throws Exception {
        Session before = start();
        before.editor().setFlow("11.5 L/s");
        before.autosave().saveNow();
        Path copy = before.autosave().fileFor(demo.toAbsolutePath());
        // Next session starts on a new project, then opens the demo from the menu.
        FakeDialogs dialogs = new FakeDialogs();
        ProjectEditor editor = new ProjectEditor(Catalog.bundled(), dialogs, new RecentFiles(dir.resolve("r.txt")));
        new Autosave(editor, dialogs, copies);
        assertTrue(editor.openFile(demo));
        assertTrue(Files.exists(copy), "not deleted behind the engineer's back");
    }

    @Test
    void aNeverSavedProjectIsKeptUnderUntitledAndMovesWithSaveAs() throws Exception {
        FakeDialogs dialogs = new FakeDialogs();
        ProjectEditor editor = new ProjectEditor(Catalog.bundled(), dialogs, new RecentFiles(dir.resolve("r.txt")));
        Autosave autosave = new Autosave(editor, dialogs, copies);
        editor.setTitle("Fresh run");
        assertTrue(autosave.saveNow());
        Path untitled = copies.resolve("autosave-untitled.json");
        assertTrue(Files.exists(untitled));
        dialogs.files.add(dir.resolve("fresh.json"));
        assertTrue(editor.saveAs());
        assertFalse(Files.exists(untitled), "saved under a name: the untitled copy goes");
    }

    @Test
    void anAutosaveThatCannotBeWrittenSaysWhyAndLeavesTheProjectFileAlone() throws Exception {
        Files.createDirectories(copies.getParent());
        Files.writeString(copies, "a file where the autosave folder should be");
        byte[] original = Files.readAllBytes(demo);
        Session s = start();
        s.editor().setFlow("11.5 L/s");
        assertFalse(s.autosave().saveNow());
        assertTrue(
                s.autosave().problemProperty().get().startsWith("Autosave failed"),
                s.autosave().problemProperty().get());
        assertArrayEquals(original, Files.readAllBytes(demo));
        assertTrue(s.dialogs().errors.isEmpty(), "a background copy does not interrupt with a dialog");
    }

    /**
     * A save that fails part-way (a full disk, simulated by a writer that stops after some bytes)
     * leaves the previous file byte for byte, tells the user why, and keeps the edits unsaved.
     */
    @Test
    void aFailedSaveNeverTouchesThePreviousGoodFileAndSaysWhy() throws Exception {
        byte[] original = Files.readAllBytes(demo);
        Session s = start();
        s.editor().setFlow("11.5 L/s");
        s.editor()
                .useWriter((project, target) -> AtomicFiles.write(target, true, out -> {
                    out.write(ProjectFile.toJson(project).substring(0, 40).getBytes(StandardCharsets.UTF_8));
                    throw new IOException("No space left on device");
                }));
        assertFalse(s.editor().save());
        assertArrayEquals(original, Files.readAllBytes(demo));
        assertEquals(1, s.dialogs().errors.size());
        String error = s.dialogs().errors.get(0);
        assertTrue(error.startsWith("Could not save demo-orchard-booster.json: "), error);
        assertTrue(error.contains("No space left on device") && error.contains("disk is full"), error);
        assertTrue(s.editor().dirtyProperty().get(), "the edits are still unsaved, not lost");
        assertEquals("11.5 L/s", s.editor().project().flow());
        try (var left = Files.list(dir)) {
            assertTrue(left.noneMatch(p -> p.getFileName().toString().endsWith(".tmp")), "no temporary file left");
        }
    }
}
