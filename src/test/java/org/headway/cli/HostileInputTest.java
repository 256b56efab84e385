package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Oversized CSV input: a million-row friction batch streams in a 32 MB heap, and a line without end
 * is refused with a located message instead of running out of memory.
 */
class HostileInputTest {

    /** Heap of the child JVM: far too small to hold a million rows (about 100 MB as records). */
    static final String CHILD_HEAP = "-Xmx32m";

    static final long MILLION = 1_000_000;

    @Test
    void aMillionRowBatchStreamsInASmallHeap(@TempDir Path dir) throws Exception {
        long small = runChild(dir, 10_000);
        long large = runChild(dir, MILLION);
        try (Stream<String> lines = Files.lines(dir.resolve("out-" + MILLION + ".csv"))) {
            assertEquals(MILLION + 1, lines.count(), "header plus one line per row");
        }
        org.headway.Fuzz.summary(String.format(
                java.util.Locale.ROOT,
                "friction batch streaming (%s): peak heap %.1f MB for 10,000 rows, %.1f MB for 1,000,000 rows",
                CHILD_HEAP,
                small / 1048576.0,
                large / 1048576.0));
    }

    private static long runChild(Path dir, long rows) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(
                        java,
                        CHILD_HEAP,
                        "-XX:+UseSerialGC",
                        "-cp",
                        System.getProperty("java.class.path"),
                        BatchMemoryMain.class.getName(),
                        String.valueOf(rows),
                        dir.resolve("in-" + rows + ".csv").toString(),
                        dir.resolve("out-" + rows + ".csv").toString())
                .redirectErrorStream(true)
                .start();
        StringBuilder all = new StringBuilder();
        try (BufferedReader out =
                new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
            for (String line; (line = out.readLine()) != null; ) {
                all.append(line).append('\n');
            }
        }
        assertTrue(child.waitFor(5, TimeUnit.MINUTES), "child did not finish");
        String text = all.toString();
        assertTrue(text.contains("exit=0 peakHeapBytes="), "child output:\n" + text);
        String peak = text.substring(text.indexOf("peakHeapBytes=") + 14).strip();
        return Long.parseLong(peak);
    }

    @Test
    void aLineWithoutEndIsRefusedAfterTheLimit() {
        // A reader that never ends a line: the limit must stop it, whatever its length.
        Reader endless = new Reader() {
            @Override
            public int read(char[] buffer, int offset, int length) {
                java.util.Arrays.fill(buffer, offset, offset + length, 'x');
                return length;
            }

            @Override
            public void close() {}
        };
        InputException e = assertThrows(InputException.class, () -> {
            try (Reader r = new LineLengthLimit(endless, "--input endless.csv", LineLengthLimit.MAX_LINE_LENGTH)) {
                char[] buffer = new char[8192];
                while (r.read(buffer, 0, buffer.length) >= 0) {
                    // keep reading
                }
            }
        });
        assertEquals(
                "--input endless.csv line 1: line is longer than 1000000 characters; is this a CSV file with one"
                        + " record per line?",
                e.getMessage());
    }

    @Test
    void crLfAndCrCountAsOneLineEndEach() throws IOException {
        Reader text = new java.io.StringReader("a\r\nb\rc\n" + "y".repeat(11));
        InputException e = assertThrows(InputException.class, () -> {
            try (Reader r = new LineLengthLimit(text, "f.csv", 10)) {
                while (r.read() >= 0) {
                    // keep reading
                }
            }
        });
        assertEquals("f.csv line 4", e.where());
    }

    @Test
    void aTenMegabyteLineInAFrictionBatchIsRefused(@TempDir Path dir) throws IOException {
        Path input = dir.resolve("points.csv");
        writeLongLine(input, "re,relative_roughness\n1e5,");
        Path output = dir.resolve("result.csv");
        CliRun run = CliRun.of("friction", "--input", input.toString(), "--output", output.toString());
        assertEquals(2, run.exitCode(), run.err());
        assertEquals(
                "headway: --input " + input + " line 2: line is longer than 1000000 characters; is this a CSV file"
                        + " with one record per line?",
                run.err().strip());
        assertFalse(Files.exists(output), "no partial output is left behind");
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(1, files.count(), "no temporary file is left behind");
        }
    }

    @Test
    void hexadecimalNumbersInABatchAreRowErrors(@TempDir Path dir) throws IOException {
        Path input = dir.resolve("points.csv");
        Files.writeString(input, "re,relative_roughness\n0x1p17,0\n1e5,1d\n");
        CliRun run = CliRun.of("friction", "--input", input.toString());
        assertEquals(1, run.exitCode(), run.err());
        assertTrue(run.out().contains("row 1, column re: not a number: '0x1p17'"), run.out());
        assertTrue(run.out().contains("row 2, column relative_roughness: not a number: '1d'"), run.out());
    }

    @Test
    void aTenMegabyteLineInFitDataIsRefused(@TempDir Path dir) throws IOException {
        Path data = dir.resolve("rig.csv");
        writeLongLine(data, "Re,f\n");
        CliRun run = CliRun.of("fit", data.toString(), "--y", "f", "--x", "Re", "--form", "power");
        assertEquals(2, run.exitCode(), run.err());
        assertEquals(
                "headway: " + data + " line 2: line is longer than 1000000 characters; is this a CSV file with one"
                        + " record per line?",
                run.err().strip());
    }

    /** Writes a prefix and then ten million digits without a line break, streamed. */
    private static void writeLongLine(Path file, String prefix) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write(prefix);
            char[] block = new char[100_000];
            java.util.Arrays.fill(block, '7');
            for (int i = 0; i < 100; i++) {
                w.write(block);
            }
        }
    }
}
