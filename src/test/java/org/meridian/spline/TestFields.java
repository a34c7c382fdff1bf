package org.meridian.spline;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;

/**
 * Fields on the unit sphere for tests. Spherical harmonics of degree l are built as homogeneous
 * harmonic polynomials of degree l restricted to the sphere, or as the zonal P_l(z); every one of
 * them is an eigenfunction of the sphere's Laplace–Beltrami operator with eigenvalue −l(l+1)
 * (any textbook on spherical harmonics, e.g. Stein &amp; Weiss, 1971, ch. IV).
 */
public final class TestFields {
    private TestFields() {
    }

    /** A scalar field on the unit sphere. */
    @FunctionalInterface
    public interface Field {
        double at(double x, double y, double z);

        default double at(Electrode e) {
            return at(e.x(), e.y(), e.z());
        }

        default double[] on(Montage montage) {
            double[] out = new double[montage.size()];
            for (int i = 0; i < out.length; i++) {
                out[i] = at(montage.electrodes().get(i));
            }
            return out;
        }
    }

    /** A named harmonic of degree l. */
    public record Harmonic(String name, int degree, Field field) {
    }

    /**
     * Real spherical harmonics of degree l ≥ 1: the zonal P_l(z), the sectoral Re and Im of
     * (x + iy)^l, and for l ≥ 2 the tesseral z·Re((x + iy)^(l−1)).
     */
    public static List<Harmonic> harmonics(int l) {
        List<Harmonic> out = new ArrayList<>();
        var legendre = PolynomialsUtils.createLegendrePolynomial(l);
        out.add(new Harmonic("P" + l + "(z)", l, (x, y, z) -> legendre.value(z)));
        out.add(new Harmonic("Re(x+iy)^" + l, l, (x, y, z) -> complexPower(x, y, l)[0]));
        out.add(new Harmonic("Im(x+iy)^" + l, l, (x, y, z) -> complexPower(x, y, l)[1]));
        if (l >= 2) {
            out.add(new Harmonic("z*Re(x+iy)^" + (l - 1), l, (x, y, z) -> z * complexPower(x, y, l - 1)[0]));
        }
        return out;
    }

    /**
     * The field of a dipole at the centre of a homogeneous sphere pointing along d:
     * V = 3 p cosθ / (4πσR²) on the surface (bioelectric field textbook), i.e. V ∝ r·d.
     */
    public static Field dipolar(double amplitude, double dx, double dy, double dz) {
        double n = Math.sqrt(dx * dx + dy * dy + dz * dz);
        return (x, y, z) -> amplitude * (x * dx + y * dy + z * dz) / n;
    }

    private static double[] complexPower(double x, double y, int power) {
        double re = 1;
        double im = 0;
        for (int k = 0; k < power; k++) {
            double r = re * x - im * y;
            im = re * y + im * x;
            re = r;
        }
        return new double[] {re, im};
    }
}
