package org.phasewright.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.model.GroupReport;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.ScalarReport;
import org.phasewright.model.SinusoidReport;
import org.phasewright.model.TermReport;
import org.phasewright.series.Series;

/**
 * The readable report of one fit, laid out for Phasewright: a table of periodic components
 * (frequency in hertz and as the user wrote it, amplitude with standard error and interval,
 * phase with standard error, F, p, share of variance), a table of the other one-column terms, the
 * joint tests of multi-column terms, a fit summary in sentences, and the warnings in words. It
 * prints fields of the {@link FitResult} only; nothing is recomputed.
 */
final class FitReport {

    private FitReport() {
    }

    static void print(PrintWriter out, String where, Series series, String unit, ModelPlan plan, FitResult r) {
        out.println(where + ": " + describe(series));
        out.println();
        String lvl = Numbers.sig(100 * r.level()) + " %";
        periodic(out, plan, r, lvl);
        scalars(out, plan, r, lvl);
        groups(out, plan, r);
        summary(out, r, unit);
        warnings(out, r);
        out.flush();
    }

    static String describe(Series s) {
        String sampling = !s.isUniform() ? s.size() + " unevenly spaced samples"
                : s.rate().getAsDouble() >= 1 ? s.size() + " samples at " + Numbers.hertz(s.rate().getAsDouble()) + " Hz"
                : s.size() + " samples, one every " + Numbers.duration(1 / s.rate().getAsDouble());
        String gaps = s.missingCount() == 0 ? "no gaps" : s.missingCount() + " missing";
        return sampling + " over " + Numbers.duration(s.duration()) + " (" + gaps + ")";
    }

    private static void periodic(PrintWriter out, ModelPlan plan, FitResult r, String lvl) {
        boolean anyUnit = plan.frequencies().values().stream().anyMatch(f -> !f.isHertz())
                || plan.fundamentals().values().stream().anyMatch(f -> !f.isHertz());
        TextTable t = anyUnit
                ? new TextTable(2, "component", "as given", "frequency (Hz)", "amplitude", "SE", lvl + " low", lvl + " high",
                        "phase (deg)", "SE (deg)", "F", "p", "share (%)")
                : new TextTable(1, "component", "frequency (Hz)", "amplitude", "SE", lvl + " low", lvl + " high",
                        "phase (deg)", "SE (deg)", "F", "p", "share (%)");
        for (TermReport tr : r.terms()) {
            if (tr instanceof SinusoidReport s) {
                row(t, anyUnit, plan.nameOf(s.label()), plan.asGiven(s.label(), 0).map(Frequency::display).orElse(""), s);
            } else if (tr instanceof HarmonicSeriesReport h) {
                for (SinusoidReport s : h.harmonics()) {
                    String name = plan.harmonicName(h.label(), h.fundamentalHz(), s.harmonic());
                    row(t, anyUnit, name, plan.asGiven(h.label(), s.harmonic()).map(Frequency::display).orElse(""), s);
                }
            }
        }
        if (t.isEmpty()) {
            return;
        }
        out.println("Periodic components  (x = A cos(2 pi f t - phase), t from the record's time zero)");
        t.print(out, "  ");
        out.println();
    }

    private static void row(TextTable t, boolean anyUnit, String name, String given, SinusoidReport s) {
        int ap = Numbers.placesFor(s.amplitudeSe());
        int pp = Math.min(3, Numbers.placesFor(s.phaseSeDeg()));
        String[] cells = {Numbers.hertz(s.frequencyHz()), Numbers.fixed(s.amplitude(), ap),
            Numbers.fixed(s.amplitudeSe(), ap), Numbers.fixed(s.amplitudeCiLow(), ap), Numbers.fixed(s.amplitudeCiHigh(), ap),
            Numbers.fixed(s.phaseDeg(), pp), Numbers.fixed(s.phaseSeDeg(), pp), Numbers.sig(s.fStat()),
            Numbers.pValue(s.pValue()), Numbers.percent(s.varianceShare())};
        if (anyUnit) {
            String[] all = new String[cells.length + 2];
            all[0] = name;
            all[1] = given;
            System.arraycopy(cells, 0, all, 2, cells.length);
            t.row(all);
        } else {
            String[] all = new String[cells.length + 1];
            all[0] = name;
            System.arraycopy(cells, 0, all, 1, cells.length);
            t.row(all);
        }
    }

