package org.phasewright.cli;

/** The {@code --level} value: a fraction in (0, 1) such as {@code 0.95}, or a percentage such as {@code 99%}. */
final class ConfidenceLevel {

    private ConfidenceLevel() {
    }

    static double parse(String text) {
        String s = text.trim();
        boolean percent = s.endsWith("%");
        try {
            double v = Double.parseDouble(percent ? s.substring(0, s.length() - 1).trim() : s);
            if (percent) {
                v /= 100;
            }
            if (!(v > 0 && v < 1)) {
                throw new IllegalArgumentException("'" + text + "' is not a confidence level: it must lie strictly"
                        + " between 0 and 1 (or 0% and 100%), e.g. 0.95 or 99%");
            }
            return v;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + text + "' is not a confidence level; write e.g. 0.95 or 99%");
        }
    }
}
