package org.phasewright.selection;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.phasewright.fit.FitOptions;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.Fitter;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.ModelException;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.TermSpec;
import org.phasewright.series.Series;
import org.phasewright.stats.Distributions;

/**
 * Model selection by nested least-squares fits.
 *
 * <p>{@link #nested}: the terms of a model are added one at a time in model order, a harmonic series
 * one kept harmonic at a time; each step is compared with the one before by the nested F-test
 * (the extra-sum-of-squares test, e.g. Draper and Smith 1998, Applied Regression Analysis, sec. 6.1)
 * and every model gets its AIC (Akaike 1974) and BIC (Schwarz 1978) from the engine.
 *
 * <p>{@link #growHarmonics}: starting from a base model, harmonics k = 1, 2, ... of a fundamental are
 * added while the F-test of the newest harmonic has p below {@code alpha}; up to {@code patience}
 * consecutive non-significant harmonics may be tried and left out (skipped) before growth stops, and
 * growth stops below the Nyquist frequency of uniform records and before a harmonic that would leave no residual
 * degrees of freedom. Each test is a sequential test at
 * level alpha, not a simultaneous one.
 *
 * <p>Cost: one fit per step (2 n p^2 flops each).
 */
public final class ModelSelection {

    private ModelSelection() {
    }

    public static SelectionTable nested(Series series, ModelSpec spec, FitOptions options) {
        List<TermSpec> done = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        List<ModelSpec> models = new ArrayList<>();
        for (TermSpec t : spec.terms()) {
            if (t instanceof HarmonicSeries h) {
                int[] kept = h.keptHarmonics();
                for (int i = 0; i < kept.length; i++) {
                    List<TermSpec> m = new ArrayList<>(done);
                    m.add(partial(h, kept, i + 1));
                    models.add(new ModelSpec(m));
                    labels.add("harmonic " + kept[i] + " of " + TermSpec.hertz(h.fundamentalHz()));
                }
            } else {
                List<TermSpec> m = new ArrayList<>(done);
                m.add(t);
                models.add(new ModelSpec(m));
                labels.add(t.label());
            }
            done.add(t);
        }
        List<FitResult> fits = new ArrayList<>();
        for (ModelSpec m : models) {
            fits.add(Fitter.fit(series, m, options));
        }
        return table(labels, models, fits);
    }

    /** The series with only the first {@code count} of its kept harmonics. */
    static HarmonicSeries partial(HarmonicSeries h, int[] kept, int count) {
        int top = kept[count - 1];
        List<Integer> skip = new ArrayList<>();
        for (int k = 1; k <= top; k++) {
            boolean in = false;
            for (int i = 0; i < count; i++) {
                in |= kept[i] == k;
            }
            if (!in) {
                skip.add(k);
            }
        }
        return new HarmonicSeries(h.fundamentalHz(), top, skip);
    }

    /** Index of the fit with the smallest criterion (the first one on ties). */
    private static int argMin(List<FitResult> fits, java.util.function.ToDoubleFunction<FitResult> criterion) {
        int best = 0;
        for (int i = 1; i < fits.size(); i++) {
            if (criterion.applyAsDouble(fits.get(i)) < criterion.applyAsDouble(fits.get(best))) {
                best = i;
            }
        }
        return best;
    }

    static SelectionTable table(List<String> labels, List<ModelSpec> models, List<FitResult> fits) {
        int bestAic = argMin(fits, FitResult::aic);
        int bestBic = argMin(fits, FitResult::bic);
        double minAic = fits.get(bestAic).aic();
        double minBic = fits.get(bestBic).bic();
        List<SelectionStep> steps = new ArrayList<>();
        for (int i = 0; i < fits.size(); i++) {
            FitResult f = fits.get(i);
            double fStat = Double.NaN;
            double pv = Double.NaN;
            int df1 = f.p();
            if (i > 0) {
                FitResult prev = fits.get(i - 1);
                df1 = f.p() - prev.p();
                if (df1 > 0 && f.dof() > 0) {
                    fStat = ((prev.rss() - f.rss()) / df1) / (f.rss() / f.dof());
                    pv = Distributions.fSurvival(Math.max(0, fStat), df1, f.dof());
                }
            }
            steps.add(new SelectionStep(labels.get(i), f.p(), f.rss(), f.dof(), fStat, df1, pv, f.aic(), f.bic(),
                    f.aic() - minAic, f.bic() - minBic));
        }
        return new SelectionTable(steps, models, bestAic, bestBic);
    }

