package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.cycle.ToleranceData;
import org.hobwright.api.job.CuttingSense;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobbingMethod;
import org.hobwright.api.job.QualityTargets;
import org.hobwright.api.job.SwivelHolder.SwivelScale;
import org.hobwright.api.job.SwivelHolder;
import org.hobwright.api.testkit.SampleJobs;
import org.hobwright.wizard.check.EngineeringCode;
import org.hobwright.wizard.store.CuttingData;
import org.hobwright.wizard.store.CuttingDataTable;
import org.hobwright.wizard.store.QualityDefaults;
import org.junit.jupiter.api.Test;

/** Swivel setting, spindle senses, pass depths, targets and hob shift. */
class SetupRulesTest {

    private static SwivelHolder holder(SwivelScale scale, double res, boolean positiveIsRight) {
        return new SwivelHolder(scale, res, false, 30, "top of the hob toward the chuck", positiveIsRight);
    }

    @Test
    void swivelSettingInTheMachinesConvention() {
        // η = 13.2368° (FORMULAS.md §4.2 example), holder read in 5′ steps
        SwivelSetting right = SwivelSetting.of(13.2368, holder(SwivelScale.DEGREES_MINUTES, 5.0 / 60, true));
        assertEquals(13.25, right.machineAngleDeg(), 1e-12);
        assertEquals(13.2368, right.exactDeg(), 0);
        assertTrue(right.rounded());
        assertEquals("13° 15′", right.text());
        assertTrue(right.direction().contains("in the positive direction (on this machine: top of the hob toward the chuck)"));
        SwivelSetting flipped = SwivelSetting.of(13.2368, holder(SwivelScale.DEGREES_MINUTES, 5.0 / 60, false));
        assertEquals(-13.25, flipped.machineAngleDeg(), 1e-12);
        assertEquals(-13.2368, flipped.exactDeg(), 0, "machine's positive is not a right-hand η: sign flipped");
        assertEquals("-13° 15′", flipped.text());
        assertTrue(flipped.direction().startsWith("swing 13° 15′ in the negative direction"), flipped.direction());
        assertEquals("13.237°", SwivelSetting.of(13.2368, holder(SwivelScale.DECIMAL_DEGREES, 0.001, true)).text());
        assertEquals("13.2°", SwivelSetting.of(13.2368, holder(SwivelScale.DECIMAL_DEGREES, 0.1, true)).text());
        // FORMULAS.md §4.3: 13.2368° → 13° 14′ 12.39″; a vernier read to 1″ shows 13° 14′ 12.0″
        assertEquals("13° 14′ 12.0″", SwivelSetting.of(13.2368, holder(SwivelScale.DEGREES_MINUTES, 1.0 / 3600,
                true)).text());
        SwivelSetting zero = SwivelSetting.of(0.01, holder(SwivelScale.DEGREES_MINUTES, 5.0 / 60, true));
        assertEquals(0.0, zero.machineAngleDeg());
        assertTrue(zero.direction().startsWith("no swivel"));
    }

    @Test
    void spindleSensesFollowTheDerivedRule() {
        // derived rule (SpindleSenses, FORMULAS.md §7.4): the hob spindle keeps the hob's cutting sense and the
        // method picks the feed; on a machine whose clockwise teeth move away from the chuck, a clockwise hob
        // feeds toward the chuck for climb and away from it for conventional
        SpindleSenses rhClimb = SpindleSenses.of(Rotation.CLOCKWISE, false, HobbingMethod.CLIMB, Hand.RIGHT, Hand.RIGHT);
        assertEquals(Rotation.CLOCKWISE, rhClimb.hob());
        assertEquals(Rotation.CLOCKWISE, rhClimb.work());
        assertEquals(1, rhClimb.feedSign());
        SpindleSenses lhClimb = SpindleSenses.of(Rotation.CLOCKWISE, false, HobbingMethod.CLIMB, Hand.LEFT, Hand.RIGHT);
        assertEquals(Rotation.CLOCKWISE, lhClimb.hob());
        assertEquals(Rotation.COUNTER_CLOCKWISE, lhClimb.work());
        SpindleSenses rhConv = SpindleSenses.of(Rotation.CLOCKWISE, false, HobbingMethod.CONVENTIONAL, Hand.RIGHT,
                Hand.RIGHT);
        assertEquals(Rotation.CLOCKWISE, rhConv.hob(), "conventional hobbing never reverses the hob");
        assertEquals(Rotation.CLOCKWISE, rhConv.work());
        assertEquals(-1, rhConv.feedSign(), "conventional hobbing feeds the other way");
        // RH gear: extra rotation counter-clockwise seen from the front face (FORMULAS.md §5.2)
        assertEquals(-1, rhClimb.differentialSign());
        assertEquals(-1, rhConv.differentialSign());
        assertEquals(1, SpindleSenses.of(Rotation.CLOCKWISE, false, HobbingMethod.CLIMB, Hand.RIGHT, Hand.LEFT)
                .differentialSign());
        assertEquals(Rotation.COUNTER_CLOCKWISE, SpindleSenses.hobSpindle(CuttingSense.CLOCKWISE, true),
                "a hob turned round on its arbor runs the spindle the other way");
    }

