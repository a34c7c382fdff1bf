package org.meridian.span;

/**
 * A run of consecutive samples assigned to one topographic state.
 *
 * @param state   the state, numbered 1, 2, … in order of first appearance in the window
 * @param first   the run's first window sample (0-based)
 * @param last    its last window sample
 * @param startMs time of the first sample
 * @param endMs   time of the last sample
 */
public record Segment(int state, int first, int last, double startMs, double endMs) {

    public Segment {
        if (state < 1 || first < 0 || last < first) {
            throw new IllegalArgumentException("segment of state " + state + " over " + first + ".." + last);
        }
    }

    public int samples() {
        return last - first + 1;
    }
}
