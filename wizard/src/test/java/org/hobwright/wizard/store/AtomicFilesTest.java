package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {
    @TempDir
    Path dir;

    /** The folder's files, without the lock file writers of a set share (it stays, empty). */
    private List<String> listing(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> !n.equals(OutputSet.LOCK)).sorted().toList();
        }
    }

    @Test
    void writesCreatesFoldersAndReplacesOnlyWhenAsked() throws IOException {
        Path f = dir.resolve("a/b/out.txt");
        AtomicFiles.writeText(f, "one", false);
        assertEquals("one", Files.readString(f));
        assertThrows(FileAlreadyExistsException.class, () -> AtomicFiles.writeText(f, "two", false));
        assertEquals("one", Files.readString(f));
        AtomicFiles.writeText(f, "two", true);
        assertEquals("two", Files.readString(f));
        assertEquals(List.of("out.txt"), listing(f.getParent()), "no temporary file left");
    }

    @Test
    void aWriteThatFailsHalfWayLeavesTheOldFile() throws IOException {
        Path f = dir.resolve("profile.json");
        AtomicFiles.writeText(f, "{\"old\": true}", true);
        IOException e = assertThrows(IOException.class, () -> AtomicFiles.write(f, out -> {
            out.write("{\"new\": ".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full");
        }, true));
        assertEquals("disk full", e.getMessage());
        assertEquals("{\"old\": true}", Files.readString(f));
        assertEquals(List.of("profile.json"), listing(dir));
    }

    @Test
    void aSetOfFilesGoesIntoANewFolderAllAtOnce() throws IOException {
        Path out = dir.resolve("out");
        Map<String, AtomicFiles.Content> files = new LinkedHashMap<>();
        files.put("job.nc", AtomicFiles.text("N10 (program)\n"));
        files.put("job.csv", AtomicFiles.text("step\n"));
        AtomicFiles.writeAll(out, files, false);
        assertEquals(List.of("job.csv", "job.nc"), listing(out));
        assertEquals(List.of("out"), listing(dir), "no staging folder left");
    }

    @Test
    void aFailingSetLeavesANewFolderAbsentAndAnOldFolderAsItWas() throws IOException {
        Map<String, AtomicFiles.Content> failing = new LinkedHashMap<>();
        failing.put("a.txt", AtomicFiles.text("new a"));
        failing.put("b.txt", out -> {
            throw new IOException("writer broke");
        });
        Path fresh = dir.resolve("fresh");
        assertThrows(IOException.class, () -> AtomicFiles.writeAll(fresh, failing, false));
        assertFalse(Files.exists(fresh));
        assertEquals(List.of(), listing(dir), "no staging folder left");

        Path old = Files.createDirectories(dir.resolve("old"));
        Files.writeString(old.resolve("a.txt"), "old a");
        assertThrows(IOException.class, () -> AtomicFiles.writeAll(old, failing, true));
        assertEquals(List.of("a.txt"), listing(old));
        assertEquals("old a", Files.readString(old.resolve("a.txt")));
    }

    @Test
    void aSetIsNotWrittenOverExistingFilesWithoutReplace() throws IOException {
        Path old = Files.createDirectories(dir.resolve("old"));
        Files.writeString(old.resolve("b.txt"), "old b");
        Map<String, AtomicFiles.Content> files = new LinkedHashMap<>();
        files.put("a.txt", AtomicFiles.text("a"));
        files.put("b.txt", AtomicFiles.text("b"));
        assertThrows(FileAlreadyExistsException.class, () -> AtomicFiles.writeAll(old, files, false));
        assertEquals(List.of("b.txt"), listing(old));
        AtomicFiles.writeAll(old, files, true);
        assertEquals("b", Files.readString(old.resolve("b.txt")));
        assertEquals(List.of("a.txt", "b.txt"), listing(old));
    }

    @Test
    void fileNamesMustBePlain() {
        assertThrows(IllegalArgumentException.class,
                () -> AtomicFiles.writeAll(dir, Map.of("../x", AtomicFiles.text("x")), true));
        assertTrue(dir.toFile().list().length == 0);
    }

    /**
     * Outputs get the permissions of any new file in that folder (the operating system applies the
     * user's file-creation mask to the reference file), and a replaced file keeps its own.
     */
    @Test
    void outputsHaveTheUsualPermissionsAndReplacementsKeepTheirs() throws IOException {
        org.junit.jupiter.api.Assumptions.assumeTrue(
                dir.getFileSystem().supportedFileAttributeViews().contains("posix"), "POSIX file system");
        Path reference = Files.createFile(dir.resolve("reference.txt"));
        Path referenceDir = Files.createDirectory(dir.resolve("reference-dir"));

        AtomicFiles.write(dir.resolve("one.nc"), AtomicFiles.text("x"), false);
        assertEquals(Files.getPosixFilePermissions(reference), Files.getPosixFilePermissions(dir.resolve("one.nc")));

        Path out = dir.resolve("out");
        AtomicFiles.writeAll(out, Map.of("a.nc", AtomicFiles.text("a")), false);
        assertEquals(Files.getPosixFilePermissions(referenceDir), Files.getPosixFilePermissions(out));
        assertEquals(Files.getPosixFilePermissions(reference), Files.getPosixFilePermissions(out.resolve("a.nc")));

        var shared = java.nio.file.attribute.PosixFilePermissions.fromString("rw-rw-r--");
        Files.setPosixFilePermissions(out.resolve("a.nc"), shared);
        AtomicFiles.writeAll(out, Map.of("a.nc", AtomicFiles.text("b")), true);
        assertEquals(shared, Files.getPosixFilePermissions(out.resolve("a.nc")));
        Files.setPosixFilePermissions(dir.resolve("one.nc"), shared);
        AtomicFiles.write(dir.resolve("one.nc"), AtomicFiles.text("y"), true);
        assertEquals(shared, Files.getPosixFilePermissions(dir.resolve("one.nc")));
    }
}
