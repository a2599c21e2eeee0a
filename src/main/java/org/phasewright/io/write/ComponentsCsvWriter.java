package org.phasewright.io.write;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.phasewright.fit.Component;
import org.phasewright.fit.Components;
import org.phasewright.fit.FitResult;
import org.phasewright.series.Series;

/**
 * Writes the fit laid out along the record: one row per sample with {@code time [s]},
 * {@code time [UTC]} (ISO-8601, for timestamped input), {@code observed}, {@code fitted},
 * {@code residual}, then one column per term of the model in model order (trend curve, each
 * sinusoid, each harmonic series summed over its harmonics, steps, covariate contributions and
 * the intercept). Headers follow {@link Headers}: the engine's label of the component (which
 * carries its frequency, e.g. {@code sinusoid 50 Hz}) then the signal's unit in brackets;
 * covariate contributions are headed {@code covariate <name>} so they cannot be mistaken for
 * the measured covariate. Gaps are empty cells in observed and residual. Cost: O(n x parts).
 */
public final class ComponentsCsvWriter {

    private ComponentsCsvWriter() {
    }

    /** The column headers for this fit and series. */
    public static List<String> headers(FitResult fit, Series data) {
        String unit = data.unit();
        List<String> h = new ArrayList<>();
        h.add("time [s]");
        if (data.origin().isPresent()) {
            h.add("time [UTC]");
        }
        h.add(Headers.withUnit("observed", unit));
        h.add(Headers.withUnit("fitted", unit));
        h.add(Headers.withUnit("residual", unit));
        for (Component c : fit.components().parts()) {
            String label = c.kind().equals("covariate") ? "covariate " + c.label() : c.label();
            h.add(Headers.withUnit(label, unit));
        }
        return h;
    }

    public static void write(Path target, FitResult fit, Series data, boolean replace) {
        Components comp = fit.components();
        List<String> header = headers(fit, data);
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
                table.endRow();
            }
            table.flush();
        });
    }
}
