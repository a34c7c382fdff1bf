package org.meridian.signal;

import java.util.Locale;
import org.meridian.core.BadInputException;
import org.meridian.core.Waveforms;

/**
 * A zero-phase Butterworth low-, high- or band-pass filter.
 *
 * <p><b>Design.</b> The analogue Butterworth prototype of order n has the maximally flat power
 * response |H(f)|² = 1 / (1 + (f/fc)^(2n)) (Butterworth, 1930). It is mapped to a digital filter
 * by the bilinear transform with the cut-off pre-warped, which gives exactly
 * |H(e^{iω})|² = 1 / (1 + (tan(π f / fs) / tan(π fc / fs))^(2n)) for the low-pass (the ratio
 * inverted for the high-pass): −3.01 dB at fc, and the analogue response wherever f ≪ fs.
 * Pole pairs k = 1..⌊n/2⌋ become second-order sections with Q_k = 1 / (2 sin((2k − 1)π / (2n))),
 * an odd order adds one first-order section. A band-pass is a high-pass at its lower edge
 * followed by a low-pass at its upper edge, each of the given order.
 *
 * <p><b>Zero phase.</b> The data are filtered forward, then backward (the two passes cancel each
 * other's phase), so peaks keep their latency. The power gain is then squared: the cut-off is the
 * −6.02 dB point, and the effective order doubles. Before filtering, each end is extended by a
 * reflection so the edges do not ring, 3 / cut-off seconds long (at most the signal length less
 * one), and each pass starts in the steady state for its first value. A low-pass uses the point
 * reflection about the end sample (2·x₀ − x_k), which continues the signal's level and slope; a
 * high-pass uses the mirror image (x_k), which keeps the local mean (a point reflection would
 * shift it by 2·(x₀ − mean), a slow step the high-pass would carry into the data). A band-pass
 * is applied as its zero-phase high-pass, then its zero-phase low-pass, each with its own
 * extension; the power gains multiply as for the cascade.
 *
 * <p>A filter is applied only when asked for; views and figures name it with {@link #describe}.
 * Immutable.
 */
public final class ButterworthFilter {
    /** The largest order accepted: higher orders buy nothing for ERPs and invite trouble. */
    public static final int MAX_ORDER = 12;

    public enum Kind {
        LOW_PASS, HIGH_PASS, BAND_PASS
    }

    private final Kind kind;
    private final int order;
    private final double highPassHz;
    private final double lowPassHz;

    private ButterworthFilter(Kind kind, int order, double highPassHz, double lowPassHz) {
        if (order < 1 || order > MAX_ORDER) {
            throw new BadInputException("filter order must be 1.." + MAX_ORDER + ", got " + order);
        }
        this.kind = kind;
        this.order = order;
        this.highPassHz = highPassHz;
        this.lowPassHz = lowPassHz;
        if (kind != Kind.LOW_PASS) {
            requirePositive(highPassHz, "high-pass cut-off");
        }
        if (kind != Kind.HIGH_PASS) {
            requirePositive(lowPassHz, "low-pass cut-off");
        }
        if (kind == Kind.BAND_PASS && !(highPassHz < lowPassHz)) {
            throw new BadInputException("band-pass " + hz(highPassHz) + "–" + hz(lowPassHz)
                    + ": the lower edge must be below the upper edge");
        }
    }

    /** Passes frequencies below {@code cutoffHz}. */
    public static ButterworthFilter lowPass(int order, double cutoffHz) {
        return new ButterworthFilter(Kind.LOW_PASS, order, Double.NaN, cutoffHz);
    }

    /** Passes frequencies above {@code cutoffHz}. */
    public static ButterworthFilter highPass(int order, double cutoffHz) {
        return new ButterworthFilter(Kind.HIGH_PASS, order, cutoffHz, Double.NaN);
    }

    /** Passes frequencies between {@code lowEdgeHz} and {@code highEdgeHz}. */
    public static ButterworthFilter bandPass(int order, double lowEdgeHz, double highEdgeHz) {
        return new ButterworthFilter(Kind.BAND_PASS, order, lowEdgeHz, highEdgeHz);
    }

    public Kind kind() {
        return kind;
    }

    public int order() {
        return order;
    }

    /** The cascade of sections of one (forward) pass at a sampling rate. */
    public SecondOrderSections design(double rateHz) {
        double nyquist = rateHz / 2;
        if (kind != Kind.LOW_PASS && !(highPassHz < nyquist)) {
            throw new BadInputException("high-pass cut-off " + hz(highPassHz)
                    + " must lie below the Nyquist frequency " + hz(nyquist));
        }
        if (kind != Kind.HIGH_PASS && !(lowPassHz < nyquist)) {
            throw new BadInputException("low-pass cut-off " + hz(lowPassHz)
                    + " must lie below the Nyquist frequency " + hz(nyquist));
        }
        return switch (kind) {
            case LOW_PASS -> sections(order, lowPassHz / rateHz, false);
            case HIGH_PASS -> sections(order, highPassHz / rateHz, true);
            case BAND_PASS -> sections(order, highPassHz / rateHz, true)
                    .then(sections(order, lowPassHz / rateHz, false));
        };
    }

