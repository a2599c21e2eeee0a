package org.phasewright.demo;

import java.util.List;

/**
 * An invented measurement scenario: it renders one demo file from a fixed seed and states the
 * truth it was made from and the command that analyses it.
 *
 * <p>Rendering is deterministic across JVMs: noise comes from {@link java.util.Random} with a
 * fixed seed (its algorithm is specified by the Java platform), waveforms use {@link StrictMath},
 * and numbers are written with fixed decimal places by {@link Decimals}.
 */
public interface DemoScenario {

    /** The file name inside {@code demo-signals/}. */
    String fileName();

    /** The file's bytes; the same on every call and every JVM. */
    byte[] render();

    /** The periodic components the signal was made from (amplitude 0 where a fitted harmonic is absent). */
    List<TrueSinusoid> sinusoids();

    /** Steps and covariate gains the signal was made with; empty when there are none. */
    List<TrueScalar> scalars();

    /**
     * The arguments (after {@code phasewright}) that analyse the file, with the file given as
     * {@code demo-signals/<fileName>}; the demo README shows them verbatim.
     */
    List<String> command();
}
