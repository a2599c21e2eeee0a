package org.phasewright.io;

import java.nio.file.Path;
import java.util.Objects;

/**
 * A result file could not be written: it exists and replacing was not asked for, its folder is
 * missing or not writable, or the disk filled up. No partial file is left behind when this is
 * thrown (see {@link org.phasewright.io.write.AtomicFile}).
 */
public final class OutputException extends RuntimeException {

    /** Why the write failed. */
    public enum Kind {
        /** The target exists and the caller did not ask to replace it. */
        EXISTS,
        /** The target cannot be created (missing folder, permissions, disk full, I/O error). */
        NOT_WRITABLE,
        /** The values cannot be stored in the requested format (e.g. a WAV of an uneven series). */
        UNSUITABLE
    }

    private final Kind kind;
    private final Path file;

    public OutputException(Kind kind, Path file, String detail, Throwable cause) {
        super((file == null ? "<output>" : file.toString()) + ": " + detail, cause);
        this.kind = Objects.requireNonNull(kind);
        this.file = file;
    }

    public OutputException(Kind kind, Path file, String detail) {
        this(kind, file, detail, null);
    }

    public Kind kind() {
        return kind;
    }

    public Path file() {
        return file;
    }
}
