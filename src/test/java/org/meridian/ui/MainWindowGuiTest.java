package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Point;
import java.awt.event.KeyEvent;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Supplier;
import org.assertj.swing.core.MouseButton;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.timing.Timeout;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.meridian.core.Study;
import org.meridian.sim.ListeningDemo;
import org.meridian.sim.Simulator;

/**
 * The window as a researcher uses it, on the demo study, in one shared window (opening it is the
 * slow part). Runs with AssertJ Swing's check that every Swing access happens on the event
 * thread. Needs a display (CI runs it under Xvfb); skipped without one.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class MainWindowGuiTest {
    private static DemoWindow demo;
    private static Robot robot;
    private static FrameFixture window;
    private static MainWindow frame;

    @BeforeAll
    static void openTheDemo() {
        demo = DemoWindow.open(new ViewOptions(OptionalDouble.of(260),
                OptionalDouble.of(460), OptionalDouble.of(360), "Pz", List.of(), ""), Timeout.timeout(30_000));
        robot = demo.robot;
        window = demo.window;
        frame = demo.frame;
    }

    @AfterAll
    static void close() {
        DemoWindow.close(demo);
    }

    @BeforeEach
    void startFromTheSameView() {
        GuiActionRunner.execute(() -> {
            ViewState s = state();
            s.setWindow(260, 460);
            s.setCursorMs(360);
            s.setSelectedChannels(List.of("Pz"));
            s.setQuantity(MapQuantity.POTENTIAL);
            s.setMoment(MapMomentMode.CURSOR);
            frame.waveformPanel().setMode(WaveformMode.ONE_CHANNEL);
        });
        settle();
    }

    @Test
    @Order(1)
    void theDemoOpensWithItsConditionsParticipantsAndADifferenceWave() {
        assertThat(frame.getTitle()).contains("two-tone listening");
        window.checkBox("study.wave.rare").requireSelected();
        window.checkBox("study.wave.frequent").requireSelected();
        window.checkBox("study.wave.rare - frequent").requireSelected();
        window.checkBox("study.participant.p16").requireSelected();
        window.label("study.included").requireText("16 of 16 in the grand average");
        window.label("map.time").requireText("rare - frequent  ·  Potential  ·  360 ms");
        assertThat(read(() -> frame.lastOpenMillis())).isPositive();
    }

    @Test
    @Order(2)
    void arrowKeysMoveTheCursorAndTheMapTimeAndMeasuresFollow() {
        robot.click(frame.mapPanel().canvas(), new Point(3, 3));
        String before = read(() -> atCursor("grand average", "rare"));
        window.pressAndReleaseKeys(KeyEvent.VK_RIGHT);
        waitFor("the cursor to step one sample (4 ms at 250 Hz)", () -> state().cursorMs() == 364);
        window.label("map.time").requireText("rare - frequent  ·  Potential  ·  364 ms");
        settle();
        assertThat(read(() -> atCursor("grand average", "rare"))).isNotEqualTo(before);

        window.pressKey(KeyEvent.VK_SHIFT).pressAndReleaseKeys(KeyEvent.VK_RIGHT).releaseKey(KeyEvent.VK_SHIFT);
        waitFor("Shift+→ to move about 10 ms", () -> Math.abs(state().cursorMs() - 374) <= 2);
        window.pressAndReleaseKeys(KeyEvent.VK_HOME);
        waitFor("Home to reach the window's start", () -> state().cursorMs() == 260);
        window.label("map.time").requireText("rare - frequent  ·  Potential  ·  260 ms");
        window.pressAndReleaseKeys(KeyEvent.VK_END);
        waitFor("End to reach the window's end", () -> state().cursorMs() == 460);
        window.pressAndReleaseKeys(KeyEvent.VK_LEFT);
        waitFor("← to step back one sample", () -> state().cursorMs() == 456);
    }

    @Test
    @Order(3)
    void draggingTheWindowBandsEdgeUpdatesTheStripAndTheMeasures() {
        TimeChartPanel chart = frame.waveformPanel().chartPanel();
        Point from = read(() -> new Point((int) Math.round(chart.msToX(460)),
                (int) chart.getScreenDataArea().getCenterY()));
        Point to = read(() -> new Point((int) Math.round(chart.msToX(520)), from.y));
        robot.pressMouse(chart, from, MouseButton.LEFT_BUTTON);
        robot.moveMouse(chart, new Point((from.x + to.x) / 2, from.y));
        robot.moveMouse(chart, to);
        robot.releaseMouse(MouseButton.LEFT_BUTTON);
        waitFor("the window's end to follow the drag", () -> Math.abs(state().windowEndMs() - 520) <= 8);
        assertThat(read(() -> state().windowStartMs())).isEqualTo(260);
        double end = read(() -> state().windowEndMs());
        waitFor("the strip to span the new window", () -> frame.spanPanel().strip().data() != null
                && frame.spanPanel().strip().data().window().endMs() == end);
        waitFor("the measures to cover the new window", () -> frame.measuresPanel().scopeText()
                .startsWith(Texts.window(260, end)));
        assertThat(read(() -> frame.spanPanel().strip().data().strip())).hasSize(6);
        assertThat(read(() -> frame.spanPanel().strip().data().strip().get(5).title()))
                .isEqualTo(Texts.ms(end));
    }

    @Test
    @Order(4)
    void clickingAnElectrodeOnTheMapSelectsItsChannel() {
        Point cz = read(() -> frame.mapPanel().electrodePoint("Cz"));
        robot.click(frame.mapPanel().canvas(), cz);
        waitFor("Cz to become the current channel", () -> state().currentChannel().equals("Cz"));
        waitFor("the measures to follow the channel", () -> frame.measuresPanel().scopeText().endsWith("·  Cz"));
        assertThat(read(() -> frame.mapPanel().electrodePoint("Cz"))).isEqualTo(cz);
    }

    @Test
    @Order(5)
    void clickingASmallPlotInTheScalpLayoutSelectsItsChannel() {
        window.toggleButton("waveforms.mode.LAYOUT").click();
        ScalpLayoutView layout = frame.waveformPanel().layoutView();
        Point oz = read(() -> layout.centreOf("Oz"));
        robot.click(layout, oz);
        waitFor("Oz to become the current channel", () -> state().currentChannel().equals("Oz"));
    }

    @Test
    @Order(6)
    void aBadContrastShowsItsErrorInlineAndAGoodOneIsAdded() {
        window.textBox("study.contrast.field").enterText("rare - frequnt");
        window.label("study.contrast.error").requireText("character 8: no condition \"frequnt\"; did you mean \"frequent\"?");
        window.button("study.contrast.add").requireDisabled();
        window.textBox("study.contrast.field").deleteText().enterText("frequent - rare");
        window.label("study.contrast.error").requireText(" ");
        window.button("study.contrast.add").requireEnabled().click();
        waitFor("the contrast to be listed and shown", () -> state().shownWaves().contains("frequent - rare"));
        window.checkBox("study.wave.frequent - rare").requireSelected();
        window.button("study.wave.remove.frequent - rare").click();
        waitFor("the contrast to go", () -> !state().shownWaves().contains("frequent - rare"));
    }

    @Test
    @Order(7)
    void leavingOutAParticipantUpdatesTheGrandAverage() {
        window.checkBox("study.participant.p03").uncheck();
        waitFor("the averages to leave out p03", () -> frame.workbench().model().averages().excluded().contains("p03"));
        window.label("study.included").requireText("15 of 16 in the grand average");
        window.button("study.participants.all").click();
        waitFor("everyone back", () -> frame.workbench().model().averages().excluded().isEmpty());
    }

    @Test
    @Order(8)
    void switchingToCsdAndBack() {
        window.toggleButton("toolbar.csd").click();
        waitFor("the map to show CSD", () -> state().quantity() == MapQuantity.CSD);
        window.label("map.time").requireText("rare - frequent  ·  CSD  ·  360 ms");
        waitFor("the colour bar to be in µV/m²", () -> frame.mapPanel().unitText().equals("CSD (µV/m²)"));
        waitFor("the span view to follow", () -> frame.spanPanel().data() != null
                && frame.spanPanel().data().quantity() == MapQuantity.CSD);
        robot.click(frame.mapPanel().canvas(), new Point(3, 3));
        window.pressAndReleaseKeys(KeyEvent.VK_C);
        waitFor("C to switch back to the potential", () -> state().quantity() == MapQuantity.POTENTIAL);
        waitFor("the colour bar to be in µV", () -> frame.mapPanel().unitText().equals("µV"));
    }

    @Test
    @Order(9)
    void aSpanTestRunsToItsResult() {
        window.button("span.run").click();
        waitFor("the span test's result", () -> frame.spanPanel().resultText().contains("p = "));
        assertThat(read(() -> frame.spanPanel().resultText())).contains("16 participants").contains("all 65,536 sign patterns");
    }

    @Test
    @Order(10)
    void aLongSpanTestCanBeCancelled() {
        // more than 16 participants: random sign patterns, as many as asked for
        Study twenty = Simulator.simulate(ListeningDemo.scenario(20), 7).study();
        GuiActionRunner.execute(() -> frame.open(twenty, "twenty listeners", new ViewOptions(
                OptionalDouble.of(260), OptionalDouble.of(460), OptionalDouble.empty(), "Pz", List.of(), "")));
        waitFor("the simulated study", () -> frame.getTitle().startsWith("twenty listeners"));
        settle();
        window.spinner("span.patterns").enterTextAndCommit("10000000");
        window.button("span.run").click();
        waitFor("the progress bar", () -> frame.workbench().tasks().shown() != null);
        window.button("status.cancel").click();
        waitFor("the test to stop", () -> frame.spanPanel().resultText().equals("span test cancelled"));
        assertThat(read(() -> frame.workbench().tasks().isRunning("span.test"))).isFalse();
    }

    private static ViewState state() {
        return demo.state();
    }

    private static String atCursor(String participant, String condition) {
        javax.swing.JTable t = frame.measuresPanel().table();
        for (int r = 0; r < t.getRowCount(); r++) {
            if (t.getValueAt(r, 0).equals(participant) && t.getValueAt(r, 1).equals(condition)) {
                return String.valueOf(t.getValueAt(r, 3));
            }
        }
        return null;
    }

    private static <T> T read(Supplier<T> s) {
        return demo.read(s);
    }

    private static void waitFor(String what, Supplier<Boolean> c) {
        demo.waitFor(what, c);
    }

    private static void settle() {
        demo.settle();
    }
}
