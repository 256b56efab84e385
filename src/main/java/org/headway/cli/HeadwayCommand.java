package org.headway.cli;

import java.io.PrintWriter;
import org.headway.caution.InputException;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The top-level {@code headway} command. */
@Command(
        name = "headway",
        mixinStandardHelpOptions = true,
        versionProvider = HeadwayCommand.Version.class,
        description = {
            "Head loss for pipe runs, friction checks of rig data, and review sheets.",
            "Results are estimates for design review against local codes by a qualified engineer."
        },
        subcommands = {
            CommandLine.HelpCommand.class,
            DemoCommand.class,
            SolveCommand.class,
            NetworkCommand.class,
            SheetCommand.class,
            FrictionCommand.class,
            FluidCommand.class,
            CatalogCommand.class,
            RigCommand.class,
            FitCommand.class,
            GroupsCommand.class
        })
public final class HeadwayCommand implements Runnable {

    /** Exit code for success. */
    public static final int EXIT_OK = 0;
    /** Exit code for a bug, or a batch where some rows could not be computed. */
    public static final int EXIT_FAILED = 1;
    /** Exit code for bad usage or bad input. */
    public static final int EXIT_BAD_INPUT = 2;
    /**
     * Exit code of {@code solve --mode flow} when no forward flow is possible: the delivery's head is
     * at or above what the source and the available head give. The result is still printed.
     */
    public static final int EXIT_NO_FLOW = 3;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Builds the command line with Headway's error handling installed. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new HeadwayCommand());
        cl.setExecutionExceptionHandler(HeadwayCommand::handleExecutionException);
        cl.setParameterExceptionHandler(HeadwayCommand::handleParameterException);
        return cl;
    }

    /** The process's standard output as text and, behind it, as bytes. */
    private record StandardOutput(PrintWriter text, java.io.OutputStream bytes) {}

    private static volatile StandardOutput standardOutput;

    /**
     * The byte stream behind {@code out} when {@code out} is the process's standard output as set up
     * by {@link #run}, so that a command writing much UTF-8 (the friction batch) can write its bytes
     * directly after flushing {@code out}; null for any other writer (tests, a picocli default).
     */
    static java.io.OutputStream bytesBehind(PrintWriter out) {
        StandardOutput s = standardOutput;
        return s != null && s.text() == out ? s.bytes() : null;
    }

    /** Runs the command line on the given arguments and returns the exit code. */
    public static int run(String... args) {
        // Standard output is buffered (one flush at the end, not one per line: a 10⁵-row table took
        // seconds line by line) and always UTF-8, whatever the platform charset. A failed write (a full
        // disk, a closed pipe) is reported and fails the command rather than leaving a silent truncation.
        java.io.FileOutputStream stdout = new java.io.FileOutputStream(java.io.FileDescriptor.out);
        PrintWriter out = new PrintWriter(
                new java.io.BufferedWriter(
                        new java.io.OutputStreamWriter(stdout, java.nio.charset.StandardCharsets.UTF_8), 1 << 16),
                false);
        standardOutput = new StandardOutput(out, stdout);
        CommandLine cl = commandLine();
        cl.setOut(out);
        int code;
        try {
            code = cl.execute(args);
        } catch (OutOfMemoryError e) {
            // Let go of whatever the command held before saying so, then fail cleanly: no stack trace.
            cl = null;
            long max = Runtime.getRuntime().maxMemory() >> 20;
            System.err.println("headway: ran out of memory (the Java heap is limited to " + max + " MB); the input is"
                    + " too large for this heap: give Java more (e.g. java -Xmx2g -jar headway.jar …) or split the"
                    + " input");
            return EXIT_FAILED;
        }
        out.flush();
        if (out.checkError()) {
            System.err.println("headway: writing to standard output failed (a full disk or a closed pipe?); the"
                    + " output is incomplete");
            return code == EXIT_OK ? EXIT_FAILED : code;
        }
        return code;
    }

    private static int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult parseResult) {
        PrintWriter err = cl.getErr();
        if (ex instanceof InputException) {
            err.println("headway: " + oneLine(ex.getMessage()));
            err.flush();
            return EXIT_BAD_INPUT;
        }
        if (ex instanceof java.io.UncheckedIOException || ex instanceof java.io.IOException) {
            err.println("headway: " + oneLine(ex.getMessage()));
            err.flush();
            return EXIT_BAD_INPUT;
        }
        err.println("headway: internal error (please report): " + ex);
        ex.printStackTrace(err);
        err.flush();
        return EXIT_FAILED;
    }

    private static int handleParameterException(CommandLine.ParameterException ex, String[] args) {
        PrintWriter err = ex.getCommandLine().getErr();
        err.println("headway: " + oneLine(ex.getMessage()) + " (try '"
                + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help')");
        err.flush();
        return EXIT_BAD_INPUT;
    }

    /**
     * Bad input is reported on exactly one line, so scripts can read it: line breaks become "; "
     * and other control characters a user's value carried into the message are shown escaped.
     */
    static String oneLine(String message) {
        if (message == null) {
            return "";
        }
        // A list of problems (one per indented line) reads as one line joined by semicolons.
        String joined = message.replaceAll(":\\R\\s*", ": ").replaceAll("\\R\\s*", "; ");
        StringBuilder b = new StringBuilder(joined.length());
        joined.codePoints().forEach(c -> {
            if (Character.isISOControl(c)) {
                b.append(String.format(java.util.Locale.ROOT, "\\u%04x", c));
            } else {
                b.appendCodePoint(c);
            }
        });
        return b.toString();
    }

    /** Version from the jar manifest, or "development" when run from classes. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"headway " + version()};
        }
    }

    /** The Headway version string. */
    public static String version() {
        String v = HeadwayCommand.class.getPackage().getImplementationVersion();
        return v == null ? "0.1.0-dev" : v;
    }
}
