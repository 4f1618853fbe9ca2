package org.hobwright.post.nc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.junit.jupiter.api.Test;

/**
 * The writer re-checks the safety invariants listed in post/README.md on its program model
 * and writes nothing when one is broken, whatever the planner said. Each test breaks one invariant
 * in an otherwise clean cycle.
 */
class SafetyRefusalTest {

    private static final Fixture SPUR = Fixtures.spurMetric();

    @Test
    void cleanCycleIsWritten() {
        assertTrue(new NcWriter().write(SPUR.cycle(), SPUR.context("ottmere-ctl")).findings().isEmpty());
    }

    @Test
    void cutBeforeSynchronisationIsRefused() {
        refused("NC_SAFETY_CUT_WITHOUT_SYNC", steps -> {
            CycleStep sync = steps.stream().filter(CycleStep.SyncOn.class::isInstance).findFirst().orElseThrow();
            steps.remove(sync);
            steps.add(indexOf(steps, CycleStep.Feed.class) + 1, sync);
            return steps;
        });
    }

    @Test
    void spindlesStoppingWhileSynchronisedIsRefused() {
        refused("NC_SAFETY_STOP_WHILE_SYNCED", steps -> {
            CycleStep off = steps.remove(indexOf(steps, CycleStep.SyncOff.class));
            steps.add(indexOf(steps, CycleStep.SpindlesStop.class) + 1, off);
            return steps;
        });
    }

    @Test
    void leavingTheSynchronisationOnIsRefused() {
        refused("NC_SAFETY_SYNC_LEFT_ON", steps -> {
            steps.remove(indexOf(steps, CycleStep.SyncOff.class));
            steps.remove(indexOf(steps, CycleStep.SpindlesStop.class));
            return steps;
        });
    }

    @Test
    void cutBelowTheFinalRootDiameterIsRefused() {
        // final infeed diameter 35 mm (FORMULAS.md §1.5 spur d_f); 34.99 mm is below it
        refused("NC_SAFETY_BELOW_ROOT", steps -> {
            int i = indexOf(steps, CycleStep.Feed.class);
            CycleStep.Feed f = (CycleStep.Feed) steps.get(i);
            steps.set(i, new CycleStep.Feed(f.pass(), 34.99, f.axialMm(), f.feedMmPerRev(), true, f.seconds()));
            return steps;
        });
    }

    @Test
    void hobSpeedAboveTheMachineIsRefused() {
        // the Ottmere hob spindle runs to 4000 rpm (samples/scenario/machines/ottmere-4008.json)
        refused("NC_SAFETY_HOB_SPEED", steps -> replaceSync(steps, 4100, 205));
    }

    @Test
    void hobSpeedAboveTheHobMakersLimitIsRefused() {
        // the fixture's hob allows 2000 rpm; the machine would allow 4000
        HobCycle c = SPUR.cycle();
        HobCycle broken = new HobCycle(c.gear(), c.inspection(), c.tolerances(), c.setup(),
                replaceSync(new ArrayList<>(c.steps()), 2500, 125), c.summary(), c.simulation(), c.findings());
        WriteResult r = new NcWriter().write(broken, SPUR.context("ottmere-ctl"));
        assertEquals(List.of("hob.maxRpm"), r.findings().stream().map(Finding::field).toList());
    }

    @Test
    void workSpeedBelowTheMachineIsRefused() {
        // the Ottmere work spindle turns from 2 rpm
        refused("NC_SAFETY_WORK_SPEED", steps -> replaceSync(steps, 60, 1.5));
    }

    private static List<CycleStep> replaceSync(List<CycleStep> steps, double hobRpm, double workRpm) {
        int i = indexOf(steps, CycleStep.SyncOn.class);
        CycleStep.SyncOn s = (CycleStep.SyncOn) steps.get(i);
        steps.set(i, new CycleStep.SyncOn(s.hobTurns(), s.workTurns(), hobRpm, workRpm, s.hobRotation(),
                s.workRotation(), 0, s.seconds()));
        return steps;
    }

    private static int indexOf(List<CycleStep> steps, Class<? extends CycleStep> type) {
        for (int i = 0; i < steps.size(); i++) {
            if (type.isInstance(steps.get(i))) {
                return i;
            }
        }
        throw new AssertionError("no " + type.getSimpleName());
    }

    private static void refused(String code, UnaryOperator<List<CycleStep>> change) {
        HobCycle c = SPUR.cycle();
        HobCycle broken = new HobCycle(c.gear(), c.inspection(), c.tolerances(), c.setup(),
                change.apply(new ArrayList<>(c.steps())), c.summary(), c.simulation(), c.findings());
        for (String dialect : SPUR.dialects()) {
            WriteResult r = new NcWriter().write(broken, SPUR.context(dialect));
            assertTrue(r.files().isEmpty(), "nothing is written");
            assertTrue(Finding.anyError(r.findings()));
            List<String> codes = r.findings().stream().map(Finding::code).toList();
            assertTrue(codes.contains(code) && codes.stream().allMatch(x -> x.startsWith("NC_SAFETY_")),
                    () -> r.findings().toString());
        }
    }

    @Test
    void aProgramBeyondTheSizeBoundIsRefused() {
        // 20,000 comments more than any hobbing cycle has; whatever planner made it, the writer stops
        HobCycle c = SPUR.cycle();
        List<CycleStep> steps = new ArrayList<>(c.steps());
        for (int i = 0; i < NcWriter.MAX_OPERATIONS; i++) {
            steps.add(0, new CycleStep.Comment("remark " + i));
        }
        HobCycle big = new HobCycle(c.gear(), c.inspection(), c.tolerances(), c.setup(), steps, c.summary(),
                c.simulation(), c.findings());
        WriteResult r = new NcWriter().write(big, SPUR.context("ottmere-ctl"));
        assertTrue(r.files().isEmpty());
        assertEquals(List.of("NC_PROGRAM_TOO_LONG"), r.findings().stream().map(Finding::code).toList());
    }
}
