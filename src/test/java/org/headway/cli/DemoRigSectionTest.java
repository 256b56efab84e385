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
        String rig = run.out().substring(run.out().indexOf("6. Rig data"));
        assertTrue(rig.startsWith("6. Rig data: fluids-data/examples/demo-rig.json (invented measurements)"), rig);
        assertTrue(rig.contains("Summary: 25 points"), rig);
        assertTrue(rig.contains("Effective roughness (Colebrook–White fitted to 17 turbulent points):\n  ε = "), rig);
        assertTrue(rig.contains("dominant contributor to u(f):"), rig);
    }

    @Test
    void demoSolvesTheCoilBranchInFlowModeWithEveryElement() {
        CliRun run = CliRun.of("demo", "--reports", dir.resolve("reports").toString());
        assertEquals(0, run.exitCode(), run.err());
        String out = run.out();
        String branch = out.substring(out.indexOf("4. A coil branch"), out.indexOf("6. Rig data"));
        for (String id : new String[] {
            "iso-flow", "branch-flow", "strainer", "reducer-in", "ahu-coil", "control-valve", "branch-return"
        }) {
            assertTrue(branch.contains("\n" + id + " "), "element row missing: " + id + "\n" + branch);
        }
        // The headers give more head than the branch loses at its 2.8 L/s design flow (see the headloss mode's
        // surplus caution), so unbalanced it must take more than 2.8 L/s: an energy balance, common practice.
        java.util.regex.Matcher m =
                java.util.regex.Pattern.compile("Flow: ([0-9.]+) L/s").matcher(branch);
        assertTrue(m.find(), branch);
        assertTrue(Double.parseDouble(m.group(1)) > 2.8, branch);
        assertTrue(branch.contains("Total head:       0 m"), "balanced flow prints a clean zero:\n" + branch);
        String main = out.substring(out.indexOf("5. A looped village main"), out.indexOf("6. Rig data"));
        assertTrue(main.contains("Solve: converged after"), main);
        assertTrue(main.contains("\nV1 "), main);
    }
}
