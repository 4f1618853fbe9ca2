package org.hobwright.api.job;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.Validate;

/**
 * The hob, in canonical units.
 *
 * @param pitch               normal pitch of the hob (must match the gear's)
 * @param pressureAngleDeg    normal pressure angle of the hob profile, degrees, 1 to 45
 * @param starts              number of starts (threads) z₀, 1 to 12
 * @param hand                thread hand
 * @param outsideDiameterMm   outside (tip) diameter d_a0, mm
 * @param leadAngleDeg        lead angle γ as marked on the hob, degrees (magnitude), if marked
 * @param referenceDiameterMm reference (pitch) diameter d_m0, mm, if known; otherwise derived from
 *                            the outside diameter and the tooth system's hob addendum
 * @param gashes              number of gashes (flutes), at least 1
 * @param lengthMm            usable hob length, mm
 * @param maxRpm              the hob maker's speed limit, rpm, if given
 * @param material            cutting material: {@code hss}, {@code hss-coated}, {@code carbide}
 * @param splineProfile       for a spline hob, its root form, tip radius and addendum
 */
public record HobSpec(
        Pitch pitch,
        double pressureAngleDeg,
        int starts,
        Hand hand,
        double outsideDiameterMm,
        OptionalDouble leadAngleDeg,
        OptionalDouble referenceDiameterMm,
        int gashes,
        double lengthMm,
        OptionalDouble maxRpm,
        String material,
        Optional<SplineHobProfile> splineProfile) {

    public HobSpec {
        Validate.present("hob.pitch", pitch);
        Validate.range("hob.pressureAngle", pressureAngleDeg, 1, 45);
        Validate.range("hob.starts", starts, 1, 12);
        Validate.present("hob.hand", hand);
        Validate.positive("hob.outsideDiameter", outsideDiameterMm);
        Objects.requireNonNull(leadAngleDeg, "leadAngleDeg");
        Validate.range("hob.leadAngle", leadAngleDeg, 0, 45);
        Objects.requireNonNull(referenceDiameterMm, "referenceDiameterMm");
        Validate.positive("hob.referenceDiameter", referenceDiameterMm);
        Validate.atLeast("hob.gashes", gashes, 1);
        Validate.positive("hob.length", lengthMm);
        Objects.requireNonNull(maxRpm, "maxRpm");
        Validate.positive("hob.maxRpm", maxRpm);
        Validate.text("hob.material", material);
        Objects.requireNonNull(splineProfile, "splineProfile");
    }

    /** A gear hob (no spline profile). */
    public HobSpec(Pitch pitch, double pressureAngleDeg, int starts, Hand hand, double outsideDiameterMm,
                   OptionalDouble leadAngleDeg, OptionalDouble referenceDiameterMm, int gashes, double lengthMm,
                   OptionalDouble maxRpm, String material) {
        this(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg, referenceDiameterMm, gashes,
                lengthMm, maxRpm, material, Optional.empty());
    }

    /** Normal module in mm. */
    public double moduleMm() {
        return pitch.moduleMm();
    }
}
