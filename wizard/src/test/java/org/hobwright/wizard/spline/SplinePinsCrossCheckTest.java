package org.hobwright.wizard.spline;

import static org.hobwright.wizard.geometry.TestGears.assertRelative;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.inspection.SampledFlanks;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The spline measurement over pins against a brute-force construction that shares no formula with the
 * production code: the flank is the unwound string of the base circle, turned so that the tooth is S wide
 * on the pitch circle ({@link SampledFlanks}); the pin centre is found by bisection on its radius until its
 * distance to the sampled flank is half the pin; the measurement is the distance between two centres (odd
 * counts: the gap nearest opposite) plus the pin. Agreement to 1e-6 relative or better.
 */
class SplinePinsCrossCheckTest {

    @ParameterizedTest(name = "{0} z {1}, m {2}, {3}°, class {5}{6}")
    @CsvSource({
        "ISO_4156, 20, 1, 30, FLAT, 5, h", "ISO_4156, 21, 1.25, 30, FILLET, 6, f", "ISO_4156, 12, 2, 37.5, FILLET, 4, e",
        "ISO_4156, 31, 0.8, 45, FILLET, 7, d", "ANSI_B92_1, 24, 1.5875, 30, FLAT, 5, h",
        "ANSI_B92_1, 19, 1.5875, 30, FILLET, 6, h", "ANSI_B92_1, 15, 2.54, 37.5, FILLET, 5, h",
        "ANSI_B92_1, 36, 1.058333333333, 45, FILLET, 7, h"})
    void overPinsAgreeWithACircleTangentToSampledFlanks(SplineStandard std, int z, double m, double alpha,
                                                        SplineRoot root, int cls, String fit) {
        List<Finding> findings = new ArrayList<>();
        SplineLimits limits = SplineLimits.of(SplineDrawing.of(std, z, m, alpha, root, cls, fit, 20), Splines.MM, findings)
                .orElseThrow();
        SplinePins pins = SplinePins.choose(limits, OptionalDouble.empty(), List.of(), Splines.MM, findings);
        assertTrue(findings.isEmpty(), findings.toString());
        assertRelative(bruteForce(limits, pins.pinMm(), limits.toothThicknessMaxMm()), pins.overPinsMaxMm(), 1e-7,
                "over pins at S_max");
        assertRelative(bruteForce(limits, pins.pinMm(), limits.toothThicknessMinMm()), pins.overPinsMinMm(), 1e-7,
                "over pins at S_min");
    }

    static double bruteForce(SplineLimits limits, double pin, double thickness) {
        SplineDrawing s = limits.spec();
        int z = s.teeth();
        double m = s.moduleMm();
        SampledFlanks flanks = new SampledFlanks(z, m, s.pressureAngleDeg(), 0, 0, thickness - Math.PI * m / 2,
                limits.majorDiameterMaxMm() + 2 * m);
        double lo = limits.baseDiameterMm() / 2;
        double hi = limits.majorDiameterMaxMm() / 2 + pin;
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
        return Math.hypot(r - r * Math.cos(other), r * Math.sin(other)) + pin;
    }
}
