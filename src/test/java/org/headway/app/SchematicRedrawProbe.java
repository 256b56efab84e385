package org.headway.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import javafx.animation.AnimationTimer;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.beans.property.SimpleObjectProperty;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.headway.pipe.Catalog;
import org.headway.project.LineList;
import org.headway.project.Project;
import org.headway.units.UnitSystem;

/**
 * A measurement aid, not a test (beside the app's package-private views, hence here and not in
 * {@code tools}): the network workspace at 1400×900 on a generated K×K looped grid (K = 58 by
 * default: 3,365 nodes and 6,613 links, about 10⁴ elements), solved, then 120 zoom and pan steps on
 * the schematic, one per frame. Prints the time of each redraw (the painter's call) and the
 * interval between frames. Run under a display, e.g. {@code src/jmh/run-schematic-bench.sh}.
 */
public final class SchematicRedrawProbe extends Application {

    static final int STEPS = 120;

    private final List<Double> drawMs = new ArrayList<>();
    private final List<Double> frameMs = new ArrayList<>();

    /** Started through this class: one that extends Application cannot be a plain classpath's main class. */
    public static final class Start {
        private Start() {}

        public static void main(String[] args) {
            Application.launch(SchematicRedrawProbe.class, args);
        }
    }

    /** An invented K×K grid of junctions 100 m apart, pipes of random bore, a reservoir at one corner. */
    static Project grid(int k) {
        Random random = new Random(7);
        StringBuilder nodes = new StringBuilder("id,elevation [m],demand [L/s],fixed_head [m],x [m],y [m]\n");
        StringBuilder links = new StringBuilder("id,from,to,kind,length [m],diameter [mm],roughness [mm]\n");
        nodes.append("R,,,80,-200,0\n");
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < k; c++) {
                nodes.append(String.format(
                        Locale.ROOT, "n%d_%d,%.2f,0.05,,%d,%d%n", r, c, 10 * random.nextDouble(), 100 * c, -100 * r));
            }
        }
        int[] bores = {100, 150, 200, 250};
        links.append("feed,R,n0_0,pipe,200,600,0.045\n");
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < k; c++) {
                if (c + 1 < k) {
                    links.append(String.format(
                            Locale.ROOT,
                            "h%d_%d,n%d_%d,n%d_%d,pipe,100,%d,0.045%n",
                            r,
                            c,
                            r,
                            c,
                            r,
                            c + 1,
                            bores[random.nextInt(4)]));
                }
                if (r + 1 < k) {
                    links.append(String.format(
                            Locale.ROOT,
                            "v%d_%d,n%d_%d,n%d_%d,pipe,100,%d,0.045%n",
                            r,
                            c,
                            r,
                            c,
                            r + 1,
                            c,
                            bores[random.nextInt(4)]));
                }
            }
        }
        Project.NetworkSpec spec =
                LineList.parse("nodes", nodes.toString(), "links", links.toString(), Catalog.bundled(), false);
        return Project.network("Grid " + k + "×" + k + " (invented)", "water", "15 degC", "auto", spec);
    }

    @Override
    public void start(Stage stage) {
        int k = Integer.getInteger("probe.k", 58);
        NetworkEditor editor = new NetworkEditor(Catalog.bundled(), new SimpleObjectProperty<>(UnitSystem.SI));
        editor.load(grid(k), null);
        long t0 = System.nanoTime();
        NetworkSolution s =
                NetworkSolution.solve(editor, editor.draft(), editor.catalog(), Path.of("."), (a, b, c) -> {});
        System.out.printf(
                Locale.ROOT,
                "grid %d×%d: %d nodes, %d links; solve %.0f ms, %d iterations%n",
                k,
                k,
                s.result().nodes().size(),
                s.result().links().size(),
                (System.nanoTime() - t0) / 1e6,
                s.result().iterations());
        NetworkWorkspaceView workspace = new NetworkWorkspaceView(editor, new FakeDialogs(), () -> Path.of("."));
        stage.setScene(new Scene(workspace, 1400, 900));
        stage.show();
        editor.show(s);
        SchematicView view = workspace.schematic();
        new AnimationTimer() {
            private int step = -30; // let the window settle first
            private long last;

            @Override
            public void handle(long now) {
                if (step >= 0 && last != 0) {
                    frameMs.add((now - last) / 1e6);
                }
                last = now;
                if (step == -1) {
                    System.out.printf(Locale.ROOT, "schematic %.0f×%.0f px%n", view.getWidth(), view.getHeight());
                    // The whole drawing, every element on the pane, ten times.
                    List<Double> whole = new ArrayList<>();
                    for (int i = 0; i < 10; i++) {
                        view.fit();
                        whole.add(view.lastPaintNanos() / 1e6);
                    }
                    System.out.println("whole drawing (fitted) redraw: " + stats(whole));
                }
                if (step >= 0) {
                    // Zoom in about the middle over the first half (to about 12×), then pan across, as
                    // a hand on the wheel and the mouse would.
                    if (step < STEPS / 2) {
                        view.zoomBy(1.043, view.getWidth() / 2, view.getHeight() / 2);
                    } else {
                        view.panBy(-14, 6);
                    }
                    drawMs.add(view.lastPaintNanos() / 1e6);
                }
                if (++step > STEPS) {
                    stop();
                    report();
                    Platform.exit();
                }
            }
        }.start();
    }

    private void report() {
        System.out.println("redraw (painter call) per step: " + stats(drawMs));
        System.out.println("frame interval while changing every frame: " + stats(frameMs));
    }

    private static String stats(List<Double> values) {
        return org.headway.app.tools.FrictionChartRedrawProbe.stats(values);
    }
}
