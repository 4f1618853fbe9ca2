package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.MachineTimes;
import org.junit.jupiter.api.Test;

/**
 * A time the machine profile does not give counts as 0 s in the cycle and batch times, and a
 * remark names it: load and unload always, the swivel only where the control positions it, the hob
 * shift only where the machine shifts.
 */
class MachineTimesRemarkTest {

    private static List<Finding> remarks(HobCycle c) {
        return c.findings().stream().filter(f -> f.code().equals(PlanCode.PLAN_MACHINE_TIME_UNKNOWN.name())).toList();
    }

    @Test
    void aProfileWithoutTimesGetsARemarkNamingTheMissingOnes() {
        HobJob job = TestJobs.meteringPumpOnVarrow();
        HobCycle c = new DefaultCyclePlanner().plan(job);
        assertFalse(c.hasErrors(), c.findings().toString());
        List<Finding> r = remarks(c);
        assertEquals(1, r.size(), c.findings().toString());
        assertEquals(Severity.INFO, r.get(0).severity());
        String message = r.get(0).message();
        assertTrue(message.contains("times.load") && message.contains("times.unload"), message);
        assertFalse(message.contains("times.swivel"), "a manual swivel holder takes no programmed time: " + message);
        assertFalse(message.contains("times.hobShift"), "no shift axis: " + message);
    }

    @Test
    void aProfileWithItsTimesGetsNone() {
        HobJob plain = TestJobs.meteringPumpOnVarrow();
        HobJob job = TestJobs.with(plain, plain.machine().withTimes(new MachineTimes(OptionalDouble.of(9),
                OptionalDouble.of(6), OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty())));
        HobCycle c = new DefaultCyclePlanner().plan(job);
        assertEquals(List.of(), remarks(c));
    }
}
