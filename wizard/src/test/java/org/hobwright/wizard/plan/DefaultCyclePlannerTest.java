package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.PassSummary;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.QualityTargets;
import org.hobwright.api.testkit.SampleJobs;
import org.hobwright.wizard.store.CuttingData;
import org.hobwright.wizard.store.CuttingDataTable;
import org.junit.jupiter.api.Test;

/** The planner on the test kit's sample jobs and variations of them. */
class DefaultCyclePlannerTest {
    private final DefaultCyclePlanner planner = new DefaultCyclePlanner();

    private static void close(double expected, double actual, String what) {
        assertEquals(expected, actual, Math.abs(expected) * 5e-6, what);
    }

    private static boolean has(HobCycle c, String code) {
        return c.findings().stream().anyMatch(f -> f.code().equals(code));
    }

    private static Finding finding(HobCycle c, String code) {
        return c.findings().stream().filter(f -> f.code().equals(code)).findFirst().orElseThrow(
                () -> new AssertionError("no " + code + " in " + c.findings()));
    }

    @Test
    void spurSynchronisation() {
        HobCycle c = planner.plan(SampleJobs.spurMetric());
        assertFalse(c.hasErrors(), c.findings().toString());
        SetupValues s = c.setup().orElseThrow();
        close(272.837, s.hobRpm(), "n0, FORMULAS.md §10 row 29");
        close(272.837 / 20, s.workRpm(), "n2 = n0 z0 / z2");
        assertEquals(20, s.syncHobTurns());
        assertEquals(1, s.syncWorkTurns());
        close(60, s.cuttingSpeedMPerMin(), "v_c kept");
        assertEquals(0.0, s.differentialDegPerMm(), "spur: no differential");
    }

    @Test
    void helicalWorkedExample() {
        HobCycle c = planner.plan(SampleJobs.helicalMetric());
        assertFalse(c.hasErrors(), c.findings().toString());
        SetupValues s = c.setup().orElseThrow();
        close(9.09457, s.workRpm(), "FORMULAS.md §10 row 30");
        assertEquals(30, s.syncHobTurns());
        // RH hob, climb: hob and work clockwise; the RH gear's extra rotation is counter-clockwise, so it
        // opposes the work's sense (derived rule, SpindleSenses); magnitude FORMULAS.md §10 row 31
        close(-0.494308, s.differentialDegPerMm(), "differential");
        CycleStep.SyncOn on = steps(c, CycleStep.SyncOn.class).get(0);
        assertEquals(Rotation.CLOCKWISE, on.hobRotation());
        assertEquals(Rotation.CLOCKWISE, on.workRotation());
        CycleSummary sum = c.summary().orElseThrow();
        // FORMULAS.md §10 rows 35 and §7.2: exact helical approach and overrun of the full-depth pass
        close(18.1330, sum.approachLengthMm(), "approach");
        close(2.83098, sum.overrunLengthMm(), "overrun");
        // FORMULAS.md §10 row 36: L = 44.964 mm (2 + 2 mm clearances) at f_a 1.5 → 3.29603 min
        CycleStep.Feed cut = steps(c, CycleStep.Feed.class).stream().filter(CycleStep.Feed::cutting).findFirst()
                .orElseThrow();
        assertEquals(3.29603 * 60, cut.seconds(), 3.29603 * 60 * 2e-5, "cutting time");
        // FORMULAS.md §4.2: η = 13.2368° = 13° 14′ 12.4″
        assertEquals("13° 14′ 12.4″", s.swivelAngleDms());
        assertEquals(13.237, s.swivelSettingDeg(), 1e-9, "rounded to the holder's 0.001°");
        assertEquals("13.237°", s.swivelSettingText());
    }

    @Test
    void stepsComeInTheSafeOrder() {
        HobCycle c = planner.plan(SampleJobs.helicalMetric());
        List<String> kinds = c.steps().stream().map(CycleStep::kind).filter(k -> !k.equals("comment")).toList();
        assertEquals(List.of("swivel", "hob-shift", "sync-on", "dwell", "coolant", "rapid", "rapid", "rapid", "feed",
                "feed", "rapid", "rapid", "rapid", "coolant", "sync-off", "spindles-stop"), kinds);
        assertInstanceOf(CycleStep.Comment.class, c.steps().get(0));
        assertTrue(c.steps().stream().anyMatch(s -> s instanceof CycleStep.Comment m && m.text().startsWith("sync: hob 30 : work 1")),
                "the sync comment names the ratio and the senses beside the moves");
        assertEquals(1.0, steps(c, CycleStep.Dwell.class).get(0).seconds(), "the machine's settle time");
        List<CycleStep.Feed> feeds = steps(c, CycleStep.Feed.class);
        assertFalse(feeds.get(0).cutting(), "radial infeed in air");
        assertTrue(feeds.get(1).cutting(), "axial cut");
        assertEquals(feeds.get(0).diameterMm(), feeds.get(1).diameterMm(), 1e-12, "infeed before the axial cut");
        close(c.gear().orElseThrow().rootDiameterMm(), feeds.get(1).diameterMm(), "full depth at the root");
    }

