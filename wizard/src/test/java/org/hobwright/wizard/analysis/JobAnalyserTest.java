package org.hobwright.wizard.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.stream.Collectors;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.ToothProportions;
import org.hobwright.api.job.Units;
import org.hobwright.api.testkit.SampleJobs;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class JobAnalyserTest {

    private static Finding only(JobAnalysis a, String code) {
        List<Finding> found = a.findings().stream().filter(f -> f.code().equals(code)).toList();
        assertEquals(1, found.size(), code + " in " + lines(a));
        return found.get(0);
    }

    private static boolean has(JobAnalysis a, String code) {
        return a.findings().stream().anyMatch(f -> f.code().equals(code));
    }

    private static String lines(JobAnalysis a) {
        return a.findings().stream().map(Finding::line).collect(Collectors.joining("\n"));
    }

    // The helical worked example (FORMULAS.md section 1.5): d_a 66.9166, span over 5 teeth 27.7705 (case 17),
    // η 13.2368° (case 27); class 7 f_pT = (0.001·62.1166 + 0.4·2 + 5)·2 = 11.72 → 12 µm (ISO 1328-1:2013 eq. (5),
    // by hand).
    @Test
    void helicalSampleJobIsCompleteAndClean() {
        JobAnalysis a = JobAnalyser.analyse(SampleJobs.helicalMetric());
        assertFalse(a.hasErrors(), lines(a));
        assertEquals(66.9166, a.gear().orElseThrow().tipDiameterMm(), 5e-4);
        assertEquals(5, a.inspection().orElseThrow().spanTeeth());
        assertEquals(27.7705, a.inspection().orElseThrow().spanWidthMm(), 5e-4);
        assertTrue(a.inspection().orElseThrow().balls());
        assertEquals(3.456, a.inspection().orElseThrow().pinDiameterMm(), 1e-12);
        assertEquals(13.2368, a.hobSetup().orElseThrow().swivelAngleDeg(), 5e-5);
        assertEquals(12, a.tolerances().orElseThrow().singlePitchUm(), 0);
    }

    @Test
    void helicalGearOnAMachineWithoutHelixIsAnError() {
        Finding f = only(JobAnalyser.analyse(SampleJobs.helicalOnSpurMachine()), "MACHINE_NO_HELIX");
        assertEquals(Severity.ERROR, f.severity());
        assertEquals("gear.helixAngle", f.field());
    }

    // The 12-tooth pinion of the sample scenario: x_min = 1 − 12 sin² 20°/2 = 0.2981 with h* = 0.99997 (ISO 53 A,
    // FORMULAS.md §2.3) → the wizard proposes x = 0.30; with x = 0.3 there is no undercut.
    @Test
    void smallPinionGetsTheShiftToUse() {
        JobBuilder b = new JobBuilder();
        b.teeth = 12;
        b.pitch = new Pitch.Module(0.8);
        b.system = "iso53-a";
        Finding f = only(JobAnalyser.analyse(b.build()), "GEAR_UNDERCUT");
        assertEquals(Severity.WARNING, f.severity());
        assertEquals("gear.profileShift", f.field());
        assertTrue(f.message().contains("at least 0.2981"), f.message());
        assertTrue(f.fix().orElseThrow().startsWith("set gear.profileShift to 0.3 (from 0.3 to 0.54 "),
                f.fix().orElseThrow());
        b.shift = 0.3;
        assertFalse(has(JobAnalyser.analyse(b.build()), "GEAR_UNDERCUT"));
        // the top of the range is where the tip check (0.25 m = 0.2 mm) starts to complain
        b.shift = 0.54;
        assertFalse(has(JobAnalyser.analyse(b.build()), "GEAR_TIP_THIN"));
        b.shift = 0.55;
        assertTrue(has(JobAnalyser.analyse(b.build()), "GEAR_TIP_THIN"));
    }

    /**
     * The undercut advice never loops into the tip check: for small tooth counts of several tooth
     * systems and both tip limits, the advice applied (the shift, and the blank when it says so) leaves
     * neither undercut nor a thin or pointed tip. When the advice says no shift exists, a search over
     * every shift from 0 to 1.5 in steps of 0.01 confirms it.
     */
    @Test
    void undercutAdviceNeverLeadsToAThinTip() {
        java.util.regex.Pattern shiftWord = java.util.regex.Pattern.compile("set gear.profileShift to ([0-9.]+)");
        java.util.regex.Pattern blankWord = java.util.regex.Pattern.compile("turn the blank to ([0-9.]+) mm");
        int advised = 0;
        int none = 0;
        for (String[] system : new String[][] {{"iso53-a", "20"}, {"iso53-c", "20"}, {"full-depth-14.5", "14.5"}}) {
            for (String material : new String[] {"steel-free-machining", "steel-case-hardening"}) {
                for (int z = 5; z <= 16; z++) {
                    JobBuilder b = new JobBuilder();
                    b.teeth = z;
                    b.system = system[0];
                    b.pressureAngle = Double.parseDouble(system[1]);
                    b.hobPressureAngle = b.pressureAngle;
                    b.material = material;
                    String what = z + " teeth, " + system[0] + ", " + material;
                    var f = JobAnalyser.analyse(b.build()).findings().stream()
                            .filter(x -> x.code().startsWith("GEAR_UNDERCUT")).findFirst();
                    if (f.isEmpty()) {
                        continue;
                    }
                    String fix = f.get().fix().orElseThrow();
                    var shift = shiftWord.matcher(fix);
                    if (fix.startsWith("no profile shift")) {
                        none++;
                        assertTrue(fix.contains("larger pressure angle"), fix);
                        for (int x = 0; x <= 150; x++) {
                            b.shift = x / 100.0;
                            JobAnalysis a = JobAnalyser.analyse(b.build());
                            assertFalse(!has(a, "GEAR_UNDERCUT") && !has(a, "GEAR_UNDERCUT_SLIGHT")
                                    && !has(a, "GEAR_TIP_THIN") && !has(a, "GEAR_TIP_POINTED"),
                                    what + ": shift " + b.shift + " is free of both, but the advice said none is: " + fix);
                        }
                    }
                    if (!shift.find()) {
                        assertTrue(fix.startsWith("no profile shift"), what + ": " + fix);
                        continue;
                    }
                    b.shift = Double.parseDouble(shift.group(1));
                    var blank = blankWord.matcher(fix);
                    if (blank.find()) {
                        b.blank = OptionalDouble.of(Double.parseDouble(blank.group(1)));
                    }
                    JobAnalysis after = JobAnalyser.analyse(b.build());
                    for (String code : new String[] {"GEAR_UNDERCUT", "GEAR_TIP_THIN", "GEAR_TIP_POINTED"}) {
                        assertFalse(has(after, code), what + ", advice " + fix + " applied: " + code + " "
                                + after.findings());
                    }
                    advised++;
                }
            }
        }
        assertTrue(advised > 20 && none > 0, advised + " advised, " + none + " without a shift");
    }

    // 14 teeth at 20°: the practical limit (Niemann/Winter, from memory; FORMULAS.md §2.3) → only a remark.
    @Test
    void fourteenTeethIsASlightUndercut() {
        JobBuilder b = new JobBuilder();
        b.teeth = 14;
        b.system = "iso53-a";
        assertEquals(Severity.INFO, only(JobAnalyser.analyse(b.build()), "GEAR_UNDERCUT_SLIGHT").severity());
    }

    // The counter wheel of the sample scenario: z 40, m 0.5, ISO 53 B → d 20, d_a 21, d_f 18.75, h 1.125
    // (ISO 21771 by hand); the drawing's 22 mm outside diameter is 1 mm off and would need x = 1.
    @Test
    void drawingWithAnImpossibleOutsideDiameter() {
        JobBuilder b = new JobBuilder();
        b.teeth = 40;
        b.pitch = new Pitch.Module(0.5);
        b.system = "iso53-b";
        b.allowance = -0.02;
        b.drawing = JobBuilder.drawing(20.0, 22.0, 18.75, 1.125, null, null, null, null);
        JobAnalysis a = JobAnalyser.analyse(b.build());
        Finding f = only(a, "DRAWING_OUTSIDE_DIAMETER");
        assertEquals(Severity.ERROR, f.severity());
        assertEquals("gear.drawing.outsideDiameter", f.field());
        assertEquals("outside diameter on the drawing 22 mm differs from the computed 21 mm by +1 mm;"
                + " it would fit a profile shift of 1 (the job has 0)", f.message());
        assertEquals("the outside diameter should be 21 mm; check the profile shift and the tooth system",
                f.fix().orElseThrow());
        Finding both = only(a, "DRAWING_INCONSISTENT");
        assertEquals("gear.drawing", both.field());
        assertEquals("the drawing's values fit different profile shifts (outside diameter 1, root diameter 0):"
                + " no gear has all of them", both.message());
        assertEquals(2, a.findings().stream().filter(Finding::isError).count(), lines(a));
    }

    // A drawing made for x = 0.25 on a job entered with x = 0.2: every shift-dependent value points to 0.25.
    @Test
    void drawingForAnotherShiftProposesIt() {
        JobBuilder b = new JobBuilder();
        b.shift = 0.25;
        b.allowance = -0.02;
        b.pin = OptionalDouble.of(1.75);
        JobAnalysis right = JobAnalyser.analyse(b.build());
        var gear = right.gear().orElseThrow();
        var insp = right.inspection().orElseThrow();
        b.shift = 0.2;
        b.drawing = JobBuilder.drawing(null, gear.tipDiameterMm(), gear.rootDiameterMm(), null, insp.spanTeeth(),
                insp.spanWidthMm(), null, insp.overPinsMm());
        JobAnalysis a = JobAnalyser.analyse(b.build());
        Finding f = only(a, "DRAWING_IMPLIES_SHIFT");
        assertEquals("gear.profileShift", f.field());
        assertEquals("if the drawing is right, set gear.profileShift to 0.25", f.fix().orElseThrow());
        assertFalse(has(a, "DRAWING_INCONSISTENT"));
        assertTrue(has(a, "DRAWING_OUTSIDE_DIAMETER") && has(a, "DRAWING_SPAN") && has(a, "DRAWING_OVER_PINS"));
    }

    // Span and over-pins printed without the thickness allowance: W_3 of m 1, z 24 is 7.71645 mm
    // (cos 20°·(2.5π + 24 inv 20°), FORMULAS.md §3.1), the allowance −0.03 takes 0.03 cos 20° = 0.02819 off.
    @Test
    void drawingSpanWithoutAllowanceIsCaught() {
        JobBuilder b = new JobBuilder();
        b.allowance = -0.03;
        b.drawing = JobBuilder.drawing(null, null, null, null, 3, 7.71645, null, null);
        Finding f = only(JobAnalyser.analyse(b.build()), "DRAWING_SPAN");
        assertTrue(f.message().contains("fits the tooth without the thickness allowance -0.03 mm"), f.message());
        assertTrue(f.fix().orElseThrow().startsWith("the span over 3 teeth should be 7.6883 mm"), f.fix().orElseThrow());
        b.drawing = JobBuilder.drawing(null, null, null, null, 3, 7.6883, null, null);
        assertFalse(has(JobAnalyser.analyse(b.build()), "DRAWING_SPAN"));
        b.drawing = JobBuilder.drawing(null, null, null, null, 30, 7.6883, null, null);
        assertEquals("gear.drawing.spanTeeth", only(JobAnalyser.analyse(b.build()), "DRAWING_SPAN_TEETH").field());
        // a span over one tooth (W_1 of m 1, z 24 is 1.81 mm) printed wrong: the count reads in the singular
        b.drawing = JobBuilder.drawing(null, null, null, null, 1, 2.5, null, null);
        Finding one = only(JobAnalyser.analyse(b.build()), "DRAWING_SPAN");
        String text = one.message() + " " + one.fix().orElse("");
        assertTrue(text.contains("span over 1 tooth") && !text.contains("1 teeth"), text);
    }

    @Test
    void drawingOverPinsOffBySaysByHowMuch() {
        JobBuilder b = new JobBuilder();
        b.pin = OptionalDouble.of(1.75);
        double m = JobAnalyser.analyse(b.build()).inspection().orElseThrow().overPinsMm();
        b.drawing = JobBuilder.drawing(null, null, null, null, null, null, null, m + 0.05);
        Finding f = only(JobAnalyser.analyse(b.build()), "DRAWING_OVER_PINS");
        assertTrue(f.message().contains("by +0.05 mm"), f.message());
        assertTrue(f.message().contains("it would fit a profile shift of"), f.message());
    }

    @Test
    void hobThatDoesNotMatchTheGear() {
        JobBuilder b = new JobBuilder();
        b.hobPitch = new Pitch.Diametral(24);
        b.hobPressureAngle = 14.5;
        JobAnalysis a = JobAnalyser.analyse(b.build());
        Finding m = only(a, "HOB_MODULE_MISMATCH");
        assertEquals("hob.diametralPitch", m.field());
        assertTrue(m.message().contains("diametral pitch 24/in (module 1.0583 mm)"), m.message());
        assertEquals("hob.pressureAngle", only(a, "HOB_PRESSURE_ANGLE_MISMATCH").field());
        assertTrue(a.hobSetup().isEmpty());
        assertTrue(a.gear().isPresent());
    }

    // Blank against d_a = 26 mm (m 1, z 24): smaller → topped; at the reference diameter 24 → error; larger →
    // stock; beyond the hob's tooth reach d_f + 2 (h_aP0 + h_fP0) = 21.5 + 5 = 26.5 mm (a standard hob clears the
    // tip by the rack clearance c only) → error.
    @ParameterizedTest
    @CsvSource({"25.5, GEAR_BLANK_BELOW_TIP, WARNING", "24, GEAR_BLANK_TOO_SMALL, ERROR",
        "26.3, GEAR_BLANK_ABOVE_TIP, WARNING", "27, GEAR_BLANK_TOO_LARGE, ERROR"})
    void blankDiameterAgainstTheTip(double blank, String code, Severity severity) {
        JobBuilder b = new JobBuilder();
        b.blank = OptionalDouble.of(blank);
        Finding f = only(JobAnalyser.analyse(b.build()), code);
        assertEquals(severity, f.severity());
        assertEquals("gear.blankDiameter", f.field());
        b.blank = OptionalDouble.of(26.005);
        assertFalse(JobAnalyser.analyse(b.build()).findings().stream().anyMatch(x -> x.code().startsWith("GEAR_BLANK")));
    }

    @Test
    void hobTooLargeForTheMachine() {
        JobBuilder b = new JobBuilder();
        b.machine = JobBuilder.smallLathe();
        b.hobDiameter = 50;
        assertEquals("hob.outsideDiameter", only(JobAnalyser.analyse(b.build()), "MACHINE_HOB_TOO_LARGE").field());
    }

    // β 29° RH with a LH hob: η = 29 + 1.94 ≈ 30.9° > 30°; a RH hob would need 27.06°.
    @Test
    void swivelBeyondTheMachineProposesTheOtherHand() {
        MachineProfile lathe = JobBuilder.smallLathe();
        JobBuilder b = new JobBuilder();
        b.machine = new MachineProfile(lathe.name(), lathe.dialect(), lathe.workMinRpm(), lathe.workMaxRpm(),
                lathe.hobMinRpm(), lathe.hobMaxRpm(), lathe.maxSyncRatio(), true, lathe.swivel(), lathe.radialMinMm(),
                lathe.radialMaxMm(), lathe.axialMinMm(), lathe.axialMaxMm(), lathe.hobShiftTravelMm(),
                lathe.rapidMmPerMin(), lathe.maxFeedMmPerMin(), lathe.syncSettleS(), lathe.maxHobDiameterMm());
        b.helix = 29;
        b.hobHand = Hand.LEFT;
        JobAnalysis a = JobAnalyser.analyse(b.build());
        Finding f = only(a, "MACHINE_SWIVEL_LIMIT");
        assertEquals("hob.hand", f.field());
        assertTrue(f.fix().orElseThrow().startsWith("use a right-hand hob"), f.fix().orElseThrow());
        assertTrue(has(a, "HOB_OPPOSITE_HAND"));
    }

    // Tip thickness (FORMULAS.md section 2.2): z 12, x 0.5, m 1 → 0.2851 mm: passes 0.25 m, fails 0.4 m for a
    // case-hardened gear; z 8, x 1.2 comes to a point.
    @Test
    void thinAndPointedTips() {
        JobBuilder b = new JobBuilder();
        b.teeth = 12;
        b.shift = 0.5;
        b.system = "iso53-a";
        assertFalse(has(JobAnalyser.analyse(b.build()), "GEAR_TIP_THIN"));
        b.material = "steel-case-hardening";
        Finding thin = only(JobAnalyser.analyse(b.build()), "GEAR_TIP_THIN");
        assertTrue(thin.message().contains("0.2851 mm is below 0.4 module"), thin.message());
        assertTrue(thin.fix().orElseThrow().startsWith("turn the blank to "), thin.fix().orElseThrow());
        b.teeth = 8;
        b.shift = 1.2;
        assertEquals(Severity.ERROR, only(JobAnalyser.analyse(b.build()), "GEAR_TIP_POINTED").severity());
    }

    @Test
    void toleranceClassOutsideTheScopeGivesAFindingAndNoValues() {
        JobBuilder b = new JobBuilder();
        b.pitch = new Pitch.Module(0.4);
        b.toleranceClass = java.util.OptionalInt.of(8);
        JobAnalysis a = JobAnalyser.analyse(b.build());
        assertTrue(only(a, "TOLERANCE_OUT_OF_SCOPE").message().contains("normal module 0.4 mm (scope 0.5 to 70 mm)"));
        assertTrue(a.tolerances().isEmpty());
        b.pitch = new Pitch.Module(1);
        assertTrue(JobAnalyser.analyse(b.build()).tolerances().isPresent());
    }

    @Test
    void hobRemarksAndLeadAngleChecks() {
        JobBuilder b = new JobBuilder();
        b.starts = 2;
        assertEquals(Severity.INFO, only(JobAnalyser.analyse(b.build()), "HOB_STARTS_COMMON_FACTOR").severity());
        b.starts = 1;
        b.hobReference = OptionalDouble.of(29.5);
        b.leadAngle = OptionalDouble.of(1.9);
        assertFalse(has(JobAnalyser.analyse(b.build()), "HOB_LEAD_ANGLE_MISMATCH"));
        b.leadAngle = OptionalDouble.of(3);
        assertEquals("hob.leadAngle", only(JobAnalyser.analyse(b.build()), "HOB_LEAD_ANGLE_MISMATCH").field());
        b.hobReference = OptionalDouble.of(33);
        JobAnalysis a = JobAnalyser.analyse(b.build());
        assertEquals("hob.referenceDiameter", only(a, "HOB_REFERENCE_DIAMETER_INVALID").field());
        assertTrue(a.hobSetup().isEmpty());
    }

    @Test
    void gearProblemsThatStopTheGeometry() {
        JobBuilder b = new JobBuilder();
        b.system = "iso53-z";
        assertEquals("gear.toothSystem", only(JobAnalyser.analyse(b.build()), "GEAR_TOOTH_SYSTEM_UNKNOWN").field());
        b.system = "iso53-c";
        b.teeth = 5;
        b.shift = -1.5;
        JobAnalysis a = JobAnalyser.analyse(b.build());
        assertEquals(Severity.ERROR, only(a, "GEAR_ROOT_NOT_POSITIVE").severity());
        assertTrue(has(a, "GEAR_PROFILE_SHIFT_RANGE"));
        assertTrue(a.gear().isEmpty());
    }

    @Test
    void customRootRadiusMustFit() {
        JobBuilder b = new JobBuilder();
        b.system = "custom";
        b.custom = Optional.of(new ToothProportions(1.0, 1.25, 0.5));
        assertEquals("gear.custom.rootRadius", only(JobAnalyser.analyse(b.build()), "GEAR_CUSTOM_ROOT_RADIUS").field());
        b.custom = Optional.of(new ToothProportions(1.0, 1.25, 0.38));
        assertFalse(has(JobAnalyser.analyse(b.build()), "GEAR_CUSTOM_ROOT_RADIUS"));
    }

    @Test
    void pinThatDoesNotTouchTheFlankIsReported() {
        JobBuilder b = new JobBuilder();
        b.pin = OptionalDouble.of(0.6);
        assertEquals("gear.pinDiameter", only(JobAnalyser.analyse(b.build()), "INSPECTION_PIN_CONTACT").field());
        b.pin = OptionalDouble.empty();
        b.teeth = 8;
        b.shift = 0.6;
        b.system = "iso53-a";
        assertEquals(Severity.INFO, only(JobAnalyser.analyse(b.build()), "INSPECTION_PIN_COMPUTED").severity());
    }

    // A ball riding on the tip edge: 16 teeth, module 2, 20°, helix 25° right hand, x 0, ball 7 mm touches the
    // helicoid at 39.52 mm (brute-force nearest point, BruteForceCrossCheckTest), above the 39.31 mm tip.
    @Test
    void ballRidingOnTheTipEdgeIsReported() {
        JobBuilder b = new JobBuilder();
        b.teeth = 16;
        b.pitch = new Pitch.Module(2);
        b.helix = 25;
        b.faceWidth = 20;
        b.system = "iso53-a";
        b.hobDiameter = 60;
        b.pin = OptionalDouble.of(7);
        Finding f = only(JobAnalyser.analyse(b.build()), "INSPECTION_PIN_CONTACT");
        assertTrue(f.message().contains("above the tip diameter 39.3081 mm"), f.message());
        b.pin = OptionalDouble.empty();
        assertFalse(has(JobAnalyser.analyse(b.build()), "INSPECTION_PIN_CONTACT"), "the chosen ball fits");
    }

    // Undercut: 20 teeth, module 2, 20°, x −0.7 (ISO 53 A). The rule's span over one tooth would touch at
    // 37.674 mm, inside the undercut (the involute starts at 37.686 mm, RootFormTest), so two teeth are spanned;
    // their anvils touch at 38.528 mm (d_c = √(d_b² + W₂²), W₂ = 8.4590 mm).
    @Test
    void spanOnAnUndercutGearTouchesAboveTheUndercut() {
        JobBuilder b = new JobBuilder();
        b.teeth = 20;
        b.pitch = new Pitch.Module(2);
        b.shift = -0.7;
        b.system = "iso53-a";
        b.hobDiameter = 60;
        JobAnalysis a = JobAnalyser.analyse(b.build());
        var inspection = a.inspection().orElseThrow();
        assertEquals(2, inspection.spanTeeth());
        assertEquals(38.5278, inspection.spanContactDiameterMm(), 1e-4);
        assertFalse(has(a, "INSPECTION_SPAN_CONTACT"));
    }

    // x −1 puts the tip on the reference circle (z 20, m 2: both 40 mm): the span and over-pins values are still
    // given, and a finding says why the chordal thickness at the reference circle cannot be measured.
    @Test
    void tipAtTheReferenceCircleKeepsTheInspectionValues() {
        JobBuilder b = new JobBuilder();
        b.teeth = 20;
        b.pitch = new Pitch.Module(2);
        b.shift = -1;
        b.system = "iso53-a";
        b.hobDiameter = 60;
        JobAnalysis a = JobAnalyser.analyse(b.build());
        assertTrue(a.inspection().isPresent(), lines(a));
        assertEquals("gear.profileShift", only(a, "INSPECTION_CHORDAL_ABOVE_TIP").field());
    }

    // Helical span anvils need b > W_k sin β_b + 2 mm (FORMULAS.md section 3.1).
    @Test
    void narrowHelicalGearCannotTakeTheSpan() {
        JobBuilder b = new JobBuilder();
        b.helix = 30;
        b.faceWidth = 3;
        assertEquals("gear.faceWidth", only(JobAnalyser.analyse(b.build()), "INSPECTION_SPAN_FACE_WIDTH").field());
    }

    // Messages are written in the job's unit: the inch fine-pitch wheel of the sample scenario (32 DP, 32 teeth,
    // agma-fine, blank 1.0625 in = OD 34/32 in, Mott Table 8-4 proportions) with a blank 0.01 in small.
    @Test
    void inchJobsSpeakInches() {
        JobBuilder b = new JobBuilder();
        b.units = Units.IN;
        b.teeth = 32;
        b.pitch = new Pitch.Diametral(32);
        b.system = "agma-fine";
        b.faceWidth = Units.IN.toMm(0.125);
        b.hobDiameter = Units.IN.toMm(1.25);
        b.blank = OptionalDouble.of(Units.IN.toMm(1.0625));
        JobAnalysis a = JobAnalyser.analyse(b.build());
        assertTrue(a.findings().isEmpty(), lines(a));
        assertEquals(1.0625, Units.IN.fromMm(a.gear().orElseThrow().tipDiameterMm()), 1e-12);
        b.blank = OptionalDouble.of(Units.IN.toMm(1.0525));
        Finding f = only(JobAnalyser.analyse(b.build()), "GEAR_BLANK_BELOW_TIP");
        assertEquals("blank diameter 1.0525 in is 0.01 in smaller than the tip diameter 1.0625 in: the teeth come out"
                + " topped", f.message());
    }

    @Test
    void findingsComeErrorsFirst() {
        JobAnalysis a = JobAnalyser.analyse(SampleJobs.helicalOnSpurMachine());
        for (int i = 1; i < a.findings().size(); i++) {
            assertTrue(a.findings().get(i - 1).severity().compareTo(a.findings().get(i).severity()) <= 0);
        }
    }
}
