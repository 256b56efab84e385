package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The launcher script's class-data archive for the desktop window (decision 0056): the first window
 * after a build writes it under a name of its own and moves it into place, later windows start from
 * it, and the command line, a machine without a display and {@code HEADWAY_CLASS_ARCHIVE=off} never
 * touch it. The script runs against a stand-in {@code java} that records its arguments (and writes
 * the archive file it is asked to), beside a stand-in jar newer than any source, so nothing is built.
 * The JVM options themselves are the JDK 17 ones ({@code -XX:ArchiveClassesAtExit},
 * {@code -XX:SharedArchiveFile}: JEP 350, Dynamic CDS Archives).
 */
class LauncherArchiveTest {

    @TempDir
    Path dir;

    private Path log;

    private List<String> run(Map<String, String> env, String... args) throws IOException, InterruptedException {
        Path home = dir.resolve("install");
        if (!Files.exists(home)) {
            Files.createDirectories(home.resolve("target"));
            Files.copy(Path.of("headway"), home.resolve("headway"));
            Files.writeString(home.resolve("target/headway.jar"), "stand-in jar");
            Path bin = Files.createDirectories(dir.resolve("bin"));
            Path java = bin.resolve("java");
            Files.writeString(
                    java,
                    "#!/bin/sh\n"
                            + "echo \"$*\" >> \"$LAUNCH_LOG\"\n"
                            + "for a in \"$@\"; do case \"$a\" in -XX:ArchiveClassesAtExit=*)"
                            + " echo archive > \"${a#-XX:ArchiveClassesAtExit=}\";; esac; done\n",
                    StandardCharsets.UTF_8);
            Files.setPosixFilePermissions(java, PosixFilePermissions.fromString("rwxr-xr-x"));
            log = dir.resolve("java-calls.txt");
        }
        List<String> command =
                new java.util.ArrayList<>(List.of("sh", home.resolve("headway").toString()));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true);
        pb.environment().put("PATH", dir.resolve("bin") + ":" + System.getenv("PATH"));
        pb.environment().put("XDG_CACHE_HOME", dir.resolve("cache").toString());
        pb.environment().put("LAUNCH_LOG", log.toString());
        pb.environment().remove("DISPLAY");
        pb.environment().remove("WAYLAND_DISPLAY");
        pb.environment().remove("HEADWAY_CLASS_ARCHIVE");
        pb.environment().putAll(env);
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue(), out);
        List<String> calls = Files.readAllLines(log);
        return List.of(calls.get(calls.size() - 1).split(" "));
    }

    private List<Path> archives() throws IOException {
        Path cache = dir.resolve("cache/headway");
        if (!Files.isDirectory(cache)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(cache)) {
            return s.sorted().toList();
        }
    }

    @Test
    void theFirstWindowWritesTheArchiveAndTheNextStartsFromIt() throws Exception {
        Map<String, String> display = Map.of("DISPLAY", ":7");
        List<String> first = run(display);
        String writing = first.stream()
                .filter(a -> a.startsWith("-XX:ArchiveClassesAtExit="))
                .findFirst()
                .orElseThrow(() -> new AssertionError("no archive written: " + first));
        assertTrue(writing.endsWith(".part"), writing);
        List<Path> made = archives();
        assertEquals(1, made.size(), made.toString());
        Path archive = made.get(0);
        assertTrue(archive.getFileName().toString().matches("window-[0-9]+-[0-9]+-[0-9]+\\.jsa"), archive.toString());
        // Written as ARCHIVE.PID.part, then moved to ARCHIVE: no .part file is left behind.
        assertTrue(
                writing.substring("-XX:ArchiveClassesAtExit=".length())
                        .matches(java.util.regex.Pattern.quote(archive.toString()) + "\\.[0-9]+\\.part"),
                writing + " vs " + archive);

        List<String> second = run(display, "gui");
        assertTrue(second.contains("-XX:SharedArchiveFile=" + archive), second.toString());
        assertFalse(second.stream().anyMatch(a -> a.startsWith("-XX:ArchiveClassesAtExit")), second.toString());
        assertEquals("gui", second.get(second.size() - 1));

        List<String> off = run(Map.of("DISPLAY", ":7", "HEADWAY_CLASS_ARCHIVE", "off"));
        assertFalse(
                off.stream().anyMatch(a -> a.startsWith("-XX:Shared") || a.startsWith("-XX:Archive")), off.toString());

        // A rebuilt jar (another size) gets an archive of its own, and the old one is removed.
        Files.writeString(dir.resolve("install/target/headway.jar"), "a rebuilt stand-in jar");
        run(display);
        List<Path> now = archives();
        assertEquals(1, now.size(), now.toString());
        assertFalse(now.get(0).equals(archive), now.toString());
    }

    @Test
    void theCommandLineAndAMachineWithoutADisplayNeverUseAnArchive() throws Exception {
        List<String> noDisplay = run(Map.of());
        assertFalse(
                noDisplay.stream().anyMatch(a -> a.contains("Archive") || a.contains("Shared")), noDisplay.toString());
        List<String> cli = run(Map.of("DISPLAY", ":7"), "solve", "project.json");
        assertFalse(cli.stream().anyMatch(a -> a.contains("Archive") || a.contains("Shared")), cli.toString());
        List<String> friction = run(Map.of("DISPLAY", ":7"), "friction", "--input", "x.csv");
        assertTrue(friction.contains("-XX:TieredStopAtLevel=1"), friction.toString());
        assertEquals(List.of(), archives());
    }
}
