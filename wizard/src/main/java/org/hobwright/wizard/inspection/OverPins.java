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
 * contact: d_c = sqrt(d_b² + (d_b tan α_Mt − D_M / cos β_b)²)
 * </pre>
 * x is the shift of the thinned tooth x_E (this is the same as adding E_sn/(z m_n)). Sources: the
 * standard measurement-over-wires relation (FORMULAS.md §3.2); the wire-table value 32 T, 1 DP, 20°, wire
 * 1.728/P → 34.4130 in (Machinery's Handbook, from memory) is reproduced in the tests, and a brute-force
 * construction of the pin on sampled flanks checks every case (BruteForceCrossCheckTest). For helical gears z m_n cos α_n = d_b cos β_b makes the ball relation the same
 * (FORMULAS.md §1.2 identity).
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
        double tangent = db * Math.tan(alphaMt) - pinDiameterMm / Math.cos(g.baseHelixAngleRad());
        double dc = tangent > 0 ? Math.sqrt(db * db + tangent * tangent) : db;
        return new OverPins(pinDiameterMm, m, dMt, dc, !g.isSpur(), q > 0 && tangent > 0);
    }

    /**
     * The pin or ball whose contact lies exactly on the circle d + 2 x m_n (the "ideal" pin).
     *
     * <pre>
     * cos α_c = d_b / (d + 2 x m_n)
     * α_Mt = tan α_c + π/(2z) − inv α_t − 2 x tan α_n / z
     * D_M = d_b cos β_b (tan α_Mt − tan α_c)
     * </pre>
     * Derived from the relation above (for x = 0 it is FORMULAS.md §3.2's form, e.g. m 1, z 20, 20° →
     * 1.72445 mm). When d + 2 x m_n is below the base circle the contact is put on the base circle.
     */
    public static double idealPinMm(InvoluteGear g) {
        int z = g.teeth();
        double x = g.effectiveProfileShift();
        double db = g.baseDiameterMm();
        double dm = g.referenceDiameterMm() + 2 * x * g.normalModuleMm();
        double alphaC = dm > db ? Math.acos(db / dm) : 0.0;
        double alphaMt = Math.tan(alphaC) + Math.PI / (2 * z) - Involute.inv(g.transversePressureAngleRad())
                - 2 * x * Math.tan(g.normalPressureAngleRad()) / z;
        return db * Math.cos(g.baseHelixAngleRad()) * (Math.tan(alphaMt) - Math.tan(alphaC));
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
