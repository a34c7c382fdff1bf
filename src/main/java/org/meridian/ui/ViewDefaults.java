package org.meridian.ui;

import java.util.List;

/** Where the view starts when a study opens: cursor, window, channels, shown waves, map wave. */
public record ViewDefaults(double cursorMs, double windowStartMs, double windowEndMs,
        List<String> channels, List<String> shownWaves, String mapWave) {
    public ViewDefaults {
        channels = List.copyOf(channels);
        shownWaves = List.copyOf(shownWaves);
    }
}
