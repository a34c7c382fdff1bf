package org.meridian.signal;

import java.util.Optional;
import org.meridian.core.BadInputException;

/**
 * A condition expression that cannot be read, with where and why: the character position (for
 * an editor to underline), the length of the offending part, a reason written for the
 * researcher, and, for an unknown condition name, the nearest known name.
 *
 * <p>The message reads e.g. {@code condition expression "rare - comon", character 8: no
 * condition "comon"; did you mean "common"?} (characters counted from 1 in the message, from 0
 * in {@link #position()}).
 */
public final class ExpressionSyntaxException extends BadInputException {
    private static final long serialVersionUID = 1L;

    private final String text;
    private final int position;
    private final int length;
    private final String reason;
    private final String suggestion;

    public ExpressionSyntaxException(String text, int position, int length, String reason,
            String suggestion) {
        super("condition expression \"" + text + "\", character " + (position + 1) + ": " + reason);
        this.text = text;
        this.position = position;
        this.length = Math.max(0, length);
        this.reason = reason;
        this.suggestion = suggestion;
    }

    /** The expression as given. */
    public String text() {
        return text;
    }

    /** Index (from 0) of the first character at fault; {@code text().length()} at the end. */
    public int position() {
        return position;
    }

    /** How many characters are at fault (0 when something is missing at the end). */
    public int length() {
        return length;
    }

    /** The reason alone, without the expression and position, for an inline hint. */
    public String reason() {
        return reason;
    }

    /** For an unknown condition: the known condition name nearest to what was written. */
    public Optional<String> suggestion() {
        return Optional.ofNullable(suggestion);
    }
}
