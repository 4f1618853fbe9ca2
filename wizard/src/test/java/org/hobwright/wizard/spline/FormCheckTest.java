package org.hobwright.wizard.spline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.check.Finding;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The form check by the generating simulation against the rack geometry computed here from first
 * principles (the simulation shares none of it): a hob placed to cut tooth thickness S sits x m outside
 * the pitch circle, x = (S − π m/2)/(2 m tan α); its tip line then cuts the root radius r + x m − h_a0
 * exactly (one cut on the space centre), and its straight flank, h_a0 − ρ (1 − sin α) high above the tip
 * line, generates involute down to the radius √(r_b² + L²) with L = r sin α − (h_s − x m)/sin α (the end of
 * the straight flank on the line of action).
 */
class FormCheckTest {

    @ParameterizedTest(name = "{0} z {1}, m {2}, {3}° {4}")
    @CsvSource({"ISO_4156, 20, 1, 30, FLAT", "ISO_4156, 24, 2.5, 30, FILLET", "ISO_4156, 18, 1.25, 37.5, FILLET",
        "ISO_4156, 40, 0.5, 45, FILLET", "ANSI_B92_1, 24, 1.5875, 30, FLAT", "ANSI_B92_1, 30, 1.27, 37.5, FILLET"})
    void standardHobReachesTheFormAndCutsTheRootWithinItsLimits(SplineStandard std, int z, double m, double alpha,
                                                                SplineRoot root) {
        SplineLimits l = Splines.limits(SplineDrawing.of(std, z, m, alpha, root, 5, "h", 20));
        SplineHob hob = Splines.standardHob(l);
        List<Finding> findings = new ArrayList<>();
        assertTrue(SplineHobCheck.check(l, hob, Splines.MM, findings), findings.toString());
        FormCheck check = FormCheck.run(l, hob, 0.001, Splines.MM, findings);
        assertTrue(findings.isEmpty(), findings.toString());
        assertTrue(check.formReached());
        double a = Math.toRadians(alpha);
        double r = l.pitchDiameterMm() / 2;
        double xmMax = (l.toothThicknessMaxMm() - Math.PI * m / 2) / (2 * Math.tan(a));
        double xmMin = (l.toothThicknessMinMm() - Math.PI * m / 2) / (2 * Math.tan(a));
        assertEquals(2 * (r + xmMax - hob.addendumMm()), check.rootDiameterMaxMm(), 1e-9, "root at S_max");
        assertEquals(2 * (r + xmMin - hob.addendumMm()), check.rootDiameterMinMm(), 1e-9, "root at S_min");
        double hs = hob.addendumMm() - hob.tipRadiusMm() * (1 - Math.sin(a));
        double roll = r * Math.sin(a) - (hs - xmMax) / Math.sin(a);
        double rb = r * Math.cos(a);
        double start = 2 * Math.sqrt(rb * rb + roll * roll);
        // 12 gashes place the flank ends of the discrete cuts near, not on, the continuous limit; 400 gashes
        // sample the generating motion finely enough to meet it
        assertEquals(start, check.involuteStartDiameterMm(), 0.02 * m, "start of the involute, 12 gashes");
        SplineHob fine = new SplineHob(hob.moduleMm(), hob.pressureAngleDeg(), hob.root(), hob.addendumMm(),
                hob.tipRadiusMm(), 1, 400);
        assertEquals(start, FormCheck.run(l, fine, 0.001, Splines.MM, findings).involuteStartDiameterMm(), 0.001 * m,
                "start of the involute, 400 gashes");
    }

    @Test
    void aLargeTipRadiusLeavesTheFormUnreached() {
        // a flat-root hob of the standard addendum 0.75 m whose corner radius 0.45 m shortens its straight
        // flank to 0.525 m, well below the 0.6 m that D_Fe asks for (the involute begins about 0.09 mm too high)
        SplineLimits l = Splines.limits(Splines.iso(20, 1, 30, SplineRoot.FLAT, 5, "h"));
        SplineHob hob = Splines.withTip(Splines.standardHob(l), 0.75, 0.45);
        List<Finding> findings = new ArrayList<>();
        assertTrue(SplineHobCheck.check(l, hob, Splines.MM, findings), findings.toString());
        FormCheck check = FormCheck.run(l, hob, 0.001, Splines.MM, findings);
        assertFalse(check.formReached());
        assertTrue(check.involuteStartDiameterMm() > l.formDiameterMm());
        assertEquals(List.of("SPLINE_FORM_NOT_REACHED"), Splines.codes(findings));
    }

    @Test
    void aLongAddendumCutsBelowTheMinorDiameter() {
        SplineLimits l = Splines.limits(Splines.iso(20, 1, 30, SplineRoot.FLAT, 5, "h"));
        List<Finding> findings = new ArrayList<>();
        FormCheck.run(l, Splines.withTip(Splines.standardHob(l), 0.95, 0.2), 0.001, Splines.MM, findings);
        assertEquals(List.of("SPLINE_ROOT_BELOW_MINOR"), Splines.codes(findings));
        findings.clear();
        FormCheck.run(l, Splines.withTip(Splines.standardHob(l), 0.6, 0.2), 0.001, Splines.MM, findings);
        // a short addendum leaves the root high and, with it, the straight flank too short for the form
        assertEquals(List.of("SPLINE_FORM_NOT_REACHED", "SPLINE_ROOT_ABOVE_MINOR"), Splines.codes(findings));
    }

    @Test
    void hobThatDoesNotFitTheSplineGetsFindings() {
        SplineLimits l = Splines.limits(Splines.iso(20, 1, 30, SplineRoot.FILLET, 5, "h"));
        SplineHob good = Splines.standardHob(l);
        List<Finding> findings = new ArrayList<>();
        assertFalse(SplineHobCheck.check(l, new SplineHob(1.25, 37.5, SplineRoot.FLAT, 0.9, 0.4, 1, 12), Splines.MM, findings));
        assertEquals(List.of("SPLINE_HOB_PITCH", "SPLINE_HOB_PRESSURE_ANGLE", "SPLINE_HOB_ROOT_FORM"),
                Splines.codes(findings));
        findings.clear();
        assertTrue(SplineHobCheck.check(l, Splines.withTip(good, 0.9, 0.1), Splines.MM, findings));
        assertEquals(List.of("SPLINE_HOB_TIP_RADIUS_SMALL"), Splines.codes(findings));
        findings.clear();
        assertFalse(SplineHobCheck.check(l, Splines.withTip(good, 0.9, 0.9), Splines.MM, findings));
        assertEquals(List.of("SPLINE_HOB_TIP_RADIUS_LARGE"), Splines.codes(findings));
    }
}
