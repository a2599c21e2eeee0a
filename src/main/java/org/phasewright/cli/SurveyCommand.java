package org.phasewright.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code phasewright survey}: what a record holds and which frequencies stand out. (In progress.) */
@Command(name = "survey", mixinStandardHelpOptions = true, description = "What a file holds.")
final class SurveyCommand implements Callable<Integer> {
    @ParentCommand
    PhasewrightCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "FILE", arity = "1")
    Path file;

    @Mixin
    InputOptions input;

    @Option(names = {"-q", "--quiet"}, description = "No progress bar.")
    boolean quiet;

    @Override
    public Integer call() {
        return 0;
    }
}
