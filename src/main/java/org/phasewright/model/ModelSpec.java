package org.phasewright.model;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The list of terms a fit is asked for, in column order. A plain value that can be saved and
 * loaded so the same model can be fitted to new records.
 */
public record ModelSpec(List<TermSpec> terms) {
    public ModelSpec {
        terms = List.copyOf(terms);
        Set<String> seen = new HashSet<>();
        for (TermSpec t : terms) {
            if (!seen.add(t.label())) {
                throw new IllegalArgumentException("the model lists the " + t.label() + " twice");
            }
        }
    }

    public static ModelSpec of(TermSpec... terms) {
        return new ModelSpec(List.of(terms));
    }

    /** True when the model has an {@link Intercept} term. */
    public boolean hasIntercept() {
        return terms.stream().anyMatch(t -> t instanceof Intercept);
    }

    /** A copy with one more term at the end. */
    public ModelSpec plus(TermSpec term) {
        List<TermSpec> t = new ArrayList<>(terms);
        t.add(term);
        return new ModelSpec(t);
    }

    /** A copy without the term with this label. */
    public ModelSpec without(String label) {
        List<TermSpec> t = new ArrayList<>(terms);
        t.removeIf(x -> x.label().equals(label));
        return new ModelSpec(t);
    }
}
