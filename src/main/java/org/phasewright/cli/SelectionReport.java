package org.phasewright.cli;

import java.io.PrintWriter;
import org.phasewright.io.write.GrowthSteps;
import org.phasewright.selection.HarmonicGrowthResult;
import org.phasewright.selection.SelectionStep;
import org.phasewright.selection.SelectionTable;

/**
 * The model-selection blocks of the readable report: the harmonics tried by {@code --harmonics auto}
 * (each against the last model kept, with the verdict in words) and the term-by-term comparison of
 * {@code --compare-terms} (each step against the one before, AIC and BIC, the smallest of each named in
 * words). Prints fields of the selection package's results.
 */
final class SelectionReport {

    private SelectionReport() {
    }

    static void growth(PrintWriter out, HarmonicGrowthResult g, ModelPlan plan, TermOptions terms) {
        double f0 = GrowthSteps.fundamentalHz(g);
        String of = Double.isNaN(f0) ? "the fundamental" : Frequency.number(f0) + " Hz";
        out.println("Harmonics of " + of + " tried one at a time  (kept when p < " + Numbers.sig(terms.growthSignificance())
                + "; up to " + terms.growthAllowMissing() + " absent in a row stepped over)");
        TextTable t = new TextTable(1, "tried", "columns", "F", "p", "verdict", "AIC", "BIC");
        for (int i = 0; i < g.table().steps().size(); i++) {
            SelectionStep s = g.table().steps().get(i);
            int k = GrowthSteps.harmonic(g, i);
            String verdict = i == 0 ? "" : g.kept().contains(k) ? "kept" : "left out";
            t.row(i == 0 ? "other terms only" : "harmonic " + k, Integer.toString(s.columns()), Numbers.sig(s.fStat()),
                    Numbers.pValue(s.pValue()), verdict, Numbers.sig(s.aic()), Numbers.sig(s.bic()));
        }
        t.print(out, "  ");
        out.println("  Kept: " + (g.kept().isEmpty() ? "none" : join(g.kept())) + ". Growth stopped: "
                + ErrorHandler.sentence(g.stopReason()));
        out.println();
    }

    static void comparison(PrintWriter out, SelectionTable table) {
        out.println("Terms added one at a time  (each row: the model of every row down to it, tested against the row above)");
        TextTable t = new TextTable(1, "added", "columns", "RSS", "F", "df1", "df2", "p", "AIC", "AIC - min", "BIC",
                "BIC - min");
        for (SelectionStep s : table.steps()) {
            t.row(s.added(), Integer.toString(s.columns()), Numbers.sig(s.rss()), Numbers.sig(s.fStat()),
                    Integer.toString(s.df1()), Integer.toString(s.dof()), Numbers.pValue(s.pValue()), Numbers.sig(s.aic()),
                    Numbers.sig(s.deltaAic()), Numbers.sig(s.bic()), Numbers.sig(s.deltaBic()));
        }
        t.print(out, "  ");
        String aic = table.steps().get(table.bestByAic()).added();
        String bic = table.steps().get(table.bestByBic()).added();
        out.println(aic.equals(bic) ? "  AIC and BIC are smallest with every term down to " + aic + "."
                : "  AIC is smallest with every term down to " + aic + "; BIC with every term down to " + bic + ".");
        out.println();
    }

    private static String join(java.util.List<Integer> ks) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < ks.size(); i++) {
            b.append(i == 0 ? "" : ", ").append(ks.get(i));
        }
        return b.toString();
    }
}
