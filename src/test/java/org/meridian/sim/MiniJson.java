package org.meridian.sim;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A strict reader of the JSON grammar of RFC 8259 (objects, arrays, strings with escapes,
 * numbers, true/false/null), for checking that what we write is well-formed; numbers come back
 * as {@link Double}. Test use only.
 */
final class MiniJson {
    private final String text;
    private int pos;

    private MiniJson(String text) {
        this.text = text;
    }

    static Object parse(String text) {
        MiniJson p = new MiniJson(text);
        Object v = p.value();
        p.space();
        if (p.pos != text.length()) {
            throw p.error("trailing text");
        }
        return v;
    }

    private Object value() {
        space();
        if (pos >= text.length()) {
            throw error("unexpected end");
        }
        char c = text.charAt(pos);
        return switch (c) {
            case '{' -> object();
            case '[' -> array();
            case '"' -> string();
            case 't' -> literal("true", Boolean.TRUE);
            case 'f' -> literal("false", Boolean.FALSE);
            case 'n' -> literal("null", null);
            default -> number();
        };
    }

    private Map<String, Object> object() {
        Map<String, Object> out = new LinkedHashMap<>();
        pos++;
        space();
        if (peek() == '}') {
            pos++;
            return out;
        }
        while (true) {
            space();
            String key = string();
            space();
            expect(':');
            if (out.put(key, value()) != null) {
                throw error("duplicate key " + key);
            }
            space();
            if (peek() == ',') {
                pos++;
            } else {
                expect('}');
                return out;
            }
        }
    }

    private List<Object> array() {
        List<Object> out = new ArrayList<>();
        pos++;
        space();
        if (peek() == ']') {
            pos++;
            return out;
        }
        while (true) {
            out.add(value());
            space();
            if (peek() == ',') {
                pos++;
            } else {
                expect(']');
                return out;
            }
        }
    }

    private String string() {
        expect('"');
        StringBuilder sb = new StringBuilder();
        while (true) {
            char c = text.charAt(pos++);
            if (c == '"') {
                return sb.toString();
            }
            if (c < 0x20) {
                throw error("control character in string");
            }
            if (c == '\\') {
                char e = text.charAt(pos++);
                switch (e) {
                    case '"', '\\', '/' -> sb.append(e);
                    case 'n' -> sb.append('\n');
                    case 'r' -> sb.append('\r');
                    case 't' -> sb.append('\t');
                    case 'b' -> sb.append('\b');
                    case 'f' -> sb.append('\f');
                    case 'u' -> {
                        sb.append((char) Integer.parseInt(text.substring(pos, pos + 4), 16));
                        pos += 4;
                    }
                    default -> throw error("bad escape");
                }
            } else {
                sb.append(c);
            }
        }
    }

    private Double number() {
        int start = pos;
        if (peek() == '-') {
            pos++;
        }
        if (peek() == '0') {
            pos++;
        } else {
            digits();
        }
        if (peek() == '.') {
            pos++;
            digits();
        }
        if (peek() == 'e' || peek() == 'E') {
            pos++;
            if (peek() == '+' || peek() == '-') {
                pos++;
            }
            digits();
        }
        return Double.valueOf(text.substring(start, pos));
    }

    private void digits() {
        int start = pos;
        while (pos < text.length() && Character.isDigit(text.charAt(pos))) {
            pos++;
        }
        if (pos == start) {
            throw error("digit expected");
        }
    }

    private Object literal(String word, Object v) {
        if (!text.startsWith(word, pos)) {
            throw error("bad literal");
        }
        pos += word.length();
        return v;
    }

    private void expect(char c) {
        if (peek() != c) {
            throw error("expected '" + c + "'");
        }
        pos++;
    }

    private char peek() {
        return pos < text.length() ? text.charAt(pos) : '\0';
    }

    private void space() {
        while (pos < text.length() && " \t\r\n".indexOf(text.charAt(pos)) >= 0) {
            pos++;
        }
    }

    private IllegalArgumentException error(String what) {
        return new IllegalArgumentException(what + " at offset " + pos);
    }
}
