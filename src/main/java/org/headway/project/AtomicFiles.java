package org.headway.project;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import org.headway.caution.InputException;

/**
 * Atomic file writes: the content goes to a temporary file in the same folder, is forced to disk,
 * and is then moved over the target in one step, so a crash leaves either the old file or the new
 * one, never a torn mix.
 *
 * <ul>
 *   <li><b>Several files, all or none</b> ({@link #writeAll}): every temporary is written first (a
 *       full disk fails here, before any target changes), then all are moved into place.
 *   <li><b>Refusing an existing file</b> is atomic: the temporary is hard-linked to the target name,
 *       which fails if the name exists, so two writers of the same new file cannot both succeed nor
 *       one replace the other. Where the file system has no hard links, a check before the move is
 *       the fallback.
 *   <li><b>Permissions</b>: a replaced file keeps its own; a new one gets what the process's umask
 *       gives a new file (the temporary is created as an ordinary file, not a private temporary).
 *   <li><b>Temporary names</b> are short ({@code .hw-<16 hex>.tmp}), so that a legal long target name
 *       is not refused for its temporary's length. Temporaries in progress are removed when the JVM
 *       is stopped by SIGINT or SIGTERM (a shutdown hook); ones left by a killed process are removed
 *       by the next write into the same folder once they are an hour old.
 * </ul>
 */
public final class AtomicFiles {

    /** Writes the content of a file into a stream. */
    @FunctionalInterface
    public interface Writer {
        void write(OutputStream out) throws IOException;
    }

    /**
     * One file of a set written together.
     *
     * @param target the file to create or replace
     * @param writer produces its content
     */
    public record Entry(Path target, Writer writer) {}

    /** Prefix of temporary names. */
    static final String TEMP_PREFIX = ".hw-";

    /** Suffix of temporary names. */
    static final String TEMP_SUFFIX = ".tmp";

    /** Age after which a temporary is taken as left by a killed process (ms). */
    static final long STALE_AFTER_MS = 3_600_000;

