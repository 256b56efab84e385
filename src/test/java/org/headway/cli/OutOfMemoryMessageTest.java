package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A command that runs out of heap (here: a fit of 10⁶ points held in a 16 MB heap, in a child JVM)
 * says so in one line with the heap limit and exits 1, instead of printing an OutOfMemoryError stack
 * trace.
 */
class OutOfMemoryMessageTest {

    @TempDir
    Path dir;

    @Test
    void runningOutOfHeapIsOneClearLine() throws Exception {
        Path data = dir.resolve("big.csv");
        try (BufferedWriter w = Files.newBufferedWriter(data, StandardCharsets.UTF_8)) {
            w.write("x,y\n");
            for (int i = 0; i < 1_000_000; i++) {
                w.write(i + "," + (2.0 * i + (i % 7) * 0.1) + "\n");
            }
        }
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(List.of(
                        java,
                        "-Xmx16m",
                        "-cp",
                        System.getProperty("java.class.path"),
                        "org.headway.Launcher",
                        "fit",
                        data.toString(),
                        "--y",
                        "y",
                        "--x",
                        "x",
                        "--form",
                        "linear"))
                .redirectOutput(dir.resolve("out.txt").toFile())
                .redirectError(dir.resolve("err.txt").toFile())
                .start();
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "child finished");
        String err = Files.readString(dir.resolve("err.txt"));
        assertEquals(1, p.exitValue(), err);
        assertTrue(err.startsWith("headway: ran out of memory (the Java heap is limited to "), err);
        assertFalse(err.contains("\tat "), "no stack trace: " + err);
        assertEquals(1, err.strip().lines().count(), err);
    }
}
