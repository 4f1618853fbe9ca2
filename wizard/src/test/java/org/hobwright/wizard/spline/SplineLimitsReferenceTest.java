package org.hobwright.wizard.spline;

import static org.hobwright.wizard.geometry.TestGears.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The spline limits against the standards: published worked examples where one was at hand (named at
 * each check), and the standards' formulas restated here from FORMULAS.md (splines) for every standard,
 * pressure angle and root form. Where a value is from memory the check says so.
 */
class SplineLimitsReferenceTest {

    // DIN 5480-1:2006-03, Figure 6 (the drawing-data example, shaft DIN 5480 - W 120 x 3 x 38 x 8f): maximum
    // effective tooth thickness 6.243, actual 6.220 and 6.180 (the last read back from M1 min), over
    // measuring circles 6 mm: M1 max 126.017 (reference), M1 min 125.956. Values as quoted secondhand, not
    // read in the printed standard; they are reproduced to the printed 0.001 mm.
    @Test
    void dinFigureSixShaftReproducesItsDrawingData() {
        double s = 3 * (Math.PI / 2 + 2 * 0.45 * Math.tan(Math.toRadians(30)));
        SplineLimits l = Splines.limits(Splines.din(120, 3, 38, 6.243 - s, 6.243 - 6.180, 6.243 - 6.220));
        assertEquals(114.0, l.pitchDiameterMm(), 1e-12, "d = m z");
        assertEquals(1.35, DinSplines.shiftMm(l.spec()), 1e-12, "x m = (d_B − m z − 1.1 m)/2");
        assertEquals(6.271, l.basicToothThicknessMm(), 0.0005, "s = m (π/2 + 2 x tan α)");
        assertEquals(119.4, l.majorDiameterMaxMm(), 1e-9, "d_a1 = d_B − 0.2 m");
        assertEquals(6.220, l.toothThicknessMaxMm(), 1e-9, "s_max");
        assertEquals(6.180, l.toothThicknessMinMm(), 1e-9, "s_min");
        SplinePins pins = SplinePins.choose(l, OptionalDouble.empty(), List.of(), Splines.MM, new ArrayList<>());
        assertEquals(6.0, pins.pinMm(), 1e-12, "D_M = 2 m for m 3");
        assertEquals(126.017, pins.overPinsMaxMm(), 0.0005, "M1 max (reference)");
        assertEquals(125.956, pins.overPinsMinMm(), 0.0005, "M1 min");
    }

    // DIN 5480 data sheet of the shaft W 6 x 0.8 x 6, 10d (a published calculation sheet for DIN 5480-1:2006,
    // read secondhand): d 4.8, d_b 4.157, x m 0.16, d_a1 5.84, d_f1 4.24, s 1.441; with A_s −0.032,
    // T_eff 0.026, T_G 0.071: s_v max 1.409, s_max 1.383, s_min 1.338.
    @Test
    void dinDataSheetSmallShaft() {
        SplineLimits nominal = Splines.limits(Splines.din(6, 0.8, 6, 0, 0.071, 0.026));
        assertEquals(4.8, nominal.pitchDiameterMm(), 1e-12, "d");
        assertEquals(4.157, nominal.baseDiameterMm(), 0.0005, "d_b");
        assertEquals(0.16, DinSplines.shiftMm(nominal.spec()), 1e-12, "x m");
        assertEquals(5.84, nominal.majorDiameterMaxMm(), 1e-9, "d_a1");
        assertEquals(4.24, nominal.minorDiameterMaxMm(), 1e-9, "d_f1 (no deviation)");
        assertEquals(1.441, nominal.basicToothThicknessMm(), 0.0005, "s");
        SplineLimits l = Splines.limits(Splines.din(6, 0.8, 6, -0.032, 0.071, 0.026));
        assertEquals(1.409, l.effectiveThicknessMaxMm(), 0.0005, "s_v max");
        assertEquals(1.383, l.toothThicknessMaxMm(), 0.0005, "s_max");
        assertEquals(1.338, l.toothThicknessMinMm(), 0.0005, "s_min");
    }

