package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** Library names against the rule written as a regular expression (java.util.regex as the reference). */
class NamesTest {
    private static final Pattern RULE = Pattern.compile("[A-Za-z0-9_-][A-Za-z0-9._-]{0,63}");

    @Test
    void sameAnswerAsTheRegularExpression() {
        SplittableRandom random = new SplittableRandom(5);
        String alphabet = "aZ09._-/\\ üé:*?\u0000";
        for (int n = 0; n < 50_000; n++) {
            StringBuilder sb = new StringBuilder();
            for (int i = random.nextInt(random.nextInt(8) == 0 ? 80 : 8); i > 0; i--) {
                sb.append(alphabet.charAt(random.nextInt(alphabet.length())));
            }
            String name = sb.toString();
            assertEquals(RULE.matcher(name).matches(), Names.valid(name), "\"" + name + "\"");
        }
    }

    @Test
    void edges() {
        assertTrue(Names.valid("varrow-1605"));
        assertTrue(Names.valid("brass_fine.2"));
        assertTrue(Names.valid("x".repeat(64)));
        assertFalse(Names.valid("x".repeat(65)));
        assertFalse(Names.valid(".hidden"));
        assertFalse(Names.valid("../x"));
        assertFalse(Names.valid(""));
        assertFalse(Names.valid(null));
    }

    /** The field of a job's or template's name is "name": the message says it once. */
    @Test
    void theMessageNamesTheFieldOnce() {
        assertEquals("name \"a b\" is not allowed: only letters, digits, '.', '_' and '-' are allowed",
                Names.check("name", "a b").orElseThrow().message());
        assertEquals("machine name \".x\" is not allowed: it starts with a dot",
                Names.check("machine", ".x").orElseThrow().message());
    }
}