    @Test
    void cycleTimeIsTheSumOfTheSteps() {
        for (HobJob job : List.of(SampleJobs.spurMetric(), SampleJobs.helicalMetric(), TestJobs.meteringPumpOnVarrow())) {
            HobCycle c = planner.plan(job);
            double time = c.summary().orElseThrow().cycleTimeS();
            assertEquals(c.stepSeconds(), time, 1e-9 * time, job.name());
            double passes = c.summary().orElseThrow().passes().stream().mapToDouble(PassSummary::seconds).sum();
            assertTrue(passes <= time + 1e-9, "passes are part of the cycle");
        }
    }

    @Test
    void hobSpeedIsCappedAtTheSpindleLimitWithAFinding() {
        HobJob job = TestJobs.with(SampleJobs.spurMetric(), TestJobs.speeds(SampleJobs.machine(true), 50, 200, 1, 3000));
        HobCycle c = planner.plan(job);
        assertFalse(c.hasErrors());
        assertEquals(200, c.setup().orElseThrow().hobRpm(), 1e-9);
        close(Math.PI * 70 * 200 / 1000, c.setup().orElseThrow().cuttingSpeedMPerMin(), "speed actually used");
        assertTrue(finding(c, PlanCode.PLAN_HOB_RPM_CAPPED.code()).message().contains(SpeedWindow.HOB_SPINDLE_MAX));
        assertEquals(Severity.WARNING, finding(c, PlanCode.PLAN_HOB_RPM_CAPPED.code()).severity());
    }

    @Test
    void hobMakersLimitAndWorkSpindleLimitAlsoCap() {
        HobJob fast = TestJobs.with(SampleJobs.spurMetric(), TestJobs.cycle("steel-case-hardening", OptionalDouble.of(600),
                OptionalDouble.of(1.5), OptionalDouble.of(1.5), OptionalDouble.empty(), 0, QualityTargets.DEFAULTS, false));
        HobCycle c = planner.plan(fast);
        assertEquals(2000, c.setup().orElseThrow().hobRpm(), 1e-9, "hob maker's 2000 rpm");
        assertTrue(finding(c, PlanCode.PLAN_HOB_RPM_CAPPED.code()).message().contains(SpeedWindow.HOB_MAKER_MAX));
        HobJob slowWork = TestJobs.with(SampleJobs.spurMetric(), TestJobs.speeds(SampleJobs.machine(true), 50, 6000, 1, 5));
        HobCycle w = planner.plan(slowWork);
        assertEquals(100, w.setup().orElseThrow().hobRpm(), 1e-9, "work 5 rpm x 20 teeth");
        assertEquals(5, w.setup().orElseThrow().workRpm(), 1e-9);
        assertTrue(finding(w, PlanCode.PLAN_HOB_RPM_CAPPED.code()).message().contains(SpeedWindow.WORK_SPINDLE_MAX));
    }

    @Test
    void hobSpeedIsRaisedToTheSpindleMinimum() {
        HobJob job = TestJobs.with(SampleJobs.spurMetric(), TestJobs.speeds(SampleJobs.machine(true), 500, 6000, 1, 3000));
        HobCycle c = planner.plan(job);
        assertEquals(500, c.setup().orElseThrow().hobRpm(), 1e-9);
        assertTrue(has(c, PlanCode.PLAN_HOB_RPM_RAISED.code()));
    }

    @Test
    void noSpeedWindowIsAnError() {
        HobJob job = TestJobs.with(SampleJobs.spurMetric(), TestJobs.speeds(SampleJobs.machine(true), 500, 6000, 1, 10));
        HobCycle c = planner.plan(job);
        assertTrue(c.hasErrors());
        assertTrue(c.steps().isEmpty());
        assertEquals(Severity.ERROR, finding(c, PlanCode.PLAN_SPEED_WINDOW_EMPTY.code()).severity());
    }

