package org.headway.fitting;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Time to fit y = a·exp(−b·x) + c to 100,000 or 1,000,000 noisy points (user expression, 3 parameters,
 * Levenberg–Marquardt with exact derivatives and Gauss–Newton polishing), from a = 1, b = 1, c = 0.
 *
 * <p>The data file is written by src/jmh/python/fit_peer.py (fixed seed) so that this benchmark
 * and the SciPy peer fit the same numbers; run both with src/jmh/run-fit-bench.sh.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class FitBenchmark {

    /** Points in the data set: {@code target/fit-bench/decay-<points>.csv}, written by fit_peer.py --generate. */
    @org.openjdk.jmh.annotations.Param({"100k", "1m"})
    public String points;

    private Observations data;
    private FitForm form;
    private final LeastSquaresFitter fitter = new LeastSquaresFitter();

    @Setup
    public void load() throws IOException {
        List<String> lines = Files.readAllLines(Path.of("target/fit-bench/decay-" + points + ".csv"));
        int n = lines.size() - 1;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            String[] parts = lines.get(i + 1).split(",");
            x[i] = Double.parseDouble(parts[0]);
            y[i] = Double.parseDouble(parts[1]);
        }
        data = Observations.of("y", y, List.of("x"), x);
        Map<String, Double> start = new LinkedHashMap<>();
        start.put("a", 1.0);
        start.put("b", 1.0);
        start.put("c", 0.0);
        form = new FitForm.UserExpression("a*exp(-b*x) + c", start);
    }

    @Benchmark
    public FitResult fitDecayingExponential() {
        return fitter.fit(data, form);
    }
}
