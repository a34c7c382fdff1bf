package org.meridian.io;

import java.nio.file.Path;
import org.meridian.core.Study;

/**
 * Loads a study from a STUDY argument: a manifest ({@code study.tsv}), its folder, a single
 * waveform file (one participant, one condition) or a long table; see DESIGN §4.
 * (Contract only; the readers are being written.)
 */
public final class StudyLoader {
    private StudyLoader() {
    }

    /** Reports loading progress; checked between files, so loading can be cancelled. */
    public interface Progress {
        void update(int filesDone, int filesTotal);

        default boolean cancelled() {
            return false;
        }
    }

    public static Study load(Path path) {
        return load(path, (done, total) -> { });
    }

    public static Study load(Path path, Progress progress) {
        throw new UnsupportedOperationException("not yet written");
    }
}
