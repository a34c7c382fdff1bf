package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;

/**
 * The axes every waveform panel of a figure shares, so that equal distances mean equal values
 * across panels: the time range (default: all of the data), the amplitude range (default:
 * rounded to cover every wave and band shown), tick steps (default: chosen from the ranges),
 * axis labels (the amplitude label gets its unit and polarity added unless it already names
 * them), and whether the times of the map strips are marked on the time axes.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record WaveformAxes(@JsonProperty("time_ms") List<Double> timeMs,
        @JsonProperty("amplitude") List<Double> amplitude,
        @JsonProperty("time_step_ms") Double timeStepMs,
        @JsonProperty("amplitude_step") Double amplitudeStep,
        @JsonProperty("time_label") String timeLabel,
        @JsonProperty("amplitude_label") String amplitudeLabel,
        @JsonProperty("mark_maps") Boolean markMaps) {

    public WaveformAxes {
        timeMs = SpecChecks.range(timeMs, "waveforms.time_ms");
        amplitude = SpecChecks.range(amplitude, "waveforms.amplitude");
        if (timeStepMs != null) {
            SpecChecks.within(timeStepMs, 0, 0.001, 1e6, "waveforms.time_step_ms", "ms");
        }
        if (amplitudeStep != null) {
            SpecChecks.within(amplitudeStep, 0, 1e-9, 1e9, "waveforms.amplitude_step", "");
        }
        timeLabel = SpecChecks.text(timeLabel, "Time (ms)");
        amplitudeLabel = SpecChecks.text(amplitudeLabel, "Amplitude");
        markMaps = markMaps == null || markMaps;
    }

    public static WaveformAxes defaults() {
        return new WaveformAxes(null, null, null, null, null, null, null);
    }
}
