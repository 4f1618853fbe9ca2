package org.hobwright.wizard.check;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.GearPairData;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.MatingGear;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.geometry.GearPair;
import org.hobwright.wizard.geometry.InvoluteGear;

/**
 * Does the gear fit its mate? From the drawing's mate (teeth, and perhaps its shift and the centre
 * distance): the working pressure angle, the sum of profile shifts the centre distance implies, the
 * backlash from the thickness allowances and the tip clearances ({@link GearPair}, ISO 21771:2007
 * relations). Errors when the centre distance is below any these gears can have, when the teeth at their
 * upper allowances would jam, or when a tip would run into the other gear's root: then the drawing's
 * centre distance, shifts and diameters cannot all be right. A tip clearance under 0.1 m_n is a warning
 * (common practice, no source).
 */
public final class GearPairChecks {
    /** Smallest tip clearance without a warning, as a fraction of m_n (common practice, no source). */
    public static final double MIN_CLEARANCE_FACTOR = 0.1;
    /** Backlash below zero by less than this is rounding, not a jam (mm). */
    private static final double JAM_TOLERANCE_MM = 1e-6;

    private GearPairChecks() {
    }

    /**
     * The pair's values, or empty when the centre distance cannot hold these gears (with an error finding).
     *
     * @param spec  the gear as the job gives it (its mate present)
     * @param g     the gear with its upper allowance
     * @param tipMm the gear's actual tip diameter, mm
     */
    public static Optional<GearPairData> check(GearSpec spec, InvoluteGear g, double tipMm, Wording words,
                                               List<Finding> out) {
        MatingGear m = spec.mate().orElseThrow();
        double x1 = g.profileShift();
        GearPair nominal = GearPair.of(g.withoutAllowance(), m.teeth(), m.profileShift().orElse(0), 0);
        double a;
        double mateShift;
        if (m.centreDistanceMm().isPresent()) {
            a = m.centreDistanceMm().getAsDouble();
            if (Double.isNaN(nominal.workingPressureAngleRad(a))) {
                out.add(EngineeringCode.GEAR_PAIR_CENTRE_DISTANCE.at("gear.mate.centreDistance", "centre distance "
                        + words.length(a) + " is below " + words.length(nominal.smallestCentreDistanceMm())
                        + ", the least any pair of " + g.teeth() + " and " + m.teeth() + " teeth of this module can have",
                        "check the centre distance and the tooth counts on the drawing"));
                return Optional.empty();
            }
            double sum = nominal.profileShiftSum(a);
            mateShift = m.profileShift().orElse(sum - x1);
            if (m.profileShift().isEmpty()) {
                out.add(EngineeringCode.GEAR_PAIR_MATE_SHIFT.at("gear.mate.profileShift", "centre distance "
                        + words.length(a) + " implies x₁ + x₂ = " + Decimal.fixed(sum, 4) + " without backlash: the"
                        + " mate's profile shift is taken as " + Decimal.fixed(mateShift, 4),
                        "enter the mate's profile shift from its drawing in gear.mate.profileShift"));
            }
        } else {
            mateShift = m.profileShift().orElse(0);
            a = nominal.centreDistanceWithoutBacklashMm(x1 + mateShift);
            if (!Double.isFinite(a)) {
                out.add(EngineeringCode.GEAR_PAIR_CENTRE_DISTANCE.at("gear.mate.profileShift", "profile shifts x₁ "
                        + Decimal.fixed(x1, 4) + " and x₂ " + Decimal.fixed(mateShift, 4) + " leave no centre distance"
                        + " for " + g.teeth() + " and " + m.teeth() + " teeth", "check the profile shifts"));
                return Optional.empty();
            }
        }
        double lower1 = spec.thicknessAllowanceLowerMm().orElse(g.thicknessAllowanceMm());
        double lower2 = m.thicknessAllowanceLowerMm().orElse(m.thicknessAllowanceMm());
        GearPair tightest = GearPair.of(g, m.teeth(), mateShift, m.thicknessAllowanceMm());
        GearPair loosest = GearPair.of(g.withThicknessAllowance(lower1), m.teeth(), mateShift, lower2);
        double jMin = tightest.normalBacklashMm(a);
        double jMax = loosest.normalBacklashMm(a);
        GearPair withoutAllowances = GearPair.of(g.withoutAllowance(), m.teeth(), mateShift, 0);
        double sum = withoutAllowances.profileShiftSum(a);
        if (jMin < -JAM_TOLERANCE_MM) {
            out.add(EngineeringCode.GEAR_PAIR_NO_BACKLASH.at("gear.mate.centreDistance", "at centre distance "
                    + words.length(a) + " the teeth at their upper allowances would jam (normal backlash "
                    + words.length(jMin) + "): it implies x₁ + x₂ = " + Decimal.fixed(sum, 4) + ", the shifts are "
                    + Decimal.fixed(x1, 4) + " + " + Decimal.fixed(mateShift, 4) + "; centre distance, shifts and"
                    + " allowances cannot all be right", "ask the designer: without backlash these shifts need a"
                    + " centre distance of " + words.length(withoutAllowances.centreDistanceWithoutBacklashMm(
                            x1 + mateShift)) + "; more negative allowances or less shift give backlash"));
        }
        double c1 = tightest.tipClearanceMm(a, tipMm);
        double c2 = tightest.mateTipClearanceMm(a);
        clearance(c1, "this gear's tip " + words.length(tipMm) + " and the mate's root "
                + words.length(tightest.mate().rootDiameterMm()), "gear.blankDiameter", g, words, out);
        clearance(c2, "the mate's tip " + words.length(tightest.mate().tipDiameterMm()) + " and this gear's root "
                + words.length(g.rootDiameterMm()), "gear.mate.profileShift", g, words, out);
        return Optional.of(new GearPairData(m.teeth(), mateShift, m.profileShift().isPresent(),
                nominal.referenceCentreDistanceMm(), a, m.centreDistanceMm().isPresent(),
                Math.toDegrees(nominal.workingPressureAngleRad(a)), sum, jMin, jMax,
                tightest.mate().tipDiameterMm(), tightest.mate().rootDiameterMm(), c1, c2));
    }

    private static void clearance(double c, String between, String field, InvoluteGear g, Wording words,
                                  List<Finding> out) {
        double least = MIN_CLEARANCE_FACTOR * g.normalModuleMm();
        String fix = "shorten the tip (turn the tip diameter smaller by twice the shortfall) or check the centre"
                + " distance and shifts with the designer";
        if (c <= 0) {
            out.add(EngineeringCode.GEAR_PAIR_TIP_INTERFERENCE.at(field, "the tip runs into the root: between "
                    + between + " the clearance is " + words.length(c) + "; centre distance, shifts and diameters"
                    + " cannot all be right", fix));
        } else if (c < least) {
            out.add(EngineeringCode.GEAR_PAIR_TIP_CLEARANCE_SMALL.at(field, "between " + between + " the clearance"
                    + " is only " + words.length(c) + " (less than 0.1 module, " + words.length(least) + ")", fix));
        }
    }
}
