package org.phasewright.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.phasewright.model.Covariate;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.TermSpec;
import org.phasewright.series.Series;

/**
 * Checks the dense QR fit against the NIST Statistical Reference Datasets for linear least
 * squares (https://www.itl.nist.gov/div898/strd/lls/lls.shtml, certified values computed in
 * 500-digit arithmetic; files and provenance in src/test/resources/nist-strd). Accuracy is measured
 * as the log relative error LRE = -log10(|estimate - certified| / |certified|), the number of
 * significant digits that agree (NIST's own measure); where the certified value is 0 the
 * absolute error, scaled to the data, must be below 1e-9.
 */
class NistStrdTest {

    private static final Map<String, String> ACHIEVED = new LinkedHashMap<>();

    record Certified(List<Double> estimates, List<Double> stdErrors, double residualSd, double rSquared) {
    }

    static Stream<Arguments> datasets() {
        return Stream.of(
                Arguments.of("norris", 1, true, 9.0),
                Arguments.of("pontius", 2, true, 9.0),
                Arguments.of("noint1", 1, false, 9.0),
                Arguments.of("noint2", 1, false, 9.0),
                Arguments.of("longley", -6, true, 9.0),
                Arguments.of("filip", 10, true, 7.0),
                Arguments.of("wampler1", 5, true, 7.0),
                Arguments.of("wampler2", 5, true, 7.0),
                Arguments.of("wampler3", 5, true, 7.0),
                Arguments.of("wampler4", 5, true, 7.0),
                Arguments.of("wampler5", 5, true, 7.0));
    }

    /**
     * @param degree a positive number d means the powers x, x^2, ..., x^d of the single predictor;
     *               a negative number -m means the m predictor columns x1..xm
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("datasets")
    void matchesCertifiedValues(String name, int degree, boolean intercept, double digits) throws IOException {
        double[][] data = readCsv("/nist-strd/" + name + ".csv");
        Certified cert = certified(name);
        int n = data.length;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = data[i][0];
        }
        Series.Builder b = Series.builder().uniform(0, 1, y);
        List<TermSpec> terms = new ArrayList<>();
        if (intercept) {
            terms.add(new Intercept());
        }
        if (degree > 0) {
            double[] x = column(data, 1);
            b.covariate("x", x);
            for (int k = 1; k <= degree; k++) {
                terms.add(new Covariate("x", k));
            }
        } else {
            for (int m = 1; m <= -degree; m++) {
                b.covariate("x" + m, column(data, m));
                terms.add(new Covariate("x" + m, 1));
            }
        }
        FitResult fit = Fitter.fit(b.build(), new ModelSpec(terms));

        double yScale = 0;
        for (double v : y) {
            yScale = Math.max(yScale, Math.abs(v));
        }
        double worstEstimate = 99;
        double worstSe = 99;
        for (int j = 0; j < cert.estimates().size(); j++) {
            CoefficientEstimate c = fit.coefficients().get(j);
            worstEstimate = Math.min(worstEstimate, lre(c.estimate(), cert.estimates().get(j)));
            double certSe = cert.stdErrors().get(j);
            if (certSe == 0) {
                // Wampler1/2 fit exactly: standard errors are 0 up to rounding, relative to the data's scale
                assertThat(Math.abs(c.stdError())).as("%s se(b%d)", name, j).isLessThan(1e-9 * yScale);
            } else {
                worstSe = Math.min(worstSe, lre(c.stdError(), certSe));
            }
        }
        double sdDigits;
        if (cert.residualSd() == 0) {
            assertThat(fit.residualSd()).as("%s residual SD", name).isLessThan(1e-9 * yScale);
            sdDigits = 99;
        } else {
            sdDigits = lre(fit.residualSd(), cert.residualSd());
        }
        double r2Digits = lre(fit.rSquared(), cert.rSquared());
        ACHIEVED.put(name, String.format(Locale.ROOT, "estimates %.1f, std errors %s, residual SD %s, R^2 %.1f",
                worstEstimate, worstSe == 99 ? "exact (0)" : String.format(Locale.ROOT, "%.1f", worstSe),
                sdDigits == 99 ? "exact (0)" : String.format(Locale.ROOT, "%.1f", sdDigits), r2Digits));

        assertThat(worstEstimate).as("%s: significant digits of the estimates", name).isGreaterThanOrEqualTo(digits);
        assertThat(worstSe).as("%s: significant digits of the standard errors", name).isGreaterThanOrEqualTo(digits);
        assertThat(sdDigits).as("%s: significant digits of the residual SD", name).isGreaterThanOrEqualTo(digits);
        assertThat(r2Digits).as("%s: significant digits of R^2", name).isGreaterThanOrEqualTo(digits);
        assertThat(fit.centredRSquared()).as("NIST uses uncentred R^2 without an intercept").isEqualTo(intercept);
    }

    @AfterAll
    static void printDigits() {
        System.out.println("NIST StRD significant digits achieved (LRE, worst over parameters):");
        ACHIEVED.forEach((k, v) -> System.out.println("  " + k + ": " + v));
    }

    static double lre(double value, double certified) {
        if (value == certified) {
            return 15;
        }
        double rel = Math.abs(value - certified) / Math.abs(certified);
        return Math.min(15, -Math.log10(rel));
    }

    private static double[] column(double[][] d, int j) {
        double[] c = new double[d.length];
        for (int i = 0; i < d.length; i++) {
            c[i] = d[i][j];
        }
        return c;
    }

    static double[][] readCsv(String resource) throws IOException {
        List<double[]> rows = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(
                Objects.requireNonNull(NistStrdTest.class.getResourceAsStream(resource)), StandardCharsets.UTF_8))) {
            r.readLine();
            String line;
            while ((line = r.readLine()) != null) {
                if (line.isBlank()) {
                    continue;
                }
                String[] f = line.split(",");
                double[] v = new double[f.length];
                for (int i = 0; i < f.length; i++) {
                    v[i] = Double.parseDouble(f[i].trim());
                }
                rows.add(v);
            }
        }
        return rows.toArray(new double[0][]);
    }

    static Certified certified(String name) throws IOException {
        List<Double> est = new ArrayList<>();
        List<Double> se = new ArrayList<>();
        double sd = Double.NaN;
        double r2 = Double.NaN;
        try (BufferedReader r = new BufferedReader(new InputStreamReader(
                Objects.requireNonNull(NistStrdTest.class.getResourceAsStream("/nist-strd/certified.csv")),
                StandardCharsets.UTF_8))) {
            r.readLine();
            String line;
            while ((line = r.readLine()) != null) {
                String[] f = line.split(",");
                if (!f[0].equals(name)) {
                    continue;
                }
                est.add(Double.parseDouble(f[3]));
                se.add(Double.parseDouble(f[4]));
                sd = Double.parseDouble(f[5]);
                r2 = Double.parseDouble(f[6]);
            }
        }
        return new Certified(est, se, sd, r2);
    }
}
