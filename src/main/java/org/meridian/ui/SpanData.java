package org.meridian.ui;

import java.util.ArrayList;
import java.util.List;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.maps.MapMaker;
import org.meridian.maps.MapMoment;
import org.meridian.maps.ScalpMap;
import org.meridian.span.Segmentation;
import org.meridian.span.SpanAnalysis;
import org.meridian.span.SpanSettings;
import org.meridian.span.SpanWindow;
import org.meridian.span.StabilityTrace;

/**
 * What the span view draws for one wave, window and quantity, computed off the event thread by
 * the span package: the maps of the strip (evenly spaced across the window, first and last on
 * the window's edges), the stability trace (GFP, DISS against the map at the GFP maximum, the
 * correlation matrix) and the segmentation into topographic states. Immutable.
 */
record SpanData(String wave, MapQuantity quantity, SpanWindow window, List<ScalpMap> strip,
        double stripMaxAbs, StabilityTrace trace, Segmentation segmentation) {

    /** The k-means restarts of the live segmentation (fewer than the command's, for speed). */
    static final int RESTARTS = 8;

    /**
     * The times of the strip's maps: {@code count} times evenly spaced from the window's start to
     * its end (one map: the middle), each snapped to the nearest sample. The figure composer
     * takes the same times, so a figure shows the strip the window shows.
     */
    static List<Double> stripTimes(org.meridian.core.TimeAxis axis, double startMs, double endMs, int count) {
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            double t = count == 1 ? (startMs + endMs) / 2 : startMs + i * (endMs - startMs) / (count - 1);
            out.add(axis.timeMs(axis.nearestIndex(t)));
        }
        return out;
    }

    /**
     * @param included the study with only the participants the view includes
     */
    static SpanData compute(StudySession session, Study included, Averages.WaveAverage wave,
            MapQuantity quantity, double startMs, double endMs, int mapCount, Tasks.TaskProgress progress) {
        Waveforms field = quantity == MapQuantity.CSD ? wave.csd()
                : wave.grand().select(session.fieldChannels());
        List<ScalpMap> strip = new ArrayList<>();
        double maxAbs = 0;
        if (session.hasMaps()) {
            MapMaker maker = session.maker(quantity.quantity(), StudySession.LIVE_RESOLUTION);
            List<MapMoment> moments = new ArrayList<>();
            for (double t : stripTimes(field.axis(), startMs, endMs, mapCount)) {
                moments.add(MapMoment.at(t));
            }
            strip = maker.maps(wave.grand(), moments);
            for (ScalpMap m : strip) {
                maxAbs = Math.max(maxAbs, m.maxAbs());
            }
        }
        progress.checkCancelled();
        SpanSettings settings = SpanSettings.window(startMs, endMs)
                .withCsd(quantity == MapQuantity.CSD)
                .withSegmentation(SpanSettings.DEFAULT_MAX_STATES, RESTARTS);
        SpanAnalysis.Description d = SpanAnalysis.describe(included,
                p -> wave.entry().wave().forParticipant(included, p), settings, SpanPanel.progressOf(progress));
        return new SpanData(wave.name(), quantity, d.window(), strip, maxAbs, d.trace(), d.segmentation());
    }
}
