package org.phasewright.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.phasewright.cli.Converters.FundamentalChoice;
import org.phasewright.cli.Converters.SkipList;
import org.phasewright.cli.Converters.TrendOption;
import org.phasewright.model.Covariate;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.Step;
import org.phasewright.model.TermSpec;
import org.phasewright.series.Series;
import picocli.CommandLine.Option;

/**
 * The options that name a model's terms. Mixed into every command that fits a model ({@code fit}
 * now; later commands that clean, check or extend a fit take the same options), so a model is
 * written the same way everywhere. {@link #plan} turns them, with an optional model file, into a
 * {@link ModelPlan} for one record.
 */
final class TermOptions {

    @Option(names = "--freq", paramLabel = "FREQ", converter = Converters.FrequencyConverter.class,
            description = "A sinusoid at this frequency (repeatable): 50, 50hz, 1485rpm, 2/day, 28.98deg/h,"
                    + " period:12.42h.")
    List<Frequency> frequencies = new ArrayList<>();

    @Option(names = "--fundamental", paramLabel = "FREQ|auto", converter = Converters.FundamentalConverter.class,
            description = "A harmonic series on this fundamental (same units as --freq), or auto to take the"
                    + " fundamental the spectrum suggests.")
    FundamentalChoice fundamental;

    @Option(names = "--harmonics", paramLabel = "K|auto", converter = Converters.HarmonicCountConverter.class,
            description = "Harmonics 1..K of the fundamental (default 1, just the fundamental; with --fundamental auto,"
                    + " the harmonics the spectrum search explains); auto keeps adding harmonics while each new one"
                    + " is significant (auto:K tries up to K).")
    HarmonicCount harmonics;

    @Option(names = "--significance", paramLabel = "ALPHA", converter = Converters.ProbabilityConverter.class,
            description = "With --harmonics auto: a harmonic is kept when its F-test p-value is below ALPHA"
                    + " (default 0.01).")
    Double significance;

    @Option(names = "--allow-missing", paramLabel = "N",
            description = "With --harmonics auto: how many absent harmonics in a row are stepped over before"
                    + " growth stops (default 3, so 1, 5 and 7 are found with 2, 3, 4 and 6 absent).")
    Integer allowMissing;

    @Option(names = "--skip-harmonics", paramLabel = "LIST", converter = Converters.SkipConverter.class,
            description = "Harmonic numbers to leave out, e.g. 2,4,6 or 4-6.")
    SkipList skip;

    @Option(names = "--trend", paramLabel = "SHAPE", converter = Converters.TrendConverter.class,
            description = "Slow trend: none (default), poly:D (polynomial of degree D), spline:K (cubic spline,"
                    + " K interior knots; add :quantile and/or :natural).")
    TrendOption trend;

    @Option(names = "--step", paramLabel = "TIME", converter = Converters.TimePointConverter.class,
            description = "A level step at this time (repeatable): seconds from the start (600), with a unit"
                    + " (90min, 8.25d) or an ISO date-time (2026-04-14T06:00:00Z).")
    List<TimePoint> steps = new ArrayList<>();

    @Option(names = "--covariate", paramLabel = "COLUMN",
            description = "Another column of the file as a regression term (repeatable).")
    List<String> covariates = new ArrayList<>();

    @Option(names = "--no-intercept", description = "Leave out the constant level.")
    boolean noIntercept;

    @Option(names = "--model", paramLabel = "FILE",
            description = "Start from the terms in this model file (written by --save-model); the options"
                    + " above add to them.")
    Path modelFile;

    /** True when the options name at least one term beyond the constant. */
    boolean namesTerms() {
        return !frequencies.isEmpty() || fundamental != null || (trend != null && trend.term().isPresent())
                || !steps.isEmpty() || !covariates.isEmpty() || modelFile != null;
    }

    boolean autoFundamental() {
        return fundamental != null && fundamental.isAuto();
    }

    /** True for {@code --harmonics auto}: the harmonic series is grown while significant. */
    boolean growHarmonics() {
        return harmonics != null && harmonics.grow();
    }

    /** The p-value below which a grown harmonic is kept. */
    double growthSignificance() {
        return significance == null ? 0.01 : significance;
    }

