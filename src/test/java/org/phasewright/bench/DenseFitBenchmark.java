package org.phasewright.bench;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Locale;
import java.util.Random;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.Fitter;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.series.Series;

/**
 * The dense fit's speed on the workload of ../shared/bench/numpy_peer.py: intercept + Legendre
 * trend of degree 1 + a harmonic series of 20 harmonics on N uniform samples (p = 42). Run by hand,
 * never in CI (speed is not a unit-test target):
 *
 * <pre>
 * mvn -B -q test-compile
 * java -Xmx4g -cp target/classes:target/test-classes:$(mvn -q dependency:build-classpath -Dmdep.outputFile=/dev/stdout) \
 *     org.phasewright.bench.DenseFitBenchmark 1000000 /tmp/y.f64
 * python3 ../shared/bench/numpy_peer.py /tmp/y.f64 --rate 5000 --fundamental 24.6 --harmonics 20 --poly 1
 * </pre>
 *
 * It writes the seeded signal as little-endian float64 for the peer, then times three fits and
 * prints the first harmonic's amplitude and SE so the two results can be compared as well as timed.
 */
public final class DenseFitBenchmark {
    private DenseFitBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 1_000_000;
        Path out = Path.of(args.length > 1 ? args[1] : "/tmp/phasewright-bench-y.f64");
        double rate = 5000;
        Random rnd = new Random(1);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / rate;
            y[i] = Math.cos(2 * Math.PI * 24.6 * t) + 0.3 * Math.cos(2 * Math.PI * 49.2 * t + 1) + 0.1 * rnd.nextGaussian();
        }
        ByteBuffer bb = ByteBuffer.allocate(8 * n).order(ByteOrder.LITTLE_ENDIAN);
        for (double v : y) {
            bb.putDouble(v);
        }
        bb.flip();
        try (FileChannel ch = FileChannel.open(out, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                StandardOpenOption.TRUNCATE_EXISTING)) {
            while (bb.hasRemaining()) {
                ch.write(bb);
            }
        }
        ModelSpec model = ModelSpec.of(new Intercept(), new PolynomialTrend(1), new HarmonicSeries(24.6, 20));
        Series s = Series.uniform(0, rate, y);
        for (int run = 1; run <= 3; run++) {
            long t0 = System.nanoTime();
            FitResult f = Fitter.fit(s, model);
            double sec = (System.nanoTime() - t0) / 1e9;
            HarmonicSeriesReport h = (HarmonicSeriesReport) f.terms().get(2);
            System.out.printf(Locale.ROOT, "{\"run\": %d, \"n\": %d, \"p\": %d, \"seconds\": %.3f, \"amplitude_1\": %.12g,"
                    + " \"amplitude_se_1\": %.6g}%n", run, n, f.p(), sec, h.harmonics().get(0).amplitude(),
                    h.harmonics().get(0).amplitudeSe());
        }
        System.out.println("data written to " + out);
    }
}
