package org.phasewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;
import org.phasewright.io.read.SamplingSummary;
import org.phasewright.series.Series;
import org.phasewright.spectrum.FundamentalCandidate;
import org.phasewright.spectrum.HarmonicMatch;
import org.phasewright.spectrum.Peak;
import org.phasewright.spectrum.PeakOptions;
import org.phasewright.spectrum.SpectrumNote;
import org.phasewright.spectrum.Survey;
import org.phasewright.spectrum.SurveyOptions;
import org.phasewright.spectrum.SurveyResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;
import picocli.CommandLine.TypeConversionException;

/**
 * {@code phasewright survey}: what a record holds (channels, samples, sampling, gaps, duration,
 * resolution 1/T, Nyquist frequency), its strongest spectral peaks, and the fundamental whose
 * harmonics explain them, ending with a {@code fit} command line to start from. The spectrum work
 * is the spectrum package's {@link Survey}; this class only prints its result.
 */
@Command(name = "survey",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        usageHelpAutoWidth = true,
        description = "Shows what a record holds (channels, samples, sampling, gaps, duration, frequency resolution"
                + " 1/T, Nyquist frequency), its strongest spectral peaks with frequency and level, and a suggested"
                + " fundamental with the harmonics it explains.",
        footerHeading = "%nExamples:%n",
        footer = {
            "  phasewright survey demo-signals/pump-accelerometer.csv --unit rpm",
            "  phasewright survey demo-signals/harbour-level.csv --unit deg/h",
            "  phasewright survey recording.wav --channel 2 --peaks 10",
            "",
            "Exit codes: 0 done, 2 usage error, 3 input error, 4 numerical problem, 1 internal error."})
final class SurveyCommand implements Callable<Integer> {

