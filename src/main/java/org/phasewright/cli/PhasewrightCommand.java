package org.phasewright.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.IVersionProvider;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The {@code phasewright} command: a tree of subcommands, one class each ({@link SurveyCommand},
 * {@link FitCommand}). Later commands (track, strip, verify, forecast, bench, view) are added to
 * {@code subcommands} and reuse the shared option groups ({@link InputOptions}) and the error
 * handling here. Exit codes: see {@link ExitCodes}.
 */
@Command(name = "phasewright",
        mixinStandardHelpOptions = true,
        versionProvider = PhasewrightCommand.Version.class,
        sortOptions = false,
        usageHelpAutoWidth = true,
        description = "Decomposes a recorded signal by least squares on harmonic bases and reports every"
                + " component's amplitude and phase with standard errors, intervals and tests.",
        subcommands = {SurveyCommand.class, FitCommand.class, CommandLine.HelpCommand.class},
        footerHeading = "%nExamples:%n",
        footer = {
            "  phasewright survey demo-signals/pump-accelerometer.csv",
            "  phasewright fit demo-signals/motor-drive-current.csv --fundamental 60 \\",
            "      --harmonics 7",
            "",
            "Exit codes: 0 done, 2 usage error, 3 input error (file or format),",
            "4 numerical problem (rank-deficient design, too few samples), 1 internal error."})
public final class PhasewrightCommand implements Runnable {

    @Spec
    CommandSpec spec;

    private final RecordSource source;

    /** The command as the application runs it, reading files with the io package's readers. */
    public PhasewrightCommand() {
        this(RecordSource.files());
    }

    PhasewrightCommand(RecordSource source) {
        this.source = source;
    }

    RecordSource source() {
        return source;
    }

    @Override
    public void run() {
        throw new ParameterException(spec.commandLine(), "name a command: survey (what is in a file) or fit"
                + " (fit a model)");
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        int code = execute(args, out, err);
        out.flush();
        err.flush();
        System.exit(code);
    }

    /** Runs the command line {@code args} with the given streams; returns the exit code. */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        return commandLine(new PhasewrightCommand(), out, err).execute(args);
    }

    static CommandLine commandLine(PhasewrightCommand root, PrintWriter out, PrintWriter err) {
        ErrorHandler handler = new ErrorHandler();
        CommandLine cmd = new CommandLine(root);
        cmd.setOut(out);
        cmd.setErr(err);
        cmd.setExecutionExceptionHandler(handler);
        cmd.setParameterExceptionHandler(handler);
        cmd.setCaseInsensitiveEnumValuesAllowed(true);
        return cmd;
    }

    /** The version Maven recorded at build time (see the io package's SoftwareVersion). */
    static final class Version implements IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"phasewright " + org.phasewright.io.SoftwareVersion.get()};
        }
    }
}
