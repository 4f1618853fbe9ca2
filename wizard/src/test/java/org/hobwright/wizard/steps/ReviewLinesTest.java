package org.hobwright.wizard.steps;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.InspectionLimits;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.MatingGear;
import org.hobwright.api.job.Units;
import org.hobwright.api.testkit.SampleJobs;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.plan.DefaultCyclePlanner;
import org.junit.jupiter.api.Test;

/** The REVIEW step shows the limits and the mating gear the planner computed, in the job's unit. */
class ReviewLinesTest {

    @Test
    void reviewShowsTheLimitsAndTheMate() {
        HobJob job = SampleJobs.spurMetric();
        job = job.withGear(job.gear().withThicknessAllowanceMm(-0.04)
                .withThicknessAllowanceLowerMm(OptionalDouble.of(-0.1))
                .withMate(Optional.of(new MatingGear(31, OptionalDouble.of(0), OptionalDouble.empty(), -0.05,
                        OptionalDouble.of(-0.12)))));
        HobCycle cycle = new DefaultCyclePlanner().plan(job);
        List<String> lines = ReviewLines.of(cycle, Units.MM);
        String all = String.join("\n", lines);
        InspectionLimits l = cycle.inspection().orElseThrow().limits().orElseThrow();
        assertTrue(all.contains("limits (drawing): span " + Decimal.fixed(l.spanWidthLowerMm(), 3) + " mm to "
                + Decimal.fixed(l.spanWidthUpperMm(), 3) + " mm"), all);
        assertTrue(all.contains("over pins " + Decimal.fixed(l.overPinsLowerMm(), 3) + " mm to "), all);
        // the mate at 51 mm, backlash 0.09 cos 20° to 0.22 cos 20° (LimitsAndMateAnalysisTest)
        assertTrue(all.contains("Mating gear"), all);
        assertTrue(all.contains("centre distance 51.000 mm"), all);
        assertTrue(all.contains("backlash " + Decimal.fixed(0.09 * Math.cos(Math.toRadians(20)), 3) + " mm to "
                + Decimal.fixed(0.22 * Math.cos(Math.toRadians(20)), 3) + " mm"), all);
    }
}
