package org.phasewright.analysis;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import org.phasewright.fit.Component;
import org.phasewright.fit.FitResult;
import org.phasewright.series.Series;

/**
 * Removes chosen components from a record: cleaned = observed - the sum of the chosen terms'
 * parts, sample by sample, using the parts the fit already computed (no statistic is recomputed).
 * Gaps stay gaps. Cost O(n x chosen terms).
 */
public final class Cleaning {
    private Cleaning() {
    }

    /**
     * The record with the components labelled {@code labels} subtracted.
     *
     * @throws IllegalArgumentException naming the unknown label and the available ones
     */
    public static Series remove(Series record, FitResult fit, Collection<String> labels) {
        if (fit.components().times().length != record.size()) {
            throw new IllegalArgumentException("the fit was made on a record of " + fit.components().times().length
                    + " samples, not on this one of " + record.size());
        }
        List<Component> chosen = new ArrayList<>();
        for (String label : labels) {
            chosen.add(find(fit, label));
        }
        double[] v = record.values();
        for (Component c : chosen) {
            double[] part = c.values();
            for (int i = 0; i < v.length; i++) {
                v[i] -= part[i];
            }
        }
        return record.withValues(v);
    }

    /** The record with every periodic component (sinusoids and harmonic series) subtracted. */
    public static Series removePeriodic(Series record, FitResult fit) {
        List<String> labels = new ArrayList<>();
        for (Component c : fit.components().parts()) {
            if (c.kind().equals("sinusoid") || c.kind().equals("harmonic_series")) {
                labels.add(c.label());
            }
        }
        return remove(record, fit, labels);
    }

    private static Component find(FitResult fit, String label) {
        for (Component c : fit.components().parts()) {
            if (c.label().equals(label)) {
                return c;
            }
        }
        List<String> names = fit.components().parts().stream().map(Component::label).toList();
        throw new IllegalArgumentException("the fit has no component '" + label + "'; it has " + String.join(", ", names));
    }
}
