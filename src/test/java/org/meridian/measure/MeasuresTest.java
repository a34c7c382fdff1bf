package org.meridian.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.signal.TimeWindow;

/** Measures on waves whose answers are known in closed form. */
class MeasuresTest {
    private static final MeasureSettings POS = MeasureSettings.defaults();
    private static final MeasureSettings NEG = POS.withPolarity(Polarity.NEGATIVE);

    private static Trace trace(TimeAxis axis, DoubleUnaryOperator f, String window) {
        double[] x = new double[axis.samples()];
        for (int i = 0; i < x.length; i++) {
            x[i] = f.applyAsDouble(axis.timeMs(i));
        }
        TimeWindow.SampleRange r = TimeWindow.parse(window).resolve(axis);
        return new Trace(x, axis, r.from(), r.to());
    }

    private static double score(String measure, Trace t, MeasureSettings s) {
        return Measures.byName(measure).score(t, s).value();
    }

    /** Piecewise-linear wave through the given (time, value) corners, 0 outside. */
    private static DoubleUnaryOperator corners(double... tv) {
        return t -> {
            for (int i = 0; i + 3 < tv.length; i += 2) {
                if (t >= tv[i] && t <= tv[i + 2]) {
                    return tv[i + 1] + (tv[i + 3] - tv[i + 1]) * (t - tv[i]) / (tv[i + 2] - tv[i]);
                }
            }
            return 0;
        };
    }

    @Test
    void theMeanOfAWholeSinePeriodIsZero() {
        TimeAxis axis = new TimeAxis(-100, 1000, 1000);
        Trace t = trace(axis, ms -> 5 * Math.sin(2 * Math.PI * ms / 100), "0:100");
        // ∫ sin over a period is 0, and the inclusive sample sum of sin(2πi/N), i = 0..N, is 0 (textbook identity)
        assertThat(score("mean", t, POS)).isCloseTo(0, within(1e-12));
        Trace offset = trace(axis, ms -> 2 + 5 * Math.sin(2 * Math.PI * ms / 100), "100:300");
        assertThat(score("mean", offset, POS)).isCloseTo(2, within(1e-12));
    }

    @Test
    void aGaussiansHalfAreaLatencyIsItsCentre() {
        TimeAxis axis = new TimeAxis(-200, 1000, 1200);
        // symmetric about its centre: half of the area lies on each side (geometry)
        Trace onSample = trace(axis, ms -> 8 * Math.exp(-Math.pow((ms - 350) / 40, 2) / 2), "150:550");
        assertThat(score("frac-area-latency", onSample, POS)).isCloseTo(350, within(1e-6));
        Trace between = trace(axis, ms -> 8 * Math.exp(-Math.pow((ms - 352.3) / 40, 2) / 2), "100:604.6");
        assertThat(score("frac-area-latency", between, POS)).isCloseTo(352.3, within(1e-3));
        Trace negative = trace(axis, ms -> -3 * Math.exp(-Math.pow((ms - 170) / 15, 2) / 2), "90:250");
        assertThat(score("frac-area-latency", negative, NEG)).isCloseTo(170, within(1e-6));
        assertThat(score("frac-area-latency", negative, NEG.withPolarity(Polarity.SIGNED))).isCloseTo(170, within(1e-6));
    }

    @Test
    void aLobeFollowedByALongNegativeStretchKeepsItsAreaLatencies() {
        // a triangle from 0 ms up to 2 µV at 100 ms and down to 0 at 200 ms, then −1 µV to the
        // window's end 1.4 s later: the positive part's running area is flat over many of the
        // scan's blocks, so the search skips stretches; geometry gives the answers
        TimeAxis axis = new TimeAxis(-100, 1000, 1800);
        Trace t = trace(axis, ms -> ms <= 200 ? corners(0, 0, 100, 2, 200, 0).applyAsDouble(ms)
                : ms < 210 ? -(ms - 200) / 10 : -1, "-50:1650");
        // symmetric triangle: half the area at its apex (geometry)
        assertThat(score("frac-area-latency", t, POS)).isCloseTo(100, within(1e-9));
        // the whole positive area is reached where the triangle ends, not where the window ends
        assertThat(score("frac-area-latency", t, POS.withFraction(1))).isCloseTo(200, within(1e-9));
        // a quarter of the area: (t/100)²·100/200 = 1/4 → t = 100/√2 ms (geometry); linear
        // interpolation in the running area is exact to O(Δt²·slope/area): 0.01 ms here
        assertThat(score("frac-area-latency", t, POS.withFraction(0.25))).isCloseTo(100 / Math.sqrt(2), within(0.01));
        // the negative part: a ramp over 200..210 ms (area 5) then −1 µV to 1650 ms (area 1440);
        // half of 1445 µV·ms is reached at 210 + (722.5 − 5) ms (geometry)
        assertThat(score("frac-area-latency", t, NEG)).isCloseTo(927.5, within(1e-9));
        assertThat(score("frac-area-latency", t, NEG.withFraction(1))).isCloseTo(1650, within(1e-9));
    }

