package org.meridian.sim;

import java.util.Map;

/**
 * A piece of a source's time course: the dipole moment along the source's orientation, in nA·m,
 * as a function of time in ms. A source's moment is the sum of its pieces; a participant's
 * latency shift δ is applied by evaluating at t − δ, its amplitude factor by multiplying.
 * Implementations are immutable and must compute their values with {@link StrictMath} so that
 * simulations repeat to the last bit on every machine.
 */
public interface TimeCourse {

    /** The moment in nA·m at {@code timeMs}. */
    double valueAt(double timeMs);

    /** A short name of the shape for the ground truth, e.g. {@code raised-cosine}. */
    String kind();

    /**
     * The shape's parameters for the ground truth, in a fixed order, each name ending in its
     * unit ({@code _ms}, {@code _nam}).
     */
    Map<String, Double> parameters();
}
