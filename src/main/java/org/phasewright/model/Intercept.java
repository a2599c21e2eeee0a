package org.phasewright.model;

import java.util.List;

/** A constant level: one column of ones. */
public record Intercept() implements TermSpec {
    @Override
    public String label() {
        return "intercept";
    }

    @Override
    public String kind() {
        return "intercept";
    }

    @Override
    public Term bind(BindingContext context) {
        return new ColumnTerm(this, List.of("intercept"), (rows, i, out, at) -> out[at] = 1.0);
    }
}
