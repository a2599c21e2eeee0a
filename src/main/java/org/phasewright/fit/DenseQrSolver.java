package org.phasewright.fit;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.decomposition.qr.QRColPivDecompositionHouseholderColumn_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;
import org.phasewright.model.Design;
import org.phasewright.model.ModelException;
import org.phasewright.model.Rows;
import org.phasewright.series.Series;

/**
 * Dense least squares by Householder QR with column pivoting (EJML's
 * {@code QRColPivDecompositionHouseholderColumn_DDRM}; Golub and Van Loan, Matrix Computations,
 * 4th ed., 5.4.2) on the column-scaled, weight-scaled design.
 *
 * <p>Steps: build X (n x p) from the design in row blocks; scale each column by the power of two nearest
 * its Euclidean norm (equilibration, exact in binary arithmetic, which is what lets raw-power polynomials such as NIST's Filip keep their digits);
 * factor XS P = Q R; decide the numerical rank from R's diagonal (a column whose |r_jj| falls below
 * {@value #RANK_TOLERANCE} |r_11| is a linear combination of the others, and the fit stops naming the
 * columns involved); apply Q' to y by the stored Householder reflectors (never forming Q); solve
 * R z = Q'y by back substitution; undo the scaling and the permutation. The residual is
 * r = y - X b. Then {@value #REFINEMENTS} steps of iterative refinement on the augmented system
 * [I A; A' 0] [r; z] = [y; 0] (Bjorck and Golub 1967; Bjorck, Numerical Methods for Least Squares
 * Problems, 1996, 2.9), with both right-hand sides f = y - r - A z and g = -A' r accumulated in
 * compensated arithmetic (Ogita, Rump and Oishi 2005), recover the digits that ill-conditioning
 * costs, also when the residual is large (where plain refinement of z alone cannot).
 *
 * <p>Cost: 2 n p^2 - 2 p^3 / 3 flops for the factorization, O(n p) for everything else, 16 n p bytes
 * of memory (the scaled design and EJML's column-major copy that becomes its factor). The condition number is that of the column-scaled design,
 * from the singular values of R (O(p^3)).
 */
final class DenseQrSolver {

    /** Relative size of R's diagonal below which a column counts as dependent on the others. */
    static final double RANK_TOLERANCE = 1e-11;

    private static final int BLOCK = 2048;

    /** Refinement steps on the augmented system; each costs O(n p). */
    static final int REFINEMENTS = 3;

    private DenseQrSolver() {
    }

