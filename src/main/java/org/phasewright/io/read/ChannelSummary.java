package org.phasewright.io.read;

/**
 * One signal channel as read: where it came from and how many of its samples are gaps.
 *
 * @param name       header text (or {@code column_k} without a header)
 * @param unit       unit written in brackets at the end of the header, or ""
 * @param column     1-based column in the file
 * @param observed   samples holding a number
 * @param missing    gap samples (empty, NaN, NA, N/A, null)
 * @param longestGap longest run of consecutive gap samples
 */
public record ChannelSummary(String name, String unit, int column, int observed, int missing, int longestGap) {
}
