package org.meridian.montage;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;
import org.meridian.core.BadInputException;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;

/**
 * The sphere that best fits measured electrode positions in the geometric least-squares sense,
 * minimising Σ (|p_i − c| − r)² over centre c and radius r. The algebraic fit
 * (|p|² = 2 c·p + (r² − |c|²), linear in its unknowns) gives the start; Levenberg–Marquardt
 * (Commons Math) refines it. Measured montages are centred on the fitted sphere and normalised
 * to unit length before any interpolation.
 *
 * @param cx     centre x, in the input's length unit
 * @param cy     centre y
 * @param cz     centre z
 * @param radius radius
 * @param rms    root-mean-square distance of the points from the sphere
 */
public record SphereFit(double cx, double cy, double cz, double radius, double rms) {

    /** Fits a sphere to at least four points that do not all lie in one plane. */
    public static SphereFit fit(double[][] points) {
        if (points.length < 4) {
            throw new IllegalArgumentException("a sphere fit needs at least 4 points, got " + points.length);
        }
        double[] start = algebraic(points);
        LeastSquaresOptimizer.Optimum optimum = new LevenbergMarquardtOptimizer().optimize(
                new LeastSquaresBuilder()
                        .start(start)
                        .target(new double[points.length])
                        .model(p -> residualsAndJacobian(points, p.toArray()))
                        .maxEvaluations(1000)
                        .maxIterations(1000)
                        .build());
        double[] c = optimum.getPoint().toArray();
        return new SphereFit(c[0], c[1], c[2], Math.abs(c[3]), optimum.getRMS());
    }

    /**
     * A montage from measured positions: fitted to a sphere, centred on it and normalised. With
     * fewer than four positions no sphere can be fitted, and the positions are only normalised
     * about the origin of their frame.
     */
    public static Montage montageFromMeasured(List<String> labels, double[][] points, String source) {
        List<Electrode> out = new ArrayList<>(labels.size());
        double[] centre = {0, 0, 0};
        if (points.length >= 4) {
            try {
                SphereFit f = fit(points);
                centre = new double[] {f.cx, f.cy, f.cz};
            } catch (RuntimeException e) {
                throw new BadInputException(source + ": the electrode positions do not fit a sphere"
                        + " (are they all in one plane?)");
            }
        }
        for (int i = 0; i < points.length; i++) {
            double x = points[i][0] - centre[0];
            double y = points[i][1] - centre[1];
            double z = points[i][2] - centre[2];
            if (x == 0 && y == 0 && z == 0) {
                throw new BadInputException(source + ": electrode " + labels.get(i)
                        + " lies at the centre of the head");
            }
            out.add(new Electrode(labels.get(i), x, y, z));
        }
        return new Montage(out, source);
    }

    private static double[] algebraic(double[][] points) {
        int n = points.length;
        RealMatrix a = new Array2DRowRealMatrix(n, 4);
        RealVector b = new ArrayRealVector(n);
        for (int i = 0; i < n; i++) {
            double[] p = points[i];
            a.setRow(i, new double[] {2 * p[0], 2 * p[1], 2 * p[2], 1});
            b.setEntry(i, p[0] * p[0] + p[1] * p[1] + p[2] * p[2]);
        }
        RealVector s = new QRDecomposition(a).getSolver().solve(b);
        double cx = s.getEntry(0);
        double cy = s.getEntry(1);
        double cz = s.getEntry(2);
        double r = Math.sqrt(Math.max(s.getEntry(3) + cx * cx + cy * cy + cz * cz, 0));
        return new double[] {cx, cy, cz, r};
    }

    private static Pair<RealVector, RealMatrix> residualsAndJacobian(double[][] points, double[] p) {
        int n = points.length;
        double[] res = new double[n];
        double[][] jac = new double[n][4];
        for (int i = 0; i < n; i++) {
            double dx = points[i][0] - p[0];
            double dy = points[i][1] - p[1];
            double dz = points[i][2] - p[2];
            double d = Math.sqrt(dx * dx + dy * dy + dz * dz);
            res[i] = d - p[3];
            double inv = d > 0 ? 1 / d : 0;
            jac[i][0] = -dx * inv;
            jac[i][1] = -dy * inv;
            jac[i][2] = -dz * inv;
            jac[i][3] = -1;
        }
        return new Pair<>(new ArrayRealVector(res, false), new Array2DRowRealMatrix(jac, false));
    }
}
