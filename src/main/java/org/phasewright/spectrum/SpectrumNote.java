package org.phasewright.spectrum;

/** A remark about a survey, with a stable code and a message in words (e.g. which method was used and why). */
public record SpectrumNote(String code, String message) {
}
