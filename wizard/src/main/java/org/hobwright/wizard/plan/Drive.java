package org.hobwright.wizard.plan;

/**
 * The fixed part of the synchronisation for a job: the whole-number ratio, the senses of rotation
 * and the differential.
 *
 * @param ratio                hob turns : work turns
 * @param senses               senses of rotation
 * @param differentialDegPerMm helical addition, degrees of work rotation per mm of axial travel toward the
 *                             back face, signed in the work's sense (0 for spur)
 */
public record Drive(SyncRatio ratio, SpindleSenses senses, double differentialDegPerMm) {

    /** Work speed for a hob speed through the ratio, rpm. */
    public double workRpm(double hobRpm) {
        return hobRpm * ratio.workTurns() / ratio.hobTurns();
    }
}
