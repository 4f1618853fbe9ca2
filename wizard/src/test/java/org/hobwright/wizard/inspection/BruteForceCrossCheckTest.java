package org.hobwright.wizard.inspection;

import static org.hobwright.wizard.geometry.TestGears.assertRelative;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.ToothSystem;
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
        double lo = g.baseDiameterMm() / 2;
        double hi = g.tipDiameterMm() / 2 + pin;
        assertTrue(flanks.distanceToGapFlank(new double[] {lo, 0, 0}, 0.3) < pin / 2, "bracket low");
        assertTrue(flanks.distanceToGapFlank(new double[] {hi, 0, 0}, 0.3) > pin / 2, "bracket high");
        for (int i = 0; i < 60; i++) {
            double mid = (lo + hi) / 2;
            if (flanks.distanceToGapFlank(new double[] {mid, 0, 0}, 0.3) < pin / 2) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double r = (lo + hi) / 2;
        double other = z % 2 == 0 ? Math.PI : Math.PI - Math.PI / z;
        double centres = Math.hypot(r - r * Math.cos(other), r * Math.sin(other));
        assertRelative(centres + pin, OverPins.of(g, pin).overPinsMm(), 1e-8, "over pins");
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
}
