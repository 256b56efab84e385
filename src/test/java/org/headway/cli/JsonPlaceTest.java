package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** JSON nested too deep is refused with its line and column in every JSON file of ours, in plain words. */
class JsonPlaceTest {

    @TempDir
    Path dir;

    @Test
    void nestingTooDeepNamesItsPlaceInProjectsRigFilesAndFittedCorrelations() throws Exception {
        String deep = "{\"format\": \"x\",\n  \"x\": " + "[".repeat(100) + "]".repeat(100) + "}\n";
        // The root object is level 1; the 64th bracket on line 2 (after 7 characters) is level 65.
        String place = "line 2, column " + (7 + 64);
        for (String[] command : new String[][] {{"solve"}, {"rig"}, {"sheet"}}) {
            Path p = dir.resolve(command[0] + ".json");
            Files.writeString(p, deep);
            CliRun r = CliRun.of(command[0], p.toString());
            assertEquals(2, r.exitCode(), r.out());
            assertTrue(r.err().contains(place), command[0] + ": " + r.err());
            assertTrue(r.err().contains("nested deeper than 64 levels"), r.err());
            assertTrue(!r.err().contains("StreamReadConstraints"), r.err());
        }
    }
}
