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
        return new ColumnTerm(this, List.of("intercept"), (rows, i, out, at) -> out[at] = 1.0) {
            /** A constant explains none of the variation about the mean: its share is not applicable (NaN). */
            @Override
            public TermReport report(TermInference inf) {
                ScalarReport r = (ScalarReport) super.report(inf);
                return new ScalarReport(r.label(), r.kind(), r.estimate(), r.stdError(), r.ciLow(), r.ciHigh(), r.t(),
                        r.fStat(), r.pValue(), Double.NaN);
            }
        };
    }
}
