package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import javax.swing.SwingUtilities;
import org.junit.jupiter.api.Test;
import org.meridian.core.TimeAxis;
import org.meridian.figure.spec.FigureWidth;

/** The composer's suggestions follow the view's modes. */
class FigureFromViewTest {
    private static final TimeAxis AXIS = new TimeAxis(-200, 250, 251);

    private static ViewState view(MapMomentMode moment) throws Exception {
        ViewState[] holder = new ViewState[1];
        SwingUtilities.invokeAndWait(() -> {
            ViewState s = new ViewState();
            s.reset(AXIS, 352, 300, 500, List.of("Cz", "Pz"), List.of("rare"), "rare");
            s.setMoment(moment);
            holder[0] = s;
        });
        return holder[0];
    }

    @Test
    void windowMeanMapsBecomeAStripOfEqualWindowsAcrossTheViewWindow() throws Exception {
        FigureFromView.Choices c = FigureFromView.suggested(view(MapMomentMode.WINDOW_MEAN), 4, WaveformMode.ONE_CHANNEL);
        assertThat(c.mapTimesMs()).isEmpty();
        // 300..500 ms in four touching windows of 50 ms (arithmetic)
        assertThat(c.mapWindowsMs()).containsExactly(List.of(300.0, 350.0), List.of(350.0, 400.0),
                List.of(400.0, 450.0), List.of(450.0, 500.0));
        assertThat(c.spanTrace()).isFalse();
        assertThat(c.width()).isEqualTo(FigureWidth.TWO_COLUMN);
    }

    @Test
    void mapsAtTheCursorGiveTimesAndAllChannelsWithGfpGiveAGfpTrace() throws Exception {
        FigureFromView.Choices c = FigureFromView.suggested(view(MapMomentMode.CURSOR), 3, WaveformMode.BUTTERFLY);
        assertThat(c.mapWindowsMs()).isEmpty();
        assertThat(c.mapTimesMs()).hasSize(3).allMatch(t -> t >= 300 && t <= 500);
        assertThat(c.spanTrace()).isTrue();
        assertThat(c.channels()).containsExactly("Cz", "Pz");
    }

    @Test
    void equalWindowsTouchAndRoundToATenthOfAMillisecond() {
        // 0..100 ms in three: 33.3, 66.7 (rounded to 0.1 ms)
        assertThat(FigureFromView.equalWindows(0, 100, 3)).containsExactly(List.of(0.0, 33.3),
                List.of(33.3, 66.7), List.of(66.7, 100.0));
    }
}
