package org.phasewright.io.read;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;

/**
 * Looks at the first 64 KiB of a CSV file to choose the delimiter and to decide whether the
 * first record is a header, before the streaming pass. Method: the first 20 data lines (not
 * blank, not '#' comments) are split quote-aware by each candidate; the first of tab, semicolon,
 * comma that splits every line into the same number (more than one) of fields wins. The first
 * record is a header when one of its cells is text (not a number, a missing-value token or a
 * date-time) above a cell of the second record that is not text. Cost: O(64 KiB).
 */
final class CsvSniffer {

    static final int SAMPLE_BYTES = 64 * 1024;
    private static final int SAMPLE_LINES = 20;
    private static final char[] CANDIDATES = {'\t', ';', ','};

    /** What the sample showed. {@code dataLines} is empty for a file of comments and blanks only. */
    record Sniff(List<String> dataLines, boolean wholeFileSeen, long sampleBytes) {
    }

    private CsvSniffer() {
    }

    static Sniff sample(Path file) throws IOException {
        byte[] head = new byte[SAMPLE_BYTES];
        int n = 0;
        try (InputStream in = Files.newInputStream(file)) {
            int r;
            while (n < head.length && (r = in.read(head, n, head.length - n)) > 0) {
                n += r;
            }
            boolean whole = in.read() < 0;
            int from = Bom.length(head, n);
            String text = new String(head, from, n - from, StandardCharsets.UTF_8);
            String[] lines = text.split("\r\n|\n|\r", -1);
            int usable = whole ? lines.length : lines.length - 1;
            List<String> data = new ArrayList<>();
            for (int i = 0; i < usable && data.size() < SAMPLE_LINES; i++) {
                String l = lines[i];
                if (!l.isBlank() && !l.startsWith("#")) {
                    data.add(l);
                }
            }
            return new Sniff(data, whole, n);
        }
    }

    static char delimiter(List<String> lines) {
        for (char c : CANDIDATES) {
            int first = fieldCount(lines.get(0), c);
            boolean consistent = first > 1;
            for (int i = 1; i < lines.size() && consistent; i++) {
                consistent = fieldCount(lines.get(i), c) == first;
            }
            if (consistent) {
                return c;
            }
        }
        char best = ',';
        int most = 1;
        for (char c : CANDIDATES) {
            int k = fieldCount(lines.get(0), c);
            if (k > most) {
                most = k;
                best = c;
            }
        }
        return best;
    }

    /** Decides whether the first of {@code records} (already split) is a header. */
    static boolean looksLikeHeader(List<List<String>> records, boolean decimalComma) {
        List<String> first = records.get(0);
        List<String> second = records.size() > 1 ? records.get(1) : null;
        for (int i = 0; i < first.size(); i++) {
            if (isText(first.get(i), decimalComma)) {
                if (second == null || i >= second.size() || !isText(second.get(i), decimalComma)) {
                    return true;
                }
            }
        }
        return false;
    }

    static boolean isText(String cell, boolean decimalComma) {
        String s = cell.trim();
        try {
            NumberCells.parse(s, decimalComma);
            return false;
        } catch (NumberCells.NotANumber e) {
            return TimestampCells.parse(s, ZoneOffset.UTC) == null;
        }
    }

    /** Number of fields of one line split by {@code delimiter}, ignoring delimiters in quotes. */
    static int fieldCount(String line, char delimiter) {
        int count = 1;
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c == '"') {
                quoted = !quoted;
            } else if (c == delimiter && !quoted) {
                count++;
            }
        }
        return count;
    }
}
