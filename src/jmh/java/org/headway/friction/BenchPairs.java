package org.headway.friction;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;

/**
 * The benchmark's (Re, ε/D) pairs, the same in Java and in the Python peer: Re log-uniform over
 * 4e3..1e8; ε/D zero for one pair in ten, otherwise log-uniform over 1e-6..5e-2; fixed seed.
 *
 * <p>{@code main(folder)} writes {@code re.f64}, {@code rr.f64} and Java's friction factors {@code
 * java-f.f64} as little-endian float64 arrays for the peer script to read, and {@code
 * java-cpu.json} with the thread CPU time per solve.
 */
public final class BenchPairs {

    /** Number of pairs. */
    public static final int COUNT = 1_000_000;

    /** Seed of the generator; change it and both sides change together. */
    public static final long SEED = 20_261_201L;

    private BenchPairs() {}

    /** Reynolds numbers (ratio). */
    public static double[] reynolds() {
        return generate()[0];
    }

    /** Relative roughness values (ratio). */
    public static double[] relativeRoughness() {
        return generate()[1];
    }

    /** Both arrays, index-aligned. */
    public static double[][] generate() {
        SplittableRandom random = new SplittableRandom(SEED);
        double[] re = new double[COUNT];
        double[] rr = new double[COUNT];
        double reLow = Math.log10(4e3);
        double reHigh = Math.log10(1e8);
        double rrLow = Math.log10(1e-6);
        double rrHigh = Math.log10(5e-2);
        for (int i = 0; i < COUNT; i++) {
            re[i] = Math.pow(10, random.nextDouble(reLow, reHigh));
            double pick = random.nextDouble();
            double exponent = random.nextDouble(rrLow, rrHigh);
            rr[i] = pick < 0.1 ? 0.0 : Math.pow(10, exponent);
        }
        return new double[][] {re, rr};
    }

    public static void main(String[] args) throws IOException {
        Path folder = Path.of(args.length > 0 ? args[0] : "target/bench");
        Files.createDirectories(folder);
        double[][] pairs = generate();
        double[] f = new double[COUNT];
        Colebrook1939 solver = Colebrook1939.solver();
        for (int i = 0; i < COUNT; i++) {
            f[i] = solver.frictionFactor(pairs[0][i], pairs[1][i]);
        }
        Files.writeString(folder.resolve("java-cpu.json"), cpuTimes(pairs[0], pairs[1]));
        write(folder.resolve("re.f64"), pairs[0]);
        write(folder.resolve("rr.f64"), pairs[1]);
        write(folder.resolve("java-f.f64"), f);
    }

    /**
     * CPU time of the thread per solve, best of 15 passes after 10 warm-up passes: a second opinion
     * beside JMH's wall-clock score, less disturbed when other work shares the cores.
     */
    private static String cpuTimes(double[] re, double[] rr) {
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        Colebrook1939 solver = Colebrook1939.solver();
        AutoFriction auto = new AutoFriction();
        double sink = 0;
        long bestHot = Long.MAX_VALUE;
        long bestAuto = Long.MAX_VALUE;
        for (int pass = 0; pass < 25; pass++) {
            long start = threads.getCurrentThreadCpuTime();
            for (int i = 0; i < re.length; i++) {
                sink += solver.frictionFactor(re[i], rr[i]);
            }
            long middle = threads.getCurrentThreadCpuTime();
            for (int i = 0; i < re.length; i++) {
                sink += auto.frictionFactor(re[i], rr[i]);
            }
            long end = threads.getCurrentThreadCpuTime();
            if (pass >= 10) {
                bestHot = Math.min(bestHot, middle - start);
                bestAuto = Math.min(bestAuto, end - middle);
            }
        }
        return "{\"hot_cpu_ns_per_op\": " + (double) bestHot / re.length + ", \"auto_cpu_ns_per_op\": "
                + (double) bestAuto / re.length + ", \"checksum\": " + sink + "}";
    }

    private static void write(Path file, double[] values) throws IOException {
        ByteBuffer buffer = ByteBuffer.allocate(values.length * Double.BYTES).order(ByteOrder.LITTLE_ENDIAN);
        buffer.asDoubleBuffer().put(values);
        Files.write(file, buffer.array());
    }
}
