package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.List;
import java.util.Set;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.FastestProposal;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.wizard.store.CuttingData;
import org.hobwright.wizard.store.CuttingDataTable;
import org.junit.jupiter.api.Test;

/**
 * Properties over 10,000 random valid jobs and invented machines (fixed seed): the safety
 * invariants checked here independently of {@link CycleInvariants}, the cycle time, the optimiser's
 * bound, and that every number is finite. Each failure names the case so it can be replayed.
 */
class PlannerPropertiesTest {
    private static final long SEED = 0x4B0B_1A7EL;
    private static final int CASES = 10_000;
    private static final double REL = 1e-9;
    /** Findings that mean the user's plan breaks a limit the optimiser keeps. */
    private static final Set<String> OUTSIDE_LIMITS = Set.of(PlanCode.PLAN_CUTTING_SPEED_OUTSIDE_TABLE.code(),
            PlanCode.PLAN_FEED_OUTSIDE_TABLE.code(), PlanCode.PLAN_FEED_MARK_OVER_TARGET.code(), PlanCode.PLAN_CHIP_OVER_LIMIT.code());

    private final DefaultCyclePlanner planner = new DefaultCyclePlanner();

    @Test
    void randomJobsKeepEveryProperty() {
        RandomJobs jobs = new RandomJobs(SEED);
        int planned = 0;
        int proposals = 0;
        int boundChecks = 0;
        for (int i = 0; i < CASES; i++) {
            HobJob job = jobs.next(i);
            String id = "case " + i + " (seed " + SEED + "): " + job;
            HobCycle c;
            try {
                c = planner.plan(job);
            } catch (RuntimeException e) {
                throw new AssertionError(id, e);
            }
            assertTrue(c.findings().stream().noneMatch(f -> f.code().equals(PlanCode.PLAN_INVARIANT_BROKEN.code())), () -> id + c.findings());
            assertEquals(c.hasErrors(), c.steps().isEmpty(), id);
            c.summary().ifPresent(s -> finite(s, id));
            if (c.hasErrors()) {
                continue;
            }
            planned++;
            safe(c, job, id);
            CycleSummary s = c.summary().orElseThrow();
            assertEquals(c.stepSeconds(), s.cycleTimeS(), REL * s.cycleTimeS(), "cycle time = sum of steps, " + id);
            if (s.fastest().isPresent()) {
                proposals++;
                FastestProposal p = s.fastest().get();
                assertTrue(p.cycleTimeS() >= p.lowerBoundS() * (1 - REL), "never below the bound, " + id);
                // the bound is reachable whenever a proposal exists (FastestCycle javadoc): equal
                assertEquals(p.lowerBoundS(), p.cycleTimeS(), REL * p.lowerBoundS(), "equal to the bound, " + id);
                withinLimits(p, job, c, id);
                if (c.findings().stream().noneMatch(f -> OUTSIDE_LIMITS.contains(f.code()))
                        && s.passes().size() <= FastestCycle.MAX_PASSES) {
                    boundChecks++;
                    assertTrue(s.cycleTimeS() >= p.lowerBoundS() * (1 - REL),
                            "a plan within the limits is never faster than the bound, " + id);
                }
            }
        }
        assertTrue(planned > CASES * 3 / 10, "enough jobs planned to mean something: " + planned);
        assertTrue(proposals > CASES / 5, "enough proposals: " + proposals);
        assertTrue(boundChecks > CASES / 25, "enough plans within limits: " + boundChecks);
    }

    private static void finite(CycleSummary s, String id) {
        double[] v = {s.cycleTimeS(), s.finishFeedMmPerRev(), s.approachLengthMm(), s.overrunLengthMm(),
                s.feedMarkFlankUm(), s.feedMarkRootUm(), s.envelopingDepthUm(), s.maxChipThicknessMm()};
        for (double d : v) {
            assertTrue(Double.isFinite(d), id);
        }
        s.fastest().ifPresent(p -> assertTrue(Double.isFinite(p.cycleTimeS() + p.lowerBoundS() + p.hobRpm()
                + p.roughFeedMmPerRev() + p.finishFeedMmPerRev() + p.cuttingSpeedMPerMin()), id));
    }

