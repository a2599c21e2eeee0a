package org.phasewright.model;

import java.util.List;

/**
 * Report of a harmonic series: each harmonic's amplitude and phase, and the group F-test that all
 * of the series' coefficients are zero.
 */
public record HarmonicSeriesReport(String label, double fundamentalHz, List<SinusoidReport> harmonics, double fStat,
                                   int df1, double pValue, double varianceShare) implements TermReport {
    public HarmonicSeriesReport {
        harmonics = List.copyOf(harmonics);
    }

    @Override
    public String kind() {
        return "harmonic_series";
    }
}
