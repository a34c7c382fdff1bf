package org.meridian.sim;

import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.meridian.core.TimeAxis;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * How long simulating takes: the whole demo study from scratch (target ≤ 2 s), the demo again
 * on a reused {@link Simulator} (a new seed each time, as a validation run would), and one
 * condition of 16 participants × 64 channels × 250 samples with the two late sources — the
 * size of one study in a span-stability validation.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class SimulateBench {
    private Scenario demo;
    private Simulator demoSimulator;
    private Simulator spanStudy;
    private long seed;

    @Setup
    public void setUp() {
        demo = ListeningDemo.scenario();
        demoSimulator = new Simulator(demo);
        List<Source> late = demo.sources().stream().filter(s -> s.name().startsWith("late-"))
                .map(s -> s.withGains(Map.of(ListeningDemo.RARE, s.gain(ListeningDemo.RARE)))).toList();
        Scenario oneCondition = new Scenario("span validation", demo.montage(), new TimeAxis(-200, 250, 250),
                demo.head(), List.of(new ConditionSpec(ListeningDemo.RARE, 80, 0.75)), late, 16, demo.noise());
        spanStudy = new Simulator(oneCondition);
    }

    @Benchmark
    public Simulation demoStudyFromScratch() {
        return Simulator.simulate(demo, ListeningDemo.SEED);
    }

    @Benchmark
    public Simulation demoStudyReusingTheSimulator() {
        return demoSimulator.simulate(seed++);
    }

    @Benchmark
    public Simulation oneConditionSixteenBySixtyFourBy250() {
        return spanStudy.simulate(seed++);
    }
}