    @Test
    void aTrianglesFractionalLatenciesFollowFromItsGeometry() {
        // rises from 0 at 0 ms to 1 µV at 100 ms, falls to 0 at 300 ms; area 150 µV·ms
        TimeAxis axis = new TimeAxis(-50, 1000, 400);
        Trace t = trace(axis, corners(0, 0, 100, 1, 300, 0), "0:300");
        assertThat(score("area", t, POS)).isCloseTo(150, within(1e-9));
        // the rising part holds 50 of 150 µV·ms: a third of the area is reached at the apex
        assertThat(score("frac-area-latency", t, POS.withFraction(1.0 / 3))).isCloseTo(100, within(1e-9));
        // half the area: the falling part's remaining area (300 − t)²/400 = 75 → t = 300 − √30000.
        // Linear interpolation in the running area is exact to O(Δt²·slope/area): 0.01 ms here
        assertThat(score("frac-area-latency", t, POS)).isCloseTo(300 - Math.sqrt(30000), within(0.01));
        // the rising edge crosses 30 % of the peak at 30 ms (similar triangles), between samples
        // at 256 Hz, and linear interpolation is exact on a straight edge
        TimeAxis coarse = new TimeAxis(-12 * 1000.0 / 256, 256, 120);
        Trace c = trace(coarse, corners(0, 0, 3 * 1000.0 / 256 * 10, 1, 300, 0), "0:250");
        double apex = 3 * 1000.0 / 256 * 10;
        assertThat(score("frac-peak-latency", c, POS.withFraction(0.3))).isCloseTo(0.3 * apex, within(1e-9));
        assertThat(score("frac-peak-latency", c, POS.withFraction(0.5))).isCloseTo(0.5 * apex, within(1e-9));
        assertThat(score("peak-latency", c, POS)).isCloseTo(apex, within(1e-9));
    }

    @Test
    void trapezoidAreasOfPiecewiseLinearWavesAreExact() {
        // corners (0, 0), (10, 3), (20, −2), (30, 0) ms at 200 Hz: the zero crossing at 16 ms lies
        // between samples. Positive part: a triangle of base 16 and height 3 = 24 µV·ms; negative
        // part: base 14, depth 2 = −14 µV·ms; signed: 10 µV·ms (geometry)
        TimeAxis axis = new TimeAxis(-20, 200, 20);
        Trace t = trace(axis, corners(0, 0, 10, 3, 20, -2, 30, 0), "0:30");
        assertThat(score("area", t, POS)).isCloseTo(24, within(1e-12));
        assertThat(score("area", t, NEG)).isCloseTo(-14, within(1e-12));
        assertThat(score("area", t, POS.withPolarity(Polarity.SIGNED))).isCloseTo(10, within(1e-12));
        // a window of one sample has no extent and no area
        assertThat(score("area", trace(axis, corners(0, 0, 10, 3, 20, -2, 30, 0), "10:11"), POS)).isZero();
        assertThat(Measures.byName("area").unit(Unit.MICROVOLT)).isEqualTo("µV·ms");
    }

    @Test
    void peaksArePerPolarityAndTiesGoToTheEarliestSample() {
        TimeAxis axis = new TimeAxis(0, 1000, 500);
        Trace t = trace(axis, corners(100, 0, 200, 4, 250, 4, 300, -6, 400, 0), "50:450");
        assertThat(score("peak", t, POS)).isEqualTo(4);
        assertThat(score("peak-latency", t, POS)).isEqualTo(200);
        assertThat(score("peak", t, NEG)).isEqualTo(-6);
        assertThat(score("peak-latency", t, NEG)).isEqualTo(300);
        assertThatThrownBy(() -> Measures.byName("peak").check(POS.withPolarity(Polarity.SIGNED)))
                .isInstanceOf(BadInputException.class).hasMessageContaining("needs polarity pos or neg");
    }

