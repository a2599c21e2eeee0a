package org.phasewright.io.read;

import java.io.IOException;
import java.io.InputStream;

/** The UTF-8 byte-order mark (EF BB BF) that some spreadsheet programs write first. */
final class Bom {

    private Bom() {
    }

    /** 3 when {@code head[0..n)} starts with the UTF-8 byte-order mark, else 0. */
    static int length(byte[] head, int n) {
        return n >= 3 && (head[0] & 0xff) == 0xEF && (head[1] & 0xff) == 0xBB && (head[2] & 0xff) == 0xBF ? 3 : 0;
    }

    /** Skips a byte-order mark at the start of a fresh (mark-supporting) stream. */
    static void skip(InputStream in) throws IOException {
        in.mark(3);
        byte[] b = new byte[3];
        int n = in.readNBytes(b, 0, 3);
        in.reset();
        if (length(b, n) == 3) {
            in.skipNBytes(3);
        }
    }
}
