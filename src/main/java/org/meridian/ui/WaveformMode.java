package org.meridian.ui;

/** The arrangements of the waveform view. */
public enum WaveformMode {
    ONE_CHANNEL("One channel", "The current channel: every shown wave with its interval band"),
    OVERLAY("Channels overlaid", "The selected channels over each other (Ctrl-click a channel to add it)"),
    LAYOUT("Scalp layout", "Every channel at its place on the head; click a small plot to select it"),
    BUTTERFLY("All channels + GFP", "Every channel of the map wave over each other, the GFP of each wave beneath");

    private final String label;
    private final String tip;

    WaveformMode(String label, String tip) {
        this.label = label;
        this.tip = tip;
    }

    public String label() {
        return label;
    }

    public String tip() {
        return tip;
    }
}
