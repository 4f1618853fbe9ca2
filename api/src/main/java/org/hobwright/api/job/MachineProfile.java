package org.hobwright.api.job;

import java.util.Objects;
import java.util.OptionalDouble;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * What a machine can do and how it counts. Every machine-specific word of the NC program comes
 * from the dialect this profile names; nothing control-specific is built into Hobwright.
 *
 * @param name               profile name (letters, digits, '.', '_', '-')
 * @param dialect            name of the NC dialect file used to post for this machine
 * @param workMinRpm         lowest stable work-spindle speed, rpm
 * @param workMaxRpm         highest work-spindle speed, rpm
 * @param hobMinRpm          lowest hob-spindle (live tool) speed, rpm
 * @param hobMaxRpm          highest hob-spindle speed, rpm
 * @param maxSyncRatio       largest hob turns per work turn the synchronisation accepts
 * @param followsHelix       true when the control can add the helical (differential) work rotation
 * @param swivel             the swivel holder or axis
 * @param radialMinMm        smallest reachable diameter of the hob axis path, as a work diameter, mm
 * @param radialMaxMm        largest reachable work diameter for the hob, mm
 * @param axialMinMm         axial travel limit on the side away from the chuck, hob centre, mm from the gear's
 *                           front face (positive toward the chuck)
 * @param axialMaxMm         axial travel limit on the chuck side, hob centre, mm from the gear's front face
 * @param hobShiftTravelMm   travel of a hob-shift axis along the hob, mm, if the machine has one
 * @param rapidMmPerMin      rapid traverse rate used for time estimates, mm/min
 * @param maxFeedMmPerMin    highest programmable feed rate, mm/min
 * @param syncSettleS        dwell after switching synchronisation on, s
 * @param maxHobDiameterMm   largest hob the holder takes, mm
 * @param clockwiseTeethTowardChuck how this machine's hob head is built: true when, with the hob spindle
 *                           turning clockwise seen from its drive end, the hob teeth at the work move toward
 *                           the chuck (the back face of the gear); false when they move away from it
 * @param times              load, unload, swivel, hob-shift and hob-change times, as far as known
 * @param phasedSync         true when the control can start the synchronisation at a set work-spindle angle
 */
