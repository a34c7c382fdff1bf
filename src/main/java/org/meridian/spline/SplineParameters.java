package org.meridian.spline;

import java.util.Locale;
import org.meridian.core.BadInputException;

/**
 * The settings of a spherical spline (Perrin, Pernier, Bertrand &amp; Echallier, 1989):
 *
 * <ul>
 *   <li>{@code order} m — the spline order; the kernel's Legendre coefficients fall as
 *       n<sup>−2m+1</sup>, so a larger m gives a smoother fit. Default 4.
 *   <li>{@code lambda} λ — the smoothing (regularisation) added to the diagonal of the kernel
 *       matrix G (the G that includes the 1/(4π) factor). 0 interpolates exactly. Default 1e-5.
 *   <li>{@code terms} T — the number of Legendre terms of the kernels. Default 50.
 *   <li>{@code headRadiusM} R — the head radius in metres that scales the surface Laplacian
 *       (∇²V = Σ c<sub>j</sub> h<sub>m</sub>(r·r<sub>j</sub>) / R²). Default 0.10 m.
 * </ul>
 *
 * The constructor rejects values outside the ranges below with a {@link BadInputException} that
 * names the setting: m from 2 to 10 (below 2 the Laplacian series does not converge), λ ≥ 0 and
 * finite, T from 7 to 400, R positive and at most 1 m.
 */
public record SplineParameters(int order, double lambda, int terms, double headRadiusM) {
    public static final int DEFAULT_ORDER = 4;
    public static final double DEFAULT_LAMBDA = 1e-5;
    public static final int DEFAULT_TERMS = 50;
    public static final double DEFAULT_HEAD_RADIUS_M = 0.10;

    public SplineParameters {
        if (order < 2 || order > 10) {
            throw new BadInputException("spline order m must be an integer from 2 to 10, got " + order);
        }
        if (!(lambda >= 0) || !Double.isFinite(lambda)) {
            throw new BadInputException("spline smoothing lambda must be 0 or more, got " + lambda);
        }
        if (terms < 7 || terms > 400) {
            throw new BadInputException("the number of Legendre terms must be from 7 to 400, got " + terms);
        }
        if (!(headRadiusM > 0) || headRadiusM > 1) {
            throw new BadInputException("the head radius must be above 0 and at most 1 m, got "
                    + headRadiusM + " m");
        }
    }

    /** m = 4, λ = 1e-5, T = 50, R = 0.10 m. */
    public static SplineParameters defaults() {
        return new SplineParameters(DEFAULT_ORDER, DEFAULT_LAMBDA, DEFAULT_TERMS, DEFAULT_HEAD_RADIUS_M);
    }

    public SplineParameters withLambda(double newLambda) {
        return new SplineParameters(order, newLambda, terms, headRadiusM);
    }

    public SplineParameters withOrder(int newOrder) {
        return new SplineParameters(newOrder, lambda, terms, headRadiusM);
    }

    public SplineParameters withTerms(int newTerms) {
        return new SplineParameters(order, lambda, newTerms, headRadiusM);
    }

    public SplineParameters withHeadRadiusM(double newRadiusM) {
        return new SplineParameters(order, lambda, terms, newRadiusM);
    }

    /** A one-line description for output headers: {@code m=4 lambda=1e-05 terms=50 radius_m=0.1}. */
    public String describe() {
        return String.format(Locale.ROOT, "m=%d lambda=%s terms=%d radius_m=%s", order,
                Double.toString(lambda), terms, Double.toString(headRadiusM));
    }
}
