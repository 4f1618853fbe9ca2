package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

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
@ApiStatus(since = "1.0")
public record SwivelHolder(
        SwivelScale scale,
        double resolutionDeg,
        boolean programmable,
        double maxAngleDeg,
        String positiveSense,
        boolean positiveIsRight) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param scale how the holder's scale (or the control) counts the angle
     * @param resolutionDeg smallest settable step, degrees (e.g. 1/60 for a scale read in whole minutes)
     * @param programmable true when the control positions the swivel axis from the program
     * @param maxAngleDeg largest swivel either way, degrees
     * @param positiveSense words that say which way a positive setting turns the hob on this machine, e.g.
     * @param positiveIsRight true when this machine's positive setting equals a positive (right-hand
     */
    public SwivelHolder {
        Checks.present("swivel.scale", scale);
        Checks.field(MachineFields.SWIVEL_RESOLUTION, resolutionDeg);
        Checks.field(MachineFields.SWIVEL_MAX_ANGLE, maxAngleDeg);
        Checks.text("swivel.positiveSense", positiveSense);
    }

    /** How a swivel scale counts. */
    @ApiStatus(since = "1.0")
    public enum SwivelScale {
        /** Decimal degrees, e.g. 13.237°. */
        DECIMAL_DEGREES,
        /** Degrees and minutes (and seconds where the vernier allows), e.g. 13° 14′. */
        DEGREES_MINUTES
    }

    /**
     * This swivel holder with another {@code scale}.
     *
     * @param scale how the holder's scale (or the control) counts the angle
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public SwivelHolder withScale(SwivelScale scale) {
        return new SwivelHolder(scale, resolutionDeg, programmable, maxAngleDeg, positiveSense, positiveIsRight);
    }

    /**
     * This swivel holder with another {@code resolutionDeg}.
     *
     * @param resolutionDeg smallest settable step, degrees (e.g. 1/60 for a scale read in whole minutes)
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public SwivelHolder withResolutionDeg(double resolutionDeg) {
        return new SwivelHolder(scale, resolutionDeg, programmable, maxAngleDeg, positiveSense, positiveIsRight);
    }

    /**
     * This swivel holder with another {@code programmable}.
     *
     * @param programmable true when the control positions the swivel axis from the program
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public SwivelHolder withProgrammable(boolean programmable) {
        return new SwivelHolder(scale, resolutionDeg, programmable, maxAngleDeg, positiveSense, positiveIsRight);
    }

    /**
     * This swivel holder with another {@code maxAngleDeg}.
     *
     * @param maxAngleDeg largest swivel either way, degrees
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public SwivelHolder withMaxAngleDeg(double maxAngleDeg) {
        return new SwivelHolder(scale, resolutionDeg, programmable, maxAngleDeg, positiveSense, positiveIsRight);
    }

    /**
     * This swivel holder with another {@code positiveSense}.
     *
     * @param positiveSense words that say which way a positive setting turns the hob on this machine, e.g.
     *     "top of the hob toward the headstock"; shown on the setup sheet
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public SwivelHolder withPositiveSense(String positiveSense) {
        return new SwivelHolder(scale, resolutionDeg, programmable, maxAngleDeg, positiveSense, positiveIsRight);
    }

    /**
     * This swivel holder with another {@code positiveIsRight}.
     *
     * @param positiveIsRight true when this machine's positive setting equals a positive (right-hand
     *     convention) swivel angle η; false flips the sign
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public SwivelHolder withPositiveIsRight(boolean positiveIsRight) {
        return new SwivelHolder(scale, resolutionDeg, programmable, maxAngleDeg, positiveSense, positiveIsRight);
    }
}
