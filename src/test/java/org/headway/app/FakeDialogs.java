package org.headway.app;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;

/** Dialogs answered from queues, recording what was asked. */
final class FakeDialogs implements Dialogs {

    final Deque<Path> files = new ArrayDeque<>();
    final Deque<UnsavedAnswer> answers = new ArrayDeque<>();
    final List<String> errors = new ArrayList<>();
    int unsavedAsked;
    final Deque<Boolean> restoreAnswers = new ArrayDeque<>();
    final List<String> restoreAsked = new ArrayList<>();

    @Override
    public Optional<Path> chooseProjectToOpen(Path startFolder) {
        return Optional.ofNullable(files.poll());
    }

    @Override
    public Optional<Path> chooseProjectSaveTarget(Path startFolder, String suggestedName) {
        return Optional.ofNullable(files.poll());
    }

    @Override
    public Optional<Path> chooseExportTarget(Path startFolder, String suggestedName, String description) {
        return Optional.ofNullable(files.poll());
    }

    @Override
    public UnsavedAnswer askUnsavedChanges(String projectName) {
        unsavedAsked++;
        UnsavedAnswer a = answers.poll();
        if (a == null) {
            throw new AssertionError("unexpected unsaved-changes question for " + projectName);
        }
        return a;
    }

    @Override
    public void showError(String heading, String message) {
        errors.add(heading + ": " + message);
    }

    @Override
    public Optional<Path> chooseDataToImport(Path startFolder) {
        return Optional.ofNullable(files.poll());
    }

    @Override
    public boolean askRestoreAutosave(String projectName, Instant savedAt) {
        restoreAsked.add(projectName);
        Boolean a = restoreAnswers.poll();
        if (a == null) {
            throw new AssertionError("unexpected restore question for " + projectName);
        }
        return a;
    }

    @Override
    public Optional<Path> chooseRigFile(Path startFolder) {
        return Optional.ofNullable(files.poll());
    }

    final List<String> texts = new ArrayList<>();

    @Override
    public void showText(String heading, String text) {
        texts.add(heading + "\n" + text);
    }
}