    @Test
    void travelsOutsideTheMachineAreErrorsAndNothingIsPosted() {
        HobJob axial = TestJobs.with(SampleJobs.spurMetric(), TestJobs.travels(SampleJobs.machine(true), 300, -5, 300));
        HobCycle a = planner.plan(axial);
        assertTrue(a.hasErrors());
        assertTrue(a.steps().isEmpty());
        assertEquals("machine.travel.axialMin", finding(a, PlanCode.PLAN_TRAVEL_AXIAL.code()).field());
        assertTrue(a.summary().isPresent(), "the summary is still computed");
        HobJob radial = TestJobs.with(SampleJobs.spurMetric(), TestJobs.travels(SampleJobs.machine(true), 40, -200, 300));
        assertEquals("machine.travel.radialMax", finding(planner.plan(radial), PlanCode.PLAN_TRAVEL_RADIAL.code()).field());
    }

    @Test
    void findingsComeErrorsFirst() {
        HobJob job = TestJobs.with(SampleJobs.spurMetric(), TestJobs.travels(
                TestJobs.speeds(SampleJobs.machine(true), 50, 200, 1, 3000), 300, -5, 300));
        List<Finding> f = planner.plan(job).findings();
        assertTrue(f.size() >= 2);
        for (int i = 1; i < f.size(); i++) {
            assertTrue(f.get(i - 1).severity().compareTo(f.get(i).severity()) <= 0, f.toString());
        }
        assertEquals(Severity.ERROR, f.get(0).severity());
    }

    @Test
    void passesFromTouchOffToRootWithAFinishingPass() {
        HobJob job = TestJobs.with(SampleJobs.spurMetric(), TestJobs.cycle("steel-case-hardening", OptionalDouble.of(30),
                OptionalDouble.of(2.0), OptionalDouble.of(1.0), OptionalDouble.of(2.0), 0.5, QualityTargets.DEFAULTS,
                false));
        HobCycle c = planner.plan(job);
        List<PassSummary> p = c.summary().orElseThrow().passes();
        // depth 4.5 mm: roughing region 4.0 mm in two 2.0 mm passes, then the finishing pass
        assertEquals(3, p.size());
        assertEquals(2.0, p.get(0).radialDepthMm(), 1e-12);
        assertEquals(4.0, p.get(1).radialDepthMm(), 1e-12);
        assertEquals(4.5, p.get(2).radialDepthMm(), 1e-12);
        assertEquals(44 - 4.0, p.get(0).infeedDiameterMm(), 1e-9, "touch-off 44 mm less twice the depth");
        assertEquals(2.0, p.get(0).feedMmPerRev());
        assertEquals(1.0, p.get(2).feedMmPerRev(), "last pass at the finishing feed");
        close(CutGeometry.approachSpur(2.0, 70), p.get(0).approachMm(), "each pass its own approach");
        assertEquals(1.0, c.summary().orElseThrow().finishFeedMmPerRev());
    }

    @Test
    void defaultRoughingDepthByModule() {
        // common practice, no source (FORMULAS.md §7.5): full depth in one pass up to module 2.5 mm, else
        // 1.25 m_n per pass; m 3 on ISO 53 A cuts 2.25 · 3 = 6.75 mm in two passes
        HobJob m3 = new HobJob("m3", SampleJobs.spurMetric().units(), SampleJobs.gear(20, 3, 0,
                org.hobwright.api.job.Hand.RIGHT, 0), new org.hobwright.api.job.HobSpec(
                new org.hobwright.api.job.Pitch.Module(3), 20, 1, org.hobwright.api.job.Hand.RIGHT, 100,
                OptionalDouble.empty(), OptionalDouble.empty(), 12, 100, OptionalDouble.empty(), "hss"),
                SampleJobs.machine(true), SampleJobs.cycle());
        List<PassSummary> p = planner.plan(m3).summary().orElseThrow().passes();
        assertEquals(2, p.size());
        assertEquals(3.375, p.get(0).radialDepthMm(), 1e-12);
        assertEquals(6.75, p.get(1).radialDepthMm(), 1e-12);
        assertEquals(1, planner.plan(SampleJobs.spurMetric()).summary().orElseThrow().passes().size(), "m 2: one pass");
    }

