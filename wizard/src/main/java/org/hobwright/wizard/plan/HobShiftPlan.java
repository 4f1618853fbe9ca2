package org.hobwright.wizard.plan;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;

/**
 * Hob shifting between parts, so that wear spreads along the hob.
 *
 * <pre>
 * working width  w = 2 h / tan α_n + π m_n        generating zone along the hob axis (FORMULAS.md §7.2, derived)
 *                                                  plus one axial pitch (common practice, no source)
 * usable range   R = min(shift-axis travel, hob length − w)
 * position for part k (k = 0, 1, …):  (⌊k / n⌋ mod P) · s,  P = ⌊R / s⌋ + 1 positions,
 *                                      s the shift per step, n parts per step; the first part is at 0
 * </pre>
 *
 * @param positionMm   shift position of the planned part, mm from the start position
 * @param usableMm     usable shift range R, mm
 * @param stepMm       shift per step, mm (0 when not shifting)
 * @param everyParts   parts per step
 * @param positions    distinct positions before the shift wraps back to 0
 */
public record HobShiftPlan(double positionMm, double usableMm, double stepMm, int everyParts, int positions) {

    /** Plans the shift, adding findings; empty when the machine has no shift axis. */
    public static Optional<HobShiftPlan> of(MachineProfile machine, HobSpec hob, CycleSettings cycle,
                                            double fullDepthMm, double pressureAngleDeg, List<Finding> findings) {
        if (machine.hobShiftTravelMm().isEmpty()) {
            if (cycle.hobShiftPerPartMm() > 0) {
                findings.add(PlanCode.PLAN_HOB_SHIFT_NO_AXIS.at("cycle.hobShift.perPart",
                        "this machine has no hob-shift axis; the hob is not shifted", null));
            }
            return Optional.empty();
        }
        double width = 2 * fullDepthMm / Math.tan(Math.toRadians(pressureAngleDeg)) + Math.PI * hob.moduleMm();
        double usable = Math.min(machine.hobShiftTravelMm().getAsDouble(), hob.lengthMm() - width);
        double step = cycle.hobShiftPerPartMm();
        if (usable <= 0) {
            if (step > 0) {
                findings.add(PlanCode.PLAN_HOB_SHIFT_NO_ROOM.at("hob.length", "the hob ("
                        + Decimal.fixed(hob.lengthMm(), 3)
                        + " mm long) has no room to shift beyond its working width of " + Decimal.fixed(width, 3)
                        + " mm", "use a longer hob or set cycle.hobShift.perPart to 0"));
            }
            return Optional.of(new HobShiftPlan(0, 0, 0, cycle.hobShiftEveryParts(), 1));
        }
        if (step > usable) {
            findings.add(PlanCode.PLAN_HOB_SHIFT_STEP_TOO_LARGE.at("cycle.hobShift.perPart",
                    "a shift of " + Decimal.fixed(step, 3) + " mm is more than the usable range of "
                            + Decimal.fixed(usable, 3) + " mm", "shift at most " + Decimal.fixed(usable, 3) + " mm"));
            step = 0;
        }
        int positions = step > 0 ? (int) Math.floor(usable / step + 1e-9) + 1 : 1;
        return Optional.of(new HobShiftPlan(0, usable, step, cycle.hobShiftEveryParts(), positions));
    }

    /** Shift position for part {@code k} (0-based), mm. */
    public double positionForPart(long k) {
        if (stepMm <= 0) {
            return 0;
        }
        return ((k / everyParts) % positions) * stepMm;
    }

    /** One line for the program, lengths in the job's units. */
    public String describe(Units units) {
        String u = " " + units.symbol();
        int decimals = units == Units.IN ? 4 : 3;
        if (stepMm <= 0) {
            return "hob shift position " + Decimal.fixed(units.fromMm(positionMm), decimals) + u
                    + " (no shifting between parts)";
        }
        return "hob shift " + Decimal.fixed(units.fromMm(stepMm), decimals) + u + " every " + everyParts
                + (everyParts == 1 ? " part" : " parts") + ", from 0 to "
                + Decimal.fixed(units.fromMm((positions - 1) * stepMm), decimals) + u + ", then back to 0";
    }
}
