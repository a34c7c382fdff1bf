package org.meridian.montage;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.ChannelPlacement.How;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;

/**
 * Finds the position of every channel label of a study: first in the montage file (when one is
 * given), under the label or another name of the same position (data T3, file T7), then among the
 * standard 10-5 positions, directly or through an alias (T3 → T7). A label
 * found in neither loads as an unpositioned channel, with the standard label it most likely meant
 * when one is close.
 */
public final class ChannelPositions {
    private ChannelPositions() {
    }

    /** The positioned channels as a montage (under the data's own labels) and how each matched. */
    public record Resolution(Montage montage, List<ChannelPlacement> placements) {
    }

    /**
     * @param labels   the channel labels of the data, in order
     * @param fromFile the montage read from a file, or null to use the standard positions only
     */
    public static Resolution resolve(List<String> labels, Montage fromFile) {
        List<Electrode> positioned = new ArrayList<>();
        List<ChannelPlacement> placements = new ArrayList<>();
        for (String label : labels) {
            Optional<Electrode> inFile = inFile(label, fromFile);
            if (inFile.isPresent()) {
                positioned.add(inFile.get().withLabel(label));
                placements.add(new ChannelPlacement(label, How.MONTAGE_FILE, ""));
                continue;
            }
            Electrode direct = StandardSystem.find10_5(label);
            if (direct != null) {
                positioned.add(direct.withLabel(label));
                placements.add(new ChannelPlacement(label, How.STANDARD, ""));
                continue;
            }
            Optional<String> alias = Labels.aliasTarget(label);
            if (alias.isPresent()) {
                positioned.add(StandardSystem.find10_5(alias.get()).withLabel(label));
                placements.add(new ChannelPlacement(label, How.ALIAS, alias.get()));
                continue;
            }
            placements.add(new ChannelPlacement(label, How.UNPOSITIONED,
                    Labels.likelyIntended(label).orElse("")));
        }
        String source;
        if (fromFile == null) {
            source = "standard 10-5 positions";
        } else if (positioned.size() == countFromFile(placements)) {
            source = fromFile.source();
        } else {
            source = fromFile.source() + " and standard 10-5 positions";
        }
        return new Resolution(new Montage(positioned, source), placements);
    }

    /**
     * The montage file's electrode for a data label, under any of its names: a file that says T7
     * measures the data's T3, and the reverse ({@link Labels#spellings}).
     */
    private static Optional<Electrode> inFile(String label, Montage fromFile) {
        if (fromFile == null) {
            return Optional.empty();
        }
        for (String name : Labels.spellings(label)) {
            Optional<Electrode> e = fromFile.find(name);
            if (e.isPresent()) {
                return e;
            }
        }
        return Optional.empty();
    }

    private static int countFromFile(List<ChannelPlacement> placements) {
        int n = 0;
        for (ChannelPlacement p : placements) {
            if (p.how() == How.MONTAGE_FILE) {
                n++;
            }
        }
        return n;
    }
}
