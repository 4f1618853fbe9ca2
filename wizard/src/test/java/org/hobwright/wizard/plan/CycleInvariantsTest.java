package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.Rotation;
import org.junit.jupiter.api.Test;

/** Each safety invariant catches the defect it is there for. */
class CycleInvariantsTest {
    private static final CycleInvariants LIMITS = new CycleInvariants(50, 2000, 1, 3000, 100, 2000, 1.0, 35);

    private static CycleStep.SyncOn syncOn(double hobRpm) {
        return new CycleStep.SyncOn(20, 1, hobRpm, hobRpm / 20, Rotation.CLOCKWISE, Rotation.CLOCKWISE, 0, 0);
    }

    private static List<CycleStep> good() {
        return new ArrayList<>(List.of(new CycleStep.Comment("x"), syncOn(300), new CycleStep.Dwell(1.0),
                new CycleStep.Rapid(1, 48, -20, 1), new CycleStep.Feed(1, 35, -20, 1.5, false, 1),
                new CycleStep.Feed(1, 35, 25, 1.5, true, 100), new CycleStep.Rapid(1, 48, 25, 1),
                new CycleStep.SyncOff(0), new CycleStep.SpindlesStop(0)));
    }

    private static void broken(List<CycleStep> steps, String words) {
        List<String> v = LIMITS.violations(steps);
        assertTrue(v.stream().anyMatch(s -> s.contains(words)), v.toString());
    }

    @Test
    void aSafeCycleHasNoViolations() {
        assertEquals(List.of(), LIMITS.violations(good()));
    }

    @Test
    void moveBeforeSyncOn() {
        List<CycleStep> s = good();
        s.add(0, new CycleStep.Rapid(1, 48, -20, 1));
        broken(s, "before sync on");
    }

    @Test
    void moveAfterSyncOff() {
        List<CycleStep> s = good();
        s.add(8, new CycleStep.Feed(1, 40, 0, 1, true, 1));
        broken(s, "after sync off");
    }

    @Test
    void spindlesStopBeforeSyncOff() {
        List<CycleStep> s = good();
        s.remove(8);
        s.add(7, new CycleStep.SpindlesStop(0));
        broken(s, "before sync off");
    }

    @Test
    void belowTheRoot() {
        List<CycleStep> s = good();
        s.set(5, new CycleStep.Feed(1, 34.99, 25, 1.5, true, 100));
        broken(s, "below the root diameter");
    }

    @Test
    void speedAboveTheLimit() {
        List<CycleStep> s = good();
        s.set(1, syncOn(2500));
        broken(s, "hob speed 2500.0 rpm outside");
    }

    @Test
    void feedRateAboveTheMachine() {
        List<CycleStep> s = good();
        s.set(5, new CycleStep.Feed(1, 35, 25, 150, true, 100));
        broken(s, "mm/min, above the machine's");
    }

    @Test
    void noSettleDwell() {
        List<CycleStep> s = good();
        s.remove(2);
        broken(s, "of dwell between sync on and the first feed");
    }

    @Test
    void missingSync() {
        List<CycleStep> s = good();
        s.remove(1);
        broken(s, "must switch sync on");
    }
}
