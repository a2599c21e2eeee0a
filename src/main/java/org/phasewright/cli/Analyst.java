package org.phasewright.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.phasewright.diagnostics.ResidualDiagnostics;
import org.phasewright.diagnostics.ResidualReport;
import org.phasewright.fit.FitOptions;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.fit.Fitter;
import org.phasewright.io.write.ShownInference;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.TermSpec;
import org.phasewright.refine.FrequencyRefiner;
import org.phasewright.refine.RefineOptions;
import org.phasewright.refine.Refinement;
import org.phasewright.selection.HarmonicGrowthResult;
import org.phasewright.selection.ModelSelection;
import org.phasewright.selection.SelectionTable;
import org.phasewright.series.Series;
import org.phasewright.uncertainty.CorrectedInference;
import org.phasewright.uncertainty.CorrectionOptions;
import org.phasewright.uncertainty.RobustFit;
import org.phasewright.uncertainty.RobustResult;
import org.phasewright.uncertainty.SeCorrection;
import org.phasewright.uncertainty.SeMethod;

/**
 * Runs the steps of {@code fit} on one record, in this order, each by its core entry point:
 * <ol>
 *   <li>{@code --harmonics auto}: {@link ModelSelection#growHarmonics} grows the series of the given
 *       fundamental on the other terms (harmonics tried one by one, kept while p < the significance,
 *       up to {@code --allow-missing} absent ones in a row stepped over);</li>
 *   <li>{@code --refine}: {@link FrequencyRefiner#refine} on the (grown) model, else {@link Fitter#fit};</li>
 *   <li>the standard errors shown: {@link RobustFit#fit} for {@code --robust}, else
 *       {@link SeCorrection#apply} for {@code --errors} other than plain, else the fit's own;</li>
 *   <li>{@link ResidualDiagnostics#of} on the residuals of the fit shown: the robust fit's components
 *       under {@code --robust}, else the least-squares fit's;</li>
 *   <li>{@code --compare-terms}: {@link ModelSelection#nested} on the final model.</li>
 * </ol>
 * Nothing is computed here beyond choosing and ordering the steps.
 */
final class Analyst {

    static final String PLAIN = SeMethod.PLAIN.id();

    private Analyst() {
    }

