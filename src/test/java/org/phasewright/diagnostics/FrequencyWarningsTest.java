package org.phasewright.diagnostics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.fit.Fitter;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelException;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.refine.FrequencyRefiner;
import org.phasewright.refine.Refinement;
import org.phasewright.series.Series;

/**
 * The resolution, cycle-count and Nyquist checks as a user meets them through fits and refinement
 * (the checks live in the engine's fit.FrequencyChecks and model.FrequencyLimits; refinement reuses them).
 */
class FrequencyWarningsTest {

    // Published speeds of the principal lunar and solar semidiurnal tidal constituents, M2 = 28.9841042 and
    // S2 = 30.0 degrees per mean solar hour (the standard constituent table); their synodic (spring-neap)
    // period is 360 / (30 - 28.9841042) hours = 14.765 days.
    private static final double M2_HZ = 28.9841042 / 360 / 3600;
    private static final double S2_HZ = 30.0 / 360 / 3600;

    private static Series hourly(double days, long seed) {
        int n = (int) Math.round(days * 24);
        Random rnd = new Random(seed);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i * 3600.0;
            y[i] = 1.2 * Math.cos(2 * Math.PI * M2_HZ * t - 1) + 0.45 * Math.cos(2 * Math.PI * S2_HZ * t) + 0.05 * rnd.nextGaussian();
        }
        return Series.uniform(0, 1.0 / 3600, y);
    }

    private static final ModelSpec TIDES = ModelSpec.of(new Intercept(), new Sinusoid(M2_HZ), new Sinusoid(S2_HZ));

    @Test
    void m2AndS2AreFlaggedInTenDaysAndNamedWithTheNeededRecordLength() {
        FitResult fit = Fitter.fit(hourly(10, 1), TIDES);
        FitWarning w = fit.warnings().stream().filter(x -> x.code().equals(FitWarning.CLOSE_FREQUENCIES)).findFirst().orElseThrow();
        Matcher m = Pattern.compile("at least ([0-9.eE+]+) s").matcher(w.message());
        assertThat(m.find()).isTrue();
        double days = Double.parseDouble(m.group(1)) / 86400;
        assertThat(days).isCloseTo(14.77, within(0.01)); // the published synodic period
        assertThat(w.message()).contains("(14.77 days)");
    }

    @Test
    void m2AndS2SeparateInThirtyDays() {
        FitResult fit = Fitter.fit(hourly(30, 2), TIDES);
        assertThat(fit.warnings()).extracting(FitWarning::code).doesNotContain(FitWarning.CLOSE_FREQUENCIES);
        Refinement r = FrequencyRefiner.refine(hourly(30, 2), ModelSpec.of(new Intercept(), new Sinusoid(M2_HZ * 1.001),
                new Sinusoid(S2_HZ * 0.999)));
        assertThat(r.frequencies().get(0).frequencyHz()).isCloseTo(M2_HZ, within(4 * r.frequencies().get(0).stdErrorHz()));
        assertThat(r.frequencies().get(1).frequencyHz()).isCloseTo(S2_HZ, within(4 * r.frequencies().get(1).stdErrorHz()));
        assertThat(r.warnings()).extracting(FitWarning::code).doesNotContain(FitWarning.CLOSE_FREQUENCIES);
    }

    @Test
    void fewCyclesWarnAndNyquistIsAnErrorNamingTheAlias() {
        double[] y = new double[200];
        for (int i = 0; i < y.length; i++) {
            y[i] = Math.sin(2 * Math.PI * 0.15 * i / 10.0);
        }
        Series s = Series.uniform(0, 10, y); // T = 20 s: 0.075 Hz has 1.5 cycles
        FitResult fit = Fitter.fit(s, ModelSpec.of(new Intercept(), new Sinusoid(0.075)));
        assertThat(fit.warnings()).extracting(FitWarning::code).contains(FitWarning.FEW_CYCLES);
        assertThatThrownBy(() -> Fitter.fit(s, ModelSpec.of(new Intercept(), new Sinusoid(7.5))))
                .isInstanceOf(ModelException.class).hasMessageContaining("Nyquist").hasMessageContaining("alias at 2.5 Hz");
    }
}
