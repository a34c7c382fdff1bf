package org.meridian.maps;

import java.util.ArrayList;
import java.util.List;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.montage.Projection;

/**
 * Where things sit on a map, in plane units of the projection (DESIGN §3: azimuthal equidistant
 * about Cz, nose up, left on the left, the 10 % ring on the unit circle): the electrodes'
 * projected positions and the coloured region. Shared by every map of one montage and extent.
 * Immutable.
 */
public final class MapLayout {
    /** How far the nose reaches beyond the head outline, in plane units. */
    static final double NOSE_LENGTH = 0.11;
    /** How far the ears reach beyond the head outline. */
    static final double EAR_DEPTH = 0.07;

    private final Montage montage;
    private final List<double[]> positions;
    private final MapRegion region;
    private final MapExtent extent;

    public MapLayout(Montage montage, MapExtent extent) {
        this.montage = montage;
        this.extent = extent;
        List<double[]> p = new ArrayList<>(montage.size());
        for (Electrode e : montage.electrodes()) {
            p.add(Projection.toPlane(e));
        }
        this.positions = p;
        this.region = extent.regionFor(p);
    }

    public Montage montage() {
        return montage;
    }

    public MapExtent extent() {
        return extent;
    }

    public MapRegion region() {
        return region;
    }

    public List<String> labels() {
        return montage.labels();
    }

    /** The projected position {x, y} of electrode {@code i} (a copy). */
    public double[] position(int i) {
        return positions.get(i).clone();
    }

    public int electrodeCount() {
        return positions.size();
    }

    /** The farthest electrode from the centre, in plane units. */
    public double outermostElectrode() {
        double r = 0;
        for (double[] p : positions) {
            r = Math.max(r, Math.hypot(p[0], p[1]));
        }
        return r;
    }

    /**
     * Half the side of the square (about the centre) that holds everything drawn: the region,
     * the head outline with nose and ears, and the electrodes.
     */
    public double viewHalfWidth() {
        double head = 1 + Math.max(NOSE_LENGTH, EAR_DEPTH);
        return Math.max(Math.max(region.halfWidth(), head), outermostElectrode() + 0.04) + 0.02;
    }
}
