package org.headway.system;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.headway.fluid.FluidState;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * A dense system curve: a 1,000-segment run evaluated at 1,000 flows (10⁶ segment evaluations),
 * against the cost of the 10⁶ friction solves alone at the same (Re, ε/D) pairs. Issue goal: the
 * curve under 0.5 s on one core.
 *
 * <p>Run: {@code mvn -B -q -Pjmh test-compile exec:exec -Dbench=SystemCurve}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class SystemCurveBenchmark {

    private PipeRun run;
    private double[] reynolds;
    private double[] relativeRoughness;
    private FrictionCorrelation method;
    private static final double MAX_FLOW = 0.05;
    private static final int FLOWS = 1000;

    @Setup
    public void setUp() {
        Random random = new Random(20261201L);
        List<Segment> segments = new ArrayList<>();
        for (int i = 0; i < 1000; i++) {
            double d = 0.05 + 0.25 * random.nextDouble();
            double eps = d * Math.pow(10, -6 + 4 * random.nextDouble());
            segments.add(Segment.builder("s" + i)
                    .length(5 + 100 * random.nextDouble())
                    .bore(d, eps)
                    .extraLossCoefficient(random.nextDouble())
                    .elevationChange(random.nextGaussian())
                    .build());
        }
        FluidState water = new FluidState(
                "water",
                293.15,
                101_325,
                998.2,
                1.0016e-3,
                1.0016e-3 / 998.2,
                OptionalDouble.of(2339),
                "",
                "",
                "",
                List.of());
        method = FrictionMethods.byId("auto");
        run = PipeRun.of(
                "bench",
                water,
                method,
                segments,
                EndCondition.OPEN_AT_PIPE_END,
                EndCondition.OPEN_AT_PIPE_END,
                Optional.empty(),
                0,
                SiteAtmosphere.SEA_LEVEL_PRESSURE,
                0.01,
                0,
                DesignLimits.USUAL);
        reynolds = new double[segments.size() * FLOWS];
        relativeRoughness = new double[reynolds.length];
        int k = 0;
        for (int j = 0; j < FLOWS; j++) {
            double q = MAX_FLOW * j / (FLOWS - 1);
            for (Segment s : segments) {
                double v = q / s.area();
                reynolds[k] = Math.max(1e-3, 998.2 * v * s.innerDiameter() / 1.0016e-3);
                relativeRoughness[k++] = s.relativeRoughness();
            }
        }
    }

    /** The whole curve: 1,000 flows × 1,000 segments. */
    @Benchmark
    public List<SystemCurve.Point> systemCurve() {
        return SystemCurve.compute(run, 0, MAX_FLOW, FLOWS);
    }

    /** The friction solves alone, same method and same (Re, ε/D) pairs. */
    @Benchmark
    public double frictionSolvesOnly() {
        double sum = 0;
        for (int i = 0; i < reynolds.length; i++) {
            sum += method.frictionFactor(reynolds[i], relativeRoughness[i]);
        }
        return sum;
    }
}
