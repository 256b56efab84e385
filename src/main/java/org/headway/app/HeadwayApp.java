package org.headway.app;

import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javafx.animation.AnimationTimer;
import javafx.application.Application;
import javafx.stage.Stage;
import org.headway.pipe.Catalog;

/**
 * The desktop application. Started by {@code org.headway.Launcher} (no arguments or {@code gui},
 * with a display) or by {@code mvn javafx:run}. A project file named on the command line is
 * opened at start.
 */
public final class HeadwayApp extends Application {

    /** Initial window size (px). */
    static final double WIDTH = 1400;

    static final double HEIGHT = 880;

    @Override
    public void start(Stage stage) {
        boolean report = Boolean.getBoolean("headway.reportStartup");
        if (report) {
            System.err.println("headway: toolkit up " + sinceJvmStart() + " ms after JVM start");
        }
        FxDialogs dialogs = new FxDialogs(stage);
        ProjectEditor editor = new ProjectEditor(Catalog.bundled(), dialogs, RecentFiles.inUserDataFolder());
        List<String> args = getParameters().getUnnamed();
        if (!args.isEmpty()) {
            Path p = Path.of(args.get(args.size() - 1));
            if (Files.isRegularFile(p)) {
                editor.openFile(p);
            }
        }
        FxRecalculator recalculator = new FxRecalculator();
        // The first solve and the chart building it leads to wait for the first frame (decision 0050).
        recalculator.hold();
        ResultsModel results = new ResultsModel(editor, recalculator, version());
        MainWindow window = new MainWindow(editor, results, dialogs);
        window.attach(stage, WIDTH, HEIGHT);
        Autosave autosave = new Autosave(editor, dialogs, Autosave.inUserDataFolder());
        window.keepAutosave(stage, autosave);
        if (report) {
            System.err.println("headway: window built " + sinceJvmStart() + " ms after JVM start");
        }
        afterFirstFrame(report, () -> {
            recalculator.release();
            // After a crash the copy is newer than the project file: offer it back.
            autosave.offerRestore();
        });
        stage.show();
    }

    /**
     * Runs {@code then} once the first frame after the window is shown has been drawn; with
     * {@code report}, first prints the time from JVM start to that frame (a measurement aid).
     */
    private static void afterFirstFrame(boolean report, Runnable then) {
        new AnimationTimer() {
            private int frames;

            @Override
            public void handle(long now) {
                // The first pulse lays the scene out; the second is the first one drawn with content.
                if (++frames == 2) {
                    stop();
                    if (report) {
                        System.err.println("headway: first frame " + sinceJvmStart() + " ms after JVM start; "
                                + StartupCpu.summary());
                        if (Boolean.getBoolean("headway.exitAfterFirstFrame")) {
                            // For the start-up benchmark: end here, without the close-time checks or autosave.
                            Runtime.getRuntime().halt(0);
                        }
                    }
                    javafx.application.Platform.runLater(then);
                }
            }
        }.start();
    }

    private static long sinceJvmStart() {
        return System.currentTimeMillis() - ManagementFactory.getRuntimeMXBean().getStartTime();
    }

    /** Version from the jar manifest, or a development marker when run from classes. */
    public static String version() {
        String v = HeadwayApp.class.getPackage().getImplementationVersion();
        return v == null ? "0.1.0-dev" : v;
    }
}
