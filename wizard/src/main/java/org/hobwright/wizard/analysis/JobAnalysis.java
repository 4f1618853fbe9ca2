package org.hobwright.wizard.analysis;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.GearPairData;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.api.cycle.SimulationData;
import org.hobwright.api.cycle.SplineData;
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
 * @param spline      for a spline job: its limits, pins and form check
 * @param simulation  for a spline job whose hob fits: the generating simulation of the form check
 */
public record JobAnalysis(Optional<GearData> gear, Optional<InspectionData> inspection,
                          Optional<ToleranceData> tolerances, Optional<HobSetup> hobSetup,
                          List<Finding> findings, Optional<GearPairData> pair, Optional<SplineData> spline,
                          Optional<SimulationData> simulation) {
    public JobAnalysis {
        findings = List.copyOf(findings);
    }

    /** The analysis of a gear job. */
    public JobAnalysis(Optional<GearData> gear, Optional<InspectionData> inspection,
                       Optional<ToleranceData> tolerances, Optional<HobSetup> hobSetup, List<Finding> findings) {
        this(gear, inspection, tolerances, hobSetup, findings, Optional.empty(), Optional.empty(), Optional.empty());
    }

    /** True when a check found an error. */
    public boolean hasErrors() {
        return Finding.anyError(findings);
    }
}