@ApiStatus(since = "1.0")
public record MachineProfile(
        String name,
        String dialect,
        double workMinRpm,
        double workMaxRpm,
        double hobMinRpm,
        double hobMaxRpm,
        double maxSyncRatio,
        boolean followsHelix,
        SwivelHolder swivel,
        double radialMinMm,
        double radialMaxMm,
        double axialMinMm,
        double axialMaxMm,
        OptionalDouble hobShiftTravelMm,
        double rapidMmPerMin,
        double maxFeedMmPerMin,
        double syncSettleS,
        double maxHobDiameterMm,
        @ApiStatus(since = "1.1") boolean clockwiseTeethTowardChuck,
        @ApiStatus(since = "1.1") MachineTimes times,
        @ApiStatus(since = "1.1") boolean phasedSync) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param name profile name (letters, digits, '.', '_', '-')
     * @param dialect name of the NC dialect file used to post for this machine
     * @param workMinRpm lowest stable work-spindle speed, rpm
     * @param workMaxRpm highest work-spindle speed, rpm
     * @param hobMinRpm lowest hob-spindle (live tool) speed, rpm
     * @param hobMaxRpm highest hob-spindle speed, rpm
     * @param maxSyncRatio largest hob turns per work turn the synchronisation accepts
     * @param followsHelix true when the control can add the helical (differential) work rotation
     * @param swivel the swivel holder or axis
     * @param radialMinMm smallest reachable diameter of the hob axis path, as a work diameter, mm
     * @param radialMaxMm largest reachable work diameter for the hob, mm
     * @param axialMinMm axial travel limit on the side away from the chuck, mm from the front face
     * @param axialMaxMm axial travel limit on the chuck side, mm from the front face
     * @param hobShiftTravelMm the value
     * @param rapidMmPerMin rapid traverse rate used for time estimates, mm/min
     * @param maxFeedMmPerMin highest programmable feed rate, mm/min
     * @param syncSettleS dwell after switching synchronisation on, s
     * @param maxHobDiameterMm largest hob the holder takes, mm
     * @param clockwiseTeethTowardChuck true when clockwise-turning hob teeth move toward the chuck at the work
     * @param times load, unload, swivel, hob-shift and hob-change times
     * @param phasedSync true when the control can start the synchronisation at a set work-spindle angle
     */
    public MachineProfile {
        Checks.text("machine.name", name);
        Checks.text("machine.dialect", dialect);
        Checks.field(MachineFields.WORK_MIN_RPM, workMinRpm);
        Checks.field(MachineFields.WORK_MAX_RPM, workMaxRpm);
        Checks.field(MachineFields.HOB_MIN_RPM, hobMinRpm);
        Checks.field(MachineFields.HOB_MAX_RPM, hobMaxRpm);
        if (workMinRpm > workMaxRpm) {
            throw new IllegalArgumentException("machine.workMinRpm (" + workMinRpm
                    + ") must not exceed machine.workMaxRpm (" + workMaxRpm + ")");
        }
        if (hobMinRpm > hobMaxRpm) {
            throw new IllegalArgumentException("machine.hobMinRpm (" + hobMinRpm
                    + ") must not exceed machine.hobMaxRpm (" + hobMaxRpm + ")");
        }
        Checks.field(MachineFields.MAX_SYNC_RATIO, maxSyncRatio);
        Checks.present("machine.swivel", swivel);
        Checks.field(MachineFields.RADIAL_MIN, radialMinMm);
        Checks.field(MachineFields.RADIAL_MAX, radialMaxMm);
        if (radialMinMm >= radialMaxMm) {
            throw new IllegalArgumentException("machine.radialMin (" + radialMinMm
                    + ") must be less than machine.radialMax (" + radialMaxMm + ")");
        }
        Checks.field(MachineFields.AXIAL_MIN, axialMinMm);
        Checks.field(MachineFields.AXIAL_MAX, axialMaxMm);
        if (axialMinMm >= axialMaxMm) {
            throw new IllegalArgumentException("machine.axialMin (" + axialMinMm
                    + ") must be less than machine.axialMax (" + axialMaxMm + ")");
        }
        Objects.requireNonNull(hobShiftTravelMm, "hobShiftTravelMm");
        hobShiftTravelMm.ifPresent(v -> Checks.positive("machine.hobShiftTravel", v));
        Checks.field(MachineFields.RAPID, rapidMmPerMin);
        Checks.field(MachineFields.MAX_FEED, maxFeedMmPerMin);
        Checks.field(MachineFields.SYNC_SETTLE, syncSettleS);
        Checks.field(MachineFields.MAX_HOB_DIAMETER, maxHobDiameterMm);
        Checks.present("machine.times", times);
    }

    /**
     * A machine whose clockwise-turning hob teeth move away from the chuck at the work, with no times
     * known and no phased synchronisation.
     *
     * @param name profile name (letters, digits, '.', '_', '-')
     * @param dialect name of the NC dialect file used to post for this machine
     * @param workMinRpm lowest stable work-spindle speed, rpm
     * @param workMaxRpm highest work-spindle speed, rpm
     * @param hobMinRpm lowest hob-spindle (live tool) speed, rpm
     * @param hobMaxRpm highest hob-spindle speed, rpm
     * @param maxSyncRatio largest hob turns per work turn the synchronisation accepts
     * @param followsHelix true when the control can add the helical (differential) work rotation
     * @param swivel the swivel holder or axis
     * @param radialMinMm smallest reachable diameter of the hob axis path, as a work diameter, mm
     * @param radialMaxMm largest reachable work diameter for the hob, mm
     * @param axialMinMm axial travel limit on the side away from the chuck, mm from the front face
     * @param axialMaxMm axial travel limit on the chuck side, mm from the front face
     * @param hobShiftTravelMm the value
     * @param rapidMmPerMin rapid traverse rate used for time estimates, mm/min
     * @param maxFeedMmPerMin highest programmable feed rate, mm/min
     * @param syncSettleS dwell after switching synchronisation on, s
     * @param maxHobDiameterMm largest hob the holder takes, mm
     */
    @ApiStatus(since = "1.1")
    public MachineProfile(String name, String dialect, double workMinRpm, double workMaxRpm, double hobMinRpm,
                          double hobMaxRpm, double maxSyncRatio, boolean followsHelix, SwivelHolder swivel,
                          double radialMinMm, double radialMaxMm, double axialMinMm, double axialMaxMm,
                          OptionalDouble hobShiftTravelMm, double rapidMmPerMin, double maxFeedMmPerMin,
                          double syncSettleS, double maxHobDiameterMm) {
        this(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio, followsHelix, swivel,
                radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm, rapidMmPerMin, maxFeedMmPerMin,
                syncSettleS, maxHobDiameterMm, false, MachineTimes.UNKNOWN, false);
    }

    /**
     * This machine profile with another {@code name}.
     *
     * @param name profile name (letters, digits, '.', '_', '-')
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withName(String name) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code dialect}.
     *
     * @param dialect name of the NC dialect file used to post for this machine
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withDialect(String dialect) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code workMinRpm}.
     *
     * @param workMinRpm lowest stable work-spindle speed, rpm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withWorkMinRpm(double workMinRpm) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code workMaxRpm}.
     *
     * @param workMaxRpm highest work-spindle speed, rpm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withWorkMaxRpm(double workMaxRpm) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code hobMinRpm}.
     *
     * @param hobMinRpm lowest hob-spindle (live tool) speed, rpm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withHobMinRpm(double hobMinRpm) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code hobMaxRpm}.
     *
     * @param hobMaxRpm highest hob-spindle speed, rpm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withHobMaxRpm(double hobMaxRpm) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code maxSyncRatio}.
     *
     * @param maxSyncRatio largest hob turns per work turn the synchronisation accepts
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withMaxSyncRatio(double maxSyncRatio) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code followsHelix}.
     *
     * @param followsHelix true when the control can add the helical (differential) work rotation
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withFollowsHelix(boolean followsHelix) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code swivel}.
     *
     * @param swivel the swivel holder or axis
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withSwivel(SwivelHolder swivel) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code radialMinMm}.
     *
     * @param radialMinMm smallest reachable diameter of the hob axis path, as a work diameter, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withRadialMinMm(double radialMinMm) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code radialMaxMm}.
     *
     * @param radialMaxMm largest reachable work diameter for the hob, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withRadialMaxMm(double radialMaxMm) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code axialMinMm}.
     *
     * @param axialMinMm axial travel limit on the side away from the chuck, mm from the front face
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withAxialMinMm(double axialMinMm) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code axialMaxMm}.
     *
     * @param axialMaxMm axial travel limit on the chuck side, mm from the front face
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withAxialMaxMm(double axialMaxMm) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code hobShiftTravelMm}.
     *
     * @param hobShiftTravelMm travel of a hob-shift axis along the hob, mm, if the machine has one
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withHobShiftTravelMm(OptionalDouble hobShiftTravelMm) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with a {@code hobShiftTravelMm} given.
     *
     * @param hobShiftTravelMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withHobShiftTravelMm(double hobShiftTravelMm) {
        return withHobShiftTravelMm(OptionalDouble.of(hobShiftTravelMm));
    }

    /**
     * This machine profile with another {@code rapidMmPerMin}.
     *
     * @param rapidMmPerMin rapid traverse rate used for time estimates, mm/min
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withRapidMmPerMin(double rapidMmPerMin) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code maxFeedMmPerMin}.
     *
     * @param maxFeedMmPerMin highest programmable feed rate, mm/min
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withMaxFeedMmPerMin(double maxFeedMmPerMin) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code syncSettleS}.
     *
     * @param syncSettleS dwell after switching synchronisation on, s
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withSyncSettleS(double syncSettleS) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code maxHobDiameterMm}.
     *
     * @param maxHobDiameterMm largest hob the holder takes, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withMaxHobDiameterMm(double maxHobDiameterMm) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code clockwiseTeethTowardChuck}.
     *
     * @param clockwiseTeethTowardChuck true when clockwise-turning hob teeth move toward the chuck at the work
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withClockwiseTeethTowardChuck(boolean clockwiseTeethTowardChuck) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code times}.
     *
     * @param times load, unload, swivel, hob-shift and hob-change times
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withTimes(MachineTimes times) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }

    /**
     * This machine profile with another {@code phasedSync}.
     *
     * @param phasedSync true when the control can start the synchronisation at a set work-spindle angle
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public MachineProfile withPhasedSync(boolean phasedSync) {
        return new MachineProfile(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio,
                followsHelix, swivel, radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm,
                rapidMmPerMin, maxFeedMmPerMin, syncSettleS, maxHobDiameterMm, clockwiseTeethTowardChuck, times,
                phasedSync);
    }
}
