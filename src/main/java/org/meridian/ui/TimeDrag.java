package org.meridian.ui;

import java.awt.Cursor;
import java.awt.event.InputEvent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.function.DoubleUnaryOperator;
import java.util.function.Predicate;
import javax.swing.JComponent;

/**
 * The time gestures every time plot shares: a click or a drag moves the time cursor; pressing
 * on an edge of the window band (within {@value #GRIP} pixels) and dragging moves that edge; a
 * drag with Shift held sweeps out a new window. The plot supplies the conversions between its
 * x pixels and milliseconds and says where its time area is.
 */
final class TimeDrag extends MouseAdapter {
    /** How close to a band edge a press grips it, in pixels. */
    static final int GRIP = 6;

    private enum Grip { CURSOR, START, END, SWEEP }

    private final JComponent plot;
    private final ViewState state;
    private final DoubleUnaryOperator xToMs;
    private final DoubleUnaryOperator msToX;
    private final Predicate<MouseEvent> inTimeArea;
    private Grip grip;
    private double sweepFromMs;
    private boolean cursorOnPress = true;

    TimeDrag(JComponent plot, ViewState state, DoubleUnaryOperator xToMs, DoubleUnaryOperator msToX,
            Predicate<MouseEvent> inTimeArea) {
        this.plot = plot;
        this.state = state;
        this.xToMs = xToMs;
        this.msToX = msToX;
        this.inTimeArea = inTimeArea;
    }

    /**
     * Leaves the cursor where it is on a plain press (it still follows a drag): for plots where a
     * click means something else, such as choosing a channel.
     */
    TimeDrag withoutCursorOnPress() {
        cursorOnPress = false;
        return this;
    }

    void install() {
        plot.setFocusable(true);
        plot.addMouseListener(this);
        plot.addMouseMotionListener(this);
    }

    @Override
    public void mousePressed(MouseEvent e) {
        plot.requestFocusInWindow();
        if (e.getButton() != MouseEvent.BUTTON1 || !inTimeArea.test(e)) {
            grip = null;
            return;
        }
        double ms = xToMs.applyAsDouble(e.getX());
        grip = gripAt(e);
        switch (grip) {
            case CURSOR -> {
                if (cursorOnPress) {
                    state.setCursorMs(ms);
                }
            }
            case SWEEP -> sweepFromMs = ms;
            default -> { }
        }
    }

    @Override
    public void mouseDragged(MouseEvent e) {
        if (grip == null) {
            return;
        }
        double ms = xToMs.applyAsDouble(e.getX());
        switch (grip) {
            case CURSOR -> state.setCursorMs(ms);
            case START -> state.setWindow(Math.min(ms, state.windowEndMs() - state.axis().stepMs()),
                    state.windowEndMs());
            case END -> state.setWindow(state.windowStartMs(),
                    Math.max(ms, state.windowStartMs() + state.axis().stepMs()));
            case SWEEP -> state.setWindow(sweepFromMs, ms);
        }
    }

    @Override
    public void mouseReleased(MouseEvent e) {
        grip = null;
    }

    @Override
    public void mouseMoved(MouseEvent e) {
        Grip g = inTimeArea.test(e) ? gripAt(e) : Grip.CURSOR;
        plot.setCursor(Cursor.getPredefinedCursor(g == Grip.START || g == Grip.END
                ? Cursor.E_RESIZE_CURSOR : Cursor.DEFAULT_CURSOR));
    }

    private Grip gripAt(MouseEvent e) {
        if ((e.getModifiersEx() & InputEvent.SHIFT_DOWN_MASK) != 0) {
            return Grip.SWEEP;
        }
        double start = msToX.applyAsDouble(state.windowStartMs());
        double end = msToX.applyAsDouble(state.windowEndMs());
        double ds = Math.abs(e.getX() - start);
        double de = Math.abs(e.getX() - end);
        if (Math.min(ds, de) <= GRIP) {
            return ds <= de ? Grip.START : Grip.END;
        }
        return Grip.CURSOR;
    }
}
