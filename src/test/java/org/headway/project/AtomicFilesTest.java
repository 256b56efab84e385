package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Atomic writes: all or none, atomic refusal, permissions, short temporaries, stale clean-up. */
class AtomicFilesTest {

    @TempDir
    Path dir;

    static AtomicFiles.Writer text(String s) {
        return out -> out.write(s.getBytes(StandardCharsets.UTF_8));
    }

    private List<Path> leftovers() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.getFileName().toString().startsWith(".")).toList();
        }
    }

    @Test
    void whenTheSecondFileFailsNeitherIsWrittenAndTheOldFirstStays() throws Exception {
        Path a = dir.resolve("sheet.pdf");
        Path b = dir.resolve("sheet.xlsx");
        Files.writeString(a, "old pdf");
        UncheckedIOException e = assertThrows(
                UncheckedIOException.class,
                () -> AtomicFiles.writeAll(
                        List.of(new AtomicFiles.Entry(a, text("new pdf")), new AtomicFiles.Entry(b, out -> {
                            throw new IOException("No space left on device");
                        })),
                        true));
        assertTrue(e.getMessage().contains("sheet.xlsx") && e.getMessage().contains("disk is full"), e.getMessage());
        assertEquals("old pdf", Files.readString(a));
        assertFalse(Files.exists(b));
        assertEquals(List.of(), leftovers());
    }

    @Test
    void refusingAnExistingFileRefusesTheWholeSet() throws Exception {
        Path a = dir.resolve("a.csv");
        Path b = dir.resolve("b.csv");
        Files.writeString(b, "keep");
        assertThrows(
                InputException.class,
                () -> AtomicFiles.writeAll(
                        List.of(new AtomicFiles.Entry(a, text("1")), new AtomicFiles.Entry(b, text("2"))), false));
        assertFalse(Files.exists(a));
        assertEquals("keep", Files.readString(b));
    }

    @Test
    void twoWritersOfOneNewFileCannotBothSucceed() throws Exception {
        Path target = dir.resolve("race.pdf");
        CountDownLatch bothWriting = new CountDownLatch(2);
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            List<Future<String>> results = pool.invokeAll(
                    List.of(() -> attempt(target, "first", bothWriting), () -> attempt(target, "second", bothWriting)));
            int won = 0;
            String winner = null;
            for (Future<String> f : results) {
                String r = f.get(30, TimeUnit.SECONDS);
                if (!r.equals("refused")) {
                    won++;
                    winner = r;
                }
            }
            assertEquals(1, won, "exactly one writer succeeds");
            assertEquals(winner, Files.readString(target), "and its content is what is there");
        } finally {
            pool.shutdownNow();
        }
        assertEquals(List.of(), leftovers());
    }

    private static String attempt(Path target, String content, CountDownLatch bothWriting) {
        try {
            AtomicFiles.write(target, false, out -> {
                // Both pass the early existence check before either places its file.
                bothWriting.countDown();
                try {
                    bothWriting.await(10, TimeUnit.SECONDS);
                } catch (InterruptedException e) {
                    throw new IOException(e);
                }
                out.write(content.getBytes(StandardCharsets.UTF_8));
            });
            return content;
        } catch (InputException e) {
            return "refused";
        }
    }

    @Test
    void aNewFileGetsThePermissionsOfAnOrdinaryNewFileAndAReplacedOneKeepsItsOwn() throws Exception {
        assumeTrue(Files.getFileStore(dir).supportsFileAttributeView("posix"));
        Path probe = Files.createFile(dir.resolve("probe")); // permissions from the umask
        Path fresh = dir.resolve("fresh.json");
        AtomicFiles.write(fresh, false, text("{}"));
        assertEquals(Files.getPosixFilePermissions(probe), Files.getPosixFilePermissions(fresh));
        Path shared = dir.resolve("shared.json");
        Files.writeString(shared, "old");
        Files.setPosixFilePermissions(shared, PosixFilePermissions.fromString("rw-rw----"));
        AtomicFiles.write(shared, true, text("new"));
        assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(shared)));
    }

    @Test
    void aLongLegalNameIsNotRefusedForItsTemporary() throws Exception {
        String name = "x".repeat(250) + ".csv"; // 254 bytes: legal on ext4 (255)
        Path target = dir.resolve(name);
        AtomicFiles.write(target, false, text("ok"));
        assertEquals("ok", Files.readString(target));
    }

    @Test
    void aDanglingLinkAtTheTargetIsNotReplacedWithoutOverwrite() throws Exception {
        Path link = dir.resolve("out.pdf");
        Files.createSymbolicLink(link, dir.resolve("missing"));
        assertThrows(InputException.class, () -> AtomicFiles.write(link, false, text("x")));
        assertTrue(Files.isSymbolicLink(link));
    }

    @Test
    void temporariesLeftByAKilledProcessAreRemovedOnceStale() throws Exception {
        Path stale = dir.resolve(".hw-00000000000000aa.tmp");
        Path recent = dir.resolve(".hw-00000000000000bb.tmp");
        Files.writeString(stale, "half");
        Files.writeString(recent, "in progress elsewhere");
        Files.setLastModifiedTime(stale, FileTime.fromMillis(System.currentTimeMillis() - 2 * 3_600_000L));
        AtomicFiles.write(dir.resolve("next.csv"), false, text("1"));
        assertFalse(Files.exists(stale));
        assertTrue(Files.exists(recent), "a temporary younger than an hour may belong to a running write");
        assertArrayEquals("1".getBytes(StandardCharsets.UTF_8), Files.readAllBytes(dir.resolve("next.csv")));
    }
}
