package org.meridian.montage;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;

/**
 * Which electrodes of a montage are neighbours, for cluster statistics over channels.
 *
 * <p>Built by Delaunay triangulation (Bowyer–Watson) of the electrodes' azimuthal equidistant
 * projection ({@link Projection}); an edge of the triangulation is kept only when the angle
 * between its two electrodes on the sphere is at most {@value #MAX_EDGE_FACTOR} times the median
 * nearest-neighbour angle of the montage. The cut drops the long, thin triangles along the rim of
 * the montage, which join electrodes that are far apart on the head. Immutable.
 */
public final class Neighbours {
    static final double MAX_EDGE_FACTOR = 2.0;

    private final List<String> labels;
    private final int[][] neighbours;

    private Neighbours(List<String> labels, int[][] neighbours) {
        this.labels = List.copyOf(labels);
        this.neighbours = neighbours;
    }

    public static Neighbours of(Montage montage) {
        List<Electrode> es = montage.electrodes();
        int n = es.size();
        boolean[][] adj = new boolean[n][n];
        if (n >= 3) {
            double[][] pts = new double[n][];
            for (int i = 0; i < n; i++) {
                pts[i] = Projection.toPlane(es.get(i));
            }
            for (int[] t : triangulate(pts)) {
                link(adj, t[0], t[1]);
                link(adj, t[1], t[2]);
                link(adj, t[2], t[0]);
            }
        } else if (n == 2) {
            link(adj, 0, 1);
        }
        double limit = MAX_EDGE_FACTOR * medianNearestAngle(es);
        int[][] out = new int[n][];
        for (int i = 0; i < n; i++) {
            List<Integer> keep = new ArrayList<>();
            for (int j = 0; j < n; j++) {
                if (adj[i][j] && angle(es.get(i), es.get(j)) <= limit) {
                    keep.add(j);
                }
            }
            out[i] = keep.stream().mapToInt(Integer::intValue).toArray();
        }
        return new Neighbours(montage.labels(), out);
    }

    public List<String> labels() {
        return labels;
    }

    /** Indices (into the montage) of the neighbours of electrode {@code i}, ascending. */
    public int[] of(int i) {
        return neighbours[i].clone();
    }

    public boolean adjacent(int i, int j) {
        return Arrays.binarySearch(neighbours[i], j) >= 0;
    }

    private static void link(boolean[][] adj, int a, int b) {
        adj[a][b] = true;
        adj[b][a] = true;
    }

    private static double angle(Electrode a, Electrode b) {
        return Math.acos(a.cosineTo(b));
    }

    private static double medianNearestAngle(List<Electrode> es) {
        if (es.size() < 2) {
            return 0;
        }
        double[] nearest = new double[es.size()];
        for (int i = 0; i < es.size(); i++) {
            double best = Double.MAX_VALUE;
            for (int j = 0; j < es.size(); j++) {
                if (i != j) {
                    best = Math.min(best, angle(es.get(i), es.get(j)));
                }
            }
            nearest[i] = best;
        }
        Arrays.sort(nearest);
        return nearest[nearest.length / 2];
    }

    /** Bowyer–Watson Delaunay triangulation; returns triangles as index triples. */
    static List<int[]> triangulate(double[][] pts) {
        int n = pts.length;
        double minX = Double.MAX_VALUE, minY = Double.MAX_VALUE;
        double maxX = -Double.MAX_VALUE, maxY = -Double.MAX_VALUE;
        for (double[] p : pts) {
            minX = Math.min(minX, p[0]);
            minY = Math.min(minY, p[1]);
            maxX = Math.max(maxX, p[0]);
            maxY = Math.max(maxY, p[1]);
        }
        double span = Math.max(maxX - minX, maxY - minY) + 1;
        double mx = (minX + maxX) / 2;
        double my = (minY + maxY) / 2;
        double[][] all = Arrays.copyOf(pts, n + 3);
        all[n] = new double[] {mx - 20 * span, my - span};
        all[n + 1] = new double[] {mx, my + 20 * span};
        all[n + 2] = new double[] {mx + 20 * span, my - span};
        List<int[]> tris = new ArrayList<>();
        tris.add(new int[] {n, n + 1, n + 2});
        for (int i = 0; i < n; i++) {
            List<int[]> bad = new ArrayList<>();
            for (int[] t : tris) {
                if (inCircumcircle(all, t, all[i])) {
                    bad.add(t);
                }
            }
            List<int[]> boundary = new ArrayList<>();
            for (int[] t : bad) {
                for (int e = 0; e < 3; e++) {
                    int a = t[e];
                    int b = t[(e + 1) % 3];
                    if (!sharedEdge(bad, t, a, b)) {
                        boundary.add(new int[] {a, b});
                    }
                }
            }
            tris.removeAll(bad);
            for (int[] edge : boundary) {
                tris.add(new int[] {edge[0], edge[1], i});
            }
        }
        tris.removeIf(t -> t[0] >= n || t[1] >= n || t[2] >= n);
        return tris;
    }

    private static boolean sharedEdge(List<int[]> bad, int[] self, int a, int b) {
        for (int[] t : bad) {
            if (t == self) {
                continue;
            }
            int hits = 0;
            for (int v : t) {
                if (v == a || v == b) {
                    hits++;
                }
            }
            if (hits == 2) {
                return true;
            }
        }
        return false;
    }

    private static boolean inCircumcircle(double[][] p, int[] t, double[] q) {
        double ax = p[t[0]][0] - q[0], ay = p[t[0]][1] - q[1];
        double bx = p[t[1]][0] - q[0], by = p[t[1]][1] - q[1];
        double cx = p[t[2]][0] - q[0], cy = p[t[2]][1] - q[1];
        double det = (ax * ax + ay * ay) * (bx * cy - cx * by)
                - (bx * bx + by * by) * (ax * cy - cx * ay)
                + (cx * cx + cy * cy) * (ax * by - bx * ay);
        double orient = (p[t[1]][0] - p[t[0]][0]) * (p[t[2]][1] - p[t[0]][1])
                - (p[t[1]][1] - p[t[0]][1]) * (p[t[2]][0] - p[t[0]][0]);
        return orient > 0 ? det > 1e-12 : det < -1e-12;
    }
}
