package org.hobwright.api.job;

import org.hobwright.api.Validate;

/**
 * How the machine sets the hob's swivel angle and how its scale reads.
 *
 * @param scale            how the holder's scale (or the control) counts the angle
 * @param resolutionDeg    smallest settable step, degrees (e.g. 1/60 for a scale read in whole minutes)
 * @param programmable     true when the control positions the swivel axis from the program
 * @param maxAngleDeg      largest swivel either way, degrees
 * @param positiveSense    words that say which way a positive setting turns the hob on this machine,
 *                         e.g. "top of the hob toward the headstock"; shown on the setup sheet
 * @param positiveIsRight  true when this machine's positive setting equals a positive (right-hand
 *                         convention) swivel angle η; false flips the sign
 */
public record SwivelHolder(
        SwivelScale scale,
        double resolutionDeg,
        boolean programmable,
        double maxAngleDeg,
        String positiveSense,
        boolean positiveIsRight) {

    public SwivelHolder {
        Validate.present("swivel.scale", scale);
        Validate.field(MachineFields.SWIVEL_RESOLUTION, resolutionDeg);
        Validate.field(MachineFields.SWIVEL_MAX_ANGLE, maxAngleDeg);
        Validate.text("swivel.positiveSense", positiveSense);
    }

    /** How a swivel scale counts. */
    public enum SwivelScale {
        /** Decimal degrees, e.g. 13.237°. */
        DECIMAL_DEGREES,
        /** Degrees and minutes (and seconds where the vernier allows), e.g. 13° 14′. */
        DEGREES_MINUTES
    }
}
