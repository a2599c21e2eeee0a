package org.phasewright.uncertainty;

import java.util.Locale;

/** How standard errors are computed. */
public enum SeMethod {
    /** s^2 (X'WX)^-1: exact under white noise. */
    PLAIN("plain", "plain least-squares standard errors (white-noise assumption)"),
    /** Least-squares estimates with the covariance implied by an AR(p) model of the residuals. */
    AR_NOISE("ar", "least-squares estimates; standard errors from an AR(p) model of the residual noise"),
    /** Newey-West (Bartlett kernel) heteroskedasticity and autocorrelation consistent covariance. */
    NEWEY_WEST("hac", "Newey-West HAC standard errors, Bartlett kernel, Andrews (1991) automatic bandwidth"),
    /** Sinusoid errors scaled by the residual spectrum near each frequency. */
    LOCAL_SPECTRUM("local_spectrum", "sinusoid standard errors from the residual spectrum near each frequency");

    private final String id;
    private final String description;

    SeMethod(String id, String description) {
        this.id = id;
        this.description = description;
    }

    /** Stable identifier for result files and the command line. */
    public String id() {
        return id;
    }

    /** What the standard errors are, in words (to be shown with every table that uses them). */
    public String description() {
        return description;
    }

    public static SeMethod parse(String text) {
        String k = text.trim().toLowerCase(Locale.ROOT).replace('-', '_');
        for (SeMethod m : values()) {
            if (m.id.equals(k) || m.name().equalsIgnoreCase(k)) {
                return m;
            }
        }
        throw new IllegalArgumentException("unknown standard-error method '" + text + "'; choose one of plain, ar, hac, local_spectrum");
    }
}
