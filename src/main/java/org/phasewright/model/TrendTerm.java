package org.phasewright.model;

import java.util.List;

/**
 * Common part of the trend terms: time mapped to u in [-1, 1] over the observed span, a basis
 * evaluated at u, reported as a group (joint F-test and share of variance).
 */
abstract class TrendTerm implements Term {
    private final TermSpec spec;
    private final List<String> names;
    private final double start;
    private final double halfSpan;

    TrendTerm(TermSpec spec, List<String> names, BindingContext context) {
        this.spec = spec;
        this.names = List.copyOf(names);
        this.start = context.firstTime();
        double span = context.lastTime() - context.firstTime();
        this.halfSpan = span > 0 ? span / 2 : 1;
    }

    /** Maps a time in seconds to the trend's coordinate u (in [-1, 1] over the fitted span). */
    final double scaled(double t) {
        return (t - start) / halfSpan - 1;
    }

    @Override
    public final TermSpec spec() {
        return spec;
    }

    @Override
    public final List<String> columnNames() {
        return names;
    }

    /** Writes the basis at coordinate {@code u} into {@code out[at..at+columns-1]}. */
    abstract void basis(double u, double[] out, int at);

    @Override
    public final void fill(Rows rows, int from, int to, double[] out, int stride, int offset) {
        for (int i = from, at = offset; i < to; i++, at += stride) {
            basis(scaled(rows.time(i)), out, at);
        }
    }

    @Override
    public final TermReport report(TermInference inf) {
        GroupTest g = inf.groupTest();
        return new GroupReport(label(), kind(), columns(), g.fStat(), g.df1(), g.pValue(), g.varianceShare());
    }
}
