package org.phasewright.selection;

import java.util.List;
import org.phasewright.model.ModelSpec;

/**
 * Result of growing a harmonic series while its harmonics stay significant.
 *
 * @param model      the chosen model (base terms plus the harmonic series with the kept harmonics)
 * @param kept       harmonic numbers kept
 * @param table      every harmonic tried, each against the model before it
 * @param stopReason why growth stopped, in words
 */
public record HarmonicGrowthResult(ModelSpec model, List<Integer> kept, SelectionTable table, String stopReason) {

    public HarmonicGrowthResult {
        kept = List.copyOf(kept);
    }
}
