package org.headway.project;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Child process for {@link AtomicSaveKillTest}: saves a project that grows by one segment per save,
 * forever, announcing each completed save on stdout, until it is killed.
 */
public final class SaveLoopMain {

    private SaveLoopMain() {}

    public static void main(String[] args) {
        Path file = Path.of(args[0]);
        int start = Integer.parseInt(args[1]);
        for (int n = start; ; n++) {
            ProjectFile.save(project(n), file);
            System.out.println("saved " + n);
            System.out.flush();
        }
    }

    /** A valid project with n segments, each with a long name so a save takes a little while. */
    static Project project(int n) {
        List<Project.SegmentSpec> segments = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            segments.add(new Project.SegmentSpec(
                    "segment " + i + " " + "x".repeat(2000),
                    "10 m",
                    Optional.empty(),
                    "50 mm",
                    "0.01 mm",
                    List.of(),
                    "",
                    ""));
        }
        return Project.of(
                "kill test",
                Project.TitleBlock.EMPTY,
                new Project.FluidSpec("water", "20 degC", "", "", "", ""),
                "1 L/s",
                "",
                "auto",
                segments,
                Project.EndsSpec.OPEN,
                Optional.empty(),
                Project.LimitsSpec.NONE,
                Optional.empty(),
                Optional.empty());
    }
}
