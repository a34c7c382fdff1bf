package org.meridian.sim;

/**
 * The background activity added to each simulated average.
 *
 * <p>Single trials carry a background whose RMS over channels (after the average reference) is
 * {@code singleTrialRmsUv}; averaging n trials leaves 1/√n of it. Of its variance, the fraction
 * {@code sensorFraction} is independent at every channel (electrode and amplifier noise), the
 * rest comes from the brain: dipoles at fixed places on a shell inside the sphere, each with
 * independent time courses along x, y and z, which makes the noise spatially smooth like real
 * background EEG. Every time course has a power spectrum ∝ 1/f^{@code exponent} above
 * {@code lowHz} and flat below it (see {@link PowerLawNoise}).
 */
public record NoiseModel(double singleTrialRmsUv, double exponent, double lowHz,
        double sensorFraction) {

    /** No noise at all: the averages are the sources' sum exactly. */
    public static final NoiseModel NONE = new NoiseModel(0, 1, 1, 0);

    public NoiseModel {
        if (!(singleTrialRmsUv >= 0) || !Double.isFinite(singleTrialRmsUv)) {
            throw new IllegalArgumentException("noise RMS must be zero or positive, got "
                    + singleTrialRmsUv);
        }
        if (!(exponent >= 0 && exponent <= 3)) {
            throw new IllegalArgumentException("spectral exponent must lie in [0, 3], got " + exponent);
        }
        if (!(lowHz > 0) || !Double.isFinite(lowHz)) {
            throw new IllegalArgumentException("low corner must be positive, got " + lowHz);
        }
        if (!(sensorFraction >= 0 && sensorFraction <= 1)) {
            throw new IllegalArgumentException("sensor fraction must lie in [0, 1], got "
                    + sensorFraction);
        }
    }

    public boolean silent() {
        return singleTrialRmsUv == 0;
    }

    /** The same spectrum and mixture with the RMS multiplied by {@code factor}. */
    public NoiseModel scaled(double factor) {
        return new NoiseModel(singleTrialRmsUv * factor, exponent, lowHz, sensorFraction);
    }
}
