package org.phasewright.io;

/** How the samples of a WAV file are stored. */
public enum WavEncoding {
    /** Two's-complement integers (16, 24, 32 bits; 8 bits is rarely signed in WAV). */
    PCM_SIGNED,
    /** Unsigned integers offset by half the range (the WAV form of 8-bit samples). */
    PCM_UNSIGNED,
    /** IEEE 754 floating point, 32 or 64 bits, full scale at +-1. */
    PCM_FLOAT
}
