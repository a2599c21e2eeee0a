package org.phasewright.io;

/**
 * Receives progress reports while a reader streams through a file, so that a front end can show
 * a progress bar. Called on the reading thread, every few tens of thousands of rows (CSV) or
 * blocks (WAV), and once more at the end; implementations must be quick.
 */
@FunctionalInterface
public interface ReadProgress {

    /** A listener that ignores every report. */
    ReadProgress NONE = (bytesRead, totalBytes, samplesRead) -> { };

    /**
     * @param bytesRead   bytes of the file consumed so far
     * @param totalBytes  size of the file in bytes (for a percentage)
     * @param samplesRead data rows (CSV) or frames (WAV) read so far
     */
    void update(long bytesRead, long totalBytes, long samplesRead);
}
