package org.phasewright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.phasewright.io.write.AtomicFile;
import org.phasewright.model.ModelSpec;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/**
 * {@code phasewright fit}: fits a model of sinusoids, harmonic series, trend, steps and
 * covariates to one or more records and reports every term with its uncertainty.
 *
 * <p>One file: the readable report on standard output (or the result JSON with {@code --json}),
 * and with {@code --out DIR} the components CSV, the coefficient table CSV and result.json in DIR.
 * Several files: each is fitted with the same options; one summary row per file goes to the
 * summary CSV ({@code --summary FILE}, else {@code DIR/summary.csv} with {@code --out}, else
 * standard output unless {@code --json} is given, which prints a JSON array of the result
 * documents instead, a failed file as {source, exit_code, error}), and with {@code --out DIR}
 * each file's outputs go to {@code DIR/<file name>/}.
 * A file that fails does not stop the batch; the exit code is then the highest code met.
 */
@Command(name = "fit",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        usageHelpAutoWidth = true,
        description = "Fits sinusoids, harmonic series, a trend, steps and covariates to a record by least squares"
                + " and reports each component's amplitude and phase with standard errors, intervals, F-tests and"
                + " share of variance, then the fit summary, residual checks and warnings in words. Optionally refines"
                + " the frequencies, grows harmonics while significant, compares terms one at a time, and shows"
                + " standard errors for correlated noise or a robust fit.",
        footerHeading = "%nFrequencies:%n",
        footer = {
            "  50 or 50hz (hertz), 2.5khz, 1485rpm (revolutions per minute),",
            "  2/day, 3/h, 10/min, 1/week, 1/year (cycles per time unit),",
            "  28.9841042deg/h, 15deg/s (angular speed), 314.16rad/s,",
            "  period:12.42h, period:20ms (the time one cycle takes).",
            "",
            "Examples:",
            "  phasewright fit demo-signals/motor-drive-current.csv --fundamental 60 \\",
            "      --harmonics 7",
            "  phasewright fit demo-signals/harbour-level.csv --freq 28.9841042deg/h \\",
            "      --freq 30deg/h --trend poly:2",
            "  phasewright fit demo-signals/greenhouse-temperature.csv \\",
            "      --value-column inside_c --fundamental 1/day --harmonics 2 \\",
            "      --step 2026-04-14T06:00:00Z --covariate outside_c --json",
            "  phasewright fit logs/*.csv --fundamental 50 --harmonics 9 --out results",
            "  phasewright fit demo-signals/pump-accelerometer.csv --fundamental 1470rpm \\",
            "      --harmonics 7 --skip-harmonics 4-6 --trend poly:2 --refine --errors ar",
            "  phasewright fit demo-signals/motor-drive-current.csv --fundamental 60 \\",
            "      --harmonics auto --compare-terms",
            "  phasewright fit demo-signals/workshop-hum.wav --fundamental 50 --harmonics 7 \\",
            "      --skip-harmonics 2,4,6 --freq 440 --freq 880 --robust huber",
            "",
            "Every report names the standard errors it shows and ends with residual checks",
            "(Durbin-Watson, autocorrelation, Ljung-Box, Jarque-Bera) and the warnings.",
            "",
            "Exit codes: 0 done, 2 usage error, 3 input error, 4 numerical problem, 1 internal error."})
final class FitCommand implements Callable<Integer> {