    static LeastSquaresSolution solve(Design design, Series series) {
        int n = design.includedCount();
        int p = design.p();
        if (n < p) {
            throw new ModelException("the model has " + p + " columns but the record has only " + n
                    + " usable samples; remove terms or supply more data");
        }
        if ((long) n * p > Integer.MAX_VALUE - 16) {
            throw new ModelException("the dense solver holds the design in memory and cannot take " + n + " samples x "
                    + p + " columns (over 2^31 values); fit a shorter stretch or fewer terms");
        }
        double[] x = new double[n * p];
        double[] y = new double[n];
        double[] sqrtW = new double[n];
        double sw = 0;
        double swy = 0;
        double swy2 = 0;
        double slw = 0;
        Rows rows = Rows.of(series);
        double[] block = new double[BLOCK * p];
        int r = 0;
        for (int from = 0; from < series.size(); from += BLOCK) {
            int to = Math.min(series.size(), from + BLOCK);
            design.fillRows(rows, from, to, block);
            for (int i = from; i < to; i++) {
                if (!design.isIncluded(i)) {
                    continue;
                }
                double w = series.weightAt(i);
                double sq = Math.sqrt(w);
                double v = series.valueAt(i);
                sqrtW[r] = sq;
                y[r] = sq * v;
                sw += w;
                swy += w * v;
                swy2 += w * v * v;
                slw += Math.log(w);
                int src = (i - from) * p;
                int dst = r * p;
                for (int j = 0; j < p; j++) {
                    double e = block[src + j];
                    if (!Double.isFinite(e)) {
                        throw new ModelException("column '" + design.columnNames().get(j) + "' is not finite at sample "
                                + (i + 1) + " (time " + series.timeAt(i) + " s)");
                    }
                    x[dst + j] = sq * e;
                }
                r++;
            }
        }
        double centredTss = centredTotalSumOfSquares(y, sqrtW, swy / sw);
        double[] scale = new double[p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                double e = x[i * p + j];
                scale[j] += e * e;
            }
        }
        for (int j = 0; j < p; j++) {
            // a power of two near the column norm: scaling by it is exact, so the scaled design is
            // the same problem, not a rounded copy (radix scaling as in LAPACK's equilibration)
            scale[j] = scale[j] == 0 ? 0 : Math.scalb(1.0, Math.getExponent(Math.sqrt(scale[j])));
            if (scale[j] == 0) {
                throw new ModelException("column '" + design.columnNames().get(j) + "' of the "
                        + design.terms().get(design.termOfColumn(j)).label() + " is zero on every usable sample");
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                x[i * p + j] /= scale[j];
            }
        }
        QRColPivDecompositionHouseholderColumn_DDRM qr = new QRColPivDecompositionHouseholderColumn_DDRM(0);
        qr.decompose(DMatrixRMaj.wrap(n, p, x));
        double[][] qrData = qr.getQR();
        double[] gammas = qr.getGammas();
        int[] piv = qr.getColPivots().clone();
        double[][] rm = upperR(qrData, p);
        checkRank(design, rm, piv);

        // from here on x holds the scaled design XS and coefficients are those of XS (unpivoted)
        double[] qty = y.clone();
        applyQt(qrData, gammas, p, n, qty);
        double[] z = backSubstitute(rm, qty, p);
        double[] resid = residual(x, y, unpivot(z, piv), n, p);
        refine(x, y, piv, qrData, gammas, rm, z, resid, n, p);
        double[] zs = unpivot(z, piv);
        resid = residual(x, y, zs, n, p);
        double rss = 0;
        for (double e : resid) {
            rss += e * e;
        }
        double[] beta = new double[p];
        for (int j = 0; j < p; j++) {
            beta[j] = zs[j] / scale[j];
        }

