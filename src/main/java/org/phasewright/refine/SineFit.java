package org.phasewright.refine;

import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.series.Series;
import org.phasewright.spectrum.Peak;
import org.phasewright.spectrum.PeakOptions;
import org.phasewright.spectrum.Survey;
import org.phasewright.spectrum.SurveyOptions;
import org.phasewright.spectrum.SurveyResult;
import org.phasewright.model.ModelException;

/**
 * The four-parameter sine fit of IEEE Std 1057 (offset C and y = A cos(wt) + B sin(wt) + C with w
 * unknown): started from the strongest spectral peak ({@link Survey}: FFT with a Hann window and
 * DTFT-maximising interpolation, or Lomb-Scargle for uneven records) and refined by
 * {@link FrequencyRefiner}. Cost: the survey plus a few refinement iterations of O(n).
 */
public final class SineFit {

    private SineFit() {
    }

    public static Refinement fourParameter(Series series) {
        return fourParameter(series, RefineOptions.defaults());
    }

    public static Refinement fourParameter(Series series, RefineOptions options) {
        SurveyResult survey = Survey.of(series, SurveyOptions.defaults().withPeaks(PeakOptions.defaults().withMinSnrDb(0).withMaxPeaks(1)));
        if (survey.peaks().isEmpty()) {
            throw new ModelException("no spectral peak to start the sine fit from: the record shows no tone");
        }
        Peak top = survey.peaks().get(0);
        return FrequencyRefiner.refine(series, ModelSpec.of(new Intercept(), new Sinusoid(top.frequencyHz())), options);
    }
}
