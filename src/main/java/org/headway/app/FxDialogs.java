package org.headway.app;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.Optional;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Label;
import javafx.stage.FileChooser;
import javafx.stage.Window;

/** {@link Dialogs} with the toolkit's file choosers and alerts. */
final class FxDialogs implements Dialogs {

    private final Window owner;

    FxDialogs(Window owner) {
        this.owner = owner;
    }

    @Override
    public Optional<Path> chooseProjectToOpen(Path startFolder) {
        FileChooser chooser = chooser("Open a project", startFolder);
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Headway projects (*.json)", "*.json"));
        File f = chooser.showOpenDialog(owner);
        return Optional.ofNullable(f).map(File::toPath);
    }

    @Override
    public Optional<Path> chooseProjectSaveTarget(Path startFolder, String suggestedName) {
        FileChooser chooser = chooser("Save the project as", startFolder);
        chooser.setInitialFileName(suggestedName);
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Headway projects (*.json)", "*.json"));
        File f = chooser.showSaveDialog(owner);
        return Optional.ofNullable(f).map(File::toPath);
    }

    @Override
    public Optional<Path> chooseExportTarget(Path startFolder, String suggestedName, String description) {
        FileChooser chooser = chooser("Export the " + description, startFolder);
        chooser.setInitialFileName(suggestedName);
        int dot = suggestedName.lastIndexOf('.');
        if (dot > 0) {
            String ext = suggestedName.substring(dot);
            chooser.getExtensionFilters()
                    .add(new FileChooser.ExtensionFilter(description + " (*" + ext + ")", "*" + ext));
        }
        File f = chooser.showSaveDialog(owner);
        return Optional.ofNullable(f).map(File::toPath);
    }

    @Override
    public UnsavedAnswer askUnsavedChanges(String projectName) {
        ButtonType save = new ButtonType("Save", ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType("Don't save", ButtonBar.ButtonData.NO);
        ButtonType cancel = new ButtonType("Keep editing", ButtonBar.ButtonData.CANCEL_CLOSE);
        Alert alert = new Alert(Alert.AlertType.CONFIRMATION, "", save, discard, cancel);
        alert.initOwner(owner);
        alert.setTitle("Unsaved changes");
        alert.setHeaderText("Save the changes to \"" + projectName + "\"?");
        alert.setContentText("Changes not saved are lost.");
        ButtonType answer = alert.showAndWait().orElse(cancel);
        if (answer == save) {
            return UnsavedAnswer.SAVE;
        }
        return answer == discard ? UnsavedAnswer.DISCARD : UnsavedAnswer.CANCEL;
    }

    @Override
    public void showError(String heading, String message) {
        Alert alert = new Alert(Alert.AlertType.ERROR);
        alert.initOwner(owner);
        alert.setTitle("Headway");
        alert.setHeaderText(heading);
        Label text = new Label(message);
        text.setWrapText(true);
        text.setMaxWidth(560);
        alert.getDialogPane().setContent(text);
        alert.showAndWait();
    }

    @Override
    public Optional<Path> chooseDataToImport(Path startFolder) {
        FileChooser chooser = chooser("Import measurements (CSV)", startFolder);
        chooser.getExtensionFilters()
                .addAll(
                        new FileChooser.ExtensionFilter("CSV with a header row (*.csv)", "*.csv"),
                        new FileChooser.ExtensionFilter("All files", "*"));
        File f = chooser.showOpenDialog(owner);
        return Optional.ofNullable(f).map(File::toPath);
    }

    @Override
    public Optional<Path> chooseRigFile(Path startFolder) {
        FileChooser chooser = chooser("Open a rig file", startFolder);
        chooser.getExtensionFilters()
                .addAll(
                        new FileChooser.ExtensionFilter("Rig files (*.json)", "*.json"),
                        new FileChooser.ExtensionFilter("All files", "*"));
        File f = chooser.showOpenDialog(owner);
        return Optional.ofNullable(f).map(File::toPath);
    }

    @Override
    public boolean askRestoreAutosave(String projectName, Instant savedAt) {
        ButtonType restore = new ButtonType("Restore", ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType("Throw away", ButtonBar.ButtonData.NO);
        Alert alert = new Alert(Alert.AlertType.CONFIRMATION, "", restore, discard);
        alert.initOwner(owner);
        alert.setTitle("Unsaved work found");
        alert.setHeaderText("Headway ended without saving changes to \"" + projectName + "\".");
        String when = DateTimeFormatter.ofPattern("d MMM yyyy, HH:mm")
                .withZone(ZoneId.systemDefault())
                .format(savedAt);
        alert.setContentText("An automatic copy was kept at " + when
                + ". Restore it as unsaved changes? (Throw away deletes the copy; the project file stays as it is.)");
        return alert.showAndWait().orElse(discard) == restore;
    }

    private static FileChooser chooser(String title, Path startFolder) {
        FileChooser chooser = new FileChooser();
        chooser.setTitle(title);
        if (startFolder != null && Files.isDirectory(startFolder)) {
            chooser.setInitialDirectory(startFolder.toFile());
        }
        return chooser;
    }

    @Override
    public void showText(String heading, String text) {
        Alert alert = new Alert(Alert.AlertType.INFORMATION);
        alert.initOwner(owner);
        alert.setTitle("Headway — " + heading);
        alert.setHeaderText(heading);
        javafx.scene.control.TextArea area = new javafx.scene.control.TextArea(text);
        area.setEditable(false);
        area.setWrapText(true);
        area.setPrefColumnCount(90);
        area.setPrefRowCount(28);
        area.setStyle("-fx-font-family: 'DejaVu Sans Mono', monospace;");
        alert.getDialogPane().setContent(area);
        alert.setResizable(true);
        alert.showAndWait();
    }
}
