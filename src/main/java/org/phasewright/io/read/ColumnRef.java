package org.phasewright.io.read;

import java.util.List;
import java.util.Objects;

/**
 * A CSV column chosen by the user: either by its header name or by its 1-based position.
 * {@link #parse(String)} reads the form a user types: a whole number is a position, anything
 * else a name.
 */
public record ColumnRef(String name, int index) {

    public ColumnRef {
        if (name == null && index < 1) {
            throw new IllegalArgumentException("column positions start at 1, got " + index);
        }
        if (name != null && index != 0) {
            throw new IllegalArgumentException("a column is chosen by name or by position, not both");
        }
    }

    public static ColumnRef named(String name) {
        return new ColumnRef(Objects.requireNonNull(name, "column name"), 0);
    }

    /** The column at 1-based position {@code index}. */
    public static ColumnRef at(int index) {
        return new ColumnRef(null, index);
    }

    /** A whole number (e.g. {@code "3"}) chooses by position, any other text by name. */
    public static ColumnRef parse(String text) {
        String t = Objects.requireNonNull(text, "column").trim();
        if (!t.isEmpty() && t.chars().allMatch(Character::isDigit) && t.length() < 10) {
            return at(Integer.parseInt(t));
        }
        return named(t);
    }

    public boolean byName() {
        return name != null;
    }

    /**
     * The 0-based position of this column among {@code headers}, or -1 when absent. A name
     * matches a header exactly, or the header without its unit ({@code "current"} matches
     * {@code "current [A]"}) when that is unambiguous.
     */
    int resolve(List<String> headers) {
        if (!byName()) {
            return index <= headers.size() ? index - 1 : -1;
        }
        int exact = headers.indexOf(name);
        if (exact >= 0) {
            return exact;
        }
        int found = -1;
        for (int i = 0; i < headers.size(); i++) {
            if (HeaderText.withoutUnit(headers.get(i)).equals(name)) {
                if (found >= 0) {
                    return -1;
                }
                found = i;
            }
        }
        return found;
    }

    @Override
    public String toString() {
        return byName() ? "'" + name + "'" : "column " + index;
    }
}
