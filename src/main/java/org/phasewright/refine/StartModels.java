package org.phasewright.refine;

import java.util.ArrayList;
import java.util.List;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.TermSpec;
import org.phasewright.spectrum.FundamentalCandidate;
import org.phasewright.spectrum.Peak;
import org.phasewright.spectrum.SurveyResult;

/**
 * Starting models for {@link FrequencyRefiner} built from a survey: an intercept plus either the
 * strongest peaks as independent sinusoids, or the fundamental candidate as a harmonic series (up to
 * its highest explained harmonic) plus the unexplained peaks as sinusoids. O(peaks).
 */
public final class StartModels {

    private StartModels() {
    }

    /** Intercept and the {@code maxTones} strongest peaks as sinusoids. */
    public static ModelSpec fromPeaks(SurveyResult survey, int maxTones) {
        List<TermSpec> terms = new ArrayList<>();
        terms.add(new Intercept());
        for (Peak p : survey.peaks().stream().limit(maxTones).toList()) {
            terms.add(new Sinusoid(p.frequencyHz()));
        }
        if (terms.size() == 1) {
            throw new IllegalArgumentException("the survey found no peak to start from");
        }
        return new ModelSpec(terms);
    }

    /**
     * Intercept, the fundamental as a harmonic series (missing harmonics below the highest explained
     * one are skipped) and the unexplained peaks as sinusoids; falls back to {@link #fromPeaks} when
     * the survey found no fundamental.
     */
    public static ModelSpec fromFundamental(SurveyResult survey, int maxTones) {
        if (survey.fundamental().isEmpty()) {
            return fromPeaks(survey, maxTones);
        }
        FundamentalCandidate c = survey.fundamental().get();
        List<Integer> found = c.harmonicNumbers();
        int top = found.get(found.size() - 1);
        List<Integer> skip = new ArrayList<>();
        for (int k = 1; k <= top; k++) {
            if (!found.contains(k)) {
                skip.add(k);
            }
        }
        List<TermSpec> terms = new ArrayList<>();
        terms.add(new Intercept());
        terms.add(new HarmonicSeries(c.frequencyHz(), top, skip));
        for (Peak p : c.unexplained().stream().limit(Math.max(0, maxTones - found.size())).toList()) {
            terms.add(new Sinusoid(p.frequencyHz()));
        }
        return new ModelSpec(terms);
    }
}
