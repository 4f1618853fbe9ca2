package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.check.Severity;
import org.junit.jupiter.api.Test;

/** The finding codes and their table in DEVELOPERS.md say the same. */
class InputCodeTest {
    private static final String SECTION = "## Finding codes: input and library";

    @Test
    void theDocumentedTableMatchesTheCodes() throws IOException {
        String doc = Files.readString(Path.of("..", "DEVELOPERS.md"));
        int start = doc.indexOf(SECTION);
        int end = doc.indexOf("\n## ", start + SECTION.length());
        String section = doc.substring(start, end < 0 ? doc.length() : end);
        List<String> documented = new ArrayList<>();
        for (String line : section.split("\n")) {
            if (line.startsWith("| `")) {
                documented.add(line.strip());
            }
        }
        List<String> expected = new ArrayList<>();
        for (InputCode c : InputCode.values()) {
            int exit = c.unreadable() ? 2 : c.severity() == Severity.ERROR ? 1 : 0;
            expected.add("| `" + c.name() + "` | " + c.severity().word() + " | " + exit + " | " + c.meaning() + " |");
        }
        assertEquals(expected, documented);
    }
}
