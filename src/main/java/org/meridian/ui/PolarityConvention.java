package org.meridian.ui;

/**
 * Which way positive voltages point in every waveform plot. Both conventions are common in the
 * ERP literature; the choice only flips the vertical axis, never the data.
 */
public enum PolarityConvention {
    POSITIVE_UP("Positive up"),
    NEGATIVE_UP("Negative up");

    private final String label;

    PolarityConvention(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    /** Whether a plot's value axis runs downwards (negative up). */
    public boolean inverted() {
        return this == NEGATIVE_UP;
    }

    public PolarityConvention other() {
        return this == POSITIVE_UP ? NEGATIVE_UP : POSITIVE_UP;
    }

    @Override
    public String toString() {
        return label;
    }
}
