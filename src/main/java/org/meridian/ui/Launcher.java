package org.meridian.ui;

import java.awt.GraphicsEnvironment;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.lang.reflect.InvocationTargetException;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import javax.swing.SwingUtilities;
import javax.swing.ToolTipManager;
import org.meridian.core.BadInputException;

/**
 * Opens the main window from the command line and waits until it is closed, so that the
 * command's exit code follows the window's life. A study of {@code null} opens the demo study;
 * with no study given, the last study opened is not reopened (the demo is the predictable start).
 */
public final class Launcher {
    private Launcher() {
    }

    /**
     * Shows the window on a study (null: the demo study) and blocks until the window is closed.
     *
     * @param theme the theme to use, or null for the remembered one
     * @throws BadInputException when there is no display to show a window on
     */
    public static void showAndWait(Path study, ViewOptions options, Theme theme) throws InterruptedException {
        if (GraphicsEnvironment.isHeadless()) {
            throw new BadInputException("no display to open the window on (set DISPLAY, or use a command"
                    + " such as info or measure)");
        }
        CountDownLatch closed = new CountDownLatch(1);
        try {
            SwingUtilities.invokeAndWait(() -> {
                UiPrefs prefs = UiPrefs.user();
                Theme t = theme == null ? prefs.theme() : theme;
                if (theme != null) {
                    prefs.setTheme(theme);
                }
                t.install();
                ToolTipManager.sharedInstance().setDismissDelay(20_000);
                MainWindow window = new MainWindow(prefs);
                window.addWindowListener(new WindowAdapter() {
                    @Override
                    public void windowClosed(WindowEvent e) {
                        closed.countDown();
                    }
                });
                window.setVisible(true);
                if (study == null) {
                    window.openDemo(options);
                } else {
                    window.open(study, options);
                }
            });
        } catch (InvocationTargetException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(cause);
        }
        closed.await();
    }
}
