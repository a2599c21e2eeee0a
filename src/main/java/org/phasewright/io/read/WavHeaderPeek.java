package org.phasewright.io.read;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Looks at the first bytes of a file the JDK refused, only to say why in the error message:
 * whether it is RIFF/WAVE at all and which format tag its fmt chunk names. It never decodes
 * samples (the JDK does that). Cost: reads at most 4 KiB.
 */
final class WavHeaderPeek {

    record Peek(boolean riffWave, boolean fmtComplete, int formatTag) {
    }

    private WavHeaderPeek() {
    }

    static Peek peek(Path file) {
        byte[] head;
        try (InputStream in = Files.newInputStream(file)) {
            head = in.readNBytes(4096);
        } catch (IOException e) {
            return new Peek(false, false, -1);
        }
        if (head.length < 12 || !ascii(head, 0).equals("RIFF") || !ascii(head, 8).equals("WAVE")) {
            return new Peek(false, false, -1);
        }
        ByteBuffer b = ByteBuffer.wrap(head).order(ByteOrder.LITTLE_ENDIAN);
        int at = 12;
        while (at + 8 <= head.length) {
            String id = ascii(head, at);
            long len = b.getInt(at + 4) & 0xffffffffL;
            if (id.equals("fmt ")) {
                if (len < 16 || at + 8 + 16 > head.length) {
                    return new Peek(true, false, -1);
                }
                int tag = b.getShort(at + 8) & 0xffff;
                if (tag == 0xFFFE && len >= 40 && at + 8 + 26 <= head.length) {
                    tag = b.getShort(at + 8 + 24) & 0xffff;
                }
                return new Peek(true, true, tag);
            }
            at += 8 + (int) Math.min(len + (len & 1), head.length);
        }
        return new Peek(true, false, -1);
    }

    static String describeTag(int tag) {
        String name = switch (tag) {
            case 1 -> "PCM";
            case 2 -> "Microsoft ADPCM";
            case 3 -> "IEEE float";
            case 6 -> "A-law";
            case 7 -> "mu-law";
            case 0x11 -> "IMA ADPCM";
            case 0x55 -> "MPEG layer 3";
            default -> "unknown";
        };
        return tag < 0 ? "(format tag unreadable)" : "with format tag " + tag + " (" + name + ")";
    }

    private static String ascii(byte[] b, int at) {
        return new String(b, at, 4, StandardCharsets.US_ASCII);
    }
}
