package org.phasewright.fit;

/**
 * Something the user must know about a fit, as a value: a stable lower-case {@code code} for
 * programs and a {@code message} in words for people. Every front end shows the message as is.
 */
public record FitWarning(String code, String message) {
    public static final String ILL_CONDITIONED = "ill_conditioned";
    public static final String EXACT_FIT = "exact_fit";
    public static final String CLOSE_FREQUENCIES = "close_frequencies";
    public static final String FEW_CYCLES = "few_cycles";
    public static final String FEW_RESIDUAL_DOF = "few_residual_dof";
    public static final String ROUNDING_LEVEL_RESIDUALS = "rounding_level_residuals";
}
