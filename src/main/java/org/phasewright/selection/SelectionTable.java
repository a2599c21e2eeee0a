package org.phasewright.selection;

import java.util.List;
import org.phasewright.model.ModelSpec;

/**
 * A nested model-selection table.
 *
 * @param steps     one row per added term or harmonic, in order
 * @param models    the model after each step (same order)
 * @param bestByAic index of the step with the smallest AIC
 * @param bestByBic index of the step with the smallest BIC
 */
public record SelectionTable(List<SelectionStep> steps, List<ModelSpec> models, int bestByAic, int bestByBic) {

    public SelectionTable {
        steps = List.copyOf(steps);
        models = List.copyOf(models);
    }
}
