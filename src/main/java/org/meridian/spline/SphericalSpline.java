package org.meridian.spline;

import java.util.List;
import org.meridian.core.BadInputException;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.Waveforms;

/**
 * A spherical spline fitted to the positions of a montage (Perrin, Pernier, Bertrand &amp;
 * Echallier, 1989; corrigendum 1990), ready to interpolate any data recorded on it.
 *
 * <p>With unit vectors r<sub>i</sub> of the N electrodes, the data v at the electrodes determine
 * coefficients c and c₀ by the bordered system [G + λI, 1; 1ᵀ, 0]·[c; c₀] = [v; 0], where
 * G<sub>ij</sub> = g<sub>m</sub>(r<sub>i</sub>·r<sub>j</sub>) includes the 1/(4π) factor of
 * {@link SplineKernel} and λ is added to that G's diagonal. Then at a unit vector r:
 *
 * <pre>
 *   V(r)    = c₀ + Σ<sub>j</sub> c<sub>j</sub> g<sub>m</sub>(r·r<sub>j</sub>)
 *   ∇²V(r)  = Σ<sub>j</sub> c<sub>j</sub> h<sub>m</sub>(r·r<sub>j</sub>) / R²
 *   CSD(r)  = −∇²V(r)                              (µV/m² for V in µV and R in metres)
 * </pre>
 *
 * The system depends only on the positions, so it is solved once, here, into an
 * (N + 1) × N solution operator; coefficients of any number of samples are then one matrix
 * product. The kernels are read from a {@link KernelTable}. Needs at least 4 electrodes.
 * Immutable.
 */
public final class SphericalSpline {
    /** Fewer positioned channels than this give no meaningful map (DESIGN §3). */
    public static final int MIN_CHANNELS = 4;

    private final Montage montage;
    private final SplineParameters parameters;
    private final KernelTable kernel;
    private final double[] ex;
    private final double[] ey;
    private final double[] ez;
    /** (N + 1) × N: rows 0 … N−1 give c, row N gives c₀. Never handed out. */
    private final double[][] operator;

