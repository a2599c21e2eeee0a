package org.phasewright.model;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/**
 * A fundamental f0 and its harmonics k f0 for k = 1..{@code harmonics}, leaving out the harmonic
 * numbers in {@code skip}: two columns (cos, sin) per kept harmonic.
 *
 * <p>Columns are evaluated by one cos/sin per row and the angle-addition recurrence
 * (cos, sin)(k+1) = (cos, sin)(k) rotated by (cos, sin)(1), re-anchored by a direct evaluation every
 * 16 harmonics so rounding error stays near 16 ulp. Cost: about 6 flops per harmonic per row.
 */
public record HarmonicSeries(double fundamentalHz, int harmonics, List<Integer> skip) implements TermSpec {
    private static final int REANCHOR = 16;

    public HarmonicSeries {
        if (!(fundamentalHz > 0) || Double.isInfinite(fundamentalHz)) {
            throw new IllegalArgumentException("a fundamental must be a positive number of hertz, got " + fundamentalHz);
        }
        if (harmonics < 1) {
            throw new IllegalArgumentException("a harmonic series needs at least 1 harmonic, got " + harmonics);
        }
        skip = skip == null ? List.of() : List.copyOf(new TreeSet<>(skip));
        for (int k : skip) {
            if (k < 1 || k > harmonics) {
                throw new IllegalArgumentException("skipped harmonic " + k + " is not among 1.." + harmonics);
            }
        }
        if (skip.size() == harmonics) {
            throw new IllegalArgumentException("every harmonic of the series is skipped");
        }
    }

    public HarmonicSeries(double fundamentalHz, int harmonics) {
        this(fundamentalHz, harmonics, List.of());
    }

    /** The harmonic numbers kept, ascending. */
    public int[] keptHarmonics() {
        return java.util.stream.IntStream.rangeClosed(1, harmonics).filter(k -> !skip.contains(k)).toArray();
    }

    @Override
    public String label() {
        return "harmonics of " + TermSpec.hertz(fundamentalHz);
    }

    @Override
    public String kind() {
        return "harmonic_series";
    }

    @Override
    public Term bind(BindingContext context) {
        int[] kept = keptHarmonics();
        int top = kept[kept.length - 1];
        FrequencyLimits.requireBelowNyquist("harmonic " + top + " (" + TermSpec.hertz(top * fundamentalHz) + ") of "
                + label(), top * fundamentalHz, context);
        return new SeriesTerm(this, kept);
    }

    private static final class SeriesTerm implements Term {
        private final HarmonicSeries spec;
        private final int[] kept;
        private final List<String> names;

        SeriesTerm(HarmonicSeries spec, int[] kept) {
            this.spec = spec;
            this.kept = kept;
            List<String> n = new ArrayList<>();
            for (int k : kept) {
                String f = TermSpec.hertz(k * spec.fundamentalHz).replace(" ", "");
                n.add("h" + k + ".cos@" + f);
                n.add("h" + k + ".sin@" + f);
            }
            this.names = List.copyOf(n);
        }

        @Override
        public TermSpec spec() {
            return spec;
        }

        @Override
        public List<String> columnNames() {
            return names;
        }

        @Override
        public double[] frequencies() {
            double[] f = new double[kept.length];
            for (int i = 0; i < kept.length; i++) {
                f[i] = kept[i] * spec.fundamentalHz;
            }
            return f;
        }

        @Override
        public void fill(Rows rows, int from, int to, double[] out, int stride, int offset) {
            double f0 = spec.fundamentalHz;
            int top = kept[kept.length - 1];
            double[] cs = new double[2];
            for (int i = from, at = offset; i < to; i++, at += stride) {
                double cycles = f0 * rows.time(i);
                Sinusoid.cosSin(cycles, cs, 0);
                double c1 = cs[0];
                double s1 = cs[1];
                double c = c1;
                double s = s1;
                int next = 0;
                for (int k = 1; k <= top; k++) {
                    if (k > 1) {
                        if (k % REANCHOR == 0) {
                            Sinusoid.cosSin(k * cycles, cs, 0);
                            c = cs[0];
                            s = cs[1];
                        } else {
                            double cn = c * c1 - s * s1;
                            s = s * c1 + c * s1;
                            c = cn;
                        }
                    }
                    if (kept[next] == k) {
                        out[at + 2 * next] = c;
                        out[at + 2 * next + 1] = s;
                        next++;
                    }
                }
            }
        }

        @Override
        public TermReport report(TermInference inf) {
            List<SinusoidReport> parts = new ArrayList<>();
            for (int j = 0; j < kept.length; j++) {
                int k = kept[j];
                parts.add(SinusoidReport.of("harmonic " + k + " of " + TermSpec.hertz(spec.fundamentalHz),
                        k * spec.fundamentalHz, k, inf.slice(2 * j, 2 * j + 2)));
            }
            GroupTest g = inf.groupTest();
            return new HarmonicSeriesReport(spec.label(), spec.fundamentalHz, parts, g.fStat(), g.df1(), g.pValue(),
                    g.varianceShare());
        }
    }
}
