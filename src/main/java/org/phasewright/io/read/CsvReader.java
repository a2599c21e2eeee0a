package org.phasewright.io.read;

import static org.phasewright.io.InputException.Kind;

import java.io.BufferedInputStream;
import java.io.BufferedReader;
import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVException;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.phasewright.io.InputException;
import org.phasewright.io.ReadProgress;
import org.phasewright.series.Series;

/**
 * Reads a signal from a CSV file into one {@link Series} per chosen channel, streaming.
 *
 * <p>Method: a first look at the opening 64 KiB chooses the delimiter and whether there is a
 * header ({@link CsvSniffer}); then one pass with Apache Commons CSV parses record by record,
 * converting each cell at once into primitive arrays, so the text is never held in memory (peak
 * memory about 8 bytes per row per numeric column, plus growth slack). Times are checked to
 * increase strictly as they are read; after the pass the sampling is classified uniform or
 * uneven ({@link SamplingSummary}). Cost: O(rows x columns) time; about 1-2 million rows per
 * second on one core for a three-column file.
 *
 * <p>Every problem is an {@link InputException} naming the file, the 1-based line and column,
 * and quoting the offending text.
 */
public final class CsvReader {

    private static final int PROGRESS_EVERY_ROWS = 1 << 16;

    private CsvReader() {
    }

    /** Reads with {@link CsvReadOptions#defaults()}. */
    public static CsvData read(Path file) {
        return read(file, CsvReadOptions.defaults());
    }

    public static CsvData read(Path file, CsvReadOptions options) {
        return new Run(file, options).read();
    }

    /** Counts the bytes the parser has pulled from the file, for progress reports. */
    private static final class CountingStream extends FilterInputStream {
        long count;

        CountingStream(InputStream in) {
            super(in);
        }

        @Override
        public int read() throws IOException {
            int b = super.read();
            if (b >= 0) {
                count++;
            }
            return b;
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            int n = super.read(b, off, len);
            if (n > 0) {
                count += n;
            }
            return n;
        }
    }

    /** State of one read. */
    private static final class Run {
        private final Path file;
        private final CsvReadOptions o;
        private long size;
        private char delimiter;
        private boolean decimalComma;
        private boolean header;
        private long headerLine = -1;
        private List<String> names;
        private int timeIdx = -1;
        private CsvSummary.TimeSource timeSource;
        private int[] channelIdx;
        private int[] covariateIdx;
        private final List<String> ignored = new ArrayList<>();
        private DoubleColumn times;
        private DoubleColumn[] channelValues;
        private DoubleColumn[] covariateValues;
        private Instant origin;
        private Instant lastInstant;
        private double lastRawTime = Double.NaN;
        private boolean sawLocalTime;
        private long firstDataLine = -1;
        private int rows;
        private int capacity;

        Run(Path file, CsvReadOptions options) {
            this.file = file;
            this.o = options;
        }

        CsvData read() {
            if (!Files.exists(file)) {
                throw InputException.inFile(Kind.UNREADABLE, file, "no such file");
            }
            if (!Files.isRegularFile(file)) {
                throw InputException.inFile(Kind.UNREADABLE, file, "not a regular file (a folder?)");
            }
            try {
                size = Files.size(file);
                if (size == 0) {
                    throw InputException.inFile(Kind.EMPTY_FILE, file, "the file is empty (0 bytes)");
                }
                CsvSniffer.Sniff sniff = CsvSniffer.sample(file);
                if (sniff.dataLines().isEmpty() && sniff.wholeFileSeen()) {
                    throw InputException.inFile(Kind.EMPTY_FILE, file, "the file holds only comment or blank lines, no data");
                }
                chooseLayout(sniff);
                stream();
            } catch (IOException e) {
                throw InputException.inFile(Kind.UNREADABLE, file, "cannot be read: " + e.getMessage(), e);
            }
            return finish();
        }

        private CSVFormat format() {
            return CSVFormat.DEFAULT.builder()
                    .setDelimiter(delimiter)
                    .setQuote('"')
                    .setCommentMarker('#')
                    .setIgnoreEmptyLines(true)
                    .setIgnoreSurroundingSpaces(true)
                    .setTrim(true)
                    .get();
        }

