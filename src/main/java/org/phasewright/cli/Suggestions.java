package org.phasewright.cli;

/** The fundamental the spectrum suggests for {@code --fundamental auto}. (Wired when spectrum lands.) */
final class Suggestions {
    private Suggestions() {
    }

    static TermOptions.SuggestedFundamental fundamental(LoadedRecord record) {
        throw new IllegalStateException("the spectrum search is not merged yet");
    }
}
