package org.hobwright.wizard.inspection;

import static org.hobwright.wizard.geometry.TestGears.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.ToothSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Over-pins, over-balls and span values against brute-force constructions on sampled flanks
 * ({@link SampledFlanks}), which share no formula with the production code: no involute function, no
 * pressure angle of the pin centre, no base tangent length.
 */
class BruteForceCrossCheckTest {

    private static InvoluteGear gear(int z, double m, double alpha, double beta, double x, double allowance) {
        return new InvoluteGear(z, m, Math.toRadians(alpha), Math.toRadians(beta), x, allowance,
                ToothSystem.builtIn("iso53-a").orElseThrow());
    }

    // The rows with m 25.4 are FORMULAS.md case 18: 1 DP, wire 1.728 in; the over-wire value printed in the wire
    // tables (34.4130 in for 32 teeth, from memory) is in reference/span-pins-chordal.csv.
    // The pin or ball centre is found by bisection on its radius R until its distance to the sampled flank is
    // D/2; the measurement is the distance between two such centres (opposite gaps: 2R; odd counts: the gap
    // nearest opposite, at π − π/z) plus D.
    @ParameterizedTest(name = "z {0}, m {1}, β {3}°, x {4}, E {5}, D {6}")
    @CsvSource({
        "20, 2, 20, 0, 0, 0, 3.5", "21, 2, 20, 0, 0, 0, 3.5", "12, 0.8, 20, 0, 0.3, 0, 1.4",
        "24, 1, 20, 0, 0, -0.03, 1.75", "32, 3.175, 14.5, 0, 0.1, 0, 5.5",
        "30, 2, 20, 15, 0.2, 0, 3.5", "31, 2, 20, 15, 0.2, 0, 3.5", "17, 1.5, 20, 30, -0.2, -0.02, 2.6",
        "32, 25.4, 20, 0, 0, 0, 43.8912", "31, 25.4, 20, 0, 0, 0, 43.8912"})
    void overPinsAgreeWithACircleTangentToSampledFlanks(int z, double m, double alpha, double beta, double x,
                                                        double allowance, double pin) {
        InvoluteGear g = gear(z, m, alpha, beta, x, allowance);
        SampledFlanks flanks = new SampledFlanks(z, m, alpha, beta, x, allowance, g.tipDiameterMm());
        double r = centreRadius(g, flanks, pin);
        double other = z % 2 == 0 ? Math.PI : Math.PI - Math.PI / z;
        double centres = Math.hypot(r - r * Math.cos(other), r * Math.sin(other));
        assertRelative(centres + pin, OverPins.of(g, pin).overPinsMm(), 1e-8, "over pins");
    }

    /**
     * Radius of the pin or ball centre on the gap's centre line, where it is D/2 from the flank: regula falsi
     * (Illinois variant) on the distance, bracketed below at the base circle and above beyond the tip.
     */
    private static double centreRadius(InvoluteGear g, SampledFlanks flanks, double pin) {
        double lo = g.baseDiameterMm() / 2;
        double hi = g.tipDiameterMm() / 2 + pin;
        double fLo = flanks.distanceToGapFlank(new double[] {lo, 0, 0}, 0.3) - pin / 2;
        double fHi = flanks.distanceToGapFlank(new double[] {hi, 0, 0}, 0.3) - pin / 2;
        assertTrue(fLo < 0, "bracket low");
        assertTrue(fHi > 0, "bracket high");
        int side = 0;
        for (int i = 0; i < 60 && hi - lo > 1e-11; i++) {
            double mid = (lo * fHi - hi * fLo) / (fHi - fLo);
            double f = flanks.distanceToGapFlank(new double[] {mid, 0, 0}, 0.3) - pin / 2;
            if (f == 0) {
                return mid;
            }
            if (f < 0) {
                lo = mid;
                fLo = f;
                fHi = side == -1 ? fHi / 2 : fHi;
                side = -1;
            } else {
                hi = mid;
                fHi = f;
                fLo = side == 1 ? fLo / 2 : fLo;
                side = 1;
            }
        }
        return (lo * fHi - hi * fLo) / (fHi - fLo);
    }

