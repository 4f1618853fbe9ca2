package org.hobwright.wizard.simulate;

/**
 * Closed-form depth of the enveloping cuts (generating flats) at the reference circle.
 *
 * <pre>
 * δ = π² z₀² m_n sin α_n / (4 z i² cos β)        normal to the flank
 * </pre>
 * z₀ hob starts, i gashes, z teeth, m_n normal module (mm), α_n normal pressure angle, β helix
 * angle. For spur gears (β = 0) this is the hob-maker handbook form recorded in FORMULAS.md §6.2
 * (cusp ρ Δφ²/8 between tangents of the involute, ρ = (d/2) sin α_n, Δφ = 2π z₀/(i z); derived
 * there, remembered from handbooks). The helical factor 1/cos β was settled by this project's
 * generating simulation (FORMULAS.md §6.2, with the deciding cases): the transverse cusp is
 * ρ_t Δφ²/8 with ρ_t = r sin α_t, and normal to the flank it is cos β_b times that, which is the
 * spur form divided by cos β because sin α_t cos β_b = sin α_n. The virtual-gear factor cos³ β
 * does not hold. In the transverse plane the depth is δ / cos β_b.
 */
public final class EnvelopingDepth {
    private EnvelopingDepth() {
    }

    /**
     * @param normalModuleMm   m_n, mm
     * @param teeth            z
     * @param starts           z₀
     * @param gashes           i
     * @param pressureAngleRad α_n, rad
     * @param helixAngleRad    β, rad
     * @return δ normal to the flank, mm
     */
    public static double closedFormMm(double normalModuleMm, int teeth, int starts, int gashes,
                                      double pressureAngleRad, double helixAngleRad) {
        return Math.PI * Math.PI * starts * starts * normalModuleMm * Math.sin(pressureAngleRad)
                / (4.0 * teeth * (double) gashes * gashes * Math.cos(helixAngleRad));
    }
}
