package org.phasewright.cli;

/**
 * A problem with an input the user named (a file that is missing or unreadable, a column that is
 * not there, a time outside the record): exit code 3. The message is one sentence that names the
 * place.
 */
final class InputProblem extends RuntimeException {
    InputProblem(String message) {
        super(message);
    }

    InputProblem(String message, Throwable cause) {
        super(message, cause);
    }
}
