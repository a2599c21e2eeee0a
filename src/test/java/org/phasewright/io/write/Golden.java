package org.phasewright.io.write;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Compares a written file with a golden file under src/test/resources/io/golden: text exactly,
 * numbers to 1e-9 relative (the engine's last digits may move with its summation order).
 * Run with {@code -Dgolden.update=true} to rewrite the golden files after an intended change.
 */
final class Golden {

    private static final Path DIR = Path.of("src/test/resources/io/golden");

    private Golden() {
    }

    static void check(Path written, String goldenName) throws IOException {
        Path golden = DIR.resolve(goldenName);
        if (Boolean.getBoolean("golden.update")) {
            Files.createDirectories(DIR);
            Files.copy(written, golden, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
        List<String> want = Files.readAllLines(golden);
        List<String> got = Files.readAllLines(written);
        assertThat(got).as("lines of %s", goldenName).hasSameSizeAs(want);
        for (int i = 0; i < want.size(); i++) {
            String[] w = tokens(want.get(i));
            String[] g = tokens(got.get(i));
            assertThat(g).as("%s line %d: %s", goldenName, i + 1, got.get(i)).hasSameSizeAs(w);
            for (int k = 0; k < w.length; k++) {
                if (isNumber(w[k]) && isNumber(g[k])) {
                    double a = Double.parseDouble(w[k]);
                    double b = Double.parseDouble(g[k]);
                    assertThat(Math.abs(a - b)).as("%s line %d token %d: %s vs %s", goldenName, i + 1, k + 1, g[k], w[k])
                            .isLessThanOrEqualTo(1e-9 * Math.max(Math.abs(a), 1e-3));
                } else {
                    assertThat(g[k]).as("%s line %d token %d", goldenName, i + 1, k + 1).isEqualTo(w[k]);
                }
            }
        }
    }

    private static String[] tokens(String line) {
        return line.split("(?<=[,:\\[\\] ])|(?=[,:\\[\\] ])");
    }

    private static boolean isNumber(String s) {
        try {
            Double.parseDouble(s.trim());
            return !s.isBlank();
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
