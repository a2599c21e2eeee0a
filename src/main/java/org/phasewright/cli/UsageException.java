package org.phasewright.cli;

/**
 * A combination of options that cannot work (e.g. {@code --harmonics} without
 * {@code --fundamental}), found after parsing: exit code 2.
 */
final class UsageException extends RuntimeException {
    UsageException(String message) {
        super(message);
    }
}
