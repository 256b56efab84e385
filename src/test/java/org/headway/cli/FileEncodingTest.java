package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.headway.caution.InputException;
import org.headway.caution.TextFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Files in another encoding than UTF-8, with a byte-order mark, or with text after the project: each
 * refused with the file and line, or read as meant. The encodings are those of the JDK's charsets
 * (Windows-1252 as a spreadsheet on Windows saves "CSV", UTF-16 as some exports write).
 */
class FileEncodingTest {

    @TempDir
    Path dir;

    static final Charset CP1252 = Charset.forName("windows-1252");

    private String project() throws Exception {
        return Files.readString(Path.of("fluids-data", "examples", "gravity-spring-line.json"));
    }

    @Test
    void aWindows1252ProjectIsRefusedWithItsLineNotReadAsReplacementCharacters() throws Exception {
        String text = project().replaceFirst("\"title\"\\s*:\\s*\"[^\"]*\"", "\"title\": \"Caf\u00e9 line\"");
        assertTrue(text.contains("Caf\u00e9"));
        Path p = dir.resolve("cafe.json");
        Files.write(p, text.getBytes(CP1252));
        CliRun r = CliRun.of("solve", p.toString());
        assertEquals(2, r.exitCode(), r.out());
        int line = text.substring(0, text.indexOf("Caf\u00e9")).split("\n", -1).length;
        assertTrue(r.err().contains("cafe.json line " + line + ":"), r.err());
        assertTrue(r.err().contains("0xE9") && r.err().contains("UTF-8"), r.err());
        // The same text as UTF-8 solves.
        Files.writeString(p, text);
        assertEquals(0, CliRun.of("solve", p.toString()).exitCode());
    }

    @Test
    void aUtf16ProjectIsNamedAsUtf16() throws Exception {
        Path p = dir.resolve("wide.json");
        Files.write(p, project().getBytes(StandardCharsets.UTF_16));
        CliRun r = CliRun.of("solve", p.toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("UTF-16"), r.err());
        Files.write(p, project().getBytes(StandardCharsets.UTF_16LE));
        CliRun noMark = CliRun.of("solve", p.toString());
        assertEquals(2, noMark.exitCode());
        assertTrue(noMark.err().contains("UTF-16"), noMark.err());
    }

    @Test
    void textAfterTheProjectsClosingBraceIsRefused() throws Exception {
        for (String tail : new String[] {"garbage\n", ">>>>>>> theirs\n", "{\"format\": \"x\"}\n"}) {
            Path p = dir.resolve("tail.json");
            Files.writeString(p, project() + tail);
            CliRun r = CliRun.of("solve", p.toString());
            assertEquals(2, r.exitCode(), tail + r.out());
            assertTrue(r.err().contains("tail.json line "), r.err());
        }
        Path p = dir.resolve("ws.json");
        Files.writeString(p, project() + "\n\n  \n");
        assertEquals(0, CliRun.of("solve", p.toString()).exitCode(), "trailing white space is fine");
    }

    @Test
    void aByteOrderMarkBeforeTheFrictionInputHeaderIsDropped() throws Exception {
        Path in = dir.resolve("excel.csv");
        Files.write(in, "\uFEFFre,relative_roughness\n1e5,1e-4\n".getBytes(StandardCharsets.UTF_8));
        CliRun r = CliRun.of("friction", "--input", in.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().startsWith("re,relative_roughness,friction_factor"), r.out());
        assertFalse(r.out().contains("\uFEFF"));
    }

    @Test
    void aWindows1252FrictionInputNamesTheLineAndLeavesStandardOutputUsable() throws Exception {
        StringBuilder b = new StringBuilder("re,relative_roughness,note\n");
        for (int i = 0; i < 2000; i++) {
            b.append("1e5,1e-4,ok\n");
        }
        b.append("1e5,1e-4,caf\u00e9\n");
        Path in = dir.resolve("latin.csv");
        Files.write(in, b.toString().getBytes(CP1252));
        CliRun r = CliRun.of("friction", "--input", in.toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("latin.csv line 2002:"), r.err());
        assertFalse(r.err().contains("Input length"), r.err());
    }

    @Test
    void aWindows1252LineListNamesTheLine() throws Exception {
        Path nodes = dir.resolve("nodes.csv");
        Files.write(
                nodes,
                "id,elevation [m],fixed_head [m],demand [L/s],name\nS,0,40,,Source\nA,2,,0.5,Caf\u00e9\n"
                        .getBytes(CP1252));
        Path links = dir.resolve("links.csv");
        Files.writeString(links, "id,from,to,kind,length [m],diameter [mm],roughness [mm]\nP,S,A,pipe,40,50,0.05\n");
        CliRun r = CliRun.of("network", "--nodes", nodes.toString(), "--links", links.toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("nodes.csv line 3:"), r.err());
    }

    @Test
    void decodingLocatesTheFirstBadByteAndDropsAMark() {
        byte[] ok = "\uFEFFa\nb\n".getBytes(StandardCharsets.UTF_8);
        assertEquals("a\nb\n", TextFiles.decode(ok, "t"));
        byte[] bad = "a\nb\nc\u00e9\n".getBytes(CP1252);
        InputException e = assertThrows(InputException.class, () -> TextFiles.decode(bad, "t.csv"));
        assertEquals("t.csv line 3", e.where());
        assertTrue(e.problem().contains("at byte 6 of the file"), e.problem());
        // A truncated multi-byte sequence at the very end is also caught.
        byte[] cut = {'a', (byte) 0xE2, (byte) 0x82};
        assertThrows(InputException.class, () -> TextFiles.decode(cut, "cut"));
    }
}
