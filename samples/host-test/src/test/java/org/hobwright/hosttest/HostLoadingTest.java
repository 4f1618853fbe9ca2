package org.hobwright.hosttest;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.databind.cfg.PackageVersion;
import java.io.IOException;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.hobwright.api.Hobwright;
import org.hobwright.api.host.Outcome;
import org.hobwright.api.host.PlannedJob;
import org.hobwright.api.host.Written;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.CycleWriter;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * A host with Jackson 2 on its own class path loads the plugin jar the two supported ways, reads,
 * plans and writes every sample job through the façade, and gets the same bytes as the terminal
 * tool ({@code hobwright plan JOB --out DIR --home HOME}, {@code SOURCE_DATE_EPOCH} set) for the
 * same library folder: the shop's cutting-data table and its dialect with {@code "maxLineLength": 80.0}.
 */
class HostLoadingTest {
    @TempDir
    static Path work;

    private static Path home;
    /** Job file name → the terminal tool's files (file name → bytes); empty when it wrote nothing. */
    private static final Map<String, Map<String, byte[]>> TERMINAL = new TreeMap<>();

    @BeforeAll
    static void terminalToolOutputs() throws IOException, InterruptedException {
        home = Host.shopLibrary(work.resolve("home"));
        for (Path job : Host.sampleJobs()) {
            Path out = work.resolve("terminal").resolve(job.getFileName().toString());
            ProcessBuilder pb = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-jar", Host.terminalJar().toString(), "plan", job.toString(), "--out", out.toString(),
                    "--home", home.toString());
            pb.environment().put("SOURCE_DATE_EPOCH", Long.toString(Host.EPOCH));
            pb.environment().remove("HOBWRIGHT_HOME");
            pb.redirectErrorStream(true).redirectOutput(work.resolve(job.getFileName() + ".log").toFile());
            Process p = pb.start();
            assertTrue(p.waitFor(120, TimeUnit.SECONDS), "the terminal tool finished");
            assertTrue(p.exitValue() == 0 || p.exitValue() == 1, () -> "exit " + p.exitValue() + ": " + log(job));
            TERMINAL.put(job.getFileName().toString(), files(out));
        }
    }

    @ParameterizedTest
    @EnumSource(Host.Arrangement.class)
    void everySampleJobGivesTheTerminalToolsBytes(Host.Arrangement arrangement) throws Exception {
        assertEquals("2.17.2", PackageVersion.VERSION.toString(), "the host's own Jackson 2");
        assertFalse(hasIsRequired(), "the host's jackson-annotations 2.17 lacks what Jackson 3 reads");
        try (URLClassLoader plugins = arrangement.loader(Host.pluginJar());
             Hobwright hw = Hobwright.open(plugins, home)) {
            assertEquals(List.of(), hw.problems());
            assertSame(Hobwright.class, plugins.loadClass(Hobwright.class.getName()), "one api, the host's");
            CycleWriter nc = hw.writers().stream().filter(w -> w.id().equals("nc")).findFirst().orElseThrow();
            assertNotSame(Host.class.getClassLoader(), nc.getClass().getClassLoader(), "the plugin's own loader");
            int written = 0;
            for (Path job : Host.sampleJobs()) {
                String name = job.getFileName().toString();
                Outcome<HobJob> read = hw.readJob(job);
                assertTrue(read.ok(), () -> name + ": " + read);
                PlannedJob planned = hw.plan(read.orElseThrow());
                Path out = work.resolve(arrangement.name()).resolve(name);
                Written w = hw.write(planned, out, Host.DATE);
                assertEquals(planned.hasErrors(), !w.ok(), () -> name + ": " + w);
                Map<String, byte[]> mine = files(out);
                Map<String, byte[]> terminal = TERMINAL.get(name);
                assertEquals(terminal.keySet(), mine.keySet(), () -> name + ": the same files; " + log(job));
                for (String f : terminal.keySet()) {
                    assertArrayEquals(terminal.get(f), mine.get(f), () -> name + ": " + f + " differs");
                }
                written += mine.size();
            }
            assertTrue(written >= 24, "six sample jobs can be written, four files each: " + written);
        }
    }

    @ParameterizedTest
    @EnumSource(Host.Arrangement.class)
    void theShopsDialectAndCuttingDataAreUsed(Host.Arrangement arrangement) throws IOException {
        try (URLClassLoader plugins = arrangement.loader(Host.pluginJar());
             Hobwright hw = Hobwright.open(plugins, home)) {
            assertTrue(hw.library().dialect("varrow-ctl").orElseThrow().contains("80.0"), "the saved dialect");
            assertEquals(70.0, hw.library().cuttingData("steel-free-machining", "hss-coated").orElseThrow()
                    .cuttingSpeedMPerMin().min(), "the shop's row");
            PlannedJob planned = hw.plan(hw.readJob(Host.samples().resolve("jobs/metering-pump-gear.json"))
                    .orElseThrow());
            double vc = planned.cycle().setup().orElseThrow().cuttingSpeedMPerMin();
            assertTrue(vc >= 70 * 0.999 && vc <= 80 * 1.001, "speed from the shop's range 70–80 m/min: " + vc);
            Written w = hw.write(planned, work.resolve("dialect-" + arrangement), Host.DATE);
            assertTrue(w.ok(), w::toString);
            List<String> nc = Files.readAllLines(w.files().stream().filter(f -> f.toString().endsWith(".nc"))
                    .findFirst().orElseThrow());
            assertTrue(nc.stream().allMatch(l -> l.length() <= 80), "no block over 80 characters");
            assertTrue(nc.stream().anyMatch(l -> l.length() > 72), "comments wrapped at 80, not at the built-in 72");
        }
    }

    private static boolean hasIsRequired() {
        try {
            JsonProperty.class.getMethod("isRequired");
            return true;
        } catch (NoSuchMethodException e) {
            return false;
        }
    }

    private static Map<String, byte[]> files(Path folder) throws IOException {
        Map<String, byte[]> out = new TreeMap<>();
        if (!Files.isDirectory(folder)) {
            return out;
        }
        try (Stream<Path> s = Files.list(folder)) {
            for (Path p : s.toList()) {
                out.put(p.getFileName().toString(), Files.readAllBytes(p));
            }
        }
        return out;
    }

    private static String log(Path job) {
        try {
            return Files.readString(work.resolve(job.getFileName() + ".log"));
        } catch (IOException e) {
            return "(no log)";
        }
    }

    static List<String> names(List<Path> paths) {
        List<String> out = new ArrayList<>();
        paths.forEach(p -> out.add(p.getFileName().toString()));
        return out;
    }
}
