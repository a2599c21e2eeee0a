package org.phasewright.io.write;

import static org.phasewright.io.write.JsonCells.num;
import static org.phasewright.io.write.JsonCells.pair;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.phasewright.diagnostics.ResidualReport;
import org.phasewright.fit.CoefficientEstimate;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.io.ModelFile;
import org.phasewright.io.SoftwareVersion;
import org.phasewright.io.read.CsvSummary;
import org.phasewright.io.read.SamplingSummary;
import org.phasewright.io.read.WavInfo;
import org.phasewright.model.GroupReport;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.ScalarReport;
import org.phasewright.model.SinusoidReport;
import org.phasewright.model.TermReport;
import org.phasewright.refine.Refinement;
import org.phasewright.selection.HarmonicGrowthResult;
import org.phasewright.selection.SelectionTable;
import org.phasewright.series.Series;
import org.phasewright.uncertainty.RobustResult;

/**
 * The result of a fit as one JSON document (Jackson tree, two-space indentation), for scripts
 * and reports. Every number is a field of the {@link FitResult} or of the input
 * {@link Series}; nothing is recomputed. Non-finite numbers (e.g. a standard error of an exact
 * fit) are written as {@code null}, since JSON has no NaN.
 *
 * <p>Top-level fields: {@code format}, {@code format_version}, {@code software} {name, version},
 * {@code data} (source, name, unit, n_samples, n_observed, n_missing, longest_gap, sampling
 * "uniform"/"uneven", rate_hz, start_s, end_s, duration_s, time_origin, time_offset_s, covariates, and when known sampling_check and wav),
 * {@code model} {terms in the model-file layout}, {@code level}, {@code n}, {@code p},
 * {@code dof}, {@code residual_sd}, {@code rss}, {@code r_squared}, {@code r_squared_centred},
 * {@code adjusted_r_squared}, {@code overall_f}, {@code overall_df1}, {@code overall_df2},
 * {@code overall_p}, {@code log_likelihood}, {@code aic}, {@code bic},
 * {@code condition_number}, {@code terms}, {@code coefficients}, {@code warnings} (messages)
 * and {@code warning_codes}. When {@link #shown(ShownInference)} is given, {@code terms} and
 * {@code coefficients} carry its standard errors and a {@code standard_errors} object {method,
 * description, dof} says which they are; {@link #warnings(List)} replaces the fit's warnings by a
 * longer list (the fit's own plus those of later checks).
 *
 * <p>The checks beyond the plain fit add, in this order after {@code warning_codes}:
 * {@link #refinement} {@code refined_frequencies} [{name, kind, start_hz, frequency_hz,
 * frequency_se_hz, frequency_ci_hz, in_unit}] and {@code refinement} {iterations, converged, rss,
 * dof}; {@link #robust} {@code robust_fit}; {@link #diagnostics} {@code diagnostics} {residuals, n,
 * lags, durbin_watson, autocorrelation, white_noise_band, ljung_box, jarque_bera, warning_codes,
 * suggestion}; {@link #harmonicGrowth} {@code harmonic_growth} {fundamental_hz, significance,
 * allow_missing, limit, kept, stop_reason, steps, best_by_aic, best_by_bic}; {@link #modelComparison}
 * {@code model_comparison} {steps, best_by_aic, best_by_bic}. A desktop view and the command line
 * build the same document from the same core results.
 *
 * <p>Each entry of {@code terms} has {@code name}, {@code kind}, {@code frequency_hz} (sinusoids
 * and harmonic series: the fundamental), {@code amplitude}, {@code amplitude_se},
 * {@code amplitude_ci} [low, high], {@code phase_deg}, {@code phase_se_deg}, {@code f_stat},
 * {@code p_value}, {@code variance_share} (null where a field does not apply to the kind), plus
 * {@code df1}, {@code harmonic}, {@code cos_coefficient}, {@code sin_coefficient} for
 * sinusoids; {@code harmonics} (a list of sinusoid entries) for harmonic series;
 * {@code columns} for trends; {@code estimate}, {@code std_error}, {@code ci}, {@code t} for
 * intercept, step and covariate terms (whose test is the t statistic, so {@code f_stat} is null).
 */
public final class ResultJson {

