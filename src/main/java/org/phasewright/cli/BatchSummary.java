package org.phasewright.cli;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.ScalarReport;
import org.phasewright.model.SinusoidReport;
import org.phasewright.model.TermReport;
import org.phasewright.refine.RefinedFrequency;

/**
 * The summary CSV of a batch fit: one row per input file. Fixed columns {@code file, status,
 * exit_code, message, n, p, dof, residual_sd, r_squared, warnings}, then {@code standard_errors}
 * (which the numbers carry), the refined frequencies with their standard errors ({@code --refine}:
 * {@code <fundamental|frequency> from <start> Hz frequency_hz}, {@code frequency_se_hz}), the residual
 * checks ({@code durbin_watson}, {@code ljung_box_p}, {@code jarque_bera_p}), then for every periodic
 * component found in any file ({@code <component> amplitude}, {@code amplitude_se},
 * {@code phase_deg}, {@code phase_se_deg}, {@code p_value}) and every one-column term
 * ({@code <term> estimate}, {@code std_error}), in the order they first appear. A file that could
 * not be fitted gets a row with status {@code failed}, its exit code and the message, and empty
 * numbers. Numbers are written in full precision ({@link Double#toString}); missing ones are empty.
 */
final class BatchSummary {
    private static final List<String> FIXED = List.of("file", "status", "exit_code", "message", "n", "p", "dof",
            "residual_sd", "r_squared", "warnings");

    private final List<Map<String, String>> rows = new ArrayList<>();
    private final Set<String> columns = new LinkedHashSet<>(FIXED);

    void ok(String file, Analysis a) {
        FitResult r = a.fit();
        Map<String, String> row = new LinkedHashMap<>();
        row.put("file", file);
        row.put("status", "ok");
        row.put("exit_code", "0");
        row.put("message", "");
        row.put("n", Integer.toString(r.n()));
        row.put("p", Integer.toString(r.p()));
        row.put("dof", Integer.toString(r.dof()));
        row.put("residual_sd", num(r.residualSd()));
        row.put("r_squared", num(r.rSquared()));
        row.put("warnings", a.warnings().stream().map(FitWarning::message).collect(Collectors.joining("; ")));
        put(row, "standard_errors", a.shown().method());
        a.refinement().ifPresent(ref -> {
            for (RefinedFrequency f : ref.frequencies()) {
                String name = (f.kind().equals("harmonic_series") ? "fundamental " : "frequency ") + "from "
                        + Numbers.hertz(f.startHz()) + " Hz";
                put(row, name + " frequency_hz", num(f.frequencyHz()));
                put(row, name + " frequency_se_hz", num(f.stdErrorHz()));
            }
        });
        a.residuals().ifPresent(d -> {
            put(row, "durbin_watson", num(d.durbinWatson()));
            put(row, "ljung_box_p", num(d.ljungBox().pValue()));
            put(row, "jarque_bera_p", num(d.jarqueBera().pValue()));
        });
        for (TermReport t : a.shown().terms()) {
            if (t instanceof SinusoidReport s) {
                sinusoid(row, s.label(), s);
            } else if (t instanceof HarmonicSeriesReport h) {
                for (SinusoidReport s : h.harmonics()) {
                    sinusoid(row, "harmonic " + s.harmonic() + " of " + Numbers.hertz(h.fundamentalHz()) + " Hz", s);
                }
            } else if (t instanceof ScalarReport s) {
                put(row, s.label() + " estimate", num(s.estimate()));
                put(row, s.label() + " std_error", num(s.stdError()));
            }
        }
        rows.add(row);
    }

    void failed(String file, int exitCode, String message) {
        Map<String, String> row = new LinkedHashMap<>();
        row.put("file", file);
        row.put("status", "failed");
        row.put("exit_code", Integer.toString(exitCode));
        row.put("message", message);
        rows.add(row);
    }

    int size() {
        return rows.size();
    }

    private void sinusoid(Map<String, String> row, String name, SinusoidReport s) {
        put(row, name + " amplitude", num(s.amplitude()));
        put(row, name + " amplitude_se", num(s.amplitudeSe()));
        put(row, name + " phase_deg", num(s.phaseDeg()));
        put(row, name + " phase_se_deg", num(s.phaseSeDeg()));
        put(row, name + " p_value", num(s.pValue()));
    }

    private void put(Map<String, String> row, String column, String value) {
        columns.add(column);
        row.put(column, value);
    }

    private static String num(double v) {
        return Double.isNaN(v) ? "" : Double.toString(v);
    }

    void write(Writer w) throws IOException {
        CSVFormat format = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();
        // not closed here: the caller owns the writer (an atomic file, or standard output)
        CSVPrinter p = new CSVPrinter(w, format);
        p.printRecord(columns);
        for (Map<String, String> row : rows) {
            List<String> cells = new ArrayList<>();
            for (String c : columns) {
                cells.add(row.getOrDefault(c, ""));
            }
            p.printRecord(cells);
        }
        p.flush();
    }
}
