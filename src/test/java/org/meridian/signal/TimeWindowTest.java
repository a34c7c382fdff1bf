package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.TimeAxis;

class TimeWindowTest {
    /** 2 ms steps from −200 ms: sample i at −200 + 2i. */
    private static final TimeAxis AXIS = new TimeAxis(-200, 500, 500);

    @Test
    void edgesSnapToTheNearestSample() {
        TimeWindow.SampleRange r = TimeWindow.parse("300.4:499.6").resolve(AXIS);
        assertThat(AXIS.timeMs(r.from())).isEqualTo(300);
        assertThat(AXIS.timeMs(r.to())).isEqualTo(500);
    }

    @Test
    void aTieGoesTowardTheInsideOfTheWindow() {
        // 301 ms lies half-way between 300 and 302: the start goes up, the end goes down
        TimeWindow.SampleRange r = TimeWindow.parse("301:499").resolve(AXIS);
        assertThat(AXIS.timeMs(r.from())).isEqualTo(302);
        assertThat(AXIS.timeMs(r.to())).isEqualTo(498);
        assertThat(r.length()).isEqualTo(99);
    }

    @Test
    void aWindowOutsideTheDataNamesTheWindowAndTheData() {
        assertThatThrownBy(() -> TimeWindow.parse("600:900").resolve(AXIS))
                .isInstanceOf(BadInputException.class)
                .hasMessage("window 600:900 ms lies outside the data (-200..798 ms)");
        assertThatThrownBy(() -> TimeWindow.parse("-250:0").resolve(AXIS))
                .hasMessageContaining("window -250:0 ms lies outside the data");
        // half a sample beyond the last one still snaps onto it
        assertThat(TimeWindow.parse("700:799").resolve(AXIS).to()).isEqualTo(499);
    }

    @Test
    void badTextIsRefusedWithTheReason() {
        assertThatThrownBy(() -> TimeWindow.parse("300-500")).hasMessageContaining("is not START:END");
        assertThatThrownBy(() -> TimeWindow.parse("a:500")).hasMessageContaining("\"a\" is not a number");
        assertThatThrownBy(() -> TimeWindow.parse("500:300")).hasMessageContaining("start must come before");
        assertThatThrownBy(() -> TimeWindow.parse("301:301.0000000001").resolve(AXIS)).hasMessageContaining("holds no sample");
        assertThat(TimeWindow.parse(" -100 : 0 ")).isEqualTo(new TimeWindow(-100, 0));
        assertThat(new TimeWindow(-100, 352.5).toString()).isEqualTo("-100:352.5");
    }
}
