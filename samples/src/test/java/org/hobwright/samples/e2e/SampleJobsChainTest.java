package org.hobwright.samples.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.hobwright.samples.host.CycleImport;
import org.hobwright.samples.host.Operation;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every sample job through the whole chain. A clean job gives all four files; a job with errors
 * gives its findings and no file at all. The program is never the judge of itself here: the
 * ordering rules are the safety invariants of the architecture notes, the CSV is read back by the
 * example host's own reader.
 */
class SampleJobsChainTest {

    static Stream<String> jobs() throws IOException {
        try (Stream<Path> s = Files.list(PlanRun.JOBS)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".json")).sorted().toList().stream();
        }
    }

    /**
     * The warnings and errors each sample is there to show, by finding code (codes are stable and
     * never reused, wizard/FINDINGS.md); every other sample plans without any.
     */
    private static final Map<String, Set<String>> SHOWS = Map.of(
            "dosing-pinion-z12.json", Set.of("GEAR_UNDERCUT"),
            "pump-helical-gear-1605.json", Set.of("MACHINE_NO_HELIX"),
            "counter-wheel-drawing-error.json", Set.of("DRAWING_OUTSIDE_DIAMETER", "DRAWING_INCONSISTENT"));

    @ParameterizedTest(name = "{0}")
    @MethodSource("jobs")
    void theWholeChainRuns(String job, @TempDir Path work) throws IOException {
        PlanRun run = PlanRun.of(job, work);
        Set<String> raised = run.findings().stream().filter(f -> !f.at("/severity").asString().equals("info"))
                .map(f -> f.at("/code").asString()).collect(Collectors.toSet());
        assertEquals(SHOWS.getOrDefault(job, Set.of()), raised, run.describe());
        assertTrue(run.exitCode() == 0 || run.exitCode() == 1, run.describe());
        boolean errors = run.findings().stream().anyMatch(f -> f.at("/severity").asString().equals("error"));
        assertEquals(errors, run.exitCode() == 1, "exit 1 exactly when an error finding is reported\n" + run.describe());
        for (var f : run.findings()) {
            for (String key : List.of("/severity", "/code", "/field", "/message")) {
                assertFalse(f.at(key).asString().isBlank(), key + " of " + f);
            }
        }
        if (errors) {
            assertEquals(List.of(), run.files(), "nothing is written for a job with errors");
            return;
        }
        for (String suffix : List.of(".nc", ".csv", ".html", ".json")) {
            assertTrue(Files.size(run.file(suffix)) > 0, suffix);
        }
        // the cautions go into the program and onto the setup sheet (project rule)
        for (String suffix : List.of(".nc", ".html")) {
            assertTrue(Files.readString(run.file(suffix)).toLowerCase(Locale.ROOT).contains("caution"), "caution in " + suffix);
        }
        assertSafeOrder(CycleImport.operations(Files.readString(run.file(".csv"))), run.number("/cycle/cycleTime"));
        run.assertProgramSafe(job, work);
    }

    /**
     * Safety invariants of the architecture notes ("NC output"), on the CSV as the example host
     * reads it back: sync on before the first cutting move, sync off after the last one and before
     * the spindles stop; the steps' times add up to the cycle time.
     */
    private static void assertSafeOrder(List<Operation> ops, double cycleTimeS) {
        List<String> kinds = ops.stream().map(Operation::kind).toList();
        int syncOn = kinds.indexOf("sync-on");
        int firstFeed = kinds.indexOf("feed");
        int syncOff = kinds.lastIndexOf("sync-off");
        int stop = kinds.lastIndexOf("spindles-stop");
        assertTrue(syncOn >= 0 && firstFeed > syncOn, "sync on before the first feed: " + kinds);
        assertTrue(syncOff > kinds.lastIndexOf("feed") && stop > syncOff, "sync off, then stop: " + kinds);
        assertEquals(cycleTimeS, ops.stream().mapToDouble(Operation::seconds).sum(), 1e-6 * cycleTimeS,
                "the steps' times add up to the cycle time");
    }
}