    static Analysis run(LoadedRecord record, ModelPlan start, TermOptions terms, CheckOptions checks, double level) {
        Series series = record.series();
        FitOptions options = FitOptions.defaults().withLevel(level);
        ModelPlan plan = start;
        List<FitWarning> warnings = new ArrayList<>();

        Optional<HarmonicGrowthResult> growth = Optional.empty();
        if (terms.growHarmonics()) {
            HarmonicGrowthResult g = grow(series, plan, terms, options);
            growth = Optional.of(g);
            if (g.kept().isEmpty()) {
                warnings.add(new FitWarning("no_harmonic_kept", "no harmonic of "
                        + plan.fundamentals().get(grownSeries(plan).label()).display() + " was significant at p < "
                        + Numbers.sig(terms.growthSignificance()) + " (" + g.stopReason() + "); the model holds no"
                        + " harmonic series"));
            }
            plan = plan.withSpec(grownModel(plan, g));
        }

        FitResult fit;
        Optional<Refinement> refinement = Optional.empty();
        if (checks.refine) {
            Refinement r = FrequencyRefiner.refine(series, plan.spec(), RefineOptions.defaults().withFit(options));
            refinement = Optional.of(r);
            plan = plan.refined(r);
            fit = r.fit();
            warnings.addAll(r.warnings());
        } else {
            fit = Fitter.fit(series, plan.spec(), options);
            warnings.addAll(fit.warnings());
        }

        Optional<RobustResult> robust = Optional.empty();
        ShownInference shown;
        if (checks.robust != null) {
            RobustResult rr = RobustFit.fit(series, fit.model(), checks.robust, checks.robust.defaultTuning(), options);
            robust = Optional.of(rr);
            shown = new ShownInference("robust_" + rr.loss().id(), robustDescription(rr), rr.terms(), rr.coefficients(),
                    rr.dof());
            if (!rr.converged()) {
                warnings.add(new FitWarning("robust_not_converged", "the robust fit did not settle in " + rr.iterations()
                        + " iterations; its estimates are the last iterate"));
            }
        } else if (checks.errors != SeMethod.PLAIN) {
            CorrectedInference c = SeCorrection.apply(fit, series, CorrectionOptions.of(checks.errors));
            shown = new ShownInference(c.method().id(), c.description(), c.terms(), c.coefficients(), c.dof());
        } else if (refinement.isPresent()) {
            // the joint covariance: amplitudes' and phases' errors include the refined frequencies' own
            Refinement r = refinement.get();
            shown = new ShownInference(PLAIN, SeMethod.PLAIN.description()
                    + ", with the uncertainty of the refined frequencies included", r.jointTerms(),
                    r.jointCoefficients(), r.dof());
        } else {
            shown = ShownInference.of(fit, PLAIN, SeMethod.PLAIN.description());
        }

        Optional<ResidualReport> residuals = Optional.empty();
        String noChecks = null;
        double[] residual = robust.map(r -> r.components().residual()).orElse(fit.components().residual());
        try {
            ResidualReport rep = checks.lags == null ? ResidualDiagnostics.of(residual)
                    : ResidualDiagnostics.of(residual, checks.lags);
            residuals = Optional.of(rep);
            warnings.addAll(rep.warnings());
        } catch (IllegalArgumentException e) {
            if (checks.lags != null) {
                throw new UsageException("--lags " + checks.lags + " does not suit " + record.where() + ": " + e.getMessage());
            }
            noChecks = e.getMessage();
        }

        Optional<SelectionTable> comparison = checks.compareTerms
                ? Optional.of(ModelSelection.nested(series, fit.model(), options)) : Optional.empty();
        return new Analysis(record, plan, fit, growth, refinement, robust, shown, residuals, noChecks, comparison, warnings);
    }

    private static HarmonicGrowthResult grow(Series series, ModelPlan plan, TermOptions terms, FitOptions options) {
        HarmonicSeries h = grownSeries(plan);
        List<TermSpec> base = new ArrayList<>(plan.spec().terms());
        base.remove(h);
        return ModelSelection.growHarmonics(series, new ModelSpec(base), h.fundamentalHz(), terms.growthSignificance(),
                terms.growthAllowMissing(), terms.harmonics.count(), options);
    }

    /** The harmonic series named by {@code --fundamental}: the one whose user frequency the plan holds. */
    private static HarmonicSeries grownSeries(ModelPlan plan) {
        for (TermSpec t : plan.spec().terms()) {
            if (t instanceof HarmonicSeries h && plan.fundamentals().containsKey(h.label())) {
                return h;
            }
        }
        throw new IllegalStateException("--harmonics auto without the --fundamental series in the model");
    }

    /** The plan's model with the grown series (its kept harmonics) in the place of the fundamental alone. */
    private static ModelSpec grownModel(ModelPlan plan, HarmonicGrowthResult g) {
        HarmonicSeries h = grownSeries(plan);
        List<TermSpec> terms = new ArrayList<>(plan.spec().terms());
        int at = terms.indexOf(h);
        if (g.kept().isEmpty()) {
            terms.remove(at);
            return new ModelSpec(terms);
        }
        int top = g.kept().get(g.kept().size() - 1);
        List<Integer> skip = new ArrayList<>();
        for (int k = 1; k <= top; k++) {
            if (!g.kept().contains(k)) {
                skip.add(k);
            }
        }
        terms.set(at, new HarmonicSeries(h.fundamentalHz(), top, skip));
        return new ModelSpec(terms);
    }

    private static String robustDescription(RobustResult r) {
        return String.format(Locale.ROOT, "robust M-estimates (%s loss, tuning %s robust standard deviations) with Huber's"
                + " sandwich standard errors", r.loss().id(), Numbers.sig(r.tuning()));
    }
}
