package org.phasewright.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/** The {@code --skip-harmonics} list: harmonic numbers and ranges, e.g. {@code 2,4,6} or {@code 4-6}. */
final class HarmonicNumbers {

    private HarmonicNumbers() {
    }

    static List<Integer> parse(String text) {
        TreeSet<Integer> out = new TreeSet<>();
        for (String item : text.split(",")) {
            String s = item.trim();
            if (s.isEmpty()) {
                continue;
            }
            int dash = s.indexOf('-', 1);
            if (dash > 0) {
                int from = whole(text, s.substring(0, dash));
                int to = whole(text, s.substring(dash + 1));
                if (to < from) {
                    throw new IllegalArgumentException("'" + text + "': the range " + s + " runs backwards");
                }
                for (int k = from; k <= to; k++) {
                    out.add(k);
                }
            } else {
                out.add(whole(text, s));
            }
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException("'" + text + "' names no harmonic; write e.g. 2,4,6 or 4-6");
        }
        return new ArrayList<>(out);
    }

    private static int whole(String text, String s) {
        try {
            int k = Integer.parseInt(s.trim());
            if (k < 1) {
                throw new IllegalArgumentException("'" + text + "': harmonic numbers start at 1, got " + k);
            }
            return k;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + text + "': '" + s + "' is not a harmonic number; write e.g. 2,4,6 or 4-6");
        }
    }
}
