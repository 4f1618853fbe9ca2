package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.HobJob;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The number of passes is bounded ({@link PassDepths#MAX_PASSES}): a roughing depth that would
 * split the depth finer is an error finding on {@code cycle.roughDepth}, before any pass is made.
 * The metering-pump gear (blank Ø26, root Ø23.5 with the thickness allowance, so about 1.2 mm of
 * depth; samples/scenario) with a roughing depth of 1e-9 mm used to run out of memory, with
 * 0.1 mm of finishing stock to fail on a negative array size, and with 1e-4 mm to plan 22,913
 * passes.
 */
class PassBoundsTest {

    private static HobJob passes(double roughDepthMm, double stockMm) {
        HobJob j = TestJobs.meteringPumpOnVarrow();
        CycleSettings c = j.cycle();
        return TestJobs.with(j, new CycleSettings(c.workMaterial(), c.cuttingSpeedMPerMin(), c.roughFeedMmPerRev(),
                c.finishFeedMmPerRev(), OptionalDouble.of(roughDepthMm), stockMm, c.method(), c.axialClearanceMm(),
                c.radialClearanceMm(), c.coolant(), c.targets(), c.hobShiftPerPartMm(), c.hobShiftEveryParts(),
                c.fastest()));
    }

    @ParameterizedTest(name = "roughDepth {0} mm, stock {1} mm")
    @CsvSource({"1e-9, 0", "1e-9, 0.1", "1e-4, 0", "1e-300, 0.1"})
    void aRoughingDepthTooFineForTheBoundIsAnError(double rough, double stock) {
        HobCycle c = new DefaultCyclePlanner().plan(passes(rough, stock));
        List<Finding> e = c.findings().stream().filter(Finding::isError).toList();
        assertEquals(List.of("PLAN_TOO_MANY_PASSES"), e.stream().map(Finding::code).toList(), c.findings().toString());
        assertEquals("cycle.roughDepth", e.get(0).field());
        assertTrue(c.steps().isEmpty());
        assertTrue(e.get(0).fix().orElseThrow().contains("at least"), e.get(0).toString());
    }

    @Test
    void theBoundItselfIsPlanned() {
        HobJob probe = passes(1, 0);
        double depth = (26.0 - new DefaultCyclePlanner().plan(probe).setup().orElseThrow().finalInfeedDiameterMm()) / 2;
        // exactly MAX_PASSES roughing passes of equal depth
        HobCycle c = new DefaultCyclePlanner().plan(passes(depth / PassDepths.MAX_PASSES, 0));
        assertFalse(c.hasErrors(), c.findings().toString());
        assertEquals(PassDepths.MAX_PASSES, c.summary().orElseThrow().passes().size());
        assertEquals(c.stepSeconds(), c.summary().orElseThrow().cycleTimeS(), 1e-9 * c.stepSeconds());
    }

    @Test
    void passDepthsRefuseMoreThanTheBound() {
        assertEquals(2.0e9, PassDepths.count(2, 1e-9, 0));
        assertEquals(PassDepths.MAX_PASSES + 1.0, PassDepths.count(1.5, 1.0 / PassDepths.MAX_PASSES, 0.5));
        assertThrows(IllegalArgumentException.class, () -> PassDepths.of(2, 1e-9, 0.1));
    }
}
