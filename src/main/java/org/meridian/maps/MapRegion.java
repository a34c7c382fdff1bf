package org.meridian.maps;

import java.awt.Shape;
import java.awt.geom.Path2D;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * The part of the projected plane (DESIGN §3) that a map colours: a region that is star-shaped
 * about a centre, its rim at radius R(φ) + margin in every direction φ.
 *
 * <ul>
 *   <li>{@link #disk}: R constant — the head outline is the disk of radius 1 about Cz.
 *   <li>{@link #around}: the rim runs through the vertices of the points' convex hull,
 *       interpolated linearly in angle and radius between neighbouring vertices (so electrodes
 *       on one ring give a round rim, not a polygon), and never inside the hull's straight edges,
 *       so every point stays inside. The centre is Cz (the plane's origin) when it lies well
 *       inside the hull, otherwise the hull's centroid.
 * </ul>
 *
 * R is tabulated at {@value #ANGLES} angles. Immutable.
 */
public final class MapRegion {
    static final int ANGLES = 1440;

    private final double cx;
    private final double cy;
    /** R(φ) + margin at φ = 2πk / ANGLES. */
    private final double[] rim;
    private final double margin;
    private final double innermost;
    private final double outermost;

    private MapRegion(double cx, double cy, double[] rim, double margin) {
        if (!(margin >= 0) || !Double.isFinite(margin)) {
            throw new IllegalArgumentException("margin must be 0 or more, got " + margin);
        }
        this.cx = cx;
        this.cy = cy;
        this.rim = rim;
        this.margin = margin;
        double lo = Double.MAX_VALUE;
        double hi = 0;
        for (double r : rim) {
            lo = Math.min(lo, r);
            hi = Math.max(hi, r);
        }
        this.innermost = lo;
        this.outermost = hi;
    }

    /** The disk of this radius about the centre (Cz). */
    public static MapRegion disk(double radius) {
        double[] rim = new double[ANGLES];
        Arrays.fill(rim, radius);
        return new MapRegion(0, 0, rim, 0);
    }

    /** The region around the points (see the class comment), grown by the margin. */
    public static MapRegion around(List<double[]> points, double margin) {
        if (points.isEmpty()) {
            throw new IllegalArgumentException("a region needs at least one point");
        }
        double[][] hull = convexHull(points);
        double[] centre = insideOrigin(hull) ? new double[] {0, 0} : centroid(hull);
        double[] angles = new double[hull.length];
        for (int i = 0; i < hull.length; i++) {
            angles[i] = Math.atan2(hull[i][1] - centre[1], hull[i][0] - centre[0]);
        }
        double[] rim = new double[ANGLES];
        for (int k = 0; k < ANGLES; k++) {
            double phi = 2 * Math.PI * k / ANGLES;
            rim[k] = hullRadius(hull, angles, centre, phi) + margin;
        }
        return new MapRegion(centre[0], centre[1], rim, margin);
    }

    public double margin() {
        return margin;
    }

    /** Whether the plane point lies in the region (on the rim counts). */
    public boolean contains(double x, double y) {
        return contains(x, y, 0);
    }

    /** Whether the plane point lies in the region grown outward by {@code extra}. */
    public boolean contains(double x, double y, double extra) {
        double dx = x - cx;
        double dy = y - cy;
        double r = Math.sqrt(dx * dx + dy * dy);
        if (r <= innermost + extra) {
            return true;
        }
        if (r > outermost + extra) {
            return false;
        }
        return r <= rimAt(Math.atan2(dy, dx)) + extra;
    }

    /** R(φ) + margin: the distance from the centre to the rim in direction φ. */
    double rimAt(double phi) {
        double t = phi / (2 * Math.PI) * ANGLES;
        t = ((t % ANGLES) + ANGLES) % ANGLES;
        int k = (int) t;
        double u = t - k;
        return (1 - u) * rim[k % ANGLES] + u * rim[(k + 1) % ANGLES];
    }

    /** Half the side of the smallest square about the plane's origin that holds the region. */
    public double halfWidth() {
        double h = 0;
        for (int k = 0; k < ANGLES; k++) {
            double phi = 2 * Math.PI * k / ANGLES;
            h = Math.max(h, Math.abs(cx + rim[k] * Math.cos(phi)));
            h = Math.max(h, Math.abs(cy + rim[k] * Math.sin(phi)));
        }
        return h;
    }

    /** The rim in plane coordinates (y up), for clipping. */
    public Shape outline() {
        Path2D.Double p = new Path2D.Double();
        for (int k = 0; k < ANGLES; k++) {
            double phi = 2 * Math.PI * k / ANGLES;
            double x = cx + rim[k] * Math.cos(phi);
            double y = cy + rim[k] * Math.sin(phi);
            if (k == 0) {
                p.moveTo(x, y);
            } else {
                p.lineTo(x, y);
            }
        }
        p.closePath();
        return p;
    }

    /**
     * The hull's radius about {@code c} in direction φ: the larger of the straight edge's
     * distance and the interpolation in angle and radius between the edge's two vertices.
     */
    private static double hullRadius(double[][] hull, double[] angles, double[] c, double phi) {
        int n = hull.length;
        if (n == 1) {
            return Math.hypot(hull[0][0] - c[0], hull[0][1] - c[1]);
        }
        double dx = Math.cos(phi);
        double dy = Math.sin(phi);
        double best = 0;
        for (int i = 0; i < n; i++) {
            double[] a = hull[i];
            double[] b = hull[(i + 1) % n];
            double ax = a[0] - c[0];
            double ay = a[1] - c[1];
            double bx = b[0] - c[0];
            double by = b[1] - c[1];
            double pa = angles[i];
            double sweep = angleBetween(pa, angles[(i + 1) % n]);
            double along = angleBetween(pa, phi);
            if (sweep <= 0 || along < 0 || along > sweep) {
                continue;
            }
            double u = along / sweep;
            double polar = (1 - u) * Math.hypot(ax, ay) + u * Math.hypot(bx, by);
            // the straight edge a→b along the ray: solve a + s(b − a) = t·d
            double ex = bx - ax;
            double ey = by - ay;
            double det = ex * dy - ey * dx;
            double straight = Math.abs(det) < 1e-15 ? polar : (ex * ay - ey * ax) / det;
            best = Math.max(best, Math.max(polar, straight));
        }
        return best;
    }

    /** The counter-clockwise angle from α to β in [0, 2π). */
    private static double angleBetween(double alpha, double beta) {
        double d = beta - alpha;
        while (d < 0) {
            d += 2 * Math.PI;
        }
        while (d >= 2 * Math.PI) {
            d -= 2 * Math.PI;
        }
        return d;
    }

    /** Whether the origin lies inside the hull, at least 0.1 plane units from its edges. */
    private static boolean insideOrigin(double[][] hull) {
        if (hull.length < 3) {
            return false;
        }
        for (int i = 0; i < hull.length; i++) {
            double[] a = hull[i];
            double[] b = hull[(i + 1) % hull.length];
            double ex = b[0] - a[0];
            double ey = b[1] - a[1];
            // signed distance of the origin to the left of edge a→b
            double d = (ex * -a[1] - ey * -a[0]) / Math.hypot(ex, ey);
            if (d < 0.1) {
                return false;
            }
        }
        return true;
    }

    private static double[] centroid(double[][] hull) {
        double x = 0;
        double y = 0;
        for (double[] v : hull) {
            x += v[0];
            y += v[1];
        }
        return new double[] {x / hull.length, y / hull.length};
    }

    /** Andrew's monotone chain, counter-clockwise; collinear points are dropped. */
    static double[][] convexHull(List<double[]> points) {
        double[][] p = points.toArray(new double[0][]);
        Arrays.sort(p, Comparator.<double[]>comparingDouble(a -> a[0]).thenComparingDouble(a -> a[1]));
        if (p.length <= 2) {
            return p.length == 2 && p[0][0] == p[1][0] && p[0][1] == p[1][1] ? new double[][] {p[0]} : p;
        }
        List<double[]> lower = new ArrayList<>();
        for (double[] q : p) {
            while (lower.size() >= 2 && cross(lower.get(lower.size() - 2), lower.get(lower.size() - 1), q) <= 0) {
                lower.remove(lower.size() - 1);
            }
            lower.add(q);
        }
        List<double[]> upper = new ArrayList<>();
        for (int i = p.length - 1; i >= 0; i--) {
            double[] q = p[i];
            while (upper.size() >= 2 && cross(upper.get(upper.size() - 2), upper.get(upper.size() - 1), q) <= 0) {
                upper.remove(upper.size() - 1);
            }
            upper.add(q);
        }
        lower.remove(lower.size() - 1);
        upper.remove(upper.size() - 1);
        lower.addAll(upper);
        return lower.toArray(new double[0][]);
    }

    private static double cross(double[] o, double[] a, double[] b) {
        return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
    }
}
