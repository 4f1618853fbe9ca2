package org.hobwright.samples.host;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.hobwright.api.Hobwright;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.HobCycle;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The example host as it ships: the plugin jar on the host's own class loader, the api and the
 * example host on this module's class path (with Jackson 2, as a host may carry it). The blank
 * wizard is answered from the shipped example answers, the façade writes the files, the operations
 * imported from the CSV are the cycle's steps, and the host closes the façade and its loader.
 */
class ExampleHostTest {

    private static final Path ANSWERS = Path.of(System.getProperty("hobwright.samples"))
            .resolveSibling("src/main/resources/example-host/dosing-pinion.properties");

    @TempDir
    Path work;

    private final StringWriter screen = new StringWriter();

    private HostSession.Result runSession() throws IOException {
        Path answers = work.resolve("answers.properties");
        Files.writeString(answers, Files.readString(ANSWERS) + "\nhost.home = "
                + work.resolve("home").toString().replace("\\", "/") + "\n");
        try (URLClassLoader plugins = new URLClassLoader(new URL[] {pluginJar().toUri().toURL()},
                getClass().getClassLoader());
             Hobwright hw = Hobwright.open(plugins, work.resolve("home"))) {
            assertEquals(List.of(), hw.problems());
            return new HostSession(hw, new PrintWriter(screen, true)).run(AnswerSheet.read(answers),
                    work.resolve("out"));
        }
    }

    private static Path pluginJar() {
        return Path.of(System.getProperty("hobwright.pluginJar"));
    }

    @Test
    void theCommandLineHostExitsZeroAndWritesEveryFile() throws IOException {
        Path answers = work.resolve("answers.properties");
        Files.writeString(answers, Files.readString(ANSWERS) + "\nhost.home = "
                + work.resolve("home").toString().replace("\\", "/") + "\n");
        PrintWriter out = new PrintWriter(screen, true);
        assertEquals(0, ExampleHost.run(new String[] {answers.toString(), work.resolve("cli").toString(),
                pluginJar().toString()}, out), screen::toString);
        assertTrue(Files.isRegularFile(work.resolve("cli/dosing-pinion-z12-shifted.nc")), screen::toString);
    }

    @Test
    void theCsvImportRebuildsTheCycleStepByStep() throws IOException {
        HostSession.Result r = runSession();
        assertEquals(HostSession.Status.DONE, r.status(), screen.toString());
        HobCycle cycle = r.cycle().orElseThrow();
        List<CycleStep> steps = cycle.steps();
        assertEquals(steps.size(), r.operations().size(), screen.toString());
        for (int i = 0; i < steps.size(); i++) {
            Operation op = r.operations().get(i);
            assertEquals(steps.get(i).kind(), op.kind(), "step " + (i + 1));
            assertEquals(steps.get(i).seconds(), op.seconds(), 1e-6 + 1e-9 * steps.get(i).seconds(), "step " + (i + 1));
            if (steps.get(i) instanceof CycleStep.Feed f) {
                assertPosition(f.diameterMm(), f.axialMm(), op);
                assertEquals(f.feedMmPerRev(), op.number("feed_mm_per_rev").orElseThrow(), 1e-6, "feed " + op);
            } else if (steps.get(i) instanceof CycleStep.Rapid rapid) {
                assertPosition(rapid.diameterMm(), rapid.axialMm(), op);
            } else if (steps.get(i) instanceof CycleStep.SyncOn sync) {
                assertEquals(sync.hobTurns(), op.number("hob_turns").orElseThrow(), "ratio " + op);
                assertEquals(sync.workTurns(), op.number("work_turns").orElseThrow(), "ratio " + op);
            }
        }
        assertEquals(cycle.stepSeconds(), r.operations().stream().mapToDouble(Operation::seconds).sum(), 1e-4);
    }

    private static void assertPosition(double diameterMm, double axialMm, Operation op) {
        assertEquals(diameterMm, op.number("diameter_mm").orElseThrow(), 1e-6, "diameter " + op);
        assertEquals(axialMm, op.number("axial_mm").orElseThrow(), 1e-6, "axial " + op);
    }

    @Test
    void theHostShowsEveryStepAndWritesEveryFile() throws IOException {
        HostSession.Result r = runSession();
        String text = screen.toString();
        for (String step : List.of("== GEAR", "== CUTTER", "== MACHINE", "== CYCLE", "== REVIEW")) {
            assertTrue(text.contains(step), step + " shown:\n" + text);
        }
        for (String suffix : List.of(".nc", ".csv", ".html", ".json")) {
            assertTrue(r.written().stream().anyMatch(p -> p.toString().endsWith(suffix)), suffix + " in " + r.written());
        }
        // hob d_m0 = 24 − 2 · 1.25 · 0.8 = 22 mm, sin γ = m / d_m0 (FORMULAS.md §4.1);
        // spur gear with a right-hand hob: η = −γ (FORMULAS.md §4.2)
        double gamma = Math.toDegrees(Math.asin(0.8 / 22.0));
        assertEquals(-gamma, r.cycle().orElseThrow().setup().orElseThrow().swivelAngleDeg(), 1e-9);
    }

    @Test
    void usageAndUnreadableAnswersExitWithTwo() {
        PrintWriter out = new PrintWriter(screen, true);
        assertEquals(2, ExampleHost.run(new String[0], out));
        assertEquals(2, ExampleHost.run(new String[] {work.resolve("missing.properties").toString(), "x"}, out));
        assertEquals(2, ExampleHost.run(new String[] {ANSWERS.toString(), "x", work.resolve("none.jar").toString()},
                out));
    }
}