    // ISO 4156-1:2005 Table 3 formulas (from memory, FORMULAS.md splines), restated: every pressure angle and
    // root form, with and without a fundamental deviation.
    @ParameterizedTest(name = "z {0}, m {1}, {2}° {3}, {4}{5}")
    @CsvSource({"20, 1, 30, FLAT, 5, h, 1.0, 1.5, 0.6, 0", "24, 2.5, 30, FILLET, 5, f, 1.0, 1.8, 0.6, -0.030",
        "18, 1.25, 37.5, FILLET, 6, e, 0.9, 1.4, 0.55, -0.040", "40, 0.5, 45, FILLET, 4, d, 0.8, 1.2, 0.5, -0.065",
        "60, 3, 30, FLAT, 7, e, 1.0, 1.5, 0.6, -0.085"})
    void isoFormulas(int z, double m, double alpha, SplineRoot root, int cls, String fit, double a, double b, double h,
                     double esv) {
        SplineLimits l = Splines.limits(Splines.iso(z, m, alpha, root, cls, fit));
        double t = Math.tan(Math.toRadians(alpha));
        double d = m * z;
        assertEquals(esv, l.tolerance().allowanceMm(), 1e-12, "es_v, ISO 286-1 Table 2 at D");
        assertRelative(d * Math.cos(Math.toRadians(alpha)), l.baseDiameterMm(), 1e-14, "D_b");
        assertRelative(m * (z + a) + esv / t, l.majorDiameterMaxMm(), 1e-14, "D_ee max");
        assertRelative(m * (z - b) + esv / t, l.minorDiameterMaxMm(), 1e-14, "D_ie max");
        double i1 = 0.45 * Math.cbrt(d) + 0.001 * d;
        double e = Math.PI * m / 2;
        double i2 = 0.45 * Math.cbrt(e) + 0.001 * e;
        assertRelative(m * (z - b) + esv / t - (40 * i1 + 160 * i2) / 1000 / t, l.minorDiameterMinMm(), 1e-14,
                "D_ie min = D_ie max − (T + λ)_class 7 / tan α_D");
        double[] k = {10, 16, 25, 40};
        assertRelative((k[cls - 4] * i1 + 4 * k[cls - 4] * i2) / 1000, l.tolerance().totalMm(), 1e-14, "T + λ");
        double rb = d * Math.cos(Math.toRadians(alpha)) / 2;
        double roll = d / 2 * Math.sin(Math.toRadians(alpha)) - (h * m - esv / 2 / t) / Math.sin(Math.toRadians(alpha));
        assertRelative(2 * Math.hypot(rb, roll), l.formDiameterMm(), 1e-14, "D_Fe max");
        assertEquals(e + esv, l.effectiveThicknessMaxMm(), 1e-14, "S_v max");
        assertEquals(0.1 * m, l.formClearanceMm(), 1e-15, "c_F");
    }

    // ISO 4156-1:2005, λ = 0.6 √(F_p² + f_f² + F_β²) with the class 5 deviations (from memory):
    // F_p = 3.55 √L + 9 (L = π m z / 2), f_f = 2.5 (m + 0.0125 m z) + 16, F_β = √g + 5 (g the length), µm.
    @Test
    void isoEffectiveVariationClassFive() {
        SplineLimits l = Splines.limits(Splines.iso(20, 1, 30, SplineRoot.FLAT, 5, "h"));
        double fp = 3.55 * Math.sqrt(Math.PI * 20 / 2) + 9;
        double ff = 2.5 * (1 + 0.0125 * 20) + 16;
        double fb = Math.sqrt(20) + 5;
        assertRelative(0.6 * Math.sqrt(fp * fp + ff * ff + fb * fb) / 1000, l.tolerance().effectiveVariationMm(), 1e-14,
                "λ");
    }

    // ANSI B92.1-1996 (recalled, FORMULAS.md splines): D = N/P, (N + 1)/P, (N − b)/P, form (N − f)/P − 2 c_F with
    // c_F = 0.001 D within 0.002 … 0.010 in, S_v max = (π/2 + k)/P, class 5 T = 11 + 0.07 N and λ = 13 + 0.12 N
    // (ten-thousandths, 16/32 and 20/40).
    @ParameterizedTest(name = "N {0}, P {1}, {2}° {3}")
    @CsvSource({"24, 16, 30, FLAT, 1.35, 1.0, 0", "19, 16, 30, FILLET, 2.0, 1.0, 0", "30, 20, 37.5, FILLET, 1.3, 0.8, 0.1",
        "36, 20, 45, FILLET, 1.0, 0.6, 0.2"})
    void ansiFormulas(int n, double p, double alpha, SplineRoot root, double b, double f, double k) {
        SplineLimits l = Splines.limits(Splines.ansi(n, p, alpha, root, 5));
        double d = n / p;
        double cf = Math.min(0.010, Math.max(0.002, 0.001 * d));
        assertRelative(d * 25.4, l.pitchDiameterMm(), 1e-14, "D");
        assertRelative((n + 1) / p * 25.4, l.majorDiameterMaxMm(), 1e-14, "D_o max");
        assertRelative(((n + 1) / p - 0.005) * 25.4, l.majorDiameterMinMm(), 1e-12, "D_o min, 16/32 and 20/40");
        assertRelative((n - b) / p * 25.4, l.minorDiameterMaxMm(), 1e-14, "D_re max");
        assertRelative(((n - f) / p - 2 * cf) * 25.4, l.formDiameterMm(), 1e-14, "D_Fe");
        assertRelative((Math.PI / 2 + k) / p * 25.4, l.effectiveThicknessMaxMm(), 1e-14, "S_v max");
        double t = Math.rint(11 + 0.07 * n) / 1e4;
        double lambda = Math.rint(13 + 0.12 * n) / 1e4;
        assertRelative((t + lambda) * 25.4, l.tolerance().totalMm(), 1e-14, "T + λ class 5");
        assertRelative(lambda * 25.4, l.tolerance().effectiveVariationMm(), 1e-14, "λ class 5");
        assertRelative(1.92 / p * 25.4, l.recommendedPinMm(), 1e-14, "pin 1.92/P");
    }

