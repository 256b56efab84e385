package org.headway.project;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.headway.rig.RigReport;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * Rig import of 1,000,000 rows: read the CSV (units in the header, water by IAPWS at each row's
 * temperature), analyse every point, sink each result, fit the roughness. One operation is the
 * whole file; rows/s = 10⁶ / (s/op). Runs in a JVM limited to 512 MB of heap and prints the
 * largest heap in use sampled every 5 ms during the trial (garbage included).
 *
 * <p>{@code mvn -B -q -Pjmh test-compile exec:exec -Dbench=RigImport}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 2)
@Measurement(iterations = 5)
@Fork(
        value = 1,
        jvmArgsAppend = {"-Xmx512m"})
public class RigImportBenchmark {

    static final long ROWS = 1_000_000;

    private Path rig;

    @Setup(Level.Trial)
    public void prepare() throws IOException {
        Path folder = Path.of("target", "rig-bench");
        Files.createDirectories(folder);
        Path data = folder.resolve("rows-1m.csv");
        if (!Files.exists(data)) {
            RigDataGenerator.writeRows(ROWS, data);
        }
        rig = folder.resolve("rig-1m.json");
        Files.writeString(
                rig,
                "{ \"format\": \"headway-rig\", \"version\": 1, \"note\": \"INVENTED benchmark data\",\n"
                        + "  \"data\": \"rows-1m.csv\", \"innerDiameter\": \"20.9 mm\", \"tapSpacing\": \"2 m\",\n"
                        + "  \"roughness\": \"0.15 mm\", \"fluid\": { \"name\": \"water\" },\n"
                        + "  \"uncertainty\": { \"flow\": \"0.5 %\", \"pressureDrop\": \"0.5 % + 2 Pa\","
                        + " \"temperature\": \"0.1 K\", \"innerDiameter\": \"0.05 mm\", \"tapSpacing\": \"1 mm\" },\n"
                        + "  \"compareWith\": \"auto\" }\n");
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            pool.resetPeakUsage();
        }
        sampler = new Thread(() -> {
            Runtime runtime = Runtime.getRuntime();
            while (!Thread.currentThread().isInterrupted()) {
                peakInUse = Math.max(peakInUse, runtime.totalMemory() - runtime.freeMemory());
                try {
                    Thread.sleep(5);
                } catch (InterruptedException e) {
                    return;
                }
            }
        });
        sampler.setDaemon(true);
        sampler.start();
    }

    private Thread sampler;
    private volatile long peakInUse;

    @Benchmark
    public RigReport importMillionRows(Blackhole sink) {
        return RigFile.load(rig).analyse(0, sink::consume);
    }

    @TearDown(Level.Trial)
    public void reportPeakHeap() throws InterruptedException {
        sampler.interrupt();
        sampler.join();
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        System.out.printf(
                "%n[rig import] heap in use, largest sample every 5 ms: %.1f MB; sum of the heap pools' own peaks"
                        + " (not simultaneous, an upper bound): %.1f MB; max heap %.0f MB%n",
                peakInUse / 1048576.0, peak / 1048576.0, Runtime.getRuntime().maxMemory() / 1048576.0);
    }
}
