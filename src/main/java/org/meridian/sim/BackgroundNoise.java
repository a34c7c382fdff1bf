package org.meridian.sim;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;

/**
 * The background activity of one scenario (see {@link NoiseModel}): its spatial covariance over
 * the montage, and a generator of average-referenced background for one averaged waveform.
 *
 * <p>Single-trial background = brain part + sensor part. The brain part comes from dipoles at
 * fixed places (the points of a 64-point Fibonacci lattice on the sphere — González, 2010,
 * "Measurement of areas on a sphere using Fibonacci and latitude–longitude lattices" — with
 * z ≥ −0.3, at 70 % of the radius), each with independent unit-variance time courses along x, y
 * and z: spatial covariance Σ_b = G Gᵀ with G the average-referenced lead fields, scaled so that
 * trace(Σ_b)/C = (1 − f)·rms². The sensor part is independent at each channel; after the
 * average reference its covariance is s²(I − 11ᵀ/C), with s² chosen so its share is f·rms².
 *
 * <p>Every time course has the same spectrum, so the background is a Gaussian process whose
 * covariance factorises into Σ = Σ_b + Σ_s (space) times one temporal covariance. It is
 * therefore generated exactly, in distribution, as A·z(t), with A Aᵀ = Σ from the eigenvectors
 * of Σ (Commons Math) and z(t) independent {@link PowerLawNoise} series — at most C − 1 of
 * them instead of one per dipole component and channel. Averaging n trials divides it by √n.
 */
final class BackgroundNoise {
    private static final int LATTICE = 64;
    private static final double ECCENTRICITY = 0.7;
    private static final double LOWEST_Z = -0.3;
    /** Eigenvalues below this fraction of the largest are the average reference's null space. */
    private static final double RANK_TOLERANCE = 1e-12;

    private final int channels;
    private final int samples;
    private final double rateHz;
    private final NoiseModel model;
    private final double[][] covariance;
    /** Channel-major: channels × series. */
    private final double[] factor;
    private final int series;

    BackgroundNoise(Scenario scenario) {
        this.channels = scenario.montage().size();
        this.samples = scenario.axis().samples();
        this.rateHz = scenario.axis().rateHz();
        this.model = scenario.noise();
        this.covariance = covariance(scenario);
        EigenDecomposition eig = new EigenDecomposition(new Array2DRowRealMatrix(covariance, false));
        double[] values = eig.getRealEigenvalues();
        double largest = 0;
        for (double v : values) {
            largest = Math.max(largest, v);
        }
        List<Integer> kept = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            if (values[i] > RANK_TOLERANCE * largest) {
                kept.add(i);
            }
        }
        this.series = kept.size();
        this.factor = new double[channels * series];
        for (int k = 0; k < series; k++) {
            int i = kept.get(k);
            double root = StrictMath.sqrt(values[i]);
            double[] u = eig.getEigenvector(i).toArray();
            for (int ch = 0; ch < channels; ch++) {
                factor[ch * series + k] = u[ch] * root;
            }
        }
    }

    /** The number of independent series behind the background (the rank of Σ). */
    int seriesCount() {
        return series;
    }

    /** Σ in µV² for single trials, average reference (a copy). */
    double[][] covariance() {
        double[][] out = new double[channels][];
        for (int i = 0; i < channels; i++) {
            out[i] = covariance[i].clone();
        }
        return out;
    }

    /** A scratch object for one thread: the series generator and its buffer. */
    Workspace workspace() {
        return new Workspace(new PowerLawNoise(samples, rateHz, model.exponent(), model.lowHz()),
                new double[series * samples]);
    }

    record Workspace(PowerLawNoise generator, double[] buffer) {
    }

    /** Adds the background of an average of {@code trials} trials to {@code v} (channel-major). */
    void addTo(double[] v, SeededStream random, int trials, Workspace w) {
        if (series == 0) {
            return;
        }
        double trialScale = 1 / StrictMath.sqrt(trials);
        double[] z = w.buffer();
        java.util.Arrays.fill(z, 0);
        w.generator().reset();
        for (int k = 0; k < series; k++) {
            w.generator().addSeries(random, 1, z, k * samples);
        }
        for (int ch = 0; ch < channels; ch++) {
            int off = ch * samples;
            for (int k = 0; k < series; k++) {
                double a = factor[ch * series + k] * trialScale;
                int zOff = k * samples;
                for (int t = 0; t < samples; t++) {
                    v[off + t] += a * z[zOff + t];
                }
            }
        }
    }

    /** Σ = Σ_b + Σ_s as described in the class comment. */
    private static double[][] covariance(Scenario scenario) {
        int channels = scenario.montage().size();
        List<Vector3> positions = brainDipolePositions(scenario.head().radiusM());
        int columns = 3 * positions.size();
        double[][] g = new double[channels][columns];
        for (int k = 0; k < positions.size(); k++) {
            LeadField lf = scenario.head().leadField(positions.get(k), scenario.montage(),
                    "a background dipole");
            for (int ch = 0; ch < channels; ch++) {
                Vector3 gain = lf.gain(ch);
                g[ch][3 * k] = gain.x();
                g[ch][3 * k + 1] = gain.y();
                g[ch][3 * k + 2] = gain.z();
            }
        }
        for (int k = 0; k < columns; k++) {
            double mean = 0;
            for (int ch = 0; ch < channels; ch++) {
                mean += g[ch][k];
            }
            mean /= channels;
            for (int ch = 0; ch < channels; ch++) {
                g[ch][k] -= mean;
            }
        }
        double[][] sigma = new double[channels][channels];
        double trace = 0;
        for (int i = 0; i < channels; i++) {
            for (int j = 0; j <= i; j++) {
                double s = 0;
                for (int k = 0; k < columns; k++) {
                    s += g[i][k] * g[j][k];
                }
                sigma[i][j] = s;
                sigma[j][i] = s;
            }
            trace += sigma[i][i];
        }
        NoiseModel noise = scenario.noise();
        double rms2 = noise.singleTrialRmsUv() * noise.singleTrialRmsUv();
        double brainScale = trace > 0 ? (1 - noise.sensorFraction()) * rms2 * channels / trace : 0;
        // independent channels of variance s² keep s²(1 − 1/C) each after the average reference
        double sensorVariance = noise.sensorFraction() * rms2 / (1 - 1.0 / channels);
        for (int i = 0; i < channels; i++) {
            for (int j = 0; j < channels; j++) {
                sigma[i][j] = sigma[i][j] * brainScale
                        + sensorVariance * ((i == j ? 1 : 0) - 1.0 / channels);
            }
        }
        return sigma;
    }

    /** The positions of the brain-noise dipoles (see the class comment). */
    static List<Vector3> brainDipolePositions(double radiusM) {
        List<Vector3> out = new ArrayList<>();
        double golden = (1 + StrictMath.sqrt(5)) / 2;
        for (int i = 0; i < LATTICE; i++) {
            double z = 1 - (2 * i + 1.0) / LATTICE;
            if (z < LOWEST_Z) {
                continue;
            }
            double rho = StrictMath.sqrt(1 - z * z);
            double phi = 2 * StrictMath.PI * i / golden;
            out.add(new Vector3(rho * StrictMath.cos(phi), rho * StrictMath.sin(phi), z)
                    .times(ECCENTRICITY * radiusM));
        }
        return out;
    }
}
