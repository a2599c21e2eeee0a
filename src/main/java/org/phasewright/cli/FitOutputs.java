package org.phasewright.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.phasewright.io.ModelFile;
import org.phasewright.io.write.CoefficientTableWriter;
import org.phasewright.io.write.ComponentsCsvWriter;
import org.phasewright.io.write.FrequencyTableWriter;
import org.phasewright.io.write.ResultJson;
import org.phasewright.model.ModelSpec;

/**
 * The fit command's files, all written by the io package's writers (each atomically): the result
 * JSON ({@link ResultJson}, given the analysis' parts by {@link AnalysisJson}), the
 * components CSV of the fit shown ({@link ComponentsCsvWriter}: the least-squares fit, or the robust fit
 * with each sample's weight), the coefficient table CSV
 * with the standard errors shown ({@link CoefficientTableWriter}), the refined frequencies
 * ({@link FrequencyTableWriter}, with {@code --refine}) and the model file ({@link ModelFile}).
 * Existing files are replaced, as a re-run of an analysis expects.
 */
final class FitOutputs {
    static final String COMPONENTS = "components.csv";
    static final String COEFFICIENTS = "coefficients.csv";
    static final String FREQUENCIES = "frequencies.csv";
    static final String RESULT = "result.json";

    private FitOutputs() {
    }

    /** The files {@link #writeDirectory} writes for this analysis, in words. */
    static String files(Analysis a) {
        return a.refinement().isPresent()
                ? COMPONENTS + ", " + COEFFICIENTS + ", " + FREQUENCIES + " and " + RESULT
                : COMPONENTS + ", " + COEFFICIENTS + " and " + RESULT;
    }

    static ModelSpec readModel(Path file) {
        return ModelFile.load(file);
    }

    static void writeModel(Path file, ModelSpec spec) throws IOException {
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        ModelFile.save(file, spec, true);
    }

    static void writeDirectory(Path dir, Analysis a, TermOptions terms) throws IOException {
        Files.createDirectories(dir);
        LoadedRecord record = a.record();
        if (a.robust().isPresent()) {
            ComponentsCsvWriter.write(dir.resolve(COMPONENTS), a.robust().get(), record.series(), true);
        } else {
            ComponentsCsvWriter.write(dir.resolve(COMPONENTS), a.fit(), record.series(), true);
        }
        CoefficientTableWriter.write(dir.resolve(COEFFICIENTS), a.fit(), a.shown(), record.unit(), true);
        if (a.refinement().isPresent()) {
            FrequencyTableWriter.write(dir.resolve(FREQUENCIES), a.refinement().get().frequencies(), a.fit().level(), true);
        }
        AnalysisJson.document(a, terms).write(dir.resolve(RESULT), true);
    }

    static void printJson(PrintWriter out, Analysis a, TermOptions terms) {
        out.print(AnalysisJson.document(a, terms).toJsonString());
        out.flush();
    }

    /** The result document as a tree, for a batch's JSON array. */
    static ObjectNode jsonTree(Analysis a, TermOptions terms) {
        return AnalysisJson.document(a, terms).tree();
    }
}
