package org.hobwright.samples;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

class ScenarioFilesTest {
    @Test
    void scenarioHasJobsAndMachines() throws IOException {
        for (String d : new String[] {"jobs", "machines"}) {
            try (Stream<Path> files = Files.list(Path.of("scenario", d))) {
                assertTrue(files.anyMatch(p -> p.toString().endsWith(".json")), d);
            }
        }
    }
}
