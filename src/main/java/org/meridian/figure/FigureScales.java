package org.meridian.figure;

import java.util.List;
import org.meridian.core.Study;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.MapSettings;
import org.meridian.figure.spec.Polarity;
import org.meridian.figure.spec.WaveformAxes;
import org.meridian.maps.ColourLimits;
import org.meridian.maps.ColourScales;
import org.meridian.maps.MapStyle;
import org.meridian.maps.RoundNumbers;
import org.meridian.maps.ScalpMap;

/**
 * The scales a figure's panels share, so that equal distances and equal colours mean equal
 * values across panels: the time and amplitude axes of all waveform panels (covering every wave
 * and band, in whole round steps), the GFP axis of all span-trace panels (from 0), and the colour
 * limits of all maps (the spec's ±limit, or the automatic limits covering every map).
 */
final class FigureScales {
    private static final int TIME_TICKS = 6;
    private static final int AMPLITUDE_TICKS = 7;

    private FigureScales() {
    }

    static WaveScales waves(FigureSpec spec, Study study, List<PanelContent> panels, double t0,
            double t1, List<double[]> marks) {
        WaveformAxes axes = spec.waveforms();
        double timeStep = axes.timeStepMs() != null ? axes.timeStepMs() : RoundNumbers.atLeast((t1 - t0) / TIME_TICKS);
        double lo;
        double hi;
        double step;
        double min = 0;
        double max = 0;
        for (PanelContent c : panels) {
            if (c instanceof PanelContent.Waveforms w) {
                for (WaveTrace t : w.traces()) {
                    for (double[] series : new double[][] {t.mean(), t.lower(), t.upper()}) {
                        if (series != null) {
                            for (double v : series) {
                                min = Math.min(min, v);
                                max = Math.max(max, v);
                            }
                        }
                    }
                }
            }
        }
        if (axes.amplitude() != null) {
            lo = axes.amplitude().get(0);
            hi = axes.amplitude().get(1);
            step = axes.amplitudeStep() != null ? axes.amplitudeStep() : amplitudeStep(lo, hi);
        } else {
            step = axes.amplitudeStep() != null ? axes.amplitudeStep() : amplitudeStep(min, max);
            double[] range = roundedRange(min, max, step);
            lo = range[0];
            hi = range[1];
        }
        String unit = study.unit().symbol();
        String label = axes.amplitudeLabel().contains("(") || axes.amplitudeLabel().contains(unit)
                ? axes.amplitudeLabel() : axes.amplitudeLabel() + " (" + unit + ")";
        return new WaveScales(t0, t1, timeStep, lo, hi, step, axes.timeLabel(), label, spec.polarity(), marks,
                min, max);
    }

    static WaveScales gfp(FigureSpec spec, Study study, List<PanelContent> panels, double t0,
            double t1, List<double[]> marks) {
        double max = 0;
        for (PanelContent c : panels) {
            if (c instanceof PanelContent.SpanTrace t && !t.diss()) {
                for (WaveTrace w : t.traces()) {
                    for (double v : w.mean()) {
                        max = Math.max(max, v);
                    }
                }
            }
        }
        double step = amplitudeStep(0, max > 0 ? max : 1);
        double hi = Math.max(step, Math.ceil(max / step - 1e-9) * step);
        WaveScales waves = waves(spec, study, List.of(), t0, t1, marks);
        return new WaveScales(t0, t1, waves.timeStepMs(), 0, hi, step, waves.timeLabel(),
                "GFP (" + study.unit().symbol() + ")", Polarity.POSITIVE_UP, marks, 0, max);
    }

    /** The DISS axis: 0 (same map shape) to 2 (inverted), in steps of 0.5. */
    static WaveScales diss(FigureSpec spec, Study study, double t0, double t1, List<double[]> marks) {
        WaveScales waves = waves(spec, study, List.of(), t0, t1, marks);
        return new WaveScales(t0, t1, waves.timeStepMs(), 0, 2, 0.5, waves.timeLabel(), "DISS",
                Polarity.POSITIVE_UP, marks, 0, 2);
    }

    /** [min, max] widened to whole steps (at least one step). */
    static double[] roundedRange(double min, double max, double step) {
        double lo = Math.floor(min / step - 1e-9) * step;
        double hi = Math.ceil(max / step + 1e-9) * step;
        if (hi == lo) {
            hi = lo + step;
        }
        return new double[] {lo, hi};
    }

    /** The next coarser amplitude step: 1, 2, 5 × a power of ten (2.5 is skipped: its ticks need a decimal). */
    static double nextAmplitudeStep(double step) {
        double next = RoundNumbers.next(step);
        return Math.abs(next / Math.pow(10, Math.floor(Math.log10(next))) - 2.5) < 1e-9 ? RoundNumbers.next(next) : next;
    }

    /**
     * The amplitude tick step: the smallest of 1, 2 and 5 times a power of ten that covers
     * [min, max] in at most {@value #AMPLITUDE_TICKS} whole steps (2.5 is left out: its ticks
     * need a decimal).
     */
    static double amplitudeStep(double min, double max) {
        double span = max > min ? max - min : 1;
        double step = RoundNumbers.atLeast(span / AMPLITUDE_TICKS);
        while (Math.ceil(max / step - 1e-9) - Math.floor(min / step + 1e-9) > AMPLITUDE_TICKS
                || Math.abs(step / Math.pow(10, Math.floor(Math.log10(step))) - 2.5) < 1e-9) {
            step = RoundNumbers.next(step);
        }
        return step;
    }

    static MapScales maps(MapSettings settings, List<ScalpMap> maps) {
        ColourLimits limits = settings.limit() != null ? ColourLimits.symmetric(settings.limit())
                : ColourLimits.automatic(maps);
        MapStyle style = MapStyle.defaults().withScale(ColourScales.byName(settings.colourScale()))
                .withContours(settings.contours()).withMarkers(settings.markers());
        return new MapScales(limits, style, maps.get(0).unitLabel());
    }
}
