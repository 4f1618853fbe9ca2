package org.hobwright.wizard.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.Units;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The same gear entered as an inch job (diametral pitch, lengths in inches converted at the boundary with
 * 25.4 mm/in) and as a metric job (module 25.4/P, lengths typed in mm) gives the same results to 1e-9
 * relative.
 */
class InchMetricTest {

    private static JobBuilder job(boolean inch, int teeth, double dp, double helix, double shift, String system,
                                  double faceIn, double blankIn, double pinIn, double allowanceIn, double hobOdIn) {
        JobBuilder b = new JobBuilder();
        b.units = inch ? Units.IN : Units.MM;
        b.teeth = teeth;
        b.pitch = inch ? new Pitch.Diametral(dp) : new Pitch.Module(25.4 / dp);
        b.helix = helix;
        b.hand = Hand.LEFT;
        b.hobHand = Hand.LEFT;
        b.shift = shift;
        b.system = system;
        b.faceWidth = inch ? Units.IN.toMm(faceIn) : faceIn * 25.4;
        b.blank = OptionalDouble.of(inch ? Units.IN.toMm(blankIn) : blankIn * 25.4);
        b.pin = OptionalDouble.of(inch ? Units.IN.toMm(pinIn) : pinIn * 25.4);
        b.allowance = inch ? Units.IN.toMm(allowanceIn) : allowanceIn * 25.4;
        b.hobDiameter = inch ? Units.IN.toMm(hobOdIn) : hobOdIn * 25.4;
        b.toleranceClass = java.util.OptionalInt.of(8);
        return b;
    }

    @ParameterizedTest
    @CsvSource({
        "32, 32, 0, 0, agma-fine, 0.125, 1.0625, 0.054, 0, 1.25",
        "24, 8, 0, 0.1, agma-coarse, 1.0, 3.275, 0.216, -0.002, 3.0",
        "30, 10, 14.5, 0, full-depth-14.5, 0.75, 3.2, 0.1728, -0.001, 2.5",
        "40, 12, 20, 0.2, agma-coarse, 1.5, 3.75, 0.144, -0.0015, 2.75"})
    void inchAndMetricJobsAgree(int teeth, double dp, double helix, double shift, String system, double faceIn,
                                double blankIn, double pinIn, double allowanceIn, double hobOdIn) {
        JobAnalysis inch = JobAnalyser.analyse(
                job(true, teeth, dp, helix, shift, system, faceIn, blankIn, pinIn, allowanceIn, hobOdIn).build());
        JobAnalysis metric = JobAnalyser.analyse(
                job(false, teeth, dp, helix, shift, system, faceIn, blankIn, pinIn, allowanceIn, hobOdIn).build());
        GearData a = inch.gear().orElseThrow();
        GearData b = metric.gear().orElseThrow();
        double[] x = {a.referenceDiameterMm(), a.baseDiameterMm(), a.tipDiameterMm(), a.rootDiameterMm(),
            a.wholeDepthMm(), a.toothThicknessMm(), a.tipThicknessMm(), a.baseHelixAngleDeg() + 1};
        double[] y = {b.referenceDiameterMm(), b.baseDiameterMm(), b.tipDiameterMm(), b.rootDiameterMm(),
            b.wholeDepthMm(), b.toothThicknessMm(), b.tipThicknessMm(), b.baseHelixAngleDeg() + 1};
        for (int i = 0; i < x.length; i++) {
            assertEquals(x[i], y[i], 1e-9 * Math.abs(x[i]), "gear value " + i);
        }
        InspectionData p = inch.inspection().orElseThrow();
        InspectionData q = metric.inspection().orElseThrow();
        assertEquals(p.spanTeeth(), q.spanTeeth());
        assertEquals(p.spanWidthMm(), q.spanWidthMm(), 1e-9 * p.spanWidthMm());
        assertEquals(p.overPinsMm(), q.overPinsMm(), 1e-9 * p.overPinsMm());
        assertEquals(p.chordalThicknessMm(), q.chordalThicknessMm(), 1e-9 * p.chordalThicknessMm());
        assertEquals(inch.hobSetup().orElseThrow().swivelAngleDeg(), metric.hobSetup().orElseThrow().swivelAngleDeg(),
                1e-9 * Math.max(1, Math.abs(inch.hobSetup().orElseThrow().swivelAngleDeg())));
        assertEquals(inch.tolerances(), metric.tolerances());
        assertEquals(codes(inch.findings()), codes(metric.findings()));
    }

    private static List<String> codes(List<Finding> findings) {
        return findings.stream().map(f -> f.code() + " " + f.field().replace("diametralPitch", "module")).toList();
    }
}
