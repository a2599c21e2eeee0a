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

    static TermOptions.SuggestedFundamental fundamental(LoadedRecord record) {
        SurveyResult survey = Survey.of(record.series());
        FundamentalCandidate c = survey.fundamental().orElseThrow(() -> new org.phasewright.model.ModelException("the spectrum of "
                + record.where() + " shows no set of peaks that a common fundamental explains, so --fundamental auto"
                + " has nothing to offer; run phasewright survey on it and give --freq or --fundamental"));
        int highest = c.harmonicNumbers().stream().mapToInt(Integer::intValue).max().orElse(1);
        return new TermOptions.SuggestedFundamental(c.frequencyHz(), highest);
    }
}
