package org.headway.friction;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Colebrook–White solves over the 1,000,000 pairs of {@link BenchPairs}, one thread. Score is per
 * solve. {@code solveHotPath} is what system curves call; {@code evaluateWithCautions} builds the
 * full result; {@code auto} adds the regime choice.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 3)
@Fork(1)
public class ColebrookBenchmark {

    private double[] reynolds;
    private double[] relativeRoughness;
    private final Colebrook1939 solver = Colebrook1939.solver();
    private final AutoFriction auto = new AutoFriction();

    @Setup
    public void setUp() {
        double[][] pairs = BenchPairs.generate();
        reynolds = pairs[0];
        relativeRoughness = pairs[1];
    }

    @Benchmark
    @OperationsPerInvocation(BenchPairs.COUNT)
    public double solveHotPath() {
        double sum = 0;
        for (int i = 0; i < reynolds.length; i++) {
            sum += solver.frictionFactor(reynolds[i], relativeRoughness[i]);
        }
        return sum;
    }

    @Benchmark
    @OperationsPerInvocation(BenchPairs.COUNT)
    public double evaluateWithCautions() {
        double sum = 0;
        for (int i = 0; i < reynolds.length; i++) {
            sum += solver.evaluate(reynolds[i], relativeRoughness[i]).frictionFactor();
        }
        return sum;
    }

    @Benchmark
    @OperationsPerInvocation(BenchPairs.COUNT)
    public double auto() {
        double sum = 0;
        for (int i = 0; i < reynolds.length; i++) {
            sum += auto.frictionFactor(reynolds[i], relativeRoughness[i]);
        }
        return sum;
    }
}
