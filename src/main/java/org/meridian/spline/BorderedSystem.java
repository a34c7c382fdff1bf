package org.meridian.spline;

import org.meridian.core.BadInputException;

/**
 * The solution operator of the bordered spline system of Perrin et al. (1989, eq. 3):
 *
 * <pre>
 *   [ K   1 ] [ c  ]   [ v ]
 *   [ 1ᵀ  0 ] [ c₀ ] = [ 0 ]        K = G + λI, symmetric positive definite
 * </pre>
 *
 * Eliminating c₀ by the Schur complement: with u = K⁻¹1 and s = 1ᵀu,
 * c₀ = uᵀv / s and c = (K⁻¹ − u uᵀ / s) v. The operator is returned as an (N + 1) × N matrix
 * whose first N rows map the data v to c and whose last row maps v to c₀, so the coefficients
 * of any number of samples are one matrix product. K⁻¹ comes from the Cholesky factor
 * K = L Lᵀ as L⁻ᵀL⁻¹ (about N³/2 multiply–adds in all).
 */
final class BorderedSystem {
    /** A pivot below this fraction of the largest diagonal entry counts as singular. */
    private static final double PIVOT_FLOOR = 1e-15;

    private BorderedSystem() {
    }

    /**
     * The (N + 1) × N solution operator for the symmetric matrix {@code k} (N × N, not modified).
     *
     * @throws BadInputException when K is not numerically positive definite
     */
    static double[][] solutionOperator(double[][] k) {
        int n = k.length;
        double[][] l = cholesky(k);
        double[][] inverse = inverseFromCholesky(l);
        double[] u = new double[n];
        double s = 0;
        for (int i = 0; i < n; i++) {
            double sum = 0;
            for (int j = 0; j < n; j++) {
                sum += inverse[i][j];
            }
            u[i] = sum;
            s += sum;
        }
        double[][] op = new double[n + 1][];
        for (int i = 0; i < n; i++) {
            double[] row = inverse[i];
            double ui = u[i] / s;
            for (int j = 0; j < n; j++) {
                row[j] -= ui * u[j];
            }
            op[i] = row;
        }
        op[n] = new double[n];
        for (int j = 0; j < n; j++) {
            op[n][j] = u[j] / s;
        }
        return op;
    }

    /** The lower Cholesky factor L of K (K = L Lᵀ), rows of length i + 1. */
    static double[][] cholesky(double[][] k) {
        int n = k.length;
        double maxDiagonal = 0;
        for (int i = 0; i < n; i++) {
            maxDiagonal = Math.max(maxDiagonal, Math.abs(k[i][i]));
        }
        double[][] l = new double[n][];
        for (int i = 0; i < n; i++) {
            double[] li = new double[i + 1];
            for (int j = 0; j <= i; j++) {
                double[] lj = l[j] == null ? li : l[j];
                double sum = k[i][j];
                for (int p = 0; p < j; p++) {
                    sum -= li[p] * lj[p];
                }
                if (j < i) {
                    li[j] = sum / lj[j];
                } else {
                    if (!(sum > PIVOT_FLOOR * maxDiagonal)) {
                        throw new BadInputException("the spline system of these " + n
                                + " electrode positions is singular; use a smoothing lambda above 0");
                    }
                    li[i] = Math.sqrt(sum);
                }
            }
            l[i] = li;
        }
        return l;
    }

    /** K⁻¹ = L⁻ᵀ L⁻¹ as a full symmetric N × N matrix. */
    static double[][] inverseFromCholesky(double[][] l) {
        int n = l.length;
        // X = L⁻¹ by forward substitution, row by row: X_i = (e_i − Σ_{p<i} L_ip X_p) / L_ii
        double[][] x = new double[n][];
        for (int i = 0; i < n; i++) {
            double[] xi = new double[i + 1];
            double[] li = l[i];
            for (int p = 0; p < i; p++) {
                double f = li[p];
                double[] xp = x[p];
                for (int c = 0; c <= p; c++) {
                    xi[c] -= f * xp[c];
                }
            }
            xi[i] += 1;
            double inv = 1 / li[i];
            for (int c = 0; c <= i; c++) {
                xi[c] *= inv;
            }
            x[i] = xi;
        }
        // K⁻¹ = Xᵀ X, accumulated as a sum of outer products of the rows of X (lower half)
        double[][] inverse = new double[n][n];
        for (int i = 0; i < n; i++) {
            double[] xi = x[i];
            for (int a = 0; a <= i; a++) {
                double f = xi[a];
                double[] row = inverse[a];
                for (int b = 0; b <= a; b++) {
                    row[b] += f * xi[b];
                }
            }
        }
        for (int a = 0; a < n; a++) {
            for (int b = 0; b < a; b++) {
                inverse[b][a] = inverse[a][b];
            }
        }
        return inverse;
    }
}
