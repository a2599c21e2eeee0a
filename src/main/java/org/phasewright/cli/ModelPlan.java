package org.phasewright.cli;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.TermSpec;
import org.phasewright.refine.RefinedFrequency;
import org.phasewright.refine.Refinement;

/**
 * A model ready to fit, with the frequencies as the user wrote them, so that reports can show
 * the user's unit beside hertz.
 *
 * @param spec         the model
 * @param frequencies  user frequency by sinusoid term label
 * @param fundamentals user fundamental by harmonic-series term label
 * @param steps        the step time as the user wrote it, by step term label
 */
record ModelPlan(ModelSpec spec, Map<String, Frequency> frequencies, Map<String, Frequency> fundamentals,
                 Map<String, String> steps) {

    ModelPlan {
        frequencies = Map.copyOf(frequencies);
        fundamentals = Map.copyOf(fundamentals);
        steps = Map.copyOf(steps);
    }

    /** A plan for a model that came without user frequencies (e.g. from a model file alone). */
    static ModelPlan of(ModelSpec spec) {
        return new ModelPlan(spec, Map.of(), Map.of(), Map.of());
    }

    /** The same frequencies for another model whose terms keep their labels (e.g. after harmonics were grown). */
    ModelPlan withSpec(ModelSpec other) {
        return new ModelPlan(other, frequencies, fundamentals, steps);
    }

    /**
     * The plan of a refinement's model: each refined frequency in the unit the user gave for its start
     * (hertz where none was given), rounded to the digits its standard error supports. The refinement
     * must have started from this plan's model; terms keep their places.
     */
    ModelPlan refined(Refinement r) {
        Builder b = builder().spec(r.model());
        steps.forEach(b::step);
        List<TermSpec> before = spec.terms();
        List<TermSpec> after = r.model().terms();
        Map<String, RefinedFrequency> byLabel = new LinkedHashMap<>();
        for (RefinedFrequency f : r.frequencies()) {
            byLabel.put(f.label(), f);
        }
        for (int i = 0; i < after.size(); i++) {
            TermSpec now = after.get(i);
            RefinedFrequency f = byLabel.get(now.label());
            if (f == null || !(now instanceof Sinusoid || now instanceof HarmonicSeries)) {
                continue;
            }
            String old = before.get(i).label();
            Frequency given = now instanceof Sinusoid ? frequencies.get(old) : fundamentals.get(old);
            Frequency shown = (given == null ? Frequency.hertz(f.startHz()) : given).at(f.frequencyHz(), f.stdErrorHz());
            if (now instanceof Sinusoid) {
                b.frequency(now.label(), shown);
            } else {
                b.fundamental(now.label(), shown);
            }
        }
        return b.build();
    }

    /** The frequency the user gave for the term {@code label} (a sinusoid's, or a series' fundamental), if any. */
    Optional<Frequency> given(String label) {
        Frequency f = frequencies.get(label);
        return Optional.ofNullable(f != null ? f : fundamentals.get(label));
    }

    /** How reports name a term: the user's frequency or time where one was given, else the term's label. */
    String nameOf(String label) {
        Frequency f0 = fundamentals.get(label);
        if (f0 != null) {
            return "harmonics of " + f0.display();
        }
        Frequency f = frequencies.get(label);
        if (f != null) {
            return "sinusoid " + f.display();
        }
        String at = steps.get(label);
        if (at != null) {
            return "step at " + at;
        }
        return label;
    }

    /** How reports name harmonic {@code k} of the series {@code label} with fundamental {@code f0Hz}. */
    String harmonicName(String label, double f0Hz, int k) {
        Frequency f0 = fundamentals.get(label);
        String base = f0 != null ? f0.display() : Frequency.number(f0Hz) + " Hz";
        return "harmonic " + k + " of " + base;
    }

    /** The user's figure for harmonic {@code k} of series {@code label}, or of sinusoid {@code label} when k is 0. */
    Optional<Frequency> asGiven(String label, int k) {
        if (k == 0) {
            return Optional.ofNullable(frequencies.get(label));
        }
        return Optional.ofNullable(fundamentals.get(label)).map(f -> f.times(k));
    }

    static Builder builder() {
        return new Builder();
    }

    static final class Builder {
        private ModelSpec spec;
        private final Map<String, Frequency> frequencies = new LinkedHashMap<>();
        private final Map<String, Frequency> fundamentals = new LinkedHashMap<>();
        private final Map<String, String> steps = new LinkedHashMap<>();

        Builder spec(ModelSpec s) {
            this.spec = s;
            return this;
        }

        Builder frequency(String label, Frequency f) {
            frequencies.put(label, f);
            return this;
        }

        Builder fundamental(String label, Frequency f) {
            fundamentals.put(label, f);
            return this;
        }

        Builder step(String label, String asWritten) {
            steps.put(label, asWritten);
            return this;
        }

        ModelPlan build() {
            return new ModelPlan(spec, frequencies, fundamentals, steps);
        }
    }
}
