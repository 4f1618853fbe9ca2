package org.hobwright.wizard.steps;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.GearPairData;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.cycle.ToleranceData;
import org.hobwright.api.job.UnitKind;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.check.Wording;

/**
 * The lines of the REVIEW step and of the terminal's run summary: setup, inspection, cycle time
 * and predicted quality, each value with its unit, lengths in the job's unit. Display rounding
 * only: 3 decimals in mm, 4 in inches.
 */
public final class ReviewLines {
    private final Units units;
    private final List<String> lines = new ArrayList<>();

    private ReviewLines(Units units) {
        this.units = units;
    }

    /** The review lines of a cycle; parts the planner could not compute are left out. */
    public static List<String> of(HobCycle cycle, Units units) {
        ReviewLines r = new ReviewLines(units);
        cycle.setup().ifPresent(r::setup);
        cycle.inspection().ifPresent(r::inspection);
        cycle.pair().ifPresent(r::pair);
        cycle.summary().ifPresent(r::summary);
        cycle.tolerances().ifPresent(r::tolerances);
        return List.copyOf(r.lines);
    }

    private void setup(SetupValues s) {
        lines.add("Setup");
        lines.add("  blank diameter " + len(s.blankDiameterMm()) + ", touch-off diameter "
                + len(s.touchOffDiameterMm()) + ", final infeed diameter " + len(s.finalInfeedDiameterMm()));
        lines.add("  hob lead angle " + deg(s.leadAngleDeg()) + ", swivel angle " + deg(s.swivelAngleDeg())
                + " (" + s.swivelAngleDms() + ")");
        lines.add("  swivel setting " + s.swivelSettingText() + ", " + s.swivelDirection());
        lines.add("  hob " + num(s.hobRpm(), 0) + " rpm, work " + num(s.workRpm(), 1) + " rpm, sync ratio "
                + Wording.count(s.syncHobTurns(), "hob turn", "hob turns") + " : "
                + Wording.count(s.syncWorkTurns(), "work turn", "work turns") + ", cutting speed "
                + speed(s.cuttingSpeedMPerMin()));
    }

    private void inspection(InspectionData i) {
        lines.add("Inspection");
        lines.add("  span over " + Wording.teeth(i.spanTeeth()) + " " + len(i.spanWidthMm()) + ", over two "
                + (i.balls() ? "balls" : "pins") + " of " + len(i.pinDiameterMm()) + ": " + len(i.overPinsMm()));
        i.limits().ifPresent(l -> lines.add("  limits (" + l.basis() + "): span " + len(l.spanWidthLowerMm()) + " to "
                + len(l.spanWidthUpperMm()) + ", over " + (i.balls() ? "balls " : "pins ") + len(l.overPinsLowerMm())
                + " to " + len(l.overPinsUpperMm()) + ", chordal thickness " + len(l.chordalThicknessLowerMm())
                + " to " + len(l.chordalThicknessUpperMm())));
    }

    private void pair(GearPairData p) {
        lines.add("Mating gear");
        lines.add("  " + p.mateTeeth() + " teeth, shift " + num(p.mateProfileShift(), 4) + ", centre distance "
                + len(p.centreDistanceMm()) + ", working pressure angle " + deg(p.workingPressureAngleDeg())
                + ", backlash " + len(p.backlashMinMm()) + " to " + len(p.backlashMaxMm()));
    }

    private void summary(CycleSummary c) {
        lines.add("Cycle");
        lines.add("  cycle time " + num(c.cycleTimeS(), 1) + " s in " + c.passes().size() + " pass"
                + (c.passes().size() == 1 ? "" : "es") + ", finishing feed " + feed(c.finishFeedMmPerRev()));
        lines.add("Predicted quality");
        lines.add("  feed marks " + num(c.feedMarkFlankUm(), 2) + " µm on the flank, " + num(c.feedMarkRootUm(), 2)
                + " µm in the root; enveloping cuts " + num(c.envelopingDepthUm(), 2)
                + " µm; largest chip " + len(c.maxChipThicknessMm()));
        c.fastest().ifPresent(f -> lines.add("  fastest proposal: " + num(f.cycleTimeS(), 1) + " s in "
                + Wording.count(f.passes(), "pass", "passes") + ", hob " + num(f.hobRpm(), 0) + " rpm; limited by "
                + f.bindingLimit() + "; to use it, give the job cycle.cuttingSpeed "
                + down(units.cuttingSpeedFromMPerMin(f.cuttingSpeedMPerMin()), 1) + ", cycle.roughFeed "
                + down(units.fromMm(f.roughFeedMmPerRev()), feedDecimals()) + " and cycle.finishFeed "
                + down(units.fromMm(f.finishFeedMmPerRev()), feedDecimals())));
    }

    /** A proposed value rounded down, so that it stays within the limit that bound it. */
    private static String down(double v, int decimals) {
        String text = Decimal.fixed(v, decimals, false, Decimal.Rounding.FLOOR);
        return text.endsWith(".") ? text.substring(0, text.length() - 1) : text;
    }

    private int feedDecimals() {
        return units == Units.IN ? 4 : 3;
    }

    private void tolerances(ToleranceData t) {
        lines.add("  ISO 1328-1 class " + t.flankToleranceClass() + ": f_pT " + num(t.singlePitchUm(), 1)
                + " µm, F_αT " + num(t.profileTotalUm(), 1) + " µm, F_βT " + num(t.helixTotalUm(), 1) + " µm");
    }

    private String len(double mm) {
        return num(units.fromMm(mm), units == Units.IN ? 4 : 3) + " " + units.symbol();
    }

    private String feed(double mmPerRev) {
        return num(units.fromMm(mmPerRev), units == Units.IN ? 4 : 3) + " " + units.symbol() + "/rev";
    }

    private String speed(double mPerMin) {
        return num(units.cuttingSpeedFromMPerMin(mPerMin), 0) + " " + UnitKind.CUTTING_SPEED.symbol(units);
    }

    private static String deg(double d) {
        return num(d, 4) + "°";
    }

    private static String num(double v, int decimals) {
        return Decimal.fixed(v, decimals);
    }
}
