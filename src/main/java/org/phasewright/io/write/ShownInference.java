package org.phasewright.io.write;

import java.util.List;
import java.util.Objects;
import org.phasewright.fit.CoefficientEstimate;
import org.phasewright.fit.FitResult;
import org.phasewright.model.TermReport;

/**
 * Which standard errors a written result shows, with the term reports and coefficients computed
 * with them: the plain least-squares ones of a {@link FitResult}, corrected ones (e.g. for
 * autocorrelated noise) or those of a robust fit. The writers take these in place of the fit's own
 * and name the method beside them; nothing is recomputed.
 *
 * @param method       stable identifier for programs, e.g. {@code plain}, {@code ar}, {@code robust_huber}
 * @param description  the same in words, for people
 * @param terms        one report per term, in model order
 * @param coefficients one entry per design column
 * @param dof          degrees of freedom of the t and F references behind the p-values and intervals
 */
public record ShownInference(String method, String description, List<TermReport> terms,
                             List<CoefficientEstimate> coefficients, int dof) {

    public ShownInference {
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(description, "description");
        terms = List.copyOf(terms);
        coefficients = List.copyOf(coefficients);
    }

    /** The fit's own terms and coefficients, under the given method name and description. */
    public static ShownInference of(FitResult fit, String method, String description) {
        return new ShownInference(method, description, fit.terms(), fit.coefficients(), fit.dof());
    }
}
