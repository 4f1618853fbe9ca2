package org.hobwright.wizard.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** The table "Finding codes: engineering" in DEVELOPERS.md lists exactly the codes of {@link EngineeringCode}. */
class FindingCatalogueTest {

    @Test
    void documentedTableMatchesTheCodes() throws IOException {
        Path doc = Path.of("..", "DEVELOPERS.md");
        String text = Files.readString(doc, StandardCharsets.UTF_8);
        int start = text.indexOf("## Finding codes: engineering");
        assertTrue(start >= 0, "section missing in " + doc.toAbsolutePath());
        int end = text.indexOf("\n## ", start + 1);
        String section = end < 0 ? text.substring(start) : text.substring(start, end);
        Map<String, String> documented = new LinkedHashMap<>();
        for (String line : section.split("\n")) {
            if (line.startsWith("| `")) {
                String[] cells = line.split("\\|");
                documented.put(cells[1].strip().replace("`", ""),
                        cells[2].strip() + " | " + cells[4].strip() + " | " + cells[5].strip());
            }
        }
        Map<String, String> coded = Arrays.stream(EngineeringCode.values()).collect(Collectors.toMap(
                EngineeringCode::code, c -> c.severity().name().toLowerCase(Locale.ROOT) + " | " + c.meaning()
                        + " | " + c.source(), (a, b) -> a, LinkedHashMap::new));
        assertEquals(coded, documented);
    }

    @Test
    void findingsCarryCodeSeverityAndSource() {
        var f = EngineeringCode.GEAR_UNDERCUT.at("gear.profileShift", "message", "fix");
        assertEquals("GEAR_UNDERCUT", f.code());
        assertEquals(EngineeringCode.GEAR_UNDERCUT.severity(), f.severity());
        assertEquals(EngineeringCode.GEAR_UNDERCUT.source(), f.source());
        assertEquals("fix", f.fix().orElseThrow());
    }
}