    @Test
    void openFeedsComeFromTheTableAndMeetTheTargets() {
        HobJob job = TestJobs.with(SampleJobs.spurMetric(), TestJobs.cycle("steel-case-hardening", OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(), 0, QualityTargets.DEFAULTS,
                false));
        HobCycle c = planner.plan(job);
        assertFalse(c.hasErrors());
        CycleSummary s = c.summary().orElseThrow();
        CuttingData row = CuttingDataTable.builtIn().find("steel-case-hardening", "hss").orElseThrow();
        close(row.cuttingSpeed().mid(), c.setup().orElseThrow().cuttingSpeedMPerMin(), "middle of the speed range");
        assertTrue(s.finishFeedMmPerRev() <= row.finishFeed().mid());
        assertTrue(s.maxChipThicknessMm() <= row.maxChipThicknessMm() * (1 + 1e-9));
        assertTrue(s.feedMarkFlankUm() <= CuttingDataTable.builtIn().qualityDefaults().feedMarkDepthUm() * (1 + 1e-9));
        assertFalse(has(c, PlanCode.PLAN_FEED_MARK_OVER_TARGET.code()));
        assertFalse(has(c, PlanCode.PLAN_CHIP_OVER_LIMIT.code()));
    }

    @Test
    void predictionsOverTargetGiveFindings() {
        QualityTargets tight = new QualityTargets(OptionalDouble.of(1.0), OptionalDouble.of(0.1), OptionalDouble.of(0.01));
        HobJob job = TestJobs.with(SampleJobs.spurMetric(), TestJobs.cycle("steel-case-hardening", OptionalDouble.of(30),
                OptionalDouble.of(1.5), OptionalDouble.of(1.5), OptionalDouble.empty(), 0, tight, false));
        HobCycle c = planner.plan(job);
        CycleSummary s = c.summary().orElseThrow();
        // FORMULAS.md §6.1/§6.2 values for d_a0 70, m 2, z 20, i 14: f 1.5 → 2.74838 µm flank, 8.03571 µm root
        close(2.74838, s.feedMarkFlankUm(), "flank");
        close(8.03571, s.feedMarkRootUm(), "root");
        close(FinishFormulas.envelopingDepthUm(2, 20, 1, 14, 20, 0), s.envelopingDepthUm(), "enveloping");
        assertTrue(finding(c, PlanCode.PLAN_FEED_MARK_OVER_TARGET.code()).fix().orElseThrow().contains("0.904"),
                "fix names the largest feed, √(4·70·0.001/sin 20°) = 0.90481 mm (FORMULAS.md §6.1), rounded down");
        assertTrue(has(c, PlanCode.PLAN_ENVELOPING_OVER_TARGET.code()));
        assertTrue(has(c, PlanCode.PLAN_CHIP_OVER_LIMIT.code()));
        assertFalse(c.hasErrors(), "quality findings are warnings");
    }

    /**
     * The finding names the material without a row: the built-in table (cutting-data.json) has plastic
     * only with hss and carbide hobs, so a coated hob is the unknown one; "unobtainium" has no row at all.
     */
    @Test
    void missingCuttingDataNamesTheMaterialWithoutARow() {
        HobJob plastic = TestJobs.with(SampleJobs.spurMetric(), TestJobs.cycle("plastic", OptionalDouble.empty(),
                OptionalDouble.of(1), OptionalDouble.of(1), OptionalDouble.empty(), 0, QualityTargets.DEFAULTS, false));
        plastic = plastic.withHob(plastic.hob().withMaterial("hss-coated"));
        Finding hob = finding(planner.plan(plastic), PlanCode.PLAN_CUTTING_DATA_MISSING.code());
        assertEquals("hob.material", hob.field(), hob::toString);
        assertTrue(hob.message().contains("only with carbide or hss hobs"), hob::toString);
        HobJob unknown = TestJobs.with(SampleJobs.spurMetric(), TestJobs.cycle("unobtainium", OptionalDouble.empty(),
                OptionalDouble.of(1), OptionalDouble.of(1), OptionalDouble.empty(), 0, QualityTargets.DEFAULTS, false));
        assertEquals("cycle.workMaterial", finding(planner.plan(unknown), PlanCode.PLAN_CUTTING_DATA_MISSING.code())
                .field());
    }

