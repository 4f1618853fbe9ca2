package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The fast number text agrees with the JDK's formatter (an independent implementation). */
class TextTest {

    @Test
    void examples() {
        assertEquals("2.346", Text.fixed(2.3456, 3));
        assertEquals("-0.050", Text.fixed(-0.05, 3));
        assertEquals("0.000", Text.fixed(-0.0001, 3), "no minus sign on a value that rounds to zero");
        assertEquals("13", Text.fixed(12.6, 0));
        assertEquals("+0.494308", Text.signed(0.4943076, 6));
        assertEquals("-0.494308", Text.signed(-0.4943076, 6));
    }

    @Test
    void agreesWithStringFormatAwayFromTies() {
        SplittableRandom rnd = new SplittableRandom(42);
        for (int i = 0; i < 10_000; i++) {
            double v = (rnd.nextDouble() - 0.5) * Math.pow(10, rnd.nextInt(-3, 7));
            int d = rnd.nextInt(0, 7);
            double scaled = Math.abs(v) * Math.pow(10, d);
            if (Math.abs(scaled - Math.floor(scaled) - 0.5) < 1e-6) {
                continue; // ties may round either way in binary
            }
            String expected = String.format(Locale.ROOT, "%." + d + "f", v);
            if (expected.matches("-0(\\.0*)?")) {
                expected = expected.substring(1);
            }
            assertEquals(expected, Text.fixed(v, d), v + " with " + d + " decimals");
        }
    }
}