    private static void scalars(PrintWriter out, ModelPlan plan, FitResult r, String lvl) {
        TextTable t = new TextTable(2, "term", "kind", "estimate", "SE", lvl + " low", lvl + " high", "t", "p",
                "share (%)");
        for (TermReport tr : r.terms()) {
            if (tr instanceof ScalarReport s) {
                int p = Numbers.placesFor(s.stdError());
                t.row(plan.nameOf(s.label()), s.kind().replace('_', ' '), Numbers.fixed(s.estimate(), p), Numbers.fixed(s.stdError(), p),
                        Numbers.fixed(s.ciLow(), p), Numbers.fixed(s.ciHigh(), p), Numbers.sig(s.t()),
                        Numbers.pValue(s.pValue()), s.kind().equals("intercept") ? "-" : Numbers.percent(s.varianceShare()));
            }
        }
        if (t.isEmpty()) {
            return;
        }
        out.println("Level, steps and covariates  (the constant level has no share of the variation about the mean)");
        t.print(out, "  ");
        out.println();
    }

    private static void groups(PrintWriter out, ModelPlan plan, FitResult r) {
        TextTable t = new TextTable(1, "term", "columns", "F", "p", "share (%)");
        for (TermReport tr : r.terms()) {
            if (tr instanceof HarmonicSeriesReport h) {
                t.row(plan.nameOf(h.label()) + " (all harmonics together)", Integer.toString(h.df1()), Numbers.sig(h.fStat()),
                        Numbers.pValue(h.pValue()), Numbers.percent(h.varianceShare()));
            } else if (tr instanceof GroupReport g) {
                t.row(g.label(), Integer.toString(g.columns()), Numbers.sig(g.fStat()), Numbers.pValue(g.pValue()),
                        Numbers.percent(g.varianceShare()));
            }
        }
        if (t.isEmpty()) {
            return;
        }
        out.println("Joint tests (F-test that all of a term's coefficients are zero)");
        t.print(out, "  ");
        out.println();
    }

    private static void summary(PrintWriter out, FitResult r, String unit) {
        out.println("Fit");
        out.println("  " + r.n() + " samples used, " + r.p() + " coefficients, " + r.dof() + " residual degrees of freedom.");
        out.println("  Residual standard deviation " + Numbers.sig(r.residualSd())
                + (unit == null || unit.isEmpty() ? " (in the signal's unit)." : " " + unit + "."));
        out.println(String.format(Locale.ROOT, "  The model explains %s %% of the %s variation (adjusted %s %%).",
                Numbers.percentFine(r.rSquared()), r.centredRSquared() ? "" : "uncentred",
                Numbers.percentFine(r.adjustedRSquared()))
                .replace("the  variation", "the variation"));
        if (!Double.isNaN(r.overallF())) {
            out.println("  All terms together: F = " + Numbers.sig(r.overallF()) + " on " + r.overallDf1() + " and "
                    + r.overallDf2() + " degrees of freedom, p " + Numbers.pRelation(r.overallP()) + ".");
        }
        out.println("  Condition number of the scaled design " + Numbers.sig(r.conditionNumber()) + ".");
        out.println();
    }

    private static void warnings(PrintWriter out, FitResult r) {
        if (r.warnings().isEmpty()) {
            out.println("No warnings.");
            return;
        }
        out.println(r.warnings().size() == 1 ? "Warning" : "Warnings");
        for (FitWarning w : r.warnings()) {
            out.println("  - " + ErrorHandler.sentence(w.message()));
        }
    }
}
