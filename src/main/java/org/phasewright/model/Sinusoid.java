package org.phasewright.model;

import java.util.List;

/**
 * A sinusoid at a known frequency: the columns cos(2 pi f t) and sin(2 pi f t). Reported as an
 * amplitude and phase ({@link SinusoidReport}).
 */
public record Sinusoid(double frequencyHz) implements TermSpec {
    public Sinusoid {
        if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz)) {
            throw new IllegalArgumentException("a sinusoid's frequency must be a positive number of hertz, got "
                    + frequencyHz);
        }
    }

    @Override
    public String label() {
        return "sinusoid " + TermSpec.hertz(frequencyHz);
    }

    @Override
    public String kind() {
        return "sinusoid";
    }

    @Override
    public Term bind(BindingContext context) {
        FrequencyLimits.requireBelowNyquist(label(), frequencyHz, context);
        return new SinusoidTerm(this);
    }

    /** cos(2 pi x) and sin(2 pi x) for x = f t in cycles, reduced to [0, 1) before the call. */
    static void cosSin(double cycles, double[] out, int at) {
        double x = cycles - Math.floor(cycles);
        double w = 2 * Math.PI * x;
        out[at] = Math.cos(w);
        out[at + 1] = Math.sin(w);
    }

    private static final class SinusoidTerm implements Term {
        private final Sinusoid spec;
        private final List<String> names;

        SinusoidTerm(Sinusoid spec) {
            this.spec = spec;
            String f = TermSpec.hertz(spec.frequencyHz).replace(" ", "");
            this.names = List.of("cos@" + f, "sin@" + f);
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
            return new double[] {spec.frequencyHz};
        }

        @Override
        public void fill(Rows rows, int from, int to, double[] out, int stride, int offset) {
            double f = spec.frequencyHz;
            for (int i = from, at = offset; i < to; i++, at += stride) {
                cosSin(f * rows.time(i), out, at);
            }
        }

        @Override
        public TermReport report(TermInference inference) {
            return SinusoidReport.of(spec.label(), spec.frequencyHz, 0, inference);
        }
    }
}