    /** Sync order, speeds, depth and travels, checked without the planner's own invariant class. */
    private static void safe(HobCycle c, HobJob job, String id) {
        List<CycleStep> steps = c.steps();
        MachineProfile m = job.machine();
        double root = c.gear().orElseThrow().rootDiameterMm();
        int on = -1;
        int off = -1;
        int stop = -1;
        int firstFeed = Integer.MAX_VALUE;
        int lastMove = -1;
        double workRpm = 0;
        for (int i = 0; i < steps.size(); i++) {
            CycleStep s = steps.get(i);
            if (s instanceof CycleStep.SyncOn so) {
                assertEquals(-1, on, "one sync on, " + id);
                on = i;
                workRpm = so.workRpm();
                double hobMax = Math.min(m.hobMaxRpm(), job.hob().maxRpm().orElse(Double.MAX_VALUE));
                assertTrue(so.hobRpm() <= hobMax * (1 + REL) && so.hobRpm() >= m.hobMinRpm() * (1 - REL), id);
                assertTrue(so.workRpm() <= m.workMaxRpm() * (1 + REL) && so.workRpm() >= m.workMinRpm() * (1 - REL), id);
                assertTrue((double) so.hobTurns() / so.workTurns() <= m.maxSyncRatio(), id);
                assertEquals(job.gear().teeth() * so.workTurns(), job.hob().starts() * so.hobTurns(), "ratio, " + id);
            } else if (s instanceof CycleStep.SyncOff) {
                off = i;
            } else if (s instanceof CycleStep.SpindlesStop) {
                stop = i;
            } else if (s instanceof CycleStep.Feed f) {
                firstFeed = Math.min(firstFeed, i);
                lastMove = i;
                position(f.diameterMm(), f.axialMm(), root, m, id);
                assertTrue(f.feedMmPerRev() * workRpm <= m.maxFeedMmPerMin() * (1 + REL), "feed rate, " + id);
            } else if (s instanceof CycleStep.Rapid r) {
                lastMove = i;
                position(r.diameterMm(), r.axialMm(), root, m, id);
            }
        }
        assertTrue(on >= 0 && on < firstFeed, "sync on before the first feed, " + id);
        assertTrue(off > lastMove, "sync off after the last move, " + id);
        assertTrue(stop > off && stop == steps.size() - 1, "spindles stop last, after sync off, " + id);
    }

    private static void position(double dia, double axial, double root, MachineProfile m, String id) {
        assertTrue(dia >= root - REL * Math.max(1, root), "no move below the root diameter, " + id);
        assertTrue(dia <= m.radialMaxMm() + 1e-9 && dia >= m.radialMinMm() - 1e-9, "radial travel, " + id);
        assertTrue(axial <= m.axialMaxMm() + 1e-9 && axial >= m.axialMinMm() - 1e-9, "axial travel, " + id);
    }

    /** The proposal keeps the limits: speeds, table range, feed rate, feed-mark target. */
    private static void withinLimits(FastestProposal p, HobJob job, HobCycle c, String id) {
        MachineProfile m = job.machine();
        int z = job.gear().teeth();
        int z0 = job.hob().starts();
        double hobMax = Math.min(Math.min(m.hobMaxRpm(), job.hob().maxRpm().orElse(Double.MAX_VALUE)),
                m.workMaxRpm() * z / z0);
        assertTrue(p.hobRpm() <= hobMax * (1 + REL), "proposal hob speed, " + id);
        assertTrue(p.hobRpm() >= Math.max(m.hobMinRpm(), m.workMinRpm() * z / z0) * (1 - REL), id);
        CuttingData row = CuttingDataTable.builtIn().find(job.cycle().workMaterial(), job.hob().material(),
                job.gear().moduleMm()).orElseThrow(() -> new AssertionError("proposal without table row, " + id));
        assertTrue(p.cuttingSpeedMPerMin() <= row.cuttingSpeed().max() * (1 + REL), id);
        assertTrue(p.finishFeedMmPerRev() <= row.finishFeed().max() * (1 + REL), id);
        assertTrue(p.passes() == 1 || p.roughFeedMmPerRev() <= row.roughFeed().max() * (1 + REL), id);
        double workRpm = p.hobRpm() * z0 / z;
        assertTrue(Math.max(p.roughFeedMmPerRev(), p.finishFeedMmPerRev()) * workRpm <= m.maxFeedMmPerMin() * (1 + REL),
                id);
        double target = job.cycle().targets().feedMarkDepthUm().orElse(
                CuttingDataTable.builtIn().qualityDefaults().feedMarkDepthUm());
        if (c.tolerances().isEmpty()) {
            assertTrue(FinishFormulas.feedMarkFlankUm(p.finishFeedMmPerRev(), job.hob().outsideDiameterMm(),
                    job.gear().pressureAngleDeg(), job.gear().helixAngleDeg()) <= target * (1 + REL), id);
        }
        assertFalse(p.bindingLimit().isBlank());
        if (p.passes() > FastestCycle.MAX_PASSES) {
            fail("too many passes, " + id);
        }
        Finding info = c.findings().stream().filter(f -> f.code().equals(PlanCode.PLAN_FASTEST.code())).findFirst().orElseThrow();
        assertTrue(info.message().contains("lower bound"), id);
    }
}
