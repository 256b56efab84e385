package org.headway.project;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import org.headway.caution.InputException;

/**
 * Atomic file writes: the content goes to a temporary file in the same folder, is forced to disk,
 * and is then moved over the target in one step, so a crash leaves either the old file or the new
 * one, never a torn mix.
 */
public final class AtomicFiles {

    /** Writes the content of a file into a stream. */
    @FunctionalInterface
    public interface Writer {
        void write(OutputStream out) throws IOException;
    }

    private AtomicFiles() {}

    /**
     * A temporary file is created readable by its owner only; give the result the permissions the
     * replaced file had, or the usual rw-r--r-- for a new file, so a project saved to a shared
     * folder stays readable by colleagues.
     */
    private static void keepPermissions(Path temp, Path target) throws IOException {
        if (!Files.getFileStore(temp).supportsFileAttributeView(java.nio.file.attribute.PosixFileAttributeView.class)) {
            return;
        }
        java.util.Set<java.nio.file.attribute.PosixFilePermission> permissions = Files.exists(target)
                ? Files.getPosixFilePermissions(target)
                : java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(temp, permissions);
    }

    /**
     * @param target file to create or replace
     * @param overwrite whether an existing target may be replaced
     * @param writer produces the content
     */
    public static void write(Path target, boolean overwrite, Writer writer) {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        if (!overwrite && Files.exists(absolute)) {
            throw new InputException(target.toString(), "already exists; choose another name or allow overwriting");
        }
        Path temp = null;
        try {
            if (Files.notExists(folder)) {
                Files.createDirectories(folder);
            }
            temp = Files.createTempFile(folder, "." + absolute.getFileName() + ".", ".tmp");
            try (OutputStream out = Files.newOutputStream(temp, StandardOpenOption.WRITE)) {
                writer.write(out);
            }
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                channel.force(true);
            }
            keepPermissions(temp, absolute);
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            temp = null;
        } catch (IOException e) {
            throw new UncheckedIOException("could not write " + target + ": " + e.getMessage(), e);
        } finally {
            if (temp != null) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException ignored) {
                    // The temporary file is hidden and named after the target; a leftover harms nothing.
                }
            }
        }
    }
}
