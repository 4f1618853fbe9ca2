package org.hobwright.api.job;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

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
 * @param cuttingSense        the sense the hob cuts in, seen from its drive end, if stated (the planner
 *                            assumes clockwise otherwise and says so)
 * @param identifier          the shop's identifier of the hob (tool number, serial), if given
 * @param splineProfile       for a spline hob, its root form, tip radius and addendum
 */
@ApiStatus(since = "1.0")
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
        @ApiStatus(since = "1.1") Optional<CuttingSense> cuttingSense,
        @ApiStatus(since = "1.1") Optional<String> identifier,
        @ApiStatus(since = "1.1") Optional<SplineHobProfile> splineProfile) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param pitch normal pitch of the hob (must match the gear's)
     * @param pressureAngleDeg normal pressure angle of the hob profile, degrees, 1 to 45
     * @param starts number of starts (threads) z₀, 1 to 12
     * @param hand thread hand
     * @param outsideDiameterMm outside (tip) diameter d_a0, mm
     * @param leadAngleDeg the value
     * @param referenceDiameterMm the value
     * @param gashes number of gashes (flutes), at least 1
     * @param lengthMm usable hob length, mm
     * @param maxRpm the value
     * @param material cutting material: {@code hss}, {@code hss-coated}, {@code carbide}
     * @param cuttingSense the sense the hob cuts in, seen from its drive end, if stated
     * @param identifier the shop's identifier of the hob, if given
     * @param splineProfile for a spline hob, its root form, tip radius and addendum
     */
    public HobSpec {
        Checks.present("hob.pitch", pitch);
        Checks.field(JobFields.HOB_PRESSURE_ANGLE, pressureAngleDeg);
        Checks.field(JobFields.HOB_STARTS, starts);
        Checks.present("hob.hand", hand);
        Checks.field(JobFields.HOB_OUTSIDE_DIAMETER, outsideDiameterMm);
        Objects.requireNonNull(leadAngleDeg, "leadAngleDeg");
        Checks.field(JobFields.HOB_LEAD_ANGLE, leadAngleDeg);
        Objects.requireNonNull(referenceDiameterMm, "referenceDiameterMm");
        Checks.field(JobFields.HOB_REFERENCE_DIAMETER, referenceDiameterMm);
        Checks.field(JobFields.HOB_GASHES, gashes);
        Checks.field(JobFields.HOB_LENGTH, lengthMm);
        Objects.requireNonNull(maxRpm, "maxRpm");
        Checks.field(JobFields.HOB_MAX_RPM, maxRpm);
        Checks.text("hob.material", material);
        Objects.requireNonNull(cuttingSense, "cuttingSense");
        Objects.requireNonNull(identifier, "identifier");
        identifier.ifPresent(id -> Checks.text("hob.identifier", id));
        Objects.requireNonNull(splineProfile, "splineProfile");
    }

    /**
     * A gear hob (no spline profile).
     *
     * @param pitch normal pitch of the hob (must match the gear's)
     * @param pressureAngleDeg normal pressure angle of the hob profile, degrees, 1 to 45
     * @param starts number of starts (threads) z₀, 1 to 12
     * @param hand hand of the hob thread
     * @param outsideDiameterMm outside diameter, mm
     * @param leadAngleDeg lead angle at the reference diameter, if stated
     * @param referenceDiameterMm reference diameter, if stated
     * @param gashes number of gashes (flutes), at least 1
     * @param lengthMm usable hob length, mm
     * @param maxRpm the hob maker's speed limit, rpm, if given
     * @param material cutting material: {@code hss}, {@code hss-coated}, {@code carbide}
     * @param cuttingSense the sense the hob cuts in, seen from its drive end, if stated
     * @param identifier the shop's identifier of the hob, if given
     */
    @ApiStatus(since = "1.1")
    public HobSpec(Pitch pitch, double pressureAngleDeg, int starts, Hand hand, double outsideDiameterMm,
                   OptionalDouble leadAngleDeg, OptionalDouble referenceDiameterMm, int gashes, double lengthMm,
                   OptionalDouble maxRpm, String material, Optional<CuttingSense> cuttingSense,
                   Optional<String> identifier) {
        this(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg, referenceDiameterMm, gashes,
                lengthMm, maxRpm, material, cuttingSense, identifier, Optional.empty());
    }

    /**
     * A hob whose cutting sense and identifier are not stated.
     *
     * @param pitch normal pitch of the hob (must match the gear's)
     * @param pressureAngleDeg normal pressure angle of the hob profile, degrees, 1 to 45
     * @param starts number of starts (threads) z₀, 1 to 12
     * @param hand thread hand
     * @param outsideDiameterMm outside (tip) diameter d_a0, mm
     * @param leadAngleDeg the value
     * @param referenceDiameterMm the value
     * @param gashes number of gashes (flutes), at least 1
     * @param lengthMm usable hob length, mm
     * @param maxRpm the value
     * @param material cutting material: {@code hss}, {@code hss-coated}, {@code carbide}
     */
    @ApiStatus(since = "1.1")
    public HobSpec(Pitch pitch, double pressureAngleDeg, int starts, Hand hand, double outsideDiameterMm,
                   OptionalDouble leadAngleDeg, OptionalDouble referenceDiameterMm, int gashes, double lengthMm,
                   OptionalDouble maxRpm, String material) {
        this(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg, referenceDiameterMm, gashes,
                lengthMm, maxRpm, material, Optional.empty(), Optional.empty(), Optional.empty());
    }

    /**
     * This hob spec with another {@code splineProfile}.
     *
     * @param splineProfile the spline hob's root form, tip radius and addendum, or empty for a gear hob
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withSplineProfile(Optional<SplineHobProfile> splineProfile) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /** {@return normal module in mm} */
    public double moduleMm() {
        return pitch.moduleMm();
    }

    /**
     * This hob spec with another {@code pitch}.
     *
     * @param pitch normal pitch of the hob (must match the gear's)
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withPitch(Pitch pitch) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with another {@code pressureAngleDeg}.
     *
     * @param pressureAngleDeg normal pressure angle of the hob profile, degrees, 1 to 45
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withPressureAngleDeg(double pressureAngleDeg) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with another {@code starts}.
     *
     * @param starts number of starts (threads) z₀, 1 to 12
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withStarts(int starts) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with another {@code hand}.
     *
     * @param hand thread hand
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withHand(Hand hand) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with another {@code outsideDiameterMm}.
     *
     * @param outsideDiameterMm outside (tip) diameter d_a0, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withOutsideDiameterMm(double outsideDiameterMm) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with another {@code leadAngleDeg}.
     *
     * @param leadAngleDeg lead angle γ as marked on the hob, degrees (magnitude), if marked
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withLeadAngleDeg(OptionalDouble leadAngleDeg) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with a {@code leadAngleDeg} given.
     *
     * @param leadAngleDeg the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withLeadAngleDeg(double leadAngleDeg) {
        return withLeadAngleDeg(OptionalDouble.of(leadAngleDeg));
    }

    /**
     * This hob spec with another {@code referenceDiameterMm}.
     *
     * @param referenceDiameterMm reference (pitch) diameter d_m0, mm, if known; otherwise derived from the
     *     outside diameter and the tooth system's hob addendum
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withReferenceDiameterMm(OptionalDouble referenceDiameterMm) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with a {@code referenceDiameterMm} given.
     *
     * @param referenceDiameterMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withReferenceDiameterMm(double referenceDiameterMm) {
        return withReferenceDiameterMm(OptionalDouble.of(referenceDiameterMm));
    }

    /**
     * This hob spec with another {@code gashes}.
     *
     * @param gashes number of gashes (flutes), at least 1
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withGashes(int gashes) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with another {@code lengthMm}.
     *
     * @param lengthMm usable hob length, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withLengthMm(double lengthMm) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with another {@code maxRpm}.
     *
     * @param maxRpm the hob maker's speed limit, rpm, if given
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withMaxRpm(OptionalDouble maxRpm) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with a {@code maxRpm} given.
     *
     * @param maxRpm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withMaxRpm(double maxRpm) {
        return withMaxRpm(OptionalDouble.of(maxRpm));
    }

    /**
     * This hob spec with another {@code material}.
     *
     * @param material cutting material: {@code hss}, {@code hss-coated}, {@code carbide}
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withMaterial(String material) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with another {@code cuttingSense}.
     *
     * @param cuttingSense the sense the hob cuts in, seen from its drive end, if stated
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withCuttingSense(Optional<CuttingSense> cuttingSense) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }

    /**
     * This hob spec with another {@code identifier}.
     *
     * @param identifier the shop's identifier of the hob, if given
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobSpec withIdentifier(Optional<String> identifier) {
        return new HobSpec(pitch, pressureAngleDeg, starts, hand, outsideDiameterMm, leadAngleDeg,
                referenceDiameterMm, gashes, lengthMm, maxRpm, material, cuttingSense, identifier, splineProfile);
    }
}
