package org.headway.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import picocli.CommandLine;

/** Runs the command line with captured standard output and error. */
record CliRun(int exitCode, String out, String err) {
    static CliRun of(String... args) {
        CommandLine cl = HeadwayCommand.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }
}
