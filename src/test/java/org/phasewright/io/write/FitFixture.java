package org.phasewright.io.write;

import java.time.Instant;
import java.util.List;
import java.util.Random;
import org.phasewright.fit.FitOptions;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.Fitter;
import org.phasewright.model.Covariate;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.Step;
import org.phasewright.series.Series;

/**
 * An invented record for the writer tests: a 100 Hz logger on a small fan (2 s, 200 samples)
 * with a 5 Hz blade-pass line and its second harmonic, a 17 Hz line, a slow drift, a level step
 * at 1.2 s, a load channel, seeded noise and three gaps.
 */
final class FitFixture {

    static final Instant ORIGIN = Instant.parse("2026-04-02T08:15:00Z");

    private FitFixture() {
    }

    static Series series() {
        Random r = new Random(42);
        int n = 200;
        double[] v = new double[n];
        double[] load = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / 100.0;
            load[i] = 1 + 0.2 * Math.sin(2 * Math.PI * 0.3 * t) + 0.05 * r.nextGaussian();
            v[i] = 0.5 + 0.1 * t + 2 * Math.cos(2 * Math.PI * 5 * t - Math.toRadians(30))
                    + 0.3 * Math.cos(2 * Math.PI * 10 * t) + 0.4 * Math.sin(2 * Math.PI * 17 * t)
                    + (t >= 1.2 ? 0.25 : 0) + 0.8 * load[i] + 0.05 * r.nextGaussian();
        }
        v[20] = Double.NaN;
        v[21] = Double.NaN;
        v[150] = Double.NaN;
        return Series.builder().uniform(0, 100, v).covariate("load", load).origin(ORIGIN).name("vibration").unit("mm/s").build();
    }

    static ModelSpec model() {
        return ModelSpec.of(new Intercept(), new PolynomialTrend(1), new HarmonicSeries(5, 2, List.of()), new Sinusoid(17),
                new Step(1.2), new Covariate("load"));
    }

    static FitResult fit() {
        return Fitter.fit(series(), model(), FitOptions.defaults());
    }
}
