package org.hobwright.wizard.inspection;

import org.hobwright.wizard.geometry.Involute;
import org.hobwright.wizard.geometry.InvoluteGear;

/**
 * Span measurement (base tangent length) over k teeth, spur or helical, in the normal plane.
 *
 * <pre>
 * W_k   = m_n cos α_n [ (k − 0.5) π + z inv α_t ] + 2 x m_n sin α_n
 * k_calc = (z/π) (tan α_M / cos² β_b − inv α_t) − 2 x tan α_n / π + 0.5,  cos α_M = d_b / (d + 2 x m_n)
 * k     = round(k_calc), ties (|k_calc − n − 0.5| &lt; 1e-9) to the lower n, 1 ≤ k ≤ z − 1
 * d_c   = sqrt(d_b² + (W_k cos β_b)²)              diameter where the anvils touch
 * </pre>
 * x is the shift of the thinned tooth x_E = x + E_sn / (2 m_n tan α_n) (FORMULAS.md §2.1), so the value
 * includes the thickness allowance. Sources: the base tangent length of ISO 21771 / DIN 3960 (clause
 * from memory; FORMULAS.md §3.1), checked against two planes touching sampled flanks in the tests; the
 * k rule puts the anvil contact on the circle d + 2 x m_n (derived; reduces to the classic
 * k = z α/180° + 0.5 for spur gears without shift). The lower-neighbour tie rule follows printed span
 * tables (from memory).
 *
 * @param teeth             number of teeth spanned k
 * @param teethCalculated   k_calc before rounding
 * @param widthMm           W_k, mm
 * @param contactDiameterMm d_c, mm
 */
public record SpanMeasurement(int teeth, double teethCalculated, double widthMm, double contactDiameterMm) {

    /** The span over the number of teeth chosen by the rule. */
    public static SpanMeasurement of(InvoluteGear g) {
        double kCalc = teethCalculated(g);
        return over(g, teethFor(kCalc, g.teeth()), kCalc);
    }

    /**
     * The span over the number of teeth chosen by the rule, or, when its anvils would touch outside the
     * usable involute (below the root form diameter, e.g. in an undercut, or above the tip), over the
     * neighbouring number of teeth nearer k_calc whose anvils touch on it (common practice, no source).
     * When neither neighbour does, the rule's k is kept and the inspection check reports it.
     *
     * @param formDiameterMm root form diameter d_Ff, where the usable involute begins, mm
     * @param tipDiameterMm  actual tip diameter, mm
     */
    public static SpanMeasurement of(InvoluteGear g, double formDiameterMm, double tipDiameterMm) {
        SpanMeasurement rule = of(g);
        if (rule.touchesBetween(formDiameterMm, tipDiameterMm)) {
            return rule;
        }
        int k = rule.teeth();
        int first = rule.teethCalculated() >= k ? k + 1 : k - 1;
        for (int candidate : new int[] {first, 2 * k - first}) {
            if (candidate >= 1 && candidate <= Math.max(1, g.teeth() - 1)) {
                SpanMeasurement other = over(g, candidate, rule.teethCalculated());
                if (other.touchesBetween(formDiameterMm, tipDiameterMm)) {
                    return other;
                }
            }
        }
        return rule;
    }

    /** True when the anvils touch between the two diameters (inclusive). */
    public boolean touchesBetween(double lowestMm, double highestMm) {
        return contactDiameterMm >= lowestMm && contactDiameterMm <= highestMm;
    }

    /** The span over a given number of teeth. */
    public static SpanMeasurement over(InvoluteGear g, int k) {
        return over(g, k, teethCalculated(g));
    }

    private static SpanMeasurement over(InvoluteGear g, int k, double kCalc) {
        double w = widthMm(g, k);
        double wt = w * Math.cos(g.baseHelixAngleRad());
        double db = g.baseDiameterMm();
        return new SpanMeasurement(k, kCalc, w, Math.sqrt(db * db + wt * wt));
    }

    /** W_k for k teeth, mm. */
    public static double widthMm(InvoluteGear g, int k) {
        double an = g.normalPressureAngleRad();
        double mn = g.normalModuleMm();
        return mn * Math.cos(an) * ((k - 0.5) * Math.PI + g.teeth() * Involute.inv(g.transversePressureAngleRad()))
                + 2 * g.effectiveProfileShift() * mn * Math.sin(an);
    }

    /** k_calc, the unrounded number of teeth that puts the anvil contact on d + 2 x m_n. */
    public static double teethCalculated(InvoluteGear g) {
        double x = g.effectiveProfileShift();
        double dm = g.referenceDiameterMm() + 2 * x * g.normalModuleMm();
        double alphaM = Math.acos(Math.min(1.0, Math.max(0.0, g.baseDiameterMm() / Math.max(dm, 1e-300))));
        double cb = Math.cos(g.baseHelixAngleRad());
        return g.teeth() / Math.PI * (Math.tan(alphaM) / (cb * cb) - Involute.inv(g.transversePressureAngleRad()))
                - 2 * x * Math.tan(g.normalPressureAngleRad()) / Math.PI + 0.5;
    }

    /** Rounds k_calc by the tie rule and keeps it within 1 … z − 1. */
    static int teethFor(double kCalc, int z) {
        double lower = Math.floor(kCalc);
        double k = Math.abs(kCalc - lower - 0.5) < 1e-9 ? lower : Math.rint(kCalc);
        return (int) Math.max(1, Math.min(Math.max(1, z - 1), k));
    }
}
