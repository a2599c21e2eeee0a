package org.phasewright.cli;

import java.util.Locale;
import org.phasewright.uncertainty.RobustLoss;
import org.phasewright.uncertainty.SeMethod;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Option;
import picocli.CommandLine.TypeConversionException;

/**
 * The options of {@code fit} that go beyond the plain least-squares fit: refining the frequencies,
 * choosing the standard errors, fitting robustly, the residual checks and the term-by-term
 * comparison. Each names a core entry point; {@link Analyst} runs them.
 */
final class CheckOptions {

    @Option(names = "--refine",
            description = "Refine every sinusoid frequency and harmonic-series fundamental by nonlinear least squares"
                    + " and report each with its standard error and interval; the rest of the output is then the fit at"
                    + " the refined frequencies.")
    boolean refine;

    @Option(names = "--errors", paramLabel = "KIND", converter = ErrorsConverter.class, defaultValue = "plain",
            description = "Which standard errors to show: plain (white noise, default), ar (from an AR model of the"
                    + " residual noise; recommended when the residuals are correlated), hac (Newey-West) or"
                    + " local-spectrum (each sinusoid's from the residual spectrum near its frequency).")
    SeMethod errors;

    @Option(names = "--robust", paramLabel = "LOSS", converter = LossConverter.class,
            description = "Fit robustly against spikes and dropouts (iteratively reweighted least squares) with the"
                    + " huber or bisquare loss, and show the robust estimates with their standard errors, the robust fit's"
                    + " summary and residual checks; --out writes its components with each sample's weight.")
    RobustLoss robust;

    @Option(names = "--lags", paramLabel = "N",
            description = "Lags of the residual autocorrelation and the Ljung-Box test (default min(10, n/5)).")
    Integer lags;

    @Option(names = "--compare-terms",
            description = "Add the terms one at a time (a harmonic series one harmonic at a time) and show each step's"
                    + " F-test against the step before, with AIC and BIC.")
    boolean compareTerms;

    /** Checks combinations that parsing alone cannot. */
    void check() {
        if (robust != null && errors != SeMethod.PLAIN) {
            throw new UsageException("--errors " + errors.id().replace('_', '-') + " does not go with --robust: a robust fit"
                    + " shows its own (Huber sandwich) standard errors");
        }
        if (lags != null && lags < 1) {
            throw new UsageException("--lags must be at least 1, got " + lags);
        }
    }

    /** {@code plain}, {@code ar}, {@code hac} or {@code local-spectrum}, read by the core's {@link SeMethod#parse}. */
    static final class ErrorsConverter implements ITypeConverter<SeMethod> {
        @Override
        public SeMethod convert(String value) {
            try {
                return SeMethod.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException("'" + value + "' is not a kind of standard error; choose plain, ar, hac"
                        + " or local-spectrum");
            }
        }
    }

    /** {@code huber} or {@code bisquare}, read by the core's {@link RobustLoss#parse}. */
    static final class LossConverter implements ITypeConverter<RobustLoss> {
        @Override
        public RobustLoss convert(String value) {
            try {
                return RobustLoss.parse(value.toLowerCase(Locale.ROOT));
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException("'" + value + "' is not a robust loss; choose huber or bisquare");
            }
        }
    }
}
