package org.phasewright.io.write;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.phasewright.diagnostics.ResidualDiagnostics;
import org.phasewright.diagnostics.ResidualReport;
import org.phasewright.fit.FitOptions;
import org.phasewright.fit.FitResult;
import org.phasewright.model.Covariate;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.Step;
import org.phasewright.refine.FrequencyRefiner;
import org.phasewright.refine.RefinedFrequency;
import org.phasewright.refine.Refinement;
import org.phasewright.selection.HarmonicGrowthResult;
import org.phasewright.selection.ModelSelection;
import org.phasewright.selection.SelectionStep;
import org.phasewright.selection.SelectionTable;
import org.phasewright.series.Series;

/**
 * The sections the result JSON adds for the checks beyond the plain fit: each holds exactly the
 * fields of the core result it was given (compared number for number), they come after the plain
 * fit's fields in a fixed order, and a document given none of them has none.
 */
class ResultJsonSectionsTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static Series data;
    private static FitResult fit;

    @BeforeAll
    static void fitOnce() {
        data = FitFixture.series();
        fit = FitFixture.fit();
    }

    @Test
    void aPlainDocumentHasNoCheckSections() throws IOException {
        JsonNode root = JSON.readTree(ResultJson.of(fit, data).toJsonString());
        for (String f : List.of("refined_frequencies", "refinement", "robust_fit", "diagnostics", "harmonic_growth",
                "model_comparison")) {
            assertThat(root.has(f)).as(f).isFalse();
        }
    }

    @Test
    void refinementCarriesEachFrequencyAndItsUnit() throws IOException {
        Refinement r = FrequencyRefiner.refine(data, FitFixture.model());
        RefinedFrequency series = r.frequencies().get(0);
        RefinedFrequency tone = r.frequencies().get(1);
        Map<String, FrequencyInUnit> units = Map.of(series.label(), new Scaled("rpm", 60), tone.label(), new Period());
        JsonNode root = JSON.readTree(ResultJson.of(r.fit(), data).refinement(r, units).toJsonString());
        JsonNode list = root.get("refined_frequencies");
        assertThat(list).hasSize(2);
        for (int i = 0; i < 2; i++) {
            RefinedFrequency want = r.frequencies().get(i);
            JsonNode f = list.get(i);
            assertThat(f.get("name").asText()).isEqualTo(want.label());
            assertThat(f.get("kind").asText()).isEqualTo(want.kind());
            assertThat(f.get("start_hz").asDouble()).isEqualTo(want.startHz());
            assertThat(f.get("frequency_hz").asDouble()).isEqualTo(want.frequencyHz());
            assertThat(f.get("frequency_se_hz").asDouble()).isEqualTo(want.stdErrorHz());
            assertThat(f.get("frequency_ci_hz").get(0).asDouble()).isEqualTo(want.ciLowHz());
            assertThat(f.get("frequency_ci_hz").get(1).asDouble()).isEqualTo(want.ciHighHz());
        }
        JsonNode rpm = list.get(0).get("in_unit");
        assertThat(rpm.get("unit").asText()).isEqualTo("rpm");
        assertThat(rpm.get("frequency").asDouble()).isEqualTo(series.frequencyHz() * 60);
        assertThat(rpm.get("frequency_se").asDouble()).isEqualTo(series.stdErrorHz() * 60);
        assertThat(rpm.get("frequency_ci").get(0).asDouble()).isEqualTo(series.ciLowHz() * 60);
        JsonNode period = list.get(1).get("in_unit");
        // a period turns the interval around: its low end comes from the high frequency
        assertThat(period.get("frequency_ci").get(0).asDouble()).isEqualTo(1 / tone.ciHighHz());
        assertThat(period.get("frequency_ci").get(1).asDouble()).isEqualTo(1 / tone.ciLowHz());
        JsonNode info = root.get("refinement");
        assertThat(info.get("iterations").asInt()).isEqualTo(r.iterations());
        assertThat(info.get("converged").asBoolean()).isEqualTo(r.converged());
        assertThat(info.get("rss").asDouble()).isEqualTo(r.rss());
        assertThat(info.get("dof").asInt()).isEqualTo(r.dof());

        JsonNode hertzOnly = JSON.readTree(ResultJson.of(r.fit(), data).refinement(r).toJsonString());
        assertThat(hertzOnly.get("refined_frequencies").get(0).has("in_unit")).isFalse();
    }

    @Test
    void diagnosticsCarryTheReportAndTheSuggestion() throws IOException {
        ResidualReport d = ResidualDiagnostics.of(fit, 12);
        JsonNode n = JSON.readTree(ResultJson.of(fit, data).diagnostics(d, ResultJson.LEAST_SQUARES_RESIDUALS, "try this")
                .toJsonString()).get("diagnostics");
        assertThat(n.get("residuals").asText()).isEqualTo("least_squares");
        assertThat(n.get("n").asInt()).isEqualTo(d.n()).isEqualTo(197);
        assertThat(n.get("lags").asInt()).isEqualTo(12);
        assertThat(n.get("durbin_watson").asDouble()).isEqualTo(d.durbinWatson());
        for (int k = 0; k < 12; k++) {
            assertThat(n.get("autocorrelation").get(k).asDouble()).isEqualTo(d.autocorrelation()[k]);
        }
        assertThat(n.get("white_noise_band").asDouble()).isEqualTo(d.band());
        assertThat(n.get("ljung_box").get("q").asDouble()).isEqualTo(d.ljungBox().statistic());
        assertThat(n.get("ljung_box").get("dof").asInt()).isEqualTo(d.ljungBox().dof());
        assertThat(n.get("ljung_box").get("p_value").asDouble()).isEqualTo(d.ljungBox().pValue());
        assertThat(n.get("jarque_bera").get("statistic").asDouble()).isEqualTo(d.jarqueBera().statistic());
        assertThat(n.get("jarque_bera").get("kurtosis").asDouble()).isEqualTo(d.jarqueBera().kurtosis());
        assertThat(n.get("warning_codes")).hasSize(d.warnings().size());
        assertThat(n.get("suggestion").asText()).isEqualTo("try this");

        JsonNode none = JSON.readTree(ResultJson.of(fit, data).diagnostics(d, ResultJson.ROBUST_RESIDUALS, null)
                .toJsonString()).get("diagnostics");
        assertThat(none.get("suggestion").isNull()).isTrue();
        assertThat(none.get("residuals").asText()).isEqualTo("robust");
        JsonNode skipped = JSON.readTree(ResultJson.of(fit, data).diagnosticsSkipped("too short").toJsonString())
                .get("diagnostics");
        assertThat(skipped.get("skipped").asText()).isEqualTo("too short");
        assertThat(skipped.size()).isEqualTo(1);
    }

    @Test
    void growthAndComparisonCarryTheirTables() throws IOException {
        ModelSpec base = ModelSpec.of(new Intercept(), new PolynomialTrend(1), new Sinusoid(17), new Step(1.2),
                new Covariate("load"));
        HarmonicGrowthResult g = ModelSelection.growHarmonics(data, base, 5, 0.01, 2, 6, FitOptions.defaults());
        SelectionTable t = ModelSelection.nested(data, FitFixture.model(), FitOptions.defaults());
        JsonNode root = JSON.readTree(ResultJson.of(fit, data).harmonicGrowth(g, 0.01, 2, 6).modelComparison(t).toJsonString());
        JsonNode n = root.get("harmonic_growth");
        assertThat(n.get("fundamental_hz").asDouble()).isEqualTo(GrowthSteps.fundamentalHz(g)).isEqualTo(5);
        assertThat(n.get("significance").asDouble()).isEqualTo(0.01);
        assertThat(n.get("allow_missing").asInt()).isEqualTo(2);
        assertThat(n.get("limit").asInt()).isEqualTo(6);
        List<Integer> kept = new ArrayList<>();
        n.get("kept").forEach(k -> kept.add(k.asInt()));
        assertThat(kept).isEqualTo(g.kept()).startsWith(1, 2);
        assertThat(n.get("stop_reason").asText()).isEqualTo(g.stopReason());
        sameTable(n, g.table());
        for (int i = 1; i < g.table().steps().size(); i++) {
            assertThat(GrowthSteps.harmonic(g, i)).isEqualTo(i);
        }
        assertThat(GrowthSteps.harmonic(g, 0)).isZero();
        sameTable(root.get("model_comparison"), t);
    }

    @Test
    void sectionsFollowThePlainFieldsInAFixedOrder() throws IOException {
        Refinement r = FrequencyRefiner.refine(data, FitFixture.model());
        SelectionTable t = ModelSelection.nested(data, r.fit().model(), FitOptions.defaults());
        // given in another order than written
        JsonNode root = JSON.readTree(ResultJson.of(r.fit(), data).modelComparison(t).diagnostics(ResidualDiagnostics.of(r.fit()),
                ResultJson.LEAST_SQUARES_RESIDUALS, null).refinement(r).toJsonString());
        List<String> names = new ArrayList<>();
        root.fieldNames().forEachRemaining(names::add);
        assertThat(names.subList(names.indexOf("warning_codes"), names.size()))
                .containsExactly("warning_codes", "refined_frequencies", "refinement", "diagnostics", "model_comparison");
    }

    private static void sameTable(JsonNode n, SelectionTable t) {
        JsonNode steps = n.get("steps");
        assertThat(steps).hasSize(t.steps().size());
        for (int i = 0; i < t.steps().size(); i++) {
            SelectionStep s = t.steps().get(i);
            JsonNode row = steps.get(i);
            assertThat(row.get("added").asText()).isEqualTo(s.added());
            assertThat(row.get("columns").asInt()).isEqualTo(s.columns());
            assertThat(row.get("rss").asDouble()).isEqualTo(s.rss());
            assertThat(row.get("dof").asInt()).isEqualTo(s.dof());
            if (i == 0) {
                assertThat(row.get("f_stat").isNull()).isTrue();
            } else {
                assertThat(row.get("f_stat").asDouble()).isEqualTo(s.fStat());
                assertThat(row.get("p_value").asDouble()).isEqualTo(s.pValue());
            }
            assertThat(row.get("aic").asDouble()).isEqualTo(s.aic());
            assertThat(row.get("delta_bic").asDouble()).isEqualTo(s.deltaBic());
        }
        assertThat(n.get("best_by_aic").asText()).isEqualTo(t.steps().get(t.bestByAic()).added());
        assertThat(n.get("best_by_bic").asText()).isEqualTo(t.steps().get(t.bestByBic()).added());
    }

    /** A unit that is a fixed multiple of hertz (rpm: 60). */
    private record Scaled(String unit, double perHertz) implements FrequencyInUnit {
        @Override
        public double fromHertz(double hz) {
            return hz * perHertz;
        }

        @Override
        public double uncertaintyFromHertz(double hz, double seHz) {
            return seHz * perHertz;
        }
    }

    /** The period in seconds. */
    private record Period() implements FrequencyInUnit {
        @Override
        public String unit() {
            return "period s";
        }

        @Override
        public double fromHertz(double hz) {
            return 1 / hz;
        }

        @Override
        public double uncertaintyFromHertz(double hz, double seHz) {
            return seHz / (hz * hz);
        }
    }
}
