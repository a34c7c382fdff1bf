package org.meridian.ui;

import java.util.List;
import java.util.OptionalDouble;

/**
 * What the researcher asked for when opening the window (the {@code view} command's options);
 * anything empty takes the defaults of {@link StudyOpener}.
 *
 * @param windowStartMs start of the time window
 * @param windowEndMs   end of the time window
 * @param cursorMs      the time cursor
 * @param channel       the current channel ("" for the default)
 * @param waves         conditions and contrasts to show, as expressions (empty for the default)
 * @param mapWave       the wave of the scalp map and span view ("" for the default)
 */
public record ViewOptions(OptionalDouble windowStartMs, OptionalDouble windowEndMs,
        OptionalDouble cursorMs, String channel, List<String> waves, String mapWave) {
    public ViewOptions {
        waves = List.copyOf(waves);
        channel = channel == null ? "" : channel;
        mapWave = mapWave == null ? "" : mapWave;
    }

    public static ViewOptions defaults() {
        return new ViewOptions(OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
                "", List.of(), "");
    }
}
