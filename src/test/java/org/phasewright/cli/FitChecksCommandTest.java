package org.phasewright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.phasewright.demo.PumpAccelerometer;

/**
 * The options of {@code fit} beyond the plain fit, run in-process: frequency refinement, the choice of
 * standard errors, the robust fit, the residual checks, harmonic growth and the term-by-term
 * comparison. Truths are those of the seeded generators (the demo scenarios, or the records made
 * here), so each check is the behaviour least-squares theory promises (common practice) and is
 * deterministic.
 */
class FitChecksCommandTest {

    private static final String MOTOR = "demo-signals/motor-drive-current.csv";
    private static final String PUMP = "demo-signals/pump-accelerometer.csv";
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    /** The pump's shaft speed given 1 % low (1470.15 rpm for 1485 rpm): refinement finds the truth inside its 99 % interval. */
    @Test
    void refineRecoversTheShaftSpeedFromAStartOnePercentOff() throws IOException {
        List<String> args = List.of("fit", PUMP, "--fundamental", "1470.15rpm", "--harmonics", "7", "--skip-harmonics", "4-6",
                "--trend", "poly:2", "--refine", "--level", "0.99", "--quiet");
        CliRun json = CliRun.of(plus(args, "--json"));
        assertThat(json.exitCode()).as(json.err()).isZero();
        JsonNode r = JSON.readTree(json.out());
        JsonNode f = r.get("refined_frequencies").get(0);
        assertThat(f.get("kind").asText()).isEqualTo("harmonic_series");
        assertThat(f.get("start_hz").asDouble()).isCloseTo(1470.15 / 60, org.assertj.core.data.Offset.offset(1e-12));
        JsonNode ci = f.get("frequency_ci_hz");
        assertThat(PumpAccelerometer.SHAFT_HZ).as("true shaft frequency in the 99%% interval %s", ci)
                .isBetween(ci.get(0).asDouble(), ci.get(1).asDouble());
        assertThat(f.get("frequency_se_hz").asDouble()).isPositive().isLessThan(0.001);
        JsonNode inRpm = f.get("in_unit");
        assertThat(inRpm.get("unit").asText()).isEqualTo("rpm");
        assertThat(1485.0).isBetween(inRpm.get("frequency_ci").get(0).asDouble(), inRpm.get("frequency_ci").get(1).asDouble());
        // the rest of the document is the fit at the refined frequency
        JsonNode series = r.get("terms").get(2);
        assertThat(series.get("name").asText()).isEqualTo(f.get("name").asText());
        assertThat(series.get("frequency_hz").asDouble()).isEqualTo(f.get("frequency_hz").asDouble());
        assertThat(r.get("warning_codes").toString()).contains("frequency_moved");
        // phases of a refined fit carry the frequency's own uncertainty (joint covariance; Kay 1993 for one tone):
        // harmonic 7's phase SE is well above the SE of a fit that takes the refined frequency as known
        assertThat(r.get("standard_errors").get("description").asText()).contains("refined frequencies included");
        CliRun known = CliRun.of("fit", PUMP, "--fundamental", Double.toString(f.get("frequency_hz").asDouble()),
                "--harmonics", "7", "--skip-harmonics", "4-6", "--trend", "poly:2", "--level", "0.99", "--quiet", "--json");
        JsonNode knownH = JSON.readTree(known.out()).get("terms").get(2).get("harmonics").get(3);
        JsonNode refinedH = series.get("harmonics").get(3);
        assertThat(refinedH.get("harmonic").asInt()).isEqualTo(7);
        assertThat(refinedH.get("phase_se_deg").asDouble()).isGreaterThan(1.5 * knownH.get("phase_se_deg").asDouble());
        assertThat(refinedH.get("amplitude_se").asDouble()).isCloseTo(knownH.get("amplitude_se").asDouble(),
                org.assertj.core.data.Percentage.withPercentage(5));

        CliRun text = CliRun.of(args);
        assertThat(text.out()).contains("Refined frequencies").contains("fundamental, started at 1470.15 rpm")
                .contains("your unit").contains("1485.0").contains("The tables below are the fit at the refined frequencies");
    }

