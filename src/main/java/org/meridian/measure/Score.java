package org.meridian.measure;

/**
 * What a measure found: a value (NaN when there is none, shown as an empty cell), and, when
 * something is worth knowing, a warning for the researcher. A {@code qualifier} marks a value
 * that is not what the measure normally reports (the window maximum standing in for a missing
 * local peak); the table shows it in the measure cell as {@code local-peak (window maximum)}.
 */
public record Score(double value, String qualifier, String warning) {

    public static Score of(double value) {
        return new Score(value, null, null);
    }

    /** No value: the table cell stays empty and the warning says why. */
    public static Score empty(String warning) {
        return new Score(Double.NaN, null, warning);
    }

    /** A stand-in value, marked in the table and warned about. */
    public static Score fallback(double value, String qualifier, String warning) {
        return new Score(value, qualifier, warning);
    }

    public boolean isEmpty() {
        return Double.isNaN(value);
    }
}
