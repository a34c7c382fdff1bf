package org.meridian.io;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.InputFile;
import org.meridian.core.Study;

/**
 * The summary and checks the {@code info} command prints: {@code key: value} lines, then
 * {@code warning: …} lines. Keys are fixed (see the readme's "File formats" section), so the
 * output can be read by scripts.
 */
public final class StudySummary {
    /** Maps, CSD and channel repair need this many positioned channels (DESIGN §3). */
    public static final int MIN_POSITIONED = 4;
    /** Below this many positioned channels CSD is coarse (common practice). */
    public static final int CSD_COARSE_BELOW = 32;

    private StudySummary() {
    }

    public static List<String> lines(Study study, StudyLoader.Kind kind) {
        List<String> out = new ArrayList<>();
        out.add("study: " + study.name());
        out.add("format: " + kind.description());
        out.add("participants: " + study.participants().size());
        out.add("participant_names: " + String.join(", ", study.participants()));
        out.add("conditions: " + String.join(", ", study.conditions()));
        out.add("channels: " + study.channelLabels().size());
        int positioned = study.montage().size();
        out.add("positioned_channels: " + positioned);
        out.add("samples: " + study.axis().samples());
        out.add("time_ms: " + Sampling.ms(study.axis().firstMs()) + ".."
                + Sampling.ms(study.axis().lastMs()));
        out.add("sampling_hz: " + Sampling.ms(study.axis().rateHz()));
        out.add("unit: " + study.unit().symbol());
        out.add("montage: " + study.montage().source());
        out.addAll(matches(study.placements()));
        String trials = trials(study);
        if (trials != null) {
            out.add("trials: " + trials);
        }
        out.addAll(warnings(study, positioned));
        return out;
    }

    /**
     * When a montage file gave positions, the data channels it lacks took template positions
     * from the standard system: measured and template positions mixed, which a careful user
     * wants to know about (null when there is nothing to say).
     */
    private static String templatePositionsBesideAMontageFile(Study study) {
        boolean montageFile = study.inputFiles().stream()
                .anyMatch(f -> f.role() == InputFile.Role.MONTAGE);
        if (!montageFile) {
            return null;
        }
        List<String> templated = new ArrayList<>();
        for (ChannelPlacement p : study.placements()) {
            if (p.how() == ChannelPlacement.How.STANDARD || p.how() == ChannelPlacement.How.ALIAS) {
                templated.add(p.label());
            }
        }
        if (templated.isEmpty()) {
            return null;
        }
        return "warning: " + templated.size() + " channel" + (templated.size() == 1 ? " is" : "s are")
                + " not in the montage file and took standard 10-5 (template) positions, mixed with"
                + " the measured ones: " + String.join(", ", templated);
    }

    private static List<String> matches(List<ChannelPlacement> placements) {
        int fromFile = 0;
        int standard = 0;
        List<String> aliases = new ArrayList<>();
        List<String> unpositioned = new ArrayList<>();
        for (ChannelPlacement p : placements) {
            switch (p.how()) {
                case MONTAGE_FILE -> fromFile++;
                case STANDARD -> standard++;
                case ALIAS -> aliases.add(p.label() + " → " + p.detail());
                case UNPOSITIONED -> unpositioned.add(p.label());
            }
        }
        return List.of(
                "labels_montage_file: " + fromFile,
                "labels_standard: " + standard,
                "labels_alias: " + withList(aliases),
                "labels_unpositioned: " + withList(unpositioned));
    }

    private static String withList(List<String> items) {
        return items.isEmpty() ? "0" : items.size() + " (" + String.join(", ", items) + ")";
    }

    /** {@code MIN..MAX}, with how many cells know their count when not all do; null if none. */
    private static String trials(Study study) {
        int known = 0;
        int cells = 0;
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int p = 0; p < study.participants().size(); p++) {
            for (int c = 0; c < study.conditions().size(); c++) {
                cells++;
                OptionalInt t = study.trials(p, c);
                if (t.isPresent()) {
                    known++;
                    min = Math.min(min, t.getAsInt());
                    max = Math.max(max, t.getAsInt());
                }
            }
        }
        if (known == 0) {
            return null;
        }
        String range = min == max ? Integer.toString(min) : min + ".." + max;
        return known == cells ? range : range + " (known for " + known + " of " + cells + " cells)";
    }

    private static List<String> warnings(Study study, int positioned) {
        List<String> out = new ArrayList<>();
        String templated = templatePositionsBesideAMontageFile(study);
        if (templated != null) {
            out.add(templated);
        }
        for (ChannelPlacement p : study.placements()) {
            if (!p.positioned()) {
                String guess = p.detail().isEmpty() ? ""
                        : "; is it a misspelling of " + p.detail() + "?";
                out.add("warning: channel " + p.label() + " has no position (not in a montage"
                        + " file, not a standard 10-5 label or alias): it is shown and measured but"
                        + " left out of maps, CSD and channel repair" + guess);
            }
        }
        if (positioned < MIN_POSITIONED) {
            out.add("warning: only " + positioned + " positioned channel"
                    + (positioned == 1 ? "" : "s") + ": maps, CSD and channel repair are"
                    + " impossible (they need at least " + MIN_POSITIONED + ")");
        } else if (positioned < CSD_COARSE_BELOW) {
            out.add("warning: CSD is coarse below " + CSD_COARSE_BELOW + " channels (this study has "
                    + positioned + " positioned)");
        }
        return out;
    }
}
