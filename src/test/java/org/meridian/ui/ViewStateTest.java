package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import javax.swing.SwingUtilities;
import org.junit.jupiter.api.Test;
import org.meridian.core.TimeAxis;

class ViewStateTest {
    /** −200 … 800 ms at 250 Hz: a sample every 4 ms. */
    private static final TimeAxis AXIS = new TimeAxis(-200, 250, 251);

    private static ViewState fresh(List<Set<ViewState.Aspect>> events) throws Exception {
        ViewState[] holder = new ViewState[1];
        SwingUtilities.invokeAndWait(() -> {
            ViewState s = new ViewState();
            s.reset(AXIS, 351, 300, 500, List.of("Pz"), List.of("rare"), "rare");
            s.addListener((state, what) -> events.add(what));
            holder[0] = s;
        });
        return holder[0];
    }

    private static void onEdt(Runnable r) throws Exception {
        SwingUtilities.invokeAndWait(r);
    }

    @Test
    void theCursorSitsOnTheNearestSampleWithinTheData() throws Exception {
        ViewState s = fresh(new ArrayList<>());
        // sample times are -200 + 4k ms: 351 lies nearest to 352
        assertThat(s.cursorMs()).isEqualTo(352);
        onEdt(() -> s.setCursorMs(5000));
        assertThat(s.cursorMs()).isEqualTo(800);
        onEdt(() -> s.stepCursor(-3));
        assertThat(s.cursorMs()).isEqualTo(788);
        onEdt(() -> s.stepCursor(-1000));
        assertThat(s.cursorMs()).isEqualTo(-200);
    }

    @Test
    void aWindowIsPutInOrderSnappedAndNeverNarrowerThanTwoSamples() throws Exception {
        ViewState s = fresh(new ArrayList<>());
        onEdt(() -> s.setWindow(461, 259));
        assertThat(s.windowStartMs()).isEqualTo(260);
        assertThat(s.windowEndMs()).isEqualTo(460);
        onEdt(() -> s.setWindow(300, 301));
        assertThat(s.windowStartMs()).isEqualTo(260);
        assertThat(s.windowEndMs()).isEqualTo(460);
    }

    @Test
    void listenersHearWhatChangedAndNothingWhenNothingDid() throws Exception {
        List<Set<ViewState.Aspect>> events = new ArrayList<>();
        ViewState s = fresh(events);
        onEdt(() -> {
            s.setCursorMs(352);
            s.setWindow(300, 500);
            s.setQuantity(MapQuantity.POTENTIAL);
        });
        assertThat(events).isEmpty();
        onEdt(() -> {
            s.setCursorMs(400);
            s.setQuantity(MapQuantity.CSD);
            s.setPolarity(PolarityConvention.NEGATIVE_UP);
        });
        assertThat(events).containsExactly(EnumSet.of(ViewState.Aspect.CURSOR),
                EnumSet.of(ViewState.Aspect.QUANTITY), EnumSet.of(ViewState.Aspect.POLARITY));
    }

    @Test
    void aPlainClickSelectsOneChannelAndACtrlClickAddsOrRemoves() throws Exception {
        ViewState s = fresh(new ArrayList<>());
        onEdt(() -> {
            s.toggleChannel("Cz");
            s.toggleChannel("Fz");
        });
        assertThat(s.selectedChannels()).containsExactly("Pz", "Cz", "Fz");
        onEdt(() -> s.toggleChannel("pz"));
        assertThat(s.selectedChannels()).containsExactly("Cz", "Fz");
        assertThat(s.currentChannel()).isEqualTo("Cz");
        onEdt(() -> s.selectChannel("Oz"));
        assertThat(s.selectedChannels()).containsExactly("Oz");
        onEdt(() -> s.toggleChannel("Oz"));
        assertThat(s.selectedChannels()).as("the last channel stays selected").containsExactly("Oz");
    }

    @Test
    void changesOffTheEventThreadAreRefused() throws Exception {
        ViewState s = fresh(new ArrayList<>());
        assertThatThrownBy(() -> s.setCursorMs(0)).isInstanceOf(IllegalStateException.class)
                .hasMessageContaining("event thread");
    }

    @Test
    void aLockedColourRangeNeedsAPositiveLimit() {
        assertThat(ColourRange.locked(5).limit()).isEqualTo(5);
        assertThat(ColourRange.automatic()).isEqualTo(new ColourRange(ColourRange.Mode.AUTO, 3));
        assertThatThrownBy(() -> ColourRange.locked(0)).isInstanceOf(IllegalArgumentException.class);
    }
}
