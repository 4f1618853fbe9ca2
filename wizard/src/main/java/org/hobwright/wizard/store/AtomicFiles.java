package org.hobwright.wizard.store;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.time.Duration;
import java.util.Map;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Atomic file writes: content goes to a temporary file in the target's own folder, is forced to
 * disk, and is then moved over the target in one step ({@link StandardCopyOption#ATOMIC_MOVE}).
 * A reader sees the old file or the new one, never a part; a write that fails half way leaves
 * the old file and no temporary file behind. Temporary files start with a dot and end in
 * {@value #TEMP_SUFFIX}, so listings can skip them.
 */
public final class AtomicFiles {
    /** Suffix of temporary files. */
    public static final String TEMP_SUFFIX = ".tmp";

    private AtomicFiles() {
    }

    /** Writes the content to a stream; may fail half way. */
    @FunctionalInterface
    public interface Content {
        /** Writes all bytes to {@code out}. */
        void writeTo(OutputStream out) throws IOException;
    }

    /** Content of a UTF-8 text. */
    public static Content text(String text) {
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        return out -> out.write(bytes);
    }

    /**
     * Writes one file atomically, creating its folder when needed.
     *
     * @param target  the file to write
     * @param content what to write
     * @param replace true to replace an existing file; false fails with
     *                {@link FileAlreadyExistsException} when the target exists, also when another
     *                process creates it at the same moment
     * @throws IOException when writing fails; the target is then unchanged
     */
    public static void write(Path target, Content content, boolean replace) throws IOException {
        Path folder = target.toAbsolutePath().getParent();
        Files.createDirectories(folder);
        Path temp = writeTemp(folder, target.getFileName().toString(), content);
        try {
            if (replace) {
                keepPermissions(target, temp);
                move(temp, target);
            } else {
                createNew(temp, target);
            }
            syncFolder(folder);
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    /** Writes one UTF-8 text file atomically; see {@link #write(Path, Content, boolean)}. */
    public static void writeText(Path target, String text, boolean replace) throws IOException {
        write(target, text(text), replace);
    }

    /**
     * Writes a set of files into a folder, all or nothing: {@link OutputSet#write} without a
     * library to keep out of.
     *
     * @param folder  the output folder
     * @param files   plain file name to content, written in this order
     * @param replace true to replace existing files of the same names
     * @throws IOException when anything fails; the folder then holds the whole old set
     */
    public static void writeAll(Path folder, Map<String, Content> files, boolean replace) throws IOException {
        OutputSet.write(folder, files, replace, java.util.Optional.empty());
    }

    static Path writeTemp(Path folder, String name, Content content) throws IOException {
        Path temp = createUnique(folder, "." + name + ".", TEMP_SUFFIX, false);
        try {
            writeFully(temp, content);
            return temp;
        } catch (IOException | RuntimeException e) {
            Files.deleteIfExists(temp);
            throw e;
        }
    }

    /**
     * Creates a new empty file or folder named prefix, a random number and suffix, with the
     * permissions any new file gets there (the user's file-creation mask applies): the temporary
     * file becomes the output, which other people and programs (a DNC server, a shared library
     * folder) may need to read. Named with a plain random number, so that no secure random
     * generator (with its security providers, a start-up cost) is set up for a name.
     */
    static Path createUnique(Path folder, String prefix, String suffix, boolean directory)
            throws IOException {
        while (true) {
            Path path = folder.resolve(prefix + Long.toUnsignedString(ThreadLocalRandom.current().nextLong()) + suffix);
            try {
                return directory ? Files.createDirectory(path) : Files.createFile(path);
            } catch (FileAlreadyExistsException taken) {
                // another name
            }
        }
    }

    /** A free name for a new file, prefix, a random number and suffix (not created). */
    static Path uniqueName(Path folder, String prefix, String suffix) {
        Path path;
        do {
            path = folder.resolve(prefix + Long.toUnsignedString(ThreadLocalRandom.current().nextLong()) + suffix);
        } while (Files.exists(path));
        return path;
    }

    /** Gives a file about to replace {@code target} the target's POSIX permissions, where there are any. */
    static void keepPermissions(Path target, Path replacement) {
        try {
            if (Files.getFileAttributeView(target, PosixFileAttributeView.class) != null && Files.exists(target)) {
                Files.setPosixFilePermissions(replacement, Files.getPosixFilePermissions(target));
            }
        } catch (IOException | UnsupportedOperationException e) {
            // the replacement keeps the permissions of a new file
        }
    }

    static void writeFully(Path file, Content content) throws IOException {
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                StandardOpenOption.TRUNCATE_EXISTING);
             OutputStream out = java.nio.channels.Channels.newOutputStream(ch)) {
            content.writeTo(out);
            out.flush();
            ch.force(true);
        }
    }

    /**
     * Asks the file system to make the folder's entries durable (so a rename survives a power cut);
     * best effort: where a folder cannot be opened for this (e.g. on Windows) nothing happens.
     */
    static void syncFolder(Path folder) {
        try (FileChannel dir = FileChannel.open(folder, StandardOpenOption.READ)) {
            dir.force(true);
        } catch (IOException | RuntimeException e) {
            // not supported here; the files themselves were forced to disk before the rename
        }
    }

    /**
     * Deletes the hidden temporary files of {@code name} in {@code folder} that are older than
     * {@code age}: what a save killed half way leaves behind (a save running now has a younger one).
     *
     * @return how many were deleted
     */
    public static int removeStaleTemps(Path folder, String name, Duration age) {
        int removed = 0;
        String prefix = "." + name + ".";
        long limit = System.currentTimeMillis() - age.toMillis();
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder, prefix + "*" + TEMP_SUFFIX)) {
            for (Path p : entries) {
                if (Files.isRegularFile(p) && Files.getLastModifiedTime(p).toMillis() < limit
                        && Files.deleteIfExists(p)) {
                    removed++;
                }
            }
        } catch (IOException | RuntimeException e) {
            // a folder that cannot be listed keeps its leftovers; they are hidden and harmless
        }
        return removed;
    }

    static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /**
     * Puts {@code temp} in place as {@code target} only if no target exists, atomically also
     * against other processes: a hard link fails when the name is taken. Where the file system
     * has no hard links, falls back to a check followed by an atomic move.
     */
    private static void createNew(Path temp, Path target) throws IOException {
        try {
            Files.createLink(target, temp);
        } catch (FileAlreadyExistsException e) {
            throw e;
        } catch (UnsupportedOperationException | FileSystemException e) {
            if (Files.exists(target)) {
                throw new FileAlreadyExistsException(target.toString());
            }
            move(temp, target);
        }
    }

    static void deleteTree(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return;
        }
        try (var files = Files.list(dir)) {
            for (Path p : (Iterable<Path>) files::iterator) {
                Files.deleteIfExists(p);
            }
        }
        Files.deleteIfExists(dir);
    }
}
