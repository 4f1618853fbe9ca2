package org.hobwright.samples.host;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** The adapter must show that a host needs the api alone: no import of wizard or post code. */
class ApiOnlyTest {
    @Test
    void theAdapterImportsOnlyTheApiOfHobwright() throws IOException {
        try (Stream<Path> files = Files.walk(Path.of("src/main/java"))) {
            List<String> offending = files.filter(p -> p.toString().endsWith(".java"))
                    .flatMap(ApiOnlyTest::lines)
                    .filter(l -> l.startsWith("import org.hobwright.") && !l.startsWith("import org.hobwright.api."))
                    .toList();
            assertEquals(List.of(), offending);
        }
    }

    private static Stream<String> lines(Path p) {
        try {
            return Files.readAllLines(p).stream().map(String::strip);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
