package org.hobwright.post.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Drawing coordinates against the JDK's BigDecimal rounding of the exact binary value to hundredths. */
class MarkupCoordinateTest {

    private static String reference(double v) {
        BigDecimal r = new BigDecimal(v).setScale(2, RoundingMode.HALF_UP).stripTrailingZeros();
        if (r.signum() == 0) {
            return "0";
        }
        return r.scale() < 0 ? r.setScale(0).toPlainString() : r.toPlainString();
    }

    @Test
    void hundredthsOfTheBinaryValueAwayFromTies() {
        SplittableRandom random = new SplittableRandom(42);
        int compared = 0;
        for (int i = 0; i < 200_000; i++) {
            double v = (random.nextDouble() * 2 - 1) * Math.pow(10, random.nextInt(-3, 5));
            double frac = Math.abs(v * 100) % 1;
            if (Math.abs(frac - 0.5) < 1e-6) {
                continue; // a tie within the product's rounding: either neighbour is a right drawing
            }
            String text = Markup.coordinate(v);
            assertEquals(reference(v), text, "coordinate of " + v);
            assertFalse(text.endsWith(".") || text.endsWith("0") && text.contains("."), text);
            assertTrue(Math.abs(Double.parseDouble(text) - v) <= 0.005 + 1e-12, text + " for " + v);
            compared++;
        }
        assertTrue(compared > 190_000, "compared " + compared);
    }

    @Test
    void plainCases() {
        assertEquals("240", Markup.coordinate(240));
        assertEquals("12.5", Markup.coordinate(12.5));
        assertEquals("-0.07", Markup.coordinate(-0.0749));
        assertEquals("0", Markup.coordinate(-0.004));
        assertEquals("0.1", Markup.coordinate(0.0999));
        assertEquals("100", Markup.coordinate(99.999));
        assertThrows(IllegalArgumentException.class, () -> Markup.coordinate(Double.NaN));
    }
}
