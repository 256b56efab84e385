package org.headway.app;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.stage.Stage;
import org.headway.pipe.Catalog;
import org.testfx.util.WaitForAsyncUtils;

/** The real window on the demo project, with fake dialogs, for the end-to-end tests. */
final class WindowFixture {

    /**
     * Monocle's headless screen is 1280×800 unless told otherwise, smaller than the window; the
     * property must be set before the toolkit starts, which the test classes do by touching this.
     */
    static void prepareScreen() {
        System.setProperty("headless.geometry", "1600x1000-32");
    }

    final Path dir;
    final Path demo;
    final FakeDialogs dialogs = new FakeDialogs();
    final ProjectEditor editor;
    final ResultsModel results;
    final MainWindow window;

    WindowFixture(Stage stage) throws Exception {
        dir = Files.createTempDirectory("headway-ui");
        demo = Demo.copyTo(dir);
        editor = new ProjectEditor(Catalog.bundled(), dialogs, new RecentFiles(dir.resolve("recent.txt")));
        editor.openFile(demo);
        results = new ResultsModel(editor, new FxRecalculator(), "test");
        window = new MainWindow(editor, results, dialogs);
        window.attach(stage, HeadwayApp.WIDTH, HeadwayApp.HEIGHT);
        stage.show();
    }

    /** Waits until the newest recalculation has been shown. */
    void awaitResults() throws Exception {
        WaitForAsyncUtils.waitFor(
                20,
                TimeUnit.SECONDS,
                () -> !results.rows().isEmpty() && !results.computingProperty().get());
        WaitForAsyncUtils.waitForFxEvents();
    }
}
