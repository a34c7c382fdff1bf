package org.meridian.ui;

import java.awt.Window;
import java.util.Optional;
import java.util.ServiceLoader;

/**
 * The seam for the figure composer: the toolbar's "Figure…" action stays disabled until an
 * implementation is found on the class path (through {@link ServiceLoader}, i.e. a line with
 * its class name in {@code META-INF/services/org.meridian.ui.FigureComposer}). The composer
 * receives the window's {@link ViewState} and {@link ViewModel} and reads what it needs (waves,
 * channels, window, cursor, quantity, colour range, averages); it must not change them.
 */
public interface FigureComposer {
    /** Opens the composer for what the window shows now; called on the event thread. */
    void open(Window owner, ViewState state, ViewModel model);

    /** The first composer on the class path, if any. */
    static Optional<FigureComposer> find() {
        return ServiceLoader.load(FigureComposer.class).findFirst();
    }
}