    @Test
    void theLocalPeakIgnoresASlopeThatEndsAtTheWindowEdge() {
        TimeAxis axis = new TimeAxis(0, 500, 300);
        // a big slope rising into the window's end (no peak there), and a small true peak at 200 ms
        DoubleUnaryOperator f = ms -> 2 * Math.exp(-Math.pow((ms - 200) / 20, 2) / 2) + (ms > 250 ? (ms - 250) / 10 : 0);
        Trace t = trace(axis, f, "150:300");
        assertThat(score("peak-latency", t, POS)).isEqualTo(300);
        Score local = Measures.byName("local-peak-latency").score(t, POS);
        // DESIGN §6.3: larger than both neighbours and the mean of k samples each side
        assertThat(local.value()).isEqualTo(200);
        assertThat(local.qualifier()).isNull();
        assertThat(score("local-peak", t, POS)).isCloseTo(f.applyAsDouble(200), within(1e-12));
    }

    @Test
    void theLocalPeakLooksPastTheWindowForItsNeighbours() {
        TimeAxis axis = new TimeAxis(0, 500, 300);
        // peak at 150 ms, the window ends there: the samples after it lie outside the window
        DoubleUnaryOperator f = ms -> Math.exp(-Math.pow((ms - 150) / 30, 2) / 2);
        assertThat(score("local-peak-latency", trace(axis, f, "100:150"), POS)).isEqualTo(150);
        // a peak at the very end of the data has no neighbour after it and cannot qualify
        DoubleUnaryOperator rising = ms -> ms;
        Score s = Measures.byName("local-peak").score(trace(axis, rising, "500:598"), POS);
        assertThat(s.qualifier()).isEqualTo("window maximum");
        assertThat(s.value()).isEqualTo(598);
        assertThat(s.warning()).contains("no local positive peak");
    }

    @Test
    void theNeighbourhoodMeanMustBeExceeded() {
        TimeAxis axis = new TimeAxis(0, 1000, 200);
        // a one-sample blip at 100 ms on top of a broad hill whose crest is at 100 ms too, but
        // a narrower spike at 60 ms that sits in a trough: larger than its neighbours, yet below
        // the hill's mean on one side with a 20 ms neighbourhood
        DoubleUnaryOperator f = ms -> {
            double hill = 5 * Math.exp(-Math.pow((ms - 100) / 15, 2) / 2);
            return hill + (ms == 60 ? 0.4 : 0);
        };
        Trace t = trace(axis, f, "50:70");
        // inside 50:70 the hill rises steadily: the only strict maximum is the blip at 60 ms,
        // whose right-hand 20 ms mean (hill at 61–80 ms) is larger than the blip's value
        double rightMean = 0;
        for (int ms = 61; ms <= 80; ms++) {
            rightMean += f.applyAsDouble(ms) / 20;
        }
        assertThat(f.applyAsDouble(60)).isLessThan(rightMean);
        Score s = Measures.byName("local-peak-latency").score(t, POS);
        assertThat(s.qualifier()).isEqualTo("window maximum");
        assertThat(s.value()).isEqualTo(70);
        // with a 1 ms neighbourhood the blip is a local peak
        assertThat(score("local-peak-latency", t, POS.withNeighbourhoodMs(1))).isEqualTo(60);
    }

    @Test
    void aFractionalPeakLatencyWithoutACrossingIsEmptyAndSaysWhy() {
        TimeAxis axis = new TimeAxis(0, 1000, 500);
        // the window starts on the slope above half the peak: no crossing inside the window
        Trace t = trace(axis, corners(100, 0, 200, 4, 300, 0), "180:300");
        Score s = Measures.byName("frac-peak-latency").score(t, POS);
        assertThat(s.isEmpty()).isTrue();
        assertThat(s.warning()).contains("does not cross 50 % of the peak");
        Score wrongSign = Measures.byName("frac-peak-latency").score(trace(axis, ms -> -1, "100:200"), POS);
        assertThat(wrongSign.isEmpty()).isTrue();
        assertThat(wrongSign.warning()).contains("not above zero");
        Score noArea = Measures.byName("frac-area-latency").score(trace(axis, ms -> -1, "100:200"), POS);
        assertThat(noArea.isEmpty()).isTrue();
    }

    @Test
    void unknownMeasuresSuggestTheNearestName() {
        assertThatThrownBy(() -> Measures.byName("peak-latncy")).isInstanceOf(BadInputException.class)
                .hasMessageStartingWith("no measure \"peak-latncy\"; did you mean \"peak-latency\"?");
        assertThat(Measures.byName(" MEAN ").name()).isEqualTo("mean");
    }
}
