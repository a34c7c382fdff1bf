package org.meridian.sim;

/**
 * An independent route to the surface potential of a dipole in a homogeneous sphere: the closed
 * form of Frank (1952) for point sources, differentiated for a dipole as restated by Brody, Terry
 * &amp; Ideker (1973) and by Mosher, Leahy &amp; Lewis (1999, eq. for the single-shell sphere);
 * written here from memory:
 * <pre>
 *   V(r) = 1/(4πσ) · p · [ 2 d/|d|³ + ( r/R + d/|d| ) / ( R² − r·r0 + R|d| ) ],   d = r − r0,
 * </pre>
 * for r on the surface (|r| = R). It sums the Legendre series in closed form, so agreement with
 * the series checks the recurrences, the tangential term and the truncation rule at once.
 * Returns µV for a moment in nA·m and positions in metres.
 */
final class HomogeneousSphereClosedForm {
    private HomogeneousSphereClosedForm() {
    }

    static double potential(double radiusM, double sigma, Vector3 r0, Vector3 pNAm, Vector3 direction) {
        Vector3 r = direction.unit().times(radiusM);
        Vector3 d = r.minus(r0);
        double dn = d.norm();
        Vector3 term1 = d.times(2 / (dn * dn * dn));
        double f = radiusM * radiusM - r.dot(r0) + radiusM * dn;
        Vector3 term2 = r.times(1 / radiusM).plus(d.times(1 / dn)).times(1 / f);
        return 1e-3 * pNAm.dot(term1.plus(term2)) / (4 * Math.PI * sigma);
    }
}
