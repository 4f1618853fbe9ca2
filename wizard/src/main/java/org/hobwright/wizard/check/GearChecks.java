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

    /**
     * Undercut: the hob's straight flank reaches below the interference point. Proposes the range of
     * profile shifts that avoids undercut and keeps the tip thickness of {@link #tip} (from the
     * smallest shift without undercut to the largest with the tip thick enough); when the range is
     * empty, says so and proposes tip shortening, or another pressure angle or tooth system.
     */
    public static void undercut(InvoluteGear g, HobJob job, Wording words, List<Finding> out) {
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
        double limit = tipLimitFactor(job) * g.normalModuleMm();
        double largest = Math.floor(largestShiftForTip(g, limit, proposed) * 100 + 1e-9) / 100;
        String geometry = ": tip diameter " + words.length(shifted.tipDiameterMm()) + ", root diameter "
                + words.length(shifted.rootDiameterMm());
        String mate = "; the mating gear and centre distance must allow for it";
        String fix;
        if (largest >= proposed) {
            fix = "set gear.profileShift to " + words.number(proposed) + " (from " + words.number(proposed) + " to "
                    + words.number(largest) + " the teeth are free of undercut and the tip at least "
                    + words.length(limit) + " thick)" + geometry + ", tip thickness "
                    + words.length(shifted.normalThicknessAtMm(shifted.tipDiameterMm())) + mate;
        } else {
            OptionalDouble shortened = diameterWithThickness(shifted, limit, shifted.tipDiameterMm());
            fix = "no profile shift avoids undercut and keeps the tip at least " + words.length(limit) + " thick for "
                    + g.teeth() + " teeth at " + words.angle(Math.toDegrees(g.normalPressureAngleRad()))
                    + " (undercut needs at least " + words.number(proposed) + ", the tip allows at most "
                    + words.number(largest) + "); "
                    + (shortened.isPresent() ? "set gear.profileShift to " + words.number(proposed)
                    + " and turn the blank to " + words.length(roundedDown(shortened.getAsDouble()))
                    + " (tip shortening: check the contact ratio with the mate), or " : "")
                    + "use a larger pressure angle (25°), a stub tooth system or more teeth" + mate;
        }
        EngineeringCode code = slight ? EngineeringCode.GEAR_UNDERCUT_SLIGHT : EngineeringCode.GEAR_UNDERCUT;
        out.add(code.at("gear.profileShift", msg, fix));
    }

    /**
     * The largest profile shift at which the tip (at the shifted gear's own tip diameter) is at least
     * {@code limitMm} thick, found by bisection (the tip thickness falls as the shift grows); a value
     * below {@code from} when even {@code from} gives too thin a tip.
     */
    static double largestShiftForTip(InvoluteGear g, double limitMm, double from) {
        if (tipThickness(g, from) < limitMm) {
            return from - 1;
        }
        double lo = from;
        double hi = from + 0.1;
        while (tipThickness(g, hi) >= limitMm && hi < from + 10) {
            lo = hi;
            hi += 0.5;
        }
        for (int i = 0; i < 60; i++) {
            double mid = (lo + hi) / 2;
            if (tipThickness(g, mid) >= limitMm) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    private static double tipThickness(InvoluteGear g, double shift) {
        InvoluteGear s = g.withProfileShift(shift);
        return s.normalThicknessAtMm(s.tipDiameterMm());
    }

    /** The tip thickness limit as a factor of the module: 0.4 for case-hardened work, else 0.25. */
    static double tipLimitFactor(HobJob job) {
        boolean caseHardened = job.cycle().workMaterial().toLowerCase(Locale.ROOT).contains("case-harden");
        return caseHardened ? TIP_LIMIT_CASE_HARDENED : TIP_LIMIT_SOFT;
    }

    /**
     * Pointed tip: the normal tooth thickness at the actual tip against 0.25 m_n (0.4 m_n when the work
     * material name says case-hardening).
     *
     * @param tipDiameterMm actual tip diameter (the smaller of d_a and the blank), mm
     */
    public static void tip(InvoluteGear g, double tipDiameterMm, HobJob job, Wording words, List<Finding> out) {
        double factor = tipLimitFactor(job);
        boolean caseHardened = factor == TIP_LIMIT_CASE_HARDENED;
        double limit = factor * g.normalModuleMm();
        double s = g.normalThicknessAtMm(tipDiameterMm);
        if (s >= limit) {
            return;
        }
        OptionalDouble shortened = diameterWithThickness(g, limit, tipDiameterMm);
        String fix = (shortened.isPresent() ? "turn the blank to " + words.length(roundedDown(shortened.getAsDouble()))
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

    /**
     * A diameter to turn, rounded down to 0.001 mm with at least 0.0005 mm to spare, so that the
     * printed value (4 decimals in mm, 5 in inches) is never above the one computed.
     */
    static double roundedDown(double mm) {
        return Math.floor(mm * 1000 - 0.5) / 1000;
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
