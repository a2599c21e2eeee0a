package org.phasewright.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;

/** Runs the command line in-process with captured standard output and error. */
record CliRun(int exitCode, String out, String err) {

    static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = PhasewrightCommand.execute(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new CliRun(code, out.toString(), err.toString());
    }

    static CliRun of(List<String> args) {
        return of(args.toArray(String[]::new));
    }
}
