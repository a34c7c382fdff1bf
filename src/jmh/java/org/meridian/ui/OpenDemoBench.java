package org.meridian.ui;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

/**
 * How long the window takes to open the demo study: everything the opening task does before the
 * window shows the study — read the bundled folder (64 channels, 16 participants, 2 conditions;
 * run from the checkout) or simulate it, fit the spline, build the live map weights, work out
 * the view's start and compute the first grand averages, bands, CSD and GFP. Run with single
 * shots in fresh forks ({@code -bm ss -f 5 -wi 0 -i 1}) for the cold figure a researcher sees on
 * the first opening; the target is ≤ 2 s.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class OpenDemoBench {

    @Benchmark
    public Object openTheDemo() {
        return StudyOpener.run(null, ViewOptions.defaults(), IntervalKind.WITHIN, Tasks.TaskProgress.NONE);
    }
}
