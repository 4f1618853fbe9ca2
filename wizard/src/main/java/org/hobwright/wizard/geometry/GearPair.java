package org.hobwright.wizard.geometry;

/**
 * An external gear running with an external mate on parallel axes: same normal module, pressure angle,
 * helix angle (opposite hand) and basic rack. The gear-pair relations of ISO 21771:2007 (clause numbers
 * from memory; FORMULAS.md §3.4):
 *
 * <pre>
 * a_d = (z₁ + z₂) m_n / (2 cos β)                          reference centre distance
 * cos α_wt = a_d cos α_t / a                               transverse working pressure angle at a
 * inv α_wt = inv α_t + 2 (x₁ + x₂) tan α_n / (z₁ + z₂)      no backlash, so
 * x₁ + x₂ = (z₁ + z₂) (inv α_wt − inv α_t) / (2 tan α_n)    the shifts a centre distance implies
 * d_w1 = 2 a z₁ / (z₁ + z₂),  p_wt = π d_w1 / z₁           working pitch circle and pitch
 * s_wt = d_w (s_t / d + inv α_t − inv α_wt)                 transverse tooth thickness there
 * j_wt = p_wt − s_wt1 − s_wt2,  j_bn = j_wt cos α_wt cos β_b  circumferential and normal backlash
 * c₁ = a − d_a1 / 2 − d_f2 / 2                             tip clearance of gear 1 over the root of gear 2
 * </pre>
 * The tooth thicknesses carry each gear's thickness allowance (the thinned tooth). With every
 * {@code a} the normal backlash changes by −(E₁ + E₂) cos α_n when the allowances change
 * (cos β cos α_n = cos α_t cos β_b), the relation the tests check.
 *
 * @param gear the gear being hobbed (with the allowance that applies)
 * @param mate the mate (same module, pressure angle, helix angle and tooth system)
 */
public record GearPair(InvoluteGear gear, InvoluteGear mate) {

    /** The mate of a gear: z₂ teeth, shift x₂, allowance E₂, everything else as the gear. */
    public static GearPair of(InvoluteGear gear, int mateTeeth, double mateShift, double mateAllowanceMm) {
        return new GearPair(gear, new InvoluteGear(mateTeeth, gear.normalModuleMm(), gear.normalPressureAngleRad(),
                gear.helixAngleRad(), mateShift, mateAllowanceMm, gear.system()));
    }

    private int teethSum() {
        return gear.teeth() + mate.teeth();
    }

    /** a_d = (z₁ + z₂) m_n / (2 cos β), mm. */
    public double referenceCentreDistanceMm() {
        return teethSum() * gear.normalModuleMm() / (2 * Math.cos(gear.helixAngleRad()));
    }

    /** Smallest centre distance a pair of these tooth counts can have at all, a_d cos α_t (α_wt = 0), mm. */
    public double smallestCentreDistanceMm() {
        return referenceCentreDistanceMm() * Math.cos(gear.transversePressureAngleRad());
    }

    /** Transverse working pressure angle at a centre distance, rad; NaN below {@link #smallestCentreDistanceMm}. */
    public double workingPressureAngleRad(double centreDistanceMm) {
        double c = smallestCentreDistanceMm() / centreDistanceMm;
        return c > 1 ? Double.NaN : Math.acos(c);
    }

    /** x₁ + x₂ that puts teeth without allowance at this centre distance without backlash. */
    public double profileShiftSum(double centreDistanceMm) {
        double awt = workingPressureAngleRad(centreDistanceMm);
        return teethSum() * (Involute.inv(awt) - Involute.inv(gear.transversePressureAngleRad()))
                / (2 * Math.tan(gear.normalPressureAngleRad()));
    }

    /** The centre distance at which teeth without allowance and with shifts summing to Σx have no backlash, mm. */
    public double centreDistanceWithoutBacklashMm(double shiftSum) {
        double q = Involute.inv(gear.transversePressureAngleRad())
                + 2 * shiftSum * Math.tan(gear.normalPressureAngleRad()) / teethSum();
        return q > 0 ? smallestCentreDistanceMm() / Math.cos(Involute.inverse(q)) : Double.NaN;
    }

    /** Normal backlash j_bn of the two thinned gears at a centre distance, mm (negative: the teeth jam). */
    public double normalBacklashMm(double centreDistanceMm) {
        double awt = workingPressureAngleRad(centreDistanceMm);
        double invT = Involute.inv(gear.transversePressureAngleRad());
        double invW = Involute.inv(awt);
        double dw1 = 2 * centreDistanceMm * gear.teeth() / teethSum();
        double dw2 = 2 * centreDistanceMm * mate.teeth() / teethSum();
        double sw1 = dw1 * (gear.transverseThicknessMm() / gear.referenceDiameterMm() + invT - invW);
        double sw2 = dw2 * (mate.transverseThicknessMm() / mate.referenceDiameterMm() + invT - invW);
        double jwt = Math.PI * dw1 / gear.teeth() - sw1 - sw2;
        return jwt * Math.cos(awt) * Math.cos(gear.baseHelixAngleRad());
    }

    /** Clearance between a tip circle of this gear and the mate's root circle at a centre distance, mm. */
    public double tipClearanceMm(double centreDistanceMm, double tipDiameterMm) {
        return centreDistanceMm - tipDiameterMm / 2 - mate.rootDiameterMm() / 2;
    }

    /** Clearance between the mate's tip circle and this gear's root circle at a centre distance, mm. */
    public double mateTipClearanceMm(double centreDistanceMm) {
        return centreDistanceMm - mate.tipDiameterMm() / 2 - gear.rootDiameterMm() / 2;
    }
}
