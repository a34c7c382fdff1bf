package org.meridian.maps;

import java.awt.geom.Path2D;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Contour lines of a map by marching squares (the two-dimensional case of Lorensen &amp; Cline,
 * 1987, "Marching cubes"): every grid cell whose four corners straddle a level contributes a
 * segment between the points where the level crosses its edges, found by linear interpolation
 * along the edge; a saddle cell (opposite corners on the same side) is resolved by the mean of
 * its four corners. Segments that share an edge crossing are joined into polylines, so a line
 * can be drawn dashed and stays one path in vector output. Cells with a corner outside the map
 * (NaN) are skipped.
 */
public final class Contours {
    private Contours() {
    }

    /** One contour: its level, its path in plane coordinates (y up), and whether it is zero. */
    public record Line(double level, Path2D path) {
        public boolean zero() {
            return level == 0;
        }
    }

    /** Lines at every multiple of {@code step} strictly inside the map's value range. */
    public static List<Line> atSteps(ScalpMap map, double step) {
        return atSteps(map, step, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
    }

    /**
     * The contours at multiples of {@code step} that lie within [lower, upper] (the colour
     * limits): where the colours saturate beyond a fixed limit, lines would only crowd the
     * saturated area without telling values apart on the colour bar.
     */
    public static List<Line> atSteps(ScalpMap map, double step, double lower, double upper) {
        List<Line> out = new ArrayList<>();
        if (Float.isInfinite(map.minimum()) || !(step > 0)) {
            return out;
        }
        long k0 = (long) Math.floor(Math.max(map.minimum(), lower - step) / step) + 1;
        long k1 = (long) Math.ceil(Math.min(map.maximum(), upper + step) / step) - 1;
        for (long k = k0; k <= k1; k++) {
            double level = k * step;
            Path2D path = trace(map, level);
            if (path != null) {
                out.add(new Line(level == 0 ? 0 : level, path));
            }
        }
        return out;
    }

    /** The contour at one level as one path of polylines, or null when it does not occur. */
    public static Path2D trace(ScalpMap map, double level) {
        MapGrid grid = map.grid();
        int n = grid.size();
        List<long[]> segments = new ArrayList<>();
        Map<Long, double[]> points = new HashMap<>();
        for (int row = 0; row + 1 < n; row++) {
            for (int col = 0; col + 1 < n; col++) {
                double tl = map.value(col, row);
                double tr = map.value(col + 1, row);
                double br = map.value(col + 1, row + 1);
                double bl = map.value(col, row + 1);
                if (Double.isNaN(tl) || Double.isNaN(tr) || Double.isNaN(br) || Double.isNaN(bl)) {
                    continue;
                }
                int mask = (tl >= level ? 8 : 0) | (tr >= level ? 4 : 0) | (br >= level ? 2 : 0) | (bl >= level ? 1 : 0);
                if (mask == 0 || mask == 15) {
                    continue;
                }
                long top = edge(n, col, row, true);
                long bottom = edge(n, col, row + 1, true);
                long left = edge(n, col, row, false);
                long right = edge(n, col + 1, row, false);
                points.putIfAbsent(top, crossing(grid, col, row, col + 1, row, tl, tr, level));
                points.putIfAbsent(bottom, crossing(grid, col, row + 1, col + 1, row + 1, bl, br, level));
                points.putIfAbsent(left, crossing(grid, col, row, col, row + 1, tl, bl, level));
                points.putIfAbsent(right, crossing(grid, col + 1, row, col + 1, row + 1, tr, br, level));
                boolean centreAbove = (tl + tr + br + bl) / 4 >= level;
                switch (mask) {
                    case 1, 14 -> segments.add(new long[] {left, bottom});
                    case 2, 13 -> segments.add(new long[] {bottom, right});
                    case 3, 12 -> segments.add(new long[] {left, right});
                    case 4, 11 -> segments.add(new long[] {top, right});
                    case 6, 9 -> segments.add(new long[] {top, bottom});
                    case 7, 8 -> segments.add(new long[] {left, top});
                    case 5 -> {
                        // tr and bl above: joined through the centre when it is above too
                        if (centreAbove) {
                            segments.add(new long[] {left, top});
                            segments.add(new long[] {bottom, right});
                        } else {
                            segments.add(new long[] {top, right});
                            segments.add(new long[] {left, bottom});
                        }
                    }
                    case 10 -> {
                        // tl and br above
                        if (centreAbove) {
                            segments.add(new long[] {top, right});
                            segments.add(new long[] {left, bottom});
                        } else {
                            segments.add(new long[] {left, top});
                            segments.add(new long[] {bottom, right});
                        }
                    }
                    default -> throw new AssertionError(mask);
                }
            }
        }
        if (segments.isEmpty()) {
            return null;
        }
        return join(segments, points);
    }

    /** The id of the horizontal edge right of (col, row) or the vertical edge below it. */
    private static long edge(int n, int col, int row, boolean horizontal) {
        return 2L * ((long) row * n + col) + (horizontal ? 0 : 1);
    }

    private static double[] crossing(MapGrid grid, int c0, int r0, int c1, int r1, double v0, double v1, double level) {
        double u = v1 == v0 ? 0.5 : (level - v0) / (v1 - v0);
        u = Math.max(0, Math.min(1, u));
        double x = grid.x(c0) + u * (grid.x(c1) - grid.x(c0));
        double y = grid.y(r0) + u * (grid.y(r1) - grid.y(r0));
        return new double[] {x, y};
    }

    /** Chains segments that meet at an edge crossing into polylines. */
    private static Path2D join(List<long[]> segments, Map<Long, double[]> points) {
        Map<Long, List<Integer>> byEdge = new HashMap<>();
        for (int i = 0; i < segments.size(); i++) {
            for (long e : segments.get(i)) {
                byEdge.computeIfAbsent(e, k -> new ArrayList<>(2)).add(i);
            }
        }
        boolean[] used = new boolean[segments.size()];
        Path2D.Double path = new Path2D.Double();
        // open chains first (they start at an edge crossing used once), then closed loops
        for (int pass = 0; pass < 2; pass++) {
            for (int start = 0; start < segments.size(); start++) {
                if (used[start]) {
                    continue;
                }
                long[] s = segments.get(start);
                long from;
                if (pass == 0) {
                    if (byEdge.get(s[0]).size() == 1) {
                        from = s[0];
                    } else if (byEdge.get(s[1]).size() == 1) {
                        from = s[1];
                    } else {
                        continue;
                    }
                } else {
                    from = s[0];
                }
                double[] p = points.get(from);
                path.moveTo(p[0], p[1]);
                int current = start;
                long at = from;
                while (current >= 0) {
                    used[current] = true;
                    long[] seg = segments.get(current);
                    long to = seg[0] == at ? seg[1] : seg[0];
                    double[] q = points.get(to);
                    path.lineTo(q[0], q[1]);
                    at = to;
                    current = -1;
                    for (int next : byEdge.get(to)) {
                        if (!used[next]) {
                            current = next;
                            break;
                        }
                    }
                }
            }
        }
        return path;
    }
}
