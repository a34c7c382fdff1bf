package org.meridian.io;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;
import org.meridian.core.BadInputException;

/**
 * Every export goes through here: the content is written to a temporary file beside the target
 * and renamed onto it, so a failed or cancelled export never leaves a half-written file, and an
 * existing file is replaced in one step.
 */
public final class AtomicFiles {
    private AtomicFiles() {
    }

    /** Something that writes the whole content to a stream. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    public static void writeString(Path target, String text) {
        write(target, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
    }

    public static void write(Path target, Content content) {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            throw new BadInputException(target + ": folder " + dir + " does not exist");
        }
        if (Files.isDirectory(abs)) {
            throw new BadInputException(target + " is a folder, not a file");
        }
        Path tmp = null;
        try {
            tmp = Files.createTempFile(dir, "." + abs.getFileName(), ".part");
            try (OutputStream out = Files.newOutputStream(tmp)) {
                content.writeTo(out);
            }
            giveUsualPermissions(tmp, abs);
            moveIntoPlace(tmp, abs);
            tmp = null;
        } catch (IOException e) {
            throw new BadInputException("cannot write " + target + ": " + e.getMessage(), e);
        } finally {
            deleteQuietly(tmp);
        }
    }

    /** Renames {@code from} onto {@code to}, atomically where the file system allows it. */
    public static void moveIntoPlace(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /**
     * Temporary files are created readable by their owner only; an export should look like any
     * other file the user writes: the permissions of the file it replaces, else rw-r--r--.
     */
    static void giveUsualPermissions(Path tmp, Path target) throws IOException {
        if (!tmp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            return;
        }
        Set<PosixFilePermission> perms = Files.exists(target)
                ? Files.getPosixFilePermissions(target)
                : PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(tmp, perms);
    }

    private static void deleteQuietly(Path p) {
        if (p == null) {
            return;
        }
        try {
            Files.deleteIfExists(p);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
