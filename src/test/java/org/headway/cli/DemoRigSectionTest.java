package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The rig section of {@code headway demo}, run from class-path resources as from the jar. */
class DemoRigSectionTest {

    @TempDir
    Path dir;

    @Test
    void demoAnalysesTheBundledRig() {
        CliRun run = CliRun.of("demo", "--reports", dir.resolve("reports").toString());
        assertEquals(0, run.exitCode(), run.err());
        String rig = run.out().substring(run.out().indexOf("4. Rig data"));
        assertTrue(rig.startsWith("4. Rig data: fluids-data/examples/demo-rig.json (invented measurements)"), rig);
        assertTrue(rig.contains("Summary: 25 points"), rig);
        assertTrue(rig.contains("Effective roughness (Colebrook–White fitted to 17 turbulent points):\n  ε = "), rig);
        assertTrue(rig.contains("dominant contributor to u(f):"), rig);
    }
}
