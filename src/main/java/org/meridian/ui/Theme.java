package org.meridian.ui;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;
import java.awt.Color;
import java.awt.Window;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import javax.swing.UnsupportedLookAndFeelException;

/**
 * The light and dark looks of the window (FlatLaf), and the colours the plots draw with in
 * each. Plot colours are chosen here, never in a panel, so a theme switch is one place.
 *
 * <p>Wave colours follow the colour-universal-design palette of Okabe &amp; Ito (2008), which
 * stays distinguishable under the common colour-vision deficiencies; black is left out since
 * it vanishes in the dark theme.
 */
public enum Theme {
    LIGHT("Light", new Color(0xffffff), new Color(0x222222), new Color(0xdcdcdc),
            new Color(0x8a8a8a), new Color(0xc0392b), new Color(0x2e6fd8, false),
            new int[] {0x0072b2, 0xd55e00, 0x009e73, 0xcc79a7, 0xe69f00, 0x56b4e9, 0x8c6d1f, 0x6a5acd}),
    DARK("Dark", new Color(0x1f2125), new Color(0xe2e2e2), new Color(0x3a3d42),
            new Color(0x8d9097), new Color(0xff6b5b), new Color(0x7aa7ff, false),
            new int[] {0x56b4e9, 0xe69f00, 0x2fd6a0, 0xe69acb, 0xf0e442, 0x9ecbff, 0xd2a766, 0xb3a6ff});

    private final String label;
    private final Color plotBackground;
    private final Color ink;
    private final Color grid;
    private final Color faint;
    private final Color cursor;
    private final Color selection;
    private final int[] waves;

    Theme(String label, Color plotBackground, Color ink, Color grid, Color faint, Color cursor,
            Color selection, int[] waves) {
        this.label = label;
        this.plotBackground = plotBackground;
        this.ink = ink;
        this.grid = grid;
        this.faint = faint;
        this.cursor = cursor;
        this.selection = selection;
        this.waves = waves;
    }

    public String label() {
        return label;
    }

    /** Background of every plot area. */
    public Color plotBackground() {
        return plotBackground;
    }

    /**
     * The ground under scalp maps, map strips and the correlation matrix. The maps package draws
     * outlines, contours and colour-bar labels in near-black ink, as on paper; in the dark theme
     * the maps therefore sit on a light card so that ink stays readable.
     */
    public Color mapCard() {
        return this == LIGHT ? plotBackground : new Color(0xdfe1e5);
    }

    /** Ink on {@link #mapCard()}. */
    public Color mapInk() {
        return this == LIGHT ? ink : new Color(0x26, 0x26, 0x26);
    }

    /** Axis lines, tick labels, titles. */
    public Color ink() {
        return ink;
    }

    /** Grid lines and the zero line's lighter neighbours. */
    public Color grid() {
        return grid;
    }

    /** Secondary lines: the other channels of a butterfly plot, unselected small plots. */
    public Color faint() {
        return faint;
    }

    /** The time cursor, drawn in every time plot and named on the map. */
    public Color cursor() {
        return cursor;
    }

    /** The selected channel's highlight and the window band's edges. */
    public Color selection() {
        return selection;
    }

    /** The window band's fill: the selection colour, mostly transparent. */
    public Color windowFill() {
        return new Color(selection.getRed(), selection.getGreen(), selection.getBlue(), 38);
    }

    /** The colour of the i-th wave (conditions and contrasts in the order they were listed). */
    public Color wave(int i) {
        return new Color(waves[Math.floorMod(i, waves.length)]);
    }

    /** The same colour, translucent, for an interval band. */
    public static Color band(Color c) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), 56);
    }

    /**
     * Text colour on a coloured fill: near-black or white, whichever contrasts more with the fill
     * by the WCAG 2.1 contrast ratio, so labels stay readable on light fills (yellow) and dark
     * ones (blue) in either theme.
     */
    public static Color inkOn(Color fill) {
        Color dark = new Color(0x1a1a1a);
        return contrast(fill, dark) >= contrast(fill, Color.WHITE) ? dark : Color.WHITE;
    }

    /** The contrast ratio (L1 + 0.05) / (L2 + 0.05) of two colours, L1 the lighter (WCAG 2.1). */
    static double contrast(Color a, Color b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    /** Relative luminance of an sRGB colour (WCAG 2.1): 0.2126 R + 0.7152 G + 0.0722 B, linearised. */
    static double luminance(Color c) {
        return 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
    }

    private static double linear(int channel) {
        double v = channel / 255.0;
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }

    public Theme other() {
        return this == LIGHT ? DARK : LIGHT;
    }

    /** Installs this look; call before any window exists or follow with {@link #applyTo}. */
    public void install() {
        try {
            UIManager.setLookAndFeel(this == LIGHT ? new FlatLightLaf() : new FlatDarkLaf());
        } catch (UnsupportedLookAndFeelException e) {
            throw new IllegalStateException("FlatLaf cannot be installed", e);
        }
    }

    /** Installs this look and redraws every open window in it. */
    public void applyTo(Window... windows) {
        install();
        FlatLaf.updateUI();
        for (Window w : windows) {
            SwingUtilities.updateComponentTreeUI(w);
        }
    }

    public static Theme parse(String name) {
        for (Theme t : values()) {
            if (t.name().equalsIgnoreCase(name)) {
                return t;
            }
        }
        return LIGHT;
    }
}
