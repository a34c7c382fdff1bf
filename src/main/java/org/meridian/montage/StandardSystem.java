package org.meridian.montage;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;

/**
 * The standard electrode systems, their positions computed from the geometry, not typed in.
 *
 * <p>Head frame: +x right ear, +y nose, +z up; positions on the unit sphere. The 10 % ring
 * (Fpz, T7, Oz, T8) is the equator, Cz the pole. One 10-10 step is 22.5° along the midline and
 * the coronal line, and 18° of azimuth along the equator (Fp1 18°, AF7 36°, F7 54°, FT7 72°, T7
 * 90°, … O1 162°). Every other row runs along the circle through its left ring point, its
 * midline point and its right ring point, divided into equal arcs between ring point and midline
 * point. Positions below the equator (column 9/10, and the Nz/Iz rows) lie 22.5° below it, at the
 * azimuths of the ring points above them. The 10-5 system halves every step: rows between rows,
 * columns between columns (an {@code h} suffix marks the column halfway toward the midline),
 * named as in Oostenveld &amp; Praamstra (2001); names follow the American Clinical
 * Neurophysiology Society guideline (2006), so T7/T8/P7/P8 rather than T3/T4/T5/T6.
 */
public enum StandardSystem {
    /** Jasper's 21 positions of the 10-20 system (Fpz and Oz included). */
    TEN_TWENTY("10-20"),
    /** Every 10-10 position above the equator, plus Nz, Iz and the 9/10 columns below it. */
    TEN_TEN("10-10"),
    /** Every 10-5 position: the 10-10 grid halved in both directions (345 positions). */
    TEN_FIVE("10-5");

    private final String displayName;

    StandardSystem(String displayName) {
        this.displayName = displayName;
    }

    public String displayName() {
        return displayName;
    }

    /** Parses {@code 10-20}, {@code 10-10} or {@code 10-5}; null for anything else. */
    public static StandardSystem parse(String s) {
        for (StandardSystem sys : values()) {
            if (sys.displayName.equalsIgnoreCase(s.trim())) {
                return sys;
            }
        }
        return null;
    }

    /** The positions of this system, front to back, left to right. */
    public Montage montage() {
        List<Electrode> out = new ArrayList<>();
        for (Electrode e : ALL_10_5.values()) {
            if (belongs(e.label())) {
                out.add(e);
            }
        }
        return new Montage(out, "standard " + displayName);
    }

    private boolean belongs(String label) {
        return switch (this) {
            case TEN_FIVE -> true;
            case TEN_TEN -> TEN_TEN_LABELS.contains(label);
            case TEN_TWENTY -> TEN_TWENTY_LABELS.contains(label);
        };
    }

    /** Looks a label up among the 10-5 positions, ignoring case; null when it is not there. */
    static Electrode find10_5(String label) {
        return ALL_10_5.get(label.trim().toLowerCase(Locale.ROOT));
    }

    /**
     * The point the geometry computed for a 10-5 label (lower case), before it became an
     * {@link Electrode} (whose constructor normalises): lets tests check that the construction
     * itself lands on the unit sphere. Null when the label is not there.
     */
    static double[] rawPoint(String label) {
        double[] p = RAW.get(label.trim().toLowerCase(Locale.ROOT));
        return p == null ? null : p.clone();
    }

    /** All 10-5 labels in their canonical spelling. */
    static List<String> labels10_5() {
        List<String> out = new ArrayList<>();
        for (Electrode e : ALL_10_5.values()) {
            out.add(e.label());
        }
        return out;
    }

    private static final List<String> TEN_TWENTY_LABELS = List.of("Fp1", "Fpz", "Fp2", "F7",
            "F3", "Fz", "F4", "F8", "T7", "C3", "Cz", "C4", "T8", "P7", "P3", "Pz", "P4", "P8",
            "O1", "Oz", "O2");

    private static final List<String> TEN_TEN_LABELS = new ArrayList<>();

    /** Keyed by lower-case label, in output order. */
    private static final Map<String, Electrode> ALL_10_5 = new LinkedHashMap<>();
    /** The computed points behind {@link #ALL_10_5}, keyed alike. */
    private static final Map<String, double[]> RAW = new LinkedHashMap<>();

