package org.phasewright.cli;

import java.nio.file.Path;

/**
 * Where commands get their records from. The application reads files with the io package's
 * readers ({@link #files()}); the seam lets a command be run on records built in memory.
 * Implementations report unreadable or malformed input as {@link InputProblem} (exit code 3)
 * with a message that names the file and, where known, the line and column.
 */
interface RecordSource {

    LoadedRecord load(Path file, RecordRequest request);

    /** The same source reporting read progress to {@code listener}; sources that cannot report return themselves. */
    default RecordSource withProgress(org.phasewright.io.ReadProgress listener) {
        return this;
    }

    /** Reads CSV and WAV files through the io package. */
    static RecordSource files() {
        return new IoRecordSource();
    }
}
