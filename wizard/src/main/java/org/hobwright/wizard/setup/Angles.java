package org.hobwright.wizard.setup;

import java.util.Optional;

/**
 * Angles as people write them: decimal degrees ({@code 1.5}, {@code -13.2368}) or degrees,
 * minutes and seconds ({@code 1°30'}, {@code 1° 30′ 0″}, {@code 1 30 0}, {@code 13d14m12.4s}).
 *
 * <p>Conversion (elementary): a = sign · (D + M/60 + S/3600); to DMS: D = trunc|a|,
 * M = trunc((|a| − D)·60), S = (|a| − D − M/60)·3600, with carries when S or M round up to 60.
 */
public final class Angles {
    private Angles() {
    }

    /**
     * Reads an angle: decimal degrees ({@code [+-]digits[.digits]}, optionally followed by
     * {@code °}) or degrees, minutes and seconds ({@code [+-]D (°|d|space) [M ('|′|m)] [S ("|″|''|s)]},
     * spaces allowed between the parts). Read character by character, without regular expressions
     * (planning reads every angle of a job; {@code AnglesTest} compares it with the regular grammar).
     *
     * @param text decimal degrees or degrees-minutes-seconds
     * @return decimal degrees, or empty when the text is not an angle (minutes or seconds of 60 or
     *         more are not an angle either)
     */
    public static Optional<Double> parse(String text) {
        if (text == null) {
            return Optional.empty();
        }
        String t = text.strip();
        if (t.isEmpty()) {
            return Optional.empty();
        }
        if (isDecimal(t, 0, t.length())) {
            return Optional.of(Double.parseDouble(t));
        }
        if (t.endsWith("°")) {
            String number = t.substring(0, t.length() - 1).strip();
            if (isDecimal(number, 0, number.length())) {
                return Optional.of(Double.parseDouble(number));
            }
        }
        return dms(t);
    }

    /** {@code [+-]?(digits(.digits?)?|.digits)} over {@code t[from, to)}. */
    private static boolean isDecimal(String t, int from, int to) {
        int i = from;
        if (i < to && (t.charAt(i) == '+' || t.charAt(i) == '-')) {
            i++;
        }
        int digits = digits(t, i, to);
        i += digits;
        if (i < to && t.charAt(i) == '.') {
            int fraction = digits(t, i + 1, to);
            if (digits == 0 && fraction == 0) {
                return false;
            }
            i += 1 + fraction;
        } else if (digits == 0) {
            return false;
        }
        return i == to;
    }

    /** Degrees, minutes and seconds; empty when the text is not in that form. */
    private static Optional<Double> dms(String t) {
        int n = t.length();
        int i = 0;
        boolean negative = false;
        if (t.charAt(i) == '+' || t.charAt(i) == '-') {
            negative = t.charAt(i) == '-';
            i++;
        }
        i = spaces(t, i);
        int d = digits(t, i, n);
        if (d == 0) {
            return Optional.empty();
        }
        double deg = Double.parseDouble(t.substring(i, i + d));
        i = spaces(t, i + d);
        if (i < n && (t.charAt(i) == '°' || t.charAt(i) == 'd')) {
            i++;
        } else if (i == 0 || !isSpace(t.charAt(i - 1))) {
            return Optional.empty();
        }
        i = spaces(t, i);
        double min = 0;
        double sec = 0;
        int m = number(t, i);
        if (m > 0) {
            min = Double.parseDouble(t.substring(i, i + m));
            i = spaces(t, i + m);
            if (i < n && (t.charAt(i) == '\'' || t.charAt(i) == '′' || t.charAt(i) == 'm')) {
                i = spaces(t, i + 1);
            }
            int s = number(t, i);
            if (s > 0) {
                sec = Double.parseDouble(t.substring(i, i + s));
                i = spaces(t, i + s);
                if (t.startsWith("''", i)) {
                    i += 2;
                } else if (i < n && (t.charAt(i) == '"' || t.charAt(i) == '″' || t.charAt(i) == 's')) {
                    i++;
                }
                i = spaces(t, i);
            }
        }
        if (i != n || min >= 60 || sec >= 60) {
            return Optional.empty();
        }
        double v = deg + min / 60 + sec / 3600;
        return Optional.of(negative ? -v : v);
    }

    /** Length of {@code digits(.digits?)?} at {@code i}, 0 when there is none. */
    private static int number(String t, int i) {
        int d = digits(t, i, t.length());
        if (d > 0 && i + d < t.length() && t.charAt(i + d) == '.') {
            return d + 1 + digits(t, i + d + 1, t.length());
        }
        return d;
    }

    private static int digits(String t, int from, int to) {
        int i = from;
        while (i < to && t.charAt(i) >= '0' && t.charAt(i) <= '9') {
            i++;
        }
        return i - from;
    }

    private static int spaces(String t, int i) {
        while (i < t.length() && isSpace(t.charAt(i))) {
            i++;
        }
        return i;
    }

    /** The white space of a regular expression's {@code \s}: space, tab, line feed, vertical tab, form feed, return. */
    private static boolean isSpace(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\u000B' || c == '\f' || c == '\r';
    }

    /** Formats as degrees, minutes and seconds to 0.1″, e.g. {@code 13° 14′ 12.4″} (negative: {@code -1° 45′ 47.6″}). */
    public static String dms(double deg) {
        long tenths = Math.round(Math.abs(deg) * 36000.0);
        long d = tenths / 36000;
        long m = (tenths % 36000) / 600;
        long s10 = tenths % 600;
        String sign = deg < 0 && tenths > 0 ? "-" : "";
        return sign + d + "° " + twoDigits(m) + "′ " + twoDigits(s10 / 10) + "." + s10 % 10 + "″";
    }

    /** Formats as degrees and whole minutes, e.g. {@code 13° 14′}. */
    public static String degreesMinutes(double deg) {
        long minutes = Math.round(Math.abs(deg) * 60.0);
        String sign = deg < 0 && minutes > 0 ? "-" : "";
        return sign + minutes / 60 + "° " + twoDigits(minutes % 60) + "′";
    }

    /** 0 to 99 as two digits (no formatter: its first use loads the JDK's locale data). */
    private static String twoDigits(long v) {
        return v < 10 ? "0" + v : Long.toString(v);
    }

    /** Rounds an angle to a step (e.g. 1/12 degree for a scale read in 5-minute steps). */
    public static double roundTo(double deg, double stepDeg) {
        return Math.round(deg / stepDeg) * stepDeg;
    }
}
