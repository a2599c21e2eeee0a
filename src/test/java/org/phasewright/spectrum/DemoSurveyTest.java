package org.phasewright.spectrum;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.phasewright.io.read.CsvReadOptions;
import org.phasewright.io.read.CsvReader;
import org.phasewright.io.read.WavReader;
import org.phasewright.series.Series;

/**
 * The survey on the committed demo signals, read as a user's file would be (through the io readers). The truth
 * each check compares with is the scenario table of demo-signals/README.md (the seeded generator
 * org.phasewright.demo.DemoSignals).
 */
class DemoSurveyTest {

    private static final Path DIR = Path.of("demo-signals");
    private static final double DAY = 86400;

    private static Series csv(String name) throws Exception {
        return CsvReader.read(DIR.resolve(name)).series();
    }

    @Test
    void pumpShaftWithItsVanePassHarmonic() throws Exception {
        // truth: shaft 24.75 Hz with 2x, 3x and the seven-vane pass at 7x = 173.25 Hz
        SurveyResult r = Survey.of(csv("pump-accelerometer.csv"));
        FundamentalCandidate c = r.fundamental().orElseThrow();
        assertThat(c.frequencyHz()).isCloseTo(24.75, within(0.002));
        assertThat(c.harmonicNumbers()).containsExactly(1, 2, 3, 7);
        assertThat(c.unexplained()).isEmpty();
    }

    @Test
    void workshopHumIsFiftyHertzWithOddHarmonicsAndTheNoteIsApart() throws Exception {
        // truth: hum 50, 150, 250, 350 Hz; the note A4 440 Hz with its 2nd partial 880 Hz (all multiples of 10 Hz)
        SurveyResult r = Survey.of(WavReader.read(DIR.resolve("workshop-hum.wav")).series());
        FundamentalCandidate c = r.fundamental().orElseThrow();
        assertThat(c.frequencyHz()).isCloseTo(50, within(0.002));
        assertThat(c.harmonicNumbers()).containsExactly(1, 3, 5, 7);
        assertThat(c.unexplained()).extracting(Peak::frequencyHz)
                .satisfiesExactlyInAnyOrder(f -> assertThat(f).isCloseTo(440, within(0.01)),
                        f -> assertThat(f).isCloseTo(880, within(0.01)));
        assertThat(r.otherSeries()).singleElement().satisfies(note -> {
            assertThat(note.frequencyHz()).isCloseTo(440, within(0.002));
            assertThat(note.harmonicNumbers()).containsExactly(1, 2);
        });
    }

    @Test
    void harbourTideHasNoFundamentalButAllFiveConstituents() throws Exception {
        // truth: M2, S2, N2, K1, O1 (speeds in deg/h) and a seasonal quadratic level; no harmonic series
        SurveyResult r = Survey.of(csv("harbour-level.csv"));
        assertThat(r.fundamental()).isEmpty();
        assertThat(r.otherSeries()).isEmpty();
        double res = r.spectrum().resolutionHz();
        for (double speed : new double[] {28.9841042, 30.0, 28.4397295, 15.0410686, 13.9430356}) {
            double f = speed / 360 / 3600;
            assertThat(r.peaks()).as("constituent %s deg/h", speed)
                    .anySatisfy(p -> assertThat(p.frequencyHz()).isCloseTo(f, within(0.05 * res)));
        }
        assertThat(r.peaks()).hasSize(5);
    }

    @Test
    void greenhouseIsOneCyclePerDayWithItsSecondHarmonic() throws Exception {
        // truth: daily cycle and its 2nd harmonic, a heater step and a covariate; uneven timestamps
        SurveyResult r = Survey.of(CsvReader.read(DIR.resolve("greenhouse-temperature.csv"),
                CsvReadOptions.builder().channels("inside_c").build()).series());
        FundamentalCandidate c = r.fundamental().orElseThrow();
        assertThat(c.frequencyHz()).isCloseTo(1 / DAY, within(0.02 * r.spectrum().resolutionHz()));
        assertThat(c.harmonicNumbers()).containsExactly(1, 2);
    }

    @Test
    void motorCurrentIsSixtyHertzWithTheFifthAndSeventh() throws Exception {
        // truth: 60 Hz with the six-pulse drive's 5th and 7th harmonics; 27.75 cycles in the record
        SurveyResult r = Survey.of(csv("motor-drive-current.csv"));
        FundamentalCandidate c = r.fundamental().orElseThrow();
        assertThat(c.frequencyHz()).isCloseTo(60, within(0.002));
        assertThat(c.harmonicNumbers()).containsExactly(1, 5, 7);
        assertThat(c.missingHarmonics()).containsExactly(2, 3, 4, 6);
    }
}
