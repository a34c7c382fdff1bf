package org.meridian.io;

import java.nio.file.Path;
import org.meridian.core.Study;

/**
 * Writes a study as a folder in the §4 layout: {@code study.tsv}, one waveform file per
 * participant × condition with its {@code # unit:} comment, and {@code montage.tsv} when the
 * positions did not all come from the standard system. The folder is written under a temporary
 * name and renamed into place; an existing non-empty folder is refused unless {@code force}.
 * (Contract only; the writer is being written.)
 */
public final class StudyWriter {
    private StudyWriter() {
    }

    /**
     * @param gzip     write the waveform files gzip-compressed ({@code .tsv.gz})
     * @param decimals digits after the decimal point of every value (fixed, so output is
     *                 byte-for-byte repeatable)
     * @param force    replace an existing non-empty folder
     */
    public record Options(boolean gzip, int decimals, boolean force) {
        public static Options defaults() {
            return new Options(false, 4, false);
        }
    }

    public static void write(Study study, Path folder, Options options) {
        throw new UnsupportedOperationException("not yet written");
    }
}
