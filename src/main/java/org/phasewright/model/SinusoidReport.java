package org.phasewright.model;

/**
 * Amplitude and phase of one cos/sin pair, x(t) = a cos(2 pi f t) + b sin(2 pi f t)
 * = A cos(2 pi f t - phi), with t in seconds from the record's time zero.
 *
 * <p>A = sqrt(a^2 + b^2) and phi = atan2(b, a), reported in degrees in (-180, 180]. Standard
 * errors by the delta method with the full a-b covariance:
 * var A = (a^2 Vaa + 2ab Vab + b^2 Vbb) / A^2 and var phi = (b^2 Vaa - 2ab Vab + a^2 Vbb) / A^4.
 * The amplitude interval is A -/+ t* se(A), its lower end clipped at 0. The F-test (2 numerator
 * degrees of freedom) tests a = b = 0. At A = 0 exactly the phase, its error and the amplitude's
 * delta-method error (and so its interval) are undefined and reported as NaN; the F-test still holds.
 *
 * @param harmonic harmonic number k within a harmonic series, 0 for a lone sinusoid
 */
public record SinusoidReport(String label, double frequencyHz, int harmonic, double amplitude, double amplitudeSe,
                             double amplitudeCiLow, double amplitudeCiHigh, double phaseDeg, double phaseSeDeg,
                             double cosCoefficient, double sinCoefficient, double fStat, double pValue,
                             double varianceShare) implements TermReport {

    @Override
    public String kind() {
        return "sinusoid";
    }

    /** Builds the report from the pair's two-coefficient slice (cos first, then sin). */
    static SinusoidReport of(String label, double frequencyHz, int harmonic, TermInference pair) {
        double a = pair.estimate(0);
        double b = pair.estimate(1);
        double vaa = pair.covariance(0, 0);
        double vab = pair.covariance(0, 1);
        double vbb = pair.covariance(1, 1);
        double amp = Math.hypot(a, b);
        // at A = 0 the phase is undefined and the delta method's gradients (a, b) / A have no limit
        boolean zero = !(amp > 0);
        double ampSe = zero ? Double.NaN : Math.sqrt((a * a * vaa + 2 * a * b * vab + b * b * vbb)) / amp;
        double phase = zero ? Double.NaN : Math.atan2(b, a);
        double phaseSe = zero ? Double.NaN : Math.sqrt(b * b * vaa - 2 * a * b * vab + a * a * vbb) / (amp * amp);
        double half = pair.tCritical() * ampSe;
        GroupTest test = pair.groupTest();
        double deg = Math.toDegrees(phase);
        if (deg <= -180) {
            deg += 360;
        }
        return new SinusoidReport(label, frequencyHz, harmonic, amp, ampSe, Math.max(0, amp - half), amp + half,
                deg, Math.toDegrees(phaseSe), a, b, test.fStat(), test.pValue(), test.varianceShare());
    }
}
