package org.hobwright.samples.e2e;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * A sample job's files as plain JSON, read beside Hobwright's own readers so that tests can check
 * its outputs against what the files say: the job, the machine profile it names and that machine's
 * dialect.
 *
 * @param job         the job file
 * @param machine     the machine profile the job names
 * @param dialectText the dialect file of that machine, as text
 * @param dialect     the same, as a tree
 */
record SampleFiles(JsonNode job, JsonNode machine, String dialectText, JsonNode dialect) {
    private static final JsonMapper JSON = JsonMapper.builder().build();

    /** The files of a job in {@link PlanRun#JOBS}. */
    static SampleFiles of(String jobFile) throws IOException {
        JsonNode job = JSON.readTree(Files.readString(PlanRun.JOBS.resolve(jobFile)));
        JsonNode machine = machine(job.get("machine").asString());
        String dialect = Files.readString(PlanRun.JOBS.resolveSibling("dialects")
                .resolve(machine.get("dialect").asString() + ".json"));
        return new SampleFiles(job, machine, dialect, JSON.readTree(dialect));
    }

    /** A sample machine profile by name. */
    static JsonNode machine(String name) throws IOException {
        Path file = PlanRun.JOBS.resolveSibling("machines").resolve(name + ".json");
        return JSON.readTree(Files.readString(file));
    }
}
