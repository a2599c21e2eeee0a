package org.phasewright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.NoSuchFileException;
import org.phasewright.model.ModelException;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;

/**
 * Maps every failure to one line on standard error and an exit code: usage errors (bad options,
 * bad values) give 2, file problems (unreadable or malformed input, columns that are not there,
 * outputs that cannot be written) give 3, numerical problems
 * ({@link ModelException}: rank deficiency, too few samples) give 4, anything else 1. The line
 * starts with the command's name, so a script's log shows where it failed.
 */
final class ErrorHandler implements IExecutionExceptionHandler, IParameterExceptionHandler {

    @Override
    public int handleParseException(ParameterException ex, String[] args) {
        CommandLine cmd = ex.getCommandLine();
        report(cmd.getErr(), cmd, sentence(ex.getMessage()) + " (see " + cmd.getCommandSpec().qualifiedName() + " --help)");
        return ExitCodes.USAGE;
    }

    @Override
    public int handleExecutionException(Exception ex, CommandLine cmd, ParseResult parseResult) {
        int code = exitCode(ex);
        String message = switch (code) {
            case ExitCodes.INTERNAL -> "internal error (" + ex.getClass().getSimpleName() + ": " + ex.getMessage()
                    + "); please report it with the command that caused it";
            case ExitCodes.INPUT -> inputMessage(ex);
            default -> ex.getMessage();
        };
        report(cmd.getErr(), cmd, sentence(message));
        return code;
    }

    /** The exit code a failure maps to. */
    static int exitCode(Throwable ex) {
        if (ex instanceof ParameterException || ex instanceof UsageException) {
            return ExitCodes.USAGE;
        }
        if (ex instanceof ModelException) {
            return ExitCodes.NUMERICAL;
        }
        if (ex instanceof InputProblem || ex instanceof org.phasewright.io.InputException
                || ex instanceof org.phasewright.io.OutputException || ex instanceof IOException
                || ex instanceof UncheckedIOException) {
            return ExitCodes.INPUT;
        }
        return ExitCodes.INTERNAL;
    }

    private static String inputMessage(Throwable ex) {
        Throwable e = ex instanceof UncheckedIOException u ? u.getCause() : ex;
        if (e instanceof NoSuchFileException n) {
            return "no such file: " + n.getFile();
        }
        if (e instanceof IOException && !(ex instanceof InputProblem)) {
            return "could not read or write " + e.getMessage();
        }
        return ex.getMessage();
    }

    private static void report(PrintWriter err, CommandLine cmd, String message) {
        err.println(cmd.getCommandSpec().qualifiedName() + ": " + message);
        err.flush();
    }

    /** Trims a message to one line ending in a full stop. */
    static String sentence(String message) {
        String m = message == null ? "failed" : message.strip().replaceAll("\\s*\\R\\s*", "; ");
        return m.endsWith(".") || m.endsWith(")") ? m : m + ".";
    }
}
