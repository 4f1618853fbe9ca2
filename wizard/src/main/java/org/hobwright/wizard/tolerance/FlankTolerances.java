package org.hobwright.wizard.tolerance;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.cycle.ToleranceData;
import org.hobwright.text.Decimal;

/**
 * Flank tolerances of ISO 1328-1:2013 (identical in ANSI/AGMA ISO 1328-1-B14 and DIN ISO 1328-1:2018)
 * for a flank tolerance class A = 1 … 11, micrometres.
 *
 * <pre>
 * (5)  f_pT  = (0.001 d + 0.4 m_n + 5)             · √2^(A−5)
 * (6)  F_pT  = (0.002 d + 0.55 √d + 0.7 m_n + 12)  · √2^(A−5)
 * (7)  f_HαT = (0.4 m_n + 0.001 d + 4)             · √2^(A−5)
 * (8)  f_fαT = (0.55 m_n + 5)                      · √2^(A−5)
 * (9)  F_αT  = √(f_HαT² + f_fαT²)
 * (10) f_HβT = (0.05 √d + 0.35 √b + 4)            · √2^(A−5)
 * (11) f_fβT = (0.07 √d + 0.45 √b + 4)            · √2^(A−5)
 * (12) F_βT  = √(f_HβT² + f_fβT²)
 * </pre>
 * d reference diameter, m_n normal module, b face width, all mm. Each value is computed unrounded
 * (the totals from the unrounded components) and then rounded by clause 5.2.3: above 10 µm to 1 µm,
 * from 5 to 10 µm to 0.5 µm, below 5 µm to 0.1 µm. Scope (clause 1): 5 ≤ z ≤ 1000,
 * 5 ≤ d ≤ 15 000 mm, 0.5 ≤ m_n ≤ 70 mm, 4 ≤ b ≤ 1200 mm, β ≤ 45°; outside it the standard gives no
 * values and none are extrapolated. Formulas in clause 5.3; the formulas, equation numbers and the
 * rounding rule from memory, not read in the standard's text (FORMULAS.md §9.1); the scope as printed in
 * the standard's published abstract.
 *
 * <p>Equation (7): the 0.001 d term is remembered with it and was seen quoted without it. Hobwright
 * includes it: it has the same form as the single pitch tolerance (5), and the AGMA adoption's formula
 * as remembered has it (from memory). The difference is 0.001 d · √2^(A−5) µm, below 1 µm for d under about 700 mm at class
 * 5, and it only enters F_αT. The tests pin the choice with both worked examples of FORMULAS.md §9.1.
 */
public final class FlankTolerances {
    private FlankTolerances() {
    }

    /**
     * The tolerances of a class, rounded by clause 5.2.3.
     *
     * @param toleranceClass flank tolerance class A, 1 to 11
     * @param d              reference diameter, mm
     * @param mn             normal module, mm
     * @param b              face width, mm
     */
    public static ToleranceData of(int toleranceClass, double d, double mn, double b) {
        double[] u = unrounded(toleranceClass, d, mn, b);
        return new ToleranceData(toleranceClass, round(u[0]), round(u[1]), round(u[2]), round(u[3]), round(u[4]),
                round(u[5]), round(u[6]), round(u[7]));
    }

    /**
     * The unrounded tolerances, µm, in the order f_pT, F_pT, f_HαT, f_fαT, F_αT, f_HβT, f_fβT, F_βT.
     *
     * @param toleranceClass flank tolerance class A
     * @param d              reference diameter, mm
     * @param mn             normal module, mm
     * @param b              face width, mm
     */
    public static double[] unrounded(int toleranceClass, double d, double mn, double b) {
        double step = Math.pow(Math.sqrt(2), toleranceClass - 5);
        double sd = Math.sqrt(d);
        double sb = Math.sqrt(b);
        double fpT = (0.001 * d + 0.4 * mn + 5) * step;
        double fPT = (0.002 * d + 0.55 * sd + 0.7 * mn + 12) * step;
        double fHa = (0.4 * mn + 0.001 * d + 4) * step;
        double ffa = (0.55 * mn + 5) * step;
        double fHb = (0.05 * sd + 0.35 * sb + 4) * step;
        double ffb = (0.07 * sd + 0.45 * sb + 4) * step;
        return new double[] {fpT, fPT, fHa, ffa, Math.hypot(fHa, ffa), fHb, ffb, Math.hypot(fHb, ffb)};
    }

    /**
     * Rounds a tolerance by ISO 1328-1:2013 clause 5.2.3: above 10 µm to whole µm, 5 to 10 µm to
     * 0.5 µm, below 5 µm to 0.1 µm (halves round up).
     */
    public static double round(double um) {
        double step = um > 10 ? 1.0 : um >= 5 ? 0.5 : 0.1;
        return Math.floor(um / step + 0.5 + 1e-9) * step;
    }

    /**
     * What lies outside the scope of ISO 1328-1:2013, in words; empty when the gear is in scope.
     *
     * @param teeth        number of teeth z
     * @param d            reference diameter, mm
     * @param mn           normal module, mm
     * @param b            face width, mm
     * @param helixAngleDeg helix angle magnitude, degrees
     */
    public static List<String> outOfScope(int teeth, double d, double mn, double b, double helixAngleDeg) {
        List<String> out = new ArrayList<>();
        if (teeth < 5 || teeth > 1000) {
            out.add("number of teeth " + teeth + " (scope 5 to 1000)");
        }
        check(out, "reference diameter", d, 5, 15000, " mm");
        check(out, "normal module", mn, 0.5, 70, " mm");
        check(out, "face width", b, 4, 1200, " mm");
        if (helixAngleDeg > 45) {
            out.add("helix angle " + fmt(helixAngleDeg) + "° (scope up to 45°)");
        }
        return out;
    }

    private static void check(List<String> out, String what, double v, double min, double max, String unit) {
        if (v < min || v > max) {
            out.add(what + " " + fmt(v) + unit + " (scope " + fmt(min) + " to " + fmt(max) + unit + ")");
        }
    }

    private static String fmt(double v) {
        return Decimal.significant(v, 6);
    }
}
