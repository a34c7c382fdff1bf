package org.meridian.sim;

import java.util.Locale;

/**
 * A vector in the head frame (+x toward the right ear, +y toward the nose, +z up): a position in
 * metres, a dipole moment or a direction, by context. Immutable; every component must be finite.
 */
public record Vector3(double x, double y, double z) {
    public static final Vector3 ZERO = new Vector3(0, 0, 0);

    public Vector3 {
        if (!Double.isFinite(x) || !Double.isFinite(y) || !Double.isFinite(z)) {
            throw new IllegalArgumentException("vector components must be finite: (" + x + ", "
                    + y + ", " + z + ")");
        }
    }

    public Vector3 plus(Vector3 o) {
        return new Vector3(x + o.x, y + o.y, z + o.z);
    }

    public Vector3 minus(Vector3 o) {
        return new Vector3(x - o.x, y - o.y, z - o.z);
    }

    public Vector3 times(double f) {
        return new Vector3(x * f, y * f, z * f);
    }

    public double dot(Vector3 o) {
        return x * o.x + y * o.y + z * o.z;
    }

    public Vector3 cross(Vector3 o) {
        return new Vector3(y * o.z - z * o.y, z * o.x - x * o.z, x * o.y - y * o.x);
    }

    public double norm() {
        return StrictMath.sqrt(dot(this));
    }

    /** This vector scaled to unit length; the zero vector has no direction and is refused. */
    public Vector3 unit() {
        double n = norm();
        if (!(n > 0)) {
            throw new IllegalArgumentException("the zero vector has no direction");
        }
        return times(1.0 / n);
    }

    /** The part of this vector perpendicular to the unit vector {@code u}. */
    public Vector3 perpendicularTo(Vector3 u) {
        return minus(u.times(dot(u)));
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "(%.4f, %.4f, %.4f)", x, y, z);
    }
}
