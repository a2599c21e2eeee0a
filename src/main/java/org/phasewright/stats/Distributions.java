package org.phasewright.stats;

/**
 * Cumulative distribution functions and quantiles of the distributions used in inference:
 * standard normal, Student t, F and chi-square.
 *
 * <p>Methods: the regularized incomplete beta function by its continued fraction evaluated with
 * the modified Lentz algorithm (DLMF 8.17.22; Press et al., Numerical Recipes, 3rd ed., 6.4),
 * the regularized incomplete gamma function by its series and continued fraction (DLMF 8.7.3,
 * 8.9.2), log-gamma by the Lanczos approximation (g = 607/128, 15 terms, as published by
 * Godfrey), the normal CDF through the complementary error function, and quantiles by
 * safeguarded Newton iteration on the CDF. Accuracy is near 1e-14 relative in the body of each
 * distribution; checked against Apache Commons Math 3 in the tests. Cost: O(1) to O(100) flops
 * per call, independent of any sample size.
 */
public final class Distributions {

    private static final double EPS = 1e-15;
    private static final double TINY = 1e-300;
    private static final int MAX_ITER = 10_000;

    private Distributions() {
    }

    // ---------------------------------------------------------------- special functions

    private static final double LANCZOS_G = 607.0 / 128.0;
    private static final double[] LANCZOS = {
        0.99999999999999709182, 57.156235665862923517, -59.597960355475491248,
        14.136097974741747174, -0.49191381609762019978, .33994649984811888699e-4,
        .46523628927048575665e-4, -.98374475304879564677e-4, .15808870322491248884e-3,
        -.21026444172410488319e-3, .21743961811521264320e-3, -.16431810653676389022e-3,
        .84418223983852743293e-4, -.26190838401581408670e-4, .36899182659531622704e-5,
    };

    /** Natural logarithm of the gamma function for x > 0. */
    public static double logGamma(double x) {
        if (!(x > 0)) {
            throw new IllegalArgumentException("logGamma needs x > 0, got " + x);
        }
        if (x < 0.5) {
            // reflection keeps the Lanczos sum in its accurate range
            return Math.log(Math.PI / Math.abs(Math.sin(Math.PI * x))) - logGamma(1 - x);
        }
        double z = x - 1;
        double sum = LANCZOS[0];
        for (int i = 1; i < LANCZOS.length; i++) {
            sum += LANCZOS[i] / (z + i);
        }
        double t = z + LANCZOS_G + 0.5;
        return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
    }

    /**
     * log B(a, b). When an argument reaches 20 the log-gamma differences are taken through Stirling's
     * series (DLMF 5.11.1) with log1p, which avoids the cancellation of three large log-gamma values.
     */
    static double logBeta(double a, double b) {
        double small = Math.min(a, b);
        double big = Math.max(a, b);
        if (big < 20) {
            return logGamma(a) + logGamma(b) - logGamma(a + b);
        }
        double sum = a + b;
        if (small < 20) {
            // log Gamma(big) - log Gamma(big + small)
            double d = -(big - 0.5) * Math.log1p(small / big) - small * Math.log(sum) + small
                    + stirlingCorrection(big) - stirlingCorrection(sum);
            return logGamma(small) + d;
        }
        return 0.5 * Math.log(2 * Math.PI) - a * Math.log1p(b / a) - b * Math.log1p(a / b)
                - 0.5 * Math.log(a) - 0.5 * Math.log(b) + 0.5 * Math.log(sum)
                + stirlingCorrection(a) + stirlingCorrection(b) - stirlingCorrection(sum);
    }

    /** log Gamma(x) - [(x - 1/2) ln x - x + ln(2 pi)/2], by Stirling's series, for x >= 20. */
    private static double stirlingCorrection(double x) {
        double x2 = x * x;
        return (1.0 / 12 - (1.0 / 360 - (1.0 / 1260 - 1.0 / (1680 * x2)) / x2) / x2) / x;
    }

    /** Regularized incomplete beta function I_x(a, b). */
    public static double regularizedBeta(double x, double a, double b) {
        if (Double.isNaN(x) || Double.isNaN(a) || Double.isNaN(b)) {
            return Double.NaN;
        }
        if (x <= 0) {
            return 0;
        }
        if (x >= 1) {
            return 1;
        }
        double front = Math.exp(a * Math.log(x) + b * Math.log1p(-x) - logBeta(a, b));
        if (x < (a + 1) / (a + b + 2)) {
            return front * betaContinuedFraction(x, a, b) / a;
        }
        return 1 - front * betaContinuedFraction(1 - x, b, a) / b;
    }

