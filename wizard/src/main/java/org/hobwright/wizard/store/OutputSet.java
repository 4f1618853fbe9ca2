package org.hobwright.wizard.store;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.locks.ReentrantLock;

/**
 * Writes a set of files into a folder all or nothing, for the terminal tool and for hosts alike.
 *
 * <p><b>The guarantee.</b> A reader of the folder sees the whole old set or the whole new one,
 * except while a folder holds the journal {@value #JOURNAL}: then a set is being written, or a
 * run was interrupted between two renames, and the set must not be taken as whole. The next write
 * into the folder (any run, any process) first finishes the interrupted set; {@link #recover}
 * does the same on its own. Writers of one folder wait for each other (the lock file
 * {@value #LOCK}, held while a set is written). A folder inside the library is refused, so no
 * output can pass for a saved machine or template.
 *
 * <p><b>How.</b> A folder that does not exist yet is written as a hidden sibling and renamed into
 * place in one step. Into an existing folder: every new file is written to a hidden temporary
 * file with a unique name and forced to disk; every file it replaces gets a hidden backup (a hard
 * link where the file system has them); then the journal is written, naming each file, its
 * temporary file and its backup; then the files are renamed into place one by one; then the
 * journal says {@code done}, the backups are deleted and the journal last. A failure during the
 * renames puts the backups back. A run killed during the renames leaves the journal in state
 * {@code moving}: recovery finishes the renames (every new file was complete on disk before the
 * first one); killed while putting backups back, state {@code rollback}: recovery finishes that.
 */
public final class OutputSet {
    /** The journal of a set being written. */
    public static final String JOURNAL = ".hobwright-journal";
    /** The lock file writers of one folder share. */
    public static final String LOCK = ".hobwright-lock";

    private static final String HEADER = "hobwright-output-set 1";
    private static final long WAIT_MS = 60_000;
    private static final Map<Path, ReentrantLock> IN_THIS_JVM = new ConcurrentHashMap<>();

    private OutputSet() {
    }

    /** One file of a set: its name, its temporary file, its backup (null when it is new). */
    private record Entry(String name, String temp, String backup) {
    }

    /**
     * Writes the files into the folder, all or nothing.
     *
     * @param folder  the output folder (created when missing)
     * @param files   plain file name to content, written in this order
     * @param replace true to replace existing files of the same names; false fails with
     *                {@link FileAlreadyExistsException} when one exists
     * @param library the library folder outputs must stay out of, when there is one
     * @throws IOException when anything fails (the folder then holds the whole old set), also when
     *                     the folder lies inside the library or another writer holds it too long
     */
    public static void write(Path folder, Map<String, AtomicFiles.Content> files, boolean replace,
                             Optional<Path> library) throws IOException {
        Map<String, AtomicFiles.Content> ordered = new LinkedHashMap<>(files);
        for (String name : ordered.keySet()) {
            if (!plainName(name)) {
                throw new IllegalArgumentException("output file name \"" + name + "\" is not a plain file name");
            }
        }
        Path abs = folder.toAbsolutePath().normalize();
        if (library.isPresent()) {
            refuseInside(abs, library.get());
        }
        if (!Files.exists(abs)) {
            try {
                writeNewFolder(abs, ordered);
                return;
            } catch (RacedException raced) {
                // another writer created the folder meanwhile: write into it like any other
            }
        }
        if (!Files.isDirectory(abs)) {
            throw new IOException(abs + " is not a folder");
        }
        withLock(abs, () -> {
            recoverLocked(abs);
            writeIntoFolder(abs, ordered, replace);
            return null;
        });
    }

    /**
     * Finishes a set a run left interrupted in the folder, if there is one (waiting for a writer
     * that is at work there).
     *
     * @return true when there was one
     */
    public static boolean recover(Path folder) throws IOException {
        Path abs = folder.toAbsolutePath().normalize();
        if (!Files.exists(abs.resolve(JOURNAL))) {
            return false;
        }
        return withLock(abs, () -> recoverLocked(abs));
    }

    /** True when the folder holds a set being written or interrupted: its files are not a whole set. */
    public static boolean interrupted(Path folder) {
        return Files.exists(folder.resolve(JOURNAL));
    }

    // ---- refusing folders -----------------------------------------------------------------------

    /**
     * The library's own folders (machines, templates, dialects) and anything inside them are no
     * output folders: a report there would be listed as a saved entry. Links are resolved first.
     */
    private static void refuseInside(Path folder, Path library) throws IOException {
        Path real = realOfNearest(folder);
        for (String shelf : List.of(Library.MACHINES, Library.TEMPLATES, Library.DIALECTS)) {
            Path kept = realOfNearest(library.toAbsolutePath().normalize().resolve(shelf));
            if (real.startsWith(kept)) {
                throw new IOException(folder + " lies inside the library folder " + kept
                        + "; outputs there would be listed as saved " + shelf + ", choose another folder");
            }
        }
    }