    public static final String FORMAT = "phasewright-result";
    public static final int FORMAT_VERSION = 1;
    /** {@code diagnostics.residuals} of checks on the least-squares residuals. */
    public static final String LEAST_SQUARES_RESIDUALS = "least_squares";
    /** {@code diagnostics.residuals} of checks on the robust fit's residuals. */
    public static final String ROBUST_RESIDUALS = "robust";

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private final FitResult fit;
    private final Series data;
    private String source;
    private double timeOffsetSeconds;
    private SamplingSummary sampling;
    private WavInfo wav;
    private ShownInference shown;
    private List<FitWarning> warnings;
    private Refinement refinement;
    private Map<String, ? extends FrequencyInUnit> refinedUnits = Map.of();
    private RobustResult robust;
    private ResidualReport diagnostics;
    private String diagnosticsOf;
    private String suggestion;
    private String diagnosticsSkipped;
    private HarmonicGrowthResult growth;
    private double growthSignificance;
    private int growthAllowMissing;
    private int growthLimit;
    private SelectionTable comparison;

    private ResultJson(FitResult fit, Series data) {
        this.fit = Objects.requireNonNull(fit, "fit");
        this.data = Objects.requireNonNull(data, "data");
    }

    /** A document for {@code fit} of the series {@code data}. */
    public static ResultJson of(FitResult fit, Series data) {
        return new ResultJson(fit, data);
    }

    /** Names the input file (or any description of the source) in the data summary. */
    public ResultJson source(String description) {
        this.source = description;
        return this;
    }

    /** Seconds the reader subtracted from numeric times (see {@code CsvSummary.timeOffsetSeconds}). */
    public ResultJson timeOffsetSeconds(double seconds) {
        this.timeOffsetSeconds = seconds;
        return this;
    }

    /** Adds the reader's sampling check (step statistics, jitter, time gaps) to the data summary. */
    public ResultJson sampling(SamplingSummary check) {
        this.sampling = check;
        return this;
    }

    /** Takes source, time offset and sampling check from a CSV reader's summary. */
    public ResultJson readBy(CsvSummary summary) {
        return source(summary.file().toString()).timeOffsetSeconds(summary.timeOffsetSeconds()).sampling(summary.sampling());
    }

    /** Takes the source and the sample format from a WAV reader's header information. */
    public ResultJson readBy(WavInfo info) {
        this.wav = info;
        return source(info.file().toString());
    }

    /**
     * Writes these terms and coefficients instead of the fit's own (plain least-squares) ones, and
     * names their standard errors in a {@code standard_errors} object.
     */
    public ResultJson shown(ShownInference inference) {
        this.shown = Objects.requireNonNull(inference, "inference");
        return this;
    }

    /** Writes these warnings instead of the fit's own; the list should include the fit's. */
    public ResultJson warnings(List<FitWarning> all) {
        this.warnings = List.copyOf(all);
        return this;
    }

    /** Adds {@code refined_frequencies} and {@code refinement}, in hertz only. */
    public ResultJson refinement(Refinement r) {
        return refinement(r, Map.of());
    }

    /**
     * Adds {@code refined_frequencies} and {@code refinement}; each refined frequency whose term label is a
     * key of {@code units} also gets {@code in_unit} with its frequency, standard error and interval in that
     * unit (the interval's ends in increasing order).
     */
    public ResultJson refinement(Refinement r, Map<String, ? extends FrequencyInUnit> units) {
        this.refinement = Objects.requireNonNull(r, "refinement");
        this.refinedUnits = Map.copyOf(units);
        return this;
    }

    /** Adds {@code robust_fit} with the robust fit's loss, scale, weights summary and convergence. */
    public ResultJson robust(RobustResult r) {
        this.robust = Objects.requireNonNull(r, "robust result");
        return this;
    }

    /**
     * Adds {@code diagnostics}: the residual checks of the residuals named by {@code residuals}
     * ({@link #LEAST_SQUARES_RESIDUALS} or {@link #ROBUST_RESIDUALS}) and a suggestion in words of what
     * to try next (or null).
     */
    public ResultJson diagnostics(ResidualReport report, String residuals, String suggestion) {
        this.diagnostics = Objects.requireNonNull(report, "residual report");
        this.diagnosticsOf = Objects.requireNonNull(residuals, "residuals");
        this.suggestion = suggestion;
        this.diagnosticsSkipped = null;
        return this;
    }

    /** Adds {@code diagnostics} {skipped} saying why there are no residual checks. */
    public ResultJson diagnosticsSkipped(String reason) {
        this.diagnosticsSkipped = Objects.requireNonNull(reason, "reason");
        this.diagnostics = null;
        return this;
    }

