package org.phasewright.model;

import java.util.List;

/**
 * Another measured channel as a regression column, raised to a whole power (1 for the channel
 * itself; 2, 3, ... for polynomial-in-x models). Powers are raw, so high powers of a column with a
 * large offset are ill-conditioned; the fit scales columns and reports the condition number.
 */
public record Covariate(String column, int power) implements TermSpec {
    public Covariate {
        if (column == null || column.isBlank()) {
            throw new IllegalArgumentException("a covariate needs a column name");
        }
        if (power < 1 || power > 30) {
            throw new IllegalArgumentException("covariate power must lie in 1..30, got " + power);
        }
    }

    public Covariate(String column) {
        this(column, 1);
    }

    @Override
    public String label() {
        return power == 1 ? column : column + "^" + power;
    }

    @Override
    public String kind() {
        return "covariate";
    }

    @Override
    public Term bind(BindingContext context) {
        context.requireCovariate(column);
        String name = column;
        int k = power;
        return new ColumnTerm(this, List.of(label()), (rows, i, out, at) -> {
            double x = rows.covariate(name, i);
            double v = x;
            for (int j = 1; j < k; j++) {
                v *= x;
            }
            out[at] = v;
        }, List.of(column));
    }
}
