package org.hobwright.samples.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.hobwright.post.nc.NcReader;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * Every sample job that plans cleanly, planned once with climb and once with conventional hobbing
 * through the whole chain: both programs are written (so the writer's own safety re-check and the
 * post tests' independent program reader, run on every posted program, found nothing wrong), the hob spindle word is the same in both
 * (a hob cuts in one sense only) and the cutting moves run the other way.
 */
class ClimbAndConventionalTest {
    private static final JsonMapper JSON = JsonMapper.builder().build();

    static Stream<String> jobs() throws IOException {
        List<String> clean = new ArrayList<>();
        for (String job : SampleJobsChainTest.jobs().toList()) {
            if (!job.contains("drawing-error") && !job.endsWith("gear-1605.json")) {
                clean.add(job);
            }
        }
        return clean.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("jobs")
    void theHobKeepsItsSenseAndTheFeedTurnsRound(String job, @TempDir Path work) throws IOException {
        Result climb = run(job, "climb", work.resolve("climb"));
        Result conventional = run(job, "conventional", work.resolve("conventional"));
        assertEquals(climb.hobWord(), conventional.hobWord(), "the same hob spindle word");
        assertNotEquals(climb.feedSign(), conventional.feedSign(), "the cutting moves run the other way");
    }

    /** A plan of the job with the method set, read back by the independent reader. */
    private static Result run(String job, String method, Path work) throws IOException {
        ObjectNode tree = (ObjectNode) JSON.readTree(Files.readString(PlanRun.JOBS.resolve(job)));
        ((ObjectNode) tree.get("cycle")).put("method", method);
        Files.createDirectories(work);
        Path file = work.resolve(job);
        Files.writeString(file, JSON.writeValueAsString(tree));
        PlanRun run = PlanRun.of(file.toAbsolutePath().toString(), work);
        assertEquals(0, run.exitCode(), run.describe());
        String machineName = tree.get("machine").asString();
        JsonNode machine = SampleFiles.machine(machineName);
        String dialectText = Files.readString(PlanRun.JOBS.resolveSibling("dialects")
                .resolve(machine.get("dialect").asString() + ".json"));
        NcReader reader = new NcReader(dialectText);
        List<NcReader.Block> blocks = reader.blocks(Files.readString(run.file(".nc")));
        List<String> found = blocks.stream().filter(b -> b.is("syncOn") || b.is("syncOnHelix"))
                .map(b -> b.values().get("hobDir")).toList();
        assertEquals(1, found.size(), "one synchronisation with the hob spindle's word: " + found);
        return new Result(found.get(0), feedSign(blocks));
    }

    /** +1 when the cutting moves run toward larger axial words, −1 the other way. */
    static int feedSign(List<NcReader.Block> blocks) {
        double last = Double.NaN;
        int sign = 0;
        for (NcReader.Block b : blocks) {
            if (!b.is("rapid") && !b.is("feed")) {
                continue;
            }
            double z = b.number("axial");
            if (b.is("feed") && !Double.isNaN(last) && z != last) {
                int s = z > last ? 1 : -1;
                assertTrue(sign == 0 || sign == s, "every cutting move the same way");
                sign = s;
            }
            last = z;
        }
        assertFalse(sign == 0, "the program has cutting moves");
        return sign;
    }

    private record Result(String hobWord, int feedSign) {
    }
}
