package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.headway.caution.Caution;
import org.headway.pipe.Catalog;
import org.headway.system.HeadLossCalculator;
import org.headway.system.PipeRun;
import org.headway.system.RunResult;
import org.headway.system.SegmentResult;
import org.junit.jupiter.api.Test;

/**
 * The same caution raised by several segments is listed once, naming them. Invented run: three
 * identical explicit-bore pipes, each with a Darby 3-K elbow, so each raises the same note about
 * the missing nominal size (checked here against each segment's own caution list).
 */
class CautionGroupingTest {

    private static final String PIPE = """
            { "id": "ID", "kind": "pipe", "length": "10 m", "innerDiameter": "40.9 mm", "roughness": "0.045 mm",
              "fittings": [ { "kind": "darby-elbow-90-standard-flanged", "count": 1 } ] }
            """;

    private static RunResult solve() {
        String json = """
                { "format": "headway-project", "version": 2, "title": "invented three-pipe run",
                  "fluid": { "name": "water", "temperature": "20 degC" }, "flow": "2 L/s",
                  "elements": [ @A@, @B@, @C@ ] }
                """.replace("@A@", PIPE.replace("ID", "first"))
                .replace("@B@", PIPE.replace("ID", "second"))
                .replace("@C@", PIPE.replace("ID", "third"));
        PipeRun run = ProjectResolver.resolve(ProjectFile.parse(json), Catalog.bundled(), Path.of("."))
                .run();
        return HeadLossCalculator.solve(run, run.designFlow());
    }

    @Test
    void identicalSegmentCautionsAreListedOnceNamingTheSegments() {
        RunResult r = solve();
        String code = "three-k-nominal-size-unknown";
        // each segment still carries its own copy, prefixed with its name
        String rest = null;
        for (SegmentResult s : r.segments()) {
            List<Caution> own =
                    s.cautions().stream().filter(c -> c.code().equals(code)).toList();
            assertEquals(1, own.size(), s.name() + " " + s.cautions());
            assertTrue(
                    own.get(0).message().startsWith(s.name() + ": "), own.get(0).message());
            String tail = own.get(0).message().substring(s.name().length() + 2);
            if (rest != null) {
                assertEquals(rest, tail);
            }
            rest = tail;
        }
        List<Caution> run =
                r.cautions().stream().filter(c -> c.code().equals(code)).toList();
        assertEquals(1, run.size(), run.toString());
        assertEquals("first, second, third: " + rest, run.get(0).message());
    }

    @Test
    void differentCautionsStaySeparate() {
        List<Caution> in = List.of(
                Caution.note("x", "a: velocity 0.3 m/s is low", "b"),
                Caution.note("x", "c: velocity 0.4 m/s is low", "b"),
                Caution.note("x", "d: velocity 0.3 m/s is low", "b"),
                Caution.warning("x", "e: velocity 0.3 m/s is low", "b"),
                Caution.note("y", "no subject here", "b"));
        List<Caution> out = Caution.grouped(in);
        assertEquals(
                List.of(
                        Caution.note("x", "a, d: velocity 0.3 m/s is low", "b"),
                        Caution.note("x", "c: velocity 0.4 m/s is low", "b"),
                        Caution.warning("x", "e: velocity 0.3 m/s is low", "b"),
                        Caution.note("y", "no subject here", "b")),
                out);
    }
}
