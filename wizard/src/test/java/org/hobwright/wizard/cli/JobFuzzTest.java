package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.hobwright.post.nc.ReadBackWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Fixed-seed fuzzing of whole runs: 2,000 job files made from the sample jobs by one or two
 * mutations each (numbers at every magnitude from the smallest subnormal to the largest double,
 * wrong types, removed keys, empty and odd keys, control characters) are planned and posted by the
 * tool in-process. Every run exits 0, 1 or 2, prints no stack trace and no internal error, stays
 * within a bounded time and allocation, and every program it posts is read back by the tests'
 * NC reader ({@link ReadBackWriter}) without a broken invariant. A failing case names its number
 * and mutations, so that it can be replayed with the same seed.
 */
class JobFuzzTest {
    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final JsonNodeFactory N = JsonNodeFactory.instance;
    private static final int JOBS = 2_000;
    private static final long SEED = 20261205;
    /** Per run: far above a normal plan (tens of milliseconds), far below a hang. */
    private static final long MAX_MILLIS = 10_000;
    /** Per run: far above a normal plan (a few megabytes allocated), far below a runaway. */
    private static final long MAX_ALLOCATED = 512L << 20;

    private static final double[] MAGNITUDES = {0, -0.0, Double.MIN_VALUE, -Double.MIN_VALUE, 2.5e-320,
        Double.MIN_NORMAL, 1e-300, 1e-30, 1e-9, 1e-7, 1e-6, 1e-4, 0.001, 0.01, 0.4, 0.5, 1, 2, 3, 7, 10, 59.999, 60,
        89.9, 90, 100, 250, 1000, 1e4, 1e6, 1e7, 1e9, 3e9, 1e15, 1e30, 1e300, 1e308, Double.MAX_VALUE,
        -1, -1e308};
    private static final List<String> ODD_KEYS = List.of("", " ", "\u001b[2J", "a\nb", "\u202e", "__proto__",
        "gear.teeth", "$schema", "x".repeat(300), "\u00e9", "0");

    @TempDir
    Path dir;

    private static List<ObjectNode> samples() throws IOException {
        List<ObjectNode> jobs = new ArrayList<>();
        try (Stream<Path> files = Files.list(Path.of("../samples/scenario/jobs"))) {
            for (Path f : files.sorted().toList()) {
                jobs.add((ObjectNode) JSON.readTree(Files.readString(f)));
            }
        }
        return jobs;
    }

    private static double number(SplittableRandom r) {
        return switch (r.nextInt(3)) {
            case 0 -> MAGNITUDES[r.nextInt(MAGNITUDES.length)];
            case 1 -> (r.nextBoolean() ? 1 : -1) * r.nextDouble() * Math.pow(10, r.nextInt(-323, 309));
            default -> r.nextDouble() * Math.pow(10, r.nextInt(-3, 4));   // plausible sizes, often planned
        };
    }

    private static JsonNode value(SplittableRandom r) {
        return switch (r.nextInt(12)) {
            case 0 -> N.stringNode("");
            case 1 -> N.stringNode("\u001b[31m" + r.nextInt(100) + "\n");
            case 2 -> N.booleanNode(r.nextBoolean());
            case 3 -> N.nullNode();
            case 4 -> N.objectNode();
            case 5 -> N.arrayNode().add(number(r));
            case 6 -> N.numberNode(r.nextLong());
            default -> N.numberNode(number(r));
        };
    }

    private static void paths(JsonNode node, String path, List<String> out) {
        for (Map.Entry<String, JsonNode> e : node.properties()) {
            String p = path + "/" + e.getKey();
            out.add(p);
            if (e.getValue().isObject()) {
                paths(e.getValue(), p, out);
            }
        }
    }

    /** One mutation of the tree, described for the failure message. */
    private static String mutate(ObjectNode tree, SplittableRandom r) {
        List<String> paths = new ArrayList<>();
        paths(tree, "", paths);
        String path = paths.get(r.nextInt(paths.size()));
        int slash = path.lastIndexOf('/');
        JsonNode parentNode = slash == 0 ? tree : tree.at(path.substring(0, slash));
        ObjectNode parent = (ObjectNode) parentNode;
        String key = path.substring(slash + 1);
        int what = r.nextInt(10);
        if (what == 0) {
            parent.remove(key);
            return "removed " + path;
        }
        if (what == 1) {
            String odd = ODD_KEYS.get(r.nextInt(ODD_KEYS.size()));
            (r.nextBoolean() ? tree : parent).set(odd, value(r));
            return "odd key \"" + odd + "\" near " + path;
        }
        JsonNode v = parent.get(key).isObject() && r.nextBoolean() ? N.numberNode(number(r)) : value(r);
        if (parent.get(key).isNumber() && r.nextInt(3) > 0) {
            v = N.numberNode(number(r));   // numbers mostly stay numbers, so that planning is reached
        }
        parent.set(key, v);
        return path + " = " + v;
    }

