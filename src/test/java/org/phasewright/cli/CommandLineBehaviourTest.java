package org.phasewright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Exit codes, error messages, help, JSON output, output files and batches of the command line. */
class CommandLineBehaviourTest {

    private static final String MOTOR = "demo-signals/motor-drive-current.csv";
    private static final String PUMP = "demo-signals/pump-accelerometer.csv";
    private static final ObjectMapper JSON = new ObjectMapper();

    @Test
    void usageErrorsExitWith2AndOneLineOnStderr() {
        for (String[] args : new String[][] {
            {},
            {"fit"},
            {"fit", MOTOR, "--frobnicate"},
            {"fit", MOTOR, "--freq", "50xyz"},
            {"fit", MOTOR, "--harmonics", "3"},
            {"fit", MOTOR},
            {"fit", MOTOR, "--fundamental", "60", "--harmonics", "3", "--skip-harmonics", "5"},
            {"fit", MOTOR, "--fundamental", "60", "--level", "1.5"},
            {"fit", MOTOR, "--fundamental", "60", "--trend", "wiggly"},
            {"survey", MOTOR, "--unit", "furlongs"},
            {"bogus"},
        }) {
            CliRun run = CliRun.of(args);
            assertThat(run.exitCode()).as("exit code of %s", List.of(args)).isEqualTo(2);
            assertThat(run.out()).as("stdout of %s", List.of(args)).isEmpty();
            assertThat(run.err().lines()).as("stderr of %s", List.of(args)).hasSize(1);
            assertThat(run.err()).startsWith("phasewright");
        }
    }

    @Test
    void aBadFrequencyIsNamedWithItsOption() {
        CliRun run = CliRun.of("fit", MOTOR, "--freq", "50xyz");
        assertThat(run.err()).contains("--freq").contains("'50xyz' is not a frequency");
    }

    @Test
    void aMissingFileExitsWith3AndNamesTheFile() {
        CliRun run = CliRun.of("fit", "no/such/file.csv", "--freq", "50");
        assertThat(run.exitCode()).isEqualTo(3);
        assertThat(run.err()).contains("no/such/file.csv").hasLineCount(1);
    }

