package org.meridian.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.TimeWindow;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Every measure for 100 participants × 128 channels × 4 conditions × 1000 samples (1 kHz,
 * −200..799 ms) in one 100:600 ms window, on one thread. Target: ≤ 200 ms.
 *
 * <p>The waves are invented to look like averaged ERPs: a P3-like component plus smooth
 * background noise (a first-order autoregressive series, ρ = 0.98 at 1 kHz, about 1 µV SD), as
 * averaging and the recording's anti-alias filter leave it. {@code whiteNoise} runs the same on
 * sample-to-sample independent noise, the worst case for the branches in the local peak.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2)
@org.openjdk.jmh.annotations.Measurement(iterations = 3)
@Fork(value = 1, jvmArgs = {"-Xmx4g"})
public class MeasureBench {
    /** Smooth (averaged-ERP-like) noise, or independent noise at every sample. */
    @Param({"smooth", "white"})
    public String noise;

    private Study study;
    private MeasureRequest everyMeasure;
    private MeasureRequest withGrandAndJackknife;

    @Setup
    public void setUp() {
        TimeAxis axis = new TimeAxis(-200, 1000, 1000);
        List<String> labels = new ArrayList<>();
        for (int c = 0; c < 128; c++) {
            labels.add("E" + (c + 1));
        }
        List<String> conditions = List.of("a", "b", "c", "d");
        Random random = new Random(1);
        Study.Builder b = Study.builder("bench");
        for (int p = 0; p < 100; p++) {
            for (String condition : conditions) {
                float[] v = new float[128 * 1000];
                double background = 0;
                for (int i = 0; i < v.length; i++) {
                    int s = i % 1000;
                    background = noise.equals("white") ? random.nextGaussian()
                            : 0.98 * background + 0.2 * random.nextGaussian();
                    v[i] = (float) (5 * Math.exp(-Math.pow((s - 500) / 60.0, 2)) + background);
                }
                b.add(String.format("p%03d", p), condition, Waveforms.wrap(labels, axis, Unit.MICROVOLT, v), 40);
            }
        }
        study = b.build();
        everyMeasure = request(false);
        withGrandAndJackknife = request(true);
    }

    private MeasureRequest request(boolean extras) {
        MeasureRequest.Builder r = MeasureRequest.builder().window(TimeWindow.parse("100:600"))
                .grand(extras).jackknife(extras);
        for (String c : study.conditions()) {
            r.condition(ConditionExpression.condition(c));
        }
        for (Measure m : Measures.all()) {
            r.measure(m);
        }
        return r.build();
    }

    @Benchmark
    public MeasureTable everyMeasure() {
        return Measurement.run(study, everyMeasure);
    }

    @Benchmark
    public MeasureTable everyMeasureWithGrandAndJackknife() {
        return Measurement.run(study, withGrandAndJackknife);
    }
}
