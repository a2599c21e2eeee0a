package org.phasewright.fit;

import java.util.List;

/**
 * A fit laid out along the record, sample by sample: the observed values (NaN at gaps), the
 * fitted model (evaluated at gaps too, where it is defined), the residual (NaN at gaps and at
 * samples left out of the fit) and one {@link Component} per term. Arrays are aligned with the
 * input record.
 */
public record Components(double[] times, double[] observed, double[] fitted, double[] residual,
                         List<Component> parts) {
    public Components {
        parts = List.copyOf(parts);
    }

    /** The part whose label is {@code label}. */
    public Component part(String label) {
        return parts.stream().filter(c -> c.label().equals(label)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no component '" + label + "'"));
    }
}
