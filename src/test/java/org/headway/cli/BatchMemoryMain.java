package org.headway.cli;

import java.io.BufferedWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Child-JVM program for {@link HostileInputTest}: writes a friction batch of N rows, then runs
 * {@code headway friction --input … --output …} on it and prints the exit code and the peak heap
 * used by the batch alone.
 */
public final class BatchMemoryMain {

    private BatchMemoryMain() {}

    public static void main(String[] args) throws Exception {
        long rows = Long.parseLong(args[0]);
        Path input = Path.of(args[1]);
        Path output = Path.of(args[2]);
        try (BufferedWriter w = Files.newBufferedWriter(input, StandardCharsets.UTF_8)) {
            w.write("point,re,relative_roughness\n");
            for (long i = 0; i < rows; i++) {
                double re = Math.pow(10, 3 + 4 * ((i * 7919) % 1000) / 1000.0);
                double rr = (i % 5) * 0.002;
                w.write(String.format(Locale.ROOT, "p%d,%.6g,%.4g%n", i, re, rr));
            }
        }
        System.gc();
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            pool.resetPeakUsage();
        }
        int code = HeadwayCommand.run("friction", "--input", input.toString(), "--output", output.toString());
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        System.out.println("exit=" + code + " peakHeapBytes=" + peak);
    }
}
