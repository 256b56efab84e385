package org.headway.app;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * A start-up measurement aid: where the process's CPU time has gone so far, split into the JavaFX
 * thread, the JIT compiler threads, the garbage collector and the rest, read from Linux's per-thread
 * accounting ({@code /proc/self/task/N/stat}, fields 14 and 15, in clock ticks of 1/100 s — the
 * usual {@code USER_HZ}, common practice, no source). On a two-core machine the first frame waits for
 * all of it, not only for the JavaFX thread. Threads that have ended are counted in the total only.
 */
public final class StartupCpu {

    private StartupCpu() {}

    /** One line, e.g. "CPU 4.42 s: JavaFX thread 1.41, JIT 2.13, GC 0.17, other 0.71"; empty off Linux. */
    public static String summary() {
        Path tasks = Path.of("/proc/self/task");
        if (!Files.isDirectory(tasks)) {
            return "";
        }
        long fx = 0, jit = 0, gc = 0, listed = 0;
        try (DirectoryStream<Path> all = Files.newDirectoryStream(tasks)) {
            for (Path t : all) {
                String stat;
                try {
                    stat = Files.readString(t.resolve("stat"));
                } catch (IOException gone) {
                    continue; // the thread ended while we looked
                }
                int open = stat.indexOf('('), close = stat.lastIndexOf(')');
                String name = stat.substring(open + 1, close);
                String[] f = stat.substring(close + 2).split(" ");
                long ticks = Long.parseLong(f[11]) + Long.parseLong(f[12]);
                listed += ticks;
                if (name.startsWith("JavaFX Applicat") || name.startsWith("GtkNativeMainLo")) {
                    fx += ticks;
                } else if (name.contains("CompilerThre")) {
                    jit += ticks;
                } else if (name.startsWith("GC Thread") || name.startsWith("G1 ")) {
                    gc += ticks;
                }
            }
        } catch (IOException e) {
            return "";
        }
        double total =
                ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os
                        ? os.getProcessCpuTime() / 1e9
                        : listed / 100.0;
        return String.format(
                Locale.ROOT,
                "CPU %.2f s: JavaFX thread %.2f, JIT %.2f, GC %.2f, other %.2f",
                total,
                fx / 100.0,
                jit / 100.0,
                gc / 100.0,
                Math.max(0, total - (fx + jit + gc) / 100.0));
    }
}
