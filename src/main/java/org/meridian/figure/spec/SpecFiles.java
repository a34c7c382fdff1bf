package org.meridian.figure.spec;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.cfg.CoercionAction;
import com.fasterxml.jackson.databind.cfg.CoercionInputShape;
import com.fasterxml.jackson.databind.exc.InvalidFormatException;
import com.fasterxml.jackson.databind.exc.InvalidTypeIdException;
import com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException;
import com.fasterxml.jackson.databind.exc.ValueInstantiationException;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.type.LogicalType;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import org.meridian.core.BadInputException;
import org.meridian.io.AtomicFiles;

/**
 * Reads and writes figure specs as JSON (Jackson). Reading is strict: an unknown field, a
 * repeated key, a value of the wrong kind or out of range, trailing text — each is one line
 * naming the file, the line and column, and the JSON path of the value at fault, e.g.
 * {@code fig.json line 7 column 20 (rows[0].panels[1].type): no panel type "mapstrip" (types:
 * waveforms, map-strip, colour-bar, span-trace)}. Writing is pretty-printed, two spaces, a final newline,
 * through {@code io.AtomicFiles}.
 */
public final class SpecFiles {
    private static final ObjectMapper MAPPER = mapper();
    private static final String PANEL_TYPES = String.join(", ", WaveformPanel.TYPE, MapStripPanel.TYPE,
            ColourBarPanel.TYPE, SpanTracePanel.TYPE);

    private SpecFiles() {
    }

    /** Reads a spec file. */
    public static FigureSpec read(Path file) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new BadInputException(file + ": no such file");
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot read (" + e.getMessage() + ")", e);
        }
        return parse(text, file.toString());
    }

    /** Reads a spec from text; {@code source} names it in errors. */
    public static FigureSpec parse(String json, String source) {
        try {
            FigureSpec spec = MAPPER.readValue(json, FigureSpec.class);
            if (spec == null) {
                throw new BadInputException(source + ": the file holds no figure spec");
            }
            return spec;
        } catch (JsonProcessingException e) {
            throw new BadInputException(describe(e, source), e);
        }
    }

    /** The spec as JSON text. */
    public static String toJson(FigureSpec spec) {
        try {
            return MAPPER.writeValueAsString(spec) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a figure spec could not be written as JSON", e);
        }
    }

    /** Writes a spec file (temporary file, then renamed). */
    public static void write(FigureSpec spec, Path file) {
        AtomicFiles.writeString(file, toJson(spec));
    }

    private static ObjectMapper mapper() {
        JsonMapper m = JsonMapper.builder()
                .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
                .enable(DeserializationFeature.FAIL_ON_NUMBERS_FOR_ENUMS)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
                .enable(SerializationFeature.INDENT_OUTPUT)
                .build();
        for (LogicalType t : List.of(LogicalType.Float, LogicalType.Integer, LogicalType.Boolean)) {
            // "7" is not 7: a quoted number is a mistake worth pointing at
            m.coercionConfigFor(t).setCoercion(CoercionInputShape.String, CoercionAction.Fail);
        }
        m.coercionConfigFor(LogicalType.Textual).setCoercion(CoercionInputShape.Integer, CoercionAction.Fail);
        m.coercionConfigFor(LogicalType.Textual).setCoercion(CoercionInputShape.Float, CoercionAction.Fail);
        DefaultPrettyPrinter printer = new DefaultPrettyPrinter()
                .withObjectIndenter(new DefaultIndenter("  ", "\n"))
                .withArrayIndenter(new DefaultIndenter("  ", "\n"));
        m.setDefaultPrettyPrinter(printer);
        return m;
    }

    private static String describe(JsonProcessingException e, String source) {
        StringBuilder out = new StringBuilder(source);
        JsonLocation at = e.getLocation();
        if (at != null && at.getLineNr() > 0) {
            out.append(" line ").append(at.getLineNr()).append(" column ").append(at.getColumnNr());
        }
        if (e instanceof JsonMappingException m) {
            String path = path(m.getPath());
            if (!path.isEmpty()) {
                out.append(" (").append(path).append(')');
            }
        }
        return out.append(": ").append(reason(e)).toString();
    }

    private static String path(List<JsonMappingException.Reference> refs) {
        StringBuilder p = new StringBuilder();
        for (JsonMappingException.Reference r : refs) {
            if (r.getIndex() >= 0) {
                p.append('[').append(r.getIndex()).append(']');
            } else if (r.getFieldName() != null) {
                if (p.length() > 0) {
                    p.append('.');
                }
                p.append(r.getFieldName());
            }
        }
        return p.toString();
    }

    private static String reason(JsonProcessingException e) {
        if (e instanceof UnrecognizedPropertyException u) {
            return "unknown field \"" + u.getPropertyName() + "\"" + known(u.getKnownPropertyIds());
        }
        if (e instanceof InvalidTypeIdException t) {
            return t.getTypeId() == null ? "a panel needs a \"type\" (" + PANEL_TYPES + ")"
                    : "no panel type \"" + t.getTypeId() + "\" (types: " + PANEL_TYPES + ")";
        }
        if (e instanceof ValueInstantiationException v) {
            Throwable cause = v.getCause();
            while (cause != null && !(cause instanceof BadInputException) && cause.getCause() != null) {
                cause = cause.getCause();
            }
            if (cause instanceof BadInputException) {
                return cause.getMessage();
            }
        }
        if (e instanceof InvalidFormatException f && f.getTargetType() != null && f.getTargetType().isEnum()) {
            List<String> names = new ArrayList<>();
            for (Object constant : f.getTargetType().getEnumConstants()) {
                try {
                    names.add(MAPPER.writeValueAsString(constant).replace("\"", ""));
                } catch (JsonProcessingException ignored) {
                    names.add(constant.toString());
                }
            }
            return "\"" + f.getValue() + "\" is not one of " + String.join(", ", names);
        }
        String message = e.getOriginalMessage();
        if (message != null && message.startsWith("Trailing token")) {
            return "there is more text after the end of the spec";
        }
        message = message == null ? e.getClass().getSimpleName() : message;
        int cut = message.indexOf('\n');
        message = cut < 0 ? message : message.substring(0, cut);
        return message.replaceAll("\\s*\\(for [^)]*\\)", "").replaceAll("`[a-z.]+\\.([A-Za-z]+)`", "$1").trim();
    }

    private static String known(Collection<Object> ids) {
        if (ids == null || ids.isEmpty()) {
            return "";
        }
        List<String> names = new ArrayList<>();
        ids.forEach(id -> names.add(String.valueOf(id)));
        names.sort(null);
        return " (fields here: " + String.join(", ", names) + ")";
    }
}
