package org.meridian.ui;

import java.util.Locale;
import org.meridian.signal.TimeWindow;

/** How times and values read on screen: {@code 352 ms}, {@code 260–460 ms}, {@code 4.81 µV}. */
final class Texts {
    private Texts() {
    }

    static String ms(double t) {
        return TimeWindow.format(t) + " ms";
    }

    static String window(double a, double b) {
        return TimeWindow.format(a) + "–" + TimeWindow.format(b) + " ms";
    }

    /** A value with two decimals below 100 in magnitude, else none; NaN reads as an en dash. */
    static String value(double v, String unit) {
        if (Double.isNaN(v)) {
            return "–";
        }
        String s = Math.abs(v) >= 100 ? String.format(Locale.ROOT, "%.0f", v)
                : String.format(Locale.ROOT, "%.2f", v);
        return s.replace('-', '−') + " " + unit;
    }
}
