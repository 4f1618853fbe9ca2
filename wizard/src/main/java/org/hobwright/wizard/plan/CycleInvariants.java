package org.hobwright.wizard.plan;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.cycle.CycleStep;

/**
 * The safety invariants every planned cycle must keep before it leaves the planner (post/README.md,
 * NC output). The post checks its program again, independently.
 * <ol>
 * <li>Exactly one sync on; it comes before the first move; a settle dwell of at least the machine's
 *     settle time follows it before the first feed.</li>
 * <li>Exactly one sync off, after the last move; the spindles stop after it, as the last step.</li>
 * <li>No move reaches below the final root diameter.</li>
 * <li>Every speed lies within the limits: hob and work speeds, the sync ratio, the feed rate.</li>
 * </ol>
 * Violations are planner defects, returned as sentences; the planner turns them into an error
 * finding and drops the steps.
 *
 * @param hobMinRpm        lowest hob speed, rpm
 * @param hobMaxRpm        highest hob speed (machine and hob), rpm
 * @param workMinRpm       lowest work speed, rpm
 * @param workMaxRpm       highest work speed, rpm
 * @param maxSyncRatio     largest hob turns per work turn
 * @param maxFeedMmPerMin  highest feed rate, mm/min
 * @param syncSettleS      settle time, s
 * @param rootDiameterMm   final root diameter, mm
 */
public record CycleInvariants(double hobMinRpm, double hobMaxRpm, double workMinRpm, double workMaxRpm,
                              double maxSyncRatio, double maxFeedMmPerMin, double syncSettleS,
                              double rootDiameterMm) {

    private static final double REL = 1e-9;

    /**
     * Checks the steps.
     *
     * @return every violation found, empty when the cycle is safe
     */
    public List<String> violations(List<CycleStep> steps) {
        List<String> out = new ArrayList<>();
        int syncOn = -1;
        int syncOff = -1;
        int stop = -1;
        int firstMove = -1;
        int lastMove = -1;
        int firstFeed = -1;
        double workRpm = Double.NaN;
        double settle = 0;
        for (int i = 0; i < steps.size(); i++) {
            CycleStep s = steps.get(i);
            if (s instanceof CycleStep.SyncOn on) {
                if (syncOn >= 0) {
                    out.add("sync on appears twice (steps " + syncOn + " and " + i + ")");
                }
                syncOn = i;
                workRpm = on.workRpm();
                speeds(on, out);
            } else if (s instanceof CycleStep.SyncOff) {
                if (syncOff >= 0) {
                    out.add("sync off appears twice (steps " + syncOff + " and " + i + ")");
                }
                syncOff = i;
            } else if (s instanceof CycleStep.SpindlesStop) {
                stop = i;
            } else if (s instanceof CycleStep.Dwell d && syncOn >= 0 && firstFeed < 0) {
                settle += d.seconds();
            } else if (s instanceof CycleStep.Rapid r) {
                firstMove = firstMove < 0 ? i : firstMove;
                lastMove = i;
                depth(i, r.diameterMm(), out);
            } else if (s instanceof CycleStep.Feed f) {
                firstMove = firstMove < 0 ? i : firstMove;
                firstFeed = firstFeed < 0 ? i : firstFeed;
                lastMove = i;
                depth(i, f.diameterMm(), out);
                if (!Double.isNaN(workRpm) && f.feedMmPerRev() * workRpm > maxFeedMmPerMin * (1 + REL)) {
                    out.add("step " + i + " feeds at " + f.feedMmPerRev() * workRpm + " mm/min, above the machine's "
                            + maxFeedMmPerMin + " mm/min");
                }
            }
        }
        order(syncOn, syncOff, stop, firstMove, lastMove, steps.size(), out);
        if (syncOn >= 0 && firstFeed >= 0 && settle < syncSettleS * (1 - REL)) {
            out.add("only " + settle + " s of dwell between sync on and the first feed, the machine needs "
                    + syncSettleS + " s");
        }
        return out;
    }

    private void order(int syncOn, int syncOff, int stop, int firstMove, int lastMove, int size, List<String> out) {
        if (syncOn < 0 || syncOff < 0 || stop < 0) {
            out.add("the cycle must switch sync on, sync off and stop the spindles (found steps " + syncOn + ", "
                    + syncOff + ", " + stop + ")");
            return;
        }
        if (firstMove >= 0 && firstMove < syncOn) {
            out.add("step " + firstMove + " moves before sync on at step " + syncOn);
        }
        if (lastMove > syncOff) {
            out.add("step " + lastMove + " moves after sync off at step " + syncOff);
        }
        if (syncOff > stop) {
            out.add("the spindles stop (step " + stop + ") before sync off (step " + syncOff + ")");
        }
        if (stop != size - 1) {
            out.add("the spindle stop is step " + stop + ", not the last step");
        }
    }

    private void depth(int i, double diameterMm, List<String> out) {
        if (diameterMm < rootDiameterMm - REL * Math.max(1, rootDiameterMm)) {
            out.add("step " + i + " reaches diameter " + diameterMm + " mm, below the root diameter " + rootDiameterMm
                    + " mm");
        }
    }

    private void speeds(CycleStep.SyncOn on, List<String> out) {
        within("hob speed", on.hobRpm(), hobMinRpm, hobMaxRpm, out);
        within("work speed", on.workRpm(), workMinRpm, workMaxRpm, out);
        double ratio = (double) on.hobTurns() / on.workTurns();
        if (ratio > maxSyncRatio * (1 + REL)) {
            out.add("sync ratio " + on.hobTurns() + ":" + on.workTurns() + " above the machine's " + maxSyncRatio);
        }
        if (Math.abs(on.hobRpm() / ratio - on.workRpm()) > REL * on.workRpm()) {
            out.add("work speed " + on.workRpm() + " rpm does not follow the ratio from hob speed " + on.hobRpm());
        }
    }

    private static void within(String what, double v, double min, double max, List<String> out) {
        if (!(v >= min * (1 - REL) && v <= max * (1 + REL))) {
            out.add(what + " " + v + " rpm outside " + min + " to " + max + " rpm");
        }
    }
}