    /**
     * Adds {@code harmonic_growth}: the growth's table, kept harmonics and stop reason, with the settings
     * it ran with (significance level, absent harmonics stepped over, highest harmonic allowed).
     */
    public ResultJson harmonicGrowth(HarmonicGrowthResult g, double significance, int allowMissing, int limit) {
        this.growth = Objects.requireNonNull(g, "growth");
        this.growthSignificance = significance;
        this.growthAllowMissing = allowMissing;
        this.growthLimit = limit;
        return this;
    }

    /** Adds {@code model_comparison}: the term-by-term table with AIC and BIC and the best by each. */
    public ResultJson modelComparison(SelectionTable table) {
        this.comparison = Objects.requireNonNull(table, "table");
        return this;
    }

    /** The document as text, ending in a newline (what {@code --json} prints). */
    public String toJsonString() {
        try {
            return MAPPER.writeValueAsString(tree()) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot happen for a tree of plain nodes", e);
        }
    }

    /** Writes the document atomically. */
    public void write(Path file, boolean replace) {
        String text = toJsonString();
        AtomicFile.writeText(file, replace, w -> w.write(text));
    }

    /** The document as a Jackson tree. */
    public ObjectNode tree() {
        ObjectNode root = NODES.objectNode();
        root.put("format", FORMAT);
        root.put("format_version", FORMAT_VERSION);
        ObjectNode sw = root.putObject("software");
        sw.put("name", "Phasewright");
        sw.put("version", SoftwareVersion.get());
        root.set("data", dataNode());
        root.putObject("model").set("terms", ModelFile.termsNode(fit.model()));
        num(root, "level", fit.level());
        root.put("n", fit.n());
        root.put("p", fit.p());
        root.put("dof", fit.dof());
        num(root, "residual_sd", fit.residualSd());
        num(root, "rss", fit.rss());
        num(root, "r_squared", fit.rSquared());
        root.put("r_squared_centred", fit.centredRSquared());
        num(root, "adjusted_r_squared", fit.adjustedRSquared());
        num(root, "overall_f", fit.overallF());
        root.put("overall_df1", fit.overallDf1());
        root.put("overall_df2", fit.overallDf2());
        num(root, "overall_p", fit.overallP());
        num(root, "log_likelihood", fit.logLikelihood());
        num(root, "aic", fit.aic());
        num(root, "bic", fit.bic());
        num(root, "condition_number", fit.conditionNumber());
        if (shown != null) {
            ObjectNode se = root.putObject("standard_errors");
            se.put("method", shown.method());
            se.put("description", shown.description());
            se.put("dof", shown.dof());
        }
        ArrayNode terms = root.putArray("terms");
        for (TermReport t : shown != null ? shown.terms() : fit.terms()) {
            terms.add(termNode(t));
        }
        ArrayNode coefs = root.putArray("coefficients");
        for (CoefficientEstimate c : shown != null ? shown.coefficients() : fit.coefficients()) {
            ObjectNode n = coefs.addObject();
            n.put("name", c.name());
            n.put("term", c.term());
            num(n, "estimate", c.estimate());
            num(n, "std_error", c.stdError());
            num(n, "t", c.t());
            num(n, "p_value", c.pValue());
            pair(n, "ci", c.ciLow(), c.ciHigh());
        }
        ArrayNode warnings = root.putArray("warnings");
        ArrayNode codes = root.putArray("warning_codes");
        for (FitWarning w : this.warnings != null ? this.warnings : fit.warnings()) {
            warnings.add(w.message());
            codes.add(w.code());
        }
        if (refinement != null) {
            CheckSections.refinement(root, refinement, refinedUnits);
        }
        if (robust != null) {
            CheckSections.robust(root, robust);
        }
        if (diagnostics != null) {
            CheckSections.diagnostics(root, diagnostics, diagnosticsOf, suggestion);
        } else if (diagnosticsSkipped != null) {
            CheckSections.diagnosticsSkipped(root, diagnosticsSkipped);
        }
        if (growth != null) {
            CheckSections.growth(root, growth, growthSignificance, growthAllowMissing, growthLimit);
        }
        if (comparison != null) {
            CheckSections.comparison(root, comparison);
        }
        return root;
    }

