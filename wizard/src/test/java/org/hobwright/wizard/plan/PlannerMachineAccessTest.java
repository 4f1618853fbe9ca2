package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.mockito.Mockito.atLeastOnce;
import static org.mockito.Mockito.mock;
import static org.mockito.Mockito.verify;
import static org.mockito.Mockito.when;

import java.util.OptionalDouble;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.MachineTimes;
import org.hobwright.api.testkit.SampleJobs;
import org.junit.jupiter.api.Test;

/** The planner learns the machine's limits only by asking the {@link MachineProfile} api. */
class PlannerMachineAccessTest {

    @Test
    void limitsAreReadThroughTheProfileAccessors() {
        MachineProfile real = SampleJobs.machine(true);
        MachineProfile m = mock(MachineProfile.class);
        when(m.name()).thenReturn("mocked");
        when(m.dialect()).thenReturn("mocked-dialect");
        when(m.workMinRpm()).thenReturn(1.0);
        when(m.workMaxRpm()).thenReturn(3000.0);
        when(m.hobMinRpm()).thenReturn(50.0);
        when(m.hobMaxRpm()).thenReturn(150.0); // below the 272.8 rpm the cutting speed asks for
        when(m.maxSyncRatio()).thenReturn(200.0);
        when(m.followsHelix()).thenReturn(true);
        when(m.swivel()).thenReturn(real.swivel());
        when(m.radialMinMm()).thenReturn(0.0);
        when(m.radialMaxMm()).thenReturn(300.0);
        when(m.axialMinMm()).thenReturn(-200.0);
        when(m.axialMaxMm()).thenReturn(300.0);
        when(m.hobShiftTravelMm()).thenReturn(OptionalDouble.empty());
        when(m.rapidMmPerMin()).thenReturn(5000.0);
        when(m.maxFeedMmPerMin()).thenReturn(2000.0);
        when(m.syncSettleS()).thenReturn(2.5);
        when(m.maxHobDiameterMm()).thenReturn(120.0);
        when(m.clockwiseTeethTowardChuck()).thenReturn(true);
        when(m.times()).thenReturn(new MachineTimes(OptionalDouble.of(7), OptionalDouble.of(5), OptionalDouble.of(3.5),
                OptionalDouble.of(1.25), OptionalDouble.empty()));
        HobJob job = TestJobs.with(SampleJobs.helicalMetric(), m);

        HobCycle c = new DefaultCyclePlanner().plan(job);

        assertFalse(c.hasErrors(), c.findings().toString());
        assertEquals(150.0, c.setup().orElseThrow().hobRpm(), 1e-12, "capped at the mocked limit");
        assertEquals(2.5, c.steps().stream().filter(s -> s instanceof CycleStep.Dwell).findFirst().orElseThrow()
                .seconds(), "the mocked settle time");
        verify(m, atLeastOnce()).hobMaxRpm();
        verify(m, atLeastOnce()).hobMinRpm();
        verify(m, atLeastOnce()).workMaxRpm();
        verify(m, atLeastOnce()).workMinRpm();
        verify(m, atLeastOnce()).maxSyncRatio();
        verify(m, atLeastOnce()).followsHelix();
        verify(m, atLeastOnce()).swivel();
        verify(m, atLeastOnce()).radialMaxMm();
        verify(m, atLeastOnce()).axialMinMm();
        verify(m, atLeastOnce()).axialMaxMm();
        verify(m, atLeastOnce()).hobShiftTravelMm();
        verify(m, atLeastOnce()).rapidMmPerMin();
        verify(m, atLeastOnce()).maxFeedMmPerMin();
        verify(m, atLeastOnce()).syncSettleS();
        verify(m, atLeastOnce()).maxHobDiameterMm();
        verify(m, atLeastOnce()).clockwiseTeethTowardChuck();
        verify(m, atLeastOnce()).times();
        assertEquals(3.5, c.steps().stream().filter(s -> s instanceof CycleStep.Swivel).findFirst().orElseThrow()
                .seconds(), "the mocked swivel time");
    }
}
