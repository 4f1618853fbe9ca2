package org.hobwright.wizard.plan;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.store.CuttingData;
import org.hobwright.wizard.store.ValueRange;

/**
 * Picks the hob speed of the user's plan: from the job's cutting speed, or the middle of the
 * cutting-data range, then held inside the speed window with a finding when a limit moves it.
 */
public final class SpeedChoice {
    private SpeedChoice() {
    }

    /**
     * The hob speed, rpm.
     *
     * @param requestedMPerMin the job's cutting speed, if given
     * @param row              the cutting-data row, if known
     * @param hobOutsideMm     d_a0, mm
     * @param window           the speed window (must be open)
     * @param findings         receives the findings
     * @return the hob speed, or empty when neither the job nor the table gives a cutting speed
     */
    public static Optional<Double> hobRpm(Optional<Double> requestedMPerMin, Optional<CuttingData> row,
                                          double hobOutsideMm, SpeedWindow window, List<Finding> findings) {
        Optional<Double> vc = requestedMPerMin.or(() -> row.map(r -> r.cuttingSpeed().mid()));
        if (vc.isEmpty()) {
            return Optional.empty();
        }
        double wanted = Kinematics.hobRpm(vc.get(), hobOutsideMm);
        double rpm = wanted;
        boolean limited = false;
        if (wanted > window.maxRpm()) {
            rpm = window.maxRpm();
            limited = true;
            findings.add(PlanCode.PLAN_HOB_RPM_CAPPED.at("cycle.cuttingSpeed", Decimal.fixed(vc.get(), 1)
                    + " m/min needs " + Decimal.fixed(wanted, 1) + " rpm on a " + Decimal.fixed(hobOutsideMm, 3)
                    + " mm hob; the " + window.maxLimit() + " allows " + Decimal.fixed(rpm, 1)
                    + " rpm, so the cut runs at " + Decimal.fixed(Kinematics.cuttingSpeed(rpm, hobOutsideMm), 1) + " m/min",
                    "accept the lower speed, or use a smaller hob or a faster spindle"));
        } else if (wanted < window.minRpm()) {
            rpm = window.minRpm();
            limited = true;
            findings.add(PlanCode.PLAN_HOB_RPM_RAISED.at("cycle.cuttingSpeed", Decimal.fixed(vc.get(), 1)
                    + " m/min needs " + Decimal.fixed(wanted, 1) + " rpm; the " + window.minLimit() + " is "
                    + Decimal.fixed(rpm, 1) + " rpm, so the cut runs at "
                    + Decimal.fixed(Kinematics.cuttingSpeed(rpm, hobOutsideMm), 1) + " m/min",
                    "check the higher cutting speed with the hob supplier"));
        }
        double used = Kinematics.cuttingSpeed(rpm, hobOutsideMm);
        if (row.isPresent() && !row.get().cuttingSpeed().contains(used)) {
            ValueRange r = row.get().cuttingSpeed();
            String msg = "cutting speed " + Decimal.fixed(used, 1) + " m/min is outside the typical " + Decimal.fixed(r.min(), 0)
                    + " to " + Decimal.fixed(r.max(), 0) + " m/min for " + row.get().workMaterial() + " with a "
                    + row.get().hobMaterial() + " hob";
            findings.add(limited ? PlanCode.PLAN_CUTTING_SPEED_OUTSIDE_TABLE.at(Severity.INFO, "cycle.cuttingSpeed", msg, null,
                    PlanSources.TABLE) : PlanCode.PLAN_CUTTING_SPEED_OUTSIDE_TABLE.at("cycle.cuttingSpeed",
                    msg, "confirm the speed with the hob supplier"));
        }
        return Optional.of(rpm);
    }
}
