package org.meridian.ui;

/**
 * Which interval band the waveform plots draw around each grand average (DESIGN §6.2), at 95 %.
 * Contrasts always get the t-interval of their own per-participant difference waves, which is
 * the within-participant interval of that difference.
 */
public enum IntervalKind {
    NONE("No band"),
    ACROSS("95 % CI"),
    WITHIN("95 % CI within participants");

    private final String label;

    IntervalKind(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    @Override
    public String toString() {
        return label;
    }
}
