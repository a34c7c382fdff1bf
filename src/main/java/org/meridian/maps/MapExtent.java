package org.meridian.maps;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.meridian.core.BadInputException;

/**
 * How far a map's colour reaches on the projected head (DESIGN §3 projection):
 *
 * <ul>
 *   <li>{@link #head()}: up to the head outline, the unit circle (the 10 % ring, 90° from Cz);
 *   <li>{@link #electrodes()} (the default): up to a rim through the outermost projected
 *       electrodes (see {@link MapRegion#around}) plus a margin, so the colour never reaches far
 *       beyond them, where the spline only extrapolates. The automatic margin is a quarter of the median
 *       distance between neighbouring electrodes in the plane, kept between 0.02 and 0.06
 *       (1.8°–5.4° of arc); a margin may also be given, in plane units (1 = 90° of arc).
 * </ul>
 */
public record MapExtent(boolean toHeadOutline, double margin) {
    static final double MIN_AUTO_MARGIN = 0.02;
    static final double MAX_AUTO_MARGIN = 0.06;

    public MapExtent {
        if (!Double.isNaN(margin) && (!(margin >= 0) || margin > 1)) {
            throw new BadInputException("the map margin must be from 0 to 1 (plane units, 1 = 90°), got " + margin);
        }
    }

    public static MapExtent head() {
        return new MapExtent(true, 0);
    }

    /** The electrodes' hull with the automatic margin. */
    public static MapExtent electrodes() {
        return new MapExtent(false, Double.NaN);
    }

    public static MapExtent electrodes(double margin) {
        return new MapExtent(false, margin);
    }

    /** Reads {@code head}, {@code electrodes} or {@code electrodes:MARGIN}. */
    public static MapExtent parse(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        if (t.equals("head")) {
            return head();
        }
        if (t.equals("electrodes")) {
            return electrodes();
        }
        if (t.startsWith("electrodes:")) {
            try {
                return electrodes(Double.parseDouble(t.substring("electrodes:".length())));
            } catch (NumberFormatException e) {
                // fall through to the error below
            }
        }
        throw new BadInputException("map extent \"" + text + "\" is not head, electrodes or electrodes:MARGIN");
    }

    /** The region for electrodes at these projected positions. */
    public MapRegion regionFor(List<double[]> planePositions) {
        if (toHeadOutline) {
            return MapRegion.disk(1);
        }
        double m = Double.isNaN(margin) ? automaticMargin(planePositions) : margin;
        return MapRegion.around(planePositions, m);
    }

    static double automaticMargin(List<double[]> positions) {
        if (positions.size() < 2) {
            return MAX_AUTO_MARGIN;
        }
        double[] nearest = new double[positions.size()];
        for (int i = 0; i < nearest.length; i++) {
            double best = Double.MAX_VALUE;
            for (int j = 0; j < nearest.length; j++) {
                if (i != j) {
                    double[] a = positions.get(i);
                    double[] b = positions.get(j);
                    best = Math.min(best, Math.hypot(a[0] - b[0], a[1] - b[1]));
                }
            }
            nearest[i] = best;
        }
        Arrays.sort(nearest);
        double median = nearest[nearest.length / 2];
        return Math.max(MIN_AUTO_MARGIN, Math.min(MAX_AUTO_MARGIN, median / 4));
    }

    /** For messages: {@code head} or {@code electrodes} (with the margin when given). */
    public String describe() {
        if (toHeadOutline) {
            return "head";
        }
        return Double.isNaN(margin) ? "electrodes" : "electrodes:" + margin;
    }
}
