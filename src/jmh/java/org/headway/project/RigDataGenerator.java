package org.headway.project;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;
import org.headway.fluid.Fluid;
import org.headway.fluid.FluidState;
import org.headway.fluid.Fluids;
import org.headway.friction.Colebrook1939;

/**
 * Writes INVENTED rig data sets: the bundled demo (25 points, laminar to turbulent) and large files
 * for the import benchmark. Not measurements.
 *
 * <p>Truth: a test section of bore {@value #BORE} m with taps {@value #TAP_SPACING} m apart and
 * roughness ε = {@value #ROUGHNESS} m; water by IAPWS at the true temperature; f = 64/Re below Re
 * 2300, Colebrook–White from 4000, a straight line in Re between. Measurement noise (normal, fixed
 * seed): flow 0.5 %, pressure drop 0.5 % and 2 Pa, temperature 0.1 K.
 *
 * <p>Usage: {@code java … org.headway.project.RigDataGenerator demo OUT.csv} or {@code …
 * RigDataGenerator rows N OUT.csv}; see {@code src/jmh/rig-data.sh}.
 */
public final class RigDataGenerator {

    static final double BORE = 0.0209;
    static final double TAP_SPACING = 2.0;
    static final double ROUGHNESS = 0.15e-3;
    static final long SEED = 2026L;
    static final double FLOW_NOISE = 0.005;
    static final double DP_NOISE_RELATIVE = 0.005;
    static final double DP_NOISE_ABSOLUTE = 2.0;
    static final double T_NOISE = 0.1;

    private static final Fluid WATER = Fluids.byId("water");

    private RigDataGenerator() {}

    public static void main(String[] args) throws IOException {
        if (args.length == 2 && args[0].equals("demo")) {
            writeDemo(Path.of(args[1]));
        } else if (args.length == 3 && args[0].equals("rows")) {
            writeRows(Long.parseLong(args[1]), Path.of(args[2]));
        } else {
            throw new IllegalArgumentException("usage: demo OUT.csv | rows N OUT.csv");
        }
    }

    /** True Darcy f of the invented pipe. */
    static double trueFriction(double reynolds) {
        double rr = ROUGHNESS / BORE;
        if (reynolds < 2300) {
            return 64 / reynolds;
        }
        if (reynolds >= 4000) {
            return Colebrook1939.solver().frictionFactor(reynolds, rr);
        }
        double low = 64 / 2300.0;
        double high = Colebrook1939.solver().frictionFactor(4000, rr);
        return low + (reynolds - 2300) / 1700 * (high - low);
    }

    /** One measured row: flow (L/s), dp (kPa), T (°C). */
    static double[] row(double reynolds, double temperatureCelsius, Random random) {
        FluidState s = WATER.state(temperatureCelsius + 273.15, 101_325.0);
        double velocity = reynolds * s.dynamicViscosity() / (s.density() * BORE);
        double flow = velocity * Math.PI * BORE * BORE / 4;
        double dp = trueFriction(reynolds) * TAP_SPACING / BORE * s.density() * velocity * velocity / 2;
        double flowMeasured = flow * (1 + FLOW_NOISE * random.nextGaussian());
        double dpMeasured =
                dp * (1 + DP_NOISE_RELATIVE * random.nextGaussian()) + DP_NOISE_ABSOLUTE * random.nextGaussian();
        double tMeasured = temperatureCelsius + T_NOISE * random.nextGaussian();
        return new double[] {flowMeasured * 1000, dpMeasured / 1000, tMeasured};
    }

    static String header(String what) {
        return "# INVENTED rig data for demonstration only: not measurements; do not use for design.\n"
                + "# " + what + " written by src/jmh/java/org/headway/project/RigDataGenerator.java (seed " + SEED
                + ").\n"
                + "# Truth: bore 20.9 mm, taps 2 m apart, roughness 0.15 mm; water (IAPWS) at the true temperature;\n"
                + "# f = 64/Re below Re 2300, Colebrook-White from Re 4000, a straight line between.\n"
                + "# Noise (normal): flow 0.5 %, pressure drop 0.5 % and 2 Pa, temperature 0.1 K.\n";
    }

    static void writeDemo(Path out) throws IOException {
        Random random = new Random(SEED);
        int n = 25;
        try (BufferedWriter w = Files.newBufferedWriter(out, StandardCharsets.UTF_8)) {
            w.write(header("25 points from Re 800 to 150000,"));
            w.write("flow [L/s],dp [kPa],T [degC],run\n");
            for (int i = 0; i < n; i++) {
                double re = 800 * Math.pow(150_000 / 800.0, i / (n - 1.0));
                // The water warms slowly as the pump runs.
                double t = 18.0 + 4.0 * i / (n - 1.0);
                double[] r = row(re, t, random);
                w.write(String.format(Locale.ROOT, "%.5g,%.5g,%.2f,R%02d%n", r[0], r[1], r[2], i + 1));
            }
        }
    }

    static void writeRows(long rows, Path out) throws IOException {
        Random random = new Random(SEED);
        try (BufferedWriter w = Files.newBufferedWriter(out, StandardCharsets.UTF_8)) {
            w.write(header(rows + " rows with Re log-uniform from 3000 to 300000,"));
            w.write("flow [L/s],dp [kPa],T [degC],run\n");
            for (long i = 0; i < rows; i++) {
                // From Re 3000 the smallest pressure drop (~40 Pa) is 20 times the 2 Pa noise: no negative drops.
                double re = 3000 * Math.pow(100.0, random.nextDouble());
                double t = 15.0 + 10.0 * random.nextDouble();
                double[] r = row(re, t, random);
                w.write(String.format(Locale.ROOT, "%.6g,%.6g,%.2f,B%d%n", r[0], r[1], r[2], i + 1));
            }
        }
    }
}
