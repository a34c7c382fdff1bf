package org.meridian.maps;

import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;

/**
 * The head drawn around a map, in plane coordinates (y up, the head outline being the unit
 * circle, DESIGN §3): the outline, a nose at the top and an ear on each side.
 */
final class HeadShape {
    /** Half the nose's base angle either side of the front, in radians (about 9°). */
    private static final double NOSE_HALF_ANGLE = 0.16;
    /** Half the ear's height either side of the equator, in plane units. */
    private static final double EAR_HALF_HEIGHT = 0.17;

    private HeadShape() {
    }

    static Shape outline() {
        return new Ellipse2D.Double(-1, -1, 2, 2);
    }

    /** A slightly rounded wedge from the outline to 1 + NOSE_LENGTH at the front. */
    static Shape nose() {
        double tip = 1 + MapLayout.NOSE_LENGTH;
        double sx = Math.sin(NOSE_HALF_ANGLE);
        double cy = Math.cos(NOSE_HALF_ANGLE);
        Path2D.Double p = new Path2D.Double();
        p.moveTo(-sx, cy);
        p.quadTo(-sx * 0.35, 1 + MapLayout.NOSE_LENGTH * 0.55, 0, tip);
        p.quadTo(sx * 0.35, 1 + MapLayout.NOSE_LENGTH * 0.55, sx, cy);
        return p;
    }

    /** An ear on the left (side −1) or right (+1): a half-ellipse leaning on the outline. */
    static Shape ear(int side) {
        double h = EAR_HALF_HEIGHT;
        double x0 = side * Math.sqrt(1 - h * h);
        double out = side * (1 + MapLayout.EAR_DEPTH);
        Path2D.Double p = new Path2D.Double();
        p.moveTo(x0, h);
        p.curveTo(out, h * 1.05, out, -h * 0.75, x0, -h);
        return p;
    }
}
