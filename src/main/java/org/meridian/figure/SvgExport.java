package org.meridian.figure;

import java.awt.Color;
import java.awt.geom.Rectangle2D;
import java.nio.file.Path;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGUnits;
import org.jfree.svg.ViewBox;
import org.meridian.io.AtomicFiles;
import org.meridian.maps.Drawing;

/**
 * SVG through JFreeSVG. The root element's width and height are in millimetres and its view box
 * in points, so the drawing code works in points and the file opens at its physical size. Text
 * stays text (font family {@link FigureFonts#svgFamily}). The output depends only on what is
 * drawn: the element-id prefix is fixed (JFreeSVG's default is time-based) and numbers are
 * printed with a fixed number of decimals in the root locale, so one figure always gives the
 * same bytes.
 */
public final class SvgExport {
    private static final String ID_PREFIX = "meridian";

    private SvgExport() {
    }

    /** The SVG document of a drawing at a physical size. */
    public static String document(Drawing drawing, double widthMm, double heightMm) {
        double w = widthMm * ExportFormat.PT_PER_MM;
        double h = heightMm * ExportFormat.PT_PER_MM;
        SVGGraphics2D g = new SVGGraphics2D(widthMm, heightMm, SVGUnits.MM);
        g.setDefsKeyPrefix(ID_PREFIX);
        g.setGeomDoubleConverter(v -> decimals(v, 3));
        g.setTransformDoubleConverter(v -> decimals(v, 5));
        g.setFontFunction(FigureFonts::svgFamily);
        // zero-width strokes would be invisible in print; JFreeSVG's stand-in is a hairline
        g.setZeroStrokeWidth(0.25);
        g.setColor(Color.WHITE);
        g.fill(new Rectangle2D.Double(0, 0, w, h));
        drawing.draw(g, new Rectangle2D.Double(0, 0, w, h));
        String element = g.getSVGElement(null, true, new ViewBox(0, 0, w, h),
                null, null);
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + element + "\n";
    }

    static void write(Drawing drawing, Path file, double widthMm, double heightMm) {
        AtomicFiles.writeString(file, document(drawing, widthMm, heightMm));
    }

    /**
     * A number rounded to a fixed number of decimals, trailing zeros dropped, never "-0": plain
     * arithmetic rather than a formatter, as a figure prints tens of thousands of coordinates.
     */
    static String decimals(double v, int places) {
        if (!Double.isFinite(v)) {
            return "0";
        }
        long scale = 1;
        for (int i = 0; i < places; i++) {
            scale *= 10;
        }
        long r = Math.round(Math.abs(v) * scale);
        if (r == 0) {
            return "0";
        }
        StringBuilder out = new StringBuilder(16);
        if (v < 0) {
            out.append('-');
        }
        out.append(r / scale);
        long fraction = r % scale;
        if (fraction != 0) {
            String digits = Long.toString(fraction + scale).substring(1);
            int end = digits.length();
            while (digits.charAt(end - 1) == '0') {
                end--;
            }
            out.append('.').append(digits, 0, end);
        }
        return out.toString();
    }
}
