package org.hobwright.wizard.plan;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;

/**
 * The air gaps the rapids keep from the blank: a radial or axial clearance below 0.5 mm is a
 * warning. The rapids end where the hob would meet a blank of exactly the drawn size; the gap
 * must cover the blank's size tolerance and runout, its position in the chuck and the rapid's
 * overshoot (0.5 mm, common practice, no source; the default 1 mm is common practice too).
 */
final class Clearances {
    /** Smallest sensible clearance, mm (common practice, no source). */
    static final double MIN_MM = 0.5;

    private Clearances() {
    }

    static void check(CycleSettings cycle, Units units, List<Finding> findings) {
        small("cycle.radialClearance", "radial", cycle.radialClearanceMm(), units, findings);
        small("cycle.axialClearance", "axial", cycle.axialClearanceMm(), units, findings);
    }

    private static void small(String field, String which, double mm, Units units, List<Finding> findings) {
        if (mm >= MIN_MM) {
            return;
        }
        int decimals = units == Units.MM ? 3 : 4;
        findings.add(PlanCode.PLAN_CLEARANCE_SMALL.at(field, "the " + which + " clearance "
                + Decimal.fixed(units.fromMm(mm), decimals) + " " + units.symbol() + " is below "
                + Decimal.fixed(units.fromMm(MIN_MM), decimals) + " " + units.symbol() + ": the hob rapids to within it of"
                + " the blank as drawn, with nothing left for the blank's size, runout and position or the rapid's"
                + " overshoot", "give a clearance of at least " + Decimal.fixed(units.fromMm(MIN_MM), decimals) + " "
                + units.symbol()));
    }
}