    @Test
    void aMalformedCellExitsWith3AndNamesFileLineAndColumn(@TempDir Path dir) throws IOException {
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "time_s,x\n0,1\n0.1,2\n0.2,abc\n0.3,4\n");
        CliRun run = CliRun.of("fit", bad.toString(), "--freq", "1");
        assertThat(run.exitCode()).isEqualTo(3);
        assertThat(run.err()).contains("bad.csv").contains("line 4").contains("column 2").hasLineCount(1);
    }

    @Test
    void aMissingCovariateColumnExitsWith3() {
        CliRun run = CliRun.of("fit", MOTOR, "--fundamental", "60", "--covariate", "load_pct");
        assertThat(run.exitCode()).isEqualTo(3);
        assertThat(run.err()).contains("load_pct").hasLineCount(1);
    }

    @Test
    void numericalProblemsExitWith4(@TempDir Path dir) throws IOException {
        CliRun aboveNyquist = CliRun.of("fit", MOTOR, "--freq", "4100");
        assertThat(aboveNyquist.exitCode()).isEqualTo(4);
        assertThat(aboveNyquist.err()).contains("Nyquist").hasLineCount(1);
        Path tiny = dir.resolve("tiny.csv");
        Files.writeString(tiny, "time_s,x\n0,1\n0.1,2\n0.2,1.5\n0.3,0.5\n");
        CliRun tooFew = CliRun.of("fit", tiny.toString(), "--fundamental", "1", "--harmonics", "3");
        assertThat(tooFew.exitCode()).isEqualTo(4);
        assertThat(tooFew.err()).hasLineCount(1);
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "fit", "survey"})
    void everyCommandHasHelpWithAnExample(String command) {
        CliRun run = command.isEmpty() ? CliRun.of("--help") : CliRun.of(command, "--help");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("Usage:").contains("Example").contains("phasewright");
        assertThat(run.err()).isEmpty();
    }

    @Test
    void jsonGoesAloneToStdoutWithTheDocumentedFields() throws IOException {
        CliRun run = CliRun.of("fit", MOTOR, "--fundamental", "60", "--harmonics", "7", "--freq", "1485rpm", "--json");
        assertThat(run.exitCode()).isZero();
        assertThat(run.err()).isEmpty();
        JsonNode r = JSON.readTree(run.out());
        for (String f : List.of("n", "p", "dof", "residual_sd", "r_squared", "terms", "coefficients", "warnings")) {
            assertThat(r.has(f)).as("field %s", f).isTrue();
        }
        assertThat(r.get("n").asInt()).isEqualTo(3700);
        assertThat(r.get("dof").asInt()).isEqualTo(r.get("n").asInt() - r.get("p").asInt());
        assertThat(r.get("warnings").isArray()).isTrue();
        JsonNode sinusoid = null;
        for (JsonNode t : r.get("terms")) {
            assertThat(t.has("name") && t.has("kind")).isTrue();
            if (t.get("kind").asText().equals("sinusoid")) {
                sinusoid = t;
            }
        }
        assertThat(sinusoid).isNotNull();
        for (String f : List.of("frequency_hz", "amplitude", "amplitude_se", "amplitude_ci", "phase_deg", "phase_se_deg",
                "f_stat", "p_value", "variance_share")) {
            assertThat(sinusoid.has(f)).as("term field %s", f).isTrue();
        }
        assertThat(sinusoid.get("frequency_hz").asDouble()).isEqualTo(24.75);
        assertThat(sinusoid.get("amplitude_ci").size()).isEqualTo(2);
        for (JsonNode c : r.get("coefficients")) {
            for (String f : List.of("name", "estimate", "std_error", "t", "p_value")) {
                assertThat(c.has(f)).as("coefficient field %s", f).isTrue();
            }
        }
    }

    @Test
    void readableTableShowsTheUsersUnitBesideHertz() {
        CliRun run = CliRun.of("fit", PUMP, "--fundamental", "1485rpm", "--harmonics", "3", "--quiet");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("1485 rpm").contains("2970 rpm").contains("24.75").contains("frequency (Hz)")
                .contains("amplitude").contains("phase (deg)").contains("share (%)").contains("Fit");
        assertThat(run.out()).doesNotContain("***");
    }

    @Test
    void outWritesComponentsCoefficientsAndResult(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("motor");
        CliRun run = CliRun.of("fit", MOTOR, "--fundamental", "60", "--harmonics", "7", "--out", out.toString());
        assertThat(run.exitCode()).isZero();
        assertThat(out.resolve("components.csv")).exists();
        assertThat(out.resolve("coefficients.csv")).exists();
        assertThat(out.resolve("result.json")).exists();
        assertThat(Files.readAllLines(out.resolve("components.csv"))).hasSize(3700 + 1);
        assertThat(JSON.readTree(out.resolve("result.json").toFile()).get("n").asInt()).isEqualTo(3700);
        try (var files = Files.list(out)) {
            assertThat(files.map(p -> p.getFileName().toString())).noneMatch(n -> n.startsWith("."));
        }
    }

    @Test
    void savedModelFitsTheSameWayWhenLoaded(@TempDir Path dir) throws IOException {
        Path model = dir.resolve("motor-model.json");
        CliRun first = CliRun.of("fit", MOTOR, "--fundamental", "60", "--harmonics", "7", "--save-model", model.toString(),
                "--json");
        CliRun again = CliRun.of("fit", MOTOR, "--model", model.toString(), "--json");
        assertThat(again.exitCode()).isZero();
        assertThat(JSON.readTree(again.out()).get("terms")).isEqualTo(JSON.readTree(first.out()).get("terms"));
    }

    @Test
    void severalFilesGiveOneSummaryRowEach(@TempDir Path dir) throws IOException {
        Path copy = dir.resolve("second.csv");
        Files.copy(Path.of(MOTOR), copy);
        Path summary = dir.resolve("summary.csv");
        CliRun run = CliRun.of("fit", MOTOR, copy.toString(), "--fundamental", "60", "--harmonics", "7",
                "--summary", summary.toString());
        assertThat(run.exitCode()).isZero();
        List<String> rows = Files.readAllLines(summary);
        assertThat(rows).hasSize(3);
        assertThat(rows.get(0)).startsWith("file,status,exit_code,message,n,p,dof,residual_sd,r_squared,warnings")
                .contains("harmonic 1 of 60 Hz amplitude");
        assertThat(rows.get(1)).startsWith(MOTOR + ",ok,0,");
        assertThat(rows.get(2)).startsWith(copy + ",ok,0,");
    }

    @Test
    void aFailingFileInABatchGetsAFailedRowAndTheExitCode(@TempDir Path dir) throws IOException {
        Path bad = dir.resolve("empty.csv");
        Files.writeString(bad, "");
        CliRun run = CliRun.of("fit", MOTOR, bad.toString(), "--fundamental", "60", "--quiet");
        assertThat(run.exitCode()).isEqualTo(3);
        List<String> rows = run.out().lines().toList();
        assertThat(rows).hasSize(3);
        assertThat(rows.get(1)).startsWith(MOTOR + ",ok,0,");
        assertThat(rows.get(2)).startsWith(bad + ",failed,3,");
        assertThat(run.err()).contains("empty.csv").hasLineCount(1);
    }

    @Test
    void surveyDescribesTheRecordAndSuggestsTheFundamental() {
        CliRun run = CliRun.of("survey", MOTOR, "--quiet");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("3700").contains("uniform, 8000 Hz").contains("resolution 1/T")
                .contains("Nyquist").contains("4000 Hz").contains("Strongest peaks")
                .contains("Suggested fundamental 60").contains("--fundamental 60");
    }

    @Test
    void surveySuggestsTheHumSeriesAndTheNoteAsASecondSeries() {
        CliRun run = CliRun.of("survey", "demo-signals/workshop-hum.wav", "--quiet");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("Suggested fundamental 49.99").contains("harmonics 1, 3, 5, 7")
                .contains("A second series: 440 Hz").contains("--skip-harmonics 2,4,6 --freq 440 --freq 880");
    }

    @Test
    void surveyOfTidesFindsNoCommonFundamental() {
        CliRun run = CliRun.of("survey", "demo-signals/harbour-level.csv", "--quiet");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("No fundamental explains").doesNotContain("--fundamental");
    }

    @Test
    void surveyOfUnevenRecordSaysSo() {
        CliRun run = CliRun.of("survey", "demo-signals/greenhouse-temperature.csv", "--quiet");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("uneven").contains("outside_c").contains("time zero");
    }

    @Test
    void autoFundamentalTakesTheSurveysSuggestion() throws IOException {
        CliRun run = CliRun.of("fit", MOTOR, "--fundamental", "auto", "--json");
        assertThat(run.exitCode()).isZero();
        JsonNode series = JSON.readTree(run.out()).get("terms").get(1);
        assertThat(series.get("kind").asText()).isEqualTo("harmonic_series");
        assertThat(series.get("frequency_hz").asDouble()).isBetween(59.99, 60.01);
        assertThat(series.get("harmonics").size()).isEqualTo(7);
    }
}