    // Where the pin or ball touches: the flank point nearest to its centre (the involute helicoid, continued
    // beyond the tip), found by minimising the distance over the roll and the turn along the helix. On a helical
    // gear the ball's normal lies in the base tangent plane at β_b to the transverse plane, so the contact lies
    // D cos β_b (not D / cos β_b) of roll below the ball centre's.
    @ParameterizedTest(name = "z {0}, m {1}, β {3}°, x {4}, D {5}")
    @CsvSource({
        // 16 teeth, module 2, 20°, helix 25°, ball 7 mm: the ball rides on the tip edge (contact above d_a 39.31)
        "16, 2, 20, 25, 0, 7", "16, 2, 20, 25, 0, 3.5",
        // 12 teeth, module 2, helix 30°, x 0.8: the ball of the old rule (5.28) and the right one (4.51)
        "12, 2, 20, 30, 0.8, 5.28", "12, 2, 20, 30, 0.8, 4.51",
        "30, 2, 20, 15, 0.2, 3.5", "20, 2, 20, 0, 0, 3.5", "17, 1.5, 20, 40, -0.2, 2.6"})
    void contactAgreesWithTheNearestPointOfTheSampledHelicoid(int z, double m, double alpha, double beta, double x,
                                                              double pin) {
        InvoluteGear g = gear(z, m, alpha, beta, x, 0);
        SampledFlanks flanks = new SampledFlanks(z, m, alpha, beta, x, 0, g.tipDiameterMm());
        double r = centreRadius(g, flanks, pin);
        double contact = flanks.nearestFlankDiameter(new double[] {r, 0, 0}, 0.3);
        assertRelative(contact, OverPins.of(g, pin).contactDiameterMm(), 1e-7, "contact diameter");
    }

    // The ball of a helical gear: 16 teeth, module 2, helix 25°, ball 7 mm touches at 39.52 mm, above the tip
    // (39.31 mm) — it rides on the tip edge, so the measurement is not over the flanks.
    @Test
    void ballRidingOnTheTipEdgeIsSeen() {
        InvoluteGear g = gear(16, 2, 20, 25, 0, 0);
        OverPins pins = OverPins.of(g, 7);
        assertEquals(39.52, pins.contactDiameterMm(), 0.005);
        assertTrue(pins.contactDiameterMm() > g.tipDiameterMm());
        assertFalse(pins.fits(g.rootFormDiameterMm(), g.tipDiameterMm()));
    }

    // The "ideal" ball touches the flank on d + 2 x m_n: checked on the sampled helicoid. β 30°, z 12, x 0.8,
    // module 2: 4.51 mm (the old relation gave 5.28 mm, whose contact lies well above that circle).
    @ParameterizedTest(name = "z {0}, m {1}, β {3}°, x {4}")
    @CsvSource({"12, 2, 20, 30, 0.8", "16, 2, 20, 25, 0", "30, 2, 20, 15, 0.2", "20, 1, 20, 0, 0", "25, 1.5, 20, 40, 0.3"})
    void idealBallTouchesOnTheShiftedReferenceCircle(int z, double m, double alpha, double beta, double x) {
        InvoluteGear g = gear(z, m, alpha, beta, x, 0);
        SampledFlanks flanks = new SampledFlanks(z, m, alpha, beta, x, 0, g.tipDiameterMm());
        double ball = OverPins.idealPinMm(g);
        double r = centreRadius(g, flanks, ball);
        assertRelative(g.referenceDiameterMm() + 2 * x * m, flanks.nearestFlankDiameter(new double[] {r, 0, 0}, 0.3),
                1e-7, "contact of the ideal ball");
        if (z == 12) {
            assertEquals(4.51, ball, 0.005);
        }
    }

