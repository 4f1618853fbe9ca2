package org.hobwright.wizard.steps;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** The step model is for hosts: nothing in it prints to a console. */
class NoPrintingTest {
    @Test
    void theStepModelNeverTouchesTheConsole() throws IOException {
        Path sources = Path.of("src/main/java/org/hobwright/wizard/steps");
        List<Path> files;
        try (Stream<Path> s = Files.list(sources)) {
            files = s.filter(p -> p.toString().endsWith(".java")).toList();
        }
        assertTrue(files.size() > 5, "the step model's sources are found: " + files);
        for (Path f : files) {
            String text = Files.readString(f);
            for (String forbidden : List.of("System.out", "System.err", "System.console", "printStackTrace")) {
                assertFalse(text.contains(forbidden), f + " uses " + forbidden);
            }
        }
    }
}
