package org.hobwright.wizard.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.stream.Collectors;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.GearPairData;
import org.hobwright.api.cycle.InspectionLimits;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.MatingGear;
import org.hobwright.api.testkit.SampleJobs;
import org.junit.jupiter.api.Test;

/**
 * The inspection limits and the mating gear as the analysis of a job gives them, with their findings. The
 * numbers are checked against their sources in {@code MeasurementLimitsTest}, {@code BruteForceCrossCheckTest}
 * and {@code GearPairTest}; here: that the job's values reach them and that what cannot be right is said.
 * The gear is the spur sample: m 2, z 20, α 20°, x 0, ISO 53 A.
 */
class LimitsAndMateAnalysisTest {

    private static HobJob spur(GearSpec change) {
        return SampleJobs.spurMetric().withGear(change);
    }

    private static GearSpec gear() {
        return SampleJobs.spurMetric().gear();
    }

    private static List<Finding> with(JobAnalysis a, String code) {
        return a.findings().stream().filter(f -> f.code().equals(code)).toList();
    }

    private static String lines(JobAnalysis a) {
        return a.findings().stream().map(Finding::line).collect(Collectors.joining("\n"));
    }

    private static GearSpec mate(int teeth, OptionalDouble shift, OptionalDouble centre) {
        return gear().withMate(Optional.of(new MatingGear(teeth, shift, centre, 0, OptionalDouble.empty())));
    }

    @Test
    void theLowerAllowanceGivesLimits() {
        GearSpec g = gear().withThicknessAllowanceMm(-0.04).withThicknessAllowanceLowerMm(OptionalDouble.of(-0.1));
        JobAnalysis a = JobAnalyser.analyse(spur(g));
        assertFalse(a.hasErrors(), lines(a));
        InspectionLimits l = a.inspection().orElseThrow().limits().orElseThrow();
        assertEquals("drawing", l.basis());
        assertEquals(a.inspection().orElseThrow().spanWidthMm(), l.spanWidthUpperMm(), 0);
        // A_W = ΔE cos α_n (DIN 3960 relation, MeasurementLimitsTest): 0.06 cos 20° below the upper limit
        assertEquals(l.spanWidthUpperMm() - 0.06 * Math.cos(Math.toRadians(20)), l.spanWidthLowerMm(), 1e-12);
        assertTrue(l.overPinsLowerMm() < l.overPinsUpperMm());
    }

    @Test
    void withoutALowerAllowanceThereAreNoLimits() {
        JobAnalysis a = JobAnalyser.analyse(SampleJobs.spurMetric());
        assertEquals(Optional.empty(), a.inspection().orElseThrow().limits());
    }

    @Test
    void aSeriesIsReportedAsFromMemory() {
        GearSpec g = gear().withThicknessAllowanceMm(-0.054).withThicknessAllowanceLowerMm(OptionalDouble.of(-0.084))
                .withThicknessSeries(Optional.of("din3967-cd25"));
        JobAnalysis a = JobAnalyser.analyse(spur(g));
        assertEquals(1, with(a, "INSPECTION_LIMITS_SERIES").size(), lines(a));
        assertTrue(a.inspection().orElseThrow().limits().orElseThrow().basis().contains("from memory"));
    }

    // A thinner tooth lets the ball sink: z 17, m 1.5, β 30°, x −0.2 with the rule's 2.592 mm ball (1.728 m_n)
    // stands above the tip at E −0.02, but at E −0.4 it no longer does.
    @Test
    void aLowerLimitThatCannotBeMeasuredIsSaid() {
        GearSpec g = new GearSpec("lower", 17, new org.hobwright.api.job.Pitch.Module(1.5), 20, 30,
                org.hobwright.api.job.Hand.RIGHT, 30, -0.2, -0.02, "iso53-a", Optional.empty(), OptionalDouble.empty(),
                OptionalDouble.empty(), java.util.OptionalInt.empty(), org.hobwright.api.job.DrawingValues.NONE)
                .withThicknessAllowanceLowerMm(OptionalDouble.of(-0.4));
        JobAnalysis a = JobAnalyser.analyse(SampleJobs.helicalMetric().withGear(g));
        List<Finding> pin = with(a, "INSPECTION_PIN_CONTACT");
        assertEquals(1, pin.size(), lines(a));
        assertEquals("gear.thicknessAllowanceLower", pin.get(0).field());
        assertTrue(pin.get(0).message().contains("not above the tip diameter"), pin.get(0)::line);
    }

