package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.SplittableRandom;
import org.hobwright.api.job.HobJob;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Robustness: 10,000 jobs with one value broken at random (wrong type, zero, negative, huge,
 * not finite, removed, an extra key) never make the reader throw; each gives a job or an error.
 */
class ReaderFuzzTest {
    private static final JsonNodeFactory N = JsonNodeFactory.instance;

    @TempDir
    Path home;

    private static final List<JsonNode> BAD_VALUES = List.of(N.numberNode(0), N.numberNode(-1), N.numberNode(1e308),
            N.numberNode(-1e308), N.numberNode(Double.NaN), N.numberNode(Double.NEGATIVE_INFINITY), N.numberNode(0.5),
            N.numberNode(3_000_000_000L), N.stringNode(""), N.stringNode("abc"), N.stringNode("-"),
            N.stringNode("1°75'"), N.stringNode("../x"), N.booleanNode(true), N.nullNode(), N.objectNode(),
            N.arrayNode());

    private static void leaves(JsonNode node, String path, List<String> out) {
        for (Map.Entry<String, JsonNode> e : node.properties()) {
            String p = path.isEmpty() ? e.getKey() : path + "/" + e.getKey();
            out.add(p);
            if (e.getValue().isObject()) {
                leaves(e.getValue(), p, out);
            }
        }
    }

    @Test
    void brokenValuesGiveFindingsNeverExceptions() {
        // fixed seed, so that a failure can be replayed from its message
        SplittableRandom r = new SplittableRandom(20261201);
        JobReader reader = new JobReader(Library.open(Optional.of(home)));
        RandomJobs jobs = new RandomJobs(42);
        int ok = 0;
        for (int i = 0; i < 10_000; i++) {
            ObjectNode tree = JobWriter.jobTree(jobs.job(), r.nextBoolean() ? org.hobwright.api.job.Units.MM
                    : org.hobwright.api.job.Units.IN, r.nextInt(4) == 0);
            List<String> paths = new ArrayList<>();
            leaves(tree, "", paths);
            String path = paths.get(r.nextInt(paths.size()));
            int slash = path.lastIndexOf('/');
            ObjectNode parent = (ObjectNode) (slash < 0 ? tree : tree.at("/" + path.substring(0, slash)));
            String key = path.substring(slash + 1);
            int what = r.nextInt(10);
            String change;
            if (what == 0) {
                parent.remove(key);
                change = "removed " + path;
            } else if (what == 1) {
                parent.put(key + "X", 1);
                change = "added " + path + "X";
            } else {
                JsonNode v = BAD_VALUES.get(r.nextInt(BAD_VALUES.size()));
                parent.set(key, v);
                change = path + " = " + v;
            }
            String caseName = "case " + i + ": " + change;
            Loaded<HobJob> loaded;
            try {
                loaded = reader.read(tree, "fuzz");
            } catch (RuntimeException e) {
                throw new AssertionError(caseName + " threw " + e, e);
            }
            assertEquals(loaded.ok(), !loaded.hasErrors(), caseName);
            if (loaded.ok()) {
                ok++;
            } else {
                assertFalse(loaded.errorLine().isBlank(), caseName);
                assertTrue(loaded.findings().stream().filter(f -> f.isError()).allMatch(f -> !f.field().isBlank()),
                        caseName);
            }
        }
        assertTrue(ok > 0 && ok < 10_000, "some broken values are harmless (e.g. a removed optional key), most are not: "
                + ok);
    }
}
