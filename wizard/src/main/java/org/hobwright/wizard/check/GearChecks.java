package org.hobwright.wizard.check;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.HobJob;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.geometry.Undercut;

/**
 * Checks of the gear as the hob will cut it: root diameter, undercut, pointed tip, custom root radius.
 * Each check adds findings to a list; none throws for a bad gear.
 */
public final class GearChecks {
    /** Tip thickness limit for soft and through-hardened gears, × m_n (from memory). */
    public static final double TIP_LIMIT_SOFT = 0.25;
    /** Tip thickness limit for case-hardened gears, × m_n (from memory). */
    public static final double TIP_LIMIT_CASE_HARDENED = 0.4;

    private GearChecks() {
    }

    /**
     * The root diameter must be positive; returns false (after adding an error) when it is not, and
     * then no other geometry may be used.
     */
    public static boolean rootPositive(InvoluteGear g, Wording words, List<Finding> out) {
        double df = g.rootDiameterMm();
        if (df > 0 && g.tipDiameterMm() > df) {
            return true;
        }
        out.add(EngineeringCode.GEAR_ROOT_NOT_POSITIVE.at("gear.profileShift", "with " + g.teeth()
                + " teeth and profile shift " + words.number(g.profileShift()) + " the root diameter would be "
                + words.length(df), "use a larger profile shift or more teeth"));
        return false;
    }

    /** Undercut: the hob's straight flank reaches below the interference point. Proposes the shift to use. */
    public static void undercut(InvoluteGear g, Wording words, List<Finding> out) {
        double hStar = Undercut.hStar(g);
        double xMin = Undercut.minProfileShift(hStar, g);
        double xE = g.effectiveProfileShift();
        if (xE >= xMin - 1e-12) {
            return;
        }
        double allowanceShift = g.profileShift() - xE;
        double proposed = Math.ceil((xMin + allowanceShift) * 100 - 1e-9) / 100;
        InvoluteGear shifted = g.withProfileShift(proposed);
        boolean slight = xMin - xE <= Undercut.SLIGHT_SHORTFALL * hStar;
        String zMin = Wording.plain(Undercut.minTeeth(hStar, g), 1);
        String msg = g.teeth() + " teeth with profile shift " + words.number(g.profileShift())
                + ": the hob undercuts the tooth roots" + (slight ? " slightly, below the working flank" : "")
                + " (no undercut from " + zMin + " teeth at zero shift; this tooth count needs a shift of at least "
                + words.number(xMin + allowanceShift) + ")";
        String fix = "set gear.profileShift to " + words.number(proposed) + ": tip diameter "
                + words.length(shifted.tipDiameterMm()) + ", root diameter " + words.length(shifted.rootDiameterMm())
                + ", tip thickness " + words.length(shifted.normalThicknessAtMm(shifted.tipDiameterMm()))
                + "; the mating gear and centre distance must allow for it";
        EngineeringCode code = slight ? EngineeringCode.GEAR_UNDERCUT_SLIGHT : EngineeringCode.GEAR_UNDERCUT;
        out.add(code.at("gear.profileShift", msg, fix));
    }

    /**
     * Pointed tip: the normal tooth thickness at the actual tip against 0.25 m_n (0.4 m_n when the work
     * material name says case-hardening).
     *
     * @param tipDiameterMm actual tip diameter (the smaller of d_a and the blank), mm
     */
    public static void tip(InvoluteGear g, double tipDiameterMm, HobJob job, Wording words, List<Finding> out) {
        boolean caseHardened = job.cycle().workMaterial().toLowerCase(Locale.ROOT).contains("case-harden");
        double factor = caseHardened ? TIP_LIMIT_CASE_HARDENED : TIP_LIMIT_SOFT;
        double limit = factor * g.normalModuleMm();
        double s = g.normalThicknessAtMm(tipDiameterMm);
        if (s >= limit) {
            return;
        }
        OptionalDouble shortened = diameterWithThickness(g, limit, tipDiameterMm);
        String fix = (shortened.isPresent() ? "turn the blank to " + words.length(shortened.getAsDouble())
                + " (tip shortening) for a tip thickness of " + words.length(limit) + ", or " : "")
                + "reduce the profile shift";
        if (s <= 0) {
            out.add(EngineeringCode.GEAR_TIP_POINTED.at("gear.profileShift", "the teeth come to a point below the tip"
                    + " diameter " + words.length(tipDiameterMm) + " (tip thickness " + words.length(s) + ")", fix));
        } else {
            out.add(EngineeringCode.GEAR_TIP_THIN.at("gear.profileShift", "tip thickness " + words.length(s)
                    + " is below " + words.number(factor) + " module (" + words.length(limit) + ")"
                    + (caseHardened ? " for a case-hardened gear" : ""), fix));
        }
    }

    /** The largest diameter below {@code maxMm} where the normal thickness is at least {@code thicknessMm}. */
    static OptionalDouble diameterWithThickness(InvoluteGear g, double thicknessMm, double maxMm) {
        double lo = Math.max(g.baseDiameterMm(), g.referenceDiameterMm());
        if (g.normalThicknessAtMm(lo) < thicknessMm) {
            return OptionalDouble.empty();
        }
        double hi = maxMm;
        for (int i = 0; i < 100; i++) {
            double mid = (lo + hi) / 2;
            if (g.normalThicknessAtMm(mid) >= thicknessMm) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return OptionalDouble.of(lo);
    }

    /**
     * A custom root radius must fit the clearance of its basic rack (ISO 53 §5.9 rule), within 0.005 m_n:
     * ISO 53 itself rounds its factors to two decimals (profile A: 0.38 against the largest 0.37995).
     */
    public static void customRootRadius(InvoluteGear g, Wording words, List<Finding> out) {
        ToothSystem s = g.system();
        if (!ToothSystem.CUSTOM.equals(s.id())) {
            return;
        }
        double m = g.normalModuleMm();
        double max = s.maxRootRadiusMm(m, g.normalPressureAngleRad());
        if (s.rootRadiusMm(m) > max + 0.005 * m) {
            out.add(EngineeringCode.GEAR_CUSTOM_ROOT_RADIUS.at("gear.custom.rootRadius", "root radius factor "
                    + words.number(s.rootRadiusFactor()) + " is larger than the largest that fits the clearance ("
                    + words.number(max / m) + ")", "use a root radius factor of at most " + words.number(max / m)));
        }
    }
}
