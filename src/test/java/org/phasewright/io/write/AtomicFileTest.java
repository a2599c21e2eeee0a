package org.phasewright.io.write;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.io.OutputException;

class AtomicFileTest {

    @TempDir
    Path dir;

    private long entries() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.count();
        }
    }

    @Test
    void writesAndRefusesToOverwriteUnlessAsked() throws IOException {
        Path f = dir.resolve("out.txt");
        AtomicFile.writeText(f, false, w -> w.write("first"));
        assertThat(Files.readString(f)).isEqualTo("first");
        assertThatThrownBy(() -> AtomicFile.writeText(f, false, w -> w.write("second")))
                .isInstanceOfSatisfying(OutputException.class, e -> assertThat(e.kind()).isEqualTo(OutputException.Kind.EXISTS))
                .hasMessageContaining("out.txt: the file exists");
        assertThat(Files.readString(f)).isEqualTo("first");
        AtomicFile.writeText(f, true, w -> w.write("second"));
        assertThat(Files.readString(f)).isEqualTo("second");
        assertThat(entries()).isEqualTo(1);
    }

    @Test
    void failureInsideTheWriterLeavesNothingAndKeepsTheOldFile() throws IOException {
        Path f = dir.resolve("out.txt");
        assertThatThrownBy(() -> AtomicFile.writeText(f, false, w -> {
            w.write("half");
            throw new IllegalStateException("boom");
        })).isInstanceOf(IllegalStateException.class).hasMessage("boom");
        assertThat(entries()).isZero();
        AtomicFile.writeText(f, false, w -> w.write("kept"));
        assertThatThrownBy(() -> AtomicFile.writeText(f, true, w -> {
            w.write("replacement");
            w.flush();
            throw new IOException("disk full");
        })).isInstanceOfSatisfying(OutputException.class, e -> assertThat(e.kind()).isEqualTo(OutputException.Kind.NOT_WRITABLE));
        assertThat(Files.readString(f)).isEqualTo("kept");
        assertThat(entries()).isEqualTo(1);
    }

    @Test
    void missingFolderIsReported() {
        assertThatThrownBy(() -> AtomicFile.writeText(dir.resolve("no/such/out.txt"), false, w -> w.write("x")))
                .isInstanceOfSatisfying(OutputException.class, e -> assertThat(e.kind()).isEqualTo(OutputException.Kind.NOT_WRITABLE))
                .hasMessageContaining("does not exist");
    }

    @Test
    void spreadsheetFormulaLabelsAreNeutralised() {
        assertThat(CsvCells.label("=HYPERLINK(\"x\")")).isEqualTo("'=HYPERLINK(\"x\")");
        assertThat(CsvCells.label("+1")).isEqualTo("'+1");
        assertThat(CsvCells.label("-2")).isEqualTo("'-2");
        assertThat(CsvCells.label("@SUM(A1)")).isEqualTo("'@SUM(A1)");
        assertThat(CsvCells.label("sinusoid 50 Hz")).isEqualTo("sinusoid 50 Hz");
        assertThat(CsvCells.number(-2.5)).isEqualTo("-2.5");
        assertThat(CsvCells.number(Double.NaN)).isEmpty();
        assertThat(CsvCells.number(3)).isEqualTo("3");
        assertThat(CsvCells.number(1e-7)).isEqualTo("1.0e-7");
    }
}
