package org.hobwright.wizard.spline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.junit.jupiter.api.Test;

/** The choice of pin: the job's, the standard's, the shop's nearest, and a warning for a pin that cannot measure. */
class SplinePinChoiceTest {
    private final SplineLimits iso = Splines.limits(Splines.iso(20, 1, 30, SplineRoot.FLAT, 5, "h"));

    // The pin touching at D for z 20, m 1, 30°: D_b (tan(30° + π/40) − tan 30°) = 1.9041 mm, rounded up to the
    // R40 number 2.00 (ISO 3 R40: ... 1.80, 1.90, 2.00 ...).
    @Test
    void isoPinIsThePitchContactPinRoundedUpToR40() {
        double raw = 20 * Math.cos(Math.toRadians(30)) * (Math.tan(Math.toRadians(30) + Math.PI / 40)
                - Math.tan(Math.toRadians(30)));
        assertEquals(raw, SplinePins.pitchContactPin(20, iso.baseDiameterMm(), Math.toRadians(30), Math.PI / 2), 1e-12);
        assertEquals(2.0, SplinePins.upR40(raw), 1e-12);
        assertEquals(1.9, SplinePins.upR40(1.85), 1e-12);
        assertEquals(2.0, SplinePins.upR40(1.9000001), 1e-12);
        assertEquals(10.0, SplinePins.upR40(9.6), 1e-12);
    }

    @Test
    void shopPinNearestTheStandardsThatFits() {
        List<Finding> findings = new ArrayList<>();
        SplinePins pins = SplinePins.choose(iso, OptionalDouble.empty(), List.of(1.0, 1.75, 2.2, 5.0), Splines.MM, findings);
        assertEquals(2.2, pins.pinMm(), 1e-12, "nearest to " + iso.recommendedPinMm());
        assertEquals(List.of("SPLINE_PIN_FROM_SHOP_SET"), Splines.codes(findings));
    }

    @Test
    void aPinThatCannotMeasureIsAWarningNotAValue() {
        List<Finding> findings = new ArrayList<>();
        SplinePins pins = SplinePins.choose(iso, OptionalDouble.of(0.8), List.of(), Splines.MM, findings);
        assertEquals(List.of("SPLINE_PIN_CONTACT"), Splines.codes(findings));
        assertTrue(pins.overPinsMaxMm() > pins.overPinsMinMm());
    }
}