        private void chooseLayout(CsvSniffer.Sniff sniff) {
            List<String> lines = sniff.dataLines();
            delimiter = o.delimiter().orElseGet(() -> lines.isEmpty() ? ',' : CsvSniffer.delimiter(lines));
            decimalComma = o.decimalComma().orElse(delimiter == ';');
            if (decimalComma && delimiter == ',') {
                throw InputException.inFile(Kind.BAD_OPTION, file,
                        "a decimal comma cannot be read in a comma-delimited file; use ';' or tab as delimiter");
            }
            switch (o.header()) {
                case PRESENT -> header = true;
                case ABSENT -> header = false;
                default -> header = !lines.isEmpty() && CsvSniffer.looksLikeHeader(sampleRecords(lines), decimalComma);
            }
            long rowsGuess = lines.isEmpty() ? 1024
                    : sniff.wholeFileSeen() ? lines.size() : (long) (1.05 * size * lines.size() / sniff.sampleBytes());
            capacity = (int) Math.min(Math.max(rowsGuess, 16), Integer.MAX_VALUE - 16);
        }

        private List<List<String>> sampleRecords(List<String> lines) {
            List<List<String>> out = new ArrayList<>();
            try (CSVParser p = CSVParser.parse(new StringReader(String.join("\n", lines)), format())) {
                for (CSVRecord r : p) {
                    out.add(r.toList());
                }
            } catch (IOException | UncheckedIOException | IllegalStateException e) {
                // a quote left open in the sample: use what was parsed; the full pass reports it
            }
            if (out.isEmpty()) {
                out.add(List.of(lines.get(0)));
            }
            return out;
        }

        private void stream() throws IOException {
            ReadProgress progress = o.progress();
            try (CountingStream counting = new CountingStream(Files.newInputStream(file));
                 InputStream buffered = new BufferedInputStream(counting, 1 << 16)) {
                Bom.skip(buffered);
                Reader reader = new BufferedReader(new InputStreamReader(buffered, StandardCharsets.UTF_8.newDecoder()
                        .onMalformedInput(CodingErrorAction.REPORT)
                        .onUnmappableCharacter(CodingErrorAction.REPORT)), 1 << 16);
                try (CSVParser parser = CSVParser.parse(reader, format())) {
                    Iterator<CSVRecord> it = parser.iterator();
                    boolean first = true;
                    while (true) {
                        CSVRecord rec;
                        try {
                            if (!it.hasNext()) {
                                break;
                            }
                            rec = it.next();
                        } catch (UncheckedIOException | IllegalStateException e) {
                            throw malformed(e, parser.getCurrentLineNumber() + 1);
                        }
                        long line = parser.getCurrentLineNumber();
                        if (first && header) {
                            takeHeader(rec, line);
                        } else {
                            if (names == null) {
                                defaultNames(rec.size());
                            }
                            if (firstDataLine < 0) {
                                setUp(rec, line);
                            }
                            row(rec, line);
                            if (rows % PROGRESS_EVERY_ROWS == 0) {
                                progress.update(counting.count, size, rows);
                            }
                        }
                        first = false;
                    }
                    progress.update(size, size, rows);
                }
            }
        }

        private InputException malformed(RuntimeException e, long line) {
            Throwable c = e.getCause();
            while (c != null && !(c instanceof CharacterCodingException) && !(c instanceof CSVException)) {
                c = c.getCause();
            }
            if (c instanceof CharacterCodingException) {
                long[] at = Utf8Scan.firstInvalid(file);
                return InputException.atLine(Kind.MALFORMED_TEXT, file, at[0] > 0 ? at[0] : line,
                        "the text is not valid UTF-8" + (at[1] >= 0 ? " (byte " + (at[1] + 1) + ")" : "")
                                + "; save the file as UTF-8");
            }
            if (c instanceof CSVException || e instanceof IllegalStateException) {
                return InputException.atLine(Kind.MALFORMED_TEXT, file, line,
                        "a quoted field is not closed before the end of the file ("
                                + (c != null ? c.getMessage() : e.getMessage()) + ")");
            }
            return InputException.inFile(Kind.UNREADABLE, file, "cannot be read: " + e.getMessage(), e);
        }

        private void takeHeader(CSVRecord rec, long line) {
            headerLine = line;
            names = new ArrayList<>(rec.size());
            Map<String, Integer> seen = new HashMap<>();
            for (int j = 0; j < rec.size(); j++) {
                String h = rec.get(j).trim();
                if (h.isEmpty()) {
                    h = "column_" + (j + 1);
                }
                Integer before = seen.putIfAbsent(h, j);
                if (before != null) {
                    throw InputException.atCell(Kind.DUPLICATE_COLUMN, file, line, j + 1, h,
                            "the header names '" + h + "' twice (also column " + (before + 1) + ")");
                }
                names.add(h);
            }
        }

