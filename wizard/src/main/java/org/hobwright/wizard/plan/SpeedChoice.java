package org.hobwright.wizard.plan;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.hobwright.api.check.Finding;

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
            findings.add(Finding.warning(PlanCodes.HOB_RPM_CAPPED, "cycle.cuttingSpeed", String.format(Locale.ROOT,
                    "%.1f m/min needs %.1f rpm on a %.3f mm hob; the %s allows %.1f rpm, so the cut runs at %.1f m/min",
                    vc.get(), wanted, hobOutsideMm, window.maxLimit(), rpm, Kinematics.cuttingSpeed(rpm, hobOutsideMm)),
                    "accept the lower speed, or use a smaller hob or a faster spindle", PlanCodes.MACHINE));
        } else if (wanted < window.minRpm()) {
            rpm = window.minRpm();
            limited = true;
            findings.add(Finding.warning(PlanCodes.HOB_RPM_RAISED, "cycle.cuttingSpeed", String.format(Locale.ROOT,
                    "%.1f m/min needs %.1f rpm; the %s is %.1f rpm, so the cut runs at %.1f m/min", vc.get(), wanted,
                    window.minLimit(), rpm, Kinematics.cuttingSpeed(rpm, hobOutsideMm)),
                    "check the higher cutting speed with the hob supplier", PlanCodes.MACHINE));
        }
        double used = Kinematics.cuttingSpeed(rpm, hobOutsideMm);
        if (row.isPresent() && !row.get().cuttingSpeed().contains(used)) {
            ValueRange r = row.get().cuttingSpeed();
            String msg = String.format(Locale.ROOT, "cutting speed %.1f m/min is outside the typical %.0f to %.0f m/min"
                    + " for %s with a %s hob", used, r.min(), r.max(), row.get().workMaterial(), row.get().hobMaterial());
            findings.add(limited ? Finding.info(PlanCodes.CUTTING_SPEED_OUTSIDE_TABLE, "cycle.cuttingSpeed", msg,
                    PlanCodes.TABLE) : Finding.warning(PlanCodes.CUTTING_SPEED_OUTSIDE_TABLE, "cycle.cuttingSpeed",
                    msg, "confirm the speed with the hob supplier", PlanCodes.TABLE));
        }
        return Optional.of(rpm);
    }
}