    /** The power gain of the zero-phase (forward–backward) filter: one pass's gain squared. */
    public double zeroPhasePowerGain(double frequencyHz, double rateHz) {
        double g = design(rateHz).powerGain(frequencyHz, rateHz);
        return g * g;
    }

    /** Filters one series forward and backward; returns a new array. */
    public double[] applyZeroPhase(double[] x, double rateHz) {
        return switch (kind) {
            case LOW_PASS -> forwardBackward(x, design(rateHz), lowPassHz, rateHz, true);
            case HIGH_PASS -> forwardBackward(x, design(rateHz), highPassHz, rateHz, false);
            case BAND_PASS -> {
                double[] high = highPass(order, highPassHz).applyZeroPhase(x, rateHz);
                yield lowPass(order, lowPassHz).applyZeroPhase(high, rateHz);
            }
        };
    }

    private static double[] forwardBackward(double[] x, SecondOrderSections sos, double cutoffHz,
            double rateHz, boolean pointReflection) {
        int n = x.length;
        if (n < 2) {
            return x.clone();
        }
        int pad = (int) Math.min(n - 1L, (long) Math.ceil(3 * rateHz / cutoffHz));
        double[] ext = new double[n + 2 * pad];
        for (int j = 0; j < pad; j++) {
            if (pointReflection) {
                ext[j] = 2 * x[0] - x[pad - j];
                ext[pad + n + j] = 2 * x[n - 1] - x[n - 2 - j];
            } else {
                ext[j] = x[pad - j];
                ext[pad + n + j] = x[n - 2 - j];
            }
        }
        System.arraycopy(x, 0, ext, pad, n);
        sos.filterInPlace(ext);
        reverse(ext);
        sos.filterInPlace(ext);
        reverse(ext);
        double[] out = new double[n];
        System.arraycopy(ext, pad, out, 0, n);
        return out;
    }

    /** Filters every channel forward and backward. */
    public Waveforms applyZeroPhase(Waveforms w) {
        int n = w.sampleCount();
        float[] out = new float[w.channelCount() * n];
        double[] x = new double[n];
        for (int c = 0; c < w.channelCount(); c++) {
            w.channelInto(c, x);
            double[] y = applyZeroPhase(x, w.axis().rateHz());
            for (int s = 0; s < n; s++) {
                out[c * n + s] = (float) y[s];
            }
        }
        return Waveforms.wrap(w.labels(), w.axis(), w.unit(), out);
    }

    /** E.g. {@code low-pass 30 Hz, Butterworth order 4, zero-phase}. */
    public String describe() {
        String what = switch (kind) {
            case LOW_PASS -> "low-pass " + hz(lowPassHz);
            case HIGH_PASS -> "high-pass " + hz(highPassHz);
            case BAND_PASS -> "band-pass " + hz(highPassHz) + "–" + hz(lowPassHz);
        };
        return what + ", Butterworth order " + order + ", zero-phase";
    }

    @Override
    public String toString() {
        return describe();
    }

    /**
     * Butterworth sections for a normalised cut-off (cycles per sample), by the bilinear
     * transform with pre-warping: K = tan(π fc / fs).
     */
    private static SecondOrderSections sections(int order, double normalisedCutoff, boolean highPass) {
        double k = Math.tan(Math.PI * normalisedCutoff);
        double k2 = k * k;
        double[][] rows = new double[(order + 1) / 2][];
        int r = 0;
        for (int pair = 1; pair <= order / 2; pair++) {
            double q = 1 / (2 * Math.sin((2 * pair - 1) * Math.PI / (2 * order)));
            double norm = 1 / (1 + k / q + k2);
            double a1 = 2 * (k2 - 1) * norm;
            double a2 = (1 - k / q + k2) * norm;
            rows[r++] = highPass
                    ? new double[] {norm, -2 * norm, norm, a1, a2}
                    : new double[] {k2 * norm, 2 * k2 * norm, k2 * norm, a1, a2};
        }
        if (order % 2 == 1) {
            double a1 = (k - 1) / (k + 1);
            rows[r] = highPass
                    ? new double[] {1 / (k + 1), -1 / (k + 1), 0, a1, 0}
                    : new double[] {k / (k + 1), k / (k + 1), 0, a1, 0};
        }
        return new SecondOrderSections(rows);
    }

    private static void reverse(double[] a) {
        for (int i = 0, j = a.length - 1; i < j; i++, j--) {
            double t = a[i];
            a[i] = a[j];
            a[j] = t;
        }
    }

    private static void requirePositive(double hz, String what) {
        if (!(hz > 0) || !Double.isFinite(hz)) {
            throw new BadInputException(what + " must be a positive frequency, got " + hz);
        }
    }

    private static String hz(double v) {
        return TimeWindow.format(v).toLowerCase(Locale.ROOT) + " Hz";
    }
}
