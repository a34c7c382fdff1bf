package org.meridian.maps;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;

/** Something that draws itself into given bounds of any {@code Graphics2D}, at a preferred aspect. */
public interface Drawing {
    void draw(Graphics2D g, Rectangle2D bounds);

    /** Width divided by height of the drawing's natural shape. */
    double aspectRatio();
}
