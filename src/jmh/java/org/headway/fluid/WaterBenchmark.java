package org.headway.fluid;

import java.util.concurrent.TimeUnit;
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
 * Time for one full water state (IF97 density, Region 4 vapour pressure, IAPWS 2008 viscosity,
 * range checks, the result record) and for its parts. Temperatures cycle through 5-150 °C and
 * pressures through 0.6-3.75 MPa so that the JIT cannot fold a constant input; none of these states
 * carries a caution (a caution's message formatting costs microseconds and is not the common path).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class WaterBenchmark {

    private static final int STATES = 64;

    private final Water water = new Water();
    private final double[] temperatures = new double[STATES];
    private final double[] pressures = new double[STATES];
    private int next;

    @Setup
    public void prepare() {
        for (int i = 0; i < STATES; i++) {
            temperatures[i] = 278.15 + 145.0 * i / (STATES - 1);
            pressures[i] = 0.6e6 + 5e4 * i;
        }
    }

    private int index() {
        next = (next + 1) & (STATES - 1);
        return next;
    }

    @Benchmark
    public FluidState state() {
        int i = index();
        return water.state(temperatures[i], pressures[i]);
    }

    @Benchmark
    public double region1Density() {
        int i = index();
        return If97Region1.density(temperatures[i], pressures[i]);
    }

    @Benchmark
    public double region4SaturationPressure() {
        int i = index();
        return If97Region4.saturationPressure(temperatures[i]);
    }

    @Benchmark
    public double viscosity() {
        int i = index();
        return Iapws2008Viscosity.viscosity(temperatures[i], 990.0);
    }
}
