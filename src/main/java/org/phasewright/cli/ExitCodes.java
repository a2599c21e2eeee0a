package org.phasewright.cli;

/** The process exit codes of every command; README's command-line section lists them. */
final class ExitCodes {
    /** The command did what was asked. */
    static final int OK = 0;
    /** Something unexpected went wrong inside Phasewright (a bug): please report it. */
    static final int INTERNAL = 1;
    /** The command line is wrong: unknown option, bad value, missing file argument. */
    static final int USAGE = 2;
    /** An input file is missing, unreadable or not in a format Phasewright reads. */
    static final int INPUT = 3;
    /** The numbers cannot be fitted: rank-deficient design, too few samples, a frequency beyond Nyquist. */
    static final int NUMERICAL = 4;

    private ExitCodes() {
    }
}
