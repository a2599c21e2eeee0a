package org.phasewright.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;

/**
 * A plain text table: a header row and rows of cells, the first {@code leftColumns} columns
 * left-aligned (names) and the rest right-aligned (numbers), two spaces between columns. Cost:
 * one pass to measure, one to print.
 */
final class TextTable {
    private final List<String> header;
    private final int leftColumns;
    private final List<List<String>> rows = new ArrayList<>();

    TextTable(int leftColumns, String... header) {
        this.header = List.of(header);
        this.leftColumns = leftColumns;
    }

    void row(String... cells) {
        if (cells.length != header.size()) {
            throw new IllegalArgumentException("row has " + cells.length + " cells for " + header.size() + " columns");
        }
        rows.add(List.of(cells));
    }

    boolean isEmpty() {
        return rows.isEmpty();
    }

    /** Prints the rows only, aligned as {@link #print} aligns them, without the header and its rule (a list of facts). */
    void printRows(PrintWriter out, String indent) {
        java.io.StringWriter buf = new java.io.StringWriter();
        print(new PrintWriter(buf), indent);
        String[] lines = buf.toString().split("\\R");
        for (int i = 2; i < lines.length; i++) {
            out.println(lines[i]);
        }
    }

    void print(PrintWriter out, String indent) {
        int[] width = new int[header.size()];
        for (int c = 0; c < width.length; c++) {
            width[c] = header.get(c).length();
            for (List<String> r : rows) {
                width[c] = Math.max(width[c], r.get(c).length());
            }
        }
        line(out, indent, header, width);
        StringBuilder rule = new StringBuilder();
        for (int c = 0; c < width.length; c++) {
            rule.append(c == 0 ? "" : "  ").append("-".repeat(width[c]));
        }
        out.println(indent + rule);
        for (List<String> r : rows) {
            line(out, indent, r, width);
        }
    }

    private void line(PrintWriter out, String indent, List<String> cells, int[] width) {
        StringBuilder b = new StringBuilder(indent);
        for (int c = 0; c < cells.size(); c++) {
            if (c > 0) {
                b.append("  ");
            }
            String s = cells.get(c);
            String pad = " ".repeat(width[c] - s.length());
            b.append(c < leftColumns ? s + pad : pad + s);
        }
        out.println(b.toString().stripTrailing());
    }
}
