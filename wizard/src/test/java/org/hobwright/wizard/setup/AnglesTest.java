package org.hobwright.wizard.setup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class AnglesTest {

    // Reading: by definition of the minute (1/60°) and second (1/3600°); 13°14'12" = 13 + 14/60 + 12/3600.
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "1.5|1.5", "1°30'|1.5", "1 30 0|1.5", "1° 30′ 0″|1.5", "-1°30'|-1.5", "13d14m12s|13.236666666666666",
        "0°5'|0.08333333333333333", "20|20", "14.5°|14.5", "+2 0 36|2.01"})
    void readsDecimalAndDms(String text, double expected) {
        assertEquals(expected, Angles.parse(text).orElseThrow(), 1e-12, text);
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "abc", "1°60'", "1 2 60", "NaN", "Infinity", "1..2"})
    void rejectsWhatIsNotAnAngle(String text) {
        assertTrue(Angles.parse(text).isEmpty(), text);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "13.2368|13° 14′ 12.5″", "1.76323|1° 45′ 47.6″", "-1.76323|-1° 45′ 47.6″", "29.999999|30° 00′ 00.0″",
        "0|0° 00′ 00.0″"})
    void formatsDmsWithCarry(double deg, String expected) {
        assertEquals(expected, Angles.dms(deg));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"13.2368|13° 14′", "16.7632|16° 46′", "-1.76323|-1° 46′"})
    void formatsDegreesMinutes(double deg, String expected) {
        assertEquals(expected, Angles.degreesMinutes(deg));
    }

    // Both ways: reading back the DMS text gives the angle to the 0.05″ the text is rounded to (definition of
    // the minute and second); 10,000 fixed-seed angles between −90° and 90°.
    @org.junit.jupiter.api.Test
    void dmsTextReadsBackToTheAngle() {
        java.util.SplittableRandom r = new java.util.SplittableRandom(3600);
        for (int i = 0; i < 10_000; i++) {
            double a = r.nextDouble(-90, 90);
            assertEquals(a, Angles.parse(Angles.dms(a)).orElseThrow(), 0.05 / 3600 + 1e-12, Angles.dms(a));
            assertEquals(a, Angles.parse(Angles.degreesMinutes(a)).orElseThrow(), 0.5 / 60 + 1e-12,
                    Angles.degreesMinutes(a));
        }
    }

    /**
     * The degrees, minutes and seconds of an angle, computed exactly: the double's exact decimal value
     * (BigDecimal) times 3600, rounded half up to the tenth of a second (or times 60 to the minute), split by
     * integer division. No floating-point product and no Math.round, so a wrong rounding or carry in
     * {@link Angles} cannot agree with it.
     */
    private static String exactDms(double deg, boolean seconds) {
        return text(deg < 0, exactUnits(deg, seconds, RoundingMode.HALF_UP), seconds);
    }

    private static String text(boolean negative, long units, boolean seconds) {
        String sign = negative && units > 0 ? "-" : "";
        return seconds
                ? String.format(Locale.ROOT, "%s%d° %02d′ %02d.%d″", sign, units / 36000, units / 600 % 60,
                        units / 10 % 60, units % 10)
                : String.format(Locale.ROOT, "%s%d° %02d′", sign, units / 60, units % 60);
    }

    /** |deg| in tenths of a second (or in minutes), exactly, rounded as asked. */
    private static long exactUnits(double deg, boolean seconds, RoundingMode rounding) {
        return new BigDecimal(deg).abs().multiply(BigDecimal.valueOf(seconds ? 36000 : 60))
                .setScale(0, rounding).longValueExact();
    }

    /**
     * Within 1e-6 of a unit of a half, the double product in {@link Angles} may land on either side
     * (2.0083333333333333° is 120.49999999999999...′ exactly and is shown as 2° 01′): there either neighbour
     * is accepted. Everywhere else the text must be the exactly rounded one.
     */
    private static void assertText(double deg, boolean seconds) {
        String actual = seconds ? Angles.dms(deg) : Angles.degreesMinutes(deg);
        BigDecimal scaled = new BigDecimal(deg).abs().multiply(BigDecimal.valueOf(seconds ? 36000 : 60));
        double fraction = scaled.subtract(new BigDecimal(scaled.toBigInteger())).doubleValue();
        if (Math.abs(fraction - 0.5) < 1e-6) {
            String down = text(deg < 0, exactUnits(deg, seconds, RoundingMode.DOWN), seconds);
            String up = text(deg < 0, exactUnits(deg, seconds, RoundingMode.UP), seconds);
            assertTrue(actual.equals(down) || actual.equals(up), actual + " for " + deg + ": " + down + " or " + up);
        } else {
            assertEquals(exactDms(deg, seconds), actual, (seconds ? "dms of " : "degrees and minutes of ") + deg);
        }
    }

    // The worked values of FORMULAS.md §4.3 and case 28 from exact decimal arithmetic: 13.2368° is 47 652.48″
    // → 13° 14′ 12.5″; 1.76323° is 6 347.628″ → 1° 45′ 47.6″; 29.999999° is 107 999.9964″ → 30° 00′ 00.0″.
    @ParameterizedTest
    @ValueSource(doubles = {13.2368, 1.76323, -1.76323, 29.999999, 0, 16.7632, 3.52812, 45, 0.0000138, -0.0000138})
    void workedValuesMatchExactArithmetic(double deg) {
        assertEquals(exactDms(deg, true), Angles.dms(deg), "dms of " + deg);
        assertEquals(exactDms(deg, false), Angles.degreesMinutes(deg), "degrees and minutes of " + deg);
    }

    /** Every 613th tenth of a second from −3° to 91°, and 2,000 fixed-seed angles, against exact arithmetic. */
    @org.junit.jupiter.api.Test
    void textsMatchExactArithmetic() {
        for (long tenths = -36000 * 3; tenths <= 36000 * 91; tenths += 613) {
            double deg = tenths / 36000.0;
            assertText(deg, true);
            assertText(deg, false);
        }
        java.util.SplittableRandom r = new java.util.SplittableRandom(1296);
        for (int i = 0; i < 2_000; i++) {
            double deg = r.nextDouble(-90, 90);
            assertText(deg, true);
            assertText(deg, false);
        }
    }

    /**
     * The hand-written reader against the regular grammar it implements (numbers read whole:
     * possessive quantifiers), on 100,000 fixed-seed texts made of the characters angles are written
     * with, and on every text of the examples above.
     */
    @org.junit.jupiter.api.Test
    void readsLikeTheRegularGrammar() {
        java.util.SplittableRandom r = new java.util.SplittableRandom(1328);
        String alphabet = "0123456789012345.  °d'′m\"″s+-\t";
        int angles = 0;
        for (int i = 0; i < 100_000; i++) {
            StringBuilder t = new StringBuilder();
            int length = r.nextInt(1, 12);
            for (int k = 0; k < length; k++) {
                t.append(alphabet.charAt(r.nextInt(alphabet.length())));
            }
            String text = t.toString();
            java.util.Optional<Double> expected = RegularGrammar.parse(text);
            assertEquals(expected, Angles.parse(text), "\"" + text + "\"");
            angles += expected.isPresent() ? 1 : 0;
        }
        assertTrue(angles > 5_000, angles + " of the texts are angles");
        for (String text : new String[] {"1°30'", "1 30 0", "1° 30′ 0″", "-1°30'", "13d14m12s", "0°5'", "14.5°",
            "+2 0 36", "1°60'", "1 2 60", "1..2", "1°30''", "1 30'' ", "13 14 12.4\"", "1d", " -13.2368 "}) {
            assertEquals(RegularGrammar.parse(text), Angles.parse(text), text);
        }
    }

    /** The grammar of angles as regular expressions: the reference the reader is checked against. */
    private static final class RegularGrammar {
        static final java.util.regex.Pattern DECIMAL = java.util.regex.Pattern.compile(
                "[+-]?(\\d++(\\.\\d*+)?|\\.\\d++)");
        static final java.util.regex.Pattern DMS = java.util.regex.Pattern.compile(
                "([+-])?\\s*(\\d++)\\s*(?:°|d|\\s)\\s*(?:(\\d++(?:\\.\\d*+)?)\\s*(?:'|′|m)?\\s*"
                        + "(?:(\\d++(?:\\.\\d*+)?)\\s*(?:\"|″|''|s)?)?)?\\s*");

        static java.util.Optional<Double> parse(String text) {
            String t = text.strip();
            if (t.isEmpty()) {
                return java.util.Optional.empty();
            }
            if (DECIMAL.matcher(t).matches()) {
                return java.util.Optional.of(Double.parseDouble(t));
            }
            if (t.endsWith("°") && DECIMAL.matcher(t.substring(0, t.length() - 1).strip()).matches()) {
                return java.util.Optional.of(Double.parseDouble(t.substring(0, t.length() - 1).strip()));
            }
            java.util.regex.Matcher m = DMS.matcher(t);
            if (!m.matches()) {
                return java.util.Optional.empty();
            }
            double deg = Double.parseDouble(m.group(2));
            double min = m.group(3) == null ? 0 : Double.parseDouble(m.group(3));
            double sec = m.group(4) == null ? 0 : Double.parseDouble(m.group(4));
            if (min >= 60 || sec >= 60) {
                return java.util.Optional.empty();
            }
            double v = deg + min / 60 + sec / 3600;
            return java.util.Optional.of("-".equals(m.group(1)) ? -v : v);
        }
    }
}
