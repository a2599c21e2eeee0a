package org.phasewright.io.write;

import static org.phasewright.io.write.JsonCells.num;
import static org.phasewright.io.write.JsonCells.pair;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Map;
import org.phasewright.diagnostics.ResidualReport;
import org.phasewright.fit.FitWarning;
import org.phasewright.refine.RefinedFrequency;
import org.phasewright.refine.Refinement;
import org.phasewright.selection.HarmonicGrowthResult;
import org.phasewright.selection.SelectionStep;
import org.phasewright.selection.SelectionTable;
import org.phasewright.uncertainty.RobustResult;

/**
 * The sections {@link ResultJson} adds for the checks beyond the plain fit: refined frequencies,
 * the robust fit, residual diagnostics, harmonic growth and the term-by-term comparison. Each copies
 * fields of the core's result records into a JSON tree; nothing is recomputed.
 */
final class CheckSections {

    private CheckSections() {
    }

    /**
     * {@code refined_frequencies} [{name, kind, start_hz, frequency_hz, frequency_se_hz, frequency_ci_hz,
     * in_unit {unit, frequency, frequency_se, frequency_ci} where the term's label has a unit}] and
     * {@code refinement} {iterations, converged, rss, dof}.
     */
    static void refinement(ObjectNode root, Refinement r, Map<String, ? extends FrequencyInUnit> units) {
        ArrayNode list = root.putArray("refined_frequencies");
        for (RefinedFrequency f : r.frequencies()) {
            ObjectNode n = list.addObject();
            n.put("name", f.label());
            n.put("kind", f.kind());
            num(n, "start_hz", f.startHz());
            num(n, "frequency_hz", f.frequencyHz());
            num(n, "frequency_se_hz", f.stdErrorHz());
            pair(n, "frequency_ci_hz", f.ciLowHz(), f.ciHighHz());
            FrequencyInUnit g = units.get(f.label());
            if (g != null) {
                ObjectNode u = n.putObject("in_unit");
                u.put("unit", g.unit());
                num(u, "frequency", g.fromHertz(f.frequencyHz()));
                num(u, "frequency_se", g.uncertaintyFromHertz(f.frequencyHz(), f.stdErrorHz()));
                double lo = g.fromHertz(f.ciLowHz());
                double hi = g.fromHertz(f.ciHighHz());
                pair(u, "frequency_ci", Math.min(lo, hi), Math.max(lo, hi)); // a period reverses the ends
            }
        }
        ObjectNode info = root.putObject("refinement");
        info.put("iterations", r.iterations());
        info.put("converged", r.converged());
        num(info, "rss", r.rss());
        info.put("dof", r.dof());
    }

    /** {@code robust_fit} {loss, tuning, scale, downweighted, iterations, converged}. */
    static void robust(ObjectNode root, RobustResult r) {
        ObjectNode n = root.putObject("robust_fit");
        n.put("loss", r.loss().id());
        num(n, "tuning", r.tuning());
        num(n, "scale", r.scale());
        n.put("downweighted", r.downweighted());
        n.put("iterations", r.iterations());
        n.put("converged", r.converged());
    }

    /**
     * {@code diagnostics} {residuals, n, lags, durbin_watson, autocorrelation, white_noise_band, ljung_box {q,
     * dof, p_value}, jarque_bera {statistic, skewness, kurtosis, p_value}, warning_codes, suggestion}.
     */
    static void diagnostics(ObjectNode root, ResidualReport r, String residuals, String suggestion) {
        ObjectNode n = root.putObject("diagnostics");
        n.put("residuals", residuals);
        n.put("n", r.n());
        n.put("lags", r.autocorrelation().length);
        num(n, "durbin_watson", r.durbinWatson());
        ArrayNode acf = n.putArray("autocorrelation");
        for (double v : r.autocorrelation()) {
            JsonCells.add(acf, v);
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
        JsonCells.text(n, "suggestion", suggestion);
    }

    /** {@code diagnostics} {skipped: why}. */
    static void diagnosticsSkipped(ObjectNode root, String reason) {
        root.putObject("diagnostics").put("skipped", reason);
    }

    /**
     * {@code harmonic_growth} {fundamental_hz, significance, allow_missing, limit, kept, stop_reason, steps,
     * best_by_aic, best_by_bic}.
     */
    static void growth(ObjectNode root, HarmonicGrowthResult g, double significance, int allowMissing, int limit) {
        ObjectNode n = root.putObject("harmonic_growth");
        num(n, "fundamental_hz", GrowthSteps.fundamentalHz(g));
        num(n, "significance", significance);
        n.put("allow_missing", allowMissing);
        n.put("limit", limit);
        ArrayNode kept = n.putArray("kept");
        g.kept().forEach(kept::add);
        n.put("stop_reason", g.stopReason());
        table(n, g.table());
    }

    /** {@code model_comparison} {steps [{added, columns, rss, dof, f_stat, df1, p_value, aic, bic, delta_aic, delta_bic}], best_by_aic, best_by_bic}. */
    static void comparison(ObjectNode root, SelectionTable t) {
        table(root.putObject("model_comparison"), t);
    }

    private static void table(ObjectNode n, SelectionTable t) {
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
    }
}
