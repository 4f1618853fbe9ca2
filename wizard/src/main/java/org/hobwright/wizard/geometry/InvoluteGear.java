package org.hobwright.wizard.geometry;

import org.hobwright.api.job.GearSpec;

/**
 * An external involute spur or helical gear cut by a standard hob of its tooth system, with the
 * relations of ISO 21771:2007 (equation numbers as cited in FORMULAS.md §1.2, from memory; every
 * relation is checked against brute-force geometry in the tests). Lengths mm, angles rad.
 *
 * <p>The helix angle is the magnitude |β|; its hand does not change any size.
 *
 * @param teeth                  number of teeth z
 * @param normalModuleMm         normal module m_n, mm
 * @param normalPressureAngleRad normal pressure angle α_n, rad
 * @param helixAngleRad          helix angle |β| at the reference cylinder, rad (0 = spur)
 * @param profileShift           profile shift coefficient x
 * @param thicknessAllowanceMm   normal tooth-thickness allowance E_sn, mm (negative thins the tooth)
 * @param system                 the basic rack; the hob is its counterpart (h_aP0 = h_fP, ρ_aP0 = ρ_fP)
 */
public record InvoluteGear(int teeth, double normalModuleMm, double normalPressureAngleRad, double helixAngleRad,
                           double profileShift, double thicknessAllowanceMm, ToothSystem system) {

    /** The gear of a job's gear record. */
    public static InvoluteGear of(GearSpec gear, ToothSystem system) {
        return new InvoluteGear(gear.teeth(), gear.moduleMm(), Math.toRadians(gear.pressureAngleDeg()),
                Math.toRadians(gear.helixAngleDeg()), gear.profileShift(), gear.thicknessAllowanceMm(), system);
    }

    /** The same gear with another profile shift. */
    public InvoluteGear withProfileShift(double x) {
        return new InvoluteGear(teeth, normalModuleMm, normalPressureAngleRad, helixAngleRad, x,
                thicknessAllowanceMm, system);
    }

    /** The same gear with another normal tooth-thickness allowance E_sn, mm. */
    public InvoluteGear withThicknessAllowance(double allowanceMm) {
        return new InvoluteGear(teeth, normalModuleMm, normalPressureAngleRad, helixAngleRad, profileShift, allowanceMm,
                system);
    }

    /** The same gear without its thickness allowance (the tooth as the basic rack gives it). */
    public InvoluteGear withoutAllowance() {
        return new InvoluteGear(teeth, normalModuleMm, normalPressureAngleRad, helixAngleRad, profileShift, 0,
                system);
    }

    /** True for a spur gear. */
    public boolean isSpur() {
        return helixAngleRad == 0.0;
    }

    /** Transverse module m_t = m_n / cos β, mm. ISO 21771 eq. (2). */
    public double transverseModuleMm() {
        return normalModuleMm / Math.cos(helixAngleRad);
    }

    /** Transverse pressure angle α_t, tan α_t = tan α_n / cos β, rad. ISO 21771 eq. (14). */
    public double transversePressureAngleRad() {
        return Math.atan(Math.tan(normalPressureAngleRad) / Math.cos(helixAngleRad));
    }

    /** Reference diameter d = z m_n / cos β, mm. ISO 21771 eq. (1). */
    public double referenceDiameterMm() {
        return teeth * transverseModuleMm();
    }

    /** Base diameter d_b = d cos α_t, mm. ISO 21771 eq. (13). */
    public double baseDiameterMm() {
        return referenceDiameterMm() * Math.cos(transversePressureAngleRad());
    }

    /** Base helix angle β_b, sin β_b = sin β cos α_n, rad. ISO 21771. */
    public double baseHelixAngleRad() {
        return Math.asin(Math.sin(helixAngleRad) * Math.cos(normalPressureAngleRad));
    }

    /** Addendum h_a = h_aP + x m_n (tip alteration k = 0), mm. ISO 21771 eq. (36). */
    public double addendumMm() {
        return system.addendumMm(normalModuleMm) + profileShift * normalModuleMm;
    }

    /**
     * Dedendum as cut by the hob, h_f = h_aP0 − x_E m_n with h_aP0 = h_fP (standard hob), mm.
     * ISO 21771 eq. (37); FORMULAS.md §1.2 note on hobbed gears. The hob makes the thickness allowance
     * by cutting deeper: it sits at x_E ({@link #effectiveProfileShift()}), so a negative allowance
     * deepens the root by |E_sn| / (2 tan α_n) (derived from s_n = m_n (π/2 + 2 x tan α_n)).
     */
    public double dedendumMm() {
        return system.dedendumMm(normalModuleMm) - effectiveProfileShift() * normalModuleMm;
    }

    /** Tip diameter d_a = d + 2 (x m_n + h_aP), mm. ISO 21771 eq. (33), k = 0. */
    public double tipDiameterMm() {
        return referenceDiameterMm() + 2 * addendumMm();
    }

    /**
     * Root diameter cut by the hob d_f = d − 2 (h_aP0 − x_E m_n), mm. ISO 21771 eq. (34), with the hob
     * fed in to make the thickness allowance (see {@link #dedendumMm()}).
     */
    public double rootDiameterMm() {
        return referenceDiameterMm() - 2 * dedendumMm();
    }

    /** Tooth depth h = h_a + h_f = (d_a − d_f) / 2, mm. ISO 21771 eq. (35). */
    public double wholeDepthMm() {
        return addendumMm() + dedendumMm();
    }

    /**
     * Lead of the helix p_z = π d / tan β = π z m_n / sin β, mm; infinite for a spur gear.
     * Helix geometry: one turn of the helix on the reference cylinder advances p_z (FORMULAS.md §1.2).
     */
    public double leadMm() {
        return isSpur() ? Double.POSITIVE_INFINITY : Math.PI * referenceDiameterMm() / Math.tan(helixAngleRad);
    }

    /** Virtual number of teeth z_n = z / (cos² β_b cos β). ISO 21771. */
    public double virtualTeeth() {
        double cb = Math.cos(baseHelixAngleRad());
        return teeth / (cb * cb * Math.cos(helixAngleRad));
    }

    /**
     * Normal tooth thickness at the reference circle with allowance,
     * s_n = m_n (π/2 + 2 x tan α_n) + E_sn, mm. ISO 21771; SDP/SI Elements of Metric Gear
     * Technology, Table 10-1.
     */
    public double normalThicknessMm() {
        return GearGeometry.normalThickness(normalModuleMm, normalPressureAngleRad, profileShift, thicknessAllowanceMm);
    }

    /** Transverse tooth thickness at the reference circle s_t = s_n / cos β, mm. */
    public double transverseThicknessMm() {
        return normalThicknessMm() / Math.cos(helixAngleRad);
    }

    /**
     * The profile shift that gives the thinned tooth with no allowance:
     * x_E = x + E_sn / (2 m_n tan α_n). Every inspection value is computed for x_E (FORMULAS.md §2.1).
     */
    public double effectiveProfileShift() {
        return profileShift + thicknessAllowanceMm / (2 * normalModuleMm * Math.tan(normalPressureAngleRad));
    }

    /**
     * Transverse tooth thickness at a diameter d_y, s_yt = d_y (s_t/d + inv α_t − inv α_yt),
     * cos α_yt = d_b / d_y, mm (d_y at least d_b). ISO 21771 (FORMULAS.md §2.1).
     */
    public double transverseThicknessAtMm(double dy) {
        return GearGeometry.transverseThicknessAt(dy, referenceDiameterMm(), baseDiameterMm(), transverseThicknessMm(),
                transversePressureAngleRad());
    }

    /**
     * Normal tooth thickness at a diameter d_y, s_yn ≈ s_yt cos β_y with tan β_y = tan β · d_y / d, mm.
     * The usual approximation (derived; FORMULAS.md §2.2).
     */
    public double normalThicknessAtMm(double dy) {
        double betaY = Math.atan(Math.tan(helixAngleRad) * dy / referenceDiameterMm());
        return transverseThicknessAtMm(dy) * Math.cos(betaY);
    }

    /**
     * Root form diameter d_Ff: where the usable involute begins, mm. Without undercut, where the hob's
     * straight flank ends; with undercut, where the undercut ends ({@link RootForm}). The hob cuts at
     * x_E ({@link #effectiveProfileShift()}).
     */
    public double rootFormDiameterMm() {
        return RootForm.diameterMm(this);
    }
}
