package org.phasewright.model;

import java.util.ArrayList;
import java.util.List;

/**
 * A polynomial trend of degree d in time, as Legendre polynomials P1..Pd of time scaled to
 * [-1, 1] over the observed span (P0 too when the model has no intercept). Legendre polynomials
 * are orthogonal on [-1, 1], so even high degrees stay well conditioned on evenly spread samples
 * (Abramowitz and Stegun 22.7.10 for the recurrence (k+1) P(k+1) = (2k+1) u P(k) - k P(k-1)).
 */
public record PolynomialTrend(int degree) implements TermSpec {
    public PolynomialTrend {
        if (degree < 1 || degree > 60) {
            throw new IllegalArgumentException("trend degree must lie in 1..60, got " + degree);
        }
    }

    @Override
    public String label() {
        return "polynomial trend of degree " + degree;
    }

    @Override
    public String kind() {
        return "polynomial_trend";
    }

    @Override
    public Term bind(BindingContext context) {
        boolean withConstant = !context.hasIntercept();
        List<String> names = new ArrayList<>();
        for (int k = withConstant ? 0 : 1; k <= degree; k++) {
            names.add("trend.P" + k);
        }
        int d = degree;
        return new TrendTerm(this, names, context) {
            @Override
            void basis(double u, double[] out, int at) {
                double prev = 1;
                double cur = u;
                int j = at;
                if (withConstant) {
                    out[j++] = 1;
                }
                out[j++] = u;
                for (int k = 1; k < d; k++) {
                    double next = ((2 * k + 1) * u * cur - k * prev) / (k + 1);
                    prev = cur;
                    cur = next;
                    out[j++] = cur;
                }
            }
        };
    }
}
