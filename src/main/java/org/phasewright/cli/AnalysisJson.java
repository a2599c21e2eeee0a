package org.phasewright.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.phasewright.diagnostics.ResidualReport;
import org.phasewright.fit.FitWarning;
import org.phasewright.io.write.ResultJson;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.TermSpec;
import org.phasewright.refine.RefinedFrequency;
import org.phasewright.refine.Refinement;
import org.phasewright.selection.HarmonicGrowthResult;
import org.phasewright.selection.SelectionStep;
import org.phasewright.selection.SelectionTable;
import org.phasewright.uncertainty.RobustResult;

/**
 * The result JSON of an {@link Analysis}: io's {@link ResultJson} of the least-squares fit with the
 * shown standard errors ({@code standard_errors} {method, description, dof}, and {@code terms} and
 * {@code coefficients} computed with them) and every warning, plus, when asked for:
 * {@code refined_frequencies} [{name, kind, start_hz, frequency_hz, frequency_se_hz, frequency_ci_hz,
 * and in_unit {unit, frequency, frequency_se, frequency_ci} when the start was given in another unit
 * than hertz}] and {@code refinement} {iterations, converged, rss, dof}; {@code robust_fit} {loss,
 * tuning, scale, downweighted, iterations, converged}; {@code diagnostics} {residuals, n, lags,
 * durbin_watson, autocorrelation, white_noise_band, ljung_box {q, dof, p_value}, jarque_bera {statistic,
 * skewness, kurtosis, p_value}, warning_codes, suggestion}; {@code harmonic_growth} {fundamental_hz,
 * significance, allow_missing, limit, kept, stop_reason, steps}; {@code model_comparison} {steps,
 * best_by_aic, best_by_bic}. Every number is a field of a core result; non-finite ones are null.
 */
final class AnalysisJson {

    private AnalysisJson() {
    }

    static ResultJson document(Analysis a) {
        LoadedRecord record = a.record();
        ResultJson doc = ResultJson.of(a.fit(), record.series()).shown(a.shown()).warnings(a.warnings());
        if (record.csv() != null) {
            doc.readBy(record.csv());
        } else if (record.wav() != null) {
            doc.readBy(record.wav());
        }
        return doc.source(record.where());
    }

    static ObjectNode tree(Analysis a, TermOptions terms) {
        ObjectNode root = document(a).tree();
        a.refinement().ifPresent(r -> refinement(root, r, a));
        a.robust().ifPresent(r -> robust(root, r));
        diagnostics(root, a);
        a.growth().ifPresent(g -> growth(root, g, terms));
        a.comparison().ifPresent(t -> root.set("model_comparison", table(root.objectNode(), t)));
        return root;
    }

    private static void refinement(ObjectNode root, Refinement r, Analysis a) {
        ArrayNode list = root.putArray("refined_frequencies");
        for (RefinedFrequency f : r.frequencies()) {
            ObjectNode n = list.addObject();
            n.put("name", f.label());
            n.put("kind", f.kind());
            num(n, "start_hz", f.startHz());
            num(n, "frequency_hz", f.frequencyHz());
            num(n, "frequency_se_hz", f.stdErrorHz());
            pair(n, "frequency_ci_hz", f.ciLowHz(), f.ciHighHz());
            a.plan().given(f.label()).filter(g -> !g.isHertz()).ifPresent(g -> {
                ObjectNode u = n.putObject("in_unit");
                u.put("unit", g.unit() == FrequencyUnit.PERIOD ? "period " + g.periodUnit() : g.unit().symbol());
                num(u, "frequency", g.inUnit(f.frequencyHz()));
                num(u, "frequency_se", g.uncertaintyInUnit(f.frequencyHz(), f.stdErrorHz()));
                double lo = g.inUnit(f.ciLowHz());
                double hi = g.inUnit(f.ciHighHz());
                pair(u, "frequency_ci", Math.min(lo, hi), Math.max(lo, hi));
            });
        }
        ObjectNode info = root.putObject("refinement");
        info.put("iterations", r.iterations());
        info.put("converged", r.converged());
        num(info, "rss", r.rss());
        info.put("dof", r.dof());
    }

    private static void robust(ObjectNode root, RobustResult r) {
        ObjectNode n = root.putObject("robust_fit");
        n.put("loss", r.loss().id());
        num(n, "tuning", r.tuning());
        num(n, "scale", r.scale());
        n.put("downweighted", r.downweighted());
        n.put("iterations", r.iterations());
        n.put("converged", r.converged());
    }

