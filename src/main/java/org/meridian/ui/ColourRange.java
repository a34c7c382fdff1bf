package org.meridian.ui;

import org.meridian.maps.ColourLimits;

/**
 * How the colour limits of the scalp map and the map strip are chosen. Every mode is symmetric
 * about zero, so zero always takes the middle colour of the diverging scale.
 *
 * <ul>
 * <li>{@link Mode#AUTO}: ± the largest absolute value the map wave reaches at the electrodes over
 *     the whole time axis (rounded up to a round number): colours stay comparable while scrubbing;
 * <li>{@link Mode#SYMMETRIC}: ± the largest absolute value of the map on screen, so each map
 *     uses the full scale (for the shape of weak maps);
 * <li>{@link Mode#LOCKED}: ± a value the researcher sets ({@link #limit}, in the map's unit).
 * </ul>
 *
 * @param mode  the mode
 * @param limit the locked half-range (positive); ignored by the other modes
 */
public record ColourRange(Mode mode, double limit) {
    public enum Mode {
        AUTO("Auto (whole wave)"),
        SYMMETRIC("Symmetric (this map)"),
        LOCKED("Locked");

        private final String label;

        Mode(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }

        @Override
        public String toString() {
            return label;
        }
    }

    public ColourRange {
        if (mode == null) {
            throw new IllegalArgumentException("a colour range needs a mode");
        }
        if (mode == Mode.LOCKED && !(limit > 0 && Double.isFinite(limit))) {
            throw new IllegalArgumentException("a locked colour range needs a positive limit, got " + limit);
        }
        if (mode != Mode.LOCKED) {
            limit = Double.NaN;
        }
    }

    public static ColourRange automatic() {
        return new ColourRange(Mode.AUTO, Double.NaN);
    }

    public static ColourRange symmetric() {
        return new ColourRange(Mode.SYMMETRIC, Double.NaN);
    }

    public static ColourRange locked(double halfRange) {
        return new ColourRange(Mode.LOCKED, halfRange);
    }

    /**
     * The colour limits of a map in this range: automatic limits (rounded up to a round number)
     * from the wave's largest value over all samples, or from the largest value of the maps on
     * screen; a locked range exactly as set, never rounded, so the map, the strip and an exported
     * figure agree.
     *
     * @param waveMaxAbs  the map wave's largest |value| at the electrodes over the whole time axis
     * @param shownMaxAbs the largest |value| of the map (or maps) on screen
     */
    public ColourLimits limits(double waveMaxAbs, double shownMaxAbs) {
        return switch (mode) {
            case AUTO -> ColourLimits.automatic(waveMaxAbs);
            case SYMMETRIC -> ColourLimits.automatic(shownMaxAbs);
            case LOCKED -> ColourLimits.symmetric(limit);
        };
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ColourRange r && r.mode == mode
                && (mode != Mode.LOCKED || Double.compare(r.limit, limit) == 0);
    }

    @Override
    public int hashCode() {
        return mode.hashCode() * 31 + (mode == Mode.LOCKED ? Double.hashCode(limit) : 0);
    }
}
