package org.phasewright.io.read;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.io.InputException;
import org.phasewright.series.Series;

class CsvReaderTest {

    @TempDir
    Path dir;

    private Path file(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    @Test
    void readsHeaderTimeChannelAndCovariates() throws IOException {
        Path p = file("pump.csv", "# pump 3, bearing housing\ntime,accel [g],temp [degC],status\n"
                + "0,0.5,20.1,ok\n0.001,-0.25,20.1,ok\n0.002,,20.2,ok\n0.003,NaN,20.2,ok\n0.004,1e-3,20.3,ok\n");
        CsvData d = CsvReader.read(p);
        Series s = d.series();
        assertThat(s.name()).isEqualTo("accel [g]");
        assertThat(s.unit()).isEqualTo("g");
        assertThat(s.times()).containsExactly(0, 0.001, 0.002, 0.003, 0.004);
        assertThat(s.valueAt(0)).isEqualTo(0.5);
        assertThat(s.isMissing(2)).isTrue();
        assertThat(s.isMissing(3)).isTrue();
        assertThat(s.valueAt(4)).isEqualTo(1e-3);
        assertThat(s.covariateNames()).containsExactly("temp [degC]");
        assertThat(s.covariate("temp [degC]")).containsExactly(20.1, 20.1, 20.2, 20.2, 20.3);
        CsvSummary sum = d.summary();
        assertThat(sum.delimiter()).isEqualTo(',');
        assertThat(sum.header()).isTrue();
        assertThat(sum.ignoredColumns()).containsExactly("status");
        assertThat(sum.channels().get(0).missing()).isEqualTo(2);
        assertThat(sum.channels().get(0).longestGap()).isEqualTo(2);
        assertThat(sum.sampling().uniform()).isTrue();
        assertThat(sum.sampling().rateHz()).isCloseTo(1000, within(1e-9));
        assertThat(s.isUniform()).isTrue();
        assertThat(sum.timeOffsetSeconds()).isZero();
    }

    @Test
    void detectsSemicolonWithDecimalCommaAndBom() throws IOException {
        Path p = dir.resolve("eu.csv");
        Files.write(p, ("\uFEFFZeit;Strom [A]\n0,0;1,5\n0,5;-2,25\n1,0;3\n").getBytes(StandardCharsets.UTF_8));
        CsvData d = CsvReader.read(p);
        assertThat(d.summary().delimiter()).isEqualTo(';');
        assertThat(d.summary().decimalComma()).isTrue();
        assertThat(d.summary().columns()).containsExactly("Zeit", "Strom [A]");
        assertThat(d.series().values()).containsExactly(1.5, -2.25, 3);
        assertThat(d.series().times()).containsExactly(0, 0.5, 1.0);
    }

    @Test
    void detectsTabsAndNoHeader() throws IOException {
        Path p = file("tabs.txt", "0\t1\t10\n1\t2\t20\n2\t3\t30\n");
        CsvData d = CsvReader.read(p);
        assertThat(d.summary().delimiter()).isEqualTo('\t');
        assertThat(d.summary().header()).isFalse();
        assertThat(d.series().name()).isEqualTo("column_2");
        assertThat(d.series().covariateNames()).containsExactly("column_3");
    }

    @Test
    void delimiterAndHeaderCanBeForced() throws IOException {
        Path p = file("forced.csv", "1;2\n3;4\n5;6\n");
        CsvData d = CsvReader.read(p, CsvReadOptions.builder().delimiter(';').decimalComma(false)
                .header(CsvReadOptions.HeaderMode.PRESENT).build());
        assertThat(d.summary().columns()).containsExactly("1", "2");
        assertThat(d.series().values()).containsExactly(4, 6);
    }

    @Test
    void choosesSeveralChannelsByNameAndIndex() throws IOException {
        Path p = file("three.csv", "t,a,b,c\n0,1,2,3\n1,4,5,6\n2,7,8,9\n");
        CsvData d = CsvReader.read(p, CsvReadOptions.builder().channels("c", "2").build());
        assertThat(d.channels()).extracting(Series::name).containsExactly("c", "a");
        assertThat(d.channel("a").values()).containsExactly(1, 4, 7);
        assertThat(d.channel("c").covariateNames()).containsExactly("b");
        assertThat(d.summary().channels()).extracting(ChannelSummary::column).containsExactly(4, 2);
    }

    @Test
    void channelNameMatchesHeaderWithoutItsUnit() throws IOException {
        Path p = file("unit.csv", "time [s],current [A]\n0,1\n1,2\n");
        assertThat(CsvReader.read(p, CsvReadOptions.builder().channels("current").build()).series().unit()).isEqualTo("A");
    }

    @Test
    void noTimeColumnWithGivenRate() throws IOException {
        Path p = file("rate.csv", "level\n1\n2\n3\n4\n");
        CsvData d = CsvReader.read(p, CsvReadOptions.builder().noTimeColumn(4).build());
        assertThat(d.series().times()).containsExactly(0, 0.25, 0.5, 0.75);
        assertThat(d.series().rate()).hasValue(4);
        assertThat(d.summary().time()).isEqualTo(CsvSummary.TimeSource.GIVEN_RATE);
        assertThat(d.summary().timeColumn()).isNull();
    }

    @Test
    void namedTimeUnitsAreConvertedToSeconds() throws IOException {
        Path p = file("ms.csv", "t_ms,x\n0,1\n250,2\n500,3\n");
        assertThat(CsvReader.read(p, CsvReadOptions.builder().timeScale(TimeScale.MILLISECONDS).build()).series().times())
                .containsExactly(0, 0.25, 0.5);
        Path h = file("h.csv", "t_h,x\n0,1\n0.5,2\n1,3\n");
        assertThat(CsvReader.read(h, CsvReadOptions.builder().timeScale(TimeScale.parse("h")).build()).series().times())
                .containsExactly(0, 1800, 3600);
        Path y = file("y.csv", "t,x\n0,1\n1,2\n2,3\n");
        // a Julian year of 365.25 days (IAU convention, from memory)
        assertThat(CsvReader.read(y, CsvReadOptions.builder().timeScale(TimeScale.YEARS).build()).series().timeAt(1))
                .isEqualTo(31_557_600.0);
        assertThat(TimeScale.parse("MIN")).isEqualTo(TimeScale.MINUTES);
        assertThat(TimeScale.parse("day").seconds()).isEqualTo(86_400);
        assertThatThrownBy(() -> TimeScale.parse("fortnight")).hasMessageContaining("s, ms, min, h, day, year");
    }

    @Test
    void largeNumericOriginIsSubtractedAndReported() throws IOException {
        Path p = file("epoch.csv", "unix,x\n1767225600.0,1\n1767225600.5,2\n1767225601.0,3\n1767225601.5,4\n");
        CsvData d = CsvReader.read(p);
        assertThat(d.summary().timeOffsetSeconds()).isEqualTo(1767225600.0);
        assertThat(d.series().times()).containsExactly(0, 0.5, 1.0, 1.5);
        assertThat(d.series().rate().getAsDouble()).isCloseTo(2.0, within(1e-12));
        // a small origin is kept as written unless asked
        Path small = file("small.csv", "t,x\n0.25,1\n0.5,2\n0.75,3\n");
        assertThat(CsvReader.read(small).series().timeAt(0)).isEqualTo(0.25);
        assertThat(CsvReader.read(small, CsvReadOptions.builder().timeZero(CsvReadOptions.TimeZero.FIRST_SAMPLE).build())
                .series().timeAt(0)).isEqualTo(0);
        assertThat(CsvReader.read(p, CsvReadOptions.builder().timeZero(CsvReadOptions.TimeZero.AS_WRITTEN).build())
                .series().timeAt(0)).isEqualTo(1767225600.0);
    }

    @Test
    void isoTimestampsWithAndWithoutOffset() throws IOException {
        Path p = file("iso.csv", "stamp,level [m]\n2026-03-01T12:00:00+01:00,1\n2026-03-01T11:00:00.250Z,2\n"
                + "2026-03-01 11:00:00.5Z,3\n2026-03-01T11:00:00.750,4\n");
        CsvData d = CsvReader.read(p);
        assertThat(d.summary().time()).isEqualTo(CsvSummary.TimeSource.ISO_8601);
        assertThat(d.series().origin()).contains(Instant.parse("2026-03-01T11:00:00Z"));
        assertThat(d.series().times()).containsExactly(0, 0.25, 0.5, 0.75);
        assertThat(d.summary().zoneForLocalTimes()).isEqualTo("Z");
        assertThat(d.series().isUniform()).isTrue();

        Path local = file("local.csv", "stamp,v\n2026-07-01T10:00:00,1\n2026-07-01T10:00:01,2\n");
        CsvData z = CsvReader.read(local, CsvReadOptions.builder().zoneForLocalTimes(ZoneId.of("Europe/Berlin")).build());
        assertThat(z.series().origin()).contains(Instant.parse("2026-07-01T08:00:00Z"));

        Path days = file("days.csv", "date,v\n2026-01-01,1\n2026-01-02,2\n2026-01-03,3\n2026-01-04,4\n2026-01-06,5\n");
        CsvData dd = CsvReader.read(days);
        assertThat(dd.series().times()).containsExactly(0, 86400, 2 * 86400, 3 * 86400, 5 * 86400);
        assertThat(dd.summary().sampling().uniform()).isFalse();
        assertThat(dd.summary().sampling().timeGaps()).isEqualTo(1);
    }

    @Test
    void unevenSamplingAndJitterAreReported() throws IOException {
        StringBuilder sb = new StringBuilder("t,x\n");
        for (int i = 0; i < 100; i++) {
            double jitter = (i % 2 == 0 ? 1 : -1) * 0.004; // 0.4 % of the 1 s step
            sb.append(i == 0 || i == 99 ? i : i + jitter).append(',').append(i).append('\n');
        }
        Path p = file("jitter.csv", sb.toString());
        CsvData d = CsvReader.read(p);
        SamplingSummary s = d.summary().sampling();
        assertThat(s.uniform()).isTrue();
        assertThat(s.jitterMaxSeconds()).isCloseTo(0.004, within(1e-9));
        assertThat(s.jitterRmsSeconds()).isBetween(0.0039, 0.004);
        CsvData strict = CsvReader.read(p, CsvReadOptions.builder().uniformTolerance(0.001).build());
        assertThat(strict.summary().sampling().uniform()).isFalse();
        assertThat(strict.summary().sampling().rateHz()).isNaN();
        assertThat(strict.series().isUniform()).isFalse();
    }

    @Test
    void quotedFieldsAndSpacesAreAccepted() throws IOException {
        Path p = file("quoted.csv", "\"time\", \"value, raw\"\n0, \"1.5\"\n1 ,2\n");
        CsvData d = CsvReader.read(p);
        assertThat(d.series().name()).isEqualTo("value, raw");
        assertThat(d.series().values()).containsExactly(1.5, 2);
    }

    @Test
    void progressIsReportedUpToTheFileSize() throws IOException {
        StringBuilder sb = new StringBuilder("t,x\n");
        for (int i = 0; i < 200_000; i++) {
            sb.append(i).append(',').append(i % 7).append('\n');
        }
        Path p = file("long.csv", sb.toString());
        List<long[]> calls = new ArrayList<>();
        CsvData d = CsvReader.read(p, CsvReadOptions.builder().progress((b, total, rows) -> calls.add(new long[] {b, total, rows})).build());
        assertThat(d.summary().rows()).isEqualTo(200_000);
        assertThat(calls.size()).isGreaterThanOrEqualTo(3);
        long[] last = calls.get(calls.size() - 1);
        assertThat(last[0]).isEqualTo(Files.size(p));
        assertThat(last[2]).isEqualTo(200_000);
        for (int i = 1; i < calls.size(); i++) {
            assertThat(calls.get(i)[0]).isGreaterThanOrEqualTo(calls.get(i - 1)[0]);
        }
    }

    @Test
    void timeColumnCanBeElsewhere() throws IOException {
        Path p = file("late.csv", "x,when\n1,0\n2,2\n3,4\n");
        CsvData d = CsvReader.read(p, CsvReadOptions.builder().timeColumn(ColumnRef.named("when")).build());
        assertThat(d.series().name()).isEqualTo("x");
        assertThat(d.series().times()).containsExactly(0, 2, 4);
    }

    @Test
    void conflictingOptionsAreRefused() throws IOException {
        Path p = file("c.csv", "t,a,b\n0,1,2\n1,2,3\n");
        assertThatThrownBy(() -> CsvReader.read(p, CsvReadOptions.builder().channels("a", "a").build()))
                .isInstanceOf(InputException.class).hasMessageContaining("chosen twice");
        assertThatThrownBy(() -> CsvReader.read(p, CsvReadOptions.builder().channels("a")
                .covariates(List.of(ColumnRef.named("a"))).build()))
                .isInstanceOf(InputException.class).hasMessageContaining("cannot be a covariate");
        assertThatThrownBy(() -> CsvReader.read(p, CsvReadOptions.builder().decimalComma(true).build()))
                .isInstanceOf(InputException.class).hasMessageContaining("comma-delimited");
        assertThatThrownBy(() -> CsvReadOptions.builder().noTimeColumn(0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> ColumnRef.at(0)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void windowsLineEndsAndLineNumbersAfterCommentsAndBlanks() throws IOException {
        Path p = file("crlf.csv", "# exported\r\ntime,x\r\n0,1\r\n\r\n# pause\r\n1,2\r\n2,oops\r\n");
        assertThatThrownBy(() -> CsvReader.read(p))
                .isInstanceOfSatisfying(InputException.class, e -> {
                    assertThat(e.line()).hasValue(7);
                    assertThat(e.column()).hasValue(2);
                    assertThat(e.columnName()).contains("x");
                })
                .hasMessageEndingWith("crlf.csv, line 7, column 2 (x): 'oops' is not a number");
        Path ok = file("crlf-ok.csv", "time,x\r\n0,1\r\n1,2\r\n");
        assertThat(CsvReader.read(ok).series().values()).containsExactly(1, 2);
    }

    @Test
    void numberCellsAreStrict() throws Exception {
        assertThat(NumberCells.parse("-1.5e-3", false)).isEqualTo(-1.5e-3);
        assertThat(NumberCells.parse(".5", false)).isEqualTo(0.5);
        assertThat(NumberCells.parse("+7", false)).isEqualTo(7);
        assertThat(NumberCells.parse("5.", false)).isEqualTo(5);
        assertThat(NumberCells.parse("1,25", true)).isEqualTo(1.25);
        assertThat(NumberCells.parse("NA", false)).isNaN();
        assertThat(NumberCells.parse("null", false)).isNaN();
        assertThat(NumberCells.parse("-inf", false)).isEqualTo(Double.NEGATIVE_INFINITY);
        for (String bad : new String[] {"1e", "e5", "1.2.3", "--1", "1 2", "0x10", "1d", "Infinityx", "."}) {
            assertThatThrownBy(() -> NumberCells.parse(bad, false)).as(bad).isInstanceOf(NumberCells.NotANumber.class);
        }
        assertThatThrownBy(() -> NumberCells.parse("1,5", false)).isInstanceOf(NumberCells.NotANumber.class);
    }
}