    private SphericalSpline(Montage montage, SplineParameters parameters) {
        List<Electrode> es = montage.electrodes();
        int n = es.size();
        if (n < MIN_CHANNELS) {
            throw new BadInputException("maps, CSD and channel repair need at least " + MIN_CHANNELS
                    + " positioned channels, and there " + (n == 1 ? "is " : "are ") + n
                    + (n == 0 ? "" : " (" + String.join(", ", montage.labels()) + ")"));
        }
        this.montage = montage;
        this.parameters = parameters;
        this.kernel = new KernelTable(new SplineKernel(parameters.order(), parameters.terms()));
        this.ex = new double[n];
        this.ey = new double[n];
        this.ez = new double[n];
        for (int i = 0; i < n; i++) {
            ex[i] = es.get(i).x();
            ey[i] = es.get(i).y();
            ez[i] = es.get(i).z();
        }
        double[][] k = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j <= i; j++) {
                double v = kernel.g(ex[i] * ex[j] + ey[i] * ey[j] + ez[i] * ez[j]);
                k[i][j] = v;
                k[j][i] = v;
            }
            k[i][i] += parameters.lambda();
        }
        this.operator = BorderedSystem.solutionOperator(k);
    }

    /** Fits the spline to the montage's positions. */
    public static SphericalSpline fit(Montage montage, SplineParameters parameters) {
        return new SphericalSpline(montage, parameters);
    }

    public Montage montage() {
        return montage;
    }

    public List<String> labels() {
        return montage.labels();
    }

    public int channelCount() {
        return ex.length;
    }

    public SplineParameters parameters() {
        return parameters;
    }

    /**
     * The one place where the CSD sign convention lives. The kernel value at a point is
     * multiplied by this factor: 1 for the potential (kernel g), and −1/R² for the CSD
     * (kernel h), because CSD = −∇²V and ∇²V = Σ c<sub>j</sub> h(r·r<sub>j</sub>) / R².
     */
    private double kernelFactor(Quantity quantity) {
        if (quantity == Quantity.CSD) {
            double r = parameters.headRadiusM();
            return -1 / (r * r);
        }
        return 1;
    }

    private double kernelAt(Quantity quantity, double cosine) {
        return quantity == Quantity.CSD ? kernel.h(cosine) : kernel.g(cosine);
    }

    /**
     * The coefficients [c₁ … c<sub>N</sub>, c₀] for one map of values given in the order of
     * {@link #labels()}.
     */
    public double[] coefficients(double[] values) {
        requireLength(values);
        int n = ex.length;
        double[] out = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            double[] row = operator[i];
            double sum = 0;
            for (int j = 0; j < n; j++) {
                sum += row[j] * values[j];
            }
            out[i] = sum;
        }
        return out;
    }

    /**
     * The quantity at one point, from {@link #coefficients} of a map. The point is a direction
     * in the head frame; it is normalised here.
     */
    public double valueAt(Quantity quantity, double[] coefficients, double x, double y, double z) {
        int n = ex.length;
        if (coefficients.length != n + 1) {
            throw new IllegalArgumentException("expected " + (n + 1) + " coefficients, got "
                    + coefficients.length);
        }
        double norm = Math.sqrt(x * x + y * y + z * z);
        double sum = 0;
        for (int j = 0; j < n; j++) {
            sum += coefficients[j] * kernelAt(quantity, (x * ex[j] + y * ey[j] + z * ez[j]) / norm);
        }
        double v = kernelFactor(quantity) * sum;
        return quantity == Quantity.POTENTIAL ? v + coefficients[n] : v;
    }

    /**
     * Weights that evaluate the quantity at many points (unit vectors {x, y, z}): precomputed
     * once, then each map is one matrix–vector product (see {@link SplineWeights}).
     *
     * <p>The weights are, in single precision, the factor times the kernel's remainder beyond
     * degree 3 between each point and each of the N electrodes, followed by the 20 monomials of
     * {@link LowDegree} at each point; the matching (N + 20) × N double-precision operator turns
     * a map's values into c (for the remainder) and the exact low-degree weights (with c₀ for
     * the potential).
     */
    public SplineWeights weightsAt(Quantity quantity, double[][] points) {
        int n = ex.length;
        int count = points.length;
        int width = n + LowDegree.COUNT;
        float[][] columns = new float[width][count];
        double[] px = new double[count];
        double[] py = new double[count];
        double[] pz = new double[count];
        for (int p = 0; p < count; p++) {
            px[p] = points[p][0];
            py[p] = points[p][1];
            pz[p] = points[p][2];
        }
        double factor = kernelFactor(quantity);
        KernelTable.Table remainder = quantity == Quantity.CSD ? kernel.hRemainder() : kernel.gRemainder();
        double[] cosine = new double[count];
        // one electrode at a time: the cosines vectorise, and neighbouring points read
        // neighbouring table entries
        for (int j = 0; j < n; j++) {
            double x = ex[j];
            double y = ey[j];
            double z = ez[j];
            for (int p = 0; p < count; p++) {
                cosine[p] = Math.max(-1.0, Math.min(1.0, px[p] * x + py[p] * y + pz[p] * z));
            }
            float[] column = columns[j];
            for (int p = 0; p < count; p++) {
                column[p] = (float) (factor * remainder.valueAt(cosine[p]));
            }
        }
        for (int m = 0; m < LowDegree.COUNT; m++) {
            float[] column = columns[n + m];
            for (int p = 0; p < count; p++) {
                column[p] = (float) LowDegree.monomial(m, px[p], py[p], pz[p]);
            }
        }
        return new SplineWeights(quantity, count, n, columns, weightsOperator(quantity));
    }

    /**
     * The (N + 20) × N operator of {@link #weightsAt}: rows 0 … N−1 are A (v → c); row N + m is
     * factor · α<sub>|e|</sub>·mult(e) · Σ<sub>j</sub> q<sub>j</sub><sup>e</sup> A<sub>j·</sub>
     * for monomial m with exponents e, plus a₀ (v → c₀) on the constant monomial for the potential.
     */
    private double[][] weightsOperator(Quantity quantity) {
        int n = ex.length;
        double factor = kernelFactor(quantity);
        double[] alpha = quantity == Quantity.CSD ? kernel.hCubic() : kernel.gCubic();
        double[][] op = new double[n + LowDegree.COUNT][];
        for (int i = 0; i < n; i++) {
            op[i] = operator[i].clone();
        }
        for (int m = 0; m < LowDegree.COUNT; m++) {
            double w = factor * LowDegree.weight(alpha, m);
            double[] row = new double[n];
            for (int j = 0; j < n; j++) {
                double q = w * LowDegree.monomial(m, ex[j], ey[j], ez[j]);
                double[] a = operator[j];
                for (int k = 0; k < n; k++) {
                    row[k] += q * a[k];
                }
            }
            if (m == 0 && quantity == Quantity.POTENTIAL) {
                for (int k = 0; k < n; k++) {
                    row[k] += operator[n][k];
                }
            }
            op[n + m] = row;
        }
        return op;
    }

    /** Weights at the positions of electrodes (e.g. the montage's own, or channels to repair). */
    public SplineWeights weightsAt(Quantity quantity, List<Electrode> targets) {
        double[][] points = new double[targets.size()][];
        for (int i = 0; i < points.length; i++) {
            Electrode e = targets.get(i);
            points[i] = new double[] {e.x(), e.y(), e.z()};
        }
        return weightsAt(quantity, points);
    }

    /**
     * The quantity at the positions of {@code targets} as an explicit linear map of the spline's
     * channels, in double precision: W = K·A (+ a₀ for the potential). For study outputs (CSD of
     * every channel, repaired channels), where the weights are few and exactness matters.
     */
    public ChannelTransform transformAt(Quantity quantity, List<Electrode> targets) {
        int n = ex.length;
        double factor = kernelFactor(quantity);
        double[][] w = new double[targets.size()][];
        double[] k = new double[n];
        for (int t = 0; t < w.length; t++) {
            Electrode e = targets.get(t);
            for (int i = 0; i < n; i++) {
                k[i] = factor * kernelAt(quantity, e.x() * ex[i] + e.y() * ey[i] + e.z() * ez[i]);
            }
            double[] row = quantity == Quantity.POTENTIAL ? operator[n].clone() : new double[n];
            for (int i = 0; i < n; i++) {
                double ki = k[i];
                double[] a = operator[i];
                for (int j = 0; j < n; j++) {
                    row[j] += ki * a[j];
                }
            }
            w[t] = row;
        }
        return new ChannelTransform(w);
    }

    /**
     * For each spline channel, its row in {@code waveforms} (matched by label, ignoring case).
     *
     * @throws BadInputException when a channel of the montage is missing from the waveforms
     */
    public int[] rowsIn(Waveforms waveforms) {
        List<String> labels = montage.labels();
        int[] rows = new int[labels.size()];
        for (int i = 0; i < rows.length; i++) {
            rows[i] = waveforms.requireIndex(labels.get(i));
        }
        return rows;
    }

    private void requireLength(double[] values) {
        if (values.length != ex.length) {
            throw new IllegalArgumentException("expected " + ex.length + " channel values, got "
                    + values.length);
        }
    }
}
