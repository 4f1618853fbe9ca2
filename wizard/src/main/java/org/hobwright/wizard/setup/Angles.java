package org.hobwright.wizard.setup;

import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Angles as people write them: decimal degrees ({@code 1.5}, {@code -13.2368}) or degrees,
 * minutes and seconds ({@code 1°30'}, {@code 1° 30′ 0″}, {@code 1 30 0}, {@code 13d14m12.4s}).
 *
 * <p>Conversion (elementary): a = sign · (D + M/60 + S/3600); to DMS: D = trunc|a|,
 * M = trunc((|a| − D)·60), S = (|a| − D − M/60)·3600, with carries when S or M round up to 60.
 */
public final class Angles {
    /** The patterns, compiled when an angle is first read (formatting needs none). */
    private static final class Grammar {
        static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)");
        static final Pattern DMS = Pattern.compile(
                "([+-])?\\s*(\\d+)\\s*(?:°|d|\\s)\\s*(?:(\\d+(?:\\.\\d*)?)\\s*(?:'|′|m)?\\s*"
                        + "(?:(\\d+(?:\\.\\d*)?)\\s*(?:\"|″|''|s)?)?)?\\s*");

        private Grammar() {
        }
    }

    private Angles() {
    }

    /**
     * Reads an angle.
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
        if (Grammar.DECIMAL.matcher(t).matches()) {
            double v = Double.parseDouble(t);
            return Double.isFinite(v) ? Optional.of(v) : Optional.empty();
        }
        if (t.endsWith("°") && Grammar.DECIMAL.matcher(t.substring(0, t.length() - 1).strip()).matches()) {
            return Optional.of(Double.parseDouble(t.substring(0, t.length() - 1).strip()));
        }
        Matcher m = Grammar.DMS.matcher(t);
        if (!m.matches()) {
            return Optional.empty();
        }
        double deg = Double.parseDouble(m.group(2));
        double min = m.group(3) == null ? 0 : Double.parseDouble(m.group(3));
        double sec = m.group(4) == null ? 0 : Double.parseDouble(m.group(4));
        if (min >= 60 || sec >= 60) {
            return Optional.empty();
        }
        double v = deg + min / 60 + sec / 3600;
        return Optional.of("-".equals(m.group(1)) ? -v : v);
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
