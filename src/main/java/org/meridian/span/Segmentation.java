package org.meridian.span;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The segmentation of a window into topographic states: the chosen number of states k, each
 * sample's state (1..k, numbered in order of first appearance; 0 for a flat map, which has no
 * shape), the state maps (normalised), the runs of one state (segments), and the
 * cross-validation criterion for every k tried. Descriptive only: it summarises the sequence of
 * maps and carries no statement about chance; the span test does that.
 */
public final class Segmentation {
    private final int[] states;
    private final double[][] stateMaps;
    private final double[] crossValidation;
    private final double meanCorrelation;
    private final List<Segment> segments;

    Segmentation(int[] states, double[][] stateMaps, double[] crossValidation,
            double meanCorrelation, StabilityTimes times) {
        this.states = states;
        this.stateMaps = stateMaps;
        this.crossValidation = crossValidation;
        this.meanCorrelation = meanCorrelation;
        this.segments = Collections.unmodifiableList(runs(states, times));
    }

    /** Times of the window samples, to stamp segments with. */
    @FunctionalInterface
    interface StabilityTimes {
        double timeMs(int windowSample);
    }

    private static List<Segment> runs(int[] states, StabilityTimes times) {
        List<Segment> out = new ArrayList<>();
        int t = 0;
        while (t < states.length) {
            int s = t;
            while (s + 1 < states.length && states[s + 1] == states[t]) {
                s++;
            }
            if (states[t] > 0) {
                out.add(new Segment(states[t], t, s, times.timeMs(t), times.timeMs(s)));
            }
            t = s + 1;
        }
        return out;
    }

    /** The chosen number of states. */
    public int k() {
        return stateMaps.length;
    }

    /** The state of window sample t: 1..k, or 0 for a flat map. */
    public int state(int t) {
        return states[t];
    }

    public int size() {
        return states.length;
    }

    /** The normalised map of state {@code s} (1-based), a copy. */
    public double[] stateMap(int s) {
        return stateMaps[s - 1].clone();
    }

    /** Runs of one state, in time order. */
    public List<Segment> segments() {
        return segments;
    }

    /**
     * The cross-validation criterion for k = 1..K (index k − 1); NaN where k was not tried.
     * The chosen k has the smallest.
     */
    public double[] crossValidation() {
        return crossValidation.clone();
    }

    /** The mean spatial correlation of each (non-flat) sample's map with its state's map. */
    public double meanCorrelation() {
        return meanCorrelation;
    }
}
