package org.hobwright.wizard.plan;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.text.Decimal;

/**
 * Checks every position of the steps against the machine's travels: radial positions as work
 * diameters within radialMin … radialMax, axial positions (hob centre from the front face, the
 * coordinate of the steps) within axialMin … axialMax. One error finding per axis names the worst
 * position and the travel.
 */
public final class TravelCheck {
    private TravelCheck() {
    }

    /** Error findings for positions outside the travels, empty when every position fits. */
    public static List<Finding> check(List<CycleStep> steps, MachineProfile machine) {
        double minDia = Double.POSITIVE_INFINITY;
        double maxDia = Double.NEGATIVE_INFINITY;
        double minAx = Double.POSITIVE_INFINITY;
        double maxAx = Double.NEGATIVE_INFINITY;
        for (CycleStep s : steps) {
            double dia;
            double ax;
            if (s instanceof CycleStep.Rapid r) {
                dia = r.diameterMm();
                ax = r.axialMm();
            } else if (s instanceof CycleStep.Feed f) {
                dia = f.diameterMm();
                ax = f.axialMm();
            } else {
                continue;
            }
            minDia = Math.min(minDia, dia);
            maxDia = Math.max(maxDia, dia);
            minAx = Math.min(minAx, ax);
            maxAx = Math.max(maxAx, ax);
        }
        List<Finding> out = new ArrayList<>(2);
        double tol = 1e-9;
        if (minDia < machine.radialMinMm() - tol || maxDia > machine.radialMaxMm() + tol) {
            out.add(PlanCode.PLAN_TRAVEL_RADIAL.at(maxDia > machine.radialMaxMm() + tol
                            ? "machine.travel.radialMax" : "machine.travel.radialMin",
                    "the cycle needs work diameters " + Decimal.fixed(minDia, 3) + " to " + Decimal.fixed(maxDia, 3)
                            + " mm, the machine reaches " + Decimal.fixed(machine.radialMinMm(), 3) + " to "
                            + Decimal.fixed(machine.radialMaxMm(), 3) + " mm",
                    "reduce cycle.radialClearance or the blank diameter, or use a machine with more radial travel"));
        }
        if (minAx < machine.axialMinMm() - tol || maxAx > machine.axialMaxMm() + tol) {
            out.add(PlanCode.PLAN_TRAVEL_AXIAL.at(minAx < machine.axialMinMm() - tol
                            ? "machine.travel.axialMin" : "machine.travel.axialMax",
                    "the cycle needs axial positions " + Decimal.fixed(minAx, 3) + " to " + Decimal.fixed(maxAx, 3)
                            + " mm from the front face, the machine reaches " + Decimal.fixed(machine.axialMinMm(), 3)
                            + " to " + Decimal.fixed(machine.axialMaxMm(), 3) + " mm",
                    "reduce cycle.axialClearance, use a smaller hob (shorter approach) or move the part's zero"));
        }
        return out;
    }
}