    private static void diagnostics(ObjectNode root, Analysis a) {
        if (a.residuals().isEmpty()) {
            ObjectNode n = root.putObject("diagnostics");
            n.put("skipped", a.noResidualChecks());
            return;
        }
        ResidualReport r = a.residuals().get();
        ObjectNode n = root.putObject("diagnostics");
        n.put("residuals", "least_squares");
        n.put("n", r.n());
        n.put("lags", r.autocorrelation().length);
        num(n, "durbin_watson", r.durbinWatson());
        ArrayNode acf = n.putArray("autocorrelation");
        for (double v : r.autocorrelation()) {
            if (Double.isFinite(v)) {
                acf.add(v);
            } else {
                acf.addNull();
            }
        }
        num(n, "white_noise_band", r.band());
        ObjectNode lb = n.putObject("ljung_box");
        num(lb, "q", r.ljungBox().statistic());
        lb.put("dof", r.ljungBox().dof());
        num(lb, "p_value", r.ljungBox().pValue());
        ObjectNode jb = n.putObject("jarque_bera");
        num(jb, "statistic", r.jarqueBera().statistic());
        num(jb, "skewness", r.jarqueBera().skewness());
        num(jb, "kurtosis", r.jarqueBera().kurtosis());
        num(jb, "p_value", r.jarqueBera().pValue());
        ArrayNode codes = n.putArray("warning_codes");
        for (FitWarning w : r.warnings()) {
            codes.add(w.code());
        }
        String hint = Suggestions.forResiduals(a);
        if (hint == null) {
            n.putNull("suggestion");
        } else {
            n.put("suggestion", hint);
        }
    }

    private static void growth(ObjectNode root, HarmonicGrowthResult g, TermOptions terms) {
        ObjectNode n = root.putObject("harmonic_growth");
        num(n, "fundamental_hz", fundamentalTried(g));
        num(n, "significance", terms.growthSignificance());
        n.put("allow_missing", terms.growthAllowMissing());
        n.put("limit", terms.harmonics.count());
        ArrayNode kept = n.putArray("kept");
        g.kept().forEach(kept::add);
        n.put("stop_reason", g.stopReason());
        table(n, g.table());
    }

    /** The fundamental the growth tried: the series each trial model adds last; NaN when none was tried. */
    static double fundamentalTried(HarmonicGrowthResult g) {
        List<ModelSpec> models = g.table().models();
        if (models.size() < 2) {
            return Double.NaN;
        }
        List<TermSpec> trial = models.get(1).terms();
        return trial.get(trial.size() - 1) instanceof HarmonicSeries h ? h.fundamentalHz() : Double.NaN;
    }

    /** The harmonic number that row {@code i} of a growth table tried (0 for the base model). */
    static int harmonicTried(HarmonicGrowthResult g, int i) {
        List<TermSpec> trial = g.table().models().get(i).terms();
        return i > 0 && trial.get(trial.size() - 1) instanceof HarmonicSeries h ? h.harmonics() : 0;
    }

    private static ObjectNode table(ObjectNode n, SelectionTable t) {
        ArrayNode steps = n.putArray("steps");
        for (SelectionStep s : t.steps()) {
            ObjectNode row = steps.addObject();
            row.put("added", s.added());
            row.put("columns", s.columns());
            num(row, "rss", s.rss());
            row.put("dof", s.dof());
            num(row, "f_stat", s.fStat());
            row.put("df1", s.df1());
            num(row, "p_value", s.pValue());
            num(row, "aic", s.aic());
            num(row, "bic", s.bic());
            num(row, "delta_aic", s.deltaAic());
            num(row, "delta_bic", s.deltaBic());
        }
        n.put("best_by_aic", t.steps().get(t.bestByAic()).added());
        n.put("best_by_bic", t.steps().get(t.bestByBic()).added());
        return n;
    }

    static void num(ObjectNode n, String field, double v) {
        if (Double.isFinite(v)) {
            n.put(field, v);
        } else {
            n.putNull(field);
        }
    }

    private static void pair(ObjectNode n, String field, double low, double high) {
        ArrayNode p = n.putArray(field);
        for (double v : List.of(low, high)) {
            if (Double.isFinite(v)) {
                p.add(v);
            } else {
                p.addNull();
            }
        }
    }
}
