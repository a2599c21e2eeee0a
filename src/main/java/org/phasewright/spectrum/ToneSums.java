package org.phasewright.spectrum;

/**
 * Weighted sums for the floating-mean single-tone least-squares fit y = c + a cos + b sin at one
 * frequency (the generalised periodogram of Zechmeister and Kürster 2009, eqs. 4-13), and the
 * amplitude sqrt(a^2 + b^2) they give. O(1) per sample; used by the Lomb-Scargle probe and by the
 * joint peak fit.
 */
final class ToneSums {
    private double sw;
    private double sc;
    private double ss;
    private double sy;
    private double scc;
    private double sss;
    private double scs;
    private double syc;
    private double sys;

    /** Adds one sample of weight w, value y, with cos and sin of its phase. */
    void add(double w, double y, double co, double si) {
        sw += w;
        sc += w * co;
        ss += w * si;
        sy += w * y;
        scc += w * co * co;
        sss += w * si * si;
        scs += w * co * si;
        syc += w * y * co;
        sys += w * y * si;
    }

    /** The sum of the weights added. */
    double totalWeight() {
        return sw;
    }

    /**
     * The fitted amplitude, with the weighted means taken as sums over {@code totalWeight} (pass 1
     * for weights already normalised to sum to one); 0 where cos and sin are so nearly collinear
     * that det < wellPosed (cc + ss)^2.
     */
    double amplitude(double totalWeight, double wellPosed) {
        double cc = scc - sc * sc / totalWeight;
        double sS = sss - ss * ss / totalWeight;
        double cs = scs - sc * ss / totalWeight;
        double yc = syc - sy * sc / totalWeight;
        double ys = sys - sy * ss / totalWeight;
        double det = cc * sS - cs * cs;
        if (!(det > wellPosed * (cc + sS) * (cc + sS))) {
            return 0;
        }
        double a = (yc * sS - ys * cs) / det;
        double b = (ys * cc - yc * cs) / det;
        return Math.hypot(a, b);
    }
}
