package org.phasewright.model;

import java.util.List;

/**
 * A level shift at time {@code timeSeconds}: one column that is 0 before the step and 1 from it on.
 * Its coefficient is the size of the shift.
 */
public record Step(double timeSeconds) implements TermSpec {
    public Step {
        if (!Double.isFinite(timeSeconds)) {
            throw new IllegalArgumentException("step time must be finite, got " + timeSeconds);
        }
    }

    @Override
    public String label() {
        return "step at " + Double.toString(timeSeconds).replaceAll("\\.0$", "") + " s";
    }

    @Override
    public String kind() {
        return "step";
    }

    @Override
    public Term bind(BindingContext context) {
        if (!(timeSeconds > context.firstTime() && timeSeconds <= context.lastTime())) {
            throw new ModelException("the " + label() + " lies outside the observed record ("
                    + context.firstTime() + " s to " + context.lastTime() + " s), so it cannot be estimated");
        }
        double t0 = timeSeconds;
        return new ColumnTerm(this, List.of(label()), (rows, i, out, at) -> out[at] = rows.time(i) >= t0 ? 1.0 : 0.0);
    }
}
