package org.hobwright.wizard.plan;

/**
 * The speeds, feeds and passes of one plan (the user's or the optimiser's).
 *
 * @param cuttingSpeedMPerMin cutting speed at the hob tip, m/min (consistent with the hob speed)
 * @param hobRpm              hob speed, rpm
 * @param roughFeedMmPerRev   feed of every pass but the last, mm per work revolution
 * @param finishFeedMmPerRev  feed of the last pass, mm per work revolution
 * @param passes              pass depths
 */
public record PlanSettings(double cuttingSpeedMPerMin, double hobRpm, double roughFeedMmPerRev,
                           double finishFeedMmPerRev, PassDepths passes) {

    /** Feed of pass {@code i} (0-based). */
    public double feed(int i) {
        return passes.isLast(i) ? finishFeedMmPerRev : roughFeedMmPerRev;
    }
}
