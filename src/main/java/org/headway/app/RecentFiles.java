package org.headway.app;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.headway.project.AtomicFiles;

/**
 * The projects opened or saved lately, newest first, kept in a small text file (one absolute path
 * a line) in the user's data folder so they survive a restart.
 */
public final class RecentFiles {

    /** How many projects the list keeps. */
    public static final int MAX_ENTRIES = 8;

    private final Path store;
    private final ObservableList<Path> entries = FXCollections.observableArrayList();

    /** @param store the text file to read and write; it need not exist yet */
    public RecentFiles(Path store) {
        this.store = store;
        entries.setAll(read(store));
    }

    /**
     * The list in the user's data folder: {@code $XDG_DATA_HOME/headway} or {@code
     * ~/.local/share/headway} (on Windows {@code %APPDATA%\Headway}), unless the system property
     * {@code headway.dataDir} names another folder.
     */
    public static RecentFiles inUserDataFolder() {
        return new RecentFiles(userDataFolder().resolve("recent-projects.txt"));
    }

    /** The folder Headway keeps its own small files in. */
    public static Path userDataFolder() {
        String override = System.getProperty("headway.dataDir");
        if (override != null && !override.isBlank()) {
            return Path.of(override);
        }
        String appData = System.getenv("APPDATA");
        if (appData != null && System.getProperty("os.name", "").startsWith("Windows")) {
            return Path.of(appData, "Headway");
        }
        String xdg = System.getenv("XDG_DATA_HOME");
        Path base = xdg != null && !xdg.isBlank()
                ? Path.of(xdg)
                : Path.of(System.getProperty("user.home"), ".local", "share");
        return base.resolve("headway");
    }

    /** Newest first; the view binds its menu to this list. */
    public ObservableList<Path> entries() {
        return entries;
    }

    /** Moves a project to the top of the list and writes the list; a failed write is not an error. */
    public void add(Path file) {
        Path absolute = file.toAbsolutePath().normalize();
        entries.remove(absolute);
        entries.add(0, absolute);
        if (entries.size() > MAX_ENTRIES) {
            entries.remove(MAX_ENTRIES, entries.size());
        }
        write();
    }

    /** Removes a project, e.g. one that no longer opens. */
    public void remove(Path file) {
        entries.remove(file.toAbsolutePath().normalize());
        write();
    }

    private void write() {
        StringBuilder text = new StringBuilder();
        for (Path p : entries) {
            text.append(p).append('\n');
        }
        byte[] bytes = text.toString().getBytes(StandardCharsets.UTF_8);
        try {
            AtomicFiles.write(store, true, out -> out.write(bytes));
        } catch (RuntimeException e) {
            // The list is a convenience: a read-only home folder must not stop the engineer's work.
        }
    }

    private static List<Path> read(Path store) {
        List<Path> list = new ArrayList<>();
        if (!Files.isRegularFile(store)) {
            return list;
        }
        try {
            for (String line : Files.readAllLines(store, StandardCharsets.UTF_8)) {
                String t = line.strip();
                if (t.isEmpty() || list.size() >= MAX_ENTRIES) {
                    continue;
                }
                try {
                    Path p = Path.of(t).toAbsolutePath().normalize();
                    if (!list.contains(p)) {
                        list.add(p);
                    }
                } catch (InvalidPathException ignored) {
                    // A line this machine cannot read as a path is skipped, not fatal.
                }
            }
        } catch (IOException e) {
            return new ArrayList<>();
        }
        return list;
    }
}
