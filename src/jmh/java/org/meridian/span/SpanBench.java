package org.meridian.span;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.meridian.core.TimeAxis;
import org.meridian.signal.TimeWindow;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.stats.Progress;
import org.meridian.stats.SignFlipTest;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Targets (issue 6), one core: the span test with 5000 sign-flip patterns for 24 participants ×
 * 128 channels × 250 samples in ≤ 1 s, from the participants' waveforms to the p-value; and the
 * segmentation of a 250-sample window of 128 channels with k up to 8 and 20 restarts in ≤ 1 s.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class SpanBench {
    private static final int PARTICIPANTS = 24;
    private static final int CHANNELS = 128;
    private static final int SAMPLES = 250;

    private List<Waveforms> participants;
    private SpanWindow window;
    private WindowMaps grandMaps;
    private WindowMaps oddMaps;
    private WindowMaps evenMaps;

    @Setup
    public void setUp() {
        SplittableRandom rnd = new SplittableRandom(2024);
        TimeAxis axis = new TimeAxis(0, 500, SAMPLES);
        List<String> labels = new ArrayList<>();
        for (int c = 0; c < CHANNELS; c++) {
            labels.add("E" + (c + 1));
        }
        double[] m1 = new double[CHANNELS];
        double[] m2 = new double[CHANNELS];
        for (int c = 0; c < CHANNELS; c++) {
            m1[c] = rnd.nextDouble(-1, 1);
            m2[c] = rnd.nextDouble(-1, 1);
        }
        participants = new ArrayList<>();
        float[] grand = new float[CHANNELS * SAMPLES];
        float[][] halves = new float[2][CHANNELS * SAMPLES];
        for (int p = 0; p < PARTICIPANTS; p++) {
            float[] v = new float[CHANNELS * SAMPLES];
            for (int c = 0; c < CHANNELS; c++) {
                for (int t = 0; t < SAMPLES; t++) {
                    double a = Math.exp(-0.5 * Math.pow((t - 90) / 30.0, 2));
                    double b = Math.exp(-0.5 * Math.pow((t - 170) / 30.0, 2));
                    v[c * SAMPLES + t] = (float) (4 * a * m1[c] + 3 * b * m2[c] + rnd.nextDouble(-2, 2));
                    grand[c * SAMPLES + t] += v[c * SAMPLES + t] / PARTICIPANTS;
                    halves[p % 2][c * SAMPLES + t] += 2 * v[c * SAMPLES + t] / PARTICIPANTS;
                }
            }
            participants.add(Waveforms.wrap(labels, axis, Unit.MICROVOLT, v));
        }
        window = SpanWindow.middle(axis, new TimeWindow(0, axis.lastMs()), "--window");
        grandMaps = new WindowMaps(Waveforms.wrap(labels, axis, Unit.MICROVOLT, grand), window);
        oddMaps = new WindowMaps(Waveforms.wrap(labels, axis, Unit.MICROVOLT, halves[0]), window);
        evenMaps = new WindowMaps(Waveforms.wrap(labels, axis, Unit.MICROVOLT, halves[1]), window);
    }

    @Benchmark
    public double spanTestFiveThousandPatterns() {
        double[][] early = new double[PARTICIPANTS][];
        double[][] late = new double[PARTICIPANTS][];
        for (int p = 0; p < PARTICIPANTS; p++) {
            double[][] parts = PartMeans.of(participants.get(p), window);
            early[p] = parts[0];
            late[p] = parts[1];
        }
        return SpanTest.run(early, late, SignFlipTest.withRandomPatterns(5000, 1), 0.05, Progress.NONE).p();
    }

    @Benchmark
    public int segmentationUpToEightStatesTwentyRestarts() {
        return new TopographicClustering(8, 20, 1).segment(grandMaps).k();
    }

    /** As the span analysis runs it: k cross-validated on two halves of the participants. */
    @Benchmark
    public int segmentationCrossValidatedOnHalves() {
        return new TopographicClustering(8, 20, 1).segment(grandMaps, oddMaps, evenMaps).k();
    }

    @Benchmark
    public double stabilityTraceWithCorrelationMatrix() {
        return StabilityTrace.of(grandMaps, -1).diss(0);
    }
}
