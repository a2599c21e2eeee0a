package org.phasewright.io.read;

import java.util.Arrays;

/** A growable array of doubles (amortised O(1) append, 8 bytes per value plus slack). */
final class DoubleColumn {

    private double[] data;
    private int size;

    DoubleColumn(int initialCapacity) {
        data = new double[Math.max(16, initialCapacity)];
    }

    void add(double v) {
        if (size == data.length) {
            long grown = Math.min((long) data.length + (data.length >> 1) + 16, Integer.MAX_VALUE - 8);
            if (grown <= size) {
                throw new IllegalStateException("more than " + size + " rows do not fit in one column");
            }
            data = Arrays.copyOf(data, (int) grown);
        }
        data[size++] = v;
    }

    int size() {
        return size;
    }

    double get(int i) {
        return data[i];
    }

    /** The values, trimmed to size (the backing array itself when it is exactly full). */
    double[] toArray() {
        return size == data.length ? data : Arrays.copyOf(data, size);
    }
}