    /** The real path of the nearest existing folder, with the rest of the path resolved on it. */
    private static Path realOfNearest(Path p) throws IOException {
        Path existing = p;
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing == null) {
            return p;
        }
        return existing.toRealPath().resolve(existing.relativize(p)).normalize();
    }

    // ---- a new folder ---------------------------------------------------------------------------

    /** Thrown when another writer created the folder first. */
    private static final class RacedException extends IOException {
        private static final long serialVersionUID = 1L;
    }

    private static void writeNewFolder(Path folder, Map<String, AtomicFiles.Content> files) throws IOException {
        Path parent = folder.getParent();
        Files.createDirectories(parent);
        Path staging = AtomicFiles.createUnique(parent, "." + folder.getFileName() + ".", "", true);
        try {
            for (Map.Entry<String, AtomicFiles.Content> e : files.entrySet()) {
                AtomicFiles.writeFully(staging.resolve(e.getKey()), e.getValue());
            }
            try {
                Files.move(staging, folder, StandardCopyOption.ATOMIC_MOVE);
                AtomicFiles.syncFolder(parent);
            } catch (FileSystemException e) {
                if (Files.isDirectory(folder)) {
                    throw new RacedException();
                }
                throw e;
            }
        } finally {
            AtomicFiles.deleteTree(staging);
        }
    }

    // ---- an existing folder ---------------------------------------------------------------------

    private static void writeIntoFolder(Path folder, Map<String, AtomicFiles.Content> files, boolean replace)
            throws IOException {
        if (!replace) {
            for (String name : files.keySet()) {
                if (Files.exists(folder.resolve(name))) {
                    throw new FileAlreadyExistsException(folder.resolve(name).toString());
                }
            }
        }
        List<Entry> entries = new ArrayList<>();
        boolean journaled = false;
        try {
            for (Map.Entry<String, AtomicFiles.Content> e : files.entrySet()) {
                Path temp = AtomicFiles.writeTemp(folder, e.getKey(), e.getValue());
                Path target = folder.resolve(e.getKey());
                String backup = null;
                if (Files.exists(target)) {
                    AtomicFiles.keepPermissions(target, temp);
                    backup = backUp(folder, target).getFileName().toString();
                }
                entries.add(new Entry(e.getKey(), temp.getFileName().toString(), backup));
            }
            journal(folder, "moving", entries);
            journaled = true;
            for (Entry e : entries) {
                AtomicFiles.move(folder.resolve(e.temp()), folder.resolve(e.name()));
            }
            AtomicFiles.syncFolder(folder);
            journal(folder, "done", entries);
        } catch (IOException | RuntimeException failure) {
            try {
                if (journaled) {
                    journal(folder, "rollback", entries);
                    rollBack(folder, entries);
                }
            } catch (IOException | RuntimeException e) {
                failure.addSuppressed(e);
                throw failure;    // the journal stays: the next run finishes the rollback
            }
            cleanUp(folder, entries);
            throw failure;
        }
        try {
            cleanUp(folder, entries);
        } catch (IOException e) {
            // the set is written; the journal says done, and the next run removes the leftovers
        }
    }

    /** A hidden hard link to (or copy of) the file, with a unique name. */
    private static Path backUp(Path folder, Path target) throws IOException {
        Path backup = AtomicFiles.uniqueName(folder, "." + target.getFileName() + ".", ".old" + AtomicFiles.TEMP_SUFFIX);
        try {
            return Files.createLink(backup, target);
        } catch (UnsupportedOperationException | FileSystemException e) {
            if (e instanceof FileAlreadyExistsException) {
                return backUp(folder, target);
            }
            return Files.copy(target, backup);
        }
    }

    private static void rollBack(Path folder, List<Entry> entries) throws IOException {
        for (Entry e : entries) {
            Path target = folder.resolve(e.name());
            if (e.backup() != null) {
                Path backup = folder.resolve(e.backup());
                if (Files.exists(backup)) {
                    AtomicFiles.move(backup, target);
                }
            } else if (!Files.exists(folder.resolve(e.temp()))) {
                Files.deleteIfExists(target);
            }
        }
        AtomicFiles.syncFolder(folder);
    }

    /** Deletes the temporary files and backups that are left, then the journal. */
    private static void cleanUp(Path folder, List<Entry> entries) throws IOException {
        for (Entry e : entries) {
            Files.deleteIfExists(folder.resolve(e.temp()));
            if (e.backup() != null) {
                Files.deleteIfExists(folder.resolve(e.backup()));
            }
        }
        Files.deleteIfExists(folder.resolve(JOURNAL));
        AtomicFiles.syncFolder(folder);
    }

    // ---- the journal and recovery -----------------------------------------------------------------

    private static void journal(Path folder, String state, List<Entry> entries) throws IOException {
        StringBuilder sb = new StringBuilder(HEADER).append('\n').append("state\t").append(state).append('\n');
        for (Entry e : entries) {
            sb.append("file\t").append(e.name()).append('\t').append(e.temp()).append('\t')
                    .append(e.backup() == null ? "-" : e.backup()).append('\n');
        }
        AtomicFiles.writeText(folder.resolve(JOURNAL), sb.toString(), true);
    }

    private static boolean recoverLocked(Path folder) throws IOException {
        Path journal = folder.resolve(JOURNAL);
        if (!Files.exists(journal)) {
            return false;
        }
        List<String> lines = Files.readAllLines(journal, StandardCharsets.UTF_8);
        if (lines.size() < 2 || !lines.get(0).equals(HEADER) || !lines.get(1).startsWith("state\t")) {
            throw new IOException(journal + " is not a journal of this version; move it away, then check the"
                    + " folder's files by hand");
        }
        String state = lines.get(1).substring("state\t".length());
        List<Entry> entries = new ArrayList<>();
        for (String l : lines.subList(2, lines.size())) {
            String[] f = l.split("\t", -1);
            if (f.length != 4 || !f[0].equals("file") || !plainName(f[1]) || !hiddenName(f[2])
                    || !(f[3].equals("-") || hiddenName(f[3]))) {
                throw new IOException(journal + ": cannot read \"" + l + "\"; check the folder's files by hand");
            }
            entries.add(new Entry(f[1], f[2], f[3].equals("-") ? null : f[3]));
        }
        switch (state) {
            case "moving" -> {
                for (Entry e : entries) {
                    Path temp = folder.resolve(e.temp());
                    if (Files.exists(temp)) {
                        AtomicFiles.move(temp, folder.resolve(e.name()));
                    }
                }
                AtomicFiles.syncFolder(folder);
            }
            case "rollback" -> rollBack(folder, entries);
            case "done" -> {
                // every file is in place; only the leftovers go
            }
            default -> throw new IOException(journal + ": unknown state \"" + state + "\"");
        }
        cleanUp(folder, entries);
        return true;
    }

    /** A visible file name without a folder in it. */
    private static boolean plainName(String name) {
        if (name.isEmpty() || name.startsWith(".") || name.contains("/") || name.contains("\\")) {
            return false;
        }
        for (int i = 0; i < name.length(); i++) {
            if (Character.isISOControl(name.charAt(i))) {
                return false;
            }
        }
        return true;
    }

    /** A hidden temporary file's name, as the writer makes them. */
    private static boolean hiddenName(String name) {
        return name.length() > 1 && name.startsWith(".") && name.endsWith(AtomicFiles.TEMP_SUFFIX)
                && plainName(name.substring(1));
    }

    // ---- the lock -------------------------------------------------------------------------------

    @FunctionalInterface
    private interface Locked<T> {
        T run() throws IOException;
    }

    /** Runs with the folder's lock: one thread of this JVM, and one process, at a time. */
    private static <T> T withLock(Path folder, Locked<T> work) throws IOException {
        ReentrantLock local = IN_THIS_JVM.computeIfAbsent(folder, f -> new ReentrantLock());
        long deadline = System.currentTimeMillis() + WAIT_MS;
        try {
            if (!local.tryLock(WAIT_MS, java.util.concurrent.TimeUnit.MILLISECONDS)) {
                throw busy(folder);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while waiting to write into " + folder, e);
        }
        try (FileChannel ch = FileChannel.open(folder.resolve(LOCK), StandardOpenOption.CREATE,
                StandardOpenOption.WRITE)) {
            FileLock lock = ch.tryLock();
            while (lock == null) {
                if (System.currentTimeMillis() > deadline) {
                    throw busy(folder);
                }
                sleep(folder);
                lock = ch.tryLock();
            }
            try {
                return work.run();
            } finally {
                lock.release();
            }
        } finally {
            local.unlock();
        }
    }

    private static void sleep(Path folder) throws IOException {
        try {
            Thread.sleep(20);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while waiting to write into " + folder, e);
        }
    }

    private static IOException busy(Path folder) {
        return new IOException("another run has been writing into " + folder + " for over a minute (it holds "
                + LOCK + "); try again when it has finished");
    }
}
