package org.hobwright.hosttest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.lang.ref.WeakReference;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Set;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.jar.JarOutputStream;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.hobwright.api.Hobwright;
import org.hobwright.api.host.PlannedJob;
import org.hobwright.api.host.Written;
import org.hobwright.api.wizard.Wizard;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * A host loads, uses and closes the plugin several times, replacing the jar in place between
 * rounds (as an update would): each round sees the new jar's built-in machine, and after closing
 * nothing of the plugin stays behind: no descriptor on the jar, no thread, no loader.
 */
class UnloadTest {
    private static final int ROUNDS = 3;

    @TempDir
    Path work;

    @Test
    @EnabledOnOs(OS.LINUX)
    void loadUseCloseReplaceReload() throws Exception {
        Path jar = work.resolve("plugins/hobwright-plugin.jar");
        Files.createDirectories(jar.getParent());
        Files.copy(Host.pluginJar(), jar);
        Path home = Host.shopLibrary(work.resolve("home"));
        Set<String> threadsBefore = threadNames();
        List<WeakReference<ClassLoader>> loaders = new ArrayList<>();
        for (int round = 0; round < ROUNDS; round++) {
            if (round > 0) {
                replaceInPlace(jar, "round-" + round);
            }
            Host.Arrangement arrangement = Host.Arrangement.values()[round % 2];
            loaders.add(new WeakReference<>(useOnce(jar, home, round, arrangement)));
            assertEquals(List.of(), descriptorsOn(jar), "round " + round + ": a descriptor on the jar stays open");
        }
        for (int i = 0; i < 100 && loaders.stream().anyMatch(r -> r.get() != null); i++) {
            System.gc();
            Thread.sleep(20);
        }
        for (int i = 0; i < ROUNDS; i++) {
            assertNull(loaders.get(i).get(), "the loader of round " + i + " was collected");
        }
        Set<String> left = threadNames();
        left.removeAll(threadsBefore);
        assertEquals(Set.of(), left.stream().filter(n -> n.toLowerCase().contains("hobwright"))
                .collect(Collectors.toSet()), "no thread of the plugin is left");
    }

    /** One round: open, list, plan, write, start the wizard, close; returns the closed loader. */
    private ClassLoader useOnce(Path jar, Path home, int round, Host.Arrangement arrangement) throws IOException {
        URLClassLoader plugins = arrangement.loader(jar);
        try (plugins; Hobwright hw = Hobwright.open(plugins, home)) {
            List<String> machines = hw.library().machines();
            for (int r = 1; r < ROUNDS; r++) {
                assertEquals(r == round, machines.contains("round-" + r),
                        "round " + round + " lists the built-in machines of its own jar: " + machines);
            }
            assertTrue(machines.contains("varrow-1605"), machines::toString);
            if (round > 0) {
                assertTrue(hw.library().machine("round-" + round).ok(), "the new built-in machine reads");
            }
            PlannedJob planned = hw.plan(hw.readJob(Host.samples().resolve("jobs/metering-pump-gear.json"))
                    .orElseThrow());
            Written w = hw.write(planned, work.resolve("out-" + round), Host.DATE);
            assertTrue(w.ok(), w::toString);
            Wizard wizard = hw.wizard();
            assertTrue(wizard.answer("gear.teeth", "24").isEmpty());
            assertFalse(descriptorsOn(jar).isEmpty(), "while the loader is open the check sees its descriptor on the jar");
        }
        assertTrue(plugins.getClass().getName().length() > 0);
        return plugins;
    }

    /**
     * Writes a new jar over the old one, byte for byte in the same file: the plugin jar with one
     * more built-in machine, a copy of the sample lathe under a new name.
     */
    private static void replaceInPlace(Path jar, String machine) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (JarFile in = new JarFile(Host.pluginJar().toFile()); JarOutputStream out = new JarOutputStream(bytes)) {
            for (JarEntry e : Collections.list(in.entries())) {
                out.putNextEntry(new JarEntry(e.getName()));
                try (InputStream s = in.getInputStream(e)) {
                    s.transferTo(out);
                }
                out.closeEntry();
            }
            String lathe = Files.readString(Host.samples().resolve("machines/varrow-1605.json"))
                    .replace("\"name\": \"varrow-1605\"", "\"name\": \"" + machine + "\"");
            out.putNextEntry(new JarEntry("org/hobwright/builtin/machines/" + machine + ".json"));
            out.write(lathe.getBytes(StandardCharsets.UTF_8));
            out.closeEntry();
        }
        Files.write(jar, bytes.toByteArray());
    }

    /** The process's open descriptors that point at the file. */
    private static List<String> descriptorsOn(Path file) throws IOException {
        Path real = file.toRealPath();
        List<String> out = new ArrayList<>();
        try (Stream<Path> fds = Files.list(Path.of("/proc/self/fd"))) {
            for (Path fd : fds.toList()) {
                try {
                    Path target = Files.readSymbolicLink(fd);
                    if (target.toString().startsWith(real.toString())) {
                        out.add(fd + " -> " + target);
                    }
                } catch (IOException | UnsupportedOperationException gone) {
                    // closed while listing
                }
            }
        }
        return out;
    }

    private static Set<String> threadNames() {
        return Thread.getAllStackTraces().keySet().stream().filter(Thread::isAlive).map(Thread::getName)
                .collect(Collectors.toSet());
    }

    @Test
    void closedHandleRefusesWork() throws IOException {
        try (URLClassLoader plugins = Host.Arrangement.CHILD_FIRST.loader(Host.pluginJar())) {
            Hobwright hw = Hobwright.open(plugins, work);
            hw.close();
            hw.close();
            assertTrue(hw.isClosed());
            IllegalStateException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalStateException.class,
                    () -> hw.library());
            assertTrue(e.getMessage().contains("closed"), e.getMessage());
            assertFalse(hw.toString().isEmpty());
        }
    }
}
