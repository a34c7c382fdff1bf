package org.meridian.core;

import java.util.Locale;

/**
 * The unit of the values held in a {@link Waveforms}. Potentials are always held in microvolts;
 * current source density (the surface Laplacian, see the spline package) in microvolts per
 * square metre. Files may give potentials in V, mV, µV or nV; {@link #parse} says which unit a
 * file's {@code # unit:} token means and by what factor its values are multiplied on loading.
 */
public enum Unit {
    MICROVOLT("µV", "uV"),
    MICROVOLT_PER_SQUARE_METRE("µV/m²", "uV/m2");

    private final String symbol;
    private final String fileToken;

    Unit(String symbol, String fileToken) {
        this.symbol = symbol;
        this.fileToken = fileToken;
    }

    /** The unit as shown on screen and in tables, e.g. {@code µV/m²}. */
    public String symbol() {
        return symbol;
    }

    /** The unit as written in a {@code # unit:} comment of the files we write (plain ASCII). */
    public String fileToken() {
        return fileToken;
    }

    /** A unit token read from a file together with the factor that converts its values. */
    public record Scaled(Unit unit, double factor) {
    }

    /**
     * Reads a unit token such as {@code uV}, {@code µV}, {@code mV}, {@code V}, {@code nV} or
     * {@code uV/m2}. Returns null for a token we do not know; the reader reports where it was.
     */
    public static Scaled parse(String token) {
        String t = token.trim().replace('μ', 'u').replace('µ', 'u').replace("²", "2")
                .replace("^2", "2").toLowerCase(Locale.ROOT);
        return switch (t) {
            case "uv" -> new Scaled(MICROVOLT, 1.0);
            case "v" -> new Scaled(MICROVOLT, 1e6);
            case "mv" -> new Scaled(MICROVOLT, 1e3);
            case "nv" -> new Scaled(MICROVOLT, 1e-3);
            case "uv/m2" -> new Scaled(MICROVOLT_PER_SQUARE_METRE, 1.0);
            default -> null;
        };
    }
}
