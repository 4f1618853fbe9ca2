package org.hobwright.wizard.inspection;

import org.hobwright.wizard.geometry.InvoluteGear;

/**
 * Chordal tooth thickness at the reference circle and the chordal height from the tip, for a gear
 * tooth caliper; helical gears in the normal section of the virtual gear.
 *
 * <pre>
 * z_v = z / cos³ β                              (z_v = z for spur)
 * ψ   = π/(2 z_v) + 2 x tan α_n / z_v           half tooth angle, rad
 * s̄   = z_v m_n sin ψ
 * h̄   = h_a + (z_v m_n / 2)(1 − cos ψ)          h_a = (d_tip − d)/2 of the actual tip
 * </pre>
 * x is the shift of the thinned tooth x_E, so s̄ includes the thickness allowance. Source: SDP/SI,
 * Elements of Metric Gear Technology, Section 10, Tables 10-1 and 10-3 (both worked examples are
 * reproduced in the tests). The cos³ β virtual number is that source's convention.
 *
 * @param thicknessMm s̄, mm
 * @param heightMm    h̄, mm
 */
public record ChordalThickness(double thicknessMm, double heightMm) {

    /**
     * Chordal thickness and height.
     *
     * @param g             the gear (with its thickness allowance)
     * @param tipDiameterMm the actual tip diameter the caliper rests on, mm
     */
    public static ChordalThickness of(InvoluteGear g, double tipDiameterMm) {
        double cb = Math.cos(g.helixAngleRad());
        double zv = g.teeth() / (cb * cb * cb);
        double mn = g.normalModuleMm();
        double psi = Math.PI / (2 * zv) + 2 * g.effectiveProfileShift() * Math.tan(g.normalPressureAngleRad()) / zv;
        double ha = (tipDiameterMm - g.referenceDiameterMm()) / 2;
        return new ChordalThickness(zv * mn * Math.sin(psi), ha + zv * mn / 2 * (1 - Math.cos(psi)));
    }
}
