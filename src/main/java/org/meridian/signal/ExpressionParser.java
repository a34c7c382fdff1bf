package org.meridian.signal;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Recursive-descent reader of condition expressions (see {@link ConditionExpression} for the
 * syntax). Every sub-expression evaluates to a linear form Σ c_k·condition_k + constant; the
 * reader rejects anything that is not linear in the conditions, and a constant left over at the
 * end, pointing at the character at fault.
 *
 * <pre>
 * expression := term (('+' | '-') term)*
 * term       := unary (('*' | '/') unary)*
 * unary      := ('+' | '-') unary | primary
 * primary    := number | name | 'quoted name' | '(' expression ')'
 * </pre>
 */
final class ExpressionParser {
    private final String text;
    private final List<String> conditions;
    private int pos;

    private ExpressionParser(String text, List<String> conditions) {
        this.text = text;
        this.conditions = conditions;
    }

    /** The coefficient of each condition (the conditions' own spelling), in order of appearance. */
    static Map<String, Double> parse(String text, List<String> conditions) {
        ExpressionParser p = new ExpressionParser(text, conditions);
        p.skipSpace();
        if (p.pos == text.length()) {
            throw p.error(0, 0, "the expression is empty; write e.g. rare - common");
        }
        int start = p.pos;
        Linear result = p.expression();
        p.skipSpace();
        if (p.pos < text.length()) {
            char c = text.charAt(p.pos);
            String reason = c == ')' ? "there is no \"(\" for this \")\""
                    : isNamePart(c) || c == '\'' || c == '('
                    ? "expected +, -, * or / before \"" + p.tokenAt(p.pos) + "\""
                    : "unexpected character \"" + c + "\"";
            throw p.error(p.pos, Math.max(1, p.tokenAt(p.pos).length()), reason);
        }
        if (result.coefficients.isEmpty()) {
            throw p.error(start, text.length() - start, "the expression names no condition");
        }
        if (result.constant != 0) {
            throw p.error(start, text.length() - start,
                    "a number cannot be added to or subtracted from a wave");
        }
        result.coefficients.values().removeIf(v -> v == 0);
        if (result.coefficients.isEmpty()) {
            throw p.error(start, text.length() - start,
                    "the conditions cancel out: every coefficient is zero");
        }
        return result.coefficients;
    }

    private Linear expression() {
        Linear left = term();
        while (true) {
            skipSpace();
            if (pos >= text.length() || (peek() != '+' && peek() != '-')) {
                return left;
            }
            char op = text.charAt(pos++);
            int rightStart = skipSpaceAndMark();
            Linear right = term();
            if (left.isConstant() != right.isConstant()) {
                int at = left.isConstant() ? left.start : rightStart;
                int end = left.isConstant() ? left.end : pos;
                throw error(at, end - at, "a number cannot be added to or subtracted from a wave;"
                        + " multiply it with a condition (e.g. 0.5*name)");
            }
            left = left.plus(right, op == '+' ? 1 : -1);
        }
    }

    private Linear term() {
        Linear left = unary();
        while (true) {
            skipSpace();
            if (pos >= text.length() || (peek() != '*' && peek() != '/')) {
                return left;
            }
            int opPos = pos;
            char op = text.charAt(pos++);
            int rightStart = skipSpaceAndMark();
            Linear right = unary();
            if (op == '*') {
                if (!left.isConstant() && !right.isConstant()) {
                    throw error(opPos, 1, "two conditions cannot be multiplied; a contrast is a "
                            + "weighted sum of conditions");
                }
                left = left.isConstant() ? right.scaled(left.constant, left.start)
                        : left.scaled(right.constant, left.start);
                left.end = pos;
            } else {
                if (!right.isConstant()) {
                    throw error(opPos, 1, "cannot divide by a condition; divide by a number");
                }
                if (right.constant == 0) {
                    throw error(rightStart, pos - rightStart, "division by zero");
                }
                left = left.scaled(1 / right.constant, left.start);
                left.end = pos;
            }
        }
    }

    private Linear unary() {
        skipSpace();
        if (pos < text.length() && (peek() == '+' || peek() == '-')) {
            int start = pos;
            char op = text.charAt(pos++);
            Linear inner = unary();
            return op == '-' ? inner.scaled(-1, start) : inner.from(start);
        }
        return primary();
    }

    private Linear primary() {
        skipSpace();
        if (pos >= text.length()) {
            String last = text.strip();
            throw error(text.length(), 0, "the expression ends after \""
                    + (last.isEmpty() ? "" : last.substring(last.length() - 1))
                    + "\"; a condition or a number should follow");
        }
        int start = pos;
        char c = peek();
        if (c == '(') {
            pos++;
            Linear inner = expression();
            skipSpace();
            if (pos >= text.length() || peek() != ')') {
                throw error(start, 1, "this \"(\" is never closed");
            }
            pos++;
            return inner.span(start, pos);
        }
        if (c == '\'') {
            return name(quoted(), start);
        }
        if (Character.isDigit(c) || (c == '.' && pos + 1 < text.length()
                && Character.isDigit(text.charAt(pos + 1)))) {
            double v = number();
            if (pos < text.length() && isNameStart(peek())) {
                throw error(pos, tokenAt(pos).length(), "write * between the number and the "
                        + "condition name (e.g. " + text.substring(start, pos) + "*"
                        + tokenAt(pos) + ")");
            }
            return Linear.constant(v, start, pos);
        }
        if (isNameStart(c)) {
            while (pos < text.length() && isNamePart(peek())) {
                pos++;
            }
            return name(text.substring(start, pos), start);
        }
        String reason = switch (c) {
            case ')' -> "there is no \"(\" for this \")\"";
            case '*', '/' -> "\"" + c + "\" needs a number or a condition before it";
            case '"' -> "quote condition names with single quotes ('like this')";
            default -> "unexpected character \"" + c + "\"";
        };
        throw error(start, 1, reason);
    }