    /** Row prefixes of the 10-5 grid from Fp (row 0) to O (row 16). */
    private static final String[] ROWS = {"Fp", "AFp", "AF", "AFF", "F", "FFC", "FC", "FCC", "C",
        "CCP", "CP", "CPP", "P", "PPO", "PO", "POO", "O"};
    /** The prefix used for columns 7 and 9 (and their h) in the temporal rows. */
    private static final Map<String, String> TEMPORAL = Map.of("FFC", "FFT", "FC", "FT", "FCC",
            "FTT", "C", "T", "CCP", "TTP", "CP", "TP", "CPP", "TPP");
    /** Left columns from the ring point to the midline, one 10-5 step apart. */
    private static final String[] LEFT_COLUMNS = {"7", "7h", "5", "5h", "3", "3h", "1", "1h"};
    private static final String[] RIGHT_COLUMNS = {"8", "8h", "6", "6h", "4", "4h", "2", "2h"};
    private static final double LOWER_RING_DEG = -22.5;

    static {
        build();
    }

    private static void build() {
        // rows below the front of the equator: N (lower ring) and NFp (halfway)
        addLatitudeRow("N", LOWER_RING_DEG, 0);
        addLatitudeRow("NFp", LOWER_RING_DEG / 2, 0);
        addLatitudeRow("Fp", 0, 0);
        for (int r = 1; r < ROWS.length - 1; r++) {
            addGridRow(r);
        }
        addLatitudeRow("O", 0, 16);
        addLatitudeRow("OI", LOWER_RING_DEG / 2, 16);
        addLatitudeRow("I", LOWER_RING_DEG, 16);
        for (Electrode e : ALL_10_5.values()) {
            if (isTenTen(e.label())) {
                TEN_TEN_LABELS.add(e.label());
            }
        }
    }

    /** A row that runs along a circle of latitude: columns 1, 1h and z (the Fp and O ends). */
    private static void addLatitudeRow(String prefix, double elevationDeg, int row) {
        double ring = ringAzimuthDeg(row);
        double step = row == 0 ? ring / 2 : (180 - ring) / 2;
        double towardMidline = row == 0 ? -step : step;
        put(prefix + "1", latitudePoint(-1, ring, elevationDeg));
        put(prefix + "1h", latitudePoint(-1, ring + towardMidline, elevationDeg));
        put(prefix + "z", latitudePoint(0, row == 0 ? 0 : 180, elevationDeg));
        put(prefix + "2h", latitudePoint(1, ring + towardMidline, elevationDeg));
        put(prefix + "2", latitudePoint(1, ring, elevationDeg));
    }

    /** A row of the grid between Fp and O: columns 9 … 1h, z, 2h … 10. */
    private static void addGridRow(int r) {
        String prefix = ROWS[r];
        String outer = TEMPORAL.getOrDefault(prefix, prefix);
        double az = ringAzimuthDeg(r);
        double[] left = latitudePoint(-1, az, 0);
        double[] right = latitudePoint(1, az, 0);
        double[] mid = midlinePoint(90 - 11.25 * r);
        double[][] leftArc = arcSteps(left, mid, right, LEFT_COLUMNS.length);
        double[][] rightArc = arcSteps(right, mid, left, RIGHT_COLUMNS.length);

        put(outer + "9", latitudePoint(-1, az, LOWER_RING_DEG));
        put(outer + "9h", latitudePoint(-1, az, LOWER_RING_DEG / 2));
        for (int k = 0; k < LEFT_COLUMNS.length; k++) {
            put((k < 2 ? outer : prefix) + LEFT_COLUMNS[k], leftArc[k]);
        }
        put(prefix + "z", mid);
        for (int k = RIGHT_COLUMNS.length - 1; k >= 0; k--) {
            put((k < 2 ? outer : prefix) + RIGHT_COLUMNS[k], rightArc[k]);
        }
        put(outer + "10h", latitudePoint(1, az, LOWER_RING_DEG / 2));
        put(outer + "10", latitudePoint(1, az, LOWER_RING_DEG));
    }