    @Test
    void aMateWithoutCentreDistanceRunsAtTheCentreDistanceWithoutBacklash() {
        JobAnalysis a = JobAnalyser.analyse(spur(mate(31, OptionalDouble.empty(), OptionalDouble.empty())));
        assertFalse(a.hasErrors(), lines(a));
        GearPairData p = a.pair().orElseThrow();
        // x₁ + x₂ = 0: the reference centre distance (20 + 31) · 2 / 2 = 51 mm, α_wt = α_t = 20°
        assertEquals(51, p.centreDistanceMm(), 1e-9);
        assertEquals(20, p.workingPressureAngleDeg(), 1e-9);
        assertEquals(0, p.backlashMinMm(), 1e-9);
        // c = 0.25 m (ISO 53 A: h_fP − h_aP)
        assertEquals(0.5, p.tipClearanceMm(), 1e-9);
        assertFalse(p.centreDistanceGiven());
    }

    @Test
    void aCentreDistanceWithoutTheMatesShiftImpliesIt() {
        // SDP/SI-style check by the relations of GearPairTest: 52.787831 mm needs x₁ + x₂ = 1 (z 20/31, m 2)
        JobAnalysis a = JobAnalyser.analyse(spur(mate(31, OptionalDouble.empty(), OptionalDouble.of(52.787831))));
        assertFalse(a.hasErrors(), lines(a));
        assertEquals(1, with(a, "GEAR_PAIR_MATE_SHIFT").size(), lines(a));
        assertEquals(1.0, a.pair().orElseThrow().mateProfileShift(), 1e-6);
        assertFalse(a.pair().orElseThrow().mateProfileShiftGiven());
    }

    @Test
    void aCentreDistanceBelowAnyPairIsAnError() {
        // a_d cos α_t = 51 cos 20° = 47.92 mm: the base circles would overlap below it
        JobAnalysis a = JobAnalyser.analyse(spur(mate(31, OptionalDouble.of(0), OptionalDouble.of(47))));
        assertEquals(1, with(a, "GEAR_PAIR_CENTRE_DISTANCE").size(), lines(a));
        assertTrue(a.hasErrors());
        assertEquals(Optional.empty(), a.pair());
    }

    @Test
    void shiftsThatDoNotFitTheCentreDistanceJam() {
        // shifts 0 and 0 need 51 mm; at 50.9 the nominal teeth would jam
        JobAnalysis a = JobAnalyser.analyse(spur(mate(31, OptionalDouble.of(0), OptionalDouble.of(50.9))));
        List<Finding> jam = with(a, "GEAR_PAIR_NO_BACKLASH");
        assertEquals(1, jam.size(), lines(a));
        assertTrue(jam.get(0).fix().orElseThrow().contains("51"), jam.get(0)::line);
    }

    // Tip clearance c = a − a_d − (x₁ + x₂) m + 0.25 m on both sides for ISO 53 A teeth without tip shortening
    // (a without backlash from GearPairTest's relations): Σx 1.5 → a 53.576951, c 0.077 mm < 0.1 m = 0.2 mm;
    // Σx 2 → a 54.321876, c −0.178 mm: the tips run into the roots.
    @Test
    void largeShiftsWithoutTipShorteningLeaveTooLittleTipClearance() {
        JobAnalysis small = JobAnalyser.analyse(spur(mate(31, OptionalDouble.of(1.5), OptionalDouble.empty())));
        assertEquals(53.576951, small.pair().orElseThrow().centreDistanceMm(), 1e-6);
        assertEquals(0.076951, small.pair().orElseThrow().tipClearanceMm(), 1e-6);
        assertEquals(2, with(small, "GEAR_PAIR_TIP_CLEARANCE_SMALL").size(), lines(small));
        JobAnalysis none = JobAnalyser.analyse(spur(mate(31, OptionalDouble.of(2), OptionalDouble.empty())));
        assertEquals(2, with(none, "GEAR_PAIR_TIP_INTERFERENCE").size(), lines(none));
        assertTrue(none.hasErrors());
    }

    @Test
    void theBacklashRangeFollowsBothGearsAllowances() {
        GearSpec g = gear().withThicknessAllowanceMm(-0.04).withThicknessAllowanceLowerMm(OptionalDouble.of(-0.1))
                .withMate(Optional.of(new MatingGear(31, OptionalDouble.of(0), OptionalDouble.empty(), -0.05,
                        OptionalDouble.of(-0.12))));
        GearPairData p = JobAnalyser.analyse(spur(g)).pair().orElseThrow();
        double cos = Math.cos(Math.toRadians(20));
        // at the centre distance without backlash of the nominal teeth: j_bn = −(E₁ + E₂) cos α_n (GearPairTest)
        assertEquals(0.09 * cos, p.backlashMinMm(), 1e-9);
        assertEquals(0.22 * cos, p.backlashMaxMm(), 1e-9);
    }
}