    @Test
    void refineWithAutoFundamentalAndOutWritesTheFrequencyTable() throws IOException {
        Path out = dir.resolve("motor");
        CliRun run = CliRun.of("fit", MOTOR, "--fundamental", "auto", "--refine", "--out", out.toString(), "--quiet");
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.out()).contains("Wrote components.csv, coefficients.csv, frequencies.csv and result.json");
        List<String> rows = Files.readAllLines(out.resolve("frequencies.csv"));
        assertThat(rows.get(0)).isEqualTo("term,kind,start [Hz],frequency [Hz],frequency SE [Hz],"
                + "frequency 95% CI low [Hz],frequency 95% CI high [Hz]");
        assertThat(rows).hasSize(2);
        String[] cells = rows.get(1).split(",");
        assertThat(cells[1]).isEqualTo("harmonic_series");
        // the generator's 60 Hz lies in the written 95 % interval
        assertThat(60.0).isBetween(Double.parseDouble(cells[5]), Double.parseDouble(cells[6]));
        JsonNode doc = JSON.readTree(out.resolve("result.json").toFile());
        assertThat(doc.get("refined_frequencies").get(0).get("frequency_hz").asDouble()).isEqualTo(Double.parseDouble(cells[3]));
    }

    /**
     * AR(1) noise with phi = 0.8 makes plain standard errors far too small at a low frequency (the
     * variance of a least-squares sinusoid coefficient follows the noise spectrum there, 2 S(f) / n:
     * Hannan 1970, Multiple Time Series, ch. VII); the ar errors must be larger, and the output must say
     * which are shown.
     */
    @Test
    void arErrorsAreLargerThanPlainOnesUnderAr1NoiseAndTheOutputSaysWhichAreShown() throws IOException {
        Path csv = ar1Record(dir.resolve("strain.csv"));
        CliRun plain = CliRun.of("fit", csv.toString(), "--freq", "3", "--json", "--quiet");
        CliRun ar = CliRun.of("fit", csv.toString(), "--freq", "3", "--errors", "ar", "--json", "--quiet");
        assertThat(ar.exitCode()).as(ar.err()).isZero();
        JsonNode p = JSON.readTree(plain.out());
        JsonNode c = JSON.readTree(ar.out());
        assertThat(p.get("standard_errors").get("method").asText()).isEqualTo("plain");
        assertThat(c.get("standard_errors").get("method").asText()).isEqualTo("ar");
        assertThat(c.get("standard_errors").get("description").asText()).contains("AR(");
        double plainSe = p.get("terms").get(1).get("amplitude_se").asDouble();
        double arSe = c.get("terms").get(1).get("amplitude_se").asDouble();
        assertThat(arSe).as("ar amplitude SE against plain %s", plainSe).isGreaterThan(1.5 * plainSe);
        for (int i = 0; i < p.get("coefficients").size(); i++) {
            assertThat(c.get("coefficients").get(i).get("std_error").asDouble())
                    .isGreaterThan(p.get("coefficients").get(i).get("std_error").asDouble());
            assertThat(c.get("coefficients").get(i).get("estimate").asDouble())
                    .isEqualTo(p.get("coefficients").get(i).get("estimate").asDouble());
        }
        assertThat(p.get("warning_codes").toString()).contains("autocorrelated_residuals");
        assertThat(p.get("diagnostics").get("suggestion").asText()).contains("--errors ar");

        CliRun text = CliRun.of("fit", csv.toString(), "--freq", "3", "--errors", "ar", "--quiet");
        assertThat(text.out()).contains("Standard errors shown: least-squares estimates; standard errors from an AR(")
                .contains("standard errors: ar").contains("already allow for correlated noise")
                .doesNotContain("Suggestion");
        CliRun plainText = CliRun.of("fit", csv.toString(), "--freq", "3", "--quiet");
        assertThat(plainText.out()).contains("Standard errors shown: plain least-squares standard errors")
                .contains("the residuals are autocorrelated").contains("Suggestion:").contains("--errors ar");
    }

    @Test
    void outWritesTheShownStandardErrorsToTheCoefficientTable() throws IOException {
        Path csv = ar1Record(dir.resolve("strain.csv"));
        Path out = dir.resolve("out");
        CliRun run = CliRun.of("fit", csv.toString(), "--freq", "3", "--errors", "hac", "--out", out.toString(), "--quiet");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode doc = JSON.readTree(out.resolve("result.json").toFile());
        assertThat(doc.get("standard_errors").get("method").asText()).isEqualTo("hac");
        String sinusoidRow = Files.readAllLines(out.resolve("coefficients.csv")).stream()
                .filter(l -> l.startsWith("sinusoid 3 Hz,")).findFirst().orElseThrow();
        assertThat(Double.parseDouble(sinusoidRow.split(",")[5])).isEqualTo(doc.get("terms").get(1).get("amplitude_se").asDouble());
    }

    /**
     * 3 % of samples hit by spikes of 5 to 15 times the noise SD: the robust fit holds the true amplitude
     * within 3 of its standard errors, which are markedly smaller than least squares' (the spikes inflate
     * the least-squares residual variance about 3-fold; common practice).
     */
    @Test
    void robustFitResistsSpikesAndSaysSo() throws IOException {
        Path csv = spikyRecord(dir.resolve("spiky.csv"));
        CliRun run = CliRun.of("fit", csv.toString(), "--freq", "5", "--robust", "huber", "--json", "--quiet");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode r = JSON.readTree(run.out());
        assertThat(r.get("standard_errors").get("method").asText()).isEqualTo("robust_huber");
        assertThat(r.get("robust_fit").get("loss").asText()).isEqualTo("huber");
        assertThat(r.get("robust_fit").get("downweighted").asInt()).isGreaterThanOrEqualTo(50);
        JsonNode tone = r.get("terms").get(1);
        double robustError = Math.abs(tone.get("amplitude").asDouble() - 1.5);
        assertThat(robustError).isLessThan(3 * tone.get("amplitude_se").asDouble());
        JsonNode ls = JSON.readTree(CliRun.of("fit", csv.toString(), "--freq", "5", "--json", "--quiet").out());
        assertThat(ls.get("terms").get(1).get("amplitude_se").asDouble()).isGreaterThan(1.4 * tone.get("amplitude_se").asDouble());
        assertThat(ls.get("diagnostics").get("suggestion").asText()).contains("--robust huber");

        CliRun text = CliRun.of("fit", csv.toString(), "--freq", "5", "--robust", "bisquare", "--quiet");
        assertThat(text.exitCode()).isZero();
        assertThat(text.out()).contains("robust M-estimates (bisquare loss").contains("Robust fit:")
                .contains("standard errors: robust bisquare").contains("Least-squares fit");
    }

    /**
     * Under --robust the summary, the residual checks and components.csv are the robust fit's own: the
     * written residuals are observed minus the robust fitted values, the weights count as the JSON says, the
     * spikes get weight near 0 and leave the robust fitted curve within a few noise SDs of the truth.
     */
    @Test
    void robustFitWritesItsOwnComponentsWeightsAndResidualChecks() throws IOException {
        Path csv = spikyRecord(dir.resolve("spiky.csv"));
        Path out = dir.resolve("robust");
        CliRun run = CliRun.of("fit", csv.toString(), "--freq", "5", "--robust", "huber", "--out", out.toString(), "--quiet");
        assertThat(run.exitCode()).as(run.err()).isZero();
        List<String> rows = Files.readAllLines(out.resolve("components.csv"));
        assertThat(rows.get(0)).isEqualTo("time [s],observed,fitted,residual,intercept,sinusoid 5 Hz,weight");
        assertThat(rows).hasSize(1 + 2000);
        JsonNode doc = JSON.readTree(out.resolve("result.json").toFile());
        int low = 0;
        double worst = 0;
        double[] residual = new double[2000];
        for (int i = 0; i < 2000; i++) {
            String[] c = rows.get(1 + i).split(",");
            double t = Double.parseDouble(c[0]);
            double fitted = Double.parseDouble(c[2]);
            residual[i] = Double.parseDouble(c[3]);
            assertThat(residual[i]).isEqualTo(Double.parseDouble(c[1]) - fitted);
            double w = Double.parseDouble(c[6]);
            assertThat(w).isBetween(0.0, 1.0);
            if (w < 0.5) {
                low++;
            }
            worst = Math.max(worst, Math.abs(fitted - (0.5 + 1.5 * Math.cos(2 * Math.PI * 5 * t + 1))));
        }
        assertThat(low).isEqualTo(doc.get("robust_fit").get("downweighted").asInt()).isGreaterThanOrEqualTo(50);
        // fitted-value SE is 0.2 sqrt(3 / 2000) = 0.008 (common practice); 0.04 is 5 of them
        assertThat(worst).isLessThan(0.04);
        JsonNode d = doc.get("diagnostics");
        assertThat(d.get("residuals").asText()).isEqualTo("robust");
        assertThat(d.get("durbin_watson").asDouble())
                .isEqualTo(org.phasewright.diagnostics.ResidualDiagnostics.durbinWatson(residual));
        assertThat(d.get("warning_codes").toString()).contains("non_normal_residuals"); // the spikes stay in the residuals
        assertThat(d.get("suggestion").isNull()).isTrue();

        CliRun text = CliRun.of("fit", csv.toString(), "--freq", "5", "--robust", "huber", "--quiet");
        assertThat(text.out()).contains("Robust fit  (huber loss)").contains("Robust residual scale")
                .contains("samples carry weight below 0.5").contains("Residual checks  (residuals of the robust fit)")
                .contains("The fit shown is already robust").doesNotContain("Suggestion")
                .doesNotContain("are those of the least-squares fit");
        JsonNode plain = JSON.readTree(CliRun.of("fit", csv.toString(), "--freq", "5", "--json", "--quiet").out());
        assertThat(plain.get("diagnostics").get("residuals").asText()).isEqualTo("least_squares");
        assertThat(plain.get("diagnostics").get("durbin_watson").asDouble()).isNotEqualTo(d.get("durbin_watson").asDouble());
    }

    @Test
    void diagnosticsAreInTheJsonAndTheReport() throws IOException {
        CliRun run = CliRun.of("fit", MOTOR, "--fundamental", "60", "--harmonics", "7", "--lags", "15", "--json", "--quiet");
        assertThat(run.exitCode()).isZero();
        JsonNode d = JSON.readTree(run.out()).get("diagnostics");
        assertThat(d.get("n").asInt()).isEqualTo(3700);
        assertThat(d.get("lags").asInt()).isEqualTo(15);
        assertThat(d.get("autocorrelation")).hasSize(15);
        assertThat(d.get("durbin_watson").asDouble()).isBetween(1.8, 2.2);
        assertThat(d.get("ljung_box").get("dof").asInt()).isEqualTo(15);
        assertThat(d.get("ljung_box").get("p_value").asDouble()).isBetween(0.0, 1.0);
        for (String f : List.of("statistic", "skewness", "kurtosis", "p_value")) {
            assertThat(d.get("jarque_bera").has(f)).as(f).isTrue();
        }
        assertThat(d.get("white_noise_band").asDouble()).isEqualTo(1.96 / Math.sqrt(3700));
        assertThat(d.get("warning_codes")).isEmpty();
        CliRun text = CliRun.of("fit", MOTOR, "--fundamental", "60", "--harmonics", "7", "--quiet");
        assertThat(text.out()).contains("Residual checks").contains("Durbin-Watson").contains("Ljung-Box")
                .contains("Jarque-Bera").contains("lags 1-10").contains("no clear sign of autocorrelation")
                .contains("consistent with normal noise").doesNotContain("*");
    }

    /** The motor drive has harmonics 1, 5 and 7 (2, 3, 4 and 6 absent): growth steps over the gaps and keeps exactly those. */
    @Test
    void harmonicGrowthFindsTheMotorDrivesOddHarmonics() throws IOException {
        CliRun run = CliRun.of("fit", MOTOR, "--fundamental", "60", "--harmonics", "auto", "--json", "--quiet");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode r = JSON.readTree(run.out());
        JsonNode g = r.get("harmonic_growth");
        assertThat(g.get("kept").toString()).isEqualTo("[1,5,7]");
        assertThat(g.get("fundamental_hz").asDouble()).isEqualTo(60);
        assertThat(g.get("allow_missing").asInt()).isEqualTo(3);
        assertThat(g.get("stop_reason").asText()).contains("not significant");
        List<Double> fitted = new ArrayList<>();
        r.get("terms").get(1).get("harmonics").forEach(h -> fitted.add(h.get("frequency_hz").asDouble()));
        assertThat(fitted).containsExactly(60.0, 300.0, 420.0);

        CliRun none = CliRun.of("fit", MOTOR, "--fundamental", "60", "--harmonics", "auto", "--allow-missing", "0", "--json",
                "--quiet");
        assertThat(JSON.readTree(none.out()).get("harmonic_growth").get("kept").toString()).isEqualTo("[1]");

        CliRun text = CliRun.of("fit", MOTOR, "--fundamental", "auto", "--harmonics", "auto", "--quiet");
        assertThat(text.exitCode()).isZero();
        assertThat(text.out()).contains("tried one at a time").contains("left out").contains("Kept: 1, 5, 7.");
    }

    @Test
    void compareTermsPrintsTheNestedTableAndPutsItInTheJson() throws IOException {
        CliRun run = CliRun.of("fit", MOTOR, "--fundamental", "60", "--harmonics", "7", "--compare-terms", "--json", "--quiet");
        JsonNode c = JSON.readTree(run.out()).get("model_comparison");
        assertThat(c.get("steps")).hasSize(1 + 7);
        assertThat(c.get("steps").get(0).get("added").asText()).isEqualTo("intercept");
        assertThat(c.get("steps").get(5).get("added").asText()).isEqualTo("harmonic 5 of 60 Hz");
        assertThat(c.get("steps").get(5).get("p_value").asDouble()).isLessThan(1e-10);
        assertThat(c.get("steps").get(2).get("p_value").asDouble()).isGreaterThan(0.01);
        assertThat(c.get("best_by_bic").asText()).isEqualTo("harmonic 7 of 60 Hz");
        CliRun text = CliRun.of("fit", MOTOR, "--fundamental", "60", "--harmonics", "7", "--compare-terms", "--quiet");
        assertThat(text.out()).contains("Terms added one at a time").contains("AIC - min")
                .contains("BIC are smallest with every term down to harmonic 7 of 60 Hz");
    }

    @Test
    void aBatchSummaryNamesTheStandardErrorsAndTheRefinedFrequencies() throws IOException {
        Path copy = dir.resolve("again.csv");
        Files.copy(Path.of(MOTOR), copy);
        CliRun run = CliRun.of("fit", MOTOR, copy.toString(), "--fundamental", "60", "--harmonics", "7", "--refine",
                "--errors", "ar", "--quiet");
        assertThat(run.exitCode()).as(run.err()).isZero();
        List<String> rows = run.out().lines().toList();
        assertThat(rows.get(0)).contains("standard_errors").contains("fundamental from 60 Hz frequency_hz")
                .contains("ljung_box_p");
        assertThat(rows.get(1)).contains(",ar,");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "--errors bogus|--errors",
        "--errors|--errors",
        "--robust tukeyish|--robust",
        "--lags 0|--lags",
        "--lags 5000|--lags 5000",
        "--harmonics auto:0|--harmonics",
        "--harmonics several|--harmonics",
        "--harmonics auto --significance 1.5|--significance",
        "--harmonics auto --allow-missing -2|--allow-missing",
        "--significance 0.05|--significance needs --harmonics auto",
        "--allow-missing 2|--allow-missing needs --harmonics auto",
        "--harmonics auto --skip-harmonics 2|--skip-harmonics",
        "--robust huber --errors ar|--robust",
    })
    void badValuesOfTheNewOptionsExitWith2AndAClearMessage(String options, String named) {
        List<String> args = new ArrayList<>(List.of("fit", MOTOR, "--fundamental", "60", "--quiet"));
        args.addAll(List.of(options.split(" ")));
        CliRun run = CliRun.of(args);
        assertThat(run.exitCode()).as("exit code of %s", options).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.err().lines()).hasSize(1);
        assertThat(run.err()).startsWith("phasewright fit: ").contains(named);
    }

    @Test
    void arErrorsOnAnUnevenRecordExitWith4AndNameTheAlternative() {
        CliRun run = CliRun.of("fit", "demo-signals/greenhouse-temperature.csv", "--value-column", "inside_c",
                "--fundamental", "1/day", "--errors", "ar", "--quiet");
        assertThat(run.exitCode()).isEqualTo(4);
        assertThat(run.err()).contains("uneven").contains("local_spectrum").hasLineCount(1);
        CliRun local = CliRun.of("fit", "demo-signals/greenhouse-temperature.csv", "--value-column", "inside_c",
                "--fundamental", "1/day", "--errors", "local-spectrum", "--quiet");
        assertThat(local.exitCode()).as(local.err()).isZero();
        assertThat(local.out()).contains("sinusoid standard errors from the residual spectrum near each frequency")
                .contains("lags count samples");
    }

    @Test
    void surveyWritesATinyFalseAlarmProbabilityAsSuch() {
        CliRun run = CliRun.of("survey", "demo-signals/greenhouse-temperature.csv", "--quiet");
        assertThat(run.out()).contains("false-alarm probability <1e-16").doesNotContain("probability 0.00");
        assertThat(Numbers.probability(3.2e-9)).isEqualTo("3.2e-9");
        assertThat(Numbers.probability(0.25)).isEqualTo("0.250");
        assertThat(Numbers.probability(0.0)).isEqualTo("<1e-16");
    }

    private static List<String> plus(List<String> args, String... more) {
        List<String> all = new ArrayList<>(args);
        all.addAll(List.of(more));
        return all;
    }

    /** 20 s at 100 Hz of 1 + 2 cos(2 pi 3 t - 0.5) plus AR(1) noise (phi 0.8, innovations SD 0.5), seed 11. */
    private static Path ar1Record(Path file) throws IOException {
        Random rnd = new Random(11);
        StringBuilder b = new StringBuilder("time_s,strain\n");
        double e = 0;
        for (int i = 0; i < 2000; i++) {
            double t = i / 100.0;
            e = 0.8 * e + 0.5 * rnd.nextGaussian();
            b.append(String.format(Locale.ROOT, "%.2f,%.6f%n", t, 1 + 2 * Math.cos(2 * Math.PI * 3 * t - 0.5) + e));
        }
        Files.writeString(file, b.toString());
        return file;
    }

    /** 20 s at 100 Hz of 0.5 + 1.5 cos(2 pi 5 t + 1) plus white noise (SD 0.2) and spikes of 1 to 3 in 3 % of samples, seed 5. */
    private static Path spikyRecord(Path file) throws IOException {
        Random rnd = new Random(5);
        StringBuilder b = new StringBuilder("time_s,x\n");
        for (int i = 0; i < 2000; i++) {
            double t = i / 100.0;
            double x = 0.5 + 1.5 * Math.cos(2 * Math.PI * 5 * t + 1) + 0.2 * rnd.nextGaussian();
            if (rnd.nextDouble() < 0.03) {
                x += (rnd.nextBoolean() ? 1 : -1) * (1 + 2 * rnd.nextDouble());
            }
            b.append(String.format(Locale.ROOT, "%.2f,%.6f%n", t, x));
        }
        Files.writeString(file, b.toString());
        return file;
    }
}
