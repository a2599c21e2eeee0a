package org.phasewright.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.phasewright.series.Series;

/**
 * A model bound to a record: the terms in column order, their column offsets, and the rows that
 * enter the fit. The design matrix X is never stored here; {@link #fillRows} evaluates any block
 * of rows on demand, so the same design serves a dense fit of a thousand samples and a streaming
 * fit of a hundred million.
 *
 * <p>A row enters the fit when its value is not a gap, its weight is positive and every covariate
 * the model reads is present. Cost of {@code fillRows}: O(rows x p) with a small constant (one
 * cos/sin per sinusoid, one per harmonic series plus a recurrence).
 */
public final class Design {
    private final ModelSpec spec;
    private final List<Term> terms;
    private final int[] offsets;
    private final List<String> columnNames;
    private final boolean[] included;
    private final int includedCount;

    private Design(ModelSpec spec, List<Term> terms, boolean[] included, int includedCount) {
        this.spec = spec;
        this.terms = List.copyOf(terms);
        this.offsets = new int[terms.size() + 1];
        List<String> names = new ArrayList<>();
        for (int i = 0; i < terms.size(); i++) {
            offsets[i + 1] = offsets[i] + terms.get(i).columns();
            names.addAll(terms.get(i).columnNames());
        }
        this.columnNames = Collections.unmodifiableList(names);
        this.included = included;
        this.includedCount = includedCount;
    }

    /** Binds every term of {@code spec} to {@code series}. */
    public static Design bind(ModelSpec spec, Series series) {
        if (spec.terms().isEmpty()) {
            throw new ModelException("the model has no terms to fit");
        }
        Set<String> covariates = new LinkedHashSet<>();
        for (TermSpec t : spec.terms()) {
            if (t instanceof Covariate c) {
                covariates.add(c.column());
            }
        }
        for (String c : covariates) {
            if (!series.hasCovariate(c)) {
                throw new ModelException("the model asks for covariate '" + c + "', but the record has "
                        + (series.covariateNames().isEmpty() ? "no covariate columns"
                        : "only " + String.join(", ", series.covariateNames())));
            }
        }
        int n = series.size();
        boolean[] inc = new boolean[n];
        int count = 0;
        for (int i = 0; i < n; i++) {
            boolean ok = !series.isMissing(i) && series.weightAt(i) > 0;
            for (String c : covariates) {
                ok &= Double.isFinite(series.covariateAt(c, i));
            }
            inc[i] = ok;
            if (ok) {
                count++;
            }
        }
        double[] times = new double[count];
        for (int i = 0, j = 0; i < n; i++) {
            if (inc[i]) {
                times[j++] = series.timeAt(i);
            }
        }
        BindingContext context = new BindingContext(series, times, spec.hasIntercept());
        List<Term> bound = new ArrayList<>();
        for (TermSpec t : spec.terms()) {
            bound.add(t.bind(context));
        }
        return new Design(spec, bound, inc, count);
    }

    public ModelSpec spec() {
        return spec;
    }

    public List<Term> terms() {
        return terms;
    }

    /** Number of columns p. */
    public int p() {
        return offsets[terms.size()];
    }

    /** First column of term {@code index}. */
    public int offset(int index) {
        return offsets[index];
    }

    public List<String> columnNames() {
        return columnNames;
    }

    /** True when row {@code i} of the record enters the fit. */
    public boolean isIncluded(int i) {
        return included[i];
    }

    /** Number of rows that enter the fit. */
    public int includedCount() {
        return includedCount;
    }

    /** Fills rows {@code from..to-1} of the series' design into {@code out} (row-major, p per row). */
    public void fillRows(Series series, int from, int to, double[] out) {
        fillRows(Rows.of(series), from, to, out);
    }

    /** Fills rows {@code from..to-1} of {@code rows} into {@code out} (row-major, p per row). */
    public void fillRows(Rows rows, int from, int to, double[] out) {
        int p = p();
        if (out.length < (long) (to - from) * p) {
            throw new IllegalArgumentException("block of " + (to - from) + " rows needs " + (to - from) * p + " values");
        }
        for (int k = 0; k < terms.size(); k++) {
            terms.get(k).fill(rows, from, to, out, p, offsets[k]);
        }
    }

    /** The design rows at bare times (models without covariates), row-major. */
    public double[] rowsAt(double[] times) {
        double[] out = new double[times.length * p()];
        fillRows(Rows.atTimes(times), 0, times.length, out);
        return out;
    }

    /** Index of the term that owns column {@code column}. */
    public int termOfColumn(int column) {
        for (int k = 0; k < terms.size(); k++) {
            if (column < offsets[k + 1]) {
                return k;
            }
        }
        throw new IndexOutOfBoundsException(column);
    }
}