    private static double betaContinuedFraction(double x, double a, double b) {
        double qab = a + b;
        double qap = a + 1;
        double qam = a - 1;
        double c = 1;
        double d = 1 - qab * x / qap;
        if (Math.abs(d) < TINY) {
            d = TINY;
        }
        d = 1 / d;
        double h = d;
        for (int m = 1; m <= MAX_ITER; m++) {
            int m2 = 2 * m;
            double aa = m * (b - m) * x / ((qam + m2) * (a + m2));
            d = 1 + aa * d;
            if (Math.abs(d) < TINY) {
                d = TINY;
            }
            c = 1 + aa / c;
            if (Math.abs(c) < TINY) {
                c = TINY;
            }
            d = 1 / d;
            h *= d * c;
            aa = -(a + m) * (qab + m) * x / ((a + m2) * (qap + m2));
            d = 1 + aa * d;
            if (Math.abs(d) < TINY) {
                d = TINY;
            }
            c = 1 + aa / c;
            if (Math.abs(c) < TINY) {
                c = TINY;
            }
            d = 1 / d;
            double del = d * c;
            h *= del;
            if (Math.abs(del - 1) < EPS) {
                return h;
            }
        }
        return h;
    }

    /** Regularized lower incomplete gamma function P(a, x). */
    public static double regularizedGammaP(double a, double x) {
        if (x <= 0) {
            return 0;
        }
        if (x < a + 1) {
            return gammaSeries(a, x);
        }
        return 1 - gammaContinuedFraction(a, x);
    }

    /** Regularized upper incomplete gamma function Q(a, x) = 1 - P(a, x). */
    public static double regularizedGammaQ(double a, double x) {
        if (x <= 0) {
            return 1;
        }
        if (x < a + 1) {
            return 1 - gammaSeries(a, x);
        }
        return gammaContinuedFraction(a, x);
    }

    private static double gammaSeries(double a, double x) {
        double ap = a;
        double sum = 1 / a;
        double del = sum;
        for (int n = 0; n < MAX_ITER; n++) {
            ap += 1;
            del *= x / ap;
            sum += del;
            if (Math.abs(del) < Math.abs(sum) * EPS) {
                break;
            }
        }
        return sum * Math.exp(-x + a * Math.log(x) - logGamma(a));
    }

    private static double gammaContinuedFraction(double a, double x) {
        double b = x + 1 - a;
        double c = 1 / TINY;
        double d = 1 / b;
        double h = d;
        for (int i = 1; i <= MAX_ITER; i++) {
            double an = -i * (i - a);
            b += 2;
            d = an * d + b;
            if (Math.abs(d) < TINY) {
                d = TINY;
            }
            c = b + an / c;
            if (Math.abs(c) < TINY) {
                c = TINY;
            }
            d = 1 / d;
            double del = d * c;
            h *= del;
            if (Math.abs(del - 1) < EPS) {
                break;
            }
        }
        return Math.exp(-x + a * Math.log(x) - logGamma(a)) * h;
    }

    /** Complementary error function, via the incomplete gamma function (erfc x = Q(1/2, x^2)). */
    public static double erfc(double x) {
        if (x < 0) {
            return 2 - erfc(-x);
        }
        return regularizedGammaQ(0.5, x * x);
    }

    // ---------------------------------------------------------------- normal

    public static double normalCdf(double z) {
        return 0.5 * erfc(-z / Math.sqrt(2));
    }

    /** Upper tail 1 - Phi(z), accurate for large z. */
    public static double normalSurvival(double z) {
        return 0.5 * erfc(z / Math.sqrt(2));
    }

