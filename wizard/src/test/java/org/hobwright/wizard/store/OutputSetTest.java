package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A set of output files is whole or marked: a run stopped between two renames leaves the journal,
 * and the next write (or {@link OutputSet#recover}) finishes the set; writers of one folder take
 * turns; the library's own folders are refused.
 */
class OutputSetTest {
    private static final List<String> NAMES = List.of("job.nc", "job.csv", "job.report.json", "job.setup.html");

    @TempDir
    Path dir;

    private static Map<String, AtomicFiles.Content> set(String version) {
        Map<String, AtomicFiles.Content> files = new LinkedHashMap<>();
        NAMES.forEach(n -> files.put(n, AtomicFiles.text(version + " " + n)));
        return files;
    }

    private static List<String> visible(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> !n.startsWith(".")).sorted().toList();
        }
    }

    private static List<String> hidden(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.startsWith("."))
                    .filter(n -> !n.equals(OutputSet.LOCK)).sorted().toList();
        }
    }

    private static void assertWholeSet(Path folder, String version) throws IOException {
        for (String n : NAMES) {
            assertEquals(version + " " + n, Files.readString(folder.resolve(n)), n);
        }
        assertEquals(NAMES.stream().sorted().toList(), visible(folder));
        assertEquals(List.of(), hidden(folder), "no journal, temporary file or backup left");
        assertFalse(OutputSet.interrupted(folder));
    }

    /**
     * The state a run leaves when it is killed after the second of four renames: the journal in
     * state {@code moving}, the first two new files in place, the last two still as temporary files,
     * every old file kept as a backup. Built by the journal's documented format.
     */
    private Path interruptedAfterTwoRenames() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("out"));
        OutputSet.write(folder, set("old"), true, Optional.empty());
        StringBuilder journal = new StringBuilder("hobwright-output-set 1\nstate\tmoving\n");
        for (int i = 0; i < NAMES.size(); i++) {
            String n = NAMES.get(i);
            String temp = "." + n + ".1" + AtomicFiles.TEMP_SUFFIX;
            String backup = "." + n + ".2.old" + AtomicFiles.TEMP_SUFFIX;
            Files.writeString(folder.resolve(temp), "new " + n);
            Files.copy(folder.resolve(n), folder.resolve(backup));
            journal.append("file\t").append(n).append('\t').append(temp).append('\t').append(backup).append('\n');
        }
        Files.writeString(folder.resolve(OutputSet.JOURNAL), journal);
        for (String n : NAMES.subList(0, 2)) {
            Files.move(folder.resolve("." + n + ".1" + AtomicFiles.TEMP_SUFFIX), folder.resolve(n),
                    java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
        assertTrue(OutputSet.interrupted(folder), "a mixed set is marked as such");
        return folder;
    }

    @Test
    void anInterruptedSetIsFinishedByTheNextWrite() throws IOException {
        Path folder = interruptedAfterTwoRenames();
        Map<String, AtomicFiles.Content> other = new LinkedHashMap<>();
        other.put("other.nc", AtomicFiles.text("other"));
        OutputSet.write(folder, other, true, Optional.empty());
        assertEquals("other", Files.readString(folder.resolve("other.nc")));
        Files.delete(folder.resolve("other.nc"));
        assertWholeSet(folder, "new");
    }

    @Test
    void anInterruptedSetIsFinishedByRecovery() throws IOException {
        Path folder = interruptedAfterTwoRenames();
        assertTrue(OutputSet.recover(folder));
        assertWholeSet(folder, "new");
        assertFalse(OutputSet.recover(folder), "nothing left to recover");
    }

    @Test
    void aRollbackStoppedHalfWayIsFinished() throws IOException {
        Path folder = interruptedAfterTwoRenames();
        Path journal = folder.resolve(OutputSet.JOURNAL);
        Files.writeString(journal, Files.readString(journal).replace("state\tmoving", "state\trollback"));
        assertTrue(OutputSet.recover(folder));
        assertWholeSet(folder, "old");
    }

    @Test
    void aJournalOfAnotherKindIsNotActedOn() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("out"));
        Files.writeString(folder.resolve(OutputSet.JOURNAL), "state\tmoving\nfile\t../x\t.a.tmp\t-\n");
        IOException e = assertThrows(IOException.class, () -> OutputSet.write(folder, set("new"), true,
                Optional.empty()));
        assertTrue(e.getMessage().contains("by hand"), e.getMessage());
        assertEquals(List.of(), visible(folder), "nothing written while the folder's state is unknown");
    }

    @Test
    void writersOfOneFolderTakeTurnsAndLeaveOneWholeSet() throws Exception {
        Path folder = Files.createDirectory(dir.resolve("out"));
        int writers = 8;
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<?>> runs = new ArrayList<>();
            for (int w = 0; w < writers; w++) {
                String version = "run" + w;
                runs.add(pool.submit(() -> {
                    for (int k = 0; k < 5; k++) {
                        OutputSet.write(folder, set(version), true, Optional.empty());
                    }
                    return null;
                }));
            }
            for (Future<?> f : runs) {
                f.get();     // every writer succeeds: none fails on another's temporary or backup names
            }
        } finally {
            pool.shutdown();
        }
        String first = Files.readString(folder.resolve(NAMES.get(0)));
        assertWholeSet(folder, first.substring(0, first.indexOf(' ')));
    }

    @Test
    void aFolderInsideTheLibrarysOwnFoldersIsRefused() throws IOException {
        Path home = Files.createDirectories(dir.resolve("home/machines"));
        IOException e = assertThrows(IOException.class,
                () -> OutputSet.write(home.resolve("x"), set("new"), true, Optional.of(dir.resolve("home"))));
        assertTrue(e.getMessage().contains("inside the library folder"), e.getMessage());
        assertFalse(Files.exists(home.resolve("x")));
        // through a link to it as well
        Path link = Files.createSymbolicLink(dir.resolve("link"), home);
        assertThrows(IOException.class, () -> OutputSet.write(link, set("new"), true,
                Optional.of(dir.resolve("home"))));
    }
}
