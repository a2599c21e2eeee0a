package org.phasewright.io.write;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

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
import org.phasewright.io.OutputException;
import org.phasewright.io.read.CsvData;
import org.phasewright.io.read.CsvReadOptions;
import org.phasewright.io.read.CsvReader;
import org.phasewright.series.Series;
import org.phasewright.uncertainty.RobustFit;
import org.phasewright.uncertainty.RobustLoss;
import org.phasewright.uncertainty.RobustResult;

/** A robust fit written out: its own components with the final weights, and its section of the result JSON. */
class RobustWritersTest {

    private static Series data;
    private static RobustResult robust;

    @TempDir
    Path dir;

    @BeforeAll
    static void fitOnce() {
        Series clean = FitFixture.series();
        double[] v = clean.values();
        v[60] += 4; // two spikes on the fan record
        v[61] -= 3;
        data = clean.withValues(v);
        robust = RobustFit.fit(data, FitFixture.model(), RobustLoss.BISQUARE);
    }

    @Test
    void componentsCsvHoldsTheRobustFitAndItsWeights() throws IOException {
        Path f = dir.resolve("components.csv");
        ComponentsCsvWriter.write(f, robust, data, false);
        List<String> lines = Files.readAllLines(f);
        assertThat(lines.get(0)).isEqualTo("time [s],time [UTC],observed [mm/s],fitted [mm/s],residual [mm/s],"
                + "intercept [mm/s],polynomial trend of degree 1 [mm/s],harmonics of 5 Hz [mm/s],sinusoid 17 Hz [mm/s],"
                + "step at 1.2 s [mm/s],covariate load [mm/s],weight");
        assertThat(lines).hasSize(1 + data.size());
        assertThat(ComponentsCsvWriter.headers(robust, data)).containsExactly(lines.get(0).split(","));
        CsvData back = CsvReader.read(f, CsvReadOptions.builder().channels("fitted", "residual", "sinusoid 17 Hz", "weight")
                .covariates(List.of()).build());
        assertThat(back.channel("fitted [mm/s]").values()).containsExactly(robust.components().fitted());
        assertThat(back.channel("residual [mm/s]").values()).containsExactly(robust.components().residual());
        Component tone = robust.components().part("sinusoid 17 Hz");
        assertThat(back.channel("sinusoid 17 Hz [mm/s]").values()).containsExactly(tone.values());
        double[] w = back.channel("weight").values();
        assertThat(w).containsExactly(robust.weights());
        assertThat(w[20]).isNaN(); // a gap of the fixture: an empty cell
        assertThat(w[60]).isZero(); // the spike is rejected by the bisquare
        // the robust fit is not the least-squares one: the spikes move the latter
        assertThat(robust.components().fitted()[60]).isNotEqualTo(robust.plain().components().fitted()[60]);
        assertThatThrownBy(() -> ComponentsCsvWriter.write(f, robust, data, false)).isInstanceOf(OutputException.class);
    }

    @Test
    void robustSectionCarriesTheFitsFields() throws IOException {
        JsonNode n = new ObjectMapper().readTree(ResultJson.of(robust.plain(), data).robust(robust).toJsonString())
                .get("robust_fit");
        assertThat(n.get("loss").asText()).isEqualTo("bisquare");
        assertThat(n.get("tuning").asDouble()).isEqualTo(robust.tuning());
        assertThat(n.get("scale").asDouble()).isEqualTo(robust.scale());
        assertThat(n.get("downweighted").asInt()).isEqualTo(robust.downweighted()).isPositive();
        assertThat(n.get("iterations").asInt()).isEqualTo(robust.iterations());
        assertThat(n.get("converged").asBoolean()).isEqualTo(robust.converged());
    }
}
