package org.meridian.span;

/** The verdict of the span test at a chosen alpha, with the word shown to the user. */
public enum SpanVerdict {
    /** p ≥ alpha: no evidence that the map changes across the window. */
    STABLE("stable"),
    /** p &lt; alpha: more than one map is needed to describe the window. */
    CHANGES("changes");

    private final String word;

    SpanVerdict(String word) {
        this.word = word;
    }

    /** "stable" or "changes". */
    public String word() {
        return word;
    }

    public static SpanVerdict of(double p, double alpha) {
        return p < alpha ? CHANGES : STABLE;
    }
}
