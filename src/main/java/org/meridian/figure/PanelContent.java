package org.meridian.figure;

import java.util.List;
import java.util.Set;
import org.meridian.maps.ScalpMap;

/** What one panel shows, computed from the data by {@link FigureContent}; drawn by the painters. */
public sealed interface PanelContent {

    /** Waves at one channel or region. */
    record Waveforms(String title, List<WaveTrace> traces, boolean legend) implements PanelContent {
        public Waveforms {
            traces = List.copyOf(traces);
        }
    }

    /** A strip of maps of one wave, with electrodes to highlight. */
    record MapStrip(String title, List<ScalpMap> maps, Set<String> highlight) implements PanelContent {
        public MapStrip {
            maps = List.copyOf(maps);
            highlight = Set.copyOf(highlight);
        }
    }

    /** GFP or DISS traces of grand-average waves, drawn like waves on the GFP or DISS scale. */
    record SpanTrace(String title, List<WaveTrace> traces, boolean legend, boolean diss) implements PanelContent {
        public SpanTrace {
            traces = List.copyOf(traces);
        }

        /** The same traces as a waveform panel's content, for the waveform painter. */
        Waveforms asWaveforms() {
            return new Waveforms(title, traces, legend);
        }
    }

    /** The shared colour bar. */
    record ColourBar() implements PanelContent {
    }
}
