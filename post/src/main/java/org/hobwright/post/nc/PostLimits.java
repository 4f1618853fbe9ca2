package org.hobwright.post.nc;

import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.MachineProfile;

/**
 * What the posted words must keep to: the final root diameter, the blank the rapids stay out of,
 * and the machine's (and hob maker's) speed and feed limits. Read from the job and the planned
 * setup values, never from the planner's steps.
 *
 * @param rootDiameterMm        final infeed (root) diameter, mm
 * @param blankDiameterMm       blank diameter, mm
 * @param faceWidthMm           face width, mm (the blank lies from 0 to this along the axial axis)
 * @param hobOutsideDiameterMm  hob outside diameter d_a0, mm
 * @param swivelDeg             swivel angle η, degrees (its size only)
 * @param hobMinRpm             lowest hob speed, rpm
 * @param hobMaxRpm             highest hob speed of the machine's hob spindle, rpm
 * @param hobMakerMaxRpm        the hob maker's highest speed (infinite when the job gives none), rpm
 * @param workMinRpm            lowest work speed, rpm
 * @param workMaxRpm            highest work speed, rpm
 * @param maxSyncRatio          largest hob turns per work turn
 * @param maxFeedMmPerMin       highest feed rate, mm/min
 * @param syncSettleS           dwell the machine needs after synchronising, s
 */
public record PostLimits(double rootDiameterMm, double blankDiameterMm, double faceWidthMm,
                         double hobOutsideDiameterMm, double swivelDeg, double hobMinRpm, double hobMaxRpm,
                         double hobMakerMaxRpm,
                         double workMinRpm, double workMaxRpm, double maxSyncRatio, double maxFeedMmPerMin,
                         double syncSettleS) {

    /** The limits of a job and its planned setup. */
    public static PostLimits of(HobJob job, SetupValues setup) {
        MachineProfile m = job.machine();
        return new PostLimits(setup.finalInfeedDiameterMm(), setup.blankDiameterMm(), job.gear().faceWidthMm(),
                job.hob().outsideDiameterMm(), Math.abs(setup.swivelAngleDeg()), m.hobMinRpm(), m.hobMaxRpm(),
                job.hob().maxRpm().orElse(Double.POSITIVE_INFINITY),
                m.workMinRpm(), m.workMaxRpm(), m.maxSyncRatio(), m.maxFeedMmPerMin(), m.syncSettleS());
    }

    /**
     * A closed range of speeds.
     *
     * @param min lowest, rpm
     * @param max highest, rpm
     */
    record Range(double min, double max) {
        boolean contains(double rpm) {
            return rpm >= min * (1 - REL) && rpm <= max * (1 + REL);
        }
    }

    /** Relative slack for comparing values that went through binary arithmetic. */
    static final double REL = 1e-9;

    /**
     * Hob speeds both spindles allow at a ratio: the hob's own limits and the work spindle's
     * carried over, n₀ = n₂ · ratio (the control locks one spindle to the other, whichever it
     * starts from).
     *
     * @param hobTurnsPerWorkTurn the synchronisation ratio
     */
    Range hobRange(double hobTurnsPerWorkTurn) {
        return new Range(Math.max(hobMinRpm, workMinRpm * hobTurnsPerWorkTurn),
                Math.min(Math.min(hobMaxRpm, hobMakerMaxRpm), workMaxRpm * hobTurnsPerWorkTurn));
    }

    /** Work speeds both spindles allow at a ratio, n₂ = n₀ / ratio. */
    Range workRange(double hobTurnsPerWorkTurn) {
        return new Range(Math.max(workMinRpm, hobMinRpm / hobTurnsPerWorkTurn),
                Math.min(workMaxRpm, Math.min(hobMaxRpm, hobMakerMaxRpm) / hobTurnsPerWorkTurn));
    }
}
