package org.hobwright.wizard.tolerance;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Tooth-thickness allowances of the DIN 3967:1978-08 system of gear fits, for a drawing that gives no
 * allowances of its own: an allowance series (a, ab, b, bc, c, cd, d, e, f, g, h; a the largest
 * thinning, h none) gives the upper normal tooth-thickness allowance A_sne, a tolerance series (21 … 30)
 * the tooth-thickness tolerance T_sn, both by the reference diameter d; the lower allowance is
 * A_sni = A_sne − T_sn. A fit is written as the two together, e.g. {@code cd25}; in a job
 * {@code din3967-cd25}.
 *
 * <p><b>The values are from memory</b> (the standard's tables of upper allowances and tolerances, as
 * reprinted in German machine-element handbooks; table numbers from memory): they could not be checked
 * against the standard's text. Every use of them is reported, so that the programmer checks the two
 * numbers against DIN 3967 before the limits are used. Reference diameters above 1000 mm are not covered.
 *
 * @param letters the allowance series, e.g. {@code cd}
 * @param number  the tolerance series, 21 to 30
 */
public record ThicknessSeries(String letters, int number) {
    /** Upper limits of the reference-diameter ranges, mm. */
    private static final double[] D_MAX = {10, 50, 125, 280, 560, 1000};
    private static final List<String> LETTERS = List.of("a", "ab", "b", "bc", "c", "cd", "d", "e", "f", "g", "h");
    /** A_sne, µm, by series (rows, in {@link #LETTERS} order) and diameter range (columns). From memory. */
    private static final int[][] UPPER = {
        {-100, -135, -180, -250, -330, -450},
        {-85, -110, -150, -200, -280, -370},
        {-70, -95, -125, -170, -230, -310},
        {-58, -75, -105, -140, -190, -260},
        {-48, -65, -85, -115, -155, -210},
        {-40, -54, -70, -95, -130, -175},
        {-33, -44, -60, -80, -110, -145},
        {-22, -30, -40, -56, -75, -100},
        {-10, -14, -19, -26, -35, -48},
        {-5, -7, -9, -12, -17, -22},
        {0, 0, 0, 0, 0, 0}};
    /** T_sn, µm, by tolerance series 21 … 30 (rows) and diameter range (columns). From memory. */
    private static final int[][] TOLERANCE = {
        {3, 5, 6, 8, 10, 12},
        {5, 8, 10, 12, 16, 20},
        {8, 12, 16, 20, 25, 30},
        {12, 20, 25, 30, 40, 50},
        {20, 30, 40, 50, 60, 80},
        {30, 50, 60, 80, 100, 130},
        {50, 80, 100, 130, 160, 200},
        {80, 130, 160, 200, 250, 300},
        {130, 200, 250, 300, 400, 500},
        {200, 300, 400, 500, 600, 800}};
    /** The prefix of a series in a job file. */
    public static final String PREFIX = "din3967-";
    /** What the report and the sheet call the source. */
    public static final String STANDARD = "DIN 3967";

    /**
     * Reads {@code din3967-cd25} (or {@code cd25}).
     *
     * @return the series, or empty when the text is not one
     */
    public static Optional<ThicknessSeries> parse(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        if (t.startsWith(PREFIX)) {
            t = t.substring(PREFIX.length());
        }
        int i = 0;
        while (i < t.length() && t.charAt(i) >= 'a' && t.charAt(i) <= 'z') {
            i++;
        }
        String letters = t.substring(0, i);
        String digits = t.substring(i);
        if (!LETTERS.contains(letters) || digits.length() != 2 || !Character.isDigit(digits.charAt(0))
                || !Character.isDigit(digits.charAt(1))) {
            return Optional.empty();
        }
        int number = Integer.parseInt(digits);
        return number >= 21 && number <= 30 ? Optional.of(new ThicknessSeries(letters, number)) : Optional.empty();
    }

    /** Every allowance series letter, largest thinning first. */
    public static List<String> allowanceSeries() {
        return LETTERS;
    }

    /** True when the standard's tables cover the reference diameter (up to 1000 mm). */
    public static boolean covers(double referenceDiameterMm) {
        return referenceDiameterMm > 0 && referenceDiameterMm <= D_MAX[D_MAX.length - 1];
    }

    /** Upper normal tooth-thickness allowance A_sne, mm (0 or negative). */
    public double upperAllowanceMm(double referenceDiameterMm) {
        return UPPER[LETTERS.indexOf(letters)][range(referenceDiameterMm)] / 1000.0;
    }

    /** Tooth-thickness tolerance T_sn, mm. */
    public double toleranceMm(double referenceDiameterMm) {
        return TOLERANCE[number - 21][range(referenceDiameterMm)] / 1000.0;
    }

    /** Lower normal tooth-thickness allowance A_sni = A_sne − T_sn, mm. */
    public double lowerAllowanceMm(double referenceDiameterMm) {
        return upperAllowanceMm(referenceDiameterMm) - toleranceMm(referenceDiameterMm);
    }

    /** The series as a job writes it, e.g. {@code din3967-cd25}. */
    public String jobText() {
        return PREFIX + letters + number;
    }

    /** The series as the report and the sheet name it, e.g. {@code DIN 3967 cd25}. */
    public String label() {
        return STANDARD + " " + letters + number;
    }

    private static int range(double d) {
        if (!covers(d)) {
            throw new IllegalArgumentException("DIN 3967 covers reference diameters up to 1000 mm, was " + d);
        }
        int i = 0;
        while (d > D_MAX[i]) {
            i++;
        }
        return i;
    }
}
