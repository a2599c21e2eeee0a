package org.phasewright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.phasewright.io.read.ColumnRef;
import org.phasewright.io.read.CsvData;
import org.phasewright.io.read.CsvReadOptions;
import org.phasewright.io.read.CsvReader;
import org.phasewright.io.read.WavData;
import org.phasewright.io.read.WavReadOptions;
import org.phasewright.io.read.WavReader;
import org.phasewright.io.write.CleanedSignalWriter;

/**
 * Every file listed in src/test/resources/io/bad/catalogue.tsv must be refused with the listed
 * kind of {@link InputException} and a message naming the listed location, and a run that
 * reads it while writing an output must leave no file behind.
 */
class BadInputCatalogueTest {

    private static final Path BAD = resource("io/bad");

    static Path resource(String name) {
        try {
            return Path.of(BadInputCatalogueTest.class.getClassLoader().getResource(name).toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static Stream<Arguments> catalogue() throws IOException {
        List<Arguments> out = new ArrayList<>();
        for (String line : Files.readAllLines(BAD.resolve("catalogue.tsv"))) {
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            String[] f = line.split("\t");
            out.add(Arguments.of(f[0], f[1], InputException.Kind.valueOf(f[2]), f[3]));
        }
        return out.stream();
    }

    @Test
    void catalogueHoldsAtLeast25BadFilesAndListsEveryOne() throws IOException {
        List<String> listed = catalogue().map(a -> (String) a.get()[0]).toList();
        assertThat(listed).hasSizeGreaterThanOrEqualTo(25).doesNotHaveDuplicates();
        try (Stream<Path> files = Files.list(BAD)) {
            List<String> present = files.map(p -> p.getFileName().toString())
                    .filter(n -> !n.equals("catalogue.tsv") && !n.equals("README.md")).toList();
            assertThat(listed).containsExactlyInAnyOrderElementsOf(present);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("catalogue")
    void refusedWithKindAndLocationAndNoOutputLeft(String file, String options, InputException.Kind kind, String expected,
                                                   @TempDir Path out) throws IOException {
        Path input = BAD.resolve(file);
        Map<String, String> opts = parseOptions(options);
        Path target = out.resolve(file.endsWith(".wav") ? "cleaned.wav" : file.endsWith(".json") ? "model.json" : "cleaned.csv");

        InputException e = catchThrowableOfType(InputException.class, () -> readAndWrite(input, opts, target));

        assertThat(e).as("reading %s must fail", file).isNotNull();
        assertThat(e.kind()).isEqualTo(kind);
        assertThat(e.getMessage()).contains(expected);
        assertThat(e.file()).contains(input);
        try (Stream<Path> left = Files.list(out)) {
            assertThat(left).as("files left behind").isEmpty();
        }
    }

    /** Reads the input and writes it out again, as a cleaning run would. */
    private static void readAndWrite(Path input, Map<String, String> opts, Path target) {
        if (input.toString().endsWith(".json")) {
            ModelFile.save(target, ModelFile.load(input), false);
        } else if (input.toString().endsWith(".wav")) {
            WavReadOptions o = opts.containsKey("wavchannel")
                    ? WavReadOptions.channel(Integer.parseInt(opts.get("wavchannel"))) : WavReadOptions.defaults();
            WavData d = WavReader.read(input, o);
            CleanedSignalWriter.writeWav(target, d.series(), d.info().sampleFormat(), false);
        } else {
            CsvReadOptions.Builder b = CsvReadOptions.builder();
            if (opts.containsKey("channels")) {
                b.channels(opts.get("channels").split(","));
            }
            if (opts.containsKey("time")) {
                b.timeColumn(ColumnRef.parse(opts.get("time")));
            }
            if (opts.containsKey("rate")) {
                b.noTimeColumn(Double.parseDouble(opts.get("rate")));
            }
            CsvData d = CsvReader.read(input, b.build());
            CleanedSignalWriter.writeCsv(target, d.series(), false);
        }
    }

    private static Map<String, String> parseOptions(String options) {
        Map<String, String> m = new HashMap<>();
        if (!options.equals("-")) {
            for (String kv : options.split(";")) {
                String[] p = kv.split("=", 2);
                m.put(p[0], p[1]);
            }
        }
        return m;
    }

    @Test
    void missingFileAndFolderAreUnreadable(@TempDir Path dir) {
        assertThatThrownBy(() -> CsvReader.read(dir.resolve("absent.csv")))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.kind()).isEqualTo(InputException.Kind.UNREADABLE))
                .hasMessageContaining("absent.csv: no such file");
        assertThatThrownBy(() -> WavReader.read(dir))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.kind()).isEqualTo(InputException.Kind.UNREADABLE));
    }
}
