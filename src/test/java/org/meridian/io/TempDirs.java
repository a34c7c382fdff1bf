package org.meridian.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Temporary folders for property tries (jqwik has no per-try @TempDir). */
final class TempDirs {
    private TempDirs() {
    }

    static Path create() {
        try {
            return Files.createTempDirectory("meridian-io-test");
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    static void delete(Path dir) {
        FolderMoves.deleteTreeQuietly(dir);
    }
}
