package org.phasewright.diagnostics;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.Fitter;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.series.Series;
import org.phasewright.uncertainty.RobustFit;
import org.phasewright.uncertainty.RobustLoss;
import org.phasewright.uncertainty.RobustResult;

/**
 * The residual checks of a bare residual series (here a robust fit's) use the same default lags as
 * those of a least-squares fit and count only observed residuals.
 */
class ResidualsOfAnyFitTest {

    @Test
    void bareResidualsGetTheDefaultLagsOfTheirObservedCount() {
        Random rnd = new Random(9);
        double[] y = new double[43];
        for (int i = 0; i < y.length; i++) {
            y[i] = Math.cos(0.4 * i) + 0.1 * rnd.nextGaussian() + (i % 10 == 3 ? 5 : 0);
        }
        y[7] = Double.NaN;
        y[8] = Double.NaN;
        y[30] = Double.NaN; // 40 observed: min(10, 40 / 5) = 8 lags
        Series s = Series.uniform(0, 1, y);
        ModelSpec spec = ModelSpec.of(new Intercept(), new Sinusoid(0.4 / (2 * Math.PI)));
        FitResult fit = Fitter.fit(s, spec);
        ResidualReport viaFit = ResidualDiagnostics.of(fit);
        ResidualReport viaArray = ResidualDiagnostics.of(fit.components().residual());
        assertThat(viaArray.n()).isEqualTo(viaFit.n()).isEqualTo(40);
        assertThat(viaArray.autocorrelation()).hasSize(8).containsExactly(viaFit.autocorrelation());
        assertThat(viaArray.ljungBox()).isEqualTo(viaFit.ljungBox());
        assertThat(viaArray.jarqueBera()).isEqualTo(viaFit.jarqueBera());

        RobustResult robust = RobustFit.fit(s, spec, RobustLoss.BISQUARE);
        ResidualReport r = ResidualDiagnostics.of(robust.components().residual());
        assertThat(r.n()).isEqualTo(40);
        assertThat(r.durbinWatson()).isEqualTo(ResidualDiagnostics.durbinWatson(robust.components().residual()))
                .isNotEqualTo(viaFit.durbinWatson());
    }
}
