package org.meridian.span;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.TimeAxis;
import org.meridian.signal.TimeWindow;

class SpanWindowTest {
    /** −100..896 ms at 250 Hz: samples every 4 ms. */
    private static final TimeAxis AXIS = new TimeAxis(-100, 250, 250);

    @Test
    void middleSplitGivesBothPartsTheSameNumberOfSamples() {
        // 300..500 ms: 51 samples, 25 early (300..396), the middle sample 400 in neither, 25 late
        SpanWindow w = SpanWindow.middle(AXIS, new TimeWindow(300, 500), "--window");
        assertThat(w.size()).isEqualTo(51);
        assertThat(w.earlyRangeMs()).isEqualTo("300..396");
        assertThat(w.lateRangeMs()).isEqualTo("404..500");
        assertThat(w.splitMs()).isEqualTo(400.0);
        // 300..496 ms: 50 samples, split between 396 and 400
        SpanWindow even = SpanWindow.middle(AXIS, new TimeWindow(300, 496), "--window");
        assertThat(even.earlyRangeMs()).isEqualTo("300..396");
        assertThat(even.lateRangeMs()).isEqualTo("400..496");
    }

    @Test
    void givenSplitStartsTheLatePartAtTheNearestSample() {
        SpanWindow w = SpanWindow.splitAt(AXIS, new TimeWindow(300, 500), 350, "--window", "--split");
        assertThat(w.earlyRangeMs()).isEqualTo("300..348");
        assertThat(w.lateRangeMs()).isEqualTo("352..500");
        assertThat(w.splitMs()).isEqualTo(350.0);
        assertThat(w.middle()).isFalse();
        SpanWindow between = SpanWindow.splitAt(AXIS, new TimeWindow(300, 500), 401, "--window", "--split");
        assertThat(between.lateRangeMs()).isEqualTo("400..500");
    }

    @Test
    void edgesHalfWayBetweenSamplesSnapInward() {
        // DESIGN §6.3: edges snap to the nearest sample, a tie goes toward the inside
        SpanWindow w = SpanWindow.middle(AXIS, new TimeWindow(302, 498), "--window");
        assertThat(w.startMs()).isEqualTo(304.0);
        assertThat(w.endMs()).isEqualTo(496.0);
        SpanWindow near = SpanWindow.middle(AXIS, new TimeWindow(301, 499), "--window");
        assertThat(near.startMs()).isEqualTo(300.0);
        assertThat(near.endMs()).isEqualTo(500.0);
    }

    @Test
    void impossibleWindowsAndSplitsAreRefusedNamingTheOption() {
        assertThatThrownBy(() -> SpanWindow.middle(AXIS, new TimeWindow(300, 2000), "option --window"))
                .isInstanceOf(BadInputException.class)
                .hasMessage("option --window: window 300:2000 ms lies outside the data (-100..896 ms)");
        assertThatThrownBy(() -> SpanWindow.middle(AXIS, new TimeWindow(300, 301), "--window"))
                .isInstanceOf(BadInputException.class).hasMessageContaining("at least 2");
        assertThatThrownBy(() -> SpanWindow.splitAt(AXIS, new TimeWindow(300, 500), 300, "--window", "option --split"))
                .isInstanceOf(BadInputException.class).hasMessageStartingWith("option --split: 300 ms");
        assertThatThrownBy(() -> SpanWindow.splitAt(AXIS, new TimeWindow(300, 500), 520, "--window", "--split"))
                .isInstanceOf(BadInputException.class).hasMessageStartingWith("--split: 520 ms");
    }
}
