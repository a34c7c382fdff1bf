package org.meridian.ui;

/** Which moment the scalp map shows: the sample at the time cursor, or the mean over the window. */
public enum MapMomentMode {
    CURSOR("At the cursor"),
    WINDOW_MEAN("Window mean");

    private final String label;

    MapMomentMode(String label) {
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
