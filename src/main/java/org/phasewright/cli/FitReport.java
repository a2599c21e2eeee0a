package org.phasewright.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.model.GroupReport;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.ScalarReport;
import org.phasewright.model.SinusoidReport;
import org.phasewright.model.TermReport;
import org.phasewright.series.Series;
import org.phasewright.uncertainty.RobustResult;

/**
 * The readable report of one fit, laid out for Phasewright: the harmonics grown and the refined
 * frequencies when asked for, a sentence naming the standard errors shown, a table of periodic
 * components (frequency in hertz and in the user's unit, amplitude with standard error and
 * interval, phase with standard error, F, p, share of variance), a table of the other one-column
 * terms, the joint tests of multi-column terms, the term-by-term comparison when asked for, a fit
 * summary in sentences, the residual checks, and the warnings in words with what to try next. It
 * prints fields of core results only; nothing is recomputed.
 */
final class FitReport {

    private FitReport() {
    }

    static void print(PrintWriter out, Analysis a, TermOptions terms) {
        LoadedRecord record = a.record();
        FitResult r = a.fit();
        out.println(record.where() + ": " + describe(record.series()));
        out.println();
        String lvl = Numbers.sig(100 * r.level()) + " %";
        a.growth().ifPresent(g -> SelectionReport.growth(out, g, a.plan(), terms));
        a.refinement().ifPresent(ref -> RefinementReport.print(out, ref, a.plan(), lvl));
        standardErrors(out, a);
        List<TermReport> shown = a.shown().terms();
        String tag = "; standard errors: " + a.shown().method().replace('_', ' ');
        periodic(out, a.plan(), shown, lvl, tag);
        scalars(out, a.plan(), shown, lvl, tag);
        groups(out, a.plan(), shown, tag);
        a.comparison().ifPresent(t -> SelectionReport.comparison(out, t));
        if (a.robust().isPresent()) {
            robustSummary(out, a.robust().get(), r, record.unit());
        } else {
            summary(out, r, record.unit());
        }
        ResidualCheckReport.print(out, a);
        warnings(out, a);
        out.flush();
    }

    private static void standardErrors(PrintWriter out, Analysis a) {
        out.println("Standard errors shown: " + ErrorHandler.sentence(a.shown().description()));
        a.robust().ifPresent(rr -> {
            out.println("  Robust fit: the amplitudes, phases and estimates below are the robust ones, and so are the fit"
                    + " summary, the residual checks and the components.");
        });
        out.println();
    }

    private static String unitSuffix(String unit) {
        return unit == null || unit.isEmpty() ? "" : " " + unit;
    }

    static String describe(Series s) {
        String sampling = !s.isUniform() ? s.size() + " unevenly spaced samples"
                : s.rate().getAsDouble() >= 1 ? s.size() + " samples at " + Numbers.hertz(s.rate().getAsDouble()) + " Hz"
                : s.size() + " samples, one every " + Numbers.duration(1 / s.rate().getAsDouble());
        String gaps = s.missingCount() == 0 ? "no gaps" : s.missingCount() + " missing";
        return sampling + " over " + Numbers.duration(s.duration()) + " (" + gaps + ")";
    }

    private static void periodic(PrintWriter out, ModelPlan plan, List<TermReport> terms, String lvl, String tag) {
        boolean anyUnit = plan.frequencies().values().stream().anyMatch(f -> !f.isHertz())
                || plan.fundamentals().values().stream().anyMatch(f -> !f.isHertz());
        TextTable t = anyUnit
                ? new TextTable(2, "component", "your unit", "frequency (Hz)", "amplitude", "SE", lvl + " low", lvl + " high",
                        "phase (deg)", "SE (deg)", "F", "p", "share (%)")
                : new TextTable(1, "component", "frequency (Hz)", "amplitude", "SE", lvl + " low", lvl + " high",
                        "phase (deg)", "SE (deg)", "F", "p", "share (%)");
        for (TermReport tr : terms) {
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
        out.println("Periodic components  (x = A cos(2 pi f t - phase), t from the record's time zero" + tag + ")");
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

    private static void scalars(PrintWriter out, ModelPlan plan, List<TermReport> terms, String lvl, String tag) {
        TextTable t = new TextTable(2, "term", "kind", "estimate", "SE", lvl + " low", lvl + " high", "t", "p",
                "share (%)");
        for (TermReport tr : terms) {
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
        out.println("Level, steps and covariates  (the constant level has no share of the variation about the mean" + tag
                + ")");
        t.print(out, "  ");
        out.println();
    }

    private static void groups(PrintWriter out, ModelPlan plan, List<TermReport> terms, String tag) {
        TextTable t = new TextTable(1, "term", "columns", "F", "p", "share (%)");
        for (TermReport tr : terms) {
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
        out.println("Joint tests  (F-test that all of a term's coefficients are zero" + tag + ")");
        t.print(out, "  ");
        out.println();
    }

    /** The robust fit's own summary, with the least-squares fit of the same samples beside it for comparison. */
    private static void robustSummary(PrintWriter out, RobustResult rr, FitResult ls, String unit) {
        out.println("Robust fit  (" + rr.loss().id() + " loss)");
        out.println("  " + rr.n() + " samples used, " + rr.p() + " coefficients, " + rr.dof() + " residual degrees of freedom.");
        out.println("  Robust residual scale " + Numbers.sig(rr.scale()) + unitSuffix(unit)
                + " (median absolute residual / 0.6745): the noise level behind the standard errors.");
        out.println("  " + rr.downweighted() + " of " + rr.n() + " samples carry weight below 0.5; " + rr.iterations()
                + " iterations" + (rr.converged() ? "." : " (not converged)."));
        out.println("  Least-squares fit of the same samples, for comparison: residual standard deviation "
                + Numbers.sig(ls.residualSd()) + unitSuffix(unit) + ", " + Numbers.percentFine(ls.rSquared()) + " % of the "
                + (ls.centredRSquared() ? "" : "uncentred ") + "variation explained.");
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

    private static void warnings(PrintWriter out, Analysis a) {
        if (a.warnings().isEmpty()) {
            out.println("No warnings.");
        } else {
            out.println(a.warnings().size() == 1 ? "Warning" : "Warnings");
            for (FitWarning w : a.warnings()) {
                out.println("  - " + ErrorHandler.sentence(w.message()));
            }
        }
        if (a.warned(org.phasewright.diagnostics.ResidualDiagnostics.AUTOCORRELATED) && !a.plainErrors()
                && a.robust().isEmpty()) {
            out.println("  (The standard errors shown already allow for correlated noise: " + a.shown().method()
                    .replace('_', '-') + ".)");
        }
        if (a.warned(org.phasewright.diagnostics.ResidualDiagnostics.NON_NORMAL) && a.robust().isPresent()) {
            out.println("  (The fit shown is already robust: samples far from it carry little or no weight, but they"
                    + " stay in its residuals.)");
        }
        String hint = Suggestions.forResiduals(a);
        if (hint != null) {
            out.println();
            out.println("Suggestion: " + ErrorHandler.sentence(hint));
        }
    }
}
