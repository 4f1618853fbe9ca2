package org.hobwright.wizard.plan;

import org.hobwright.api.job.SwivelHolder;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.setup.Angles;

/**
 * The swivel angle as a machine sets it: in the machine's sign convention, rounded to the holder's
 * resolution, written as its scale reads, with the direction in words.
 *
 * <pre>
 * setting = round(s · η, resolution),  s = +1 when the holder's positive sense is the right-hand
 *                                      convention of η (positiveIsRight), otherwise −1
 * </pre>
 *
 * @param machineAngleDeg the setting in the machine's sign, rounded, degrees
 * @param exactDeg        the same before rounding to the holder's resolution, degrees
 * @param text            the setting as the scale reads it (decimal degrees or degrees-minutes)
 * @param direction       the direction in words for this machine
 */
public record SwivelSetting(double machineAngleDeg, double exactDeg, String text, String direction) {

    /**
     * The setting of a swivel angle on a holder.
     *
     * @param swivelAngleDeg η, signed (right hand positive), degrees
     * @param holder         the machine's swivel holder
     */
    public static SwivelSetting of(double swivelAngleDeg, SwivelHolder holder) {
        double signed = holder.positiveIsRight() ? swivelAngleDeg : -swivelAngleDeg;
        double rounded = Angles.roundTo(signed, holder.resolutionDeg());
        if (rounded == 0) {
            rounded = 0.0; // no negative zero in reports
        }
        String text = text(rounded, holder);
        String direction;
        if (rounded == 0) {
            direction = "no swivel: hob axis square to the work axis";
        } else if (rounded > 0) {
            direction = "swing " + text + " in the positive direction (on this machine: " + holder.positiveSense() + ")";
        } else {
            direction = "swing " + text(-rounded, holder) + " in the negative direction (on this machine positive is: "
                    + holder.positiveSense() + ", so turn the other way)";
        }
        return new SwivelSetting(rounded, signed, text, direction);
    }

    /** True when the holder's resolution moved the setting away from the exact angle. */
    public boolean rounded() {
        return Math.abs(machineAngleDeg - exactDeg) > 1e-9;
    }

    private static String text(double deg, SwivelHolder holder) {
        double res = holder.resolutionDeg();
        if (holder.scale() == SwivelHolder.SwivelScale.DEGREES_MINUTES) {
            return res < 1.0 / 60 - 1e-12 ? Angles.dms(deg) : Angles.degreesMinutes(deg);
        }
        int decimals = (int) Math.max(0, Math.min(6, Math.ceil(-Math.log10(res) - 1e-9)));
        return Decimal.fixed(deg, decimals) + "°";
    }
}
