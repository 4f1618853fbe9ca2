package org.hobwright.wizard.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.SimulationData;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.testkit.SampleJobs;
import org.hobwright.wizard.plan.DefaultCyclePlanner;
import org.junit.jupiter.api.Test;

/** The planned cycle carries the simulation, and the planner's closed form agrees with it. */
class PlannedCycleTest {
    @Test
    void planCarriesTheSimulationAndAgreesWithIt() {
        for (HobJob job : new HobJob[] {SampleJobs.spurMetric(), SampleJobs.helicalMetric()}) {
            HobCycle cycle = new DefaultCyclePlanner().plan(job);
            SimulationData sim = cycle.simulation().orElseThrow();
            double plannerMm = cycle.summary().orElseThrow().envelopingDepthUm() / 1000;
            // two independent methods: the planner's closed form (FORMULAS.md §6.2 with the settled 1/cos β)
            // and the depth measured on the simulated flank
            assertEquals(plannerMm, sim.envelopingDepthMm(), 0.10 * plannerMm, job.name());
            assertEquals(plannerMm, sim.closedFormEnvelopingDepthMm(), 1e-12, job.name());
            assertTrue(cycle.findings().stream().noneMatch(f -> f.code().equals(SimulationCode.SIM_NOT_RUN.code())));
        }
    }
}
