package org.hobwright.api.job;

import java.util.Objects;
import java.util.OptionalDouble;
import org.hobwright.api.Validate;

/**
 * The hob, in canonical units. Every number must lie in the range of its field in {@link JobFields}.
 *
 * @param pitch               normal pitch of the hob (must match the gear's)
 * @param pressureAngleDeg    normal pressure angle of the hob profile, degrees
 * @param starts              number of starts (threads) z₀
 * @param hand                thread hand
 * @param outsideDiameterMm   outside (tip) diameter d_a0, mm
 * @param leadAngleDeg        lead angle γ as marked on the hob, degrees (magnitude), if marked
 * @param referenceDiameterMm reference (pitch) diameter d_m0, mm, if known; otherwise derived from
 *                            the outside diameter and the tooth system's hob addendum
 * @param gashes              number of gashes (flutes)
 * @param lengthMm            usable hob length, mm
 * @param maxRpm              the hob maker's speed limit, rpm, if given
 * @param material            cutting material: {@code hss}, {@code hss-coated}, {@code carbide}
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
        String material) {

    public HobSpec {
        Validate.present("hob.pitch", pitch);
        Validate.field(JobFields.HOB_PRESSURE_ANGLE, pressureAngleDeg);
        Validate.field(JobFields.HOB_STARTS, starts);
        Validate.present("hob.hand", hand);
        Validate.field(JobFields.HOB_OUTSIDE_DIAMETER, outsideDiameterMm);
        Objects.requireNonNull(leadAngleDeg, "leadAngleDeg");
        Validate.field(JobFields.HOB_LEAD_ANGLE, leadAngleDeg);
        Objects.requireNonNull(referenceDiameterMm, "referenceDiameterMm");
        Validate.field(JobFields.HOB_REFERENCE_DIAMETER, referenceDiameterMm);
        Validate.field(JobFields.HOB_GASHES, gashes);
        Validate.field(JobFields.HOB_LENGTH, lengthMm);
        Objects.requireNonNull(maxRpm, "maxRpm");
        Validate.field(JobFields.HOB_MAX_RPM, maxRpm);
        Validate.text("hob.material", material);
    }

    /** Normal module in mm. */
    public double moduleMm() {
        return pitch.moduleMm();
    }
}
