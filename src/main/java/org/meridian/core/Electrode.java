package org.meridian.core;

/**
 * A positioned electrode: its label and its direction on the unit sphere in the head frame
 * (+x toward the right ear, +y toward the nose, +z up). The given vector is normalised; it must
 * not be zero. Immutable.
 */
public record Electrode(String label, double x, double y, double z) {

    public Electrode {
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("an electrode needs a label");
        }
        double n = Math.sqrt(x * x + y * y + z * z);
        if (!(n > 0) || !Double.isFinite(n)) {
            throw new IllegalArgumentException("electrode " + label + " has no direction: ("
                    + x + ", " + y + ", " + z + ")");
        }
        x /= n;
        y /= n;
        z /= n;
    }

    /** Cosine of the angle between this electrode and another, clamped to [-1, 1]. */
    public double cosineTo(Electrode other) {
        return cosine(x, y, z, other.x, other.y, other.z);
    }

    /** Angle from the vertex (Cz, +z) in degrees. */
    public double thetaDeg() {
        return Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, z))));
    }

    /** Angle in the x–y plane from +x toward +y in degrees, in (-180, 180]. */
    public double phiDeg() {
        return Math.toDegrees(Math.atan2(y, x));
    }

    /** The same direction under another label. */
    public Electrode withLabel(String newLabel) {
        return new Electrode(newLabel, x, y, z);
    }

    static double cosine(double ax, double ay, double az, double bx, double by, double bz) {
        double c = ax * bx + ay * by + az * bz;
        return Math.max(-1.0, Math.min(1.0, c));
    }
}
