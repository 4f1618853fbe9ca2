package org.hobwright.api.contract;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.CyclePlanner;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.testkit.SampleJobs;
import org.junit.jupiter.api.Test;

/** What every {@link CyclePlanner} must do. Extend it in a provider's tests. */
public abstract class CyclePlannerContract {

    /** The planner under test. */
    protected abstract CyclePlanner planner();

    @Test
    void declaresStableIdAndVersion() {
        assertFalse(planner().id().isBlank());
        assertEquals(planner().id(), planner().id());
        assertEquals(Spi.API_VERSION, planner().apiVersion(), "built against this api");
        assertFalse(planner().buildVersion().isBlank());
    }

    @Test
    void plansEverySampleJobWithoutThrowing() {
        for (HobJob job : List.of(SampleJobs.spurMetric(), SampleJobs.helicalMetric(),
                SampleJobs.helicalOnSpurMachine())) {
            HobCycle cycle = planner().plan(job);
            assertNotNull(cycle, job.name());
            if (cycle.hasErrors()) {
                assertTrue(cycle.steps().isEmpty(), job.name() + ": a cycle with errors has no steps");
            } else {
                assertFalse(cycle.steps().isEmpty(), job.name() + ": a clean cycle has steps");
            }
        }
    }

    /** A null job is a broken contract: a NullPointerException that names the job, not a bare one. */
    @Test
    void planNullNamesTheJob() {
        NullPointerException e = assertThrows(NullPointerException.class, () -> planner().plan(null));
        assertNotNull(e.getMessage(), "a message, not a bare NullPointerException");
        assertTrue(e.getMessage().contains("job"), e.getMessage());
    }

    /** The cycle says which job it was planned for, so a writer can refuse it for another one. */
    @Test
    void cycleNamesItsJob() {
        HobJob job = SampleJobs.spurMetric();
        assertEquals(java.util.Optional.of(job), planner().plan(job).plannedFor());
    }

    @Test
    void planningTwiceGivesEqualCycles() {
        assertEquals(planner().plan(SampleJobs.helicalMetric()), planner().plan(SampleJobs.helicalMetric()));
    }

    @Test
    void helixOnMachineThatCannotFollowOneIsAnError() {
        assertTrue(planner().plan(SampleJobs.helicalOnSpurMachine()).hasErrors());
    }
}
