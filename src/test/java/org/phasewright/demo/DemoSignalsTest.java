package org.phasewright.demo;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;
import javax.sound.sampled.UnsupportedAudioFileException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The committed demo files are exactly what the seeded generator writes, and the README matches them. */
class DemoSignalsTest {

    private static final Path COMMITTED = Path.of("demo-signals");

    @Test
    void committedFilesEqualTheGeneratorsOutputByteForByte() throws IOException {
        for (DemoFile f : DemoSignals.render()) {
            Path committed = COMMITTED.resolve(f.name());
            assertThat(committed).as("demo file %s is committed", f.name()).exists();
            assertThat(Files.readAllBytes(committed))
                    .as("demo-signals/%s differs from the generator's output; re-run "
                            + "java -cp target/classes org.phasewright.demo.DemoSignals demo-signals", f.name())
                    .isEqualTo(f.content());
        }
    }

    @Test
    void renderingTwiceGivesTheSameBytes() {
        assertThat(DemoSignals.render()).isEqualTo(DemoSignals.render());
    }

    @Test
    void writeAllWritesEveryFileAndLeavesNoTemporaryFiles(@TempDir Path dir) throws IOException {
        List<Path> written = DemoSignals.writeAll(dir);
        assertThat(written).hasSize(DemoSignals.scenarios().size());
        try (var list = Files.list(dir)) {
            assertThat(list.map(p -> p.getFileName().toString())).noneMatch(n -> n.endsWith(".tmp"));
        }
        for (DemoFile f : DemoSignals.render()) {
            assertThat(Files.readAllBytes(dir.resolve(f.name()))).isEqualTo(f.content());
        }
    }

    @Test
    void thereAreAtLeastFiveScenariosWithDistinctFilesAndSmallSizes() {
        List<DemoFile> files = DemoSignals.render();
        assertThat(files).hasSizeGreaterThanOrEqualTo(5);
        Set<String> names = new HashSet<>();
        for (DemoFile f : files) {
            assertThat(names.add(f.name())).as("unique name %s", f.name()).isTrue();
            assertThat(f.content().length).as("size of %s", f.name()).isBetween(1_000, 2_000_000);
        }
    }

    @Test
    void readmeDescribesEveryScenarioWithItsCommand() throws IOException {
        String readme = Files.readString(COMMITTED.resolve("README.md"), StandardCharsets.UTF_8);
        for (DemoScenario s : DemoSignals.scenarios()) {
            assertThat(readme).contains(s.fileName());
            assertThat(readme).contains("./phasewright " + String.join(" ", s.command()));
            for (TrueSinusoid t : s.sinusoids()) {
                assertThat(readme).as("README of %s names %s", s.fileName(), t.label()).contains(t.label());
            }
        }
    }

    @Test
    void workshopRecordingIsMono16BitPcmAtTheStatedRate() throws IOException, UnsupportedAudioFileException {
        Path wav = COMMITTED.resolve(WorkshopHum.FILE);
        try (AudioInputStream in = AudioSystem.getAudioInputStream(wav.toFile())) {
            AudioFormat f = in.getFormat();
            assertThat(f.getEncoding()).isEqualTo(AudioFormat.Encoding.PCM_SIGNED);
            assertThat(f.getSampleSizeInBits()).isEqualTo(16);
            assertThat(f.getChannels()).isEqualTo(1);
            assertThat(f.getSampleRate()).isEqualTo(WorkshopHum.RATE_HZ);
            assertThat(in.getFrameLength()).isEqualTo(WorkshopHum.SAMPLES);
        }
    }

    @Test
    void dropoutsAndGapsAreEmptyCells() throws IOException {
        List<String> pump = Files.readAllLines(COMMITTED.resolve(PumpAccelerometer.FILE));
        long emptyPump = pump.stream().skip(1).filter(l -> l.endsWith(",")).count();
        assertThat(emptyPump).isEqualTo(45 + 20 + 60);
        List<String> harbour = Files.readAllLines(COMMITTED.resolve(HarbourLevel.FILE));
        assertThat(harbour).hasSize(HarbourLevel.HOURS + 1);
        long emptyHarbour = harbour.stream().skip(1).filter(l -> l.endsWith(",")).count();
        assertThat(emptyHarbour).isEqualTo(30 + 52 + 5);
    }

    @Test
    void greenhouseTimestampsAreUnevenAndIncreasing() throws IOException {
        List<String> rows = Files.readAllLines(COMMITTED.resolve(GreenhouseTemperature.FILE));
        Set<Long> steps = new HashSet<>();
        long previous = Long.MIN_VALUE;
        for (String row : rows.subList(1, rows.size())) {
            long t = java.time.Instant.parse(row.substring(0, row.indexOf(','))).getEpochSecond();
            assertThat(t).isGreaterThan(previous);
            if (previous != Long.MIN_VALUE) {
                steps.add(t - previous);
            }
            previous = t;
        }
        assertThat(steps.size()).as("distinct sampling intervals").isGreaterThan(50);
    }
}