    @Test
    void missingCuttingDataIsAnErrorOnlyWhenSomethingIsOpen() {
        HobJob open = TestJobs.with(SampleJobs.spurMetric(), TestJobs.cycle("unobtainium", OptionalDouble.empty(),
                OptionalDouble.of(1), OptionalDouble.of(1), OptionalDouble.empty(), 0, QualityTargets.DEFAULTS, false));
        assertTrue(has(planner.plan(open), PlanCode.PLAN_CUTTING_DATA_MISSING.code()));
        assertTrue(planner.plan(open).hasErrors());
        HobJob given = TestJobs.with(SampleJobs.spurMetric(), TestJobs.cycle("unobtainium", OptionalDouble.of(30),
                OptionalDouble.of(1), OptionalDouble.of(1), OptionalDouble.empty(), 0, QualityTargets.DEFAULTS, true));
        HobCycle c = planner.plan(given);
        assertFalse(c.hasErrors());
        assertTrue(has(c, PlanCode.PLAN_CHIP_LIMIT_UNKNOWN.code()));
        assertTrue(has(c, PlanCode.PLAN_FASTEST_NONE.code()), "no fastest cycle without table limits");
    }

    @Test
    void fastestCycleIsShownBesideThePlan() {
        HobJob job = TestJobs.with(SampleJobs.helicalMetric(), TestJobs.cycle("steel-case-hardening",
                OptionalDouble.of(30), OptionalDouble.of(1.0), OptionalDouble.of(0.8), OptionalDouble.empty(), 0,
                QualityTargets.DEFAULTS, true));
        HobCycle c = planner.plan(job);
        var p = c.summary().orElseThrow().fastest().orElseThrow();
        assertEquals(p.lowerBoundS(), p.cycleTimeS(), 1e-9 * p.cycleTimeS(), "bound reached");
        assertTrue(p.cycleTimeS() < c.summary().orElseThrow().cycleTimeS(), "faster than the cautious plan");
        assertTrue(p.cuttingSpeedMPerMin() <= 40 * (1 + 1e-12), "table maximum 40 m/min for HSS in this steel");
        assertTrue(p.bindingLimit().contains("cutting speed range"), p.bindingLimit());
        assertEquals(30, c.setup().orElseThrow().cuttingSpeedMPerMin(), 1e-9, "the user's plan is kept");
        assertTrue(has(c, PlanCode.PLAN_FASTEST.code()));
    }

    @Test
    void meteringPumpGearPlansOnTheInventedLathe() {
        HobCycle c = planner.plan(TestJobs.meteringPumpOnVarrow());
        assertFalse(c.hasErrors(), c.findings().toString());
        SetupValues s = c.setup().orElseThrow();
        // γ = asin(1/29.5) = 1.94300° (FORMULAS.md §4.1), η = −γ for a spur gear, holder read in 5′ steps
        assertEquals(-23.0 / 12, s.swivelSettingDeg(), 1e-12);
        assertEquals("-1° 55′", s.swivelSettingText());
        assertTrue(s.swivelDirection().contains("in the negative direction"), s.swivelDirection());
        assertTrue(has(c, PlanCode.PLAN_SWIVEL_ROUNDED.code()));
        // a manual holder: the setting is a step (a row of the cycle CSV), not a move of the control
        List<CycleStep> swivels = c.steps().stream().filter(x -> x instanceof CycleStep.Swivel).toList();
        assertEquals(1, swivels.size(), "manual holder: one swivel step");
        CycleStep.Swivel manual = (CycleStep.Swivel) swivels.get(0);
        assertFalse(manual.programmable(), "manual holder");
        assertEquals(-23.0 / 12, manual.machineAngleDeg(), 1e-12);
        // every move carries the hob's 32 mm tip diameter (metering-pump-gear.json)
        assertTrue(c.steps().stream().filter(x -> x instanceof CycleStep.Feed).allMatch(x ->
                ((CycleStep.Feed) x).hobTipDiameterMm() == 32), "hob tip diameter on the feeds");
        assertTrue(c.steps().stream().noneMatch(x -> x instanceof CycleStep.HobShift), "no shift axis");
        assertTrue(c.summary().orElseThrow().fastest().isPresent());
    }

    @Test
    void hobShiftIsPartOfTheCycle() {
        HobJob base = SampleJobs.spurMetric();
        HobJob job = TestJobs.with(base, TestJobs.shiftAndFastest(base.cycle(), 0.5, 10, false));
        HobCycle c = planner.plan(job);
        assertEquals(1, steps(c, CycleStep.HobShift.class).size());
        assertTrue(c.steps().stream().anyMatch(s -> s instanceof CycleStep.Comment m && m.text().startsWith(
                "hob shift 0.500 mm every 10 parts")));
        assertEquals(0.0, c.setup().orElseThrow().hobShiftMm());
    }

    private static <T extends CycleStep> List<T> steps(HobCycle c, Class<T> type) {
        return c.steps().stream().filter(type::isInstance).map(type::cast).toList();
    }
}
