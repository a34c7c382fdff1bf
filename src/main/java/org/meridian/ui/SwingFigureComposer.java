package org.meridian.ui;

import java.awt.Window;

/**
 * The figure composer of this build, found by {@link FigureComposer#find()} through
 * {@code META-INF/services/org.meridian.ui.FigureComposer}: opens a {@link FigureComposerDialog}.
 */
public final class SwingFigureComposer implements FigureComposer {
    @Override
    public void open(Window owner, ViewState state, ViewModel model) {
        new FigureComposerDialog(owner, state, model).setVisible(true);
    }
}
