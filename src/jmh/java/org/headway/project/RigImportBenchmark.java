package org.headway.project;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.headway.correlation.RigReport;
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
 * whole file; rows/s = 10⁶ / (s/op). Runs in a JVM limited to 512 MB of heap and prints the peak
 * heap use of the trial (sum over heap pools of their peak usage).
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
    }

    @Benchmark
    public RigReport importMillionRows(Blackhole sink) {
        return RigFile.load(rig).analyse(0, sink::consume);
    }

    @TearDown(Level.Trial)
    public void reportPeakHeap() {
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        System.out.printf(
                "%n[rig import] peak heap %.1f MB (sum of heap pools' peaks; max heap %.0f MB)%n",
                peak / 1048576.0, Runtime.getRuntime().maxMemory() / 1048576.0);
    }
}
