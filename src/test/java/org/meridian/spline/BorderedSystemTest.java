package org.meridian.spline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;

class BorderedSystemTest {

    private static double[][] randomPositiveDefinite(int n, long seed) {
        Random random = new Random(seed);
        double[][] b = new double[n][n];
        for (double[] row : b) {
            for (int j = 0; j < n; j++) {
                row[j] = random.nextGaussian();
            }
        }
        double[][] k = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double s = 0;
                for (int p = 0; p < n; p++) {
                    s += b[i][p] * b[j][p];
                }
                k[i][j] = s + (i == j ? 0.5 : 0);
            }
        }
        return k;
    }

    @Test
    void choleskyFactorMatchesCommonsMath() {
        double[][] k = randomPositiveDefinite(30, 1);
        double[][] l = BorderedSystem.cholesky(k);
        // Commons Math CholeskyDecomposition as the reference factorisation
        RealMatrix reference = new CholeskyDecomposition(new Array2DRowRealMatrix(k)).getL();
        for (int i = 0; i < k.length; i++) {
            for (int j = 0; j <= i; j++) {
                assertThat(l[i][j]).isCloseTo(reference.getEntry(i, j), within(1e-9));
            }
        }
    }

    @Test
    void operatorSolvesTheBorderedSystemLikeCommonsMathLu() {
        int n = 25;
        double[][] k = randomPositiveDefinite(n, 2);
        double[][] op = BorderedSystem.solutionOperator(k);
        RealMatrix bordered = new Array2DRowRealMatrix(n + 1, n + 1);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                bordered.setEntry(i, j, k[i][j]);
            }
            bordered.setEntry(i, n, 1);
            bordered.setEntry(n, i, 1);
        }
        var lu = new LUDecomposition(bordered).getSolver();
        Random random = new Random(3);
        for (int trial = 0; trial < 5; trial++) {
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                v[i] = random.nextGaussian();
            }
            // Commons Math LUDecomposition of [K 1; 1ᵀ 0] solved for [v; 0] (Perrin et al., 1989, eq. 3)
            RealVector expected = lu.solve(new ArrayRealVector(java.util.Arrays.copyOf(v, n + 1)));
            for (int i = 0; i <= n; i++) {
                double got = 0;
                for (int j = 0; j < n; j++) {
                    got += op[i][j] * v[j];
                }
                assertThat(got).as("row %d", i).isCloseTo(expected.getEntry(i), within(1e-9));
            }
        }
    }

    @Test
    void singularMatrixIsAClearError() {
        double[][] k = {{1, 1, 0, 0}, {1, 1, 0, 0}, {0, 0, 1, 0}, {0, 0, 0, 1}};
        assertThatThrownBy(() -> BorderedSystem.solutionOperator(k))
                .isInstanceOf(BadInputException.class).hasMessageContaining("singular");
    }
}
