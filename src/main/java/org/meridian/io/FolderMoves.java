package org.meridian.io;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * Puts a finished output folder in place by renaming, so a reader of the target sees either
 * the old folder or the complete new one. Replacing takes two renames (old aside, new in); if
 * the second fails the old folder is moved back.
 */
final class FolderMoves {
    private FolderMoves() {
    }

    static boolean isEmpty(Path dir) {
        try (DirectoryStream<Path> s = Files.newDirectoryStream(dir)) {
            return !s.iterator().hasNext();
        } catch (IOException e) {
            return false;
        }
    }

    /**
     * @param replace whether {@code target} exists (an empty folder, or a study allowed to be
     *                replaced) and is to be replaced
     */
    static void moveIntoPlace(Path finished, Path target, boolean replace) throws IOException {
        if (!replace) {
            rename(finished, target);
            return;
        }
        if (isEmpty(target)) {
            Files.delete(target);
            rename(finished, target);
            return;
        }
        Path aside = Files.createTempDirectory(target.getParent(),
                "." + target.getFileName() + ".replaced-");
        Files.delete(aside);
        rename(target, aside);
        try {
            rename(finished, target);
        } catch (IOException e) {
            rename(aside, target);
            throw e;
        }
        deleteTreeQuietly(aside);
    }

    private static void rename(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to);
        }
    }

    /** Removes a folder we made (a temporary or a replaced one) with everything in it. */
    static void deleteTreeQuietly(Path dir) {
        try {
            Files.walkFileTree(dir, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attrs)
                        throws IOException {
                    Files.delete(file);
                    return FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult postVisitDirectory(Path d, IOException exc)
                        throws IOException {
                    Files.delete(d);
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException ignored) {
            // a leftover hidden temporary folder is harmless; the result is already in place
        }
    }
}
