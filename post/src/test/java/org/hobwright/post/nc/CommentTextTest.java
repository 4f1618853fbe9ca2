package org.hobwright.post.nc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Comment text reaches the control as plain printable ASCII without the dialect's forbidden characters. */
class CommentTextTest {

    @Test
    void anglesBecomeWordsAndForbiddenCharactersSpaces() {
        Dialect.CommentRules rules = new Dialect.CommentRules(true, "()");
        assertEquals("SWIVEL -13 DEG 14 MIN 12.4 SEC, 1 START S, ZAHNRAD A?",
                CommentText.clean("Swivel −13° 14′ 12.4″, 1 start(s), Zahnrad ä\u2603", rules));
    }

    @Test
    void spacesAreTidiedAsTheRegularExpressionsWould() {
        java.util.SplittableRandom random = new java.util.SplittableRandom(7);
        String alphabet = "  ,;:.aB";
        for (int n = 0; n < 20_000; n++) {
            StringBuilder sb = new StringBuilder();
            for (int i = random.nextInt(12); i > 0; i--) {
                sb.append(alphabet.charAt(random.nextInt(alphabet.length())));
            }
            String text = sb.toString().strip();
            String expected = text.replaceAll(" {2,}", " ").replaceAll(" ([,;:.])", "$1");
            assertEquals(expected, CommentText.tidySpaces(text), "\"" + text + "\"");
        }
    }

    @Test
    void wrapsAtSpacesWithinTheWidth() {
        List<String> pieces = CommentText.wrap("KEEP THE GUARDS CLOSED AND NEVER REACH IN", 16);
        assertEquals(List.of("KEEP THE GUARDS", "CLOSED AND NEVER", "REACH IN"), pieces);
        pieces.forEach(p -> assertTrue(p.length() <= 16, p));
    }
}
