package org.meridian.core;

/**
 * How a channel label of a study found its position: in the montage file, among the standard
 * positions (directly or through an alias such as T3 → T7), or not at all. Unpositioned channels
 * (an EOG channel, say) are shown and measured, but left out of maps, CSD and channel repair.
 *
 * @param label      the label as the data gives it
 * @param how        where the position came from
 * @param detail     the standard label an alias stands for, or the likely intended label of an
 *                   unpositioned channel; empty when there is nothing to say
 */
public record ChannelPlacement(String label, How how, String detail) {

    public enum How {
        MONTAGE_FILE, STANDARD, ALIAS, UNPOSITIONED
    }

    public ChannelPlacement {
        detail = detail == null ? "" : detail;
    }

    public boolean positioned() {
        return how != How.UNPOSITIONED;
    }
}
