package org.phasewright.model;

import java.util.ArrayList;
import java.util.List;

/**
 * A smooth trend as a cubic spline in time with {@code interiorKnots} interior knots, evenly
 * spaced or at quantiles of the observed sample times.
 *
 * <p>Cubic B-splines (de Boor, A Practical Guide to Splines, 1978; evaluation by the Cox-de Boor
 * recurrence as in Piegl and Tiller, The NURBS Book, algorithm A2.2) on a clamped knot vector give
 * k + 4 basis functions; they sum to one, so the first is left out when the model has an
 * intercept. A natural cubic spline (linear beyond the boundary knots) uses the truncated-power
 * basis of Hastie, Tibshirani and Friedman, The Elements of Statistical Learning, eq. 5.4-5.5:
 * u and d_j(u) - d_(K-1)(u) with K = k + 2 knots, k + 1 columns (plus a constant when the model has
 * no intercept). Both work on time scaled to [-1, 1]. Cost: O(1) per row and column.
 */
public record SplineTrend(int interiorKnots, KnotPlacement placement, boolean natural) implements TermSpec {
    public SplineTrend {
        if (interiorKnots < 0 || interiorKnots > 500) {
            throw new IllegalArgumentException("interior knots must number 0..500, got " + interiorKnots);
        }
        if (placement == null) {
            placement = KnotPlacement.EVEN;
        }
        if (natural && interiorKnots < 1) {
            throw new IllegalArgumentException("a natural spline needs at least 1 interior knot");
        }
    }

    /** A cubic B-spline trend with evenly spaced knots. */
    public SplineTrend(int interiorKnots) {
        this(interiorKnots, KnotPlacement.EVEN, false);
    }

    @Override
    public String label() {
        return (natural ? "natural spline trend, " : "spline trend, ") + interiorKnots + " knots";
    }

    @Override
    public String kind() {
        return "spline_trend";
    }

    @Override
    public Term bind(BindingContext context) {
        double a = context.firstTime();
        double b = context.lastTime();
        if (!(b > a)) {
            throw new ModelException("a spline trend needs a record that spans some time");
        }
        double[] interior = new double[interiorKnots];
        for (int j = 0; j < interiorKnots; j++) {
            double q = (j + 1.0) / (interiorKnots + 1.0);
            double t = placement == KnotPlacement.EVEN ? a + q * (b - a) : context.timeQuantile(q);
            interior[j] = 2 * (t - a) / (b - a) - 1;
            if (j > 0 && !(interior[j] > interior[j - 1])) {
                throw new ModelException("the " + label() + " has coincident knots; the samples are too few or too"
                        + " clustered for that many knots");
            }
        }
        return natural ? naturalTerm(context, interior) : bsplineTerm(context, interior);
    }

    private Term bsplineTerm(BindingContext context, double[] interior) {
        int k = interior.length;
        double[] knots = new double[k + 8];
        for (int i = 0; i < 4; i++) {
            knots[i] = -1;
            knots[k + 4 + i] = 1;
        }
        System.arraycopy(interior, 0, knots, 4, k);
        int count = k + 4;
        int first = context.hasIntercept() ? 1 : 0;
        List<String> names = new ArrayList<>();
        for (int j = first; j < count; j++) {
            names.add("trend.B" + j);
        }
        return new TrendTerm(this, names, context) {
            private final double[] values = new double[4];
            private final double[] left = new double[4];
            private final double[] right = new double[4];

            @Override
            void basis(double u, double[] out, int at) {
                for (int j = 0; j < count - first; j++) {
                    out[at + j] = 0;
                }
                double x = Math.max(-1, Math.min(1, u));
                int span = findSpan(knots, count, x);
                basisFunctions(knots, span, x, values, left, right);
                for (int r = 0; r < 4; r++) {
                    int j = span - 3 + r;
                    if (j >= first) {
                        out[at + j - first] = values[r];
                    }
                }
            }
        };
    }

    /** The knot span index s with knots[s] <= x < knots[s+1] (the last span for x at the end). */
    static int findSpan(double[] knots, int count, double x) {
        if (x >= knots[count]) {
            return count - 1;
        }
        int lo = 3;
        int hi = count;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (x < knots[mid]) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return lo;
    }

    /** The four nonzero cubic B-spline values on span {@code span} at x (Cox-de Boor, triangular form). */
    static void basisFunctions(double[] knots, int span, double x, double[] n, double[] left, double[] right) {
        n[0] = 1;
        for (int j = 1; j <= 3; j++) {
            left[j] = x - knots[span + 1 - j];
            right[j] = knots[span + j] - x;
            double saved = 0;
            for (int r = 0; r < j; r++) {
                double temp = n[r] / (right[r + 1] + left[j - r]);
                n[r] = saved + right[r + 1] * temp;
                saved = left[j - r] * temp;
            }
            n[j] = saved;
        }
    }

    private Term naturalTerm(BindingContext context, double[] interior) {
        int bigK = interior.length + 2;
        double[] xi = new double[bigK];
        xi[0] = -1;
        xi[bigK - 1] = 1;
        System.arraycopy(interior, 0, xi, 1, interior.length);
        boolean withConstant = !context.hasIntercept();
        List<String> names = new ArrayList<>();
        if (withConstant) {
            names.add("trend.N0");
        }
        names.add("trend.N1");
        for (int j = 0; j < bigK - 2; j++) {
            names.add("trend.N" + (j + 2));
        }
        return new TrendTerm(this, names, context) {
            @Override
            void basis(double u, double[] out, int at) {
                int j = at;
                if (withConstant) {
                    out[j++] = 1;
                }
                out[j++] = u;
                double dLast = truncated(u, bigK - 2);
                for (int m = 0; m < bigK - 2; m++) {
                    out[j++] = truncated(u, m) - dLast;
                }
            }

            private double truncated(double u, int m) {
                double a = Math.max(0, u - xi[m]);
                double b = Math.max(0, u - xi[bigK - 1]);
                return (a * a * a - b * b * b) / (xi[bigK - 1] - xi[m]);
            }
        };
    }
}
