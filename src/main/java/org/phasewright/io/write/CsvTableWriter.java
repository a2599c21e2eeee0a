package org.phasewright.io.write;

import java.io.IOException;
import java.io.Writer;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Prints the rows of a comma-separated table with Commons CSV (RFC 4180 quoting, '\n' line
 * ends). Header cells go through {@link CsvCells#label(String)}; callers format data cells with
 * {@link CsvCells}.
 */
final class CsvTableWriter {

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();

    private final CSVPrinter printer;

    CsvTableWriter(Writer out, List<String> header) throws IOException {
        this.printer = new CSVPrinter(out, FORMAT);
        for (String h : header) {
            printer.print(CsvCells.label(h));
        }
        printer.println();
    }

    /** Prints one record of already formatted cells. */
    void row(String... cells) throws IOException {
        printer.printRecord((Object[]) cells);
    }

    /** Prints one cell of the current record. */
    void cell(String text) throws IOException {
        printer.print(text);
    }

    void endRow() throws IOException {
        printer.println();
    }

    void flush() throws IOException {
        printer.flush();
    }
}