    @ParentCommand
    PhasewrightCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "FILE", arity = "1..*", description = "Record(s) to fit: CSV or WAV.")
    List<Path> files = new ArrayList<>();

    @Mixin
    TermOptions terms;

    @Mixin
    InputOptions input;

    @Mixin
    CheckOptions checks;

    @Option(names = "--level", paramLabel = "LEVEL", converter = Converters.LevelConverter.class, defaultValue = "0.95",
            description = "Confidence level of every interval, e.g. 0.95 or 99%% (default ${DEFAULT-VALUE}).")
    double level;

    @Option(names = "--save-model", paramLabel = "FILE",
            description = "Write the fitted model's terms to this model file, for --model later.")
    Path saveModel;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Write components.csv, coefficients.csv (with the standard errors shown), result.json and,"
                    + " with --refine, frequencies.csv into DIR (created if missing).")
    Path outDir;

    @Option(names = "--json", description = "Print the result JSON on standard output and nothing else there.")
    boolean json;

    @Option(names = "--summary", paramLabel = "FILE",
            description = "With several files: write the one-row-per-file summary CSV here.")
    Path summaryFile;

    @Option(names = {"-q", "--quiet"}, description = "No progress bar.")
    boolean quiet;

    @Override
    public Integer call() throws IOException {
        terms.check();
        checks.check();
        if (terms.autoFundamental() && saveModel != null && files.size() > 1) {
            throw new UsageException("--save-model with --fundamental auto and several files would save one model per"
                    + " file; fit one file, or give the fundamental");
        }
        if (outDir != null && Files.exists(outDir) && !Files.isDirectory(outDir)) {
            throw new InputProblem("--out " + outDir + " is a file, not a directory");
        }
        RecordRequest request = input.request(terms.covariates);
        ModelSpec base = terms.modelFile == null ? new ModelSpec(List.of()) : FitOutputs.readModel(terms.modelFile);
        if (files.size() == 1) {
            return single(files.get(0), request, base);
        }
        return batch(request, base);
    }

    private int single(Path file, RecordRequest request, ModelSpec base) throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        Analysis a;
        try (Progress progress = Progress.start("fit", 1000, quiet)) {
            RecordSource reading = root.source().withProgress((bytes, total, samples) ->
                    progress.at(total > 0 ? 800 * bytes / total : 0));
            a = fitOne(reading, file, request, base);
            progress.at(950);
            if (saveModel != null) {
                FitOutputs.writeModel(saveModel, a.fit().model());
            }
            if (outDir != null) {
                FitOutputs.writeDirectory(outDir, a, terms);
            }
            progress.at(1000);
        }
        if (json) {
            FitOutputs.printJson(out, a, terms);
        } else {
            FitReport.print(out, a, terms);
            if (outDir != null) {
                out.println();
                out.println("Wrote " + FitOutputs.files(a) + " to " + outDir + ".");
            }
        }
        out.flush();
        return ExitCodes.OK;
    }

    private int batch(RecordRequest request, ModelSpec base) throws IOException {
        BatchSummary summary = new BatchSummary();
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        int worst = ExitCodes.OK;
        ModelSpec saved = null;
        Set<String> dirNames = new HashSet<>();
        ArrayNode documents = JsonNodeFactory.instance.arrayNode();
        try (Progress progress = Progress.start("fit", files.size(), quiet)) {
            for (Path file : files) {
                try {
                    Analysis a = fitOne(root.source(), file, request, base);
                    summary.ok(file.toString(), a);
                    if (json) {
                        documents.add(FitOutputs.jsonTree(a, terms));
                    }
                    if (outDir != null) {
                        FitOutputs.writeDirectory(outDir.resolve(uniqueName(file, dirNames)), a, terms);
                    }
                    if (saved == null) {
                        saved = a.fit().model();
                    }
                } catch (RuntimeException | IOException e) {
                    int code = ErrorHandler.exitCode(e);
                    if (code == ExitCodes.INTERNAL || code == ExitCodes.USAGE) {
                        throw e;
                    }
                    String message = ErrorHandler.sentence(e.getMessage());
                    summary.failed(file.toString(), code, message);
                    if (json) {
                        ObjectNode failed = documents.addObject();
                        failed.put("source", file.toString());
                        failed.put("exit_code", code);
                        failed.put("error", message);
                    }
                    err.println(spec.qualifiedName() + ": " + message);
                    worst = Math.max(worst, code);
                }
                progress.step(file.getFileName().toString());
            }
        }
        if (saveModel != null && saved != null) {
            FitOutputs.writeModel(saveModel, saved);
        }
        Path target = summaryFile != null ? summaryFile : outDir != null ? outDir.resolve("summary.csv") : null;
        if (json) {
            out.print(new ObjectMapper().writerWithDefaultPrettyPrinter().writeValueAsString(documents));
            out.println();
        }
        if (target != null) {
            if (target.toAbsolutePath().getParent() != null) {
                Files.createDirectories(target.toAbsolutePath().getParent());
            }
            AtomicFile.writeText(target, true, summary::write);
            if (!json) {
                out.println("Fitted " + files.size() + " files; summary in " + target + ".");
            }
        } else if (!json) {
            summary.write(out);
        }
        out.flush();
        return worst;
    }

    private Analysis fitOne(RecordSource source, Path file, RecordRequest request, ModelSpec base) {
        LoadedRecord record = source.load(file, request);
        TermOptions.SuggestedFundamental suggested = terms.autoFundamental()
                ? Suggestions.fundamental(record) : null;
        ModelPlan plan = terms.plan(base, record.series(), record.where(), suggested);
        return Analyst.run(record, plan, terms, checks, level);
    }

    private static String uniqueName(Path file, Set<String> used) {
        String base = file.getFileName().toString().replaceAll("\\.[^.]*$", "");
        String name = base;
        for (int i = 2; !used.add(name); i++) {
            name = base + "-" + i;
        }
        return name;
    }
}
