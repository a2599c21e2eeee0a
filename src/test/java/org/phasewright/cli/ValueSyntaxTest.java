package org.phasewright.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.phasewright.model.KnotPlacement;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.SplineTrend;
import org.phasewright.series.Series;

/** The syntaxes of --step, --trend, --skip-harmonics, --harmonics and --level, and refined frequencies in the user's unit. */
class ValueSyntaxTest {

    @Test
    void timesInSecondsWithUnitsAndIsoDateTimes() {
        assertThat(TimePoint.parse("600").seconds()).isEqualTo(600);
        assertThat(TimePoint.parse("90min").seconds()).isEqualTo(5400);
        assertThat(TimePoint.parse("8.25d").seconds()).isEqualTo(8.25 * 86400);
        assertThat(TimePoint.parse("1.5 h").seconds()).isEqualTo(5400);
        assertThat(TimePoint.parse("2026-04-14T06:00:00Z").instant()).isEqualTo(Instant.parse("2026-04-14T06:00:00Z"));
        assertThat(TimePoint.parse("2026-04-14T06:00:00").instant()).isEqualTo(Instant.parse("2026-04-14T06:00:00Z"));
        assertThat(TimePoint.parse("2026-04-14T08:00:00+02:00").instant()).isEqualTo(Instant.parse("2026-04-14T06:00:00Z"));
        assertThatThrownBy(() -> TimePoint.parse("tomorrow")).hasMessageContaining("is not a time");
        assertThatThrownBy(() -> TimePoint.parse("5 furlongs")).hasMessageContaining("not a time unit");
    }

    @Test
    void dateTimesArePlacedOnTheRecordsTimeAxis() {
        Series s = Series.builder().times(new double[] {0, 60, 120}).values(new double[] {1, 2, 3})
                .origin(Instant.parse("2026-04-14T05:59:00Z")).build();
        assertThat(TimePoint.parse("2026-04-14T06:00:30Z").secondsIn(s, "f.csv")).isEqualTo(90);
        Series bare = Series.at(new double[] {0, 1}, new double[] {1, 2});
        assertThatThrownBy(() -> TimePoint.parse("2026-04-14T06:00:30Z").secondsIn(bare, "f.csv"))
                .isInstanceOf(InputProblem.class).hasMessageContaining("f.csv has no timestamps");
    }

    @Test
    void trends() {
        assertThat(TrendChoice.parse("none")).isEmpty();
        assertThat(TrendChoice.parse("poly:2")).contains(new PolynomialTrend(2));
        assertThat(TrendChoice.parse("spline:6")).contains(new SplineTrend(6, KnotPlacement.EVEN, false));
        assertThat(TrendChoice.parse("spline:6:quantile:natural")).contains(new SplineTrend(6, KnotPlacement.QUANTILE, true));
        assertThatThrownBy(() -> TrendChoice.parse("cubic")).hasMessageContaining("is not a trend");
        assertThatThrownBy(() -> TrendChoice.parse("poly:x")).hasMessageContaining("not a whole number");
        assertThatThrownBy(() -> TrendChoice.parse("poly:0")).hasMessageContaining("not a usable trend");
        assertThatThrownBy(() -> TrendChoice.parse("spline:4:wobbly")).hasMessageContaining("wobbly");
    }

    @Test
    void harmonicLists() {
        assertThat(HarmonicNumbers.parse("2,4,6")).containsExactly(2, 4, 6);
        assertThat(HarmonicNumbers.parse("4-6")).containsExactly(4, 5, 6);
        assertThat(HarmonicNumbers.parse("6, 2-3,2")).isEqualTo(List.of(2, 3, 6));
        assertThatThrownBy(() -> HarmonicNumbers.parse("0")).hasMessageContaining("start at 1");
        assertThatThrownBy(() -> HarmonicNumbers.parse("6-4")).hasMessageContaining("backwards");
        assertThatThrownBy(() -> HarmonicNumbers.parse("two")).hasMessageContaining("not a harmonic number");
        assertThatThrownBy(() -> HarmonicNumbers.parse(",")).hasMessageContaining("names no harmonic");
    }

    @Test
    void levels() {
        assertThat(ConfidenceLevel.parse("0.95")).isEqualTo(0.95);
        assertThat(ConfidenceLevel.parse("99%")).isEqualTo(0.99);
        assertThatThrownBy(() -> ConfidenceLevel.parse("1")).hasMessageContaining("strictly between");
        assertThatThrownBy(() -> ConfidenceLevel.parse("95")).hasMessageContaining("strictly between");
        assertThatThrownBy(() -> ConfidenceLevel.parse("high")).hasMessageContaining("not a confidence level");
    }

    @Test
    void harmonicCounts() {
        assertThat(HarmonicCount.parse("7")).isEqualTo(new HarmonicCount(7, false));
        assertThat(HarmonicCount.parse("auto")).isEqualTo(new HarmonicCount(HarmonicCount.DEFAULT_LIMIT, true));
        assertThat(HarmonicCount.parse("AUTO:20")).isEqualTo(new HarmonicCount(20, true));
        assertThatThrownBy(() -> HarmonicCount.parse("0")).hasMessageContaining("at least 1");
        assertThatThrownBy(() -> HarmonicCount.parse("auto:")).hasMessageContaining("not a harmonic count");
        assertThatThrownBy(() -> HarmonicCount.parse("lots")).hasMessageContaining("auto:K");
    }

    @Test
    void refinedFrequenciesKeepTheUsersUnitRoundedToTheirError() {
        Frequency rpm = FrequencyParser.parse("1470rpm");
        Frequency refined = rpm.at(24.7499121, 0.00017);
        assertThat(refined.hertz()).isEqualTo(24.7499121);
        // SE 0.0102 rpm: two significant digits are the third decimal
        assertThat(refined.display()).isEqualTo("1484.995 rpm");
        assertThat(rpm.uncertaintyInUnit(24.7499121, 0.00017)).isEqualTo(0.00017 * 60, org.assertj.core.data.Offset.offset(1e-12));
        Frequency day = FrequencyParser.parse("period:1day");
        // a period's error is the frequency's times P / f (first order): 1e-9 Hz at 1/day is 0.0000864 day
        assertThat(day.uncertaintyInUnit(1 / 86400.0, 1e-9)).isEqualTo(86400 * 1e-9, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(day.at(1.157701978e-5, 3.57e-9).display()).isEqualTo("period 0.99975 day");
        assertThat(Frequency.hertz(60).at(60.000031, Double.NaN).display()).isEqualTo("60.000031 Hz");
    }
}
