package org.phasewright.fit;

/**
 * The fitted model at new times: the mean, a confidence interval for the mean
 * (x0' b -/+ t* s sqrt(x0' C x0)) and a prediction interval for one new observation
 * (x0' b -/+ t* s sqrt(1 + x0' C x0)), at the fit's confidence level.
 */
public record Prediction(double[] times, double[] mean, double[] meanLow, double[] meanHigh, double[] newLow,
                         double[] newHigh) {
}
