package org.hobwright.wizard.inspection;

import org.hobwright.api.cycle.InspectionLimits;
import org.hobwright.wizard.geometry.InvoluteGear;

/**
 * Upper and lower limits of the span, the measurement over pins or balls and the chordal tooth thickness,
 * from the upper and lower normal tooth-thickness allowances E_sns and E_sni. Each limit is the value of
 * the tooth thinned by that allowance (x_E = x + E_sn / (2 m_n tan α_n), FORMULAS.md §2.1), over the same
 * number of teeth, with the same pin or ball, and at the same tip. Span and chordal thickness change
 * linearly with the allowance (ΔW = ΔE_sn cos α_n, the span relation of FORMULAS.md §3.1); the measurement
 * over pins does not, so it is computed again (FORMULAS.md §3.2). The root diameter follows the hob, fed in
 * by ΔE_sn / (2 tan α_n) more for the thinner tooth ({@link InvoluteGear#rootDiameterMm()}).
 */
public final class MeasurementLimits {
    private MeasurementLimits() {
    }

    /**
     * The limits of computed inspection values.
     *
     * @param g      the gear with its upper allowance (the one the values were computed for)
     * @param v      the inspection values (span teeth, pin and tip are kept)
     * @param lowerAllowanceMm the lower normal allowance E_sni, mm, not above the upper one
     * @param basis  where the allowances come from, for the report
     */
    public static InspectionLimits of(InvoluteGear g, InspectionValues v, double lowerAllowanceMm, String basis) {
        InvoluteGear lower = g.withThicknessAllowance(lowerAllowanceMm);
        double pin = v.pins().pinDiameterMm();
        return new InspectionLimits(g.thicknessAllowanceMm(), lowerAllowanceMm, basis,
                v.span().widthMm(), SpanMeasurement.widthMm(lower, v.span().teeth()),
                v.pins().overPinsMm(), OverPins.of(lower, pin).overPinsMm(),
                v.chordal().thicknessMm(), ChordalThickness.of(lower, v.tipDiameterMm()).thicknessMm(),
                g.rootDiameterMm(), lower.rootDiameterMm());
    }
}
