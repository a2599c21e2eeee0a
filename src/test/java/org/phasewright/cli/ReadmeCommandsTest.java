package org.phasewright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every {@code ./phasewright} command of the README's command-line section that reads the demo signals
 * and writes no file runs as written (in-process) and succeeds. Commands that write files
 * ({@code --out}, {@code --save-model}, {@code --summary}) or read files that are not in the
 * repository ({@code logs/*.csv}) are left out, so the test leaves the working tree as it was.
 */
class ReadmeCommandsTest {

    static Stream<String> commands() throws IOException {
        String readme = Files.readString(Path.of("README.md"), StandardCharsets.UTF_8);
        int from = readme.indexOf("<!-- section: command line (cli) -->");
        int to = readme.indexOf("<!-- section:", from + 1);
        List<String> out = new ArrayList<>();
        for (String line : readme.substring(from, to < 0 ? readme.length() : to).split("\\R")) {
            String l = line.strip();
            if (l.startsWith("./phasewright ") && !l.contains("--out") && !l.contains("--save-model")
                    && !l.contains("--summary") && !l.contains("*")) {
                out.add(l);
            }
        }
        assertThat(out).as("README command lines found").hasSizeGreaterThanOrEqualTo(8);
        return out.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("commands")
    void readmeCommandRunsAsWritten(String line) {
        String[] words = line.substring("./phasewright ".length()).split(" +");
        CliRun run = CliRun.of(Arrays.asList(words));
        assertThat(run.exitCode()).as("%s%n%s", line, run.err()).isZero();
        assertThat(run.err()).isEmpty();
        assertThat(run.out()).isNotBlank();
    }
}
