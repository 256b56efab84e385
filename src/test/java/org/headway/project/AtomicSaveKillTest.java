package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Proves that a crash mid-save never leaves a damaged project: a child JVM saves a growing project
 * in a loop and is killed ({@code destroyForcibly}) at a random moment, {@value #KILLS} times; after
 * each kill the file must load and be exactly one of the versions the child wrote, not older than
 * the one found after the previous kill.
 */
class AtomicSaveKillTest {

    static final int KILLS = 100;

    @Test
    void killedSavesLeaveTheOldOrTheNewFile(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("growing.json");
        ProjectFile.save(SaveLoopMain.project(1), file);
        Random random = new Random(42);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String classpath = System.getProperty("java.class.path");
        int lastSeen = 1;
        int saves = 0;
        for (int kill = 0; kill < KILLS; kill++) {
            Process child = new ProcessBuilder(
                            java,
                            "-Xshare:auto",
                            "-cp",
                            classpath,
                            SaveLoopMain.class.getName(),
                            file.toString(),
                            String.valueOf(lastSeen + 1))
                    .redirectErrorStream(true)
                    .start();
            BufferedReader out =
                    new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8));
            String first = out.readLine(); // wait until the child has completed one save
            assertTrue(first != null && first.startsWith("saved "), "child did not start: " + first);
            Thread.sleep(random.nextInt(40));
            child.destroyForcibly();
            assertTrue(child.waitFor(30, TimeUnit.SECONDS));
            Project loaded = ProjectFile.load(file);
            int version = loaded.segments().size();
            // Whole, and exactly one of the versions the child wrote, never older than the last one seen.
            assertEquals(SaveLoopMain.project(version), loaded, "after kill " + kill);
            assertTrue(
                    version > lastSeen, "after kill " + kill + ": version " + version + " not newer than " + lastSeen);
            saves += version - lastSeen;
            lastSeen = version;
            try (var files = Files.list(dir)) {
                // Leftover hidden temporary files are allowed after a kill, but the project itself is whole.
                assertTrue(files.anyMatch(p -> p.equals(file)));
            }
        }
        org.headway.Fuzz.summary("atomic-save kill test: " + KILLS + " kills during " + saves
                + " saves; after every kill the file loaded whole as the newest completed version");
    }
}