    private Linear name(String written, int start) {
        String resolved = null;
        for (String c : conditions) {
            if (c.equals(written)) {
                resolved = c;
            }
        }
        if (resolved == null) {
            for (String c : conditions) {
                if (c.equalsIgnoreCase(written)) {
                    resolved = c;
                }
            }
        }
        if (resolved == null) {
            String nearest = nearest(written);
            String hint = nearest == null ? ""
                    : "; did you mean \"" + nearest + "\"?";
            throw new ExpressionSyntaxException(text, start, pos - start,
                    "no condition \"" + written + "\"" + hint, nearest);
        }
        Linear l = new Linear(start, pos);
        l.coefficients.put(resolved, 1.0);
        return l;
    }

    /** The known condition nearest to what was written ({@link NearestName}). */
    private String nearest(String written) {
        return NearestName.among(written, conditions);
    }

    private String quoted() {
        int open = pos++;
        StringBuilder sb = new StringBuilder();
        while (true) {
            if (pos >= text.length()) {
                throw error(open, text.length() - open, "this quote is never closed");
            }
            char c = text.charAt(pos++);
            if (c == '\'') {
                if (pos < text.length() && peek() == '\'') {
                    sb.append('\'');
                    pos++;
                } else {
                    break;
                }
            } else {
                sb.append(c);
            }
        }
        if (sb.length() == 0) {
            throw error(open, pos - open, "an empty condition name");
        }
        return sb.toString();
    }

    private double number() {
        int start = pos;
        while (pos < text.length() && Character.isDigit(peek())) {
            pos++;
        }
        if (pos < text.length() && peek() == '.') {
            pos++;
            while (pos < text.length() && Character.isDigit(peek())) {
                pos++;
            }
        }
        if (pos < text.length() && (peek() == 'e' || peek() == 'E')) {
            int mark = pos;
            pos++;
            if (pos < text.length() && (peek() == '+' || peek() == '-')) {
                pos++;
            }
            if (pos < text.length() && Character.isDigit(peek())) {
                while (pos < text.length() && Character.isDigit(peek())) {
                    pos++;
                }
            } else {
                pos = mark;
            }
        }
        String s = text.substring(start, pos);
        try {
            double v = Double.parseDouble(s);
            if (!Double.isFinite(v)) {
                throw error(start, pos - start, "the number " + s + " is too large");
            }
            return v;
        } catch (NumberFormatException e) {
            throw error(start, pos - start, "\"" + s + "\" is not a number");
        }
    }

    /** The word or character starting at a position, for messages. */
    private String tokenAt(int at) {
        int end = at;
        if (at < text.length() && isNamePart(text.charAt(at))) {
            while (end < text.length() && isNamePart(text.charAt(end))) {
                end++;
            }
        } else {
            end = Math.min(text.length(), at + 1);
        }
        return text.substring(at, end);
    }

    static boolean isNameStart(char c) {
        return Character.isLetter(c) || c == '_';
    }

    static boolean isNamePart(char c) {
        return Character.isLetterOrDigit(c) || c == '_' || c == '.';
    }

    private char peek() {
        return text.charAt(pos);
    }

    private void skipSpace() {
        while (pos < text.length() && Character.isWhitespace(peek())) {
            pos++;
        }
    }

    private int skipSpaceAndMark() {
        skipSpace();
        return pos;
    }

    private ExpressionSyntaxException error(int at, int length, String reason) {
        return new ExpressionSyntaxException(text, at, length, reason, null);
    }

    /** Σ c_k·condition_k + constant, with the text span it came from. */
    private static final class Linear {
        final Map<String, Double> coefficients = new LinkedHashMap<>();
        double constant;
        int start;
        int end;

        Linear(int start, int end) {
            this.start = start;
            this.end = end;
        }

        static Linear constant(double v, int start, int end) {
            Linear l = new Linear(start, end);
            l.constant = v;
            return l;
        }

        boolean isConstant() {
            return coefficients.isEmpty();
        }

        Linear plus(Linear other, double sign) {
            Linear out = new Linear(start, other.end);
            out.coefficients.putAll(coefficients);
            other.coefficients.forEach((k, v) -> out.coefficients.merge(k, sign * v, Double::sum));
            out.constant = constant + sign * other.constant;
            return out;
        }

        Linear scaled(double factor, int newStart) {
            Linear out = new Linear(newStart, end);
            coefficients.forEach((k, v) -> out.coefficients.put(k, factor * v));
            out.constant = factor * constant;
            return out;
        }

        Linear from(int newStart) {
            return scaled(1, newStart);
        }

        Linear span(int newStart, int newEnd) {
            Linear out = scaled(1, newStart);
            out.end = newEnd;
            return out;
        }
    }
}
