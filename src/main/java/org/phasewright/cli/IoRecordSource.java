package org.phasewright.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.phasewright.io.ReadProgress;
import org.phasewright.io.read.ChannelSummary;
import org.phasewright.io.read.ColumnRef;
import org.phasewright.io.read.CsvData;
import org.phasewright.io.read.CsvReadOptions;
import org.phasewright.io.read.CsvReader;
import org.phasewright.io.read.WavData;
import org.phasewright.io.read.WavReadOptions;
import org.phasewright.io.read.WavReader;

/**
 * Reads records with the io package's readers: WAV when the file starts with a RIFF header,
 * CSV otherwise. Translates the command line's choices into reader options: {@code --value-column}
 * and {@code --channel} pick the signal (channel N of a CSV file is its N-th column after the time
 * column), {@code --time-column} and {@code --rate} say where times come from, and only the
 * covariates a model names are read besides the signal (all numeric columns when the caller asks
 * for {@link RecordRequest#allColumns()}). The readers' own {@code InputException}s name file, line and column
 * and pass through unchanged.
 */
final class IoRecordSource implements RecordSource {

    private final ReadProgress progress;

    IoRecordSource() {
        this(ReadProgress.NONE);
    }

    IoRecordSource(ReadProgress progress) {
        this.progress = progress;
    }

    @Override
    public RecordSource withProgress(ReadProgress listener) {
        return new IoRecordSource(listener);
    }

    @Override
    public LoadedRecord load(Path file, RecordRequest request) {
        return isWav(file) ? wav(file, request) : csv(file, request);
    }

    private LoadedRecord wav(Path file, RecordRequest request) {
        if (request.timeColumn() != null || request.valueColumn() != null) {
            throw new UsageException(file + " is a WAV file: it has channels, not columns; use --channel N");
        }
        if (request.rateHz() != null) {
            throw new UsageException(file + " is a WAV file, whose header gives the sample rate; leave out --rate");
        }
        if (!request.covariates().isEmpty()) {
            throw new UsageException(file + " is a WAV file: it holds no columns to use as covariates");
        }
        int channel = request.channel() == null ? 1 : request.channel();
        WavData d = WavReader.read(file, WavReadOptions.channel(channel).withProgress(progress));
        List<String> channels = new ArrayList<>();
        for (int c = 1; c <= d.info().channels(); c++) {
            channels.add("channel " + c);
        }
        String format = String.format(Locale.ROOT, "WAV, %d-bit %s, %d channel%s", d.info().bitsPerSample(),
                d.info().encoding().toString().toLowerCase(Locale.ROOT).replace('_', ' '), d.info().channels(),
                d.info().channels() == 1 ? "" : "s");
        return new LoadedRecord(file.toString(), format, channels, "channel " + channel, d.series(),
                "full scale", null, d.info());
    }

    private LoadedRecord csv(Path file, RecordRequest request) {
        CsvReadOptions.Builder b = CsvReadOptions.builder().progress(progress);
        if (request.rateHz() != null) {
            if (request.timeColumn() != null) {
                throw new UsageException("give either --time-column or --rate, not both");
            }
            b.noTimeColumn(request.rateHz());
        }
        ColumnRef time = request.timeColumn() == null ? null : ColumnRef.parse(request.timeColumn());
        if (time != null) {
            b.timeColumn(time);
        }
        if (request.valueColumn() != null) {
            if (request.channel() != null) {
                throw new UsageException("give either --value-column or --channel, not both");
            }
            b.channels(List.of(ColumnRef.parse(request.valueColumn())));
        } else if (request.channel() != null) {
            b.channels(List.of(ColumnRef.at(channelColumn(request.channel(), request.rateHz() != null, time))));
        }
        if (!request.allColumns()) {
            b.covariates(request.covariates().stream().map(ColumnRef::named).toList());
        }
        CsvData d = CsvReader.read(file, b.build());
        List<String> channels = new ArrayList<>();
        for (ChannelSummary c : d.summary().channels()) {
            channels.add(c.name());
        }
        channels.addAll(d.summary().covariates());
        String format = "CSV" + (d.summary().delimiter() == ',' ? "" : d.summary().delimiter() == ';'
                ? ", semicolon-separated" : ", tab-separated")
                + (d.summary().time() == org.phasewright.io.read.CsvSummary.TimeSource.ISO_8601 ? ", ISO 8601 times" : "");
        ChannelSummary chosen = d.summary().channels().get(0);
        return new LoadedRecord(file.toString(), format, channels, chosen.name(), d.series(), chosen.unit(),
                d.summary(), null);
    }

    /** The file column of signal channel {@code n} (1-based), the time column being skipped. */
    private static int channelColumn(int n, boolean noTimeColumn, ColumnRef time) {
        if (noTimeColumn) {
            return n;
        }
        if (time == null) {
            return n + 1;
        }
        if (!time.byName()) {
            return n < time.index() ? n : n + 1;
        }
        throw new UsageException("with --time-column given by name, choose the signal by --value-column NAME"
                + " rather than --channel");
    }

    private static boolean isWav(Path file) {
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".wav") || name.endsWith(".wave")) {
            return true;
        }
        try (InputStream in = Files.newInputStream(file)) {
            byte[] head = in.readNBytes(12);
            return head.length == 12 && new String(head, 0, 4, java.nio.charset.StandardCharsets.US_ASCII).equals("RIFF")
                    && new String(head, 8, 4, java.nio.charset.StandardCharsets.US_ASCII).equals("WAVE");
        } catch (IOException e) {
            return false; // the CSV reader reports the unreadable file with its own message
        }
    }
}
