package org.phasewright.cli;

import java.util.List;

/**
 * Which part of a file to read.
 *
 * @param timeColumn  CSV time column, or null to let the reader find it
 * @param valueColumn CSV value column, or null for the first
 * @param channel     channel counting from 1, or null for the first
 * @param rateHz      sample rate for files without times, or null
 * @param covariates  further columns to read as covariates
 * @param allColumns  read every further numeric column as a covariate (for surveys); then
 *                    {@code covariates} is ignored
 */
record RecordRequest(String timeColumn, String valueColumn, Integer channel, Double rateHz, List<String> covariates,
                     boolean allColumns) {
    RecordRequest {
        covariates = List.copyOf(covariates);
    }

    /** The same request, reading every numeric column. */
    RecordRequest everyColumn() {
        return new RecordRequest(timeColumn, valueColumn, channel, rateHz, List.of(), true);
    }
}
