package org.hobwright.wizard.check;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.ToleranceData;
import org.hobwright.api.job.GearSpec;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.tolerance.FlankTolerances;

/** ISO 1328-1:2013 tolerances for the job's class, or a finding when the gear is outside the standard's scope. */
public final class ToleranceCheck {
    private ToleranceCheck() {
    }

    /** The tolerances, when the gear names a class and lies within the scope. */
    public static Optional<ToleranceData> tolerances(GearSpec gear, InvoluteGear g, List<Finding> out) {
        if (gear.flankToleranceClass().isEmpty()) {
            return Optional.empty();
        }
        int a = gear.flankToleranceClass().getAsInt();
        double d = g.referenceDiameterMm();
        List<String> outside = FlankTolerances.outOfScope(g.teeth(), d, g.normalModuleMm(), gear.faceWidthMm(),
                gear.helixAngleDeg());
        if (!outside.isEmpty()) {
            out.add(EngineeringCode.TOLERANCE_OUT_OF_SCOPE.at("gear.toleranceClass", "flank tolerance class " + a
                    + " cannot be applied: outside the scope of ISO 1328-1:2013: " + String.join("; ", outside),
                    "agree the tolerances with the customer; ISO 1328-1 values are not extrapolated"));
            return Optional.empty();
        }
        return Optional.of(FlankTolerances.of(a, d, g.normalModuleMm(), gear.faceWidthMm()));
    }
}
