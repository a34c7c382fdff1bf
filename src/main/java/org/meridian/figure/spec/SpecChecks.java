package org.meridian.figure.spec;

import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;
import org.meridian.core.BadInputException;

/** Checks shared by the spec's records; each failure names the field in the spec's own words. */
final class SpecChecks {
    private static final Pattern COLOUR = Pattern.compile("#[0-9a-fA-F]{6}");

    private SpecChecks() {
    }

    static double within(Double value, double fallback, double low, double high, String field, String unit) {
        double v = value == null ? fallback : value;
        if (!Double.isFinite(v) || v < low || v > high) {
            throw new BadInputException(field + " must be " + number(low) + " to " + number(high)
                    + (unit.isEmpty() ? "" : " " + unit) + ", got " + number(v));
        }
        return v;
    }

    static String colour(String value, String field) {
        if (value == null || !COLOUR.matcher(value).matches()) {
            throw new BadInputException(field + " must be a colour written #RRGGBB, got "
                    + (value == null ? "nothing" : "\"" + value + "\""));
        }
        return value.toUpperCase(Locale.ROOT);
    }

    static String text(String value, String fallback) {
        return value == null ? fallback : value;
    }

    static String required(String value, String field) {
        if (value == null || value.isBlank()) {
            throw new BadInputException(field + " is required");
        }
        return value.trim();
    }

    /** A two-number range [from, to] with from < to, or null. */
    static List<Double> range(List<Double> value, String field) {
        if (value == null) {
            return null;
        }
        if (value.size() != 2 || value.get(0) == null || value.get(1) == null
                || !Double.isFinite(value.get(0)) || !Double.isFinite(value.get(1))
                || !(value.get(0) < value.get(1))) {
            throw new BadInputException(field + " must be two numbers [from, to] with from below to, got " + value);
        }
        return List.copyOf(value);
    }

    static String number(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e12) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
