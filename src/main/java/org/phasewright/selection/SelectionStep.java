package org.phasewright.selection;

/**
 * One row of a nested model-selection table: the model made of every earlier step plus this one.
 *
 * @param added     what this step adds (a term label, or "harmonic k of ...")
 * @param columns   design columns p of the model after this step
 * @param rss       its residual sum of squares
 * @param dof       its residual degrees of freedom n - p
 * @param fStat     nested F statistic against the previous step, ((RSS_prev - RSS) / dp) / (RSS / (n - p));
 *                  NaN for the first step
 * @param df1       dp, the columns added
 * @param pValue    P(F(dp, n - p) >= fStat); NaN for the first step
 * @param aic       AIC of the model (engine definition, noise variance counted)
 * @param bic       BIC of the model
 * @param deltaAic  AIC minus the smallest AIC in the table
 * @param deltaBic  BIC minus the smallest BIC in the table
 */
public record SelectionStep(String added, int columns, double rss, int dof, double fStat, int df1, double pValue,
                            double aic, double bic, double deltaAic, double deltaBic) {
}
