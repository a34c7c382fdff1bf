package org.meridian.ui;

import java.awt.FlowLayout;
import java.util.Locale;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import org.meridian.maps.ColourLimits;

/**
 * The toolbar's colour range: a choice of automatic (whole wave), symmetric (this map) or locked,
 * and, for locked, the ± limit in the map's unit. Choosing "Locked" takes the limits on screen
 * as its starting value.
 */
final class ColourRangeControl extends JPanel {
    private final Workbench bench;
    private final JComboBox<ColourRange.Mode> mode = new JComboBox<>(ColourRange.Mode.values());
    private final JTextField limit = new JTextField(5);
    private final java.util.function.Supplier<ColourLimits> shown;
    private boolean updating;

    ColourRangeControl(Workbench bench, java.util.function.Supplier<ColourLimits> shown) {
        super(new FlowLayout(FlowLayout.LEFT, 3, 0));
        this.bench = bench;
        this.shown = shown;
        setOpaque(false);
        mode.setName("toolbar.range");
        mode.setToolTipText("How the map's colour limits are chosen (always symmetric about zero)");
        limit.setName("toolbar.rangeLimit");
        limit.setToolTipText("The locked limit: colours run from −X to +X; press Enter to apply");
        add(new JLabel("Colours"));
        add(mode);
        add(new JLabel("±"));
        add(limit);
        mode.addActionListener(e -> choose());
        limit.addActionListener(e -> applyLimit());
        bench.state().addListener((s, what) -> {
            if (what.contains(ViewState.Aspect.COLOUR_RANGE)) {
                refresh();
            }
        });
        refresh();
    }

    private void choose() {
        if (updating) {
            return;
        }
        ColourRange.Mode m = (ColourRange.Mode) mode.getSelectedItem();
        switch (m) {
            case AUTO -> bench.state().setColourRange(ColourRange.automatic());
            case SYMMETRIC -> bench.state().setColourRange(ColourRange.symmetric());
            case LOCKED -> {
                ColourLimits now = shown.get();
                bench.state().setColourRange(ColourRange.locked(now == null ? 10 : now.upper()));
            }
        }
    }

    private void applyLimit() {
        try {
            double v = Double.parseDouble(limit.getText().trim().replace("±", "").replace(',', '.'));
            if (v > 0 && Double.isFinite(v)) {
                bench.state().setColourRange(ColourRange.locked(v));
                return;
            }
        } catch (NumberFormatException e) {
            // fall through to the message
        }
        bench.message("the colour limit must be a positive number, e.g. 6");
        refresh();
    }

    private void refresh() {
        updating = true;
        try {
            ColourRange r = bench.state().colourRange();
            mode.setSelectedItem(r.mode());
            limit.setEnabled(r.mode() == ColourRange.Mode.LOCKED);
            limit.setText(r.mode() == ColourRange.Mode.LOCKED
                    ? String.format(Locale.ROOT, "%s", trim(r.limit())) : "");
        } finally {
            updating = false;
        }
    }

    private static String trim(double v) {
        String s = String.format(Locale.ROOT, "%.4f", v);
        return s.replaceAll("0+$", "").replaceAll("\\.$", "");
    }
}