    // The span is the width of the k-tooth group between two parallel planes touching its outer flanks: with the
    // group symmetric about +x, twice the largest projection of one outer flank onto n = (0, cos ψ, sin ψ),
    // minimised over ψ (the anvils settle where they touch the flanks along a line), within the face width.
    @ParameterizedTest(name = "z {0}, m {1}, β {3}°, x {4}, E {5}, k {6}")
    @CsvSource({
        "20, 1, 20, 0, 0, 0, 3", "24, 3, 20, 0, 0.4, 0, 4", "24, 1, 20, 0, 0, -0.03, 3", "40, 0.5, 14.5, 0, 0, 0, 4",
        "30, 2, 20, 15, 0.2, 0, 5", "30, 2, 20, 15, 0.2, 0, 4", "25, 1.5, 20, 25, -0.1, -0.02, 4"})
    void spanAgreesWithTheWidthOfSampledFlanks(int z, double m, double alpha, double beta, double x,
                                               double allowance, int k) {
        InvoluteGear g = gear(z, m, alpha, beta, x, allowance);
        SampledFlanks flanks = new SampledFlanks(z, m, alpha, beta, x, allowance, g.tipDiameterMm());
        double top = (k - 1) / 2.0 * flanks.pitchAngle();
        double faceWidth = 40;
        double width = beta == 0 ? 2 * flanks.support(top, new double[] {0, 1, 0}, faceWidth)
                : SampledFlanks.minimise(psi -> 2 * flanks.support(top,
                        new double[] {0, Math.cos(psi), Math.sin(psi)}, faceWidth), -0.6, 0.6, 40);
        assertRelative(width, SpanMeasurement.widthMm(g, k), 1e-8, "span");
    }

    // The lower limits are the values of the tooth thinned by the lower allowance over the same teeth and with
    // the same pin or ball: the same constructions on flanks sampled with that allowance.
    @ParameterizedTest(name = "z {0}, m {1}, β {3}°, x {4}, E {5} / {6}")
    @CsvSource({
        "24, 1, 20, 0, 0, -0.03, -0.08", "21, 2, 20, 0, 0.2, -0.02, -0.09", "31, 2, 20, 15, 0.2, -0.05, -0.12",
        "25, 1.5, 20, 25, -0.1, -0.02, -0.07"})
    void lowerLimitsAgreeWithSampledFlanksOfTheThinnerTooth(int z, double m, double alpha, double beta, double x,
                                                           double upper, double lower) {
        InvoluteGear g = gear(z, m, alpha, beta, x, upper);
        InspectionValues v = InspectionValues.of(g, g.tipDiameterMm(), java.util.OptionalDouble.empty(), 0.01);
        org.hobwright.api.cycle.InspectionLimits l = MeasurementLimits.of(g, v, lower, "drawing");
        SampledFlanks thinner = new SampledFlanks(z, m, alpha, beta, x, lower, g.tipDiameterMm());
        double pin = v.pins().pinDiameterMm();
        double r = centreRadius(gear(z, m, alpha, beta, x, lower), thinner, pin);
        double other = z % 2 == 0 ? Math.PI : Math.PI - Math.PI / z;
        assertRelative(Math.hypot(r - r * Math.cos(other), r * Math.sin(other)) + pin, l.overPinsLowerMm(), 1e-8,
                "lower over-pins limit");
        int k = v.span().teeth();
        double top = (k - 1) / 2.0 * thinner.pitchAngle();
        double width = beta == 0 ? 2 * thinner.support(top, new double[] {0, 1, 0}, 40)
                : SampledFlanks.minimise(psi -> 2 * thinner.support(top,
                        new double[] {0, Math.cos(psi), Math.sin(psi)}, 40), -0.6, 0.6, 40);
        assertRelative(width, l.spanWidthLowerMm(), 1e-8, "lower span limit");
        assertEquals(v.data().spanWidthMm(), l.spanWidthUpperMm(), 0, "upper span limit is the value");
        assertEquals(v.data().overPinsMm(), l.overPinsUpperMm(), 0, "upper over-pins limit is the value");
    }
}
