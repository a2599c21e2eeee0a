package org.phasewright.fit;

import java.util.List;
import java.util.Optional;
import org.phasewright.model.Design;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.TermReport;
import org.phasewright.stats.Distributions;

/**
 * Everything a least-squares fit says, as an immutable value.
 *
 * @param n                 samples that entered the fit
 * @param p                 columns of the design
 * @param dof               residual degrees of freedom n - p
 * @param level             confidence level of every interval
 * @param residualSd        s = sqrt(RSS / (n - p)); NaN when n = p
 * @param rss               residual sum of squares (weighted)
 * @param rSquared          1 - RSS / TSS; TSS is centred when the constant lies in the design's
 *                          column space and uncentred otherwise (as NIST StRD does for models
 *                          without an intercept)
 * @param centredRSquared   which TSS was used
 * @param adjustedRSquared  1 - (1 - R^2) (n - k0) / (n - p), k0 = 1 if centred else 0
 * @param overallF          F statistic of all terms (but the constant, when centred)
 * @param overallDf1        its numerator degrees of freedom p - k0
 * @param overallDf2        its denominator degrees of freedom n - p
 * @param overallP          its p-value
 * @param logLikelihood     Gaussian log-likelihood at the maximum-likelihood variance RSS / n
 * @param aic               -2 logL + 2 (p + 1), counting the noise variance as a parameter
 * @param bic               -2 logL + ln(n) (p + 1)
 * @param conditionNumber   2-norm condition number of the column-scaled design
 * @param coefficients      one entry per column
 * @param covariance        s^2 (X'WX)^-1
 * @param terms             one report per term, in model order
 * @param components        the fit laid out along the record
 * @param warnings          what the user must know, in words
 * @param leverages         h_ii of the included samples in record order (NaN elsewhere), when asked for
 * @param design            the bound design, kept so the model can be evaluated at new times
 */
public record FitResult(int n, int p, int dof, double level, double residualSd, double rss, double rSquared,
                        boolean centredRSquared, double adjustedRSquared, double overallF, int overallDf1,
                        int overallDf2, double overallP, double logLikelihood, double aic, double bic,
                        double conditionNumber, List<CoefficientEstimate> coefficients, double[][] covariance,
                        List<TermReport> terms, Components components, List<FitWarning> warnings,
                        Optional<double[]> leverages, Design design) {

    public FitResult {
        coefficients = List.copyOf(coefficients);
        terms = List.copyOf(terms);
        warnings = List.copyOf(warnings);
    }

    /** The model that was fitted. */
    public ModelSpec model() {
        return design.spec();
    }

    /** The estimated coefficient vector in column order. */
    public double[] beta() {
        return coefficients.stream().mapToDouble(CoefficientEstimate::estimate).toArray();
    }

    /** The report of the term labelled {@code label}. */
    public TermReport term(String label) {
        return terms.stream().filter(t -> t.label().equals(label)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no term '" + label + "' in the fit"));
    }

    /**
     * The model at new times with confidence intervals for the mean and prediction intervals for a
     * new (unit-weight) observation. Models with covariates cannot be evaluated at bare times.
     * Cost O(m p^2) for m times.
     */
    public Prediction predict(double[] times) {
        double[] rows = design.rowsAt(times);
        return predictRows(times, rows);
    }

    private Prediction predictRows(double[] times, double[] rows) {
        int m = times.length;
        double[] b = beta();
        double tc = dof > 0 ? Distributions.studentTQuantile(0.5 + level / 2, dof) : Double.NaN;
        double s2 = residualSd * residualSd;
        double[] mean = new double[m];
        double[] ml = new double[m];
        double[] mh = new double[m];
        double[] nl = new double[m];
        double[] nh = new double[m];
        for (int i = 0; i < m; i++) {
            double mu = 0;
            double q = 0;
            for (int j = 0; j < p; j++) {
                double xj = rows[i * p + j];
                mu += xj * b[j];
                double s = 0;
                for (int k = 0; k < p; k++) {
                    s += covariance[j][k] * rows[i * p + k];
                }
                q += xj * s;
            }
            mean[i] = mu;
            double seMean = Math.sqrt(q);
            double seNew = Math.sqrt(q + s2);
            ml[i] = mu - tc * seMean;
            mh[i] = mu + tc * seMean;
            nl[i] = mu - tc * seNew;
            nh[i] = mu + tc * seNew;
        }
        return new Prediction(times.clone(), mean, ml, mh, nl, nh);
    }
}
