package org.headway.app;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.HexFormat;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.SimpleStringProperty;
import org.headway.caution.InputException;
import org.headway.project.AtomicFiles;
import org.headway.project.Project;
import org.headway.project.ProjectFile;

/**
 * Keeps a copy of unsaved work in the user's data folder so that a crash loses at most the last
 * few seconds: one file per project ({@code autosave-<key>.json}, the key a hash of the project's
 * path, {@code untitled} for a project never saved) with a note beside it naming the project.
 * Written atomically; removed after a clean save or a clean exit. At start, an autosave newer than
 * its project file means the app ended without saving, and the engineer is offered it back.
 *
 * <p>The timing is the view's: it calls {@link #saveNow} a moment after each edit and every
 * minute. This class does the file work only, with no toolkit.
 */
public final class Autosave {

    /** Pause after an edit before the copy is written (ms). */
    public static final long DEBOUNCE_MS = 2_000;

    /** Interval of the periodic copy (ms). */
    public static final long INTERVAL_MS = 60_000;

    private final ProjectEditor editor;
    private final Dialogs dialogs;
    private final Path folder;
    private final SimpleStringProperty problem = new SimpleStringProperty("");
    private Path lastWritten;

    /**
     * @param editor the project being edited
     * @param dialogs where the restore question goes
     * @param folder folder for the copies (created when first needed)
     */
    public Autosave(ProjectEditor editor, Dialogs dialogs, Path folder) {
        this.editor = editor;
        this.dialogs = dialogs;
        this.folder = folder;
        // A clean save makes the copy pointless; so does opening another project after a discard.
        editor.dirtyProperty().addListener((o, was, now) -> {
            if (!now) {
                discard();
            }
        });
    }

    /** The copies' folder inside the user's data folder. */
    public static Path inUserDataFolder() {
        return RecentFiles.userDataFolder().resolve("autosave");
    }

    /** Why the last copy could not be written, empty when it was. */
    public ReadOnlyStringProperty problemProperty() {
        return problem;
    }

    /** The copy for the project file given (null: a project never saved). */
    public Path fileFor(Path projectFile) {
        return folder.resolve("autosave-" + key(projectFile) + ".json");
    }

    private static String key(Path projectFile) {
        if (projectFile == null) {
            return "untitled";
        }
        try {
            byte[] hash = MessageDigest.getInstance("SHA-256")
                    .digest(projectFile.toAbsolutePath().normalize().toString().getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(hash, 0, 8);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }

    /**
     * Writes the copy if there are unsaved changes, else removes it. A failed write is reported
     * through {@link #problemProperty()} and never touches the project file.
     *
     * @return true when a copy was written
     */
    public boolean saveNow() {
        if (!editor.dirtyProperty().get()) {
            discard();
            return false;
        }
        Path target = fileFor(editor.fileProperty().get());
        Project p = editor.project();
        try {
            Files.createDirectories(folder);
            ProjectFile.save(p, target);
            Path origin = editor.fileProperty().get();
            byte[] note = ((origin == null ? "(never saved) " + editor.displayName() : origin.toString()) + "\n")
                    .getBytes(StandardCharsets.UTF_8);
            AtomicFiles.write(note(target), true, out -> out.write(note));
        } catch (IOException | UncheckedIOException | InputException e) {
            problem.set("Autosave failed (" + target.getParent() + "): " + e.getMessage());
            return false;
        }
        if (lastWritten != null && !lastWritten.equals(target)) {
            delete(lastWritten);
        }
        lastWritten = target;
        problem.set("");
        return true;
    }

    /**
     * Removes the copy this session wrote (after a Save as, the one under the old name). A copy left
     * by an earlier session for another project is left alone: it is offered when that project is
     * opened at start.
     */
    public void discard() {
        if (lastWritten != null) {
            delete(lastWritten);
            lastWritten = null;
        }
    }

    /**
     * At start, after the project (if any) is open: if a copy newer than the project file exists,
     * asks whether to restore it; yes puts it in place as unsaved changes, no deletes it.
     *
     * @return true when the copy was restored
     */
    public boolean offerRestore() {
        Path projectFile = editor.fileProperty().get();
        Path copy = fileFor(projectFile);
        if (!Files.isRegularFile(copy)) {
            return false;
        }
        Instant copyTime;
        Project kept;
        try {
            copyTime = Files.getLastModifiedTime(copy).toInstant();
            if (projectFile != null
                    && Files.isRegularFile(projectFile)
                    && !copyTime.isAfter(Files.getLastModifiedTime(projectFile).toInstant())) {
                // Saved after the copy was taken: the file is the newer work.
                delete(copy);
                return false;
            }
            kept = ProjectFile.load(copy);
        } catch (IOException | UncheckedIOException | InputException e) {
            problem.set("An autosaved copy could not be read and was left in " + folder + ": " + e.getMessage());
            return false;
        }
        if (kept.equals(editor.project())) {
            delete(copy);
            return false;
        }
        if (dialogs.askRestoreAutosave(editor.displayName(), copyTime)) {
            editor.restoreUnsaved(kept);
            lastWritten = copy;
            return true;
        }
        delete(copy);
        return false;
    }

    private static Path note(Path copy) {
        String name = copy.getFileName().toString();
        return copy.resolveSibling(name.substring(0, name.length() - ".json".length()) + ".txt");
    }

    private static void delete(Path copy) {
        try {
            Files.deleteIfExists(copy);
            Files.deleteIfExists(note(copy));
        } catch (IOException e) {
            // A copy that cannot be deleted is offered again at the next start; nothing is lost.
        }
    }
}
