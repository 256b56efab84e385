package org.headway.app.tools;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import javafx.animation.AnimationTimer;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.headway.chart.FrictionChart;
import org.headway.friction.FrictionMethods;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.fx.ChartViewer;
import org.jfree.chart.plot.XYPlot;

/**
 * A measurement aid, not a test: shows the friction chart with 100,000 synthetic rig-like points in
 * the JFreeChart viewer and times redraws while zooming and panning. Run under a display (e.g.
 * xvfb-run) with the test classpath:
 *
 * <pre>java -cp target/classes:target/test-classes:$(cat cp.txt) org.headway.app.tools.FrictionChartRedrawProbe\$Start</pre>
 *
 * Prints (1) the time of the synchronous redraw the viewer does on each axis change, and (2) the
 * interval between frames while the range changes every frame (redraw plus rasterising).
 */
public final class FrictionChartRedrawProbe extends Application {

    static final int POINTS = 100_000;
    static final int STEPS = 120;

    private final List<Double> drawMs = new ArrayList<>();
    private final List<Double> frameMs = new ArrayList<>();

    /** Started through {@link Start}: a class that extends Application cannot be the main class of a plain classpath. */
    public static final class Start {
        private Start() {}

        public static void main(String[] args) {
            Application.launch(FrictionChartRedrawProbe.class, args);
        }
    }

    static List<FrictionChart.RigPoint> rigPoints() {
        Random random = new Random(42);
        var colebrook = FrictionMethods.byId("colebrook");
        List<FrictionChart.RigPoint> points = new ArrayList<>(POINTS);
        for (int i = 0; i < POINTS; i++) {
            double re = Math.pow(10, 4 + 2 * random.nextDouble());
            double f = colebrook.frictionFactor(re, 2e-4) * (1 + 0.03 * random.nextGaussian());
            points.add(new FrictionChart.RigPoint(re, f, 0.02 * re, 0.02 * f));
        }
        return points;
    }

    @Override
    public void start(Stage stage) {
        long t0 = System.nanoTime();
        JFreeChart chart = FrictionChart.build(new FrictionChart.Spec(
                "100,000 synthetic rig points",
                FrictionMethods.byId("colebrook"),
                FrictionChart.Spec.USUAL_ROUGHNESS,
                1e3,
                1e8,
                List.of(),
                rigPoints(),
                List.of()));
        System.out.printf(Locale.ROOT, "build: %.0f ms%n", (System.nanoTime() - t0) / 1e6);
        if (Boolean.getBoolean("probe.noAntiAlias")) {
            chart.setAntiAlias(false);
        }
        ChartViewer viewer = new ChartViewer(chart);
        stage.setScene(new Scene(viewer, 1200, 800));
        stage.show();
        XYPlot plot = (XYPlot) chart.getPlot();
        new AnimationTimer() {
            private int step = -30; // let the window settle first
            private long last;

            @Override
            public void handle(long now) {
                if (step >= 0 && last != 0) {
                    frameMs.add((now - last) / 1e6);
                }
                last = now;
                if (step >= 0) {
                    // Zoom in over the first half, then pan right, as a hand on the wheel and mouse would.
                    double lo;
                    double hi;
                    if (step < STEPS / 2) {
                        double k = step / (double) (STEPS / 2);
                        lo = Math.pow(10, 3 + 1.0 * k);
                        hi = Math.pow(10, 8 - 1.5 * k);
                    } else {
                        double shift = 0.02 * (step - STEPS / 2);
                        lo = Math.pow(10, 4 + shift);
                        hi = Math.pow(10, 6.5 + shift);
                    }
                    long a = System.nanoTime();
                    plot.getDomainAxis().setRange(lo, hi);
                    drawMs.add((System.nanoTime() - a) / 1e6);
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
        System.out.println("synchronous redraw per axis change: " + stats(drawMs));
        System.out.println("frame interval while changing every frame: " + stats(frameMs));
    }

    /** n, mean, median, p95 and max of timings in ms (shared with the schematic probe). */
    public static String stats(List<Double> values) {
        double[] v = values.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        double mean = Arrays.stream(v).average().orElse(Double.NaN);
        return String.format(
                Locale.ROOT,
                "n=%d mean %.1f ms, median %.1f ms, p95 %.1f ms, max %.1f ms",
                v.length,
                mean,
                v[v.length / 2],
                v[(int) Math.floor(0.95 * (v.length - 1))],
                v[v.length - 1]);
    }
}
