package org.hobwright.wizard.analysis;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.GearPairData;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.api.cycle.ToleranceData;
import org.hobwright.wizard.setup.HobSetup;

/**
 * Everything the engineering core says about a job before any cycle is planned: gear geometry,
 * inspection values, tolerances, hob setup and the findings of every check.
 *
 * @param gear        gear geometry, when it could be computed
 * @param inspection  inspection values, when they could be computed
 * @param tolerances  ISO 1328-1 flank tolerances, when a class is known and the gear is in scope
 * @param hobSetup    hob lead and swivel, when they could be computed
 * @param findings    every finding of the checks
 * @param pair        the gear with its mate, when the job gives one and the pair could be computed
 */
public record JobAnalysis(Optional<GearData> gear, Optional<InspectionData> inspection,
                          Optional<ToleranceData> tolerances, Optional<HobSetup> hobSetup,
                          List<Finding> findings, Optional<GearPairData> pair) {
    public JobAnalysis {
        findings = List.copyOf(findings);
    }

    /** True when a check found an error. */
    public boolean hasErrors() {
        return Finding.anyError(findings);
    }
}