    @ParentCommand
    PhasewrightCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "FILE", arity = "1", description = "Record to survey: CSV or WAV.")
    Path file;

    @Mixin
    InputOptions input;

    @Option(names = "--peaks", paramLabel = "N", defaultValue = "8",
            description = "How many of the strongest peaks to list (default ${DEFAULT-VALUE}).")
    int peaks;

    @Option(names = "--unit", paramLabel = "UNIT", converter = UnitConverter.class,
            description = "Also show frequencies in this unit: rpm, /day, /h, deg/h, khz, or period:h (periods).")
    DisplayUnit unit;

    @Option(names = {"-q", "--quiet"}, description = "No progress bar.")
    boolean quiet;

    @Override
    public Integer call() {
        if (peaks < 1) {
            throw new UsageException("--peaks must be at least 1, got " + peaks);
        }
        LoadedRecord record;
        SurveyResult result;
        try (Progress progress = Progress.start("survey", 1000, quiet)) {
            RecordSource reading = root.source().withProgress((bytes, total, samples) ->
                    progress.at(total > 0 ? 500 * bytes / total : 0));
            record = reading.load(file, input.request(List.of()).everyColumn());
            progress.at(500);
            SurveyOptions options = SurveyOptions.defaults().withPeaks(PeakOptions.defaults().withMaxPeaks(Math.max(peaks, 20)));
            result = Survey.of(record.series(), options);
            progress.at(1000);
        }
        PrintWriter out = spec.commandLine().getOut();
        describe(out, record);
        spectrum(out, record, result);
        out.flush();
        return ExitCodes.OK;
    }

    private void describe(PrintWriter out, LoadedRecord r) {
        Series s = r.series();
        out.println(r.where() + "  (" + r.format() + ")");
        TextTable t = new TextTable(2, "", "");
        List<String> others = new ArrayList<>(r.channels());
        others.remove(r.channel());
        t.row("channels", r.channels().size() + ": " + r.channel() + " (surveyed)"
                + (others.isEmpty() ? "" : ", " + String.join(", ", others)));
        t.row("samples", s.size() + (s.missingCount() == 0 ? ", none missing"
                : ", " + s.missingCount() + " missing (longest gap " + s.longestGap() + " samples)"));
        double duration = s.duration();
        SamplingSummary sampling = r.sampling();
        if (s.isUniform()) {
            double rate = s.rate().getAsDouble();
            t.row("sampling", "uniform, " + Numbers.hertz(rate) + " Hz (one sample every " + Numbers.duration(1 / rate) + ")");
        } else {
            String detail = sampling == null ? "" : ": intervals " + Numbers.duration(sampling.minStepSeconds()) + " to "
                    + Numbers.duration(sampling.maxStepSeconds()) + ", median " + Numbers.duration(sampling.medianStepSeconds())
                    + (sampling.timeGaps() > 0 ? ", " + sampling.timeGaps() + " intervals over 1.5 x the median" : "");
            t.row("sampling", "uneven" + detail);
        }
        s.origin().ifPresent(o -> t.row("time zero", o.toString() + " (first sample)"));
        t.row("duration T", Numbers.duration(duration));
        if (duration > 0) {
            t.row("resolution 1/T", Numbers.hertz(1 / duration) + " Hz" + inUnit(1 / duration));
        }
        if (s.isUniform()) {
            double ny = s.rate().getAsDouble() / 2;
            t.row("Nyquist", Numbers.hertz(ny) + " Hz" + inUnit(ny));
        } else if (sampling != null && sampling.medianStepSeconds() > 0) {
            double half = 0.5 / sampling.medianStepSeconds();
            t.row("Nyquist", "no strict limit for uneven sampling; half the median rate is " + Numbers.hertz(half) + " Hz"
                    + inUnit(half));
        }
        t.printRows(out, "  ");
        out.println();
    }

    private void spectrum(PrintWriter out, LoadedRecord r, SurveyResult result) {
        for (SpectrumNote n : result.notes()) {
            out.println("Spectrum: " + ErrorHandler.sentence(withProbability(n.message(), result)));
        }
        List<Peak> list = result.peaks().subList(0, Math.min(peaks, result.peaks().size()));
        Map<Integer, Integer> harmonicOfPeak = new TreeMap<>();
        result.fundamental().ifPresent(c -> {
            for (HarmonicMatch m : c.harmonics()) {
                harmonicOfPeak.put(m.peak().gridIndex(), m.harmonic());
            }
        });
        if (list.isEmpty()) {
            out.println();
            out.println("No spectral peak stands clearly above the noise.");
            return;
        }
        out.println();
        out.println("Strongest peaks  (amplitude in the signal's unit" + (r.unit().isEmpty() ? "" : ", " + r.unit()) + ")");
        TextTable t = unit == null
                ? new TextTable(0, "rank", "frequency (Hz)", "amplitude", "above noise (dB)", "harmonic")
                : new TextTable(0, "rank", "frequency (Hz)", unit.symbol(), "amplitude", "above noise (dB)", "harmonic");
        int rank = 1;
        for (Peak p : list) {
            Integer k = harmonicOfPeak.get(p.gridIndex());
            String h = k == null ? "-" : Integer.toString(k);
            String f = String.format(Locale.ROOT, "%.6g", p.frequencyHz());
            String amp = Numbers.sig(p.amplitude());
            String snr = String.format(Locale.ROOT, "%.1f", p.snrDb());
            if (unit == null) {
                t.row(Integer.toString(rank++), Frequency.number(Double.parseDouble(f)), amp, snr, h);
            } else {
                t.row(Integer.toString(rank++), Frequency.number(Double.parseDouble(f)), unit.show(p.frequencyHz()), amp,
                        snr, h);
            }
        }
        t.print(out, "  ");
        out.println();
        if (result.fundamental().isEmpty()) {
            out.println("No fundamental explains several of these peaks as its harmonics.");
            out.println("To fit the strongest peaks:");
            out.println("  phasewright fit " + r.where() + freqOptions(list));
            return;
        }
        FundamentalCandidate c = result.fundamental().get();
        List<Integer> ks = c.harmonicNumbers();
        out.println("Suggested fundamental " + Numbers.hertz(round(c.frequencyHz())) + " Hz" + inUnit(c.frequencyHz())
                + ": its harmonics " + join(ks) + " carry " + Numbers.percent(c.explainedPowerFraction())
                + " % of the peaks' power; a match this good arises by chance with probability at most "
                + Numbers.probability(c.chanceProbability()) + ".");
        List<Peak> leftOver = new ArrayList<>(c.unexplained());
        StringBuilder extra = new StringBuilder();
        for (FundamentalCandidate other : result.otherSeries()) {
            out.println("A second series: " + Numbers.hertz(round(other.frequencyHz())) + " Hz"
                    + inUnit(other.frequencyHz()) + " with harmonics " + join(other.harmonicNumbers()) + ".");
            for (HarmonicMatch m : other.harmonics()) {
                leftOver.removeIf(p -> p.gridIndex() == m.peak().gridIndex());
                extra.append(" --freq ").append(Frequency.number(round(m.harmonic() * other.frequencyHz())));
            }
        }
        if (!leftOver.isEmpty()) {
            List<String> fs = new ArrayList<>();
            for (Peak p : leftOver) {
                fs.add(Frequency.number(round(p.frequencyHz())) + " Hz");
            }
            out.println("Peaks no series explains: " + String.join(", ", fs) + ".");
        }
        StringBuilder cmd = new StringBuilder("  phasewright fit " + r.where() + " --fundamental "
                + Frequency.number(round(c.frequencyHz())) + " --harmonics " + c.highestHarmonic());
        List<Integer> skip = c.missingHarmonics();
        if (!skip.isEmpty()) {
            cmd.append(" --skip-harmonics ").append(join(skip).replace(" ", ""));
        }
        cmd.append(extra);
        cmd.append(freqOptions(leftOver.subList(0, Math.min(5, leftOver.size()))));
        out.println("To fit it:");
        out.println(cmd);
    }

    /**
     * The note with its false-alarm probability written from the result's field by
     * {@link Numbers#probability} ({@code <1e-16}, {@code 3.2e-09}), so a tiny probability does not
     * read as 0.00.
     */
    static String withProbability(String message, SurveyResult result) {
        if (result.topPeakFalseAlarmProbability().isEmpty()) {
            return message;
        }
        String p = Numbers.probability(result.topPeakFalseAlarmProbability().getAsDouble());
        return message.replaceAll("false-alarm probability [-+0-9.eE]+",
                java.util.regex.Matcher.quoteReplacement("false-alarm probability " + p));
    }

    private static String freqOptions(List<Peak> list) {
        StringBuilder b = new StringBuilder();
        for (Peak p : list) {
            b.append(" --freq ").append(Frequency.number(round(p.frequencyHz())));
        }
        return b.toString();
    }

    private String inUnit(double hz) {
        return unit == null ? "" : " (" + unit.show(hz) + ")";
    }

    private static double round(double hz) {
        return Double.parseDouble(String.format(Locale.ROOT, "%.6g", hz));
    }

    private static String join(List<Integer> ks) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < ks.size(); i++) {
            b.append(i == 0 ? "" : ", ").append(ks.get(i));
        }
        return b.toString();
    }

    static final class UnitConverter implements ITypeConverter<DisplayUnit> {
        @Override
        public DisplayUnit convert(String value) {
            try {
                return DisplayUnit.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }
}
