package org.hobwright.api.cycle;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * The optimiser's shortest cycle for the job's limits, shown beside the user's plan.
 *
 * @param cycleTimeS          cycle time of the proposal, s
 * @param lowerBoundS         the lower bound the optimiser proved, s
 * @param bindingLimit        which limit binds, in words (e.g. "hob spindle maximum speed")
 * @param cuttingSpeedMPerMin proposed cutting speed, m/min
 * @param hobRpm              proposed hob speed, rpm
 * @param roughFeedMmPerRev   proposed roughing feed, mm per work revolution
 * @param finishFeedMmPerRev  proposed finishing feed, mm per work revolution
 * @param passes              proposed number of passes
 */
@ApiStatus(since = "1.0")
public record FastestProposal(double cycleTimeS, double lowerBoundS, String bindingLimit,
                              double cuttingSpeedMPerMin, double hobRpm, double roughFeedMmPerRev,
                              double finishFeedMmPerRev, int passes) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param cycleTimeS cycle time of the proposal, s
     * @param lowerBoundS the lower bound the optimiser proved, s
     * @param bindingLimit which limit binds, in words (e.g. "hob spindle maximum speed")
     * @param cuttingSpeedMPerMin proposed cutting speed, m/min
     * @param hobRpm proposed hob speed, rpm
     * @param roughFeedMmPerRev proposed roughing feed, mm per work revolution
     * @param finishFeedMmPerRev proposed finishing feed, mm per work revolution
     * @param passes proposed number of passes
     */
    public FastestProposal {
        Checks.positive("cycleTimeS", cycleTimeS);
        Checks.positive("lowerBoundS", lowerBoundS);
        Checks.text("bindingLimit", bindingLimit);
        Checks.positive("cuttingSpeedMPerMin", cuttingSpeedMPerMin);
        Checks.positive("hobRpm", hobRpm);
        Checks.positive("roughFeedMmPerRev", roughFeedMmPerRev);
        Checks.positive("finishFeedMmPerRev", finishFeedMmPerRev);
        Checks.atLeast("passes", passes, 1);
    }
}
