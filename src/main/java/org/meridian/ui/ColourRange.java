package org.meridian.ui;

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
