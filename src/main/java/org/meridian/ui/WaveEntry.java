package org.meridian.ui;

import org.meridian.signal.ConditionWave;

/**
 * A wave the study panel lists: a loaded condition or a contrast the researcher wrote, with the
 * index of its colour (kept when other waves come and go, so a wave never changes colour).
 */
public record WaveEntry(ConditionWave wave, boolean contrast, int colourIndex) {
    public String name() {
        return wave.name();
    }
}
