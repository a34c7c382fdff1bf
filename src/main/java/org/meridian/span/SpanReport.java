package org.meridian.span;

import java.util.List;
import org.meridian.core.Unit;

/**
 * Everything a span analysis found for one condition over one window: the descriptive trace
 * (GFP, r and DISS against the reference map, the correlation matrix), the descriptive
 * segmentation into topographic states, and the inferential span test.
 *
 * @param condition    the condition or contrast, as the researcher wrote it
 * @param settings     what was asked
 * @param window       the window as snapped to samples, with its split
 * @param unit         µV for potentials (average reference), µV/m² for CSD
 * @param channels     the channels whose maps were analysed
 * @param leftOut      channels of the study that were left out (no position)
 * @param participants the participants in the test, in study order
 * @param trace        per-sample GFP, r, DISS and the correlation matrix of the grand average
 * @param segmentation topographic states of the grand average (descriptive)
 * @param test         the span test
 */
public record SpanReport(String condition, SpanSettings settings, SpanWindow window, Unit unit,
        List<String> channels, List<String> leftOut, List<String> participants,
        StabilityTrace trace, Segmentation segmentation, SpanTest.Result test) {

    public SpanReport {
        channels = List.copyOf(channels);
        leftOut = List.copyOf(leftOut);
        participants = List.copyOf(participants);
    }
}
