package org.headway.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class CatalogCommandTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = HeadwayCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void listsMaterials() {
        assertEquals(0, run("catalog", "materials"));
        String text = out.toString();
        assertTrue(text.startsWith("id "), text);
        // Moody (1944): commercial steel 0.046 mm (from memory)
        assertTrue(text.lines().anyMatch(l -> l.startsWith("steel-commercial-new ") && l.contains(" 0.046 ")), text);
        assertTrue(text.contains("14 materials"), text);
        assertEquals("", err.toString());
    }

    @Test
    void sizesAsCsvAreSortedByInnerDiameter() {
        assertEquals(0, run("catalog", "sizes", "--table", "asme-b36.10m", "--schedule", "40", "--format", "csv"));
        List<String> lines = out.toString().lines().collect(Collectors.toList());
        assertEquals("table,nominal,schedule,od_mm,wall_mm,id_mm", lines.get(0));
        assertEquals(24, lines.size());
        // ASME B36.10M NPS 2 Sch 40: OD 60.3 mm, wall 3.91 mm (from memory)
        assertTrue(lines.contains("asme-b36.10m,2,40,60.3,3.91,52.48"), lines.toString());
        double previous = 0;
        for (String line : lines.subList(1, lines.size())) {
            double id = Double.parseDouble(line.substring(line.lastIndexOf(',') + 1));
            assertTrue(id > previous, line);
            previous = id;
        }
    }

    @Test
    void scheduleAcrossTablesKeepsTablesThatHaveIt() {
        assertEquals(0, run("catalog", "sizes", "--schedule", "40", "--format", "csv", "--filter", "1-1/2"));
        List<String> lines = out.toString().lines().collect(Collectors.toList());
        assertEquals(
                List.of(
                        "table,nominal,schedule,od_mm,wall_mm,id_mm",
                        "asme-b36.10m,1-1/2,40,48.3,3.68,40.94",
                        "astm-d1785,1-1/2,40,48.26,3.683,40.894"),
                lines);
    }

    @Test
    void fittingsFilter() {
        assertEquals(0, run("catalog", "fittings", "--filter", "globe"));
        String text = out.toString();
        assertTrue(text.contains("globe-valve-open"), text);
        assertTrue(text.contains("hooper-globe-valve"), text);
        assertTrue(text.contains("darby-globe-valve"), text);
        assertTrue(text.contains("3 fittings"), text);
        assertTrue(!text.contains("elbow"), text);
    }

    @Test
    void unknownListIsBadInput() {
        assertEquals(2, run("catalog", "pumps"));
        assertEquals(
                "headway: LIST: unknown list 'pumps'; expected materials, sizes or fittings",
                err.toString().strip());
        assertEquals("", out.toString());
    }

    @Test
    void unknownScheduleNamesWhatExists() {
        assertEquals(2, run("catalog", "sizes", "--table", "astm-b88", "--schedule", "40"));
        assertEquals(
                "headway: schedule: table astm-b88 has no schedule 40; schedules: K, L, M",
                err.toString().strip());
    }

    @Test
    void userFolderOverridesAndBrokenFileGivesOneLine(@TempDir Path dir) throws IOException {
        Files.writeString(
                dir.resolve("materials.csv"),
                "# source: invented for this test\n"
                        + "id,name,roughness_mm,roughness_low_mm,roughness_high_mm,condition,size_table,source\n"
                        + "pvc,Our PVC,0.002,0.0015,0.007,new,astm-d1785,ours\n");
        assertEquals(0, run("catalog", "materials", "--catalog", dir.toString(), "--filter", "pvc", "--format", "csv"));
        assertTrue(out.toString().contains("pvc,Our PVC,0.002,0.0015,0.007,new,astm-d1785,ours"), out.toString());

        Files.writeString(
                dir.resolve("materials.csv"),
                "# source: invented for this test\n"
                        + "id,name,roughness_mm,roughness_low_mm,roughness_high_mm,condition,size_table,source\n"
                        + "pvc,Our PVC,0.002,0.0015,abc,new,astm-d1785,ours\n");
        err.getBuffer().setLength(0);
        assertEquals(2, run("catalog", "materials", "--catalog", dir.toString()));
        List<String> errLines = Arrays.asList(err.toString().strip().split("\n"));
        assertEquals(1, errLines.size(), err.toString());
        assertEquals(
                "headway: " + dir.resolve("materials.csv") + " line 3, column roughness_high_mm: not a number: 'abc'",
                errLines.get(0));
    }
}
