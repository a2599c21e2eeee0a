package org.phasewright.model;

import java.util.List;

/**
 * A term of one column given cell by cell (intercept, step, covariate). Its report is the single
 * coefficient with its standard error, interval and t-test.
 */
class ColumnTerm implements Term {

    /** Evaluates the column at row {@code i}, writing to {@code out[at]}. */
    interface Cell {
        void eval(Rows rows, int i, double[] out, int at);
    }

    private final TermSpec spec;
    private final List<String> names;
    private final Cell cell;
    private final List<String> covariates;

    ColumnTerm(TermSpec spec, List<String> names, Cell cell) {
        this(spec, names, cell, List.of());
    }

    ColumnTerm(TermSpec spec, List<String> names, Cell cell, List<String> covariates) {
        this.spec = spec;
        this.names = names;
        this.cell = cell;
        this.covariates = covariates;
    }

    @Override
    public TermSpec spec() {
        return spec;
    }

    @Override
    public List<String> columnNames() {
        return names;
    }

    @Override
    public List<String> covariatesUsed() {
        return covariates;
    }

    @Override
    public void fill(Rows rows, int from, int to, double[] out, int stride, int offset) {
        for (int i = from, at = offset; i < to; i++, at += stride) {
            cell.eval(rows, i, out, at);
        }
    }

    @Override
    public TermReport report(TermInference inf) {
        double b = inf.estimate(0);
        double se = inf.stdError(0);
        double t = b / se;
        double half = inf.tCritical() * se;
        GroupTest g = inf.groupTest();
        return new ScalarReport(label(), kind(), b, se, b - half, b + half, t, g.fStat(), inf.twoSidedP(t),
                g.varianceShare());
    }
}
