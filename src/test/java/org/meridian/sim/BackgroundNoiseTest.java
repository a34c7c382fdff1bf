package org.meridian.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meridian.core.TimeAxis;
import org.meridian.montage.StandardSystem;

class BackgroundNoiseTest {
    private static Scenario scenario(NoiseModel noise) {
        return new Scenario("noise", StandardSystem.TEN_TWENTY.montage(), new TimeAxis(0, 250, 200),
                SphereHeadModel.standard(), List.of(new ConditionSpec("a", 1, 1)), List.of(), 1, noise);
    }

    @Test
    void theSimulatedBackgroundHasTheModelsSpatialCovariance() {
        BackgroundNoise bg = new BackgroundNoise(scenario(new NoiseModel(10, 1, 1, 0.25)));
        double[][] sigma = bg.covariance();
        int c = sigma.length;
        int samples = 200;
        double[][] sample = new double[c][c];
        BackgroundNoise.Workspace w = bg.workspace();
        int reps = 400;
        for (int r = 0; r < reps; r++) {
            double[] v = new double[c * samples];
            bg.addTo(v, SeededStream.derive(7, r), 1, w);
            for (int i = 0; i < c; i++) {
                for (int j = 0; j < c; j++) {
                    double s = 0;
                    for (int t = 0; t < samples; t += 20) {
                        s += v[i * samples + t] * v[j * samples + t];
                    }
                    sample[i][j] += s / (samples / 20) / reps;
                }
            }
        }
        // the sample covariance of Gaussian vectors converges to their covariance (law of large
        // numbers); 4000 nearly independent draws give a few per cent error
        double num = 0;
        double den = 0;
        for (int i = 0; i < c; i++) {
            for (int j = 0; j < c; j++) {
                num += (sample[i][j] - sigma[i][j]) * (sample[i][j] - sigma[i][j]);
                den += sigma[i][j] * sigma[i][j];
            }
        }
        assertThat(Math.sqrt(num / den)).isLessThan(0.08);
    }

    @Test
    void theCovarianceHasTheRequestedSizeAndTheAverageReference() {
        double[][] sigma = new BackgroundNoise(scenario(new NoiseModel(10, 1, 1, 0.25))).covariance();
        int c = sigma.length;
        double trace = 0;
        for (int i = 0; i < c; i++) {
            trace += sigma[i][i];
            double row = 0;
            for (int j = 0; j < c; j++) {
                row += sigma[i][j];
            }
            // average-referenced data sum to zero over channels, so every row of Σ does (definition)
            assertThat(row).isCloseTo(0, within(1e-9));
        }
        // the mean channel variance is rms² (the model's definition): 100 µV²
        assertThat(trace / c).isCloseTo(100, within(1e-9));
    }

    @Test
    void sensorNoiseMakesTheBackgroundFullRankUnderTheAverageReference() {
        int c = StandardSystem.TEN_TWENTY.montage().size();
        assertThat(new BackgroundNoise(scenario(new NoiseModel(10, 1, 1, 0.2))).seriesCount()).isEqualTo(c - 1);
    }
}
