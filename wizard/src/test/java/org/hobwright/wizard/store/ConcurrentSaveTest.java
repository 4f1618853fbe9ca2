package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import org.hobwright.api.job.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/** Saves from several threads and from a second process never leave a broken or half-written file. */
@Timeout(value = 120, unit = TimeUnit.SECONDS)
class ConcurrentSaveTest {
    @TempDir
    Path home;

    private Process start(String... args) throws IOException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xshare:auto", "-XX:TieredStopAtLevel=1", "-cp", System.getProperty("java.class.path"),
                SaveLoop.class.getName()));
        cmd.addAll(List.of(args));
        return new ProcessBuilder(cmd).redirectErrorStream(true).start();
    }

    /** Waits for the second process to say it is ready, then lets both start together. */
    private void go(Process p, BufferedReader r) throws IOException {
        assertEquals("ready", r.readLine(), "second process started");
        Files.createDirectories(home);
        Files.writeString(home.resolve(SaveLoop.GO), "go");
    }

    private static BufferedReader reader(Process p) {
        return new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
    }

    private static List<String> lines(BufferedReader r) throws IOException {
        List<String> out = new ArrayList<>();
        try (r) {
            for (String l; (l = r.readLine()) != null; ) {
                out.add(l);
            }
        }
        return out;
    }

    private List<String> strayFiles() throws IOException {
        try (Stream<Path> s = Files.list(home.resolve("machines"))) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.startsWith(".")).toList();
        }
    }

    @Test
    void threadsAndAnotherProcessReplacingOneFile() throws Exception {
        Library lib = Library.open(Optional.of(home));
        assertTrue(lib.saveMachine(SaveLoop.machine("shared", "start"), false).ok());
        Process other = start("replace", home.toString(), "shared", "process", "150");
        BufferedReader otherOut = reader(other);
        go(other, otherOut);
        AtomicBoolean stop = new AtomicBoolean();
        AtomicInteger reads = new AtomicInteger();
        List<String> broken = Collections.synchronizedList(new ArrayList<>());
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            Future<?> reader = pool.submit(() -> {
                while (!stop.get()) {
                    Loaded<MachineFile> m = lib.machineFile("shared");
                    reads.incrementAndGet();
                    if (!m.ok()) {
                        broken.add(m.errorLine());
                    }
                }
            });
            List<Future<?>> writers = new ArrayList<>();
            for (int t = 0; t < 3; t++) {
                int thread = t;
                writers.add(pool.submit(() -> {
                    for (int i = 0; i < 100; i++) {
                        Loaded<Path> s = lib.saveMachine(SaveLoop.machine("shared", "round " + i + " by thread "
                                + thread), true);
                        if (!s.ok()) {
                            broken.add(s.errorLine());
                        }
                    }
                }));
            }
            for (Future<?> w : writers) {
                w.get();
            }
            List<String> out = lines(otherOut);
            assertEquals(0, other.waitFor(), out.toString());
            assertEquals(List.of("done"), out);
            stop.set(true);
            reader.get();
        } finally {
            stop.set(true);
            pool.shutdownNow();
            other.destroy();
        }
        assertEquals(List.of(), broken);
        assertTrue(reads.get() > 0);
        String last = lib.machineFile("shared").get().description();
        assertTrue(last.matches("round \\d+ by (thread \\d|process)"), last);
        assertEquals(List.of(), strayFiles(), "no temporary files left");
    }

    @Test
    void twoProcessesCreatingTheSameNamesSaveEachExactlyOnce() throws Exception {
        int count = 200;
        Process other = start("create", home.toString(), "fresh", Integer.toString(count));
        BufferedReader otherOut = reader(other);
        go(other, otherOut);
        Library lib = Library.open(Optional.of(home));
        Map<String, Integer> created = new HashMap<>();
        for (int i = 0; i < count; i++) {
            if (lib.saveMachine(new MachineFile(SaveLoop.SampleProfile.profile("fresh-" + i), Units.MM, "here"),
                    false).ok()) {
                created.merge("fresh-" + i, 1, Integer::sum);
            }
        }
        List<String> out = lines(otherOut);
        assertEquals(0, other.waitFor(), out.toString());
        for (String l : out) {
            if (l.startsWith("saved ")) {
                created.merge(l.substring(6), 1, Integer::sum);
            }
        }
        for (int i = 0; i < count; i++) {
            assertEquals(1, created.getOrDefault("fresh-" + i, 0), "fresh-" + i + " created once");
            assertTrue(lib.machine("fresh-" + i).ok());
        }
        assertEquals(List.of(), strayFiles());
    }

    @Test
    void aProcessKilledHalfWayThroughASaveLeavesTheOldFile() throws Exception {
        Library lib = Library.open(Optional.of(home));
        assertTrue(lib.saveMachine(SaveLoop.machine("victim", "the old one"), false).ok());
        Path target = home.resolve("machines/victim.json");
        String before = Files.readString(target);
        Process other = start("stall", target.toString());
        try (BufferedReader r = reader(other)) {
            assertEquals("writing", r.readLine(), "the second process started its save");
            other.destroyForcibly().waitFor();
        }
        assertEquals(before, Files.readString(target));
        assertEquals("the old one", lib.machineFile("victim").get().description());
        assertFalse(Files.exists(home.resolve("machines/not-killed")));
        // the killed process's temporary file may stay behind; listings skip it
        assertEquals(List.of("victim"), lib.machines().stream().filter(e -> !e.builtIn()).map(LibraryEntry::name)
                .toList());
    }
}
