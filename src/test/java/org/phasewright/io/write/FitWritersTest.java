package org.phasewright.io.write;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.fit.Component;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.refine.FrequencyRefiner;
import org.phasewright.refine.RefinedFrequency;
import org.phasewright.refine.Refinement;
import org.phasewright.uncertainty.CorrectedInference;
import org.phasewright.uncertainty.CorrectionOptions;
import org.phasewright.uncertainty.SeCorrection;
import org.phasewright.uncertainty.SeMethod;
import org.phasewright.io.OutputException;
import org.phasewright.io.SoftwareVersion;
import org.phasewright.io.read.ColumnRef;
import org.phasewright.io.read.CsvData;
import org.phasewright.io.read.CsvReadOptions;
import org.phasewright.io.read.CsvReader;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.SinusoidReport;
import org.phasewright.series.Series;

class FitWritersTest {

    private static Series data;
    private static FitResult fit;

    @TempDir
    Path dir;

    @BeforeAll
    static void fitOnce() {
        data = FitFixture.series();
        fit = FitFixture.fit();
    }

    @Test
    void componentsCsvMatchesGoldenAndReadsBackExactly() throws IOException {
        Path f = dir.resolve("components.csv");
        ComponentsCsvWriter.write(f, fit, data, false);
        Golden.check(f, "components.csv");
        assertThat(Files.readAllLines(f).get(0)).isEqualTo("time [s],time [UTC],observed [mm/s],fitted [mm/s],residual [mm/s],"
                + "intercept [mm/s],polynomial trend of degree 1 [mm/s],harmonics of 5 Hz [mm/s],sinusoid 17 Hz [mm/s],"
                + "step at 1.2 s [mm/s],covariate load [mm/s]");
        List<String> lines = Files.readAllLines(f);
        assertThat(lines.get(21)).startsWith("0.2,2026-04-02T08:15:00.200Z,,");
        CsvData back = CsvReader.read(f, CsvReadOptions.builder().channels("observed", "fitted", "residual", "harmonics of 5 Hz")
                .covariates(List.of()).build());
        assertThat(back.channel("observed [mm/s]").values()).containsExactly(fit.components().observed());
        assertThat(back.channel("fitted [mm/s]").values()).containsExactly(fit.components().fitted());
        assertThat(back.channel("residual [mm/s]").values()).containsExactly(fit.components().residual());
        Component h = fit.components().part("harmonics of 5 Hz");
        assertThat(back.channel("harmonics of 5 Hz [mm/s]").values()).containsExactly(h.values());
        assertThat(back.series().missingCount()).isEqualTo(3);
        assertThat(back.series().times()).containsExactly(data.times());
    }

    @Test
    void isoTimeColumnOfComponentsRestoresTheOrigin() throws IOException {
        Path f = dir.resolve("components.csv");
        ComponentsCsvWriter.write(f, fit, data, false);
        CsvData back = CsvReader.read(f, CsvReadOptions.builder().timeColumn(ColumnRef.named("time [UTC]"))
                .channels("observed").covariates(List.of()).build());
        assertThat(back.series().origin()).contains(FitFixture.ORIGIN);
        for (int i = 0; i < data.size(); i++) {
            assertThat(back.series().timeAt(i)).isCloseTo(data.timeAt(i), within(1e-9));
        }
    }

    @Test
    void coefficientTableMatchesGoldenAndHoldsTheReportedNumbers() throws IOException {
        Path f = dir.resolve("coefficients.csv");
        CoefficientTableWriter.write(f, fit, data.unit(), false);
        Golden.check(f, "coefficients.csv");
        List<String> lines = Files.readAllLines(f);
        assertThat(lines.get(0)).isEqualTo("term,kind,harmonic,frequency [Hz],amplitude [mm/s],amplitude SE [mm/s],"
                + "amplitude 95% CI low [mm/s],amplitude 95% CI high [mm/s],phase [deg],phase SE [deg],estimate,estimate SE,"
                + "estimate 95% CI low,estimate 95% CI high,t,F,df1,df2,p-value,variance share");
        // intercept, trend, harmonic group + 2 harmonics, sinusoid, step, covariate
        assertThat(lines).hasSize(1 + 8);
        CsvData table = CsvReader.read(f, CsvReadOptions.builder().noTimeColumn(1).channels("amplitude")
                .covariates(List.of()).build());
        HarmonicSeriesReport h = (HarmonicSeriesReport) fit.term("harmonics of 5 Hz");
        SinusoidReport first = h.harmonics().get(0);
        assertThat(table.series().valueAt(3)).isEqualTo(first.amplitude());
        assertThat(first.amplitude()).isCloseTo(2.0, within(0.05));
        assertThat(lines.get(4)).startsWith("harmonic 1 of 5 Hz,sinusoid,1,5,");
    }