        private void defaultNames(int n) {
            names = new ArrayList<>(n);
            for (int j = 0; j < n; j++) {
                names.add("column_" + (j + 1));
            }
        }

        private int resolve(ColumnRef ref, String role) {
            int j = ref.resolve(names);
            if (j < 0) {
                long line = header ? headerLine : firstDataLine;
                String detail = ref.byName()
                        ? "no column named '" + ref.name() + "' for the " + role + "; available: " + String.join(", ", names)
                        : "no column " + ref.index() + " for the " + role + "; the file has " + names.size()
                        + " columns: " + String.join(", ", names);
                throw InputException.atLine(Kind.UNKNOWN_COLUMN, file, line, detail);
            }
            return j;
        }

        /** Resolves the columns and the time format on the first data record. */
        private void setUp(CSVRecord rec, long line) {
            firstDataLine = line;
            checkWidth(rec, line);
            if (o.sampleRateHz().isPresent()) {
                timeSource = CsvSummary.TimeSource.GIVEN_RATE;
            } else {
                timeIdx = o.timeColumn().map(r -> resolve(r, "time")).orElse(0);
                timeSource = timeSourceOf(rec.get(timeIdx).trim(), line);
            }
            List<Integer> chosen = new ArrayList<>();
            if (!o.channels().isEmpty()) {
                for (ColumnRef ref : o.channels()) {
                    int j = resolve(ref, "signal");
                    if (j == timeIdx) {
                        throw InputException.atLine(Kind.BAD_OPTION, file, header ? headerLine : line,
                                "column " + (j + 1) + " (" + names.get(j) + ") is the time column and cannot also be a channel");
                    }
                    if (chosen.contains(j)) {
                        throw InputException.atLine(Kind.BAD_OPTION, file, header ? headerLine : line,
                                "column " + (j + 1) + " (" + names.get(j) + ") is chosen twice as a channel");
                    }
                    chosen.add(j);
                }
            } else {
                for (int j = 0; j < names.size() && chosen.isEmpty(); j++) {
                    if (j != timeIdx && isNumberOrMissing(rec.get(j))) {
                        chosen.add(j);
                    }
                }
                if (chosen.isEmpty()) {
                    if (names.size() == 1 && timeIdx == 0) {
                        throw InputException.atLine(Kind.BAD_OPTION, file, line,
                                "the file has a single column, read as time; give a sample rate to read it as the signal");
                    }
                    int j = timeIdx == 0 ? 1 : 0;
                    throw InputException.atCell(Kind.NOT_A_NUMBER, file, line, j + 1, headerName(j),
                            "'" + rec.get(j).trim() + "' is not a number" + numberHint(rec.get(j))
                                    + ", and no other column holds numbers for the signal");
                }
            }
            channelIdx = chosen.stream().mapToInt(Integer::intValue).toArray();
            List<Integer> cov = new ArrayList<>();
            if (o.covariates().isPresent()) {
                for (ColumnRef ref : o.covariates().get()) {
                    int j = resolve(ref, "covariate");
                    if (j == timeIdx || chosen.contains(j) || cov.contains(j)) {
                        throw InputException.atLine(Kind.BAD_OPTION, file, header ? headerLine : line,
                                "column " + (j + 1) + " (" + names.get(j) + ") cannot be a covariate: it is already the time, a channel or a covariate");
                    }
                    cov.add(j);
                }
            } else {
                for (int j = 0; j < names.size(); j++) {
                    if (j == timeIdx || chosen.contains(j)) {
                        continue;
                    }
                    if (!isNumberOrMissing(rec.get(j))) {
                        ignored.add(names.get(j));
                    } else {
                        cov.add(j);
                    }
                }
            }
            covariateIdx = cov.stream().mapToInt(Integer::intValue).toArray();
            times = timeIdx >= 0 ? new DoubleColumn(capacity) : null;
            channelValues = new DoubleColumn[channelIdx.length];
            for (int k = 0; k < channelIdx.length; k++) {
                channelValues[k] = new DoubleColumn(capacity);
            }
            covariateValues = new DoubleColumn[covariateIdx.length];
            for (int k = 0; k < covariateIdx.length; k++) {
                covariateValues[k] = new DoubleColumn(capacity);
            }
        }

        private boolean isNumberOrMissing(String cell) {
            try {
                NumberCells.parse(cell.trim(), decimalComma);
                return true;
            } catch (NumberCells.NotANumber e) {
                return false;
            }
        }

