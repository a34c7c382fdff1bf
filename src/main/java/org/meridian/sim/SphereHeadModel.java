package org.meridian.sim;

import java.util.List;
import java.util.Locale;
import org.meridian.core.BadInputException;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;

/**
 * A head modelled as one homogeneous conducting sphere: radius R (metres), conductivity σ
 * (siemens per metre), electrodes on its surface at the directions of a {@link Montage}, and
 * current dipoles inside it. Potentials follow the Legendre series of {@link SphereSeries},
 * summed until the truncation error is at most ε·|p|/(4πσR²) at every electrode.
 *
 * <p>Units: positions in metres, moments in nanoampere-metres (nA·m), potentials in microvolts
 * (the series gives volts per ampere-metre, so a factor 1e-3 turns it into µV per nA·m). The
 * potential has zero mean over the whole sphere (the n = 0 term is absent); data are
 * re-referenced by whoever uses them.
 *
 * <p>The homogeneous sphere leaves out the skull, so its maps are sharper and its amplitudes
 * larger per unit moment than in a real head; the moments of a scenario are chosen for
 * plausible scalp amplitudes in this model, not taken from source-imaging studies.
 */
public final class SphereHeadModel {
    /** 9 cm: a common radius for an adult head sphere (common practice). */
    public static final double DEFAULT_RADIUS_M = 0.09;
    /** 0.33 S/m: the conductivity usually assumed for brain and scalp (common practice). */
    public static final double DEFAULT_CONDUCTIVITY_S_PER_M = 0.33;
    /** Truncation error per electrode at most 1e-10 · |p|/(4πσR²). */
    public static final double DEFAULT_TOLERANCE = 1e-10;
    /** Sources must lie within 99 % of the radius (the series needs ~3600 terms there). */
    public static final double MAX_ECCENTRICITY = 0.99;

    private static final double MICROVOLT_PER_NANOAMPERE_METRE = 1e-3;

    private final double radiusM;
    private final double conductivity;
    private final double tolerance;
    /** 1/(4πσR²) in µV per nA·m. */
    private final double scale;

    public SphereHeadModel(double radiusM, double conductivitySPerM, double tolerance) {
        if (!(radiusM > 0) || !Double.isFinite(radiusM)) {
            throw new IllegalArgumentException("sphere radius must be positive, got " + radiusM);
        }
        if (!(conductivitySPerM > 0) || !Double.isFinite(conductivitySPerM)) {
            throw new IllegalArgumentException("conductivity must be positive, got "
                    + conductivitySPerM);
        }
        if (!(tolerance > 0 && tolerance < 1)) {
            throw new IllegalArgumentException("series tolerance must lie in (0, 1), got "
                    + tolerance);
        }
        this.radiusM = radiusM;
        this.conductivity = conductivitySPerM;
        this.tolerance = tolerance;
        this.scale = MICROVOLT_PER_NANOAMPERE_METRE
                / (4 * StrictMath.PI * conductivitySPerM * radiusM * radiusM);
    }

    /** R = 9 cm, σ = 0.33 S/m, ε = 1e-10. */
    public static SphereHeadModel standard() {
        return new SphereHeadModel(DEFAULT_RADIUS_M, DEFAULT_CONDUCTIVITY_S_PER_M, DEFAULT_TOLERANCE);
    }

    public double radiusM() {
        return radiusM;
    }

    public double conductivitySPerM() {
        return conductivity;
    }

    public double tolerance() {
        return tolerance;
    }

    /** |r0| / R of a position. */
    public double eccentricity(Vector3 positionM) {
        return positionM.norm() / radiusM;
    }

    /** Whether a dipole may sit here (eccentricity at most {@link #MAX_ECCENTRICITY}). */
    public boolean accepts(Vector3 positionM) {
        return eccentricity(positionM) <= MAX_ECCENTRICITY;
    }

    /** The number of series terms summed for a dipole at this position. */
    public int termCount(Vector3 positionM) {
        return SphereSeries.termCount(checkedEccentricity(positionM, "a dipole"), tolerance);
    }

    /**
     * The potential in µV on the surface, in the direction {@code electrode} (any non-zero
     * vector), of a dipole with moment {@code momentNAm} (nA·m) at {@code positionM}.
     */
    public double potential(Vector3 positionM, Vector3 momentNAm, Vector3 electrode) {
        return momentNAm.dot(gain(positionM, electrode.unit(), termCount(positionM)));
    }

    /**
     * The lead field of a dipole position for the electrodes of a montage: for each electrode
     * the potential (µV) per nA·m of moment along x, y and z. Computed once per position and
     * montage; any orientation and any waveform of a dipole there is then a product with it.
     */
    public LeadField leadField(Vector3 positionM, Montage montage) {
        return leadField(positionM, montage, "a dipole");
    }

    /** As {@link #leadField(Vector3, Montage)}, naming the source in an error message. */
    public LeadField leadField(Vector3 positionM, Montage montage, String what) {
        int terms = SphereSeries.termCount(checkedEccentricity(positionM, what), tolerance);
        List<Electrode> electrodes = montage.electrodes();
        double[] gains = new double[3 * electrodes.size()];
        for (int c = 0; c < electrodes.size(); c++) {
            Electrode e = electrodes.get(c);
            Vector3 g = gain(positionM, new Vector3(e.x(), e.y(), e.z()), terms);
            gains[3 * c] = g.x();
            gains[3 * c + 1] = g.y();
            gains[3 * c + 2] = g.z();
        }
        return new LeadField(montage.labels(), gains);
    }

    /** The potential per unit moment (µV per nA·m) at unit direction {@code rHat}. */
    private Vector3 gain(Vector3 positionM, Vector3 rHat, int terms) {
        double r0 = positionM.norm();
        double t = r0 / radiusM;
        // at the centre only the n = 1 term survives and g = 3 r̂ whatever r̂0 is taken to be
        Vector3 r0Hat = r0 > 0 ? positionM.times(1 / r0) : new Vector3(0, 0, 1);
        double x = Math.max(-1, Math.min(1, rHat.dot(r0Hat)));
        double[] ab = new double[2];
        SphereSeries.sums(t, x, terms, ab);
        double a = ab[0];
        double b = ab[1];
        return r0Hat.times((a - x * b) * scale).plus(rHat.times(b * scale));
    }

    private double checkedEccentricity(Vector3 positionM, String what) {
        double t = eccentricity(positionM);
        if (!(t <= MAX_ECCENTRICITY)) {
            throw new BadInputException(String.format(Locale.ROOT,
                    "%s at %s m lies %.1f %% of the radius from the centre; it must lie within "
                            + "%.0f %% of the %.3f m sphere", what, positionM, 100 * t,
                    100 * MAX_ECCENTRICITY, radiusM));
        }
        return t;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "homogeneous sphere, R = %.3f m, σ = %.3f S/m, ε = %.0e",
                radiusM, conductivity, tolerance);
    }
}
