package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;

/**
 * Standard output as a separate process sees it: a failed write (a full disk) fails the command
 * instead of exiting 0 with a truncated file, and non-ASCII reaches a POSIX-locale terminal as
 * UTF-8 rather than as "?".
 */
class StandardOutputTest {

    private static ProcessBuilder headway(String... args) {
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        List<String> command = new java.util.ArrayList<>(
                List.of(java.toString(), "-cp", System.getProperty("java.class.path"), "org.headway.Launcher"));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command);
        pb.environment().put("LC_ALL", "C");
        pb.environment().put("LANG", "C");
        pb.environment().remove("DISPLAY");
        return pb;
    }

    @Test
    @EnabledOnOs(OS.LINUX)
    void aFullDiskOnStandardOutputFailsTheCommand() throws Exception {
        // /dev/full refuses every write with ENOSPC (Linux), like a disk that has filled up.
        Process p = headway("fluid", "water", "--temperature", "15 degC")
                .redirectOutput(new File("/dev/full"))
                .start();
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(1, p.exitValue(), err);
        assertTrue(err.contains("writing to standard output failed"), err);
    }

    /** A batch file of 20,000 rows (several blocks) with a quoted, non-ASCII note column. */
    private static Path batchFile(Path dir) throws Exception {
        StringBuilder text = new StringBuilder("point,re,relative_roughness,note\n");
        for (int i = 0; i < 20_000; i++) {
            text.append("p")
                    .append(i)
                    .append(',')
                    .append(1e4 + 37 * i)
                    .append(",0.0002,\"Düse, Ø ")
                    .append(i)
                    .append("\"\n");
        }
        Path input = dir.resolve("points.csv");
        Files.writeString(input, text, StandardCharsets.UTF_8);
        return input;
    }

    @Test
    @EnabledOnOs(OS.LINUX)
    void aFrictionBatchOntoAFullDiskFailsTheCommand(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        Process p = headway("friction", "--input", batchFile(dir).toString())
                .redirectOutput(new File("/dev/full"))
                .start();
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(1, p.exitValue(), err);
        assertTrue(err.contains("writing to standard output failed"), err);
        assertEquals(1, err.lines().count(), err);
    }

    @Test
    void aFrictionBatchOnStandardOutputIsTheFileItWouldWrite(@org.junit.jupiter.api.io.TempDir Path dir)
            throws Exception {
        Path input = batchFile(dir);
        Path file = dir.resolve("out.csv");
        Process toFile = headway("friction", "--input", input.toString(), "--output", file.toString())
                .start();
        toFile.getInputStream().readAllBytes();
        assertTrue(toFile.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, toFile.exitValue());
        Process toStdout = headway("friction", "--input", input.toString()).start();
        byte[] printed = toStdout.getInputStream().readAllBytes();
        assertTrue(toStdout.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, toStdout.exitValue());
        byte[] written = Files.readAllBytes(file);
        org.junit.jupiter.api.Assertions.assertArrayEquals(written, printed);
        assertTrue(new String(written, StandardCharsets.UTF_8).contains("\"Düse, Ø 19999\""));
    }

    @Test
    void nonAsciiIsWrittenAsUtf8UnderThePosixLocale() throws Exception {
        Process p = headway("fluid", "water", "--temperature", "15 degC").start();
        byte[] out = p.getInputStream().readAllBytes();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue());
        String text = new String(out, StandardCharsets.UTF_8);
        assertTrue(text.contains("kg/m³"), text);
        assertTrue(text.contains("°C"), text);
        assertTrue(!text.contains("kg/m?"), text);
    }
}