    /**
     * The tool's command line made once and run again for every job (picocli sets every option back
     * to its initial value before each parse): building it costs more than a run that stops at a
     * finding.
     */
    private static final class Reused {
        private final StringWriter out = new StringWriter();
        private final StringWriter err = new StringWriter();
        private final CommandLine cl;

        Reused(Path home) {
            CliEnvironment env = new CliEnvironment(new BufferedReader(new StringReader("")), Cli.CLOCK,
                    Map.of("HOBWRIGHT_HOME", home.toString()), JobFuzzTest.class.getClassLoader(), true);
            cl = HobwrightCommand.commandLine(env);
            cl.setOut(new PrintWriter(out, true));
            cl.setErr(new PrintWriter(err, true));
        }

        Cli.Run run(String... args) {
            out.getBuffer().setLength(0);
            err.getBuffer().setLength(0);
            int code = cl.execute(args);
            return new Cli.Run(code, out.toString(), err.toString());
        }
    }

    @Test
    void mutatedJobsExitZeroOneOrTwoWithinBoundsAndPostOnlySafePrograms() throws IOException {
        List<ObjectNode> samples = samples();
        SplittableRandom r = new SplittableRandom(SEED);
        com.sun.management.ThreadMXBean threads =
                (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        long thread = Thread.currentThread().getId();
        long checkedBefore = ReadBackWriter.checked();
        int violationsBefore = ReadBackWriter.violations().size();
        int[] exits = new int[3];
        Reused tool = new Reused(dir);
        Path job = dir.resolve("job.json");
        Path out = dir.resolve("out");
        for (int i = 0; i < JOBS; i++) {
            ObjectNode tree = samples.get(r.nextInt(samples.size())).deepCopy();
            List<String> changes = new ArrayList<>();
            for (int m = 1 + r.nextInt(2); m > 0; m--) {
                changes.add(mutate(tree, r));
            }
            String name = "case " + i + " (seed " + SEED + "): " + String.join("; ", changes);
            Files.writeString(job, JSON.writeValueAsString(tree));
            long allocated = threads.getThreadAllocatedBytes(thread);
            long start = System.nanoTime();
            Cli.Run run = tool.run("plan", job.toString(), "--out", out.toString());
            long millis = (System.nanoTime() - start) / 1_000_000;
            long bytes = threads.getThreadAllocatedBytes(thread) - allocated;
            String all = run.out() + run.err();
            assertTrue(run.code() >= 0 && run.code() <= 2, () -> name + "\n" + run);
            assertFalse(all.contains("Exception") || all.contains("\tat ") || all.contains("internal error"),
                    () -> name + "\n" + run);
            assertFalse(all.contains("\u001b"), () -> name + ": a raw escape character in the output\n" + run);
            assertTrue(millis < MAX_MILLIS, () -> name + ": " + millis + " ms");
            assertTrue(bytes < MAX_ALLOCATED, () -> name + ": " + (bytes >> 20) + " MB allocated");
            assertTrue(run.out().lines().filter(l -> l.contains(job + "): ")).count() <= 1,
                    () -> name + ": one job per run, nothing kept from the run before\n" + run);
            exits[run.code()]++;
        }
        assertEquals(List.of(), ReadBackWriter.violations().subList(violationsBefore,
                ReadBackWriter.violations().size()), "programs read back with broken invariants");
        // the mix shows the fuzzing reaches every outcome: planned and posted, job errors, unreadable
        assertTrue(exits[0] > JOBS / 40 && exits[1] > JOBS / 40 && exits[2] > JOBS / 40,
                () -> "exit 0/1/2: " + exits[0] + "/" + exits[1] + "/" + exits[2]);
        assertTrue(ReadBackWriter.checked() - checkedBefore >= exits[0], "every posted program was read back");
    }
}
