package org.hobwright.wizard.inspection;

import org.hobwright.wizard.geometry.Involute;
import org.hobwright.wizard.geometry.InvoluteGear;

/**
 * Measurement over two pins (spur gears) or two balls (helical gears).
 *
 * <pre>
 * inv α_Mt = D_M / (z m_n cos α_n) − π/(2z) + inv α_t + 2 x tan α_n / z
 * d_Mt     = d_b / cos α_Mt                       circle through the pin or ball centres
 * even z:  M_d = d_Mt + D_M
 * odd z:   M_d = d_Mt cos(90°/z) + D_M            (both in one transverse plane)
 * contact: d_c = sqrt(d_b² + (d_b tan α_Mt − D_M cos β_b)²)
 * </pre>
 * x is the shift of the thinned tooth x_E (this is the same as adding E_sn/(z m_n)). Sources: the
 * standard measurement-over-wires relation (FORMULAS.md §3.2); the wire-table value 32 T, 1 DP, 20°, wire
 * 1.728/P → 34.4130 in (Machinery's Handbook, from memory) is reproduced in the tests, and a brute-force
 * construction of the pin on sampled flanks checks every case (BruteForceCrossCheckTest). For helical gears z m_n cos α_n = d_b cos β_b makes the ball relation the same
 * (FORMULAS.md §1.2 identity). The contact: the flank is an involute helicoid, whose normal at every
 * point lies in the base tangent plane at β_b to the transverse plane; the ball centre lies D_M/2 along
 * that normal, so its roll length in the transverse section exceeds the contact's by (D_M/2) cos β_b
 * (derived; a brute-force nearest point on the sampled helicoid confirms it in the tests).
 *
 * @param pinDiameterMm     D_M, mm
 * @param overPinsMm        M_d, mm
 * @param centreDiameterMm  d_Mt, mm
 * @param contactDiameterMm diameter where the pin or ball touches the flank, mm (negative tangent length
 *                          means it would touch below the base circle: then d_b is returned and
 *                          {@link #touchesInvolute()} is false)
 * @param balls             true for balls (helical gear)
 * @param touchesInvolute   false when the contact point lies below the base circle
 */
public record OverPins(double pinDiameterMm, double overPinsMm, double centreDiameterMm, double contactDiameterMm,
                       boolean balls, boolean touchesInvolute) {

    /** The rule factor of the US wire tables: D_M = 1.728 / P, i.e. 1.728 m_n (Machinery's Handbook, from memory). */
    public static final double RULE_FACTOR = 1.728;

    /**
     * Measurement over pins or balls of a given diameter.
     *
     * @param g             the gear (with its thickness allowance)
     * @param pinDiameterMm D_M, mm, greater than 0
     */
    public static OverPins of(InvoluteGear g, double pinDiameterMm) {
        int z = g.teeth();
        double mn = g.normalModuleMm();
        double an = g.normalPressureAngleRad();
        double q = pinDiameterMm / (z * mn * Math.cos(an)) - Math.PI / (2 * z)
                + Involute.inv(g.transversePressureAngleRad()) + 2 * g.effectiveProfileShift() * Math.tan(an) / z;
        double db = g.baseDiameterMm();
        double alphaMt = Involute.inverse(Math.max(0, q));
        double dMt = db / Math.cos(alphaMt);
        double m = z % 2 == 0 ? dMt + pinDiameterMm : dMt * Math.cos(Math.PI / (2 * z)) + pinDiameterMm;
        double tangent = db * Math.tan(alphaMt) - pinDiameterMm * Math.cos(g.baseHelixAngleRad());
        double dc = tangent > 0 ? Math.sqrt(db * db + tangent * tangent) : db;
        return new OverPins(pinDiameterMm, m, dMt, dc, !g.isSpur(), q > 0 && tangent > 0);
    }

    /**
     * The pin or ball whose contact lies exactly on the circle d + 2 x m_n (the "ideal" pin).
     *
     * <pre>
     * cos α_c = d_b / d_c,  d_c = d + 2 x m_n
     * contact:   d_b tan α_Mt − D_M cos β_b = d_b tan α_c
     * over pins: inv α_Mt = D_M / (d_b cos β_b) + C,  C = −π/(2z) + inv α_t + 2 x tan α_n / z
     * so with u = D_M / d_b:  α_Mt = tan α_c − C − u sin β_b tan β_b,  u cos β_b = tan α_Mt − tan α_c
     * </pre>
     * Derived from the two relations above (z m_n cos α_n = d_b cos β_b); solved for u by bisection. For
     * spur gears u sin β_b tan β_b vanishes and D_M = d_b (tan α_Mt − tan α_c), α_Mt = tan α_c − C, FORMULAS.md
     * §3.2's form (e.g. m 1, z 20, 20° → 1.72445 mm). When d + 2 x m_n is below the given lowest contact
     * circle (the root form diameter, or the base circle) the contact is put on that circle.
     *
     * @param g              the gear
     * @param lowestContactMm lowest diameter the contact may have, mm (the root form diameter d_Ff)
     */
    public static double idealPinMm(InvoluteGear g, double lowestContactMm) {
        int z = g.teeth();
        double x = g.effectiveProfileShift();
        double db = g.baseDiameterMm();
        double dc = Math.max(Math.max(lowestContactMm, db), g.referenceDiameterMm() + 2 * x * g.normalModuleMm());
        double tanC = Math.sqrt(dc * dc - db * db) / db;
        double c = -Math.PI / (2 * z) + Involute.inv(g.transversePressureAngleRad())
                + 2 * x * Math.tan(g.normalPressureAngleRad()) / z;
        double betaB = g.baseHelixAngleRad();
        double k = Math.sin(betaB) * Math.tan(betaB);
        double cosB = Math.cos(betaB);
        double a0 = tanC - c;
        if (!(a0 > Math.atan(tanC)) || a0 >= Math.PI / 2) {
            return Double.NaN;
        }
        // f(u) = tan(α_Mt(u)) − tan α_c − u cos β_b falls from f(0) > 0 as u grows
        double lo = 0;
        double hi = (Math.tan(a0) - tanC) / cosB;
        for (int i = 0; i < 200 && hi - lo > 1e-16; i++) {
            double u = (lo + hi) / 2;
            double f = Math.tan(a0 - u * k) - tanC - u * cosB;
            if (f > 0) {
                lo = u;
            } else {
                hi = u;
            }
        }
        return db * (lo + hi) / 2;
    }

    /** {@link #idealPinMm(InvoluteGear, double)} with the contact no lower than the root form diameter. */
    public static double idealPinMm(InvoluteGear g) {
        return idealPinMm(g, g.rootFormDiameterMm());
    }

    /** Radius the pin or ball reaches from the gear axis, mm: d_Mt/2 + D_M/2. */
    public double reachRadiusMm() {
        return (centreDiameterMm + pinDiameterMm) / 2;
    }

    /**
     * True when the pin or ball touches the involute between the root form diameter and the tip and
     * reaches beyond the tip, so the anvils touch the pins and not the teeth (common practice, no source).
     *
     * @param formDiameterMm root form diameter d_Ff, mm
     * @param tipDiameterMm  actual tip diameter, mm
     */
    public boolean fits(double formDiameterMm, double tipDiameterMm) {
        return touchesInvolute && contactDiameterMm >= formDiameterMm && contactDiameterMm <= tipDiameterMm
                && 2 * reachRadiusMm() > tipDiameterMm;
    }
}
