package org.hobwright.wizard.steps;

import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.PassSummary;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.HobJob;

/**
 * The cycle settings a planned job actually used: the job's own choices with the cutting speed,
 * feeds and roughing depth the planner settled on in place of those it chose or limited. A template
 * saved from them makes the next job on the machine come out the same way.
 */
public final class UsedCycle {
    /** The roughing depth is written rounded up to this step, mm, so it never adds a pass. */
    private static final double DEPTH_STEP_MM = 0.001;

    private UsedCycle() {
    }

    /**
     * The settings used.
     *
     * @param job   the job as planned
     * @param cycle its plan; without a setup or summary (a plan with errors) the job's own settings
     */
    public static CycleSettings of(HobJob job, HobCycle cycle) {
        CycleSettings c = job.cycle();
        if (cycle.setup().isEmpty() || cycle.summary().isEmpty()) {
            return c;
        }
        CycleSummary s = cycle.summary().get();
        List<PassSummary> passes = s.passes();
        boolean roughing = passes.size() > 1;
        OptionalDouble roughFeed = roughing ? OptionalDouble.of(passes.get(0).feedMmPerRev()) : c.roughFeedMmPerRev();
        OptionalDouble roughDepth = roughing
                ? OptionalDouble.of(Math.ceil(passes.get(0).radialDepthMm() / DEPTH_STEP_MM - 1e-6) * DEPTH_STEP_MM)
                : c.roughDepthMm();
        return new CycleSettings(c.workMaterial(), OptionalDouble.of(cycle.setup().get().cuttingSpeedMPerMin()),
                roughFeed, OptionalDouble.of(s.finishFeedMmPerRev()), roughDepth, c.finishStockMm(), c.method(),
                c.axialClearanceMm(), c.radialClearanceMm(), c.coolant(), c.targets(), c.hobShiftPerPartMm(),
                c.hobShiftEveryParts(), c.fastest());
    }
}
