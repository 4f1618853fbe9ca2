package org.hobwright.api.cycle;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.Validate;
import org.hobwright.api.check.Finding;

/**
 * The planner's answer for one job. Parts that could not be computed because of errors are
 * empty; the findings say why. A cycle with an error finding has no steps and must not be posted.
 *
 * @param gear        computed gear geometry
 * @param inspection  inspection values
 * @param tolerances  ISO 1328-1 flank tolerances, when a class is known
 * @param setup       setup values
 * @param steps       the ordered steps (empty when the job has errors)
 * @param summary     time and predicted quality
 * @param simulation  generating simulation, when run
 * @param findings    every finding, errors first
 * @param spline      for a spline job, the spline's limits, pins and form check
 */
public record HobCycle(
        Optional<GearData> gear,
        Optional<InspectionData> inspection,
        Optional<ToleranceData> tolerances,
        Optional<SetupValues> setup,
        List<CycleStep> steps,
        Optional<CycleSummary> summary,
        Optional<SimulationData> simulation,
        List<Finding> findings,
        Optional<SplineData> spline) {

    public HobCycle {
        Validate.present("gear", gear);
        Validate.present("inspection", inspection);
        Validate.present("tolerances", tolerances);
        Validate.present("setup", setup);
        steps = List.copyOf(Validate.present("steps", steps));
        Validate.present("summary", summary);
        Validate.present("simulation", simulation);
        findings = List.copyOf(Validate.present("findings", findings));
        Validate.present("spline", spline);
        if (Finding.anyError(findings) && !steps.isEmpty()) {
            throw new IllegalArgumentException("a cycle with error findings must have no steps, had "
                    + steps.size());
        }
    }

    /** The cycle of a gear job. */
    public HobCycle(Optional<GearData> gear, Optional<InspectionData> inspection, Optional<ToleranceData> tolerances,
                    Optional<SetupValues> setup, List<CycleStep> steps, Optional<CycleSummary> summary,
                    Optional<SimulationData> simulation, List<Finding> findings) {
        this(gear, inspection, tolerances, setup, steps, summary, simulation, findings, Optional.empty());
    }

    /** True when any finding is an error: nothing may be posted. */
    public boolean hasErrors() {
        return Finding.anyError(findings);
    }

    /** Sum of the steps' seconds, s. */
    public double stepSeconds() {
        return steps.stream().mapToDouble(CycleStep::seconds).sum();
    }
}
