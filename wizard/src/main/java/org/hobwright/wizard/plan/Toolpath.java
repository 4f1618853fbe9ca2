package org.hobwright.wizard.plan;

import java.util.List;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.PassSummary;

/**
 * The ordered steps of a cycle and the summary of each pass.
 *
 * @param steps      every step, in order
 * @param passes     one summary per axial pass
 * @param cycleTimeS the sum of the steps' seconds, s
 */
public record Toolpath(List<CycleStep> steps, List<PassSummary> passes, double cycleTimeS) {
    public Toolpath {
        steps = List.copyOf(steps);
        passes = List.copyOf(passes);
    }
}