    @Test
    void resultJsonHasTheAgreedFieldsAndMatchesGolden() throws IOException {
        ResultJson doc = ResultJson.of(fit, data).source("fan.csv");
        Path f = dir.resolve("result.json");
        doc.write(f, false);
        assertThat(Files.readString(f)).isEqualTo(doc.toJsonString());
        // the version and the condition number (which depends on the engine's column scaling, not
        // on this writer) are masked; both are checked against their sources below
        String golden = Files.readString(f).replace("\"" + SoftwareVersion.get() + "\"", "\"VERSION\"")
                .replaceFirst("\"condition_number\" : [^,\n]+", "\"condition_number\" : \"COND\"");
        Path normalised = dir.resolve("normalised.json");
        Files.writeString(normalised, golden);
        Golden.check(normalised, "result.json");

        JsonNode root = new ObjectMapper().readTree(f.toFile());
        assertThat(root.get("n").asInt()).isEqualTo(fit.n()).isEqualTo(197);
        assertThat(root.get("p").asInt()).isEqualTo(fit.p());
        assertThat(root.get("dof").asInt()).isEqualTo(fit.dof());
        assertThat(root.get("residual_sd").asDouble()).isEqualTo(fit.residualSd());
        assertThat(root.get("r_squared").asDouble()).isEqualTo(fit.rSquared());
        assertThat(root.get("condition_number").asDouble()).isEqualTo(fit.conditionNumber());
        assertThat(root.get("software").get("version").asText()).isEqualTo(SoftwareVersion.get()).isNotEqualTo("unknown");
        JsonNode d = root.get("data");
        assertThat(d.get("n_samples").asInt()).isEqualTo(200);
        assertThat(d.get("n_missing").asInt()).isEqualTo(3);
        assertThat(d.get("longest_gap").asInt()).isEqualTo(2);
        assertThat(d.get("sampling").asText()).isEqualTo("uniform");
        assertThat(d.get("rate_hz").asDouble()).isEqualTo(100);
        assertThat(d.get("time_origin").asText()).isEqualTo("2026-04-02T08:15:00Z");
        for (JsonNode t : root.get("terms")) {
            for (String field : List.of("name", "kind", "amplitude", "amplitude_se", "amplitude_ci", "phase_deg", "phase_se_deg",
                    "f_stat", "p_value", "variance_share")) {
                assertThat(t.has(field)).as("%s of %s", field, t.get("name")).isTrue();
            }
        }
        JsonNode sin = root.get("terms").get(3);
        SinusoidReport s = (SinusoidReport) fit.term("sinusoid 17 Hz");
        assertThat(sin.get("name").asText()).isEqualTo("sinusoid 17 Hz");
        assertThat(sin.get("frequency_hz").asDouble()).isEqualTo(17);
        assertThat(sin.get("amplitude").asDouble()).isEqualTo(s.amplitude());
        assertThat(sin.get("amplitude_ci").get(0).asDouble()).isEqualTo(s.amplitudeCiLow());
        assertThat(sin.get("amplitude_ci").get(1).asDouble()).isEqualTo(s.amplitudeCiHigh());
        assertThat(sin.get("phase_se_deg").asDouble()).isEqualTo(s.phaseSeDeg());
        assertThat(root.get("terms").get(0).has("frequency_hz")).isFalse();
        assertThat(root.get("terms").get(2).get("harmonics")).hasSize(2);
        JsonNode c0 = root.get("coefficients").get(0);
        for (String field : List.of("name", "estimate", "std_error", "t", "p_value")) {
            assertThat(c0.has(field)).as(field).isTrue();
        }
        assertThat(root.get("coefficients")).hasSize(fit.p());
        assertThat(root.get("warnings").isArray()).isTrue();
        assertThat(root.get("model").get("terms")).hasSize(6);
        assertThatThrownBy(() -> doc.write(f, false)).isInstanceOf(OutputException.class);
    }

    @Test
    void readerSummariesAddSourceOffsetAndSamplingCheck() throws IOException {
        Path csv = dir.resolve("fan.csv");
        CleanedSignalWriter.writeCsv(csv, data, false);
        CsvData read = CsvReader.read(csv);
        JsonNode d = new ObjectMapper().readTree(ResultJson.of(fit, read.series()).readBy(read.summary()).toJsonString()).get("data");
        assertThat(d.get("source").asText()).isEqualTo(csv.toString());
        assertThat(d.get("sampling_check").get("time_gaps").asInt()).isZero();
        assertThat(d.get("sampling_check").get("tolerance_steps").asDouble()).isEqualTo(0.01);
        assertThat(d.get("time_offset_s").asDouble()).isZero();
        Path wav = dir.resolve("fan.wav");
        Series scaled = data.withValues(java.util.Arrays.stream(data.values()).map(x -> x / 10).toArray());
        CleanedSignalWriter.writeWav(wav, scaled, org.phasewright.io.WavSampleFormat.pcm16(100), false);
        org.phasewright.io.read.WavData w = org.phasewright.io.read.WavReader.read(wav);
        JsonNode wd = new ObjectMapper().readTree(ResultJson.of(fit, w.series()).readBy(w.info()).toJsonString()).get("data");
        assertThat(wd.get("wav").get("bits_per_sample").asInt()).isEqualTo(16);
        assertThat(wd.get("wav").get("encoding").asText()).isEqualTo("pcm_signed");
    }

