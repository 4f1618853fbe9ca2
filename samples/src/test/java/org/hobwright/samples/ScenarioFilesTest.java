package org.hobwright.samples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** The scenario's files hang together: names, folders, schemas, references and the README. */
class ScenarioFilesTest {

    private static final Path SCENARIO = Path.of("scenario");
    private static final JsonMapper JSON = JsonMapper.builder().build();

    private static List<Path> files(String folder) throws IOException {
        try (Stream<Path> s = Files.walk(SCENARIO.resolve(folder))) {
            return s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
    }

    private static JsonNode read(Path p) throws IOException {
        return JSON.readTree(Files.readString(p));
    }

    private static String baseName(Path p) {
        return p.getFileName().toString().replaceFirst("\\.json$", "");
    }

    @Test
    void scenarioFoldersExist() {
        for (String d : new String[] {"jobs", "machines", "dialects", "templates"}) {
            assertTrue(Files.isDirectory(SCENARIO.resolve(d)), d);
        }
    }

    @Test
    void everyJobNamesItselfPointsToItsSchemaAndUsesAShippedMachine() throws IOException {
        for (Path p : files("jobs")) {
            JsonNode job = read(p);
            assertEquals("../schema/job.schema.json", job.at("/$schema").asString(), p.toString());
            assertEquals("hobwright-job", job.at("/format").asString(), p.toString());
            assertEquals(baseName(p), job.at("/name").asString(), p + ": name matches the file name");
            String machine = job.at("/machine").asString();
            assertTrue(Files.isRegularFile(SCENARIO.resolve("machines/" + machine + ".json")), p + " → " + machine);
            String template = job.at("/cycle/template").asString("");
            if (!template.isEmpty()) {
                assertTrue(Files.isRegularFile(SCENARIO.resolve("templates/" + machine + "/" + template + ".json")),
                        p + " → template " + template);
            }
        }
    }

    @Test
    void everyMachineHasItsDialectAndATemplate() throws IOException {
        for (Path p : files("machines")) {
            JsonNode m = read(p);
            assertEquals(baseName(p), m.at("/name").asString(), p.toString());
            String dialect = m.at("/dialect").asString();
            assertTrue(Files.isRegularFile(SCENARIO.resolve("dialects/" + dialect + ".json")), p + " → " + dialect);
            assertTrue(files("templates/" + baseName(p)).size() >= 1, "a saved template for " + baseName(p));
        }
    }

    @Test
    void everyTemplateSitsUnderItsMachineAndPointsToItsSchema() throws IOException {
        for (Path p : files("templates")) {
            JsonNode t = read(p);
            assertEquals("../../schema/template.schema.json", t.at("/$schema").asString(), p.toString());
            assertEquals(baseName(p), t.at("/name").asString(), p.toString());
            assertEquals(p.getParent().getFileName().toString(), t.at("/machine").asString(), p.toString());
        }
    }

    @Test
    void theReadmeSaysWhatEveryJobShows() throws IOException {
        String readme = Files.readString(Path.of("README.md"));
        for (Path p : files("jobs")) {
            assertTrue(readme.contains("`" + p.getFileName() + "`"), "README.md describes " + p.getFileName());
        }
    }
}
