package org.phasewright.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.phasewright.diagnostics.ResidualDiagnostics;
import org.phasewright.diagnostics.ResidualReport;

/**
 * The residual checks of the readable report, one line each: Durbin-Watson, the autocorrelation up
 * to the chosen lag with the lags outside the white-noise band named, Ljung-Box and Jarque-Bera with
 * their p-values and a verdict in words that follows the diagnostics' own warnings. Prints fields of
 * the {@link ResidualReport}.
 */
final class ResidualCheckReport {

    private ResidualCheckReport() {
    }

    static void print(PrintWriter out, Analysis a) {
        boolean uneven = !a.record().series().isUniform();
        out.println("Residual checks  (" + (a.robust().isPresent() ? "residuals of the robust fit" : "residuals")
                + (uneven ? "; lags count samples, not equal times, as the sampling is uneven" : "") + ")");
        if (a.residuals().isEmpty()) {
            out.println("  None: " + ErrorHandler.sentence(a.noResidualChecks()));
            out.println();
            return;
        }
        ResidualReport r = a.residuals().get();
        double[] acf = r.autocorrelation();
        TextTable t = new TextTable(2, "", "");
        t.row("Durbin-Watson", Numbers.sig(r.durbinWatson()) + "  (2 when neighbouring residuals are uncorrelated, below 2"
                + " when they move together)");
        t.row("autocorrelation", "lags 1-" + acf.length + ": " + values(acf));
        List<String> outside = new ArrayList<>();
        for (int k = 0; k < acf.length; k++) {
            if (Math.abs(acf[k]) > r.band()) {
                outside.add(Integer.toString(k + 1));
            }
        }
        t.row("", "white noise stays within +-" + Numbers.sig(r.band()) + " at about 95 % of lags; "
                + (outside.isEmpty() ? "every lag does" : "outside: lag" + (outside.size() > 1 ? "s " : " ")
                + String.join(", ", outside)));
        boolean correlated = r.warnings().stream().anyMatch(w -> w.code().equals(ResidualDiagnostics.AUTOCORRELATED));
        t.row("Ljung-Box", "Q = " + Numbers.sig(r.ljungBox().statistic()) + " on " + r.ljungBox().dof() + " lags, p "
                + Numbers.pRelation(r.ljungBox().pValue()) + ": " + (correlated ? "the residuals are autocorrelated"
                : Double.isNaN(r.ljungBox().pValue()) ? "not defined" : "no clear sign of autocorrelation"));
        boolean nonNormal = r.warnings().stream().anyMatch(w -> w.code().equals(ResidualDiagnostics.NON_NORMAL));
        t.row("Jarque-Bera", Numbers.sig(r.jarqueBera().statistic()) + ", p " + Numbers.pRelation(r.jarqueBera().pValue())
                + " (skewness " + Numbers.sig(r.jarqueBera().skewness()) + ", kurtosis " + Numbers.sig(r.jarqueBera().kurtosis())
                + "): " + (nonNormal ? "the residuals are not normal"
                : Double.isNaN(r.jarqueBera().pValue()) ? "not defined" : "consistent with normal noise"));
        t.printRows(out, "  ");
        out.println();
    }

    private static String values(double[] acf) {
        StringBuilder b = new StringBuilder();
        for (int k = 0; k < acf.length; k++) {
            b.append(k == 0 ? "" : " ").append(Double.isNaN(acf[k]) ? "n/a" : String.format(Locale.ROOT, "%.3f", acf[k]));
        }
        return b.toString();
    }
}
