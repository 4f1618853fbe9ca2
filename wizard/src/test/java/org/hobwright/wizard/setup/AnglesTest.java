package org.hobwright.wizard.setup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class AnglesTest {

    // Worked values: 13.2368° = 13° 14′ 12.5″ (12.48″) and 1.76323° = 1° 45′ 47.6″ — conversion by
    // definition of the minute (1/60°) and second (1/3600°), checked by hand.
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

    /** The texts are those of java.util.Formatter with the patterns they replace, over every tenth of a second. */
    @org.junit.jupiter.api.Test
    void textsMatchTheJdkFormatter() {
        for (long tenths = -36000 * 3; tenths <= 36000 * 91; tenths += 7) {
            double deg = tenths / 36000.0;
            long t = Math.round(Math.abs(deg) * 36000.0);
            String sign = deg < 0 && t > 0 ? "-" : "";
            assertEquals(String.format(java.util.Locale.ROOT, "%s%d° %02d′ %04.1f″", sign, t / 36000,
                    (t % 36000) / 600, (t % 600) / 10.0), Angles.dms(deg), "dms of " + deg);
            long minutes = Math.round(Math.abs(deg) * 60.0);
            String msign = deg < 0 && minutes > 0 ? "-" : "";
            assertEquals(String.format(java.util.Locale.ROOT, "%s%d° %02d′", msign, minutes / 60, minutes % 60),
                    Angles.degreesMinutes(deg), "degrees and minutes of " + deg);
        }
    }
}
