package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Point;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Supplier;
import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.RowSorter;
import javax.swing.SortOrder;
import org.assertj.swing.core.MouseButton;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.finder.WindowFinder;
import org.assertj.swing.fixture.DialogFixture;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.timing.Timeout;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.meridian.maps.ColourLimits;

/**
 * Details of the window on the demo study: what a cursor step repaints, the locked colour limit,
 * the status bar's readout, the measures table's polarity, emptiness and sort order, the window
 * band in the scalp layout, and the processing of the averages. Runs with AssertJ Swing's event-thread check; needs a display.
 */
class WindowDetailsGuiTest {
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
            s.setShownWaves(List.of("rare", "frequent", "rare - frequent"));
            s.setColourRange(ColourRange.automatic());
            frame.waveformPanel().setMode(WaveformMode.ONE_CHANNEL);
        });
        settle();
    }

    @Test
    void aCursorStepRedrawsNoChartAndNoMapStrip() {
        for (WaveformMode mode : new WaveformMode[] {WaveformMode.ONE_CHANNEL, WaveformMode.BUTTERFLY}) {
            GuiActionRunner.execute(() -> frame.waveformPanel().setMode(mode));
            settle();
            int chart = read(() -> frame.waveformPanel().chartPanel().chartDraws());
            int strip = read(() -> frame.spanPanel().strip().draws());
            for (int i = 0; i < 5; i++) {
                GuiActionRunner.execute(() -> state().stepCursor(1));
                robot.waitForIdle();
            }
            assertThat(read(() -> state().cursorMs())).isEqualTo(380);
            assertThat(read(() -> frame.waveformPanel().chartPanel().chartDraws())).as(mode.label()).isEqualTo(chart);
            assertThat(read(() -> frame.spanPanel().strip().draws())).isEqualTo(strip);
            GuiActionRunner.execute(() -> state().setCursorMs(360));
        }
    }

    @Test
    void aLockedLimitThatIsNotRoundIsUsedAsSetByTheMapAndTheStrip() {
        window.comboBox("toolbar.range").selectItem(ColourRange.Mode.LOCKED.label());
        window.textBox("toolbar.rangeLimit").deleteText().enterText("7.3\n");
        waitFor("the range to be locked at 7.3", () -> state().colourRange().equals(ColourRange.locked(7.3)));
        robot.waitForIdle();
        waitFor("the map to draw at ±7.3", () -> new ColourLimits(-7.3, 7.3).equals(frame.mapPanel().limits()));
        assertThat(read(() -> frame.spanPanel().strip().limits())).isEqualTo(new ColourLimits(-7.3, 7.3));
    }

    @Test
    void theValueUnderTheMouseIsShownWholeBeforeItsWave() {
        TimeChartPanel chart = frame.waveformPanel().chartPanel();
        Point p = read(() -> {
            Rectangle2D area = chart.getScreenDataArea();
            XYPlot plot = (XYPlot) chart.getChart().getPlot();
            float v = frame.workbench().model().averages().wave("rare - frequent").grand()
                    .channel(frame.workbench().model().averages().wave("rare - frequent").grand().indexOf("Pz"))[
                    state().axis().nearestIndex(360)];
            double y = plot.getRangeAxis().valueToJava2D(v, area, RectangleEdge.LEFT);
            return new Point((int) Math.round(chart.msToX(360)), (int) Math.round(y));
        });
        robot.moveMouse(chart, p);
        JLabel value = window.label("status.value").target();
        waitFor("the readout of the difference wave", () -> value.getText().endsWith("rare - frequent"));
        assertThat(read(value::getText)).matches("−?\\d+\\.\\d+ µV  rare - frequent");
        assertThat(read(() -> value.getWidth())).isGreaterThanOrEqualTo(
                read(() -> value.getFontMetrics(value.getFont()).stringWidth(value.getText())));
        robot.moveMouse(frame.mapPanel().canvas(), new Point(2, 2));
    }

    @Test
    void signedAreasTheirColumnsAndNoPeaks() {
        window.comboBox("measures.polarity").selectItem("signed area");
        waitFor("the signed measures", () -> columns().contains("Area (µV·ms)") && !columns().contains("Peak (µV)"));
        settle();
        assertThat(columns()).contains("Mean (µV)", "Frac. area lat. (ms)");
        assertThat(read(() -> frame.measuresPanel().table().getRowCount())).isEqualTo(3);
        window.comboBox("measures.polarity").selectItem("positive");
        waitFor("the peaks to come back", () -> columns().contains("Peak (µV)"));
        settle();
    }

    @Test
    void theSortOrderSurvivesMovingTheWindowAndTheTableEmptiesWithoutWaves() {
        JTable table = frame.measuresPanel().table();
        int peak = read(() -> columns().indexOf("Peak (µV)"));
        GuiActionRunner.execute(() -> table.getRowSorter().setSortKeys(
                List.of(new RowSorter.SortKey(peak, SortOrder.DESCENDING))));
        GuiActionRunner.execute(() -> state().setWindow(280, 480));
        waitFor("the measures of the new window", () -> frame.measuresPanel().scopeText().startsWith(Texts.window(280, 480)));
        settle();
        assertThat(read(() -> List.<RowSorter.SortKey>copyOf(table.getRowSorter().getSortKeys())))
                .containsExactly(new RowSorter.SortKey(peak, SortOrder.DESCENDING));
        assertThat(read(() -> peakValues(table, peak))).isSortedAccordingTo((a, b) -> Double.compare(b, a));

        GuiActionRunner.execute(() -> state().setShownWaves(List.of()));
        waitFor("the table to empty", () -> table.getRowCount() == 0);
        assertThat(read(() -> frame.measuresPanel().scopeText())).startsWith("No wave shown");
    }

    @Test
    void theWindowBandsEdgeCanBeDraggedInTheScalpLayout() {
        window.toggleButton("waveforms.mode.LAYOUT").click();
        ScalpLayoutView layout = frame.waveformPanel().layoutView();
        Point from = read(() -> layout.pointAt("Pz", 460));
        Point to = read(() -> layout.pointAt("Pz", 540));
        robot.pressMouse(layout, from, MouseButton.LEFT_BUTTON);
        robot.moveMouse(layout, new Point((from.x + to.x) / 2, from.y));
        robot.moveMouse(layout, to);
        robot.releaseMouse(MouseButton.LEFT_BUTTON);
        // a small plot is a few pixels per 10 ms: the edge lands within two pixels' time of 540
        double msPerPixel = read(() -> 80.0 / Math.max(1, layout.pointAt("Pz", 540).x - layout.pointAt("Pz", 460).x));
        waitFor("the window's end to follow the drag", () -> Math.abs(state().windowEndMs() - 540) <= 2 * msPerPixel + 4);
        assertThat(read(() -> state().windowStartMs())).isEqualTo(260);
        assertThat(read(() -> state().currentChannel())).isEqualTo("Pz");
    }

    @Test
    void aLowPassFilterSmoothsThePlottedWaveAndIsStatedAboveIt() {
        double roughBefore = read(() -> roughness(plotted()));
        double[] before = read(WindowDetailsGuiTest::plotted);
        window.button("toolbar.processing").click();
        DialogFixture dialog = WindowFinder.findDialog("processing").using(robot);
        dialog.textBox("processing.lowPass").enterText("500");
        // the demo is sampled at 250 Hz (4 ms steps), so 500 Hz lies above Nyquist, 125 Hz (Nyquist-Shannon)
        dialog.label("processing.error").requireText(java.util.regex.Pattern.compile(".*125.*"));
        dialog.button("processing.apply").requireDisabled();
        dialog.textBox("processing.lowPass").deleteText().enterText("8");
        dialog.label("processing.error").requireText(" ");
        dialog.button("processing.apply").requireEnabled().click();
        waitFor("the averages to be low-passed", () -> !frame.workbench().model().averages().processing().isNone());
        settle();
        assertThat(read(() -> frame.waveformPanel().processingText()))
                .isEqualTo("Processed: low-pass 8 Hz, Butterworth order 4, zero-phase");
        // a figure composed from this view says the same and applies it to the loaded study itself
        assertThat(read(() -> FigureFromView.build(state(), frame.workbench().model(),
                FigureFromView.suggested(state(), 6, WaveformMode.ONE_CHANNEL), "study").processingValue()))
                .isEqualTo(read(() -> state().processing()));
        double[] after = read(WindowDetailsGuiTest::plotted);
        assertThat(after).hasSameSizeAs(before).isNotEqualTo(before);
        // common practice: a low-pass removes most of a wave's sample-to-sample curvature
        assertThat(read(() -> roughness(plotted()))).isLessThan(roughBefore / 4);

        dialog.button("processing.none").click();
        dialog.button("processing.apply").click();
        waitFor("the raw averages back", () -> frame.workbench().model().averages().processing().isNone());
        settle();
        assertThat(read(() -> frame.waveformPanel().processingText())).isEmpty();
        assertThat(read(WindowDetailsGuiTest::plotted)).containsExactly(before);
        dialog.button("processing.close").click();
    }

    /** The first wave of the one-channel chart (the grand average of "rare" at Pz), as plotted. */
    private static double[] plotted() {
        XYPlot plot = (XYPlot) frame.waveformPanel().chartPanel().getChart().getPlot();
        org.jfree.data.xy.XYDataset d = plot.getDataset(0);
        double[] out = new double[d.getItemCount(0)];
        for (int i = 0; i < out.length; i++) {
            out[i] = d.getYValue(0, i);
        }
        return out;
    }

    /** The sum of squared second differences: large for a wave with fast wiggles. */
    private static double roughness(double[] v) {
        double sum = 0;
        for (int i = 1; i + 1 < v.length; i++) {
            double d = v[i + 1] - 2 * v[i] + v[i - 1];
            sum += d * d;
        }
        return sum;
    }

    private static List<Double> peakValues(JTable table, int column) {
        List<Double> out = new java.util.ArrayList<>();
        for (int r = 0; r < table.getRowCount(); r++) {
            out.add(((MeasureRows.Value) table.getValueAt(r, table.convertColumnIndexToView(column))).value());
        }
        return out;
    }

    private static List<String> columns() {
        return read(() -> {
            List<String> out = new java.util.ArrayList<>();
            JTable t = frame.measuresPanel().table();
            for (int c = 0; c < t.getModel().getColumnCount(); c++) {
                out.add(t.getModel().getColumnName(c));
            }
            return out;
        });
    }

    private static ViewState state() {
        return demo.state();
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
