package org.meridian.ui;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import org.meridian.core.BadInputException;

/**
 * What every panel of one window shares: the {@link ViewState}, the {@link ViewModel}, the
 * background {@link Tasks}, the current {@link Theme}, and the status bar's fields for what
 * lies under the mouse and for messages. Handed to each panel's constructor; owned by the
 * event thread.
 */
public final class Workbench {
    /** Told when the theme changes, after the look is installed. */
    @FunctionalInterface
    public interface ThemeListener {
        void themeChanged(Theme theme);
    }

    private final ViewState state;
    private final ViewModel model;
    private final Tasks tasks;
    private final StatusBar status;
    private final List<ThemeListener> themeListeners = new CopyOnWriteArrayList<>();
    private Theme theme;

    Workbench(Theme theme) {
        this.theme = theme;
        this.state = new ViewState();
        this.tasks = new Tasks();
        this.status = new StatusBar();
        this.tasks.addObserver(status);
        this.model = new ViewModel(state, tasks, this::report);
    }

    public ViewState state() {
        return state;
    }

    public ViewModel model() {
        return model;
    }

    public Tasks tasks() {
        return tasks;
    }

    StatusBar statusBar() {
        return status;
    }

    public Theme theme() {
        return theme;
    }

    public void addThemeListener(ThemeListener l) {
        themeListeners.add(l);
    }

    void setTheme(Theme t) {
        theme = t;
        for (ThemeListener l : themeListeners) {
            l.themeChanged(t);
        }
    }

    /** Shows what lies under the mouse in the status bar; empty strings clear. */
    public void pointer(String time, String channel, String value) {
        status.showPointer(time, channel, value);
    }

    /** Shows a one-line message in the status bar. */
    public void message(String text) {
        status.showMessage(text);
    }

    /**
     * Shows a failure in the status bar as one line: a researcher's error as it is, anything else
     * as an internal failure (with the stack trace on stderr for a bug report).
     */
    public void report(Throwable t) {
        if (t instanceof BadInputException) {
            message("error: " + oneLine(t.getMessage()));
        } else {
            message("internal failure: " + oneLine(String.valueOf(t)));
            t.printStackTrace();
        }
    }

    static String oneLine(String s) {
        return s == null ? "" : s.replace('\n', ' ').replace('\r', ' ').trim();
    }
}
