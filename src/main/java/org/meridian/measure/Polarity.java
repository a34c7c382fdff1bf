package org.meridian.measure;

import java.util.Locale;
import org.meridian.core.BadInputException;

/**
 * Which part of the wave a measure looks at: the positive deflections, the negative ones, or
 * (for areas) the signed wave. Written {@code pos}, {@code neg}, {@code signed}.
 */
public enum Polarity {
    POSITIVE("pos"), NEGATIVE("neg"), SIGNED("signed");

    private final String token;

    Polarity(String token) {
        this.token = token;
    }

    /** {@code pos}, {@code neg} or {@code signed}. */
    public String token() {
        return token;
    }

    /** +1 for positive, −1 for negative: multiply by it to turn a negative peak into a maximum. */
    public int sign() {
        return this == NEGATIVE ? -1 : 1;
    }

    public static Polarity parse(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        for (Polarity p : values()) {
            if (p.token.equals(t)) {
                return p;
            }
        }
        return switch (t) {
            case "positive", "+" -> POSITIVE;
            case "negative", "-" -> NEGATIVE;
            default -> throw new BadInputException("polarity \"" + text + "\" is not pos, neg or signed");
        };
    }

    @Override
    public String toString() {
        return token;
    }
}
