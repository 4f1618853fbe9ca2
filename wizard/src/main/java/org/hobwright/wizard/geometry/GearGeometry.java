package org.hobwright.wizard.geometry;

import java.util.OptionalDouble;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.job.GearSpec;

/**
 * Involute geometry of an external spur or helical gear as the api's {@link GearData}, ISO 21771:2007
 * relations (see {@link InvoluteGear} for each formula and its source).
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
        return of(InvoluteGear.of(gear, system));
    }

    /**
     * Computes the gear data of an involute gear.
     *
     * @param g the gear
     * @return the geometry; the tip thickness is the normal thickness at the tip diameter d_a
     */
    public static GearData of(InvoluteGear g) {
        OptionalDouble lead = g.isSpur() ? OptionalDouble.empty() : OptionalDouble.of(g.leadMm());
        return new GearData(g.transverseModuleMm(), Math.toDegrees(g.transversePressureAngleRad()),
                g.referenceDiameterMm(), g.baseDiameterMm(), g.tipDiameterMm(), g.rootDiameterMm(), g.addendumMm(),
                g.dedendumMm(), g.wholeDepthMm(), Math.toDegrees(g.baseHelixAngleRad()), lead, g.normalThicknessMm(),
                g.normalThicknessAtMm(g.tipDiameterMm()), g.virtualTeeth());
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