    /** Azimuth of row r's ring point from Fpz, in degrees: 18° (Fp) + 9° per 10-5 row. */
    private static double ringAzimuthDeg(int row) {
        return 18 + 9 * row;
    }

    /**
     * A point at an azimuth from Fpz (degrees, toward the given side: -1 left, +1 right, 0
     * midline) and an elevation above the equator.
     */
    private static double[] latitudePoint(int side, double azimuthDeg, double elevationDeg) {
        double a = StrictMath.toRadians(azimuthDeg);
        double e = StrictMath.toRadians(elevationDeg);
        double x = side * Math.abs(StrictMath.sin(a)) * StrictMath.cos(e);
        return new double[] {x, StrictMath.cos(a) * StrictMath.cos(e), StrictMath.sin(e)};
    }

    /** A midline point at an angle from Cz, positive toward the nose. */
    private static double[] midlinePoint(double fromCzDeg) {
        double t = StrictMath.toRadians(fromCzDeg);
        return new double[] {0, StrictMath.sin(t), StrictMath.cos(t)};
    }

    /**
     * Points at {@code steps} equal arcs from {@code from} toward {@code mid} on the circle through
     * {@code from}, {@code mid} and {@code other}; element 0 is {@code from} itself, and the last
     * step reaches {@code mid} (not included).
     */
    private static double[][] arcSteps(double[] from, double[] mid, double[] other, int steps) {
        double[] centre = circumcentre(from, mid, other);
        double[] u = sub(from, centre);
        double[] v = sub(mid, centre);
        double radius = norm(u);
        double[] e1 = scale(u, 1 / radius);
        // e2: in the plane, perpendicular to e1, on the side of mid
        double[] w = sub(v, scale(e1, dot(v, e1)));
        double[] e2 = scale(w, 1 / norm(w));
        double angle = StrictMath.atan2(dot(v, e2), dot(v, e1));
        double[][] out = new double[steps][];
        for (int k = 0; k < steps; k++) {
            double t = angle * k / steps;
            out[k] = add(centre, add(scale(e1, radius * StrictMath.cos(t)), scale(e2, radius * StrictMath.sin(t))));
        }
        return out;
    }

    /** The centre of the circle through three points in space. */
    private static double[] circumcentre(double[] a, double[] b, double[] c) {
        double[] ab = sub(b, a);
        double[] ac = sub(c, a);
        double[] n = cross(ab, ac);
        double n2 = dot(n, n);
        double[] t1 = scale(cross(n, ab), dot(ac, ac));
        double[] t2 = scale(cross(ac, n), dot(ab, ab));
        return add(a, scale(add(t1, t2), 1 / (2 * n2)));
    }

    private static void put(String label, double[] p) {
        RAW.put(label.toLowerCase(Locale.ROOT), p.clone());
        ALL_10_5.put(label.toLowerCase(Locale.ROOT), new Electrode(label, p[0], p[1], p[2]));
    }

    /**
     * Whether a 10-5 label belongs to the 10-10 system: no {@code h} column, a 10-10 row, and
     * columns 1–10 or z; below the equator only Nz, Iz and the 9/10 columns of rows AF to PO.
     */
    private static boolean isTenTen(String label) {
        if (label.endsWith("h")) {
            return false;
        }
        if (label.equals("Nz") || label.equals("Iz")) {
            return true;
        }
        String prefix = label.replaceAll("(\\d+|z)$", "");
        return switch (prefix) {
            case "Fp", "O", "AF", "F", "FT", "FC", "T", "C", "TP", "CP", "P", "PO" -> true;
            default -> false;
        };
    }

    private static double[] sub(double[] a, double[] b) {
        return new double[] {a[0] - b[0], a[1] - b[1], a[2] - b[2]};
    }

    private static double[] add(double[] a, double[] b) {
        return new double[] {a[0] + b[0], a[1] + b[1], a[2] + b[2]};
    }

    private static double[] scale(double[] a, double s) {
        return new double[] {a[0] * s, a[1] * s, a[2] * s};
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    private static double norm(double[] a) {
        return StrictMath.sqrt(dot(a, a));
    }

    private static double[] cross(double[] a, double[] b) {
        return new double[] {a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2],
            a[0] * b[1] - a[1] * b[0]};
    }
}