        double[][] rinv = invertUpper(rm, p);
        double[][] c = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                double s = 0;
                for (int k = Math.max(i, j); k < p; k++) {
                    s += rinv[i][k] * rinv[j][k];
                }
                c[piv[i]][piv[j]] = s / (scale[piv[i]] * scale[piv[j]]);
            }
        }
        boolean constantInSpan = constantInSpan(qrData, gammas, sqrtW, n, p);
        return new LeastSquaresSolution(beta, c, rss, n, conditionNumber(rm, p), constantInSpan, swy, swy2, sw, slw,
                centredTss);
    }

    /**
     * sum w (v - m)^2 about a first-pass weighted mean m, the deviations formed from the weighted values
     * y = sqrt(w) v as y - sqrt(w) m, then corrected by the second pass's residual mean (the two-pass
     * algorithm with correction, Chan, Golub and LeVeque 1983). The one-pass form sum w v^2 - (sum w v)^2 / sum w
     * loses every digit when the mean is large beside the spread.
     */
    private static double centredTotalSumOfSquares(double[] y, double[] sqrtW, double mean) {
        double ss = 0;
        double sd = 0;
        double sw = 0;
        for (int i = 0; i < y.length; i++) {
            double d = y[i] - sqrtW[i] * mean;
            ss += d * d;
            sd += sqrtW[i] * d;
            sw += sqrtW[i] * sqrtW[i];
        }
        return Math.max(0, ss - sd * sd / sw);
    }

    /**
     * Refines z (scaled, pivoted coefficients) and r in place: each step solves
     * [I A; A' 0] [dr; dz] = [f; g] through the QR factors as h = R^-T g, d = Q' f,
     * dz = R^-1 (d_1 - h), dr = Q (h, d_2).
     */
    private static void refine(double[] x, double[] y, int[] piv, double[][] qrData, double[] gammas,
                               double[][] rm, double[] z, double[] r, int n, int p) {
        for (int step = 0; step < REFINEMENTS; step++) {
            double[] f = residual(x, y, unpivot(z, piv), n, p);
            for (int i = 0; i < n; i++) {
                f[i] -= r[i];
            }
            double[] g = new double[p];
            for (int j = 0; j < p; j++) {
                g[j] = -compensatedColumnDot(x, r, piv[j], n, p);
            }
            double[] h = forwardSubstituteTransposed(rm, g, p);
            applyQt(qrData, gammas, p, n, f);
            double[] rhs = new double[p];
            for (int j = 0; j < p; j++) {
                rhs[j] = f[j] - h[j];
            }
            double[] dz = backSubstitute(rm, rhs, p);
            System.arraycopy(h, 0, f, 0, p);
            applyQ(qrData, gammas, p, n, f);
            for (int j = 0; j < p; j++) {
                z[j] += dz[j];
            }
            for (int i = 0; i < n; i++) {
                r[i] += f[i];
            }
        }
    }

    /** v := Q v, the reflectors applied in reverse order. */
    private static void applyQ(double[][] qrData, double[] gammas, int p, int n, double[] v) {
        for (int j = p - 1; j >= 0; j--) {
            reflect(qrData[j], gammas[j], j, n, v);
        }
    }

    /** Solves R' h = g by forward substitution. */
    private static double[] forwardSubstituteTransposed(double[][] rm, double[] g, int p) {
        double[] h = new double[p];
        for (int i = 0; i < p; i++) {
            double s = g[i];
            for (int k = 0; k < i; k++) {
                s -= rm[k][i] * h[k];
            }
            h[i] = s / rm[i][i];
        }
        return h;
    }

    /** Column j of the row-major X dotted with v, in compensated arithmetic. */
    private static double compensatedColumnDot(double[] x, double[] v, int j, int n, int p) {
        double s = 0;
        double c = 0;
        for (int i = 0; i < n; i++) {
            double a = x[i * p + j];
            double prod = a * v[i];
            double perr = Math.fma(a, v[i], -prod);
            double t = s + prod;
            double bb = t - s;
            c += (s - (t - bb)) + (prod - bb) + perr;
            s = t;
        }
        return s + c;
    }

    private static double[][] upperR(double[][] qrData, int p) {
        double[][] rm = new double[p][p];
        for (int j = 0; j < p; j++) {
            for (int i = 0; i <= j; i++) {
                rm[i][j] = qrData[j][i];
            }
        }
        return rm;
    }

    /** y := Q' y, applying the Householder reflectors I - gamma u u' in order (u_j = 1 implicitly). */
    private static void applyQt(double[][] qrData, double[] gammas, int p, int n, double[] v) {
        for (int j = 0; j < p; j++) {
            reflect(qrData[j], gammas[j], j, n, v);
        }
    }

    /** v := (I - gamma u u') v for the reflector u stored in column j below the diagonal. */
    private static void reflect(double[] u, double gamma, int j, int n, double[] v) {
        double s = v[j];
        for (int k = j + 1; k < n; k++) {
            s += u[k] * v[k];
        }
        s *= gamma;
        v[j] -= s;
        for (int k = j + 1; k < n; k++) {
            v[k] -= u[k] * s;
        }
    }

    private static double[] backSubstitute(double[][] rm, double[] rhs, int p) {
        double[] z = new double[p];
        for (int i = p - 1; i >= 0; i--) {
            double s = rhs[i];
            for (int k = i + 1; k < p; k++) {
                s -= rm[i][k] * z[k];
            }
            z[i] = s / rm[i][i];
        }
        return z;
    }

    /** Coefficients in pivot order back to column order. */
    private static double[] unpivot(double[] z, int[] piv) {
        double[] b = new double[z.length];
        for (int j = 0; j < z.length; j++) {
            b[piv[j]] = z[j];
        }
        return b;
    }

    /** r = y - X b with each row's dot product accumulated in compensated arithmetic (Ogita, Rump, Oishi 2005). */
    private static double[] residual(double[] x, double[] y, double[] b, int n, int p) {
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            double s = y[i];
            double c = 0;
            int off = i * p;
            for (int j = 0; j < p; j++) {
                double prod = -x[off + j] * b[j];
                double perr = Math.fma(-x[off + j], b[j], -prod);
                double t = s + prod;
                double bb = t - s;
                double serr = (s - (t - bb)) + (prod - bb);
                s = t;
                c += serr + perr;
            }
            r[i] = s + c;
        }
        return r;
    }

    private static double[][] invertUpper(double[][] rm, int p) {
        double[][] inv = new double[p][p];
        for (int j = 0; j < p; j++) {
            inv[j][j] = 1 / rm[j][j];
            for (int i = j - 1; i >= 0; i--) {
                double s = 0;
                for (int k = i + 1; k <= j; k++) {
                    s += rm[i][k] * inv[k][j];
                }
                inv[i][j] = -s / rm[i][i];
            }
        }
        return inv;
    }

    private static void checkRank(Design design, double[][] rm, int[] piv) {
        int p = rm.length;
        double top = Math.abs(rm[0][0]);
        int rank = 0;
        while (rank < p && Math.abs(rm[rank][rank]) > RANK_TOLERANCE * top) {
            rank++;
        }
        if (rank == p) {
            return;
        }
        // the first dependent column (in pivot order) and the independent columns it is built from
        int dep = rank;
        double[] z = new double[rank];
        for (int i = rank - 1; i >= 0; i--) {
            double s = rm[i][dep];
            for (int k = i + 1; k < rank; k++) {
                s -= rm[i][k] * z[k];
            }
            z[i] = s / rm[i][i];
        }
        double zmax = 0;
        for (double v : z) {
            zmax = Math.max(zmax, Math.abs(v));
        }
        List<String> cols = new ArrayList<>();
        Set<String> terms = new LinkedHashSet<>();
        cols.add(design.columnNames().get(piv[dep]));
        terms.add(design.terms().get(design.termOfColumn(piv[dep])).label());
        for (int i = 0; i < rank; i++) {
            if (Math.abs(z[i]) > 1e-6 * zmax) {
                cols.add(design.columnNames().get(piv[i]));
                terms.add(design.terms().get(design.termOfColumn(piv[i])).label());
            }
        }
        throw new ModelException("the design is rank deficient (rank " + rank + " of " + p + "): columns "
                + String.join(", ", cols) + " are collinear within numerical precision, so the "
                + String.join(" and the ", terms) + " cannot be estimated together"
                + (terms.size() > 1 ? "; terms at frequencies closer than the record can resolve, or trends and steps"
                + " that duplicate each other, do this" : "") + "; remove or change one of them");
    }

    /** Whether sqrt(w) (the weighted constant) lies in the column space: its residual after projection is ~0. */
    private static boolean constantInSpan(double[][] qrData, double[] gammas, double[] sqrtW, int n, int p) {
        double[] v = sqrtW.clone();
        double total = 0;
        for (double e : v) {
            total += e * e;
        }
        applyQt(qrData, gammas, p, n, v);
        double rest = 0;
        for (int k = p; k < n; k++) {
            rest += v[k] * v[k];
        }
        return rest <= 1e-16 * total;
    }

    private static double conditionNumber(double[][] rm, int p) {
        DMatrixRMaj m = new DMatrixRMaj(rm);
        SingularValueDecomposition_F64<DMatrixRMaj> svd = DecompositionFactory_DDRM.svd(p, p, false, false, true);
        if (!svd.decompose(m)) {
            return Double.NaN;
        }
        double max = 0;
        double min = Double.POSITIVE_INFINITY;
        for (double s : svd.getSingularValues()) {
            max = Math.max(max, s);
            min = Math.min(min, s);
        }
        return max / min;
    }
}
