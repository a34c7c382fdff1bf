package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowable;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.meridian.core.BadInputException;

/** Writing small input files and reading the one-line error that loading them gives. */
final class LoadErrors {
    private LoadErrors() {
    }

    /** Writes {@code text} (UTF-8) to {@code dir/name}, creating folders on the way. */
    static Path write(Path dir, String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.createDirectories(f.getParent());
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }

    /** The message of the error loading {@code path} gives, checked to be of {@code kind} and one line. */
    static String message(Path path, Class<? extends BadInputException> kind) {
        Throwable t = catchThrowable(() -> StudyLoader.load(path));
        assertThat(t).isInstanceOf(kind);
        assertThat(t.getMessage()).doesNotContain("\n");
        return t.getMessage();
    }
}