    /** Quantile of the standard normal distribution (Acklam's rational start, then Newton steps). */
    public static double normalQuantile(double p) {
        checkProbability(p);
        if (p == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        if (p == 1) {
            return Double.POSITIVE_INFINITY;
        }
        // start from a logistic-like approximation, refine by Newton on the CDF
        double q = p < 0.5 ? p : 1 - p;
        double t = Math.sqrt(-2 * Math.log(q));
        double z = t - (2.515517 + 0.802853 * t + 0.010328 * t * t)
                / (1 + 1.432788 * t + 0.189269 * t * t + 0.001308 * t * t * t);
        z = p < 0.5 ? -z : z;
        for (int i = 0; i < 50; i++) {
            double f = (p < 0.5 ? normalCdf(z) - p : q - normalSurvival(z));
            double dens = Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
            double step = f / dens;
            z -= step;
            if (Math.abs(step) < 1e-15 * Math.max(1, Math.abs(z))) {
                break;
            }
        }
        return z;
    }

    // ---------------------------------------------------------------- Student t

    /** CDF of Student's t with {@code dof} degrees of freedom (dof > 0, may be fractional). */
    public static double studentTCdf(double t, double dof) {
        checkDof(dof);
        if (Double.isNaN(t)) {
            return Double.NaN;
        }
        if (Double.isInfinite(t)) {
            return t > 0 ? 1 : 0;
        }
        double tail = 0.5 * regularizedBeta(dof / (dof + t * t), dof / 2, 0.5);
        return t > 0 ? 1 - tail : tail;
    }

    /** Two-sided p-value P(|T| >= |t|) for Student's t with {@code dof} degrees of freedom. */
    public static double studentTTwoSidedP(double t, double dof) {
        checkDof(dof);
        if (Double.isNaN(t)) {
            return Double.NaN;
        }
        if (Double.isInfinite(t)) {
            return 0;
        }
        return regularizedBeta(dof / (dof + t * t), dof / 2, 0.5);
    }

    /** Quantile of Student's t: the value t with P(T <= t) = p. */
    public static double studentTQuantile(double p, double dof) {
        checkProbability(p);
        checkDof(dof);
        if (p == 0.5) {
            return 0;
        }
        if (p == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        if (p == 1) {
            return Double.POSITIVE_INFINITY;
        }
        if (p < 0.5) {
            return -studentTQuantile(1 - p, dof);
        }
        // invert the incomplete beta: P(T > t) = (1-p) = 0.5 I_x(dof/2, 1/2) with x = dof/(dof+t^2)
        double x = inverseRegularizedBeta(2 * (1 - p), dof / 2, 0.5);
        if (x <= 0) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.sqrt(dof * (1 - x) / x);
    }

    // ---------------------------------------------------------------- F

    /** CDF of the F distribution with (d1, d2) degrees of freedom. */
    public static double fCdf(double f, double d1, double d2) {
        checkDof(d1);
        checkDof(d2);
        if (f <= 0) {
            return 0;
        }
        return regularizedBeta(d1 * f / (d1 * f + d2), d1 / 2, d2 / 2);
    }

    /** Upper tail P(F >= f): the p-value of an F-test, computed without cancellation. */
    public static double fSurvival(double f, double d1, double d2) {
        checkDof(d1);
        checkDof(d2);
        if (Double.isNaN(f)) {
            return Double.NaN;
        }
        if (f <= 0) {
            return 1;
        }
        if (Double.isInfinite(f)) {
            return 0;
        }
        return regularizedBeta(d2 / (d2 + d1 * f), d2 / 2, d1 / 2);
    }

    /** Quantile of the F distribution. */
    public static double fQuantile(double p, double d1, double d2) {
        checkProbability(p);
        if (p == 0) {
            return 0;
        }
        if (p == 1) {
            return Double.POSITIVE_INFINITY;
        }
        double x = inverseRegularizedBeta(p, d1 / 2, d2 / 2);
        return d2 * x / (d1 * (1 - x));
    }

    // ---------------------------------------------------------------- chi-square

    public static double chiSquareCdf(double x, double dof) {
        checkDof(dof);
        return regularizedGammaP(dof / 2, x / 2);
    }

    /** Upper tail P(X >= x) of chi-square with {@code dof} degrees of freedom. */
    public static double chiSquareSurvival(double x, double dof) {
        checkDof(dof);
        if (Double.isNaN(x)) {
            return Double.NaN;
        }
        return regularizedGammaQ(dof / 2, x / 2);
    }

    // ---------------------------------------------------------------- inversion

    /**
     * The x in [0, 1] with I_x(a, b) = p, by bisection to bracket then Newton steps with the
     * beta density as derivative, falling back to bisection whenever Newton leaves the bracket.
     */
    public static double inverseRegularizedBeta(double p, double a, double b) {
        checkProbability(p);
        if (p == 0) {
            return 0;
        }
        if (p == 1) {
            return 1;
        }
        double lo = 0;
        double hi = 1;
        double x = 0.5;
        double logB = logBeta(a, b);
        for (int i = 0; i < 400; i++) {
            double f = regularizedBeta(x, a, b) - p;
            if (f == 0) {
                return x;
            }
            if (f < 0) {
                lo = x;
            } else {
                hi = x;
            }
            double dens = Math.exp((a - 1) * Math.log(x) + (b - 1) * Math.log1p(-x) - logB);
            double next = x - f / dens;
            if (!(next > lo && next < hi) || !Double.isFinite(next)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - x) <= 1e-16 * Math.max(x, 1e-300) || hi - lo < 1e-300) {
                return next;
            }
            x = next;
        }
        return x;
    }

    private static void checkProbability(double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("probability must lie in [0, 1], got " + p);
        }
    }

    private static void checkDof(double dof) {
        if (!(dof > 0)) {
            throw new IllegalArgumentException("degrees of freedom must be positive, got " + dof);
        }
    }
}