    private ObjectNode dataNode() {
        ObjectNode d = NODES.objectNode();
        if (source == null) {
            d.putNull("source");
        } else {
            d.put("source", source);
        }
        d.put("name", data.name());
        d.put("unit", data.unit());
        d.put("n_samples", data.size());
        d.put("n_observed", data.observedCount());
        d.put("n_missing", data.missingCount());
        d.put("longest_gap", data.longestGap());
        d.put("sampling", data.isUniform() ? "uniform" : "uneven");
        if (data.isUniform()) {
            num(d, "rate_hz", data.rate().getAsDouble());
        } else {
            d.putNull("rate_hz");
        }
        num(d, "start_s", data.startTime());
        num(d, "end_s", data.endTime());
        num(d, "duration_s", data.duration());
        if (data.origin().isPresent()) {
            d.put("time_origin", data.origin().get().toString());
        } else {
            d.putNull("time_origin");
        }
        num(d, "time_offset_s", timeOffsetSeconds);
        d.putArray("covariates").addAll(data.covariateNames().stream().map(NODES::textNode).toList());
        if (sampling != null) {
            ObjectNode c = d.putObject("sampling_check");
            num(c, "tolerance_steps", sampling.tolerance());
            num(c, "mean_step_s", sampling.meanStepSeconds());
            num(c, "median_step_s", sampling.medianStepSeconds());
            num(c, "min_step_s", sampling.minStepSeconds());
            num(c, "max_step_s", sampling.maxStepSeconds());
            num(c, "jitter_rms_s", sampling.jitterRmsSeconds());
            num(c, "jitter_max_s", sampling.jitterMaxSeconds());
            c.put("time_gaps", sampling.timeGaps());
        }
        if (wav != null) {
            ObjectNode w = d.putObject("wav");
            w.put("encoding", wav.encoding().name().toLowerCase(java.util.Locale.ROOT));
            w.put("bits_per_sample", wav.bitsPerSample());
            w.put("channels", wav.channels());
            w.put("selection", wav.selection());
            num(w, "sample_rate_hz", wav.sampleRateHz());
        }
        return d;
    }

    private static ObjectNode termNode(TermReport t) {
        ObjectNode n = NODES.objectNode();
        n.put("name", t.label());
        n.put("kind", t.kind());
        if (t instanceof SinusoidReport s) {
            sinusoid(n, s);
        } else if (t instanceof HarmonicSeriesReport h) {
            num(n, "frequency_hz", h.fundamentalHz());
            notApplicableAmplitude(n);
            num(n, "f_stat", h.fStat());
            n.put("df1", h.df1());
            num(n, "p_value", h.pValue());
            num(n, "variance_share", h.varianceShare());
            ArrayNode parts = n.putArray("harmonics");
            for (SinusoidReport s : h.harmonics()) {
                ObjectNode p = parts.addObject();
                p.put("name", s.label());
                p.put("kind", s.kind());
                sinusoid(p, s);
            }
        } else if (t instanceof GroupReport g) {
            notApplicableAmplitude(n);
            num(n, "f_stat", g.fStat());
            n.put("df1", g.df1());
            num(n, "p_value", g.pValue());
            num(n, "variance_share", g.varianceShare());
            n.put("columns", g.columns());
        } else if (t instanceof ScalarReport s) {
            notApplicableAmplitude(n);
            num(n, "f_stat", s.fStat());
            n.put("df1", 1);
            num(n, "p_value", s.pValue());
            num(n, "variance_share", s.varianceShare());
            num(n, "estimate", s.estimate());
            num(n, "std_error", s.stdError());
            pair(n, "ci", s.ciLow(), s.ciHigh());
            num(n, "t", s.t());
        }
        return n;
    }

    private static void sinusoid(ObjectNode n, SinusoidReport s) {
        num(n, "frequency_hz", s.frequencyHz());
        if (s.harmonic() > 0) {
            n.put("harmonic", s.harmonic());
        }
        num(n, "amplitude", s.amplitude());
        num(n, "amplitude_se", s.amplitudeSe());
        pair(n, "amplitude_ci", s.amplitudeCiLow(), s.amplitudeCiHigh());
        num(n, "phase_deg", s.phaseDeg());
        num(n, "phase_se_deg", s.phaseSeDeg());
        num(n, "f_stat", s.fStat());
        n.put("df1", 2);
        num(n, "p_value", s.pValue());
        num(n, "variance_share", s.varianceShare());
        num(n, "cos_coefficient", s.cosCoefficient());
        num(n, "sin_coefficient", s.sinCoefficient());
    }

    private static void notApplicableAmplitude(ObjectNode n) {
        for (String f : new String[] {"amplitude", "amplitude_se", "amplitude_ci", "phase_deg", "phase_se_deg"}) {
            n.putNull(f);
        }
    }
}
