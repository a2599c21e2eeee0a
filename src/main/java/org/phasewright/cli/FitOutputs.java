package org.phasewright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.phasewright.fit.FitResult;
import org.phasewright.io.ModelFile;
import org.phasewright.io.write.CoefficientTableWriter;
import org.phasewright.io.write.ComponentsCsvWriter;
import org.phasewright.io.write.ResultJson;
import org.phasewright.model.ModelSpec;

/**
 * The fit command's files, all written by the io package's writers (each atomically): the result
 * JSON ({@link ResultJson}), the components CSV ({@link ComponentsCsvWriter}), the coefficient
 * table CSV ({@link CoefficientTableWriter}) and the model file ({@link ModelFile}). Existing
 * files are replaced, as a re-run of an analysis expects.
 */
final class FitOutputs {
    static final String COMPONENTS = "components.csv";
    static final String COEFFICIENTS = "coefficients.csv";
    static final String RESULT = "result.json";
    static final String FILES = COMPONENTS + ", " + COEFFICIENTS + " and " + RESULT;

    private FitOutputs() {
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

    static void writeDirectory(Path dir, LoadedRecord record, FitResult result) throws IOException {
        Files.createDirectories(dir);
        ComponentsCsvWriter.write(dir.resolve(COMPONENTS), result, record.series(), true);
        CoefficientTableWriter.write(dir.resolve(COEFFICIENTS), result, record.unit(), true);
        json(record, result).write(dir.resolve(RESULT), true);
    }

    static void printJson(PrintWriter out, LoadedRecord record, FitResult result) {
        out.print(json(record, result).toJsonString());
        out.flush();
    }

    /** The result document as a tree, for a batch's JSON array. */
    static com.fasterxml.jackson.databind.node.ObjectNode jsonTree(LoadedRecord record, FitResult result) {
        return json(record, result).tree();
    }

    private static ResultJson json(LoadedRecord record, FitResult result) {
        ResultJson doc = ResultJson.of(result, record.series());
        if (record.csv() != null) {
            doc.readBy(record.csv());
        } else if (record.wav() != null) {
            doc.readBy(record.wav());
        }
        return doc.source(record.where());
    }
}
