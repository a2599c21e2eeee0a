package org.phasewright.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** The command line's frequency syntax. Unit factors are common practice (1 rpm = 1/60 Hz, 1 day = 86 400 s). */
class FrequencyParserTest {

    @ParameterizedTest(name = "{0} is {1} Hz")
    @CsvSource({
        "50, 50",
        "50hz, 50",
        "50 Hz, 50",
        "2.5kHz, 2500",
        "1e3, 1000",
        ".5, 0.5",
        "1485rpm, 24.75",
        "1485 RPM, 24.75",
        "3/h, 0.000833333333333333333",
        "3/hour, 0.000833333333333333333",
        "10/min, 0.16666666666666666",
        "2/day, 2.3148148148148148e-5",
        "2/d, 2.3148148148148148e-5",
        "1/week, 1.6534391534391535e-6",
        "1/year, 3.168808781402895e-8",
        "4/s, 4",
        "360deg/s, 1",
        "30deg/h, 2.3148148148148148e-5",
        "360deg/day, 1.1574074074074074e-5",
        "6.283185307179586rad/s, 1",
        "period:20ms, 50",
        "period:12h, 2.3148148148148148e-5",
        "period:1day, 1.1574074074074074e-5",
        "period: 0.5 s, 2",
    })
    void readsEachUnit(String text, double hertz) {
        assertThat(FrequencyParser.parse(text).hertz()).isCloseTo(hertz, within(Math.abs(hertz) * 1e-14));
    }

    @Test
    void tidalSpeedOfM2InDegreesPerHour() {
        // M2 speed 28.9841042 deg/h (published constituent speed); period 12.4206 h (from memory)
        Frequency m2 = FrequencyParser.parse("28.9841042deg/h");
        assertThat(1 / m2.hertz() / 3600).isCloseTo(12.4206012, within(1e-6));
    }

    @Test
    void harmonicsKeepTheUsersUnit() {
        assertThat(FrequencyParser.parse("1485rpm").times(2).display()).isEqualTo("2970 rpm");
        assertThat(FrequencyParser.parse("2/day").times(3).display()).isEqualTo("6 /day");
        assertThat(FrequencyParser.parse("period:12h").times(2).display()).isEqualTo("period 6 h");
        assertThat(FrequencyParser.parse("period:12h").times(2).hertz()).isCloseTo(1 / 21600.0, within(1e-18));
        assertThat(FrequencyParser.parse("28.9841042deg/h").display()).isEqualTo("28.9841042 deg/h");
        assertThat(FrequencyParser.parse("50").isHertz()).isTrue();
        assertThat(FrequencyParser.parse("1485rpm").isHertz()).isFalse();
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "abc", "50xyz", "-50", "0", "0rpm", "period:12", "period:12parsecs", "period:h",
        "3/fortnight", "deg/h", "15deg/min", "1/ms", "nan", "1e999"})
    void rejectsWhatIsNotAFrequency(String text) {
        assertThatThrownBy(() -> FrequencyParser.parse(text))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("is not a frequency");
    }
}
