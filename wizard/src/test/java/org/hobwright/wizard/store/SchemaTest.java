package org.hobwright.wizard.store;

import static org.hobwright.wizard.store.StoreTesting.BAD_FILES;
import static org.hobwright.wizard.store.StoreTesting.RESOURCES;
import static org.hobwright.wizard.store.StoreTesting.SCENARIO;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.networknt.schema.Error;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tools.jackson.core.JacksonException;
import tools.jackson.core.StreamReadFeature;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The JSON Schemas (draft 2020-12) against the sample files and the bad-file corpus, checked
 * with an independent general-purpose validator (networknt json-schema-validator).
 */
class SchemaTest {
    private static final SchemaRegistry REGISTRY = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12);
    /** Repeated keys are not valid input for the schema check either (RFC 8259 §4: names SHOULD be unique). */
    private static final JsonMapper STRICT = JsonMapper.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION).build();

    @TempDir
    static Path home;

    private static Schema schema(String kind) {
        // the copies bundled on the class path, which are the files of samples/scenario/schema
        return REGISTRY.getSchema(SchemaLocation.of("classpath:org/hobwright/builtin/schema/" + kind + ".schema.json"));
    }

    /** The schema errors of a file; a file that is not JSON gives one pseudo-error. */
    private static List<String> schemaErrors(Path file, String kind) throws IOException {
        JsonNode node;
        try {
            node = STRICT.readTree(Files.readString(file));
        } catch (JacksonException e) {
            return List.of("not JSON: " + e.getOriginalMessage());
        }
        if (node == null || node.isMissingNode()) {
            return List.of("empty");
        }
        return schema(kind).validate(node).stream().map(Error::toString).toList();
    }

    private static String kindOf(Path file) {
        String dir = file.getParent().getFileName().toString();
        String parent = file.getParent().getParent().getFileName().toString();
        if (dir.equals("jobs") || file.getFileName().toString().startsWith("job") || dir.equals("store")) {
            return "job";
        }
        if (dir.equals("machines") || file.getFileName().toString().startsWith("machine")) {
            return "machine";
        }
        if (parent.equals("templates") || file.getFileName().toString().startsWith("template")) {
            return "template";
        }
        throw new IllegalArgumentException("no schema for " + file);
    }

    static Stream<Path> sampleFiles() throws IOException {
        Stream<Path> samples = Stream.of("jobs", "machines", "templates").map(SCENARIO::resolve)
                .flatMap(d -> {
                    try {
                        return Files.walk(d).filter(p -> p.toString().endsWith(".json")).sorted().toList().stream();
                    } catch (IOException e) {
                        throw new java.io.UncheckedIOException(e);
                    }
                });
        return Stream.concat(samples, Stream.of(RESOURCES.resolve("instrument-gear-in.json"),
                RESOURCES.resolve("instrument-gear-mm.json")));
    }

    static Stream<Path> badFiles() throws IOException {
        try (Stream<Path> s = Files.list(BAD_FILES)) {
            return s.sorted().toList().stream();
        }
    }

    @Test
    void everySampleKindIsThere() throws IOException {
        assertTrue(sampleFiles().count() >= 7, "jobs, machines and templates of the scenario");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("sampleFiles")
    void everyShippedFileValidatesAndReads(Path file) throws IOException {
        String kind = kindOf(file);
        assertEquals(List.of(), schemaErrors(file, kind), file.toString());
        String schemaRef = STRICT.readTree(Files.readString(file)).path("$schema").asString("");
        assertTrue(Files.isRegularFile(file.getParent().resolve(schemaRef)),
                file + " points to its schema with a relative $schema, was \"" + schemaRef + "\"");
        Loaded<?> read = switch (kind) {
            case "job" -> new JobReader(Library.open(Optional.of(home))).read(file);
            case "machine" -> Library.readMachineFile(file);
            default -> Library.readTemplateFile(file);
        };
        assertTrue(read.ok() && read.findings().isEmpty(), file + ": " + read.findings());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badFiles")
    void everyBadFileIsRejectedByTheSchemaAndTheReader(Path file) throws IOException {
        String kind = kindOf(file);
        assertFalse(schemaErrors(file, kind).isEmpty(), file + " passes the schema");
        Loaded<?> read = switch (kind) {
            case "job" -> new JobReader(Library.open(Optional.of(home))).read(file);
            case "machine" -> Library.readMachineFile(file);
            default -> Library.readTemplateFile(file);
        };
        assertTrue(read.value().isEmpty() && read.hasErrors(), file + " passes the reader");
        assertFalse(read.errorLine().isBlank());
        assertFalse(read.errorLine().contains("\n"), "one line: " + read.errorLine());
        assertTrue(read.errorLine().contains(file.toString()) || read.errorLine().contains(file.getFileName().toString()),
                "names the file: " + read.errorLine());
    }
}
