package org.phasewright.spectrum;

/**
 * Result of the generalised Lomb-Scargle periodogram.
 *
 * @param spectrum              amplitudes of the best floating-mean sinusoid fit at each grid frequency
 * @param power                 normalised power p in [0, 1] at each grid frequency: the fraction of the
 *                              weighted variance about the mean explained by that sinusoid
 *                              (Zechmeister and Kürster 2009, eq. 5)
 * @param topFrequencyHz        grid frequency of the highest power
 * @param topPower              highest normalised power
 * @param falseAlarmProbability probability that white noise alone gives a peak at least this high
 *                              anywhere on the grid, by Baluev (2008) (see {@link LombScargle})
 */
public record UnevenPeriodogram(Spectrum spectrum, double[] power, double topFrequencyHz, double topPower,
                                double falseAlarmProbability) {

    public UnevenPeriodogram {
        power = power.clone();
    }

    @Override
    public double[] power() {
        return power.clone();
    }
}
