package org.meridian.io;

import java.io.IOException;
import java.io.InputStream;
import java.io.PushbackInputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.zip.GZIPInputStream;
import org.meridian.core.BadInputException;

/**
 * Opens an input file for reading only. A gzip-compressed file (told by its first two bytes,
 * whatever its name) is decompressed transparently.
 */
final class TextInput {
    private static final int GZIP_MAGIC_1 = 0x1f;
    private static final int GZIP_MAGIC_2 = 0x8b;
    private static final int GZIP_BUFFER = 1 << 16;

    private TextInput() {
    }

    /** The file as a stream of (decompressed) bytes; the caller closes it. */
    static InputStream open(Path path) {
        String name = path.toString();
        if (Files.isDirectory(path)) {
            throw new ReadException(name, 0, 0, "is a folder, not a file");
        }
        InputStream raw;
        try {
            raw = Files.newInputStream(path, StandardOpenOption.READ);
        } catch (NoSuchFileException e) {
            throw new ReadException(name, 0, 0, "file does not exist");
        } catch (AccessDeniedException e) {
            throw new ReadException(name, 0, 0, "file cannot be read (permission denied)");
        } catch (IOException e) {
            throw new ReadException(name, 0, 0, "cannot be read: " + e.getMessage());
        }
        try {
            PushbackInputStream in = new PushbackInputStream(raw, 2);
            int b1 = in.read();
            int b2 = b1 < 0 ? -1 : in.read();
            if (b2 >= 0) {
                in.unread(b2);
            }
            if (b1 >= 0) {
                in.unread(b1);
            }
            if (b1 == GZIP_MAGIC_1 && b2 == GZIP_MAGIC_2) {
                return new GZIPInputStream(in, GZIP_BUFFER);
            }
            return in;
        } catch (IOException e) {
            closeQuietly(raw);
            throw new ReadException(name, 0, 0, "is not a readable gzip file: " + e.getMessage());
        }
    }

    /** Whether a file starts with the gzip magic bytes (false when it cannot be read). */
    static boolean isGzip(Path path) {
        try (InputStream in = Files.newInputStream(path, StandardOpenOption.READ)) {
            return in.read() == GZIP_MAGIC_1 && in.read() == GZIP_MAGIC_2;
        } catch (IOException e) {
            return false;
        }
    }

    /** A read failure in the middle of a file (a truncated gzip stream, a vanished disk). */
    static BadInputException failure(String file, int line, IOException e) {
        String what = e instanceof java.util.zip.ZipException || e instanceof java.io.EOFException
                ? "the compressed data is damaged or cut short"
                : "the file cannot be read further: " + e.getMessage();
        return new ReadException(file, line, 0, what);
    }

    private static void closeQuietly(InputStream in) {
        try {
            in.close();
        } catch (IOException ignored) {
            // already failing; the first problem is the one to report
        }
    }
}
