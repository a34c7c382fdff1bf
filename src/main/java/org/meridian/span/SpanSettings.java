package org.meridian.span;

import java.util.OptionalDouble;
import org.meridian.core.BadInputException;
import org.meridian.signal.TimeWindow;
import org.meridian.spline.SplineParameters;

/**
 * What a span analysis is asked to do. Errors name the command-line option of the value at
 * fault, since the window passes the same settings.
 *
 * @param window       the window in ms
 * @param splitMs      where the late part starts; empty for the middle of the window
 * @param referenceMs  time of the reference map of the trace; empty for the GFP maximum
 * @param csd          whether to analyse the CSD (surface Laplacian) instead of the potential
 * @param spline       the spherical spline behind the CSD
 * @param maxStates    the largest number of topographic states tried (K)
 * @param restarts     k-means runs for each k
 * @param permutations random sign-flip patterns when there are more than 16 participants
 * @param seed         seed of the random patterns and of the k-means starts
 * @param alpha        level of the verdict
 * @param whiten       run the conservative variant of the span test that first whitens the
 *                     part pairs ({@link PairWhitening}); false for the test of DESIGN §7
 */
public record SpanSettings(TimeWindow window, OptionalDouble splitMs, OptionalDouble referenceMs,
        boolean csd, SplineParameters spline, int maxStates, int restarts, int permutations,
        long seed, double alpha, boolean whiten) {

    public static final int DEFAULT_MAX_STATES = 8;
    public static final int DEFAULT_RESTARTS = 20;
    public static final int DEFAULT_PERMUTATIONS = 5000;
    public static final long DEFAULT_SEED = 1;
    public static final double DEFAULT_ALPHA = 0.05;

    public SpanSettings {
        java.util.Objects.requireNonNull(window, "window");
        java.util.Objects.requireNonNull(spline, "spline");
        if (maxStates < 1 || maxStates > 20) {
            throw new BadInputException("option --max-states: " + maxStates + " is not between 1 and 20");
        }
        if (restarts < 1 || restarts > 1000) {
            throw new BadInputException("option --restarts: " + restarts + " is not between 1 and 1000");
        }
        if (permutations < 99 || permutations > 10_000_000) {
            throw new BadInputException("option --permutations: " + permutations
                    + " is not between 99 and 10000000");
        }
        if (!(alpha > 0 && alpha < 1)) {
            throw new BadInputException("option --alpha: " + alpha + " is not between 0 and 1");
        }
    }

    /**
     * The window with the defaults: middle split, GFP-maximum reference, potential, the span
     * test of DESIGN §7 (no whitening), …
     */
    public static SpanSettings window(TimeWindow window) {
        return new SpanSettings(window, OptionalDouble.empty(), OptionalDouble.empty(), false,
                SplineParameters.defaults(), DEFAULT_MAX_STATES, DEFAULT_RESTARTS,
                DEFAULT_PERMUTATIONS, DEFAULT_SEED, DEFAULT_ALPHA, false);
    }

    /** The window [startMs, endMs] with the defaults. */
    public static SpanSettings window(double startMs, double endMs) {
        return window(new TimeWindow(startMs, endMs));
    }

    public SpanSettings withSplitMs(double ms) {
        return new SpanSettings(window, OptionalDouble.of(ms), referenceMs, csd, spline, maxStates,
                restarts, permutations, seed, alpha, whiten);
    }

    public SpanSettings withReferenceMs(double ms) {
        return new SpanSettings(window, splitMs, OptionalDouble.of(ms), csd, spline, maxStates,
                restarts, permutations, seed, alpha, whiten);
    }

    public SpanSettings withCsd(boolean useCsd) {
        return new SpanSettings(window, splitMs, referenceMs, useCsd, spline, maxStates, restarts,
                permutations, seed, alpha, whiten);
    }

    public SpanSettings withSpline(SplineParameters parameters) {
        return new SpanSettings(window, splitMs, referenceMs, csd, parameters, maxStates, restarts,
                permutations, seed, alpha, whiten);
    }

    public SpanSettings withSegmentation(int newMaxStates, int newRestarts) {
        return new SpanSettings(window, splitMs, referenceMs, csd, spline, newMaxStates, newRestarts,
                permutations, seed, alpha, whiten);
    }

    public SpanSettings withPermutations(int newPermutations, long newSeed) {
        return new SpanSettings(window, splitMs, referenceMs, csd, spline, maxStates, restarts,
                newPermutations, newSeed, alpha, whiten);
    }

    public SpanSettings withAlpha(double newAlpha) {
        return new SpanSettings(window, splitMs, referenceMs, csd, spline, maxStates, restarts,
                permutations, seed, newAlpha, whiten);
    }

    /** The span test of DESIGN §7 (false) or its conservative whitened variant (true). */
    public SpanSettings withWhitening(boolean whitenPairs) {
        return new SpanSettings(window, splitMs, referenceMs, csd, spline, maxStates, restarts,
                permutations, seed, alpha, whitenPairs);
    }
}
