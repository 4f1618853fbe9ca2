package org.hobwright.wizard.inspection;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.OptionalDouble;
import org.hobwright.api.cycle.InspectionLimits;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.ToothSystem;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The limits of the inspection values against the published relations between a tooth-thickness allowance
 * and the measurements (the brute-force check of the lower limits is in {@link BruteForceCrossCheckTest}).
 */
class MeasurementLimitsTest {

    private static InvoluteGear gear(int z, double m, double beta, double x, double allowance) {
        return new InvoluteGear(z, m, Math.toRadians(20), Math.toRadians(beta), x, allowance,
                ToothSystem.builtIn("iso53-a").orElseThrow());
    }

    private static InspectionLimits limits(InvoluteGear g, double lower) {
        InspectionValues v = InspectionValues.of(g, g.tipDiameterMm(), OptionalDouble.empty(), 0.01);
        return MeasurementLimits.of(g, v, lower, "drawing");
    }

    // Span: the allowance of the span is the thickness allowance projected on the base tangent,
    // A_W = A_sn cos α_n (DIN 3960:1987 / ISO/TR 10064-2:1996 relation, clause from memory), exactly, because
    // W_k is linear in the thickness. Over pins or balls, to first order: A_M = A_sn cos α_t / (sin α_Mt cos β)
    // for an even count, times cos(90°/z) for an odd one (DIN 3960:1987 form, from memory; derived again from
    // d_Mt = d_b / cos α_Mt with inv α_Mt changing by A_sn / (z m_n)), with α_Mt taken between the two limits. Root: the hob
    // is fed in by ΔE / (2 tan α_n), so d_f changes by ΔE / tan α_n (the rack of ISO 21771, x_E). Chordal
    // thickness: the chord of an arc that changed by ΔE, so ΔE cos ψ (ψ the half tooth angle, SDP/SI Table 10-1
    // form), within 1 %.
    @ParameterizedTest(name = "z {0}, m {1}, β {2}°, x {3}, E {4} / {5}")
    @CsvSource({
        "24, 1, 0, 0, -0.03, -0.08", "25, 2, 0, 0.3, -0.05, -0.13", "40, 3, 15, -0.1, -0.08, -0.2",
        "31, 2, 25, 0.2, 0, -0.1", "57, 4, 10, 0.5, -0.1, -0.25"})
    void limitsFollowThePublishedAllowanceRelations(int z, double m, double beta, double x, double upper,
                                                   double lower) {
        InvoluteGear g = gear(z, m, beta, x, upper);
        InspectionLimits l = limits(g, lower);
        double de = lower - upper;
        double alphaN = g.normalPressureAngleRad();
        assertEquals(de * Math.cos(alphaN), l.spanWidthLowerMm() - l.spanWidthUpperMm(), 1e-12, "A_W");

        double dbMt = g.baseDiameterMm();
        double mid = (OverPins.of(g, limitsPin(g)).centreDiameterMm()
                + OverPins.of(g.withThicknessAllowance(lower), limitsPin(g)).centreDiameterMm()) / 2;
        double alphaMt = Math.acos(dbMt / mid);
        double published = de * Math.cos(g.transversePressureAngleRad())
                / (Math.sin(alphaMt) * Math.cos(g.helixAngleRad())) * (z % 2 == 0 ? 1 : Math.cos(Math.PI / 2 / z));
        assertEquals(published, l.overPinsLowerMm() - l.overPinsUpperMm(), Math.abs(published) * 2e-3, "A_M");

        assertEquals(de / Math.tan(alphaN), l.rootDiameterLowerMm() - l.rootDiameterUpperMm(), 1e-12, "Δd_f");
        assertEquals(de, l.chordalThicknessLowerMm() - l.chordalThicknessUpperMm(), Math.abs(de) * 0.01, "Δs̄");
        assertEquals(upper, l.upperAllowanceMm(), 0);
        assertEquals(lower, l.lowerAllowanceMm(), 0);
    }

    private static double limitsPin(InvoluteGear g) {
        return InspectionValues.of(g, g.tipDiameterMm(), OptionalDouble.empty(), 0.01).pins().pinDiameterMm();
    }
}
