package org.meridian.core;

import java.nio.file.Path;
import java.util.Objects;

/**
 * One file a study was read from, so that no command ever writes over it: its real path (links
 * resolved), what it was to the study, and whether it was gzip-compressed (outputs follow the
 * input's compression by default).
 */
public record InputFile(Path path, Role role, boolean gzip) {
    /** What a file was to the study. */
    public enum Role {
        MANIFEST("the study manifest", false),
        WAVEFORMS("a waveform file", true),
        LONG_TABLE("the long table", true),
        MONTAGE("the montage file", false);

        private final String description;
        private final boolean holdsWaveforms;

        Role(String description, boolean holdsWaveforms) {
            this.description = description;
            this.holdsWaveforms = holdsWaveforms;
        }

        /** In words, for messages: "the study manifest", "a waveform file". */
        public String description() {
            return description;
        }

        /** Whether the file holds waveform values (rather than listing or placing them). */
        public boolean holdsWaveforms() {
            return holdsWaveforms;
        }
    }

    public InputFile {
        Objects.requireNonNull(path, "path");
        Objects.requireNonNull(role, "role");
    }
}
