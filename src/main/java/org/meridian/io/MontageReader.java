package org.meridian.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.SamePositionException;
import org.meridian.montage.SphereFit;

/**
 * Reads a montage file (DESIGN §4), the form told by the header's column names:
 * <ul>
 * <li>{@code label x y z}: measured positions in the head frame (+x right ear, +y nose, +z up)
 * in any length unit. They are fitted to a sphere, centred and normalised
 * ({@link SphereFit#montageFromMeasured}).</li>
 * <li>{@code label theta phi} in degrees: theta from +z (Cz), phi in the x–y plane from +x
 * toward +y, i.e. the direction (sin θ cos φ, sin θ sin φ, cos θ) on the unit sphere.</li>
 * <li>the electrodes table of the Brain Imaging Data Structure: {@code name x y z} and any
 * further columns, read as the first form; an electrode whose coordinates are {@code n/a} has
 * no position and is left out.</li>
 * </ul>
 * Columns may come in any order; other columns are ignored.
 */
public final class MontageReader {
    private MontageReader() {
    }

    /** Whether a header names a montage file: a label column and coordinate columns. */
    static boolean isMontageHeader(Preamble pre) {
        return labelColumn(pre) >= 0
                && ((pre.indexOf("x") >= 0 && pre.indexOf("y") >= 0 && pre.indexOf("z") >= 0)
                || (pre.indexOf("theta") >= 0 && pre.indexOf("phi") >= 0));
    }

    /** The column named {@code label} or, as in the imaging community's table, {@code name}. */
    private static int labelColumn(Preamble pre) {
        int i = pre.indexOf("label");
        return i >= 0 ? i : pre.indexOf("name");
    }

    public static Montage read(Path file) {
        String name = file.toString();
        try (LineScanner sc = new LineScanner(name, TextInput.open(file), () -> false)) {
            Preamble pre = Preamble.read(sc);
            int il = labelColumn(pre);
            if (il < 0) {
                throw sc.error(0, "a montage file needs a label (or name) column; this header has "
                        + String.join(", ", pre.columns()));
            }
            int ix = pre.indexOf("x");
            int iy = pre.indexOf("y");
            int iz = pre.indexOf("z");
            if (ix >= 0 && iy >= 0 && iz >= 0) {
                return measured(sc, pre, il, new int[] {ix, iy, iz}, name);
            }
            int it = pre.indexOf("theta");
            int ip = pre.indexOf("phi");
            if (it >= 0 && ip >= 0) {
                return spherical(sc, pre, il, it, ip, name);
            }
            throw sc.error(0, "a montage file needs the columns x, y and z, or theta and phi;"
                    + " this header has " + String.join(", ", pre.columns()));
        }
    }

    private static Montage measured(LineScanner sc, Preamble pre, int il, int[] xyz,
            String name) {
        List<String> labels = new ArrayList<>();
        List<double[]> points = new ArrayList<>();
        Map<String, Integer> labelLines = new HashMap<>();
        Map<List<Double>, Integer> pointLines = new HashMap<>();
        Map<Integer, String> labelOnLine = new HashMap<>();
        int width = pre.columns().size();
        while (sc.next()) {
            if (!row(sc, width)) {
                continue;
            }
            String label = label(sc, il, labelLines);
            if (isMissing(sc, xyz[0]) || isMissing(sc, xyz[1]) || isMissing(sc, xyz[2])) {
                continue;
            }
            double[] p = {sc.number(xyz[0]), sc.number(xyz[1]), sc.number(xyz[2])};
            Integer same = pointLines.put(List.of(p[0] + 0.0, p[1] + 0.0, p[2] + 0.0),
                    sc.line());
            if (same != null) {
                throw sc.error(0, "electrode " + label + " is at the same position as "
                        + labelOnLine.get(same) + " (line " + same + ")");
            }
            labelOnLine.put(sc.line(), label);
            labels.add(label);
            points.add(p);
        }
        if (labels.isEmpty()) {
            throw new ReadException(name, pre.headerLine(), 0, "a header but no electrodes");
        }
        try {
            return SphereFit.montageFromMeasured(labels, points.toArray(new double[0][]), name);
        } catch (SamePositionException e) {
            throw samePosition(name, e, labelLines);
        }
    }

    private static Montage spherical(LineScanner sc, Preamble pre, int il, int it, int ip,
            String name) {
        List<Electrode> electrodes = new ArrayList<>();
        Map<String, Integer> labelLines = new HashMap<>();
        int width = pre.columns().size();
        while (sc.next()) {
            if (!row(sc, width)) {
                continue;
            }
            String label = label(sc, il, labelLines);
            double theta = Math.toRadians(sc.number(it));
            double phi = Math.toRadians(sc.number(ip));
            electrodes.add(new Electrode(label, Math.sin(theta) * Math.cos(phi),
                    Math.sin(theta) * Math.sin(phi), Math.cos(theta)));
        }
        if (electrodes.isEmpty()) {
            throw new ReadException(name, pre.headerLine(), 0, "a header but no electrodes");
        }
        try {
            return new Montage(electrodes, name);
        } catch (SamePositionException e) {
            throw samePosition(name, e, labelLines);
        }
    }

    /**
     * Two electrodes whose directions coincide (after the sphere fit, for measured positions),
     * named with their lines.
     */
    private static ReadException samePosition(String name, SamePositionException e,
            Map<String, Integer> labelLines) {
        return new ReadException(name, labelLines.get(Montage.key(e.second())), 0, "electrode "
                + e.second() + " is at the same position as " + e.first() + " (line "
                + labelLines.get(Montage.key(e.first())) + ")");
    }

    /** Whether the current line is a data row of the right width; false for a blank line. */
    private static boolean row(LineScanner sc, int width) {
        if (sc.cellCount() == 1 && sc.isBlank()) {
            return false;
        }
        if (sc.cellCount() != width) {
            throw WaveformReader.ragged(sc, width);
        }
        return true;
    }

    private static String label(LineScanner sc, int cell, Map<String, Integer> labelLines) {
        String label = sc.text(cell);
        if (label.isEmpty()) {
            throw sc.error(cell + 1, "empty electrode label");
        }
        Integer previous = labelLines.put(Montage.key(label), sc.line());
        if (previous != null) {
            throw sc.error(cell + 1, "electrode " + label + " appears twice (also on line " + previous + ")");
        }
        return label;
    }

    /** The imaging community's tables write {@code n/a} for an unknown coordinate. */
    private static boolean isMissing(LineScanner sc, int cell) {
        return sc.text(cell).equalsIgnoreCase("n/a");
    }
}
