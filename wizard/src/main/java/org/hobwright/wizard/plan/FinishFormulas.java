package org.hobwright.wizard.plan;

import org.hobwright.wizard.simulate.EnvelopingDepth;

/**
 * Predicted finish and chip load of hobbing.
 *
 * <pre>
 * feed mark, flank   δ_x = f_a² · sin α_n / (4 d_a0 cos² β)        (FORMULAS.md §6.1: spur form as commonly published,
 *                                                                   from memory; the 1/cos² β factor derived)
 * feed mark, root    δ_root = f_a² / (4 d_a0 cos² β)               (FORMULAS.md §6.1: sagitta geometry, derived)
 * enveloping depth   δ_y = π² z₀² m_n sin α_n / (4 z₂ i² cos β)    (FORMULAS.md §6.2, derived; spur form matches the
 *                                                                   hob-maker handbook form from memory; the
 *                                                                   1/cos β factor settled by the generating
 *                                                                   simulation, see EnvelopingDepth)
 * Hoffmeister        h_max = 4.9 m_n z₂^(9.25·10⁻³ β^1.25 − 0.542) e^(−0.015 β) e^(−0.015 x)
 *                          (r_a0/m_n)^(−8.25·10⁻³ β − 0.225) i^(−0.877) (f_a/m_n)^0.511 (T/m_n)^0.319
 *                    B. Hoffmeister, Über den Verschleiß am Wälzfräser, dissertation, RWTH Aachen, 1970
 *                    (FORMULAS.md §8.1; exponents from memory, not confirmed in print)
 * </pre>
 * f_a axial feed mm per work revolution; d_a0 hob outside diameter mm; r_a0 = d_a0/2; α_n normal
 * pressure angle; β helix angle (magnitude, degrees in the Hoffmeister formula); z₀ starts;
 * z₂ gear teeth; i gashes per start in Hoffmeister's formula, gashes in the enveloping formula;
 * m_n normal module mm; x profile shift; T radial depth of cut mm. Feed marks and enveloping
 * depths are returned in µm, chip thickness in mm.
 */
public final class FinishFormulas {
    private static final double FEED_EXPONENT = 0.511;

    private FinishFormulas() {
    }

    /** Flank feed-mark depth δ_x = f_a² sin α_n / (4 d_a0 cos² β), µm. */
    public static double feedMarkFlankUm(double feedMm, double hobOutsideDiameterMm, double pressureAngleDeg,
                                         double helixAngleDeg) {
        return 1000.0 * feedMm * feedMm * Math.sin(Math.toRadians(pressureAngleDeg))
                / (4 * hobOutsideDiameterMm * cos2(helixAngleDeg));
    }

    /** Root feed-mark depth δ_root = f_a² / (4 d_a0 cos² β), µm. */
    public static double feedMarkRootUm(double feedMm, double hobOutsideDiameterMm, double helixAngleDeg) {
        return 1000.0 * feedMm * feedMm / (4 * hobOutsideDiameterMm * cos2(helixAngleDeg));
    }

    /** Largest feed whose flank feed mark stays within a depth: f_a = √(4 d_a0 cos² β δ / sin α_n), mm. */
    public static double feedForFlankMark(double markUm, double hobOutsideDiameterMm, double pressureAngleDeg,
                                          double helixAngleDeg) {
        return Math.sqrt(4 * hobOutsideDiameterMm * cos2(helixAngleDeg) * markUm / 1000.0
                / Math.sin(Math.toRadians(pressureAngleDeg)));
    }

    /** Enveloping-cut depth δ_y = π² z₀² m_n sin α_n / (4 z₂ i² cos β), normal to the flank, µm ({@link EnvelopingDepth}). */
    public static double envelopingDepthUm(double moduleMm, int teeth, int starts, int gashes,
                                           double pressureAngleDeg, double helixAngleDeg) {
        return 1000.0 * EnvelopingDepth.closedFormMm(moduleMm, teeth, starts, gashes,
                Math.toRadians(pressureAngleDeg), Math.toRadians(helixAngleDeg));
    }

    /**
     * Hoffmeister's maximum undeformed chip thickness, mm.
     *
     * @param moduleMm           m_n, mm
     * @param teeth              z₂
     * @param helixAngleDeg      β, degrees (magnitude is used)
     * @param profileShift       x
     * @param hobTipRadiusMm     r_a0, mm
     * @param gashesPerStart     i = gashes / starts
     * @param feedMm             f_a, mm per work revolution
     * @param depthMm            T, radial depth of cut, mm
     */
    public static double hoffmeisterMm(double moduleMm, int teeth, double helixAngleDeg, double profileShift,
                                       double hobTipRadiusMm, double gashesPerStart, double feedMm, double depthMm) {
        return hoffmeisterUnitFeed(moduleMm, teeth, helixAngleDeg, profileShift, hobTipRadiusMm, gashesPerStart, depthMm)
                * Math.pow(feedMm / moduleMm, FEED_EXPONENT);
    }

    /**
     * Largest feed keeping Hoffmeister's chip thickness within a limit: f_a = m_n (h_allow / K)^(1/0.511),
     * K the formula evaluated at f_a / m_n = 1 (FORMULAS.md §8.1), mm.
     */
    public static double feedForChipThickness(double limitMm, double moduleMm, int teeth, double helixAngleDeg,
                                              double profileShift, double hobTipRadiusMm, double gashesPerStart,
                                              double depthMm) {
        double k = hoffmeisterUnitFeed(moduleMm, teeth, helixAngleDeg, profileShift, hobTipRadiusMm, gashesPerStart,
                depthMm);
        return moduleMm * Math.pow(limitMm / k, 1.0 / FEED_EXPONENT);
    }

    private static double hoffmeisterUnitFeed(double mn, int z, double helixAngleDeg, double x, double ra0,
                                              double i, double depth) {
        double b = Math.abs(helixAngleDeg);
        return 4.9 * mn * Math.pow(z, 9.25e-3 * Math.pow(b, 1.25) - 0.542) * Math.exp(-0.015 * b)
                * Math.exp(-0.015 * x) * Math.pow(ra0 / mn, -8.25e-3 * b - 0.225) * Math.pow(i, -0.877)
                * Math.pow(depth / mn, 0.319);
    }

    private static double cos2(double helixAngleDeg) {
        double c = Math.cos(Math.toRadians(helixAngleDeg));
        return c * c;
    }
}