    @Test
    void exactFitWritesNullForUndefinedNumbers() throws IOException {
        double[] v = new double[16];
        for (int i = 0; i < v.length; i++) {
            v[i] = 1 + Math.cos(2 * Math.PI * i / 8.0);
        }
        Series s = Series.uniform(0, 1, v);
        FitResult exact = org.phasewright.fit.Fitter.fit(s, org.phasewright.model.ModelSpec.of(
                new org.phasewright.model.Intercept(), new org.phasewright.model.Sinusoid(0.125)),
                org.phasewright.fit.FitOptions.defaults());
        String json = ResultJson.of(exact, s).toJsonString();
        assertThat(json).doesNotContain("NaN").doesNotContain("Infinity");
        JsonNode root = new ObjectMapper().readTree(json);
        assertThat(root.get("data").get("source").isNull()).isTrue();
        assertThat(root.get("warnings").size()).isEqualTo(exact.warnings().size());
    }

    @Test
    void shownStandardErrorsReplaceThePlainOnesAndAreNamed() throws IOException {
        // the fixture's noise is white, so AR errors would equal the plain ones; Newey-West errors differ
        CorrectedInference c = SeCorrection.apply(fit, data, CorrectionOptions.of(SeMethod.NEWEY_WEST));
        ShownInference shown = new ShownInference(c.method().id(), c.description(), c.terms(), c.coefficients(), c.dof());
        JsonNode root = new ObjectMapper().readTree(ResultJson.of(fit, data).shown(shown)
                .warnings(List.of(new FitWarning("checked", "a later check"))).toJsonString());
        JsonNode se = root.get("standard_errors");
        assertThat(se.get("method").asText()).isEqualTo("hac");
        assertThat(se.get("description").asText()).isEqualTo(c.description());
        assertThat(se.get("dof").asInt()).isEqualTo(c.dof());
        SinusoidReport corrected = (SinusoidReport) c.term("sinusoid 17 Hz");
        assertThat(root.get("terms").get(3).get("amplitude_se").asDouble()).isEqualTo(corrected.amplitudeSe())
                .isNotEqualTo(((SinusoidReport) fit.term("sinusoid 17 Hz")).amplitudeSe());
        for (int i = 0; i < fit.p(); i++) {
            assertThat(root.get("coefficients").get(i).get("std_error").asDouble()).isEqualTo(c.coefficients().get(i).stdError());
        }
        assertThat(root.get("warnings").toString()).isEqualTo("[\"a later check\"]");
        assertThat(root.get("warning_codes").toString()).isEqualTo("[\"checked\"]");
        assertThat(new ObjectMapper().readTree(ResultJson.of(fit, data).toJsonString()).has("standard_errors")).isFalse();

        Path f = dir.resolve("coefficients.csv");
        CoefficientTableWriter.write(f, fit, shown, data.unit(), false);
        String row = Files.readAllLines(f).stream().filter(l -> l.startsWith("sinusoid 17 Hz,")).findFirst().orElseThrow();
        String[] cells = row.split(",");
        assertThat(Double.parseDouble(cells[5])).isEqualTo(corrected.amplitudeSe());
        assertThat(cells[17]).isEqualTo(Integer.toString(c.dof()));
    }

    @Test
    void frequencyTableHoldsTheRefinedFrequenciesExactly() throws IOException {
        Refinement r = FrequencyRefiner.refine(data, FitFixture.model());
        Path f = dir.resolve("frequencies.csv");
        FrequencyTableWriter.write(f, r.frequencies(), 0.99, false);
        List<String> lines = Files.readAllLines(f);
        assertThat(lines.get(0)).isEqualTo("term,kind,start [Hz],frequency [Hz],frequency SE [Hz],"
                + "frequency 99% CI low [Hz],frequency 99% CI high [Hz]");
        assertThat(lines).hasSize(1 + 2);
        for (int i = 0; i < 2; i++) {
            RefinedFrequency want = r.frequencies().get(i);
            String[] cells = lines.get(1 + i).split(",");
            assertThat(cells[0]).isEqualTo(want.label());
            assertThat(cells[1]).isEqualTo(want.kind());
            assertThat(Double.parseDouble(cells[2])).isEqualTo(want.startHz());
            assertThat(Double.parseDouble(cells[3])).isEqualTo(want.frequencyHz());
            assertThat(Double.parseDouble(cells[4])).isEqualTo(want.stdErrorHz());
            assertThat(Double.parseDouble(cells[5])).isEqualTo(want.ciLowHz());
            assertThat(Double.parseDouble(cells[6])).isEqualTo(want.ciHighHz());
        }
        assertThatThrownBy(() -> FrequencyTableWriter.write(f, r.frequencies(), 0.99, false)).isInstanceOf(OutputException.class);
    }
}
