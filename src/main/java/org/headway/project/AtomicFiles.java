package org.headway.project;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
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
            Files.createDirectories(folder);
            temp = Files.createTempFile(folder, "." + absolute.getFileName() + ".", ".tmp");
            try (OutputStream out = Files.newOutputStream(temp, StandardOpenOption.WRITE)) {
                writer.write(out);
            }
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                channel.force(true);
            }
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            temp = null;
        } catch (FileAlreadyExistsException e) {
            throw new InputException(target.toString(), "already exists", e);
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
