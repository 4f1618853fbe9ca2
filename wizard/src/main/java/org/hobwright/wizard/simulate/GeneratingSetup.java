package org.hobwright.wizard.simulate;

import org.hobwright.wizard.geometry.Involute;

/**
 * Everything the generating simulation needs, in mm and radians.
 *
 * <p>Derived values (ISO 21771:2007): m_t = m_n / cos β (eq. 2), tan α_t = tan α_n / cos β
 * (eq. 14), r = z m_t / 2 (eq. 1), r_b = r cos α_t (eq. 13), sin β_b = sin β cos α_n. The rack
 * datum line lies x·m_n outside the reference circle (profile shift); the rack rolls without
 * slipping on the reference circle. Per gash passage the work turns Δφ = 2π z₀ / (i z)
 * (generating ratio: one tooth per start and hob turn, i gashes per hob turn; FORMULAS.md §6.2).
 *
 * @param teeth              number of teeth z
 * @param normalModuleMm     m_n, mm
 * @param pressureAngleRad   α_n, rad
 * @param helixAngleRad      β, rad, magnitude (the transverse section does not depend on the hand)
 * @param profileShift       x including the thickness allowance: x + E_sn / (2 m_n tan α_n)
 * @param hobAddendumMm      h_aP0 = h_fP of the gear's tooth system, mm
 * @param hobTipRadiusMm     ρ_aP0 = ρ_fP of the gear's tooth system, mm
 * @param tipDiameterMm      d_a of the gear, mm
 * @param starts             hob starts z₀
 * @param gashes             hob gashes i
 * @param phase              where the cuts fall, as a fraction of Δφ: cuts at φ_k = (k + phase) Δφ
 *                           (0 puts one cut on the centre of the tooth space)
 * @param resolutionMm       largest spacing of the profile points, mm
 */
public record GeneratingSetup(int teeth, double normalModuleMm, double pressureAngleRad, double helixAngleRad,
                              double profileShift, double hobAddendumMm, double hobTipRadiusMm,
                              double tipDiameterMm, int starts, int gashes, double phase, double resolutionMm) {

    /** Checks the arguments (a broken contract, not a job problem: the caller turns job problems into findings). */
    public GeneratingSetup {
        if (teeth < 1 || starts < 1 || gashes < 1) {
            throw new IllegalArgumentException("teeth, starts and gashes must be at least 1, were "
                    + teeth + ", " + starts + ", " + gashes);
        }
        for (double v : new double[] {normalModuleMm, pressureAngleRad, hobAddendumMm, tipDiameterMm, resolutionMm}) {
            if (!(v > 0) || !Double.isFinite(v)) {
                throw new IllegalArgumentException("module, pressure angle, hob addendum, tip diameter and resolution"
                        + " must be finite and greater than 0, one was " + v);
            }
        }
        if (!(hobTipRadiusMm >= 0) || !(helixAngleRad >= 0) || !(helixAngleRad < Math.PI / 2)
                || !Double.isFinite(profileShift) || !Double.isFinite(phase)) {
            throw new IllegalArgumentException("tip radius " + hobTipRadiusMm + ", helix angle " + helixAngleRad
                    + ", shift " + profileShift + " or phase " + phase + " out of range");
        }
    }

    /** The same setup with another hob (starts, gashes) and cut phase. */
    public GeneratingSetup withHob(int newStarts, int newGashes, double newPhase) {
        return new GeneratingSetup(teeth, normalModuleMm, pressureAngleRad, helixAngleRad, profileShift, hobAddendumMm,
                hobTipRadiusMm, tipDiameterMm, newStarts, newGashes, newPhase, resolutionMm);
    }

    /** cos β. */
    public double cosBeta() {
        return Math.cos(helixAngleRad);
    }

    /** α_t, rad. */
    public double transversePressureAngleRad() {
        return Math.atan(Math.tan(pressureAngleRad) / cosBeta());
    }

    /** m_t, mm. */
    public double transverseModuleMm() {
        return normalModuleMm / cosBeta();
    }

    /** Reference (rolling) radius r = z m_t / 2, mm. */
    public double referenceRadiusMm() {
        return teeth * transverseModuleMm() / 2;
    }

    /** Base radius r_b = r cos α_t, mm. */
    public double baseRadiusMm() {
        return referenceRadiusMm() * Math.cos(transversePressureAngleRad());
    }

    /** Tip radius, mm. */
    public double tipRadiusMm() {
        return tipDiameterMm / 2;
    }

    /** Distance of the rack datum line from the gear centre, r + x m_n, mm. */
    public double datumDistanceMm() {
        return referenceRadiusMm() + profileShift * normalModuleMm;
    }

    /** Base helix angle β_b, sin β_b = sin β cos α_n, rad. */
    public double baseHelixAngleRad() {
        return Math.asin(Math.sin(helixAngleRad) * Math.cos(pressureAngleRad));
    }

    /** Work rotation per gash passage Δφ = 2π z₀ / (i z), rad. */
    public double stepRad() {
        return 2 * Math.PI * starts / ((double) gashes * teeth);
    }

    /**
     * Polar angle, from the tooth-space centre line, at which the right flank's involute leaves
     * the base circle: π/z − s_t/d − inv α_t, with s_t = m_t (π/2 + 2 x tan α_n) (ISO 21771 tooth
     * thickness; FORMULAS.md §2.1).
     */
    public double flankBaseAngleRad() {
        double mt = transverseModuleMm();
        double st = mt * (Math.PI / 2 + 2 * profileShift * Math.tan(pressureAngleRad));
        return Math.PI / teeth - st / (2 * referenceRadiusMm()) - Involute.inv(transversePressureAngleRad());
    }

    /** True when the hob's tip radius leaves a tip flat (or the two radii just meet): the hob tooth can exist. */
    public boolean hobHasTipFlat() {
        return rack().hasTipFlat();
    }

    /** The transverse rack tooth of the hob. */
    TransverseRack rack() {
        return new TransverseRack(transversePressureAngleRad(), Math.PI * transverseModuleMm() / 4, hobAddendumMm,
                hobTipRadiusMm, cosBeta());
    }
}
