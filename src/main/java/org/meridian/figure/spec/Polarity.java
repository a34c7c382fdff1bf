package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonProperty;

/** Which way positive voltages point on a waveform's amplitude axis; always stated on the axis. */
public enum Polarity {
    @JsonProperty("positive-up") POSITIVE_UP("positive up"),
    @JsonProperty("negative-up") NEGATIVE_UP("negative up");

    private final String words;

    Polarity(String words) {
        this.words = words;
    }

    /** How the axis label states it, e.g. {@code positive up}. */
    public String words() {
        return words;
    }
}