        private CsvSummary.TimeSource timeSourceOf(String cell, long line) {
            switch (o.timeFormat()) {
                case NUMBER:
                    return CsvSummary.TimeSource.NUMBER;
                case ISO_8601:
                    return CsvSummary.TimeSource.ISO_8601;
                default:
                    if (NumberCells.isMissingToken(cell)) {
                        throw InputException.atCell(Kind.MISSING_TIME, file, line, timeIdx + 1, headerName(timeIdx),
                                "the time is missing ('" + cell + "'); every row needs a time");
                    }
                    if (!CsvSniffer.isText(cell, decimalComma)) {
                        return TimestampCells.parse(cell, o.zoneForLocalTimes()) != null
                                ? CsvSummary.TimeSource.ISO_8601 : CsvSummary.TimeSource.NUMBER;
                    }
                    throw InputException.atCell(Kind.NOT_A_NUMBER, file, line, timeIdx + 1, headerName(timeIdx),
                            "'" + cell + "' is neither a number nor an ISO-8601 date-time, so it cannot be a time");
            }
        }

        private String headerName(int j) {
            return header && j >= 0 && j < names.size() ? names.get(j) : null;
        }

        private void checkWidth(CSVRecord rec, long line) {
            if (rec.size() != names.size()) {
                throw InputException.atLine(Kind.RAGGED_ROW, file, line, "the row has " + rec.size() + " fields where "
                        + (header ? "the header (line " + headerLine + ")" : "the first row (line " + firstDataLine + ")")
                        + " has " + names.size());
            }
        }

        private void row(CSVRecord rec, long line) {
            checkWidth(rec, line);
            if (times != null) {
                times.add(timeOf(rec.get(timeIdx), line));
            }
            for (int k = 0; k < channelIdx.length; k++) {
                channelValues[k].add(valueOf(rec.get(channelIdx[k]), line, channelIdx[k]));
            }
            for (int k = 0; k < covariateIdx.length; k++) {
                covariateValues[k].add(valueOf(rec.get(covariateIdx[k]), line, covariateIdx[k]));
            }
            rows++;
        }

        private double valueOf(String cell, long line, int j) {
            try {
                double v = NumberCells.parse(cell, decimalComma);
                if (Double.isInfinite(v)) {
                    throw InputException.atCell(Kind.INFINITE_VALUE, file, line, j + 1, headerName(j),
                            "'" + cell + "' is infinite; leave the cell empty (or write NaN) for a missing value");
                }
                return v;
            } catch (NumberCells.NotANumber e) {
                throw InputException.atCell(Kind.NOT_A_NUMBER, file, line, j + 1, headerName(j),
                        "'" + cell + "' is not a number" + numberHint(cell));
            }
        }

        private String numberHint(String cell) {
            if (!decimalComma && cell.indexOf(',') >= 0) {
                return " (a decimal comma is read in files delimited by ';', or when decimal comma is asked for with a tab delimiter)";
            }
            if (decimalComma && cell.indexOf(',') >= 0 && cell.indexOf('.') >= 0) {
                return " (thousands separators are not read; write 1234,5)";
            }
            return "";
        }

        private double timeOf(String cell, long line) {
            int col = timeIdx + 1;
            if (timeSource == CsvSummary.TimeSource.ISO_8601) {
                TimestampCells.Parsed p = TimestampCells.parse(cell, o.zoneForLocalTimes());
                if (p == null) {
                    if (NumberCells.isMissingToken(cell)) {
                        throw InputException.atCell(Kind.MISSING_TIME, file, line, col, headerName(timeIdx),
                                "the time is missing ('" + cell + "'); every row needs a time");
                    }
                    throw InputException.atCell(Kind.BAD_TIMESTAMP, file, line, col, headerName(timeIdx),
                            "'" + cell + "' is not an ISO-8601 date-time such as 2026-03-01T12:00:00Z");
                }
                sawLocalTime |= !p.hadOffset();
                Instant t = p.instant();
                if (origin == null) {
                    origin = t;
                } else {
                    int cmp = t.compareTo(lastInstant);
                    if (cmp <= 0) {
                        throw order(cmp == 0, line, cell, lastInstant.toString());
                    }
                }
                lastInstant = t;
                return (t.getEpochSecond() - origin.getEpochSecond()) + (t.getNano() - origin.getNano()) * 1e-9;
            }
            double raw;
            try {
                raw = NumberCells.parse(cell, decimalComma);
            } catch (NumberCells.NotANumber e) {
                throw InputException.atCell(Kind.NOT_A_NUMBER, file, line, col, headerName(timeIdx),
                        "'" + cell + "' is not a number (time in " + o.timeScale().symbol() + ")");
            }
            if (Double.isNaN(raw)) {
                throw InputException.atCell(Kind.MISSING_TIME, file, line, col, headerName(timeIdx),
                        "the time is missing ('" + cell + "'); every row needs a time");
            }
            if (Double.isInfinite(raw)) {
                throw InputException.atCell(Kind.INFINITE_VALUE, file, line, col, headerName(timeIdx),
                        "the time '" + cell + "' is infinite");
            }
            if (!Double.isNaN(lastRawTime) && !(raw > lastRawTime)) {
                throw order(raw == lastRawTime, line, cell, Double.toString(lastRawTime));
            }
            lastRawTime = raw;
            return raw * o.timeScale().seconds();
        }

