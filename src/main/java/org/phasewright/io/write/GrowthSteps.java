package org.phasewright.io.write;

import java.util.List;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.TermSpec;
import org.phasewright.selection.HarmonicGrowthResult;

/**
 * What each row of a harmonic-growth table tried, read from the row's model: each trial model adds
 * the harmonic series last, with the tried harmonic as its highest. Shared by the result JSON and the
 * readable reports so both name the rows alike. O(1) per call.
 */
public final class GrowthSteps {

    private GrowthSteps() {
    }

    /** The fundamental the growth tried, in hertz; NaN when no harmonic was tried. */
    public static double fundamentalHz(HarmonicGrowthResult g) {
        List<ModelSpec> models = g.table().models();
        if (models.size() < 2) {
            return Double.NaN;
        }
        List<TermSpec> trial = models.get(1).terms();
        return trial.get(trial.size() - 1) instanceof HarmonicSeries h ? h.fundamentalHz() : Double.NaN;
    }

    /** The harmonic number that row {@code i} of the table tried (0 for the base model). */
    public static int harmonic(HarmonicGrowthResult g, int i) {
        List<TermSpec> trial = g.table().models().get(i).terms();
        return i > 0 && trial.get(trial.size() - 1) instanceof HarmonicSeries h ? h.harmonics() : 0;
    }
}
