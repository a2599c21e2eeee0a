package org.phasewright.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;
import org.phasewright.model.Covariate;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.Sinusoid;
import org.phasewright.series.Series;

/**
 * Frisch-Waugh-Lovell theorem (Frisch and Waugh 1933; Lovell 1963): in a linear model, a
 * coefficient equals the slope of the response residualised on the other columns against that
 * column residualised on the other columns. The residualising regressions use Commons Math 3.
 */
class FrischWaughLovellTest {

    @Test
    void eachCoefficientIsTheSlopeOfTheResidualisedColumns() {
        Random rnd = new Random(42);
        int n = 400;
        double[] temp = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / 50.0;
            temp[i] = 20 + 3 * Math.sin(t) + rnd.nextGaussian();
            y[i] = 1 + 0.3 * temp[i] + 0.8 * Math.cos(2 * Math.PI * 0.9 * t) + 0.1 * t + 0.5 * rnd.nextGaussian();
        }
        Series s = Series.builder().uniform(0, 50, y).covariate("temperature", temp).build();
        FitResult fit = Fitter.fit(s, ModelSpec.of(new Intercept(), new PolynomialTrend(2), new Sinusoid(0.9),
                new Sinusoid(0.35), new Covariate("temperature")));
        int p = fit.p();
        double[] block = new double[n * p];
        fit.design().fillRows(s, 0, n, block);
        for (int j = 0; j < p; j++) {
            double[][] others = new double[n][p - 1];
            double[] xj = new double[n];
            for (int i = 0; i < n; i++) {
                for (int k = 0, c = 0; k < p; k++) {
                    if (k == j) {
                        xj[i] = block[i * p + k];
                    } else {
                        others[i][c++] = block[i * p + k];
                    }
                }
            }
            double[] ey = residuals(y, others);
            double[] ex = residuals(xj, others);
            double num = 0;
            double den = 0;
            for (int i = 0; i < n; i++) {
                num += ex[i] * ey[i];
                den += ex[i] * ex[i];
            }
            double slope = num / den;
            double b = fit.coefficients().get(j).estimate();
            assertThat(Math.abs(slope - b)).as("column %s", fit.coefficients().get(j).name())
                    .isLessThan(1e-10 * Math.max(1, Math.abs(b)));
        }
    }

    private static double[] residuals(double[] v, double[][] x) {
        OLSMultipleLinearRegression r = new OLSMultipleLinearRegression(0);
        r.setNoIntercept(true);
        r.newSampleData(v.clone(), x);
        return r.estimateResiduals();
    }
}