    @Test
    void passDepths() {
        // equal split of the roughing region, finishing pass at full depth (common practice, no source)
        assertArrayEquals(new double[] {4.5}, PassDepths.of(4.5, 4.5, 0).depthsMm());
        assertArrayEquals(new double[] {4.5}, PassDepths.of(4.5, 10, 0).depthsMm());
        assertArrayEquals(new double[] {2, 4, 4.5}, PassDepths.of(4.5, 2, 0.5).depthsMm(), 1e-12);
        assertArrayEquals(new double[] {1.125, 2.25, 3.375, 4.5}, PassDepths.of(4.5, 1.3, 0).depthsMm(), 1e-12);
        assertArrayEquals(new double[] {4.5}, PassDepths.of(4.5, 1, 5).depthsMm(), "stock above the depth: one pass");
        assertArrayEquals(new double[] {1.5, 3.0, 4.5}, PassDepths.of(4.5, 1.5, 0).depthsMm(), 1e-12,
                "a whole number of passes does not add one");
        PassDepths p = PassDepths.of(4.5, 2, 0.5);
        assertEquals(0.5, p.increment(2), 1e-12);
        assertTrue(p.isLast(2));
    }

    @Test
    void targetsFromTheJobTheToleranceClassOrTheTable() {
        QualityDefaults d = CuttingDataTable.builtIn().qualityDefaults();
        CuttingData row = CuttingDataTable.builtIn().find("brass", "hss").orElseThrow();
        // FORMULAS.md §9.1 worked example (m_n 2, d 62.1166, b 20, class 6): f_fαT 8.5, f_fβT 9.5 µm
        ToleranceData tol = new ToleranceData(6, 8.5, 25, 7.0, 8.5, 11, 8.5, 9.5, 13);
        QualityLimits fromClass = QualityLimits.of(QualityTargets.DEFAULTS, Optional.of(tol), d, Optional.of(row));
        assertEquals(d.toleranceShare() * 9.5, fromClass.feedMarkUm(), 1e-12);
        assertEquals(d.toleranceShare() * 8.5, fromClass.envelopingUm(), 1e-12);
        assertEquals(row.maxChipThicknessMm(), fromClass.chipMm());
        QualityLimits fromTable = QualityLimits.of(QualityTargets.DEFAULTS, Optional.empty(), d, Optional.empty());
        assertEquals(d.feedMarkDepthUm(), fromTable.feedMarkUm());
        assertTrue(Double.isNaN(fromTable.chipMm()));
        QualityLimits given = QualityLimits.of(new QualityTargets(OptionalDouble.of(2), OptionalDouble.of(1), OptionalDouble.of(0.1)),
                Optional.of(tol), d, Optional.of(row));
        assertEquals(2, given.feedMarkUm());
        assertEquals(1, given.envelopingUm());
        assertEquals(0.1, given.chipMm());
    }

    @Test
    void hobShiftWithinTheUsableLength() {
        var job = SampleJobs.spurMetric();
        var cycle = TestJobs.shiftAndFastest(job.cycle(), 0.5, 10, false);
        List<Finding> f = new ArrayList<>();
        HobShiftPlan p = HobShiftPlan.of(job.machine(), job.hob(), cycle, 4.5, 20, f).orElseThrow();
        // working width 2·4.5/tan 20° (generating zone, FORMULAS.md §7.2, derived) + π·2 (one axial pitch,
        // common practice, no source) = 31.0105 mm; hob 80 mm, axis 60 mm → usable 48.9895 mm
        assertEquals(80 - (9 / Math.tan(Math.toRadians(20)) + 2 * Math.PI), p.usableMm(), 1e-9);
        assertEquals(98, p.positions());
        assertEquals(0, p.positionForPart(9));
        assertEquals(0.5, p.positionForPart(10));
        assertEquals(48.5, p.positionForPart(979), 1e-12);
        assertEquals(0, p.positionForPart(980), "wraps back to the start");
        assertTrue(f.isEmpty());
        var tooFar = TestJobs.shiftAndFastest(job.cycle(), 70, 1, false);
        HobShiftPlan.of(job.machine(), job.hob(), tooFar, 4.5, 20, f);
        assertEquals(PlanCode.PLAN_HOB_SHIFT_STEP_TOO_LARGE.code(), f.get(0).code());
    }

    @Test
    void helicalGearOnAMachineThatCannotFollowAHelixIsAnError() {
        var job = SampleJobs.helicalOnSpurMachine();
        HobCycle c = new DefaultCyclePlanner().plan(job);
        // reported once, by the engineering check, before any planning
        assertEquals(List.of(EngineeringCode.MACHINE_NO_HELIX.code()),
                c.findings().stream().filter(Finding::isError).map(Finding::code).toList());
        assertTrue(c.steps().isEmpty());
    }
}
