package org.meridian.figure;

import java.text.FieldPosition;
import java.text.NumberFormat;
import java.text.ParsePosition;
import org.meridian.maps.RoundNumbers;

/**
 * Prints axis ticks as the colour bar does ({@link RoundNumbers#format}): as many decimals as
 * the step needs, and a true minus sign (U+2212) rather than a hyphen.
 */
final class TickFormat extends NumberFormat {
    private static final long serialVersionUID = 1L;
    private final double step;

    TickFormat(double step) {
        this.step = step;
    }

    @Override
    public StringBuffer format(double number, StringBuffer to, FieldPosition pos) {
        return to.append(RoundNumbers.format(number, step));
    }

    @Override
    public StringBuffer format(long number, StringBuffer to, FieldPosition pos) {
        return format((double) number, to, pos);
    }

    @Override
    public Number parse(String source, ParsePosition pos) {
        throw new UnsupportedOperationException("tick labels are only printed");
    }
}
