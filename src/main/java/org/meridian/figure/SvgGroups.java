package org.meridian.figure;

import java.awt.Graphics2D;
import java.util.LinkedHashMap;
import java.util.Map;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGHints;

/**
 * Opens and closes named groups ({@code <g id=… class=…>}) in SVG output, so that a figure's
 * panels and maps can be found, counted and edited in the file; on any other {@code Graphics2D}
 * it does nothing.
 */
final class SvgGroups {
    private SvgGroups() {
    }

    static void begin(Graphics2D g, String id, String cssClass) {
        if (g instanceof SVGGraphics2D) {
            Map<String, String> attributes = new LinkedHashMap<>();
            attributes.put("id", id);
            attributes.put("class", cssClass);
            g.setRenderingHint(SVGHints.KEY_BEGIN_GROUP, attributes);
        }
    }

    static void end(Graphics2D g) {
        if (g instanceof SVGGraphics2D) {
            g.setRenderingHint(SVGHints.KEY_END_GROUP, "true");
        }
    }
}
