package org.hobwright.wizard.check;

import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;

/**
 * Numbers in finding messages, in the job's units: lengths to 4 decimals in mm or 5 in inches,
 * angles to 4 decimals of a degree, trailing zeros dropped, {@code Locale}-independent.
 *
 * @param units the job's length unit
 */
public record Wording(Units units) {

    /** A length given in mm, written in the job's unit, e.g. {@code 26.1 mm} or {@code 1.0625 in}. */
    public String length(double mm) {
        return plain(units.fromMm(mm), units == Units.MM ? 4 : 5) + " " + units.symbol();
    }

    /** An angle in degrees, e.g. {@code 13.2368°}. */
    public String angle(double deg) {
        return plain(deg, 4) + "°";
    }

    /** A plain number to 4 decimals. */
    public String number(double v) {
        return plain(v, 4);
    }

    /** A count with its noun in the right number: {@code 1 tooth}, {@code 3 teeth}. */
    public static String count(long n, String one, String many) {
        return n + " " + (n == 1 ? one : many);
    }

    /** A number of teeth: {@code 1 tooth}, {@code 3 teeth}. */
    public static String teeth(long n) {
        return count(n, "tooth", "teeth");
    }

    /** The input field of a pitch: {@code PREFIX.module} or {@code PREFIX.diametralPitch}. */
    public static String pitchField(String prefix, Pitch pitch) {
        return prefix + (pitch instanceof Pitch.Diametral ? ".diametralPitch" : ".module");
    }

    /** A pitch as the user gave it, e.g. {@code module 2 mm} or {@code diametral pitch 12/in (module 2.1167 mm)}. */
    public String pitch(Pitch pitch) {
        if (pitch instanceof Pitch.Diametral dp) {
            return "diametral pitch " + plain(dp.perInch(), 4) + "/in (module " + plain(dp.moduleMm(), 4) + " mm)";
        }
        return "module " + plain(pitch.moduleMm(), 4) + " mm";
    }

    static String plain(double v, int decimals) {
        return Decimal.plain(v, decimals);
    }
}
