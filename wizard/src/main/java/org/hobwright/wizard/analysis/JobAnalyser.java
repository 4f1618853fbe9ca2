package org.hobwright.wizard.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.job.HobJob;
import org.hobwright.wizard.geometry.GearGeometry;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.setup.HobSetup;

/**
 * Runs the engineering core on a job: geometry, inspection, tolerances, hob setup and checks.
 * Never throws for a problem with the job; every problem is a finding.
 */
public final class JobAnalyser {
    private JobAnalyser() {
    }

    /** Analyses a job. */
    public static JobAnalysis analyse(HobJob job) {
        List<Finding> findings = new ArrayList<>();
        Optional<ToothSystem> system = ToothSystem.of(job.gear());
        if (system.isEmpty()) {
            findings.add(Finding.error("GEAR_TOOTH_SYSTEM_UNKNOWN", "gear.toothSystem",
                    "tooth system \"" + job.gear().toothSystem() + "\" is not known",
                    "use one of " + String.join(", ", ToothSystem.ids()), "Hobwright tooth-system table"));
            return new JobAnalysis(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(), findings);
        }
        GearData gear = GearGeometry.of(job.gear(), system.get());
        HobSetup setup = HobSetup.of(job.gear(), job.hob(), system.get());
        return new JobAnalysis(Optional.of(gear), Optional.empty(), Optional.empty(), Optional.of(setup), findings);
    }
}
