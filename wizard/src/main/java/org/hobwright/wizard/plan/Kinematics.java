package org.hobwright.wizard.plan;

/**
 * Speeds of the generating drive.
 *
 * <pre>
 * n₀ = 1000 · v_c / (π · d_a0)          hob speed, min⁻¹             (definition of cutting speed, FORMULAS.md §5.1)
 * v_c = π · d_a0 · n₀ / 1000            cutting speed at the hob tip, m/min (the same relation inverted)
 * n₂ = n₀ · z₀ / z₂                     work speed: one tooth per start per hob turn (generating condition)
 * v_fa = f_a · n₂                       axial feed rate, mm/min
 * Δφ₂ = 360 · sin|β| / (π · z₂ · m_n)   differential, degrees of work rotation per mm of axial travel,
 *                                       from the lead p_z = π z₂ m_n / sin|β| (FORMULAS.md §5.2)
 * </pre>
 * d_a0 hob outside diameter mm, v_c m/min, z₀ hob starts, z₂ gear teeth, f_a mm per work
 * revolution, β helix angle, m_n normal module mm.
 */
public final class Kinematics {
    private Kinematics() {
    }

    /** Hob speed n₀ = 1000 v_c / (π d_a0), rpm, for v_c in m/min and d_a0 in mm. */
    public static double hobRpm(double cuttingSpeedMPerMin, double hobOutsideDiameterMm) {
        return 1000.0 * cuttingSpeedMPerMin / (Math.PI * hobOutsideDiameterMm);
    }

    /** Cutting speed v_c = π d_a0 n₀ / 1000, m/min. */
    public static double cuttingSpeed(double hobRpm, double hobOutsideDiameterMm) {
        return Math.PI * hobOutsideDiameterMm * hobRpm / 1000.0;
    }

    /** Work speed n₂ = n₀ z₀ / z₂, rpm. */
    public static double workRpm(double hobRpm, int starts, int teeth) {
        return hobRpm * starts / teeth;
    }

    /** Axial feed rate v_fa = f_a n₂, mm/min. */
    public static double feedRate(double feedMmPerRev, double workRpm) {
        return feedMmPerRev * workRpm;
    }

    /** Time to feed a length at a feed per work revolution, s: 60 L / (f_a n₂). */
    public static double feedSeconds(double lengthMm, double feedMmPerRev, double workRpm) {
        return 60.0 * lengthMm / (feedMmPerRev * workRpm);
    }

    /**
     * Differential magnitude 360 sin|β| / (π z₂ m_n), degrees of work rotation per mm of axial hob
     * travel; 0 for a spur gear. Source: helix lead p_z = π z m_n / sin β (FORMULAS.md §1.2, §5.2).
     */
    public static double differentialDegPerMm(double helixAngleDeg, int teeth, double moduleMm) {
        return 360.0 * Math.sin(Math.toRadians(Math.abs(helixAngleDeg))) / (Math.PI * teeth * moduleMm);
    }
}
