package org.phasewright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.model.Covariate;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.Intercept;
import org.phasewright.model.KnotPlacement;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.SplineTrend;
import org.phasewright.model.Step;

class ModelFileTest {

    @TempDir
    Path dir;

    private static final ModelSpec EVERY_KIND = ModelSpec.of(new Intercept(), new PolynomialTrend(3),
            new SplineTrend(4, KnotPlacement.QUANTILE, true), new Sinusoid(172.2), new HarmonicSeries(24.6, 6, List.of(4, 2)),
            new Step(3.5), new Covariate("load [kW]", 2));

    @Test
    void everyKindOfTermRoundTrips() {
        Path f = dir.resolve("model.json");
        ModelFile.save(f, EVERY_KIND, false);
        assertThat(ModelFile.load(f)).isEqualTo(EVERY_KIND);
        assertThatThrownBy(() -> ModelFile.save(f, EVERY_KIND, false)).isInstanceOf(OutputException.class);
        ModelFile.save(f, ModelSpec.of(new Intercept()), true);
        assertThat(ModelFile.load(f)).isEqualTo(ModelSpec.of(new Intercept()));
    }

    @Test
    void fileLayoutIsStable() throws IOException {
        String json = ModelFile.toJson(ModelSpec.of(new Sinusoid(50), new HarmonicSeries(50, 3, List.of(2))));
        assertThat(json).isEqualTo("""
                {
                  "format" : "phasewright-model",
                  "format_version" : 1,
                  "terms" : [ {
                    "kind" : "sinusoid",
                    "frequency_hz" : 50.0
                  }, {
                    "kind" : "harmonic_series",
                    "fundamental_hz" : 50.0,
                    "harmonics" : 3,
                    "skip" : [ 2 ]
                  } ]
                }
                """);
    }

    @Test
    void handWrittenFileWithDefaultsIsAccepted() {
        ModelSpec m = ModelFile.fromJson("""
                {"description": "pump 3, line and blade pass",
                 "terms": [{"kind": "intercept"}, {"kind": "spline_trend", "interior_knots": 3},
                           {"kind": "harmonic_series", "fundamental_hz": 49.95, "harmonics": 4},
                           {"kind": "covariate", "column": "temp"}]}
                """, null);
        assertThat(m.terms()).containsExactly(new Intercept(), new SplineTrend(3, KnotPlacement.EVEN, false),
                new HarmonicSeries(49.95, 4), new Covariate("temp", 1));
    }

    @Test
    void errorsNameTheField() {
        assertThatThrownBy(() -> ModelFile.fromJson("{\"terms\": [{\"kind\": \"spline_trend\", \"interior_knots\": 3, "
                + "\"placement\": \"random\"}]}", Path.of("m.json")))
                .isInstanceOfSatisfying(InputException.class, e -> {
                    assertThat(e.kind()).isEqualTo(InputException.Kind.BAD_MODEL);
                    assertThat(e.field()).contains("terms[0].placement");
                })
                .hasMessage("m.json, field terms[0].placement: expected \"even\" or \"quantile\", found \"random\"");
        assertThatThrownBy(() -> ModelFile.fromJson("[1, 2]", null)).hasMessageContaining("field (top level)");
        assertThatThrownBy(() -> ModelFile.fromJson("{\"terms\": [{\"kind\": \"step\", \"time_s\": 1, \"natural\": true}]}", null))
                .hasMessageContaining("field terms[0].natural: unknown field");
        assertThatThrownBy(() -> ModelFile.fromJson("{\"terms\": [{\"kind\": \"spline_trend\", \"interior_knots\": 2, "
                + "\"natural\": \"yes\"}]}", null)).hasMessageContaining("field terms[0].natural: expected true or false");
        assertThatThrownBy(() -> ModelFile.fromJson("{\"terms\": [{\"kind\": \"sinusoid\", \"frequency_hz\": 5}], \"format_version\": 2}", null))
                .hasMessageContaining("field format_version");
        assertThatThrownBy(() -> ModelFile.load(dir.resolve("none.json")))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.kind()).isEqualTo(InputException.Kind.UNREADABLE));
    }
}
