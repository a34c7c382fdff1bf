package org.meridian.ui;

import java.awt.Dimension;
import java.util.function.Supplier;
import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JToggleButton;
import javax.swing.JToolBar;
import org.meridian.maps.ColourLimits;

/**
 * The row above the panels: Open; Potential | CSD; the colour range; the polarity convention;
 * Figure… (disabled until a figure composer is on the class path, see {@link FigureComposer});
 * and the theme. Every control mirrors the {@link ViewState}.
 */
final class Toolbar extends JToolBar {
    private final JToggleButton potential = new JToggleButton("Potential");
    private final JToggleButton csd = new JToggleButton("CSD");
    private final JToggleButton polarity = new JToggleButton();
    private final JButton theme = new JButton();
    private final Workbench bench;

    Toolbar(Workbench bench, MainWindow window, Supplier<ColourLimits> shownLimits) {
        this.bench = bench;
        setFloatable(false);
        setName("toolbar");
        JButton open = new JButton("Open…");
        open.setName("toolbar.open");
        open.setToolTipText("Open a study: its folder, its manifest (study.tsv), a waveform file or a long table."
                + " You can also drop one on the window.");
        open.addActionListener(e -> window.chooseAndOpen());
        add(open);
        addSeparator();

        potential.setName("toolbar.potential");
        potential.setToolTipText("Maps and span view show the potential (µV) — press C to switch");
        csd.setName("toolbar.csd");
        csd.setToolTipText("Maps and span view show the CSD (surface Laplacian, µV/m²) — press C to switch");
        for (JToggleButton b : new JToggleButton[] {potential, csd}) {
            b.putClientProperty("JButton.buttonType", "segmented");
        }
        potential.putClientProperty("JButton.segmentPosition", "first");
        csd.putClientProperty("JButton.segmentPosition", "last");
        ButtonGroup q = new ButtonGroup();
        q.add(potential);
        q.add(csd);
        potential.addActionListener(e -> bench.state().setQuantity(MapQuantity.POTENTIAL));
        csd.addActionListener(e -> {
            if (bench.state().quantity() != MapQuantity.CSD) {
                window.toggleQuantity();
                refresh();
            }
        });
        add(potential);
        add(csd);
        addSeparator();

        add(new ColourRangeControl(bench, shownLimits));
        addSeparator();

        polarity.setName("toolbar.polarity");
        polarity.setToolTipText("Which way positive voltages point in every waveform plot");
        polarity.addActionListener(e -> bench.state().setPolarity(bench.state().polarity().other()));
        add(polarity);
        addSeparator();

        JButton processing = new JButton("Processing…");
        processing.setName("toolbar.processing");
        processing.setToolTipText("Reference, filter and baseline of every participant's averages");
        processing.addActionListener(e -> window.openProcessing());
        add(processing);
        addSeparator();

        JButton figure = new JButton("Figure…");
        figure.setName("toolbar.figure");
        boolean composer = FigureComposer.find().isPresent();
        figure.setEnabled(composer);
        figure.setToolTipText(composer ? "Compose a publication figure from this view"
                : "Figure composer: not part of this build yet");
        figure.addActionListener(e -> window.openFigureComposer());
        add(figure);

        add(javax.swing.Box.createHorizontalGlue());
        theme.setName("toolbar.theme");
        theme.addActionListener(e -> {
            window.toggleTheme();
            refresh();
        });
        add(theme);
        setMinimumSize(new Dimension(200, getPreferredSize().height));

        bench.state().addListener((s, what) -> refresh());
        bench.model().addListener((m, what) -> refresh());
        refresh();
    }

    private void refresh() {
        ViewState s = bench.state();
        potential.setSelected(s.quantity() == MapQuantity.POTENTIAL);
        csd.setSelected(s.quantity() == MapQuantity.CSD);
        StudySession session = bench.model().session();
        csd.setEnabled(session == null || session.hasCsd());
        polarity.setText(s.polarity() == PolarityConvention.POSITIVE_UP ? "Positive up ↑" : "Negative up ↑");
        polarity.setSelected(s.polarity() == PolarityConvention.NEGATIVE_UP);
        theme.setText(bench.theme() == Theme.LIGHT ? "Dark theme" : "Light theme");
        theme.setToolTipText("Switch to the " + bench.theme().other().label().toLowerCase() + " theme");
    }
}
