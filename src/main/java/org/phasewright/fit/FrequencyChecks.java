package org.phasewright.fit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.phasewright.model.Design;
import org.phasewright.model.Term;

/**
 * Warnings about what a record can resolve, from the frequencies in the model and the record
 * length T:
 * <ul>
 *   <li>two frequencies closer than 1/T (the Rayleigh criterion, common practice in spectral
 *       analysis) are hard to separate: their estimates trade against each other and their
 *       standard errors grow;</li>
 *   <li>a frequency with fewer than 2 cycles in the record is barely distinguishable from a trend.</li>
 * </ul>
 * Frequencies at or above Nyquist are rejected earlier, when the terms are bound.
 */
public final class FrequencyChecks {
    private FrequencyChecks() {
    }

    public static List<FitWarning> check(Design design, double recordLength) {
        List<FitWarning> out = new ArrayList<>();
        if (!(recordLength > 0)) {
            return out;
        }
        List<double[]> tagged = new ArrayList<>();
        List<String> owners = new ArrayList<>();
        for (Term t : design.terms()) {
            for (double f : t.frequencies()) {
                tagged.add(new double[] {f, owners.size()});
                owners.add(t.label() + (t.frequencies().length > 1 ? " (" + fmt(f) + " Hz)" : ""));
            }
        }
        double[][] fs = tagged.toArray(new double[0][]);
        Arrays.sort(fs, (a, b) -> Double.compare(a[0], b[0]));
        double resolution = 1 / recordLength;
        for (int i = 1; i < fs.length; i++) {
            double gap = fs[i][0] - fs[i - 1][0];
            if (gap < resolution) {
                out.add(new FitWarning(FitWarning.CLOSE_FREQUENCIES, "the " + owners.get((int) fs[i - 1][1]) + " and the "
                        + owners.get((int) fs[i][1]) + " are " + fmt(gap) + " Hz apart, closer than the record's resolution 1/T = "
                        + fmt(resolution) + " Hz; a record of at least " + fmt(1 / gap) + " s" + readable(1 / gap)
                        + " is needed to separate them,"
                        + " so their amplitudes trade against each other"));
            }
        }
        for (double[] f : fs) {
            double cycles = f[0] * recordLength;
            if (cycles < 2) {
                out.add(new FitWarning(FitWarning.FEW_CYCLES, "the " + owners.get((int) f[1]) + " completes only "
                        + fmt(cycles) + " cycles in the record; with fewer than 2 it is hard to tell from a trend"));
            }
        }
        return out;
    }

    /** " (2.5 h)" or " (14.77 days)" for long durations, empty below an hour. */
    static String readable(double seconds) {
        if (seconds >= 2 * 86400) {
            return String.format(Locale.ROOT, " (%.2f days)", seconds / 86400);
        }
        if (seconds >= 3600) {
            return String.format(Locale.ROOT, " (%.2f h)", seconds / 3600);
        }
        return "";
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
