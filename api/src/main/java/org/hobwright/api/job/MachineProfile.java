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
 * @param axialMinMm         axial travel limit toward the chuck (the far face side), mm from the entry face
 * @param axialMaxMm         axial travel limit away from the chuck, mm from the entry face
 * @param hobShiftTravelMm   travel of a hob-shift axis along the hob, mm, if the machine has one
 * @param rapidMmPerMin      rapid traverse rate used for time estimates, mm/min
 * @param maxFeedMmPerMin    highest programmable feed rate, mm/min
 * @param syncSettleS        dwell after switching synchronisation on, s
 * @param maxHobDiameterMm   largest hob the holder takes, mm
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
        double maxHobDiameterMm) {

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
    }
}