    private static final Set<Path> IN_PROGRESS = ConcurrentHashMap.newKeySet();

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(AtomicFiles::removeInProgress, "headway-temporaries"));
    }

    private AtomicFiles() {}

    private static void removeInProgress() {
        for (Path p : IN_PROGRESS) {
            try {
                Files.deleteIfExists(p);
            } catch (IOException ignored) {
                // Best effort at exit.
            }
        }
    }

    /**
     * @param target file to create or replace
     * @param overwrite whether an existing target may be replaced
     * @param writer produces the content
     */
    public static void write(Path target, boolean overwrite, Writer writer) {
        writeAll(List.of(new Entry(target, writer)), overwrite);
    }

    /**
     * Writes several files, all or none.
     *
     * @param entries the files
     * @param overwrite whether existing targets may be replaced; if not, and any exists, none is
     *     written
     * @throws InputException naming an existing target when overwriting is not allowed
     * @throws UncheckedIOException naming the file and the reason when a write fails; no target has
     *     then changed (except when a move itself fails part-way, which on one file system does not
     *     happen short of a crash)
     */
    public static void writeAll(List<Entry> entries, boolean overwrite) {
        List<Path> targets = new ArrayList<>();
        for (Entry e : entries) {
            Path absolute = e.target().toAbsolutePath();
            if (!overwrite && Files.exists(absolute, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
                throw new InputException(
                        e.target().toString(), "already exists; choose another name or allow overwriting");
            }
            targets.add(absolute);
        }
        List<Path> temps = new ArrayList<>();
        try {
            for (int i = 0; i < entries.size(); i++) {
                Entry e = entries.get(i);
                Path absolute = targets.get(i);
                Path temp;
                try {
                    temp = createTemporary(absolute);
                } catch (IOException ex) {
                    throw new UncheckedIOException(
                            "could not write " + e.target() + ": cannot create a file in " + absolute.getParent() + " ("
                                    + reason(ex) + ")",
                            ex);
                }
                temps.add(temp);
                try {
                    try (OutputStream out = Files.newOutputStream(temp, StandardOpenOption.WRITE)) {
                        e.writer().write(out);
                    }
                    try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                        channel.force(true);
                    }
                    keepPermissions(temp, absolute);
                } catch (IOException ex) {
                    throw new UncheckedIOException("could not write " + e.target() + ": " + reason(ex), ex);
                }
            }
            List<Path> linked = new ArrayList<>();
            for (int i = 0; i < entries.size(); i++) {
                try {
                    place(temps.get(i), targets.get(i), overwrite);
                    linked.add(targets.get(i));
                } catch (FileAlreadyExistsException ex) {
                    // Another writer created it after the check: take back the new files of this set.
                    for (Path p : linked) {
                        Files.deleteIfExists(p);
                    }
                    throw new InputException(
                            entries.get(i).target().toString(),
                            "was created by another writer meanwhile; nothing was written");
                } catch (IOException ex) {
                    throw new UncheckedIOException(
                            "could not write " + entries.get(i).target() + ": " + reason(ex), ex);
                }
            }
        } catch (IOException ex) {
            throw new UncheckedIOException("could not write: " + reason(ex), ex);
        } finally {
            for (Path t : temps) {
                try {
                    Files.deleteIfExists(t);
                } catch (IOException ignored) {
                    // Hidden and short-named; the next write into the folder removes it when stale.
                }
                IN_PROGRESS.remove(t);
            }
        }
    }

    /**
     * A temporary file beside a target, with the permissions a new file of this process gets, and
     * registered for removal if the JVM is stopped. Stale temporaries in the folder are removed first.
     */
    public static Path createTemporary(Path target) throws IOException {
        Path folder = target.toAbsolutePath().getParent();
        if (Files.notExists(folder)) {
            Files.createDirectories(folder);
        }
        removeStale(folder);
        java.util.concurrent.ThreadLocalRandom random = java.util.concurrent.ThreadLocalRandom.current();
        for (int attempt = 0; ; attempt++) {
            Path temp = folder.resolve(
                    TEMP_PREFIX + String.format(java.util.Locale.ROOT, "%016x", random.nextLong()) + TEMP_SUFFIX);
            try {
                IN_PROGRESS.add(temp);
                // An ordinary new file: its permissions follow the umask, unlike createTempFile's 0600.
                Files.newOutputStream(temp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)
                        .close();
                return temp;
            } catch (FileAlreadyExistsException e) {
                IN_PROGRESS.remove(temp);
                if (attempt > 10) {
                    throw e;
                }
            } catch (IOException e) {
                IN_PROGRESS.remove(temp);
                throw e;
            }
        }
    }

    /**
     * Moves a finished temporary into place: over the target when overwriting, else by a hard link
     * that fails if the target exists.
     */
    public static void place(Path temp, Path target, boolean overwrite) throws IOException {
        if (!overwrite) {
            try {
                Files.createLink(target, temp);
                Files.deleteIfExists(temp);
                IN_PROGRESS.remove(temp);
                return;
            } catch (UnsupportedOperationException | java.nio.file.FileSystemException e) {
                if (e instanceof FileAlreadyExistsException) {
                    throw (FileAlreadyExistsException) e;
                }
                // No hard links here: fall back to a check and a plain move.
                if (Files.exists(target, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
                    throw new FileAlreadyExistsException(target.toString());
                }
            }
        }
        try {
            Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
        }
        IN_PROGRESS.remove(temp);
    }

    /** Forgets a temporary the caller has removed or moved itself. */
    public static void release(Path temp) {
        IN_PROGRESS.remove(temp);
    }

    /** A replaced file keeps its permissions; a new one keeps the umask's, set when it was created. */
    static void keepPermissions(Path temp, Path target) throws IOException {
        if (!Files.getFileStore(temp).supportsFileAttributeView(java.nio.file.attribute.PosixFileAttributeView.class)) {
            return;
        }
        if (Files.exists(target)) {
            Files.setPosixFilePermissions(temp, Files.getPosixFilePermissions(target));
        }
    }

    /** Removes temporaries of ours in a folder older than an hour (left by a killed process). */
    static void removeStale(Path folder) {
        long cutoff = System.currentTimeMillis() - STALE_AFTER_MS;
        try (DirectoryStream<Path> stream = Files.newDirectoryStream(folder, TEMP_PREFIX + "*" + TEMP_SUFFIX)) {
            for (Path p : stream) {
                try {
                    FileTime t = Files.getLastModifiedTime(p, java.nio.file.LinkOption.NOFOLLOW_LINKS);
                    if (t.toMillis() < cutoff && Files.isRegularFile(p, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
                        Files.deleteIfExists(p);
                    }
                } catch (NoSuchFileException ignored) {
                    // Removed meanwhile.
                }
            }
        } catch (IOException ignored) {
            // A folder we cannot list is reported by the write itself.
        }
    }

    /** The reason of an I/O failure in words: the exception's class says more than its message. */
    static String reason(IOException e) {
        if (e instanceof NoSuchFileException) {
            return "no such file or folder " + e.getMessage();
        }
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied (" + e.getMessage() + ")";
        }
        String m = e.getMessage();
        if (m != null && m.contains("No space left")) {
            return "the disk is full (" + m + ")";
        }
        return m == null ? e.getClass().getSimpleName() : m;
    }
}
