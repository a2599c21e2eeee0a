package org.phasewright.io.write;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.phasewright.fit.Component;
import org.phasewright.fit.Components;
import org.phasewright.fit.FitResult;
import org.phasewright.series.Series;
import org.phasewright.uncertainty.RobustResult;

/**
 * Writes the fit laid out along the record: one row per sample with {@code time [s]},
 * {@code time [UTC]} (ISO-8601, for timestamped input), {@code observed}, {@code fitted},
 * {@code residual}, then one column per term of the model in model order (trend curve, each
 * sinusoid, each harmonic series summed over its harmonics, steps, covariate contributions and
 * the intercept). Headers follow {@link Headers}: the engine's label of the component (which
 * carries its frequency, e.g. {@code sinusoid 50 Hz}) then the signal's unit in brackets;
 * covariate contributions are headed {@code covariate <name>} so they cannot be mistaken for
 * the measured covariate. Gaps are empty cells in observed and residual. A robust fit's components
 * end with a {@code weight} column, each sample's final robustness weight. Cost: O(n x parts).
 */
public final class ComponentsCsvWriter {

    /** Header of the robustness-weight column of a robust fit's components. */
    public static final String WEIGHT = "weight";

    private ComponentsCsvWriter() {
    }

    /** The column headers for this fit and series. */
    public static List<String> headers(FitResult fit, Series data) {
        return headers(fit.components(), data, false);
    }

    /** The column headers for this robust fit and series (the components' columns, then {@code weight}). */
    public static List<String> headers(RobustResult fit, Series data) {
        return headers(fit.components(), data, true);
    }

    /** Writes the least-squares fit along the record. */
    public static void write(Path target, FitResult fit, Series data, boolean replace) {
        write(target, fit.components(), null, data, replace);
    }

    /**
     * Writes the robust fit along the record: its own fitted values, residuals and parts (from the robust
     * coefficients), then a last column {@code weight} with each sample's final robustness weight (1 full
     * weight, 0 rejected; empty where the sample did not enter the fit).
     */
    public static void write(Path target, RobustResult fit, Series data, boolean replace) {
        write(target, fit.components(), fit.weights(), data, replace);
    }

    private static List<String> headers(Components comp, Series data, boolean weight) {
        String unit = data.unit();
        List<String> h = new ArrayList<>();
        h.add("time [s]");
        if (data.origin().isPresent()) {
            h.add("time [UTC]");
        }
        h.add(Headers.withUnit("observed", unit));
        h.add(Headers.withUnit("fitted", unit));
        h.add(Headers.withUnit("residual", unit));
        for (Component c : comp.parts()) {
            String label = c.kind().equals("covariate") ? "covariate " + c.label() : c.label();
            h.add(Headers.withUnit(label, unit));
        }
        if (weight) {
            h.add(WEIGHT);
        }
        return h;
    }

    private static void write(Path target, Components comp, double[] weights, Series data, boolean replace) {
        List<String> header = headers(comp, data, weights != null);
        Instant origin = data.origin().orElse(null);
        List<Component> parts = comp.parts();
        double[] t = comp.times();
        double[] obs = comp.observed();
        double[] fitted = comp.fitted();
        double[] res = comp.residual();
        AtomicFile.writeText(target, replace, w -> {
            CsvTableWriter table = new CsvTableWriter(w, header);
            for (int i = 0; i < t.length; i++) {
                table.cell(CsvCells.number(t[i]));
                if (origin != null) {
                    table.cell(Headers.instantAt(origin, t[i]));
                }
                table.cell(CsvCells.number(obs[i]));
                table.cell(CsvCells.number(fitted[i]));
                table.cell(CsvCells.number(res[i]));
                for (Component c : parts) {
                    table.cell(CsvCells.number(c.values()[i]));
                }
                if (weights != null) {
                    table.cell(CsvCells.number(weights[i]));
                }
                table.endRow();
            }
            table.flush();
        });
    }
}
