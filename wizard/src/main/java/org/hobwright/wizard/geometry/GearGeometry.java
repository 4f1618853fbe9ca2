package org.hobwright.wizard.geometry;

import java.util.OptionalDouble;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.job.GearSpec;

/**
 * Involute geometry of an external spur or helical gear, ISO 21771:2007 relations.
 *
 * <pre>
 * m_t = m_n / cos β                              ISO 21771 eq. (2)
 * tan α_t = tan α_n / cos β                      ISO 21771 eq. (14)
 * d = z m_t                                      ISO 21771 eq. (1)
 * d_b = d cos α_t                                ISO 21771 eq. (13)
 * d_a = d + 2 (x m_n + h_aP)                     ISO 21771 eq. (33), tip alteration k = 0
 * d_f = d − 2 (h_aP0 − x m_n), h_aP0 = h_fP      ISO 21771 eq. (34), root cut by a standard hob
 * sin β_b = sin β cos α_n
 * p_z = π d / tan β                              lead of the helix
 * s_n = m_n (π/2 + 2 x tan α_n) + E_sn           normal tooth thickness at d
 * s_yt = d_y (s_t/d + inv α_t − inv α_yt)        transverse thickness at d_y, cos α_yt = d_b/d_y
 * z_n = z / (cos² β_b cos β)                     virtual number of teeth
 * </pre>
 * All lengths in mm, angles in degrees at the boundary.
 */
public final class GearGeometry {
    private GearGeometry() {
    }

    /**
     * Computes the gear data.
     *
     * @param gear   the gear
     * @param system its tooth system
     * @return the geometry (tip thickness may be negative for a pointed tooth: the checks report it)
     */
    public static GearData of(GearSpec gear, ToothSystem system) {
        double mn = gear.moduleMm();
        double beta = Math.toRadians(gear.helixAngleDeg());
        double alphaN = Math.toRadians(gear.pressureAngleDeg());
        double x = gear.profileShift();
        double mt = mn / Math.cos(beta);
        double alphaT = Math.atan(Math.tan(alphaN) / Math.cos(beta));
        double d = gear.teeth() * mt;
        double db = d * Math.cos(alphaT);
        double haP = system.addendumMm(mn);
        double hfP = system.dedendumMm(mn);
        double da = d + 2 * (x * mn + haP);
        double df = d - 2 * (hfP - x * mn);
        double betaB = Math.asin(Math.sin(beta) * Math.cos(alphaN));
        OptionalDouble lead = gear.isSpur() ? OptionalDouble.empty()
                : OptionalDouble.of(Math.PI * d / Math.tan(beta));
        double sn = normalThickness(mn, alphaN, x, gear.thicknessAllowanceMm());
        double st = sn / Math.cos(beta);
        double tipT = transverseThicknessAt(da, d, db, st, alphaT);
        double betaA = Math.atan(Math.tan(beta) * da / d);
        double tipN = tipT * Math.cos(betaA);
        double zn = gear.teeth() / (Math.pow(Math.cos(betaB), 2) * Math.cos(beta));
        return new GearData(mt, Math.toDegrees(alphaT), d, db, da, df, (da - d) / 2, (d - df) / 2, (da - df) / 2,
                Math.toDegrees(betaB), lead, sn, tipN, zn);
    }

    /** Normal tooth thickness at the reference circle, s_n = m_n (π/2 + 2 x tan α_n) + E_sn, mm. */
    public static double normalThickness(double mn, double alphaNRad, double x, double allowanceMm) {
        return mn * (Math.PI / 2 + 2 * x * Math.tan(alphaNRad)) + allowanceMm;
    }

    /**
     * Transverse tooth thickness at diameter d_y: s_yt = d_y (s_t/d + inv α_t − inv α_yt),
     * cos α_yt = d_b / d_y (d_y ≥ d_b).
     */
    public static double transverseThicknessAt(double dy, double d, double db, double st, double alphaTRad) {
        double alphaY = Math.acos(Math.min(1.0, db / dy));
        return dy * (st / d + Involute.inv(alphaTRad) - Involute.inv(alphaY));
    }
}
