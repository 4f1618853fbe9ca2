package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.testkit.SampleJobs;
import org.junit.jupiter.api.Test;

/** Clearances below 0.5 mm (common practice, no source) are a warning on the field that sets them. */
class ClearanceTest {

    private static HobJob clearances(HobJob j, double axialMm, double radialMm) {
        CycleSettings c = j.cycle();
        return TestJobs.with(j, new CycleSettings(c.workMaterial(), c.cuttingSpeedMPerMin(), c.roughFeedMmPerRev(),
                c.finishFeedMmPerRev(), c.roughDepthMm(), c.finishStockMm(), c.method(), axialMm, radialMm, c.coolant(),
                c.targets(), c.hobShiftPerPartMm(), c.hobShiftEveryParts(), c.fastest()));
    }

    private static List<String> warned(HobCycle c) {
        return c.findings().stream().filter(f -> f.code().equals(PlanCode.PLAN_CLEARANCE_SMALL.code())).map(Finding::field)
                .toList();
    }

    @Test
    void zeroClearancesAreWarnedAbout() {
        HobCycle c = new DefaultCyclePlanner().plan(clearances(SampleJobs.spurMetric(), 0, 0));
        assertFalse(c.hasErrors(), c.findings().toString());
        assertEquals(List.of("cycle.axialClearance", "cycle.radialClearance"), warned(c).stream().sorted().toList());
        assertTrue(c.findings().stream().anyMatch(f -> f.message().contains("radial clearance 0.000 mm is below 0.500"
                + " mm")), c.findings().toString());
    }

    @Test
    void halfAMillimetreIsEnough() {
        assertEquals(List.of(), warned(new DefaultCyclePlanner().plan(clearances(SampleJobs.spurMetric(), 0.5, 0.5))));
        assertEquals(List.of("cycle.axialClearance"),
                warned(new DefaultCyclePlanner().plan(clearances(SampleJobs.spurMetric(), 0.4, 0.5))));
    }
}
