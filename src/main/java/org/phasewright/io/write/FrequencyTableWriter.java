package org.phasewright.io.write;

import java.nio.file.Path;
import java.util.List;
import org.phasewright.refine.RefinedFrequency;

/**
 * Writes the table of refined frequencies ({@link org.phasewright.refine.FrequencyRefiner}): one row
 * per refined sinusoid frequency or harmonic-series fundamental. Columns: {@code term} (the term's
 * label in the refined model), {@code kind}, {@code start [Hz]}, {@code frequency [Hz]},
 * {@code frequency SE [Hz]}, {@code frequency 95% CI low [Hz]} and {@code high} at the given level.
 * Numbers are written exactly ({@link CsvCells#number(double)}); the file is written atomically.
 */
public final class FrequencyTableWriter {

    private FrequencyTableWriter() {
    }

    public static List<String> headers(double level) {
        String lvl = CoefficientTableWriter.levelText(level);
        return List.of("term", "kind", "start [Hz]", "frequency [Hz]", "frequency SE [Hz]",
                "frequency " + lvl + " CI low [Hz]", "frequency " + lvl + " CI high [Hz]");
    }

    /**
     * @param level the confidence level the intervals were computed at (the refinement's fit level)
     */
    public static void write(Path target, List<RefinedFrequency> frequencies, double level, boolean replace) {
        List<String> header = headers(level);
        AtomicFile.writeText(target, replace, w -> {
            CsvTableWriter table = new CsvTableWriter(w, header);
            for (RefinedFrequency f : frequencies) {
                table.row(CsvCells.label(f.label()), f.kind(), CsvCells.number(f.startHz()), CsvCells.number(f.frequencyHz()),
                        CsvCells.number(f.stdErrorHz()), CsvCells.number(f.ciLowHz()), CsvCells.number(f.ciHighHz()));
            }
            table.flush();
        });
    }
}
