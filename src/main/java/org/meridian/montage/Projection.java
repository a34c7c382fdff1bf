package org.meridian.montage;

import org.meridian.core.Electrode;

/**
 * The azimuthal equidistant projection about the vertex (Cz) used by every 2-D map: a point's
 * distance from the centre is its angle from Cz divided by 90°, its direction that of its x–y
 * component. The nose is up (+y), the left ear on the left (−x); the equator (Fpz, T7, Oz, T8)
 * becomes the unit circle, and positions below it fall outside.
 */
public final class Projection {
    private Projection() {
    }

    /** Projects a unit vector onto the plane: returns {x, y}. */
    public static double[] toPlane(double x, double y, double z) {
        double horizontal = Math.hypot(x, y);
        double theta = Math.atan2(horizontal, z);
        double radius = theta / (Math.PI / 2);
        if (horizontal == 0) {
            return new double[] {0, z >= 0 ? 0 : -radius};
        }
        return new double[] {radius * x / horizontal, radius * y / horizontal};
    }

    public static double[] toPlane(Electrode e) {
        return toPlane(e.x(), e.y(), e.z());
    }

    /** The unit vector that projects to a plane point (the inverse of {@link #toPlane}). */
    public static double[] toSphere(double px, double py) {
        double radius = Math.hypot(px, py);
        double theta = radius * Math.PI / 2;
        if (radius == 0) {
            return new double[] {0, 0, 1};
        }
        double s = Math.sin(theta) / radius;
        return new double[] {px * s, py * s, Math.cos(theta)};
    }
}
