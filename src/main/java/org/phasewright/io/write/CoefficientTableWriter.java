package org.phasewright.io.write;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.phasewright.fit.FitResult;
import org.phasewright.model.GroupReport;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.ScalarReport;
import org.phasewright.model.SinusoidReport;
import org.phasewright.model.TermReport;

/**
 * Writes the table of reported quantities: one row per term, and for a harmonic series one
 * further row per harmonic. Columns (units in brackets, the signal's unit written as given):
 * {@code term}, {@code kind}, {@code harmonic}, {@code frequency [Hz]}, {@code amplitude [u]},
 * {@code amplitude SE [u]}, {@code amplitude CI low [u]} and {@code high} at the fit's level
 * (e.g. {@code amplitude 95% CI low}), {@code phase [deg]}, {@code phase SE [deg]},
 * {@code estimate}, {@code estimate SE}, {@code estimate CI low/high} (intercept, steps,
 * covariates), {@code t}, {@code F}, {@code df1}, {@code df2}, {@code p-value},
 * {@code variance share}. Cells that do not apply to a kind are empty. The fit's own (plain)
 * standard errors are written unless a {@link ShownInference} names others.
 */
public final class CoefficientTableWriter {

    private CoefficientTableWriter() {
    }

    public static List<String> headers(FitResult fit, String unit) {
        String lvl = levelText(fit.level());
        List<String> h = new ArrayList<>();
        h.add("term");
        h.add("kind");
        h.add("harmonic");
        h.add("frequency [Hz]");
        h.add(Headers.withUnit("amplitude", unit));
        h.add(Headers.withUnit("amplitude SE", unit));
        h.add(Headers.withUnit("amplitude " + lvl + " CI low", unit));
        h.add(Headers.withUnit("amplitude " + lvl + " CI high", unit));
        h.add("phase [deg]");
        h.add("phase SE [deg]");
        h.add("estimate");
        h.add("estimate SE");
        h.add("estimate " + lvl + " CI low");
        h.add("estimate " + lvl + " CI high");
        h.add("t");
        h.add("F");
        h.add("df1");
        h.add("df2");
        h.add("p-value");
        h.add("variance share");
        return h;
    }

    static String levelText(double level) {
        double pct = level * 100;
        return (pct == Math.rint(pct) ? Long.toString((long) pct) : String.format(Locale.ROOT, "%.4g", pct)) + "%";
    }

    public static void write(Path target, FitResult fit, String unit, boolean replace) {
        write(target, fit, ShownInference.of(fit, "plain", "plain least-squares standard errors"), unit, replace);
    }

    /**
     * Writes the term reports of {@code shown} (e.g. with corrected standard errors) for the fit
     * {@code fit}; {@code df2} is the shown inference's degrees of freedom.
     */
    public static void write(Path target, FitResult fit, ShownInference shown, String unit, boolean replace) {
        List<String> header = headers(fit, unit);
        String df2 = Integer.toString(shown.dof());
        AtomicFile.writeText(target, replace, w -> {
            CsvTableWriter table = new CsvTableWriter(w, header);
            for (TermReport t : shown.terms()) {
                if (t instanceof SinusoidReport s) {
                    sinusoidRow(table, s, df2);
                } else if (t instanceof HarmonicSeriesReport h) {
                    table.row(CsvCells.label(h.label()), h.kind(), "", CsvCells.number(h.fundamentalHz()), "", "", "", "", "", "",
                            "", "", "", "", "", CsvCells.number(h.fStat()), Integer.toString(h.df1()), df2,
                            CsvCells.number(h.pValue()), CsvCells.number(h.varianceShare()));
                    for (SinusoidReport s : h.harmonics()) {
                        sinusoidRow(table, s, df2);
                    }
                } else if (t instanceof GroupReport g) {
                    table.row(CsvCells.label(g.label()), g.kind(), "", "", "", "", "", "", "", "", "", "", "", "", "",
                            CsvCells.number(g.fStat()), Integer.toString(g.df1()), df2, CsvCells.number(g.pValue()),
                            CsvCells.number(g.varianceShare()));
                } else if (t instanceof ScalarReport s) {
                    table.row(CsvCells.label(s.label()), s.kind(), "", "", "", "", "", "", "", "",
                            CsvCells.number(s.estimate()), CsvCells.number(s.stdError()), CsvCells.number(s.ciLow()),
                            CsvCells.number(s.ciHigh()), CsvCells.number(s.t()), CsvCells.number(s.fStat()), "1", df2,
                            CsvCells.number(s.pValue()), CsvCells.number(s.varianceShare()));
                }
            }
            table.flush();
        });
    }

    private static void sinusoidRow(CsvTableWriter table, SinusoidReport s, String df2) throws IOException {
        table.row(CsvCells.label(s.label()), s.kind(), s.harmonic() > 0 ? Integer.toString(s.harmonic()) : "",
                CsvCells.number(s.frequencyHz()), CsvCells.number(s.amplitude()), CsvCells.number(s.amplitudeSe()),
                CsvCells.number(s.amplitudeCiLow()), CsvCells.number(s.amplitudeCiHigh()), CsvCells.number(s.phaseDeg()),
                CsvCells.number(s.phaseSeDeg()), "", "", "", "", "", CsvCells.number(s.fStat()), "2", df2,
                CsvCells.number(s.pValue()), CsvCells.number(s.varianceShare()));
    }
}
