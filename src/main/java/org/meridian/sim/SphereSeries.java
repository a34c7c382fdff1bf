package org.meridian.sim;

/**
 * The Legendre series for the surface potential of a current dipole inside a homogeneous
 * conducting sphere, and the rule that decides how many of its terms to sum.
 *
 * <p>A dipole of moment p at r0 (eccentricity t = |r0|/R &lt; 1) in a sphere of radius R and
 * conductivity σ produces on the surface, at the point whose direction makes the angle γ with
 * r0 (x = cos γ),
 * <pre>
 *   V = 1/(4πσR²) · Σ_{n≥1} (2n+1) t^(n−1) · [ p_r P_n(x) + p_t P_n^1(x) / n ]
 * </pre>
 * with p_r the moment along r0 and p_t its part along the tangent at r0 that points toward the
 * surface point; P_n^1(x) = sqrt(1 − x²) P_n'(x). It is the gradient, with respect to the source
 * position, of the series of a point current source in an insulated sphere,
 * (1/(4πσR)) Σ (2n+1)/n · t^n P_n(x), which follows from expanding 1/|r − r0| in Legendre
 * polynomials and adding the interior harmonic that cancels the normal current at r = R
 * (the classical derivation; see e.g. Nunez &amp; Srinivasan, 2006, Electric Fields of the Brain,
 * appendix on the sphere). For t → 0 only n = 1 survives and V = 3 p·r̂ / (4πσR²).
 *
 * <p>In vector form V = p · g/(4πσR²) with g = (A − x·B) r̂0 + B r̂, where
 * A = Σ (2n+1) t^(n−1) P_n(x) and B = Σ (2n+1) t^(n−1) P_n'(x)/n; this avoids dividing by
 * sin γ when the surface point lies straight above the dipole.
 *
 * <p><b>Truncation.</b> |P_n(x)| ≤ 1, and |P_n^1(x)| / n ≤ 1 by Bernstein's inequality for
 * polynomials of degree n, so the terms beyond N change V by at most
 * (|p_r| + |p_t|)/(4πσR²) · S(N) ≤ √2·|p|/(4πσR²) · S(N), where
 * S(N) = Σ_{n&gt;N} (2n+1) t^(n−1) = t^N [(2N+3)/(1−t) + 2t/(1−t)²]. {@link #termCount} returns
 * the smallest N with √2·S(N) ≤ ε, so the truncation error at every surface point is at most
 * ε·|p|/(4πσR²): ε/3 of the largest potential the same dipole would produce at the centre.
 * The count grows like ln(ε)/ln(t) as the dipole nears the surface (about 40 terms at t = 0.5,
 * 300 at t = 0.9, 3600 at t = 0.99 for ε = 1e-10).
 */
final class SphereSeries {
    /** More terms than any eccentricity we accept needs; a guard against endless loops. */
    static final int MAX_TERMS = 200_000;
    private static final double SQRT2 = StrictMath.sqrt(2.0);

    private SphereSeries() {
    }

    /**
     * The number of terms after which the truncation error is at most {@code tolerance} in
     * units of |p|/(4πσR²).
     *
     * @param t         eccentricity |r0|/R, in [0, 1)
     * @param tolerance ε &gt; 0
     */
    static int termCount(double t, double tolerance) {
        if (!(t >= 0 && t < 1)) {
            throw new IllegalArgumentException("eccentricity must lie in [0, 1), got " + t);
        }
        if (!(tolerance > 0)) {
            throw new IllegalArgumentException("tolerance must be positive, got " + tolerance);
        }
        double tn = t;
        for (int n = 1; n <= MAX_TERMS; n++) {
            if (SQRT2 * tailBound(t, n, tn) <= tolerance) {
                return n;
            }
            tn *= t;
        }
        throw new IllegalArgumentException("the series needs more than " + MAX_TERMS
                + " terms at eccentricity " + t);
    }

    /** S(N) = Σ_{n&gt;N} (2n+1) t^(n−1), given tN = t^N. */
    static double tailBound(double t, int terms, double tN) {
        double q = 1 - t;
        return tN * ((2.0 * terms + 3) / q + 2 * t / (q * q));
    }

    /**
     * Sums the first {@code terms} terms of A and B (see the class comment) at eccentricity t
     * and x = cos γ, writing A to {@code out[0]} and B to {@code out[1]}.
     */
    static void sums(double t, double x, int terms, double[] out) {
        // P_0 = 1, P_1 = x; (n+1) P_{n+1} = (2n+1) x P_n − n P_{n−1}; P'_{n+1} = x P'_n + (n+1) P_n
        double pPrev = 1;
        double p = x;
        double dp = 1;
        double tPow = 1;
        double a = 0;
        double b = 0;
        for (int n = 1; n <= terms; n++) {
            double w = (2 * n + 1) * tPow;
            a += w * p;
            b += w * dp / n;
            double pNext = ((2 * n + 1) * x * p - n * pPrev) / (n + 1);
            dp = x * dp + (n + 1) * p;
            pPrev = p;
            p = pNext;
            tPow *= t;
            if (tPow == 0) {
                break;
            }
        }
        out[0] = a;
        out[1] = b;
    }

    /** P_n(x) by the three-term recurrence (for tests and diagnostics). */
    static double legendre(int degree, double x) {
        double pPrev = 1;
        double p = x;
        if (degree == 0) {
            return 1;
        }
        for (int n = 1; n < degree; n++) {
            double pNext = ((2 * n + 1) * x * p - n * pPrev) / (n + 1);
            pPrev = p;
            p = pNext;
        }
        return p;
    }

    /** P_n'(x) by the recurrence P'_{n+1} = x P'_n + (n+1) P_n (for tests and diagnostics). */
    static double legendreDerivative(int degree, double x) {
        if (degree == 0) {
            return 0;
        }
        double pPrev = 1;
        double p = x;
        double dp = 1;
        for (int n = 1; n < degree; n++) {
            double pNext = ((2 * n + 1) * x * p - n * pPrev) / (n + 1);
            dp = x * dp + (n + 1) * p;
            pPrev = p;
            p = pNext;
        }
        return dp;
    }
}
