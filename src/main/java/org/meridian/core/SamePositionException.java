package org.meridian.core;

/**
 * Two electrodes of a {@link Montage} at the same position. It carries both labels, so a reader
 * can name the lines or columns they came from.
 */
public final class SamePositionException extends BadInputException {
    private static final long serialVersionUID = 1L;

    private final String source;
    private final String first;
    private final String second;

    public SamePositionException(String source, String first, String second) {
        super((source.isEmpty() ? "" : source + ": ") + "electrodes " + first + " and " + second
                + " are at the same position");
        this.source = source;
        this.first = first;
        this.second = second;
    }

    /** Where the positions came from (a montage file, the standard positions). */
    public String source() {
        return source;
    }

    /** The electrode listed first. */
    public String first() {
        return first;
    }

    /** The electrode listed later, at the same position as {@link #first()}. */
    public String second() {
        return second;
    }
}
