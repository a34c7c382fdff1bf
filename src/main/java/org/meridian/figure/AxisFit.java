package org.meridian.figure;

import java.util.List;
import org.meridian.maps.RoundNumbers;

/**
 * Chooses tick steps a figure's plots have room for. The time step is the finest round step
 * (1, 2, 2.5, 5 × 10^k, no finer than the content's own choice) at which neighbouring tick labels
 * keep at least {@value #LABEL_GAP_EM} font sizes apart in the narrowest plot; the amplitude step
 * the finest (1, 2, 5 × 10^k) whose ticks lie at least {@value #TICK_SPACING_EM} font sizes apart
 * in the shortest plot, the range widened again to whole steps. Steps the spec fixes are kept.
 * The amplitude label falls back to its unit alone when the full label is longer than the plot
 * is tall.
 */
final class AxisFit {
    /** Clear space between neighbouring time labels, in font sizes. */
    static final double LABEL_GAP_EM = 0.8;
    /** Least distance between amplitude ticks, in font sizes (labels are about 0.7 tall). */
    static final double TICK_SPACING_EM = 1.6;

    private AxisFit() {
    }

    /**
     * @param fixedStep     whether the spec fixes the amplitude step
     * @param fixedRange    whether the spec fixes the amplitude range
     * @param fromZero      whether the range starts at 0 (GFP) rather than at the data's floor
     * @param plotHeightPt  the height of the shortest plot on these axes
     */
    static WaveScales amplitude(WaveScales s, boolean fixedStep, boolean fixedRange, boolean fromZero,
            double plotHeightPt, FigureStyle style) {
        if (fixedStep) {
            return s;
        }
        double least = TICK_SPACING_EM * style.small().getSize2D();
        WaveScales fitted = s;
        for (int guard = 0; guard < 40 && spacing(fitted, plotHeightPt) < least; guard++) {
            double step = FigureScales.nextAmplitudeStep(fitted.amplitudeStep());
            double from = fitted.amplitudeFrom();
            double to = fitted.amplitudeTo();
            if (!fixedRange) {
                if (fromZero) {
                    from = 0;
                    to = Math.max(step, Math.ceil(s.dataMax() / step - 1e-9) * step);
                } else {
                    double[] r = FigureScales.roundedRange(s.dataMin(), s.dataMax(), step);
                    from = r[0];
                    to = r[1];
                }
            }
            fitted = fitted.withAmplitude(from, to, step);
        }
        return fitted;
    }

    /** The amplitude label, or its unit alone when the label is longer than the plot is tall. */
    static WaveScales label(WaveScales s, double roomPt, FigureStyle style) {
        String label = s.amplitudeLabel();
        int open = label.lastIndexOf('(');
        int close = label.lastIndexOf(')');
        if (TextMeasure.width(label, style.label()) <= roomPt || open < 0 || close < open) {
            return s;
        }
        return s.withAmplitudeLabel(label.substring(open + 1, close));
    }

    /** The finest time step whose labels keep apart on a plot of this width (points). */
    static double timeStep(WaveScales s, boolean fixed, double plotWidthPt, FigureStyle style) {
        double step = s.timeStepMs();
        if (fixed) {
            return step;
        }
        for (int guard = 0; guard < 40 && !timeLabelsFit(s, step, plotWidthPt, style); guard++) {
            step = RoundNumbers.next(step);
        }
        return step;
    }

    private static double spacing(WaveScales s, double plotHeightPt) {
        return plotHeightPt * s.amplitudeStep() / (s.amplitudeTo() - s.amplitudeFrom());
    }

    private static boolean timeLabelsFit(WaveScales s, double step, double plotWidthPt, FigureStyle style) {
        TickFormat format = new TickFormat(step);
        double perMs = plotWidthPt / (s.timeToMs() - s.timeFromMs());
        double gap = LABEL_GAP_EM * style.small().getSize2D();
        double previousRight = Double.NEGATIVE_INFINITY;
        for (double t : ticks(s.timeFromMs(), s.timeToMs(), step)) {
            double half = TextMeasure.width(format.format(t), style.small()) / 2;
            double x = (t - s.timeFromMs()) * perMs;
            if (x - half < previousRight + gap) {
                return false;
            }
            previousRight = x + half;
        }
        return true;
    }

    private static List<Double> ticks(double from, double to, double step) {
        java.util.ArrayList<Double> out = new java.util.ArrayList<>();
        for (double k = Math.ceil(from / step - 1e-9); k * step <= to + 1e-9 * step; k++) {
            out.add(k * step);
        }
        return out;
    }
}
