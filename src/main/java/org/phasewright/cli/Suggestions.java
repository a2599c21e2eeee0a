package org.phasewright.cli;

import org.phasewright.spectrum.FundamentalCandidate;
import org.phasewright.spectrum.Survey;
import org.phasewright.spectrum.SurveyResult;

/**
 * The fundamental the spectrum suggests for {@code --fundamental auto}: the spectrum package's
 * survey (periodogram, peaks, fundamental search) on the record, and the highest harmonic number
 * it matched.
 */
final class Suggestions {
    private Suggestions() {
    }

    /**
     * What to try next given the residual checks, in words with the option to use, or null: correlated
     * noise under plain standard errors points to {@code --errors ar} ({@code local-spectrum} for uneven
     * records, which {@code ar} cannot take); non-normal residuals of a least-squares fit point to
     * {@code --robust huber}.
     */
    static String forResiduals(Analysis a) {
        java.util.List<String> hints = new java.util.ArrayList<>();
        if (a.warned(org.phasewright.diagnostics.ResidualDiagnostics.AUTOCORRELATED) && a.plainErrors()) {
            String option = a.record().series().isUniform() ? "--errors ar" : "--errors local-spectrum";
            hints.add("the residuals are autocorrelated and the plain standard errors shown assume they are not; run again"
                    + " with " + option + " for standard errors that allow for correlated noise");
        }
        if (a.warned(org.phasewright.diagnostics.ResidualDiagnostics.NON_NORMAL) && a.robust().isEmpty()) {
            hints.add("the residuals are not normal; if the record holds spikes or dropouts, run again with --robust huber");
        }
        return hints.isEmpty() ? null : String.join("; ", hints);
    }

    static TermOptions.SuggestedFundamental fundamental(LoadedRecord record) {
        SurveyResult survey = Survey.of(record.series());
        FundamentalCandidate c = survey.fundamental().orElseThrow(() -> new org.phasewright.model.ModelException("the spectrum of "
                + record.where() + " shows no set of peaks that a common fundamental explains, so --fundamental auto"
                + " has nothing to offer; run phasewright survey on it and give --freq or --fundamental"));
        int highest = c.harmonicNumbers().stream().mapToInt(Integer::intValue).max().orElse(1);
        return new TermOptions.SuggestedFundamental(c.frequencyHz(), highest);
    }
}