    /** Absent harmonics in a row that growth steps over. */
    int growthAllowMissing() {
        return allowMissing == null ? 3 : allowMissing;
    }

    /** Checks combinations that parsing alone cannot. */
    void check() {
        if (fundamental == null && harmonics != null) {
            throw new UsageException("--harmonics needs --fundamental");
        }
        if (fundamental == null && skip != null) {
            throw new UsageException("--skip-harmonics needs --fundamental");
        }
        if (growHarmonics() && skip != null) {
            throw new UsageException("--skip-harmonics does not go with --harmonics auto, which itself leaves out the"
                    + " harmonics that are not significant");
        }
        if (!growHarmonics() && significance != null) {
            throw new UsageException("--significance needs --harmonics auto");
        }
        if (!growHarmonics() && allowMissing != null) {
            throw new UsageException("--allow-missing needs --harmonics auto");
        }
        if (allowMissing != null && allowMissing < 0) {
            throw new UsageException("--allow-missing must be 0 or more, got " + allowMissing);
        }
        if (!namesTerms()) {
            throw new UsageException("name the terms to fit: --freq, --fundamental, --trend, --step, --covariate"
                    + " or --model (run phasewright survey FILE to see which frequencies the file holds)");
        }
    }

    /**
     * The model for one record: the model file's terms (if any), then intercept, trend, harmonic
     * series, sinusoids, steps and covariates from the options.
     *
     * @param base      the terms read from --model, or an empty model
     * @param series    the record, for placing date-time steps and for the auto fundamental
     * @param where     the file name, for messages
     * @param suggested the fundamental and harmonic count suggested for this record when
     *                  {@code --fundamental auto} was given, else null
     */
    ModelPlan plan(ModelSpec base, Series series, String where, SuggestedFundamental suggested) {
        List<TermSpec> terms = new ArrayList<>(base.terms());
        ModelPlan.Builder plan = ModelPlan.builder();
        try {
            if (!noIntercept && base.terms().isEmpty()) {
                terms.add(new Intercept());
            }
            if (noIntercept) {
                terms.removeIf(t -> t instanceof Intercept);
            }
            if (trend != null) {
                trend.term().ifPresent(terms::add);
            }
            if (fundamental != null) {
                Frequency f0 = fundamental.isAuto() ? Frequency.hertz(suggested.fundamentalHz()) : fundamental.frequency();
                // --harmonics auto starts from the fundamental alone; the fit command grows the series
                int k = growHarmonics() ? 1 : harmonics != null ? harmonics.count()
                        : fundamental.isAuto() ? suggested.harmonics() : 1;
                List<Integer> skipped = skip == null ? List.of() : skip.harmonics();
                for (int s : skipped) {
                    if (s > k) {
                        throw new UsageException("--skip-harmonics names harmonic " + s + " but --harmonics is " + k);
                    }
                }
                if (skipped.size() >= k) {
                    throw new UsageException("--skip-harmonics leaves out every harmonic of 1.." + k);
                }
                HarmonicSeries h = new HarmonicSeries(f0.hertz(), k, skipped);
                terms.add(h);
                plan.fundamental(h.label(), f0);
            }
            for (Frequency f : frequencies) {
                Sinusoid s = new Sinusoid(f.hertz());
                terms.add(s);
                plan.frequency(s.label(), f);
            }
            for (TimePoint t : steps) {
                double at = t.secondsIn(series, where);
                if (series.size() > 0 && (at <= series.startTime() || at > series.endTime())) {
                    throw new InputProblem("the step at " + t.text() + " lies outside the record " + where
                            + " (" + Frequency.number(series.startTime()) + " s to " + Frequency.number(series.endTime())
                            + " s from its time zero)");
                }
                Step step = new Step(at);
                terms.add(step);
                plan.step(step.label(), t.text());
            }
            for (String c : covariates) {
                if (!series.hasCovariate(c)) {
                    throw new InputProblem(where + " has no column '" + c + "' to use as a covariate");
                }
                terms.add(new Covariate(c));
            }
            return plan.spec(new ModelSpec(terms)).build();
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }

    /** A fundamental found in the record's spectrum, for {@code --fundamental auto}. */
    record SuggestedFundamental(double fundamentalHz, int harmonics) {
    }
}