    /**
     * Grows a harmonic series of {@code fundamentalHz} on top of {@code base}.
     *
     * @param alpha     significance level of each harmonic's F-test (e.g. 0.01)
     * @param patience  non-significant harmonics in a row that may be skipped before stopping (0 = stop at the first)
     * @param maxHarmonic highest harmonic number tried
     */
    public static HarmonicGrowthResult growHarmonics(Series series, ModelSpec base, double fundamentalHz, double alpha,
                                                     int patience, int maxHarmonic, FitOptions options) {
        if (!(alpha > 0 && alpha < 1)) {
            throw new IllegalArgumentException("significance level must lie in (0, 1), got " + alpha);
        }
        if (patience < 0 || maxHarmonic < 1) {
            throw new IllegalArgumentException("patience must be >= 0 and the harmonic limit >= 1");
        }
        double nyquist = series.isUniform() ? series.rate().getAsDouble() / 2 : Double.POSITIVE_INFINITY;
        List<String> labels = new ArrayList<>();
        List<ModelSpec> models = new ArrayList<>();
        List<FitResult> fits = new ArrayList<>();
        FitResult current = Fitter.fit(series, base, options);
        labels.add("base model");
        models.add(base);
        fits.add(current);
        List<Integer> kept = new ArrayList<>();
        int misses = 0;
        String reason = "reached the harmonic limit " + maxHarmonic;
        ModelSpec chosen = base;
        for (int k = 1; k <= maxHarmonic; k++) {
            if (k * fundamentalHz >= nyquist * (1 - 1e-12)) {
                reason = String.format(Locale.ROOT, "harmonic %d (%.6g Hz) would reach the Nyquist frequency %.6g Hz", k,
                        k * fundamentalHz, nyquist);
                break;
            }
            List<Integer> trial = new ArrayList<>(kept);
            trial.add(k);
            ModelSpec m = base.plus(series(fundamentalHz, trial));
            FitResult f;
            try {
                f = Fitter.fit(series, m, options);
            } catch (ModelException e) {
                reason = "harmonic " + k + " cannot be fitted: " + e.getMessage();
                break;
            }
            if (f.dof() <= 0) {
                reason = "harmonic " + k + " would leave no residual degrees of freedom (the model would interpolate"
                        + " the " + f.n() + " samples), so it cannot be tested";
                break;
            }
            int df1 = f.p() - current.p();
            double fStat = ((current.rss() - f.rss()) / df1) / (f.rss() / f.dof());
            double pv = Distributions.fSurvival(Math.max(0, fStat), df1, f.dof());
            labels.add("harmonic " + k + " of " + TermSpec.hertz(fundamentalHz));
            models.add(m);
            fits.add(f);
            if (pv < alpha) {
                kept.add(k);
                current = f;
                chosen = m;
                misses = 0;
            } else {
                misses++;
                if (misses > patience) {
                    reason = String.format(Locale.ROOT, "harmonic %d is not significant (p = %.3g >= %.3g)%s", k, pv, alpha,
                            patience > 0 ? " after " + patience + " skipped" : "");
                    break;
                }
            }
        }
        SelectionTable table = growthTable(labels, models, fits, base, kept);
        return new HarmonicGrowthResult(chosen, kept, table, reason);
    }

    private static HarmonicSeries series(double f0, List<Integer> harmonics) {
        int top = harmonics.get(harmonics.size() - 1);
        List<Integer> skip = new ArrayList<>();
        for (int k = 1; k <= top; k++) {
            if (!harmonics.contains(k)) {
                skip.add(k);
            }
        }
        return new HarmonicSeries(f0, top, skip);
    }

    /** Each tried harmonic against the last accepted model before it. */
    private static SelectionTable growthTable(List<String> labels, List<ModelSpec> models, List<FitResult> fits,
                                              ModelSpec base, List<Integer> kept) {
        int bestAic = argMin(fits, FitResult::aic);
        int bestBic = argMin(fits, FitResult::bic);
        double minAic = fits.get(bestAic).aic();
        double minBic = fits.get(bestBic).bic();
        List<SelectionStep> steps = new ArrayList<>();
        FitResult anchor = fits.get(0);
        steps.add(new SelectionStep(labels.get(0), anchor.p(), anchor.rss(), anchor.dof(), Double.NaN, anchor.p(), Double.NaN,
                anchor.aic(), anchor.bic(), anchor.aic() - minAic, anchor.bic() - minBic));
        for (int i = 1; i < fits.size(); i++) {
            FitResult f = fits.get(i);
            int df1 = f.p() - anchor.p();
            double fStat = ((anchor.rss() - f.rss()) / df1) / (f.rss() / f.dof());
            double pv = Distributions.fSurvival(Math.max(0, fStat), df1, f.dof());
            steps.add(new SelectionStep(labels.get(i), f.p(), f.rss(), f.dof(), fStat, df1, pv, f.aic(), f.bic(),
                    f.aic() - minAic, f.bic() - minBic));
            int k = Integer.parseInt(labels.get(i).split(" ")[1]);
            if (kept.contains(k)) {
                anchor = f;
            }
        }
        return new SelectionTable(steps, models, bestAic, bestBic);
    }
}
