package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Commands that write files refuse to replace what the user has unless told to. */
class OutputSafetyTest {

    @TempDir
    Path dir;

    @Test
    void fitSaveRefusesAnExistingFileWithoutForce() throws Exception {
        Path data = dir.resolve("d.csv");
        Files.writeString(data, "x,y\n1,2.1\n2,3.9\n3,6.2\n4,7.8\n");
        Path keep = dir.resolve("keep.csv");
        Files.writeString(keep, "precious data\n");
        CliRun r = CliRun.of(
                "fit", data.toString(), "--y", "y", "--x", "x", "--form", "linear", "--save", keep.toString());
        assertEquals(2, r.exitCode(), r.out());
        assertTrue(r.err().contains("--save") && r.err().contains("--force"), r.err());
        assertEquals("precious data\n", Files.readString(keep));
        CliRun forced = CliRun.of(
                "fit",
                data.toString(),
                "--y",
                "y",
                "--x",
                "x",
                "--form",
                "linear",
                "--save",
                keep.toString(),
                "--force");
        assertEquals(0, forced.exitCode(), forced.err());
        assertTrue(Files.readString(keep).contains("headway-fitted-correlation"));
    }

    @Test
    void frictionOutputRefusesAnExistingFileAndItsOwnInput() throws Exception {
        Path in = dir.resolve("in.csv");
        Files.writeString(in, "re,relative_roughness\n1e5,1e-4\n");
        CliRun self = CliRun.of("friction", "--input", in.toString(), "--output", in.toString(), "--force");
        assertEquals(2, self.exitCode());
        assertTrue(self.err().contains("is the input file"), self.err());
        assertEquals("re,relative_roughness\n1e5,1e-4\n", Files.readString(in));
        Path out = dir.resolve("out.csv");
        Files.writeString(out, "old\n");
        CliRun refused = CliRun.of("friction", "--input", in.toString(), "--output", out.toString());
        assertEquals(2, refused.exitCode());
        assertTrue(refused.err().contains("--force"), refused.err());
        assertEquals("old\n", Files.readString(out));
        CliRun forced = CliRun.of("friction", "--input", in.toString(), "--output", out.toString(), "--force");
        assertEquals(0, forced.exitCode(), forced.err());
        assertTrue(Files.readString(out).startsWith("re,relative_roughness,friction_factor"));
    }

    @Test
    void frictionOutputIntoAMissingFolderNamesTheFolder() throws Exception {
        Path in = dir.resolve("in.csv");
        Files.writeString(in, "re,relative_roughness\n1e5,1e-4\n");
        Path out = dir.resolve("no-such-folder").resolve("out.csv");
        CliRun r = CliRun.of("friction", "--input", in.toString(), "--output", out.toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("out.csv") && r.err().contains("does not exist"), r.err());
        assertTrue(r.err().contains("no-such-folder"), r.err());
    }

    @Test
    void anIterationBudgetThatWouldOverflowIsRefused() throws Exception {
        Path data = dir.resolve("d.csv");
        Files.writeString(data, "x,y\n1,2.1\n2,3.9\n3,6.2\n4,7.8\n");
        CliRun r = CliRun.of(
                "fit",
                data.toString(),
                "--y",
                "y",
                "--x",
                "x",
                "--expression",
                "a*x^b",
                "--start",
                "a=1,b=1",
                "--max-iterations",
                "600000000");
        assertEquals(2, r.exitCode(), r.out());
        assertTrue(r.err().contains("--max-iterations") && r.err().contains("1000000"), r.err());
    }
}
