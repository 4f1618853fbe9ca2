package org.hobwright.wizard.store;

import static org.hobwright.wizard.store.StoreTesting.SCENARIO;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The JSON Schemas in {@code samples/scenario/schema} ({@code job}, {@code machine},
 * {@code template}) are the ones the field table gives ({@link SchemaFromTable}): every key, type,
 * range, choice and default the readers and the wizard use. After a change of the table, run this
 * test with {@code HOBWRIGHT_WRITE_SCHEMAS=1} in the environment to rewrite them, then review the
 * diff. ({@link SchemaTest} checks the samples and the bad files against them with an independent
 * validator.)
 */
class SchemaFilesTest {
    private static final Path SCHEMAS = SCENARIO.resolve("schema");

    @Test
    void theSchemasFollowTheFieldTable() throws IOException {
        boolean write = "1".equals(System.getenv("HOBWRIGHT_WRITE_SCHEMAS"));
        for (Map.Entry<String, String> e : SchemaFromTable.all().entrySet()) {
            Path file = SCHEMAS.resolve(e.getKey());
            if (write) {
                Files.writeString(file, e.getValue());
            }
            assertEquals(e.getValue(), Files.readString(file), file + " is stale: run SchemaFilesTest with"
                    + " HOBWRIGHT_WRITE_SCHEMAS=1 and review the diff");
        }
    }
}
