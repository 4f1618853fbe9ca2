package org.hobwright.samples;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class ScenarioFilesTest {
    @Test
    void scenarioFoldersExist() {
        for (String d : new String[] {"jobs", "machines", "dialects", "templates"}) {
            assertTrue(Files.isDirectory(Path.of("scenario", d)), d);
        }
    }
}
