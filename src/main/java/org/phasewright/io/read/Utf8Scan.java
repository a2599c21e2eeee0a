package org.phasewright.io.read;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Finds the first byte sequence that is not valid UTF-8, to name its line in an error (the
 * decoder of the reading pass runs ahead of the parser, so it cannot say where). Checks lead
 * and continuation bytes, overlong two-byte forms and surrogates (RFC 3629). Cost: one pass,
 * only on the error path.
 */
final class Utf8Scan {

    private Utf8Scan() {
    }

    /** {line (1-based), byte offset (0-based)} of the first invalid byte, or {-1, -1}. */
    static long[] firstInvalid(Path file) {
        try (InputStream in = new java.io.BufferedInputStream(Files.newInputStream(file), 1 << 16)) {
            long offset = 0;
            long line = 1;
            int need = 0;
            int lead = 0;
            long start = 0;
            int b;
            while ((b = in.read()) >= 0) {
                if (need > 0) {
                    boolean bad = (b & 0xC0) != 0x80
                            || (lead == 0xE0 && need == 2 && b < 0xA0)
                            || (lead == 0xED && need == 2 && b > 0x9F)
                            || (lead == 0xF0 && need == 3 && b < 0x90)
                            || (lead == 0xF4 && need == 3 && b > 0x8F);
                    if (bad) {
                        return new long[] {line, start};
                    }
                    need--;
                    lead = 0;
                } else if (b >= 0x80) {
                    start = offset;
                    lead = b;
                    if (b >= 0xC2 && b <= 0xDF) {
                        need = 1;
                    } else if (b >= 0xE0 && b <= 0xEF) {
                        need = 2;
                    } else if (b >= 0xF0 && b <= 0xF4) {
                        need = 3;
                    } else {
                        return new long[] {line, offset};
                    }
                } else if (b == '\n') {
                    line++;
                }
                offset++;
            }
            return need > 0 ? new long[] {line, start} : new long[] {-1, -1};
        } catch (IOException e) {
            return new long[] {-1, -1};
        }
    }
}