        private InputException order(boolean duplicate, long line, String cell, String previous) {
            return InputException.atCell(duplicate ? Kind.DUPLICATE_TIME : Kind.TIME_DECREASING, file, line, timeIdx + 1,
                    headerName(timeIdx), duplicate
                            ? "the time " + cell + " repeats the time of the row before; times must increase strictly"
                            : "the time " + cell + " is earlier than the time of the row before (" + previous
                            + "); sort the file by time");
        }

        private CsvData finish() {
            if (rows == 0) {
                if (header && headerLine > 0) {
                    throw InputException.atLine(Kind.HEADER_ONLY, file, headerLine,
                            "the file has a header but no data rows");
                }
                throw InputException.inFile(Kind.EMPTY_FILE, file, "the file holds no data rows");
            }
            if (rows == 1) {
                throw InputException.atLine(Kind.TOO_FEW_SAMPLES, file, firstDataLine,
                        "the file holds a single sample; at least two are needed");
            }
            double[] t;
            double offset = 0;
            SamplingSummary sampling;
            if (times == null) {
                double rate = o.sampleRateHz().getAsDouble();
                t = new double[rows];
                for (int i = 0; i < rows; i++) {
                    t[i] = i / rate;
                }
                sampling = SamplingSummary.exact(rate);
            } else {
                t = times.toArray();
                if (timeSource == CsvSummary.TimeSource.NUMBER) {
                    offset = switch (o.timeZero()) {
                        case FIRST_SAMPLE -> t[0];
                        case AS_WRITTEN -> 0;
                        case DETECT -> Math.abs(t[0]) > t[rows - 1] - t[0] ? t[0] : 0;
                    };
                    if (offset != 0) {
                        for (int i = 0; i < rows; i++) {
                            t[i] -= offset;
                        }
                    }
                }
                sampling = SamplingSummary.of(t, o.uniformTolerance());
            }
            List<ChannelSummary> summaries = new ArrayList<>();
            List<Series> series = new ArrayList<>();
            List<String> covNames = new ArrayList<>();
            double[][] cov = new double[covariateIdx.length][];
            for (int k = 0; k < covariateIdx.length; k++) {
                cov[k] = covariateValues[k].toArray();
                covNames.add(names.get(covariateIdx[k]));
            }
            for (int k = 0; k < channelIdx.length; k++) {
                int j = channelIdx[k];
                String name = names.get(j);
                double[] v = channelValues[k].toArray();
                channelValues[k] = null;
                Series.Builder b = Series.builder().times(t).values(v).name(name).unit(HeaderText.unit(name));
                if (sampling.uniform()) {
                    b.declaredUniformRate(sampling.rateHz());
                }
                if (origin != null) {
                    b.origin(origin);
                }
                for (int c = 0; c < cov.length; c++) {
                    b.covariate(covNames.get(c), cov[c]);
                }
                Series s = b.build();
                if (s.observedCount() < 2) {
                    throw InputException.atCell(Kind.TOO_FEW_SAMPLES, file, -1, j + 1, headerName(j),
                            "the channel holds " + (s.observedCount() == 0 ? "no numbers" : "a single number")
                                    + " (all other cells are empty or missing); at least two are needed");
                }
                summaries.add(new ChannelSummary(name, s.unit(), j + 1, s.observedCount(), s.missingCount(), s.longestGap()));
                series.add(s);
            }
            CsvSummary summary = new CsvSummary(file, size, rows, delimiter, decimalComma, header, names, timeSource,
                    timeIdx >= 0 ? names.get(timeIdx) : null,
                    timeSource == CsvSummary.TimeSource.NUMBER ? o.timeScale() : null, offset, origin,
                    sawLocalTime ? o.zoneForLocalTimes().getId() : null, sampling, summaries, covNames, ignored);
            return new CsvData(series, summary);
        }
    }
}
