package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

/** The planner's finding codes and their table in DEVELOPERS.md say the same. */
class PlanCodesTest {
    private static final String SECTION = "## Finding codes: planner";

    @Test
    void theDocumentedTableMatchesTheCodes() throws IOException, IllegalAccessException {
        String doc = Files.readString(Path.of("..", "DEVELOPERS.md"));
        int start = doc.indexOf(SECTION);
        int end = doc.indexOf("\n## ", start + SECTION.length());
        Set<String> documented = new TreeSet<>();
        for (String line : doc.substring(start, end < 0 ? doc.length() : end).split("\n")) {
            if (line.startsWith("| `PLAN_")) {
                documented.add(line.substring(3, line.indexOf('`', 3)));
            }
        }
        Set<String> codes = new TreeSet<>();
        for (Field f : PlanCodes.class.getFields()) {
            if (Modifier.isStatic(f.getModifiers()) && f.getType() == String.class
                    && ((String) f.get(null)).startsWith("PLAN_")) {
                codes.add((String) f.get(null));
            }
        }
        assertEquals(codes, documented);
    }
}
