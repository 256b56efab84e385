package org.headway.app;

import java.nio.file.Path;
import java.time.Instant;
import java.util.Optional;

/**
 * Everything a view-model asks the user through a dialog. The desktop implements it with file
 * choosers and alerts; tests pass a fake.
 */
public interface Dialogs {

    /** The answer to "the project has unsaved changes". */
    enum UnsavedAnswer {
        SAVE,
        DISCARD,
        CANCEL
    }

    /**
     * @param startFolder folder to start in (may be null)
     * @return the project file chosen, or empty when the user cancels
     */
    Optional<Path> chooseProjectToOpen(Path startFolder);

    /**
     * @param startFolder folder to start in (may be null)
     * @param suggestedName file name to offer
     * @return where to save, or empty when the user cancels
     */
    Optional<Path> chooseProjectSaveTarget(Path startFolder, String suggestedName);

    /**
     * @param startFolder folder to start in (may be null)
     * @param suggestedName file name to offer, with its extension
     * @param description what is being exported, e.g. "PDF sheet"
     * @return the file to write, or empty when the user cancels
     */
    Optional<Path> chooseExportTarget(Path startFolder, String suggestedName, String description);

    /**
     * @param projectName name of the project with unsaved changes
     * @return what to do with them
     */
    UnsavedAnswer askUnsavedChanges(String projectName);

    /**
     * Tells the user something went wrong; the work they did stays as it was.
     *
     * @param heading one line saying what failed
     * @param message the engine's message, in plain words
     */
    void showError(String heading, String message);

    /**
     * @param startFolder folder to start in (may be null)
     * @return the data file (CSV) chosen, or empty when the user cancels
     */
    Optional<Path> chooseDataToImport(Path startFolder);

    /**
     * Offers work kept by the autosave after the app ended without saving it (a crash).
     *
     * @param projectName the project the autosave belongs to
     * @param savedAt when the autosave was written
     * @return true to restore it (as unsaved changes), false to throw it away
     */
    boolean askRestoreAutosave(String projectName, Instant savedAt);

    /**
     * @param startFolder folder to start in (may be null)
     * @return the rig file (JSON naming its data CSV) chosen, or empty when the user cancels
     */
    Optional<Path> chooseRigFile(Path startFolder);

    /**
     * Shows a page of reference text (the Help menu's pages), read-only and selectable.
     *
     * @param heading what the page is
     * @param text the page
     */
    void showText(String heading, String text);
}
