package org.phasewright.cli;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.phasewright.model.ModelSpec;

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

    /** How reports name a term: the user's frequency or time where one was given, else the term's label. */
    String nameOf(String label) {
        Frequency f0 = fundamentals.get(label);
        if (f0 != null && !f0.isHertz()) {
            return "harmonics of " + f0.display();
        }
        Frequency f = frequencies.get(label);
        if (f != null && !f.isHertz()) {
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
        String base = f0 != null && !f0.isHertz() ? f0.display() : Frequency.number(f0Hz) + " Hz";
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