    // ANSI B92.1-1996: classes 4, 6, 7 are 0.71, 1.40 and 2.00 times the class 5 tolerances (as the standard's
    // note says; the same factors are in its secondary summaries).
    @Test
    void ansiClassFactors() {
        double five = Splines.limits(Splines.ansi(24, 16, 30, SplineRoot.FLAT, 5)).tolerance().totalMm();
        double[] factor = {0.71, 1.0, 1.40, 2.00};
        for (int c = 4; c <= 7; c++) {
            assertRelative(factor[c - 4] * five, Splines.limits(Splines.ansi(24, 16, 30, SplineRoot.FLAT, c))
                    .tolerance().totalMm(), 1e-14, "class " + c);
        }
    }

    // Two standards written independently agree where their definitions coincide: an ISO 4156 30° flat-root
    // spline of module 25.4/16 and fit h has the ANSI 16/32 spline's D, D_b, S and major diameter.
    @Test
    void isoAndAnsiAgreeWhereTheyCoincide() {
        SplineLimits iso = Splines.limits(SplineDrawing.of(SplineStandard.ISO_4156, 24, 25.4 / 16, 30, SplineRoot.FLAT, 5, "h",
                25));
        SplineLimits ansi = Splines.limits(Splines.ansi(24, 16, 30, SplineRoot.FLAT, 5));
        assertRelative(ansi.baseDiameterMm(), iso.baseDiameterMm(), 1e-14, "D_b");
        assertRelative(ansi.effectiveThicknessMaxMm(), iso.effectiveThicknessMaxMm(), 1e-14, "S_v max");
        assertRelative(ansi.majorDiameterMaxMm(), iso.majorDiameterMaxMm(), 1e-14, "D_ee max");
    }

    // The standard hob's addendum: 0.75 m for ISO 4156 30° flat root (D_ie max = m (z − 1.5)), 0.55 m for DIN 5480
    // (d_f1 = d_B − 2.2 m), whatever the deviation (derived: the hob sits deeper by es / (2 tan α)).
    @Test
    void standardHobAddendum() {
        assertEquals(0.75, Splines.limits(Splines.iso(20, 1, 30, SplineRoot.FLAT, 5, "e")).standardHobAddendumMm(),
                1e-12);
        assertEquals(0.55 * 3, Splines.limits(Splines.din(120, 3, 38, -0.028, 0.063, 0.023)).standardHobAddendumMm(),
                1e-12);
    }

    @Test
    void inputsTheStandardDoesNotDefineAreFindings() {
        assertEquals(List.of("SPLINE_PRESSURE_ANGLE"), codesOf(Splines.iso(20, 1, 20, SplineRoot.FILLET, 5, "h")));
        assertEquals(List.of("SPLINE_ROOT_FORM"), codesOf(Splines.iso(20, 1, 45, SplineRoot.FLAT, 5, "h")));
        assertEquals(List.of("SPLINE_TOLERANCE_CLASS"), codesOf(Splines.iso(20, 1, 30, SplineRoot.FLAT, 8, "h")));
        assertEquals(List.of("SPLINE_FIT_CLASS"), codesOf(Splines.iso(20, 1, 30, SplineRoot.FLAT, 5, "g")));
        assertEquals(List.of("SPLINE_FIT_CLASS"), codesOf(Splines.ansi(20, 16, 30, SplineRoot.FLAT, 5)
                .withFit("f")));
        assertEquals(List.of("SPLINE_PITCH"), codesOf(Splines.ansi(20, 14, 30, SplineRoot.FLAT, 5)));
        assertEquals(List.of("SPLINE_TEETH_RANGE"), codesOf(Splines.iso(5, 1, 30, SplineRoot.FLAT, 5, "h")));
        assertEquals(List.of("SPLINE_TOLERANCE_VALUES"), codesOf(SplineDrawing.of(SplineStandard.DIN_5480, 38, 3, 30,
                SplineRoot.FILLET, 8, "f", 40)));
        assertEquals(List.of("SPLINE_REFERENCE_DIAMETER"), codesOf(Splines.din(125, 3, 38, -0.028, 0.063, 0.023)));
        assertEquals(List.of("SPLINE_TOOTH_TOO_THIN"), codesOf(Splines.din(120, 3, 38, -3, 4, 0.023)));
        assertEquals(List.of("SPLINE_SIZE"), codesOf(Splines.iso(100, 6, 30, SplineRoot.FLAT, 5, "h")));
    }

    private static List<String> codesOf(SplineDrawing s) {
        List<Finding> findings = new ArrayList<>();
        SplineLimits.of(s, Splines.MM, findings);
        return Splines.codes(findings);
    }
}
