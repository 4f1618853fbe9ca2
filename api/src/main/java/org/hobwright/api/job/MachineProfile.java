package org.hobwright.api.job;

import java.util.Objects;
import java.util.OptionalDouble;
import org.hobwright.api.Validate;

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
        boolean clockwiseTeethTowardChuck,
        MachineTimes times,
        boolean phasedSync) {

    public MachineProfile {
        Validate.text("machine.name", name);
        Validate.text("machine.dialect", dialect);
        Validate.nonNegative("machine.workMinRpm", workMinRpm);
        Validate.positive("machine.workMaxRpm", workMaxRpm);
        Validate.nonNegative("machine.hobMinRpm", hobMinRpm);
        Validate.positive("machine.hobMaxRpm", hobMaxRpm);
        if (workMinRpm > workMaxRpm) {
            throw new IllegalArgumentException("machine.workMinRpm (" + workMinRpm
                    + ") must not exceed machine.workMaxRpm (" + workMaxRpm + ")");
        }
        if (hobMinRpm > hobMaxRpm) {
            throw new IllegalArgumentException("machine.hobMinRpm (" + hobMinRpm
                    + ") must not exceed machine.hobMaxRpm (" + hobMaxRpm + ")");
        }
        Validate.positive("machine.maxSyncRatio", maxSyncRatio);
        Validate.present("machine.swivel", swivel);
        Validate.nonNegative("machine.radialMin", radialMinMm);
        Validate.positive("machine.radialMax", radialMaxMm);
        if (radialMinMm >= radialMaxMm) {
            throw new IllegalArgumentException("machine.radialMin (" + radialMinMm
                    + ") must be less than machine.radialMax (" + radialMaxMm + ")");
        }
        Validate.finite("machine.axialMin", axialMinMm);
        Validate.finite("machine.axialMax", axialMaxMm);
        if (axialMinMm >= axialMaxMm) {
            throw new IllegalArgumentException("machine.axialMin (" + axialMinMm
                    + ") must be less than machine.axialMax (" + axialMaxMm + ")");
        }
        Objects.requireNonNull(hobShiftTravelMm, "hobShiftTravelMm");
        hobShiftTravelMm.ifPresent(v -> Validate.positive("machine.hobShiftTravel", v));
        Validate.positive("machine.rapid", rapidMmPerMin);
        Validate.positive("machine.maxFeed", maxFeedMmPerMin);
        Validate.nonNegative("machine.syncSettle", syncSettleS);
        Validate.positive("machine.maxHobDiameter", maxHobDiameterMm);
        Validate.present("machine.times", times);
    }

    /**
     * A machine whose clockwise-turning hob teeth move away from the chuck at the work, with no times
     * known and no phased synchronisation.
     */
    public MachineProfile(String name, String dialect, double workMinRpm, double workMaxRpm, double hobMinRpm,
                          double hobMaxRpm, double maxSyncRatio, boolean followsHelix, SwivelHolder swivel,
                          double radialMinMm, double radialMaxMm, double axialMinMm, double axialMaxMm,
                          OptionalDouble hobShiftTravelMm, double rapidMmPerMin, double maxFeedMmPerMin,
                          double syncSettleS, double maxHobDiameterMm) {
        this(name, dialect, workMinRpm, workMaxRpm, hobMinRpm, hobMaxRpm, maxSyncRatio, followsHelix, swivel,
                radialMinMm, radialMaxMm, axialMinMm, axialMaxMm, hobShiftTravelMm, rapidMmPerMin, maxFeedMmPerMin,
                syncSettleS, maxHobDiameterMm, false, MachineTimes.UNKNOWN, false);
    }
}
