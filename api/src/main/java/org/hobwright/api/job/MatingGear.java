package org.hobwright.api.job;

import java.util.Objects;
import java.util.OptionalDouble;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * The gear this one runs with, as the drawing gives it: an external gear of the same module, pressure
 * angle, helix angle (opposite hand) and tooth system, on parallel axes. Canonical units (mm).
 *
 * <p>Experimental: the shape may still change in a minor version (e.g. internal mates).
 *
 * @param teeth                     number of teeth of the mate, at least 1
 * @param profileShift              the mate's profile shift coefficient, if the drawing gives it (else it
 *                                  is worked out from the centre distance), -3 to 3
 * @param centreDistanceMm          the centre distance of the pair as drawn, mm, if given
 * @param thicknessAllowanceMm      the mate's upper normal tooth-thickness allowance, mm, -10 to 10
 * @param thicknessAllowanceLowerMm the mate's lower normal tooth-thickness allowance, mm, if given; not above
 *                                  the upper one
 */
@ApiStatus(since = "1.1", stability = ApiStatus.Stability.EXPERIMENTAL)
public record MatingGear(int teeth, OptionalDouble profileShift, OptionalDouble centreDistanceMm,
                         double thicknessAllowanceMm, OptionalDouble thicknessAllowanceLowerMm) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param teeth number of teeth of the mate
     * @param profileShift the mate's profile shift coefficient, if given
     * @param centreDistanceMm the centre distance as drawn, mm, if given
     * @param thicknessAllowanceMm the mate's upper normal tooth-thickness allowance, mm
     * @param thicknessAllowanceLowerMm the mate's lower normal tooth-thickness allowance, mm, if given
     */
    public MatingGear {
        Checks.field(JobFields.MATE_TEETH, teeth);
        Objects.requireNonNull(profileShift, "profileShift");
        Checks.field(JobFields.MATE_PROFILE_SHIFT, profileShift);
        Objects.requireNonNull(centreDistanceMm, "centreDistanceMm");
        Checks.field(JobFields.MATE_CENTRE_DISTANCE, centreDistanceMm);
        Checks.field(JobFields.MATE_THICKNESS_ALLOWANCE, thicknessAllowanceMm);
        Objects.requireNonNull(thicknessAllowanceLowerMm, "thicknessAllowanceLowerMm");
        Checks.field(JobFields.MATE_THICKNESS_ALLOWANCE_LOWER, thicknessAllowanceLowerMm);
        if (thicknessAllowanceLowerMm.isPresent() && thicknessAllowanceLowerMm.getAsDouble() > thicknessAllowanceMm) {
            throw new IllegalArgumentException("mate.thicknessAllowanceLower must not be above mate.thicknessAllowance ("
                    + thicknessAllowanceMm + "), was " + thicknessAllowanceLowerMm.getAsDouble());
        }
    }
}
