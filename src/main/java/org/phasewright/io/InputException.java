package org.phasewright.io;

import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalLong;

/**
 * A problem with an input file (signal CSV or WAV, or a model file): the file is empty, a cell
 * is not a number, a row is ragged, the times go backwards, the audio encoding is not supported,
 * a model field is wrong, and so on.
 *
 * <p>Every instance names the file and, where they apply, the 1-based line and column (for
 * text files) or the field (for model files), and carries a {@link Kind} so that callers and
 * tests can tell problems apart without parsing the message. Front ends map this exception to a
 * single exit status (the command line uses 3). The message reads, for example:
 * {@code pump.csv, line 12, column 3 (current [A]): 'abc' is not a number}.
 */
public final class InputException extends RuntimeException {

    /** What went wrong, independent of the wording of the message. */
    public enum Kind {
        /** The file cannot be opened or read (missing, a directory, an I/O error). */
        UNREADABLE,
        /** The file holds no bytes, or only comment and blank lines. */
        EMPTY_FILE,
        /** A CSV file with a header line and no data rows. */
        HEADER_ONLY,
        /** Fewer samples than an analysis can use (one row, or a channel with fewer than two numbers). */
        TOO_FEW_SAMPLES,
        /** A cell that should hold a number holds other text. */
        NOT_A_NUMBER,
        /** A cell that should hold an ISO-8601 date-time cannot be read as one. */
        BAD_TIMESTAMP,
        /** A time cell is empty or NaN; times cannot be missing. */
        MISSING_TIME,
        /** A row has more or fewer fields than the header (or the first row). */
        RAGGED_ROW,
        /** A time is earlier than the one before it. */
        TIME_DECREASING,
        /** A time equals the one before it. */
        DUPLICATE_TIME,
        /** A column named or numbered by the user is not in the file. */
        UNKNOWN_COLUMN,
        /** Two header cells carry the same name, so a column cannot be chosen by name. */
        DUPLICATE_COLUMN,
        /** A value or time is infinite (written as Inf, or a number too large for a double). */
        INFINITE_VALUE,
        /** The text is not valid UTF-8, or has an unterminated quote. */
        MALFORMED_TEXT,
        /** A reading option contradicts the file (e.g. the time column is also chosen as a channel). */
        BAD_OPTION,
        /** An audio file the JDK cannot decode, or an encoding Phasewright does not convert. */
        UNSUPPORTED_AUDIO,
        /** The header declares more data than the file holds, or the file ends inside a header. */
        TRUNCATED,
        /** An audio file whose data chunk holds no samples. */
        NO_AUDIO_DATA,
        /** A model file whose JSON is malformed or whose field has a wrong or missing value. */
        BAD_MODEL
    }

    private final Kind kind;
    private final Path file;
    private final long line;
    private final int column;
    private final String columnName;
    private final String field;
    private final String detail;

    private InputException(Kind kind, Path file, long line, int column, String columnName, String field,
                           String detail, Throwable cause) {
        super(compose(file, line, column, columnName, field, detail), cause);
        this.kind = Objects.requireNonNull(kind);
        this.file = file;
        this.line = line;
        this.column = column;
        this.columnName = columnName;
        this.field = field;
        this.detail = detail;
    }

    /** A problem of the file as a whole (no line or column applies). */
    public static InputException inFile(Kind kind, Path file, String detail) {
        return new InputException(kind, file, -1, -1, null, null, detail, null);
    }

    /** A problem of the file as a whole, caused by a lower-level exception. */
    public static InputException inFile(Kind kind, Path file, String detail, Throwable cause) {
        return new InputException(kind, file, -1, -1, null, null, detail, cause);
    }

    /** A problem on one line of a text file (no single column applies). */
    public static InputException atLine(Kind kind, Path file, long line, String detail) {
        return new InputException(kind, file, line, -1, null, null, detail, null);
    }

    /** A problem in one cell: 1-based line and column, and the column's header name if known. */
    public static InputException atCell(Kind kind, Path file, long line, int column, String columnName, String detail) {
        return new InputException(kind, file, line, column, columnName, null, detail, null);
    }

    /** A problem in a named field of a structured file (e.g. {@code terms[2].frequency_hz}). */
    public static InputException atField(Kind kind, Path file, String field, long line, int column, String detail) {
        return new InputException(kind, file, line, column, null, field, detail, null);
    }

    private static String compose(Path file, long line, int column, String columnName, String field, String detail) {
        StringBuilder sb = new StringBuilder();
        sb.append(file == null ? "<input>" : file.toString());
        if (line > 0) {
            sb.append(", line ").append(line);
        }
        if (column > 0) {
            sb.append(", column ").append(column);
            if (columnName != null && !columnName.isEmpty()) {
                sb.append(" (").append(columnName).append(')');
            }
        }
        if (field != null) {
            sb.append(", field ").append(field);
        }
        return sb.append(": ").append(detail).toString();
    }

    public Kind kind() {
        return kind;
    }

    public Optional<Path> file() {
        return Optional.ofNullable(file);
    }

    /** 1-based line of a text file, when the problem lies on one line. */
    public OptionalLong line() {
        return line > 0 ? OptionalLong.of(line) : OptionalLong.empty();
    }

    /** 1-based column of a CSV file (or character column of a JSON file), when one applies. */
    public OptionalInt column() {
        return column > 0 ? OptionalInt.of(column) : OptionalInt.empty();
    }

    /** Header name of the column, when the file has a header. */
    public Optional<String> columnName() {
        return Optional.ofNullable(columnName);
    }

    /** Path of the field in a structured file, e.g. {@code terms[1].harmonics}. */
    public Optional<String> field() {
        return Optional.ofNullable(field);
    }

    /** The message without the location prefix. */
    public String detail() {
        return detail;
    }
}
