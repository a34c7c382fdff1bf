package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.ArrayList;
import java.util.List;
import org.meridian.core.BadInputException;

/**
 * A figure spec: everything a figure is made from besides the data, as saved in a JSON file
 * ({@link SpecFiles}). The study is a path, relative to the spec file where possible; the rows
 * of panels are laid out top to bottom. Every part left out takes its journal-ready default
 * (filled in here, so a spec written back states every setting). Immutable.
 *
 * @param version the spec format's version ({@value #VERSION})
 * @param letters whether panels get letters A, B, C … in reading order
 * @param excludedParticipants participants left out of every average and interval
 * @param processing what is done to every participant's averages first (reference, filter,
 *                   baseline); null or absent for nothing, which is also how "nothing" is written
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
@JsonPropertyOrder({"version", "study", "size", "font", "lines", "polarity", "letters", "conditions",
    "excluded_participants", "processing", "intervals", "waveforms", "maps", "rows"})
public record FigureSpec(@JsonProperty("version") Integer version,
        @JsonProperty("study") String study,
        @JsonProperty("size") FigureSize size,
        @JsonProperty("font") Typography font,
        @JsonProperty("lines") LineWidths lines,
        @JsonProperty("polarity") Polarity polarity,
        @JsonProperty("letters") Boolean letters,
        @JsonProperty("conditions") List<ShownCondition> conditions,
        @JsonProperty("excluded_participants") List<String> excludedParticipants,
        @JsonProperty("processing") ProcessingSpec processing,
        @JsonProperty("intervals") IntervalSpec intervals,
        @JsonProperty("waveforms") WaveformAxes waveforms,
        @JsonProperty("maps") MapSettings maps,
        @JsonProperty("rows") List<PanelRow> rows) {

    public static final int VERSION = 1;

    public FigureSpec {
        version = version == null ? VERSION : version;
        if (version != VERSION) {
            throw new BadInputException("version " + version + " is not a figure spec version this Meridian reads (it reads "
                    + VERSION + ")");
        }
        study = SpecChecks.required(study, "study");
        size = size == null ? FigureSize.defaults() : size;
        font = font == null ? Typography.defaults() : font;
        lines = lines == null ? LineWidths.defaults() : lines;
        polarity = polarity == null ? Polarity.POSITIVE_UP : polarity;
        letters = letters == null || letters;
        conditions = withDefaults(conditions);
        excludedParticipants = excludedParticipants == null ? List.of() : List.copyOf(excludedParticipants);
        processing = processing == null || processing.toProcessing().isNone() ? null : processing;
        intervals = intervals == null ? IntervalSpec.defaults() : intervals;
        waveforms = waveforms == null ? WaveformAxes.defaults() : waveforms;
        maps = maps == null ? MapSettings.defaults() : maps;
        if (rows == null || rows.isEmpty()) {
            throw new BadInputException("rows: a figure needs at least one row of panels");
        }
        rows = List.copyOf(rows);
        checkPanelsAgainstConditions(conditions, rows);
    }

    /** The same figure with another study path (e.g. made relative to where the spec is saved). */
    public FigureSpec withStudy(String newStudy) {
        return new FigureSpec(version, newStudy, size, font, lines, polarity, letters, conditions,
                excludedParticipants, processing, intervals, waveforms, maps, rows);
    }

    /** The same figure with other processing (null or nothing for none). */
    public FigureSpec withProcessing(ProcessingSpec newProcessing) {
        return new FigureSpec(version, study, size, font, lines, polarity, letters, conditions,
                excludedParticipants, newProcessing, intervals, waveforms, maps, rows);
    }

    /** The processing the spec asks for ({@code Processing.none()} when it has none). */
    public org.meridian.signal.Processing processingValue() {
        return processing == null ? org.meridian.signal.Processing.none() : processing.toProcessing();
    }

    /** Every panel in reading order. */
    public List<PanelSpec> panels() {
        List<PanelSpec> out = new ArrayList<>();
        rows.forEach(r -> out.addAll(r.panels()));
        return out;
    }

    private static List<ShownCondition> withDefaults(List<ShownCondition> given) {
        if (given == null) {
            return List.of();
        }
        List<ShownCondition> out = new ArrayList<>();
        for (int i = 0; i < given.size(); i++) {
            ShownCondition c = given.get(i);
            if (c == null) {
                throw new BadInputException("conditions[" + i + "] is empty");
            }
            for (ShownCondition earlier : out) {
                if (earlier.wave().equals(c.wave())) {
                    throw new BadInputException("conditions[" + i + "]: wave \"" + c.wave() + "\" is listed twice");
                }
            }
            out.add(c.withDefaults(i));
        }
        return List.copyOf(out);
    }

    private static void checkPanelsAgainstConditions(List<ShownCondition> conditions, List<PanelRow> rows) {
        for (int r = 0; r < rows.size(); r++) {
            List<PanelSpec> panels = rows.get(r).panels();
            for (int p = 0; p < panels.size(); p++) {
                List<String> picked = panels.get(p) instanceof WaveformPanel w ? w.conditions()
                        : panels.get(p) instanceof SpanTracePanel t ? t.conditions() : null;
                if (panels.get(p) instanceof WaveformPanel || panels.get(p) instanceof SpanTracePanel) {
                    String where = "rows[" + r + "].panels[" + p + "]";
                    if (conditions.isEmpty()) {
                        throw new BadInputException(where + ": a waveform or span-trace panel needs the figure's "
                                + "conditions (the waves it shows, e.g. [{\"wave\": \"rare\"}])");
                    }
                    for (String wanted : picked == null ? List.<String>of() : picked) {
                        if (conditions.stream().noneMatch(c -> c.wave().equals(wanted))) {
                            throw new BadInputException(where + ".conditions: \"" + wanted
                                    + "\" is not one of the figure's conditions ("
                                    + String.join(", ", conditions.stream().map(ShownCondition::wave).toList()) + ")");
                        }
                    }
                }
            }
        }
    }
}
