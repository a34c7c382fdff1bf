package org.meridian.ui;

import java.awt.Color;
import java.awt.Component;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.util.function.Supplier;
import javax.swing.Icon;

/** A small rounded square in a wave's colour, beside its name in lists and legends. */
final class Swatch implements Icon {
    private final Supplier<Color> colour;
    private final int size;

    Swatch(Supplier<Color> colour, int size) {
        this.colour = colour;
        this.size = size;
    }

    @Override
    public void paintIcon(Component c, Graphics g, int x, int y) {
        Graphics2D g2 = (Graphics2D) g.create();
        g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g2.setColor(colour.get());
        g2.fillRoundRect(x + 1, y + 1, size - 2, size - 2, 4, 4);
        g2.dispose();
    }

    @Override
    public int getIconWidth() {
        return size;
    }

    @Override
    public int getIconHeight() {
        return size;
    }
}
