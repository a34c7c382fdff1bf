package org.meridian.sim;

/**
 * How much a source differs between participants. For each participant and source, with
 * independent standard normal z's:
 * <ul>
 *   <li>amplitude × exp(amplitudeSdLog · z) (log-normal, median 1; 0.25 ≈ ±25 %);</li>
 *   <li>all its components shifted by latencySdMs · z milliseconds;</li>
 *   <li>its position moved by positionSdMm · z millimetres along each of x, y and z (drawn
 *       again, up to a limit, while the result lies outside the sphere model's allowed radius);</li>
 *   <li>its orientation tilted: orientationSdDeg (converted to radians) · z along each of two
 *       directions perpendicular to it, then normalised, so the tilt angle is about
 *       Rayleigh-distributed with this scale.</li>
 * </ul>
 * The same draws hold for every condition of that participant.
 */
public record Variability(double amplitudeSdLog, double latencySdMs, double positionSdMm,
        double orientationSdDeg) {

    /** Every participant has exactly the nominal source. */
    public static final Variability NONE = new Variability(0, 0, 0, 0);

    public Variability {
        check("amplitude spread", amplitudeSdLog);
        check("latency spread", latencySdMs);
        check("position spread", positionSdMm);
        check("orientation spread", orientationSdDeg);
    }

    private static void check(String what, double v) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be zero or positive, got " + v);
        }
    }
}
