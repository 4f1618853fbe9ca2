package org.hobwright.wizard.inspection;

import static org.hobwright.wizard.geometry.TestGears.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.TestGears;
import org.hobwright.wizard.geometry.ToothSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;

class InspectionReferenceTest {

    // Expected values and their sources: the header of reference/span-pins-chordal.csv.
    @ParameterizedTest(name = "case {0}: {6}({7}) = {8} ({9})")
    @CsvFileSource(resources = "/reference/span-pins-chordal.csv")
    void matchesPublishedValues(String id, int z, double m, double alpha, double beta, double x, String quantity,
                                double parameter, double expected, String source) {
        InvoluteGear g = TestGears.gear(z, m, alpha, beta, x);
        double actual = switch (quantity) {
            case "span" -> SpanMeasurement.widthMm(g, (int) parameter);
            case "spanTeethCalculated" -> SpanMeasurement.teethCalculated(g);
            case "spanContactDiameter" -> SpanMeasurement.over(g, (int) parameter).contactDiameterMm();
            case "overPins" -> OverPins.of(g, parameter).overPinsMm();
            case "pinCentrePressureAngle" -> Math.toDegrees(Math.acos(g.baseDiameterMm()
                    / OverPins.of(g, parameter).centreDiameterMm()));
            case "idealPin" -> OverPins.idealPinMm(g);
            case "chordalThickness" -> ChordalThickness.of(g, g.tipDiameterMm()).thicknessMm();
            case "chordalHeight" -> ChordalThickness.of(g, g.tipDiameterMm()).heightMm();
            default -> throw new IllegalArgumentException(quantity);
        };
        assertRelative(expected, actual, 5e-6, id + " " + quantity + " (" + source + ")");
    }

    // k rule: spur x = 0 reduces to k = z·α/180° + 0.5 (classic rule, FORMULAS.md section 3.1); ties (z a multiple of 9
    // at 20°) take the lower neighbour like printed span tables (z 10-18 → 2, from memory).
    @ParameterizedTest
    @CsvSource({"10, 2", "18, 2", "20, 3", "24, 3", "27, 3", "36, 4", "45, 5", "100, 12"})
    void spanTeethFollowTheClassicRule(int z, int k) {
        InvoluteGear g = TestGears.gear(z, 1, 20, 0, 0);
        assertEquals(z * 20.0 / 180 + 0.5, SpanMeasurement.teethCalculated(g), 1e-12);
        assertEquals(k, SpanMeasurement.of(g).teeth());
    }

    // Same helical gear of FORMULAS.md case 17: k_calc 4.50088 → 5 teeth, contact on 64.0650 mm.
    @Test
    void helicalSpanChoosesFiveTeeth() {
        SpanMeasurement s = SpanMeasurement.of(TestGears.gear(30, 2, 20, 15, 0.2));
        assertEquals(5, s.teeth());
        assertRelative(64.0650, s.contactDiameterMm(), 5e-6, "contact diameter");
    }

    // The thickness allowance enters as x_E = x + E/(2 m tan α) (FORMULAS.md section 2.1): the span shrinks by
    // |E| cos α_n (2 Δx m sin α = E cos α), the chordal thickness by about |E|.
    @Test
    void allowanceReducesSpanByItsNormalProjection() {
        InvoluteGear plain = TestGears.gear(24, 1, 20, 0, 0, "iso53-c");
        InvoluteGear thin = new InvoluteGear(24, 1, Math.toRadians(20), 0, 0, -0.03,
                ToothSystem.builtIn("iso53-c").orElseThrow());
        assertEquals(SpanMeasurement.widthMm(plain, 3) - 0.03 * Math.cos(Math.toRadians(20)),
                SpanMeasurement.widthMm(thin, 3), 1e-12);
        assertEquals(-0.03, ChordalThickness.of(thin, 26).thicknessMm() - ChordalThickness.of(plain, 26).thicknessMm(),
                1e-4);
        assertEquals(true, OverPins.of(thin, 1.75).overPinsMm() < OverPins.of(plain, 1.75).overPinsMm());
    }

    // Pin choice: job pin first, else 1.728 m (US wire tables, Machinery's Handbook) when it fits.
    @Test
    void pinChoiceFollowsTheStatedRule() {
        InvoluteGear g = TestGears.gear(24, 1, 20, 0, 0);
        assertEquals(1.75, PinChoice.choose(g, java.util.OptionalDouble.of(1.75), 26, 0.01).diameterMm(), 0);
        PinChoice rule = PinChoice.choose(g, java.util.OptionalDouble.empty(), 26, 0.01);
        assertEquals(PinChoice.Origin.WIRE_TABLE_RULE, rule.origin());
        assertEquals(1.728, rule.diameterMm(), 1e-15);
    }

    // z 8, x 0.6, m 1: the 1.728 mm pin reaches only 11.081 mm, below the 11.2 mm tip (independent computation of
    // the over-pins relation), so the pin touching at d + 2 x m is used: 2.95497 mm → 2.95 mm at a 0.01 mm step.
    @Test
    void largeShiftGetsAComputedPin() {
        InvoluteGear g = TestGears.gear(8, 1, 20, 0, 0.6);
        assertRelative(11.0811, OverPins.of(g, 1.728).overPinsMm(), 5e-6, "rule pin");
        PinChoice c = PinChoice.choose(g, java.util.OptionalDouble.empty(), g.tipDiameterMm(), 0.01);
        assertEquals(PinChoice.Origin.CONTACT_AT_SHIFTED_REFERENCE, c.origin());
        assertEquals(2.95, c.diameterMm(), 1e-12);
        assertEquals(true, OverPins.of(g, c.diameterMm()).fits(g.rootFormDiameterMm(), g.tipDiameterMm()));
    }
}
