package org.phasewright.cli;

import java.util.List;
import java.util.Optional;
import org.phasewright.diagnostics.ResidualReport;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.io.write.ShownInference;
import org.phasewright.refine.Refinement;
import org.phasewright.selection.HarmonicGrowthResult;
import org.phasewright.selection.SelectionTable;
import org.phasewright.uncertainty.RobustResult;

/**
 * Everything {@code fit} found for one record, each part a result of a core entry point.
 *
 * @param record      the record as read
 * @param plan        the final model with the user's frequencies (refined ones when refined)
 * @param fit         the least-squares fit of the final model (at the refined frequencies when refined)
 * @param growth      the harmonic growth ({@code --harmonics auto}), if asked for
 * @param refinement  the frequency refinement ({@code --refine}), if asked for
 * @param robust      the robust fit ({@code --robust}), if asked for
 * @param shown       the term reports and coefficients shown, and which standard errors they carry
 * @param residuals   the residual checks of the fit shown: the robust fit's residuals when {@link #robust()} is
 *                    present, else those of {@link #fit()}; empty when the record is too short for them
 * @param noResidualChecks why there are no residual checks, or null
 * @param comparison  the term-by-term comparison ({@code --compare-terms}), if asked for
 * @param warnings    every warning: the fit's (or the refinement's, which include the fit's), the
 *                    robust fit's and the residual checks'
 */
record Analysis(LoadedRecord record, ModelPlan plan, FitResult fit, Optional<HarmonicGrowthResult> growth,
                Optional<Refinement> refinement, Optional<RobustResult> robust, ShownInference shown,
                Optional<ResidualReport> residuals, String noResidualChecks, Optional<SelectionTable> comparison,
                List<FitWarning> warnings) {

    Analysis {
        warnings = List.copyOf(warnings);
    }

    /** True when a warning with this code was raised. */
    boolean warned(String code) {
        return warnings.stream().anyMatch(w -> w.code().equals(code));
    }

    /** True when the plain least-squares standard errors are shown. */
    boolean plainErrors() {
        return shown.method().equals(Analyst.PLAIN);
    }
}
