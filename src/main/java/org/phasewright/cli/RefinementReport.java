package org.phasewright.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.Optional;
import org.phasewright.refine.RefinedFrequency;
import org.phasewright.refine.Refinement;

/**
 * The block of refined frequencies in the readable report: per refined sinusoid frequency or
 * harmonic-series fundamental its start, the estimate with standard error and confidence interval in
 * hertz, and the same in the unit the user gave (a period's standard error is the frequency's times
 * P / f, first order; its interval is the frequency interval's ends turned into periods). Prints
 * fields of the {@link Refinement}.
 */
final class RefinementReport {

    private RefinementReport() {
    }

    static void print(PrintWriter out, Refinement r, ModelPlan plan, String lvl) {
        boolean anyUnit = r.frequencies().stream().anyMatch(f -> plan.given(f.label()).filter(g -> !g.isHertz()).isPresent());
        TextTable t = anyUnit
                ? new TextTable(1, "component", "start (Hz)", "frequency (Hz)", "SE (Hz)", lvl + " low", lvl + " high",
                        "your unit", "SE", lvl + " low", lvl + " high")
                : new TextTable(1, "component", "start (Hz)", "frequency (Hz)", "SE (Hz)", lvl + " low", lvl + " high");
        for (RefinedFrequency f : r.frequencies()) {
            Frequency start = plan.given(f.label()).orElse(Frequency.hertz(f.startHz()));
            String what = (f.kind().equals("harmonic_series") ? "fundamental" : "sinusoid") + ", started at "
                    + start.at(f.startHz(), Double.NaN).display();
            String[] hz = {what, Numbers.hertz(f.startHz()), withError(f.frequencyHz(), f.stdErrorHz()),
                Numbers.error(f.stdErrorHz()), withError(f.ciLowHz(), f.stdErrorHz()), withError(f.ciHighHz(), f.stdErrorHz())};
            if (!anyUnit) {
                t.row(hz);
                continue;
            }
            Optional<Frequency> given = plan.given(f.label()).filter(g -> !g.isHertz());
            String[] inUnit = given.map(g -> inUnit(g, f)).orElse(new String[] {"", "", "", ""});
            String[] all = new String[hz.length + inUnit.length];
            System.arraycopy(hz, 0, all, 0, hz.length);
            System.arraycopy(inUnit, 0, all, hz.length, inUnit.length);
            t.row(all);
        }
        out.println(String.format(Locale.ROOT, "Refined frequencies  (nonlinear least squares, %d iteration%s, %s)",
                r.iterations(), r.iterations() == 1 ? "" : "s", r.converged() ? "converged" : "not converged"));
        t.print(out, "  ");
        out.println("  The tables below are the fit at the refined frequencies.");
        out.println();
    }

    private static String[] inUnit(Frequency g, RefinedFrequency f) {
        double se = g.uncertaintyInUnit(f.frequencyHz(), f.stdErrorHz());
        double lo = g.inUnit(f.ciLowHz());
        double hi = g.inUnit(f.ciHighHz());
        return new String[] {g.at(f.frequencyHz(), f.stdErrorHz()).display(), Numbers.error(se),
            withError(Math.min(lo, hi), se), withError(Math.max(lo, hi), se)};
    }

    /** {@code v} to the decimals that show two significant digits of {@code se}; exponent form for tiny errors. */
    static String withError(double v, double se) {
        if (!(se > 0) || !Double.isFinite(se)) {
            return Numbers.sig(v);
        }
        int places = 1 - (int) Math.floor(Math.log10(se));
        if (places > 9 && v != 0) {
            // at most 10 significant digits: beyond them a double's rounding, not the data, speaks
            int digits = Math.min(9, (int) Math.floor(Math.log10(Math.abs(v))) + places);
            return String.format(Locale.ROOT, "%." + Math.max(1, digits) + "e", v);
        }
        return Numbers.fixed(v, Math.max(0, places));
    }
}
