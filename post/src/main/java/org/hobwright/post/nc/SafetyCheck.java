package org.hobwright.post.nc;

import org.hobwright.post.PostCode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.MachineProfile;

/**
 * Re-checks the safety invariants on the program model, independently of the planner, before a
 * program is written:
 * <ul>
 *   <li>the synchronisation is on before every cutting move;</li>
 *   <li>it is off before the spindles stop, and off at the end of the program;</li>
 *   <li>no cutting move goes below the final infeed (root) diameter;</li>
 *   <li>hob and work speeds, the ratio and the feed rate are within the machine profile (and the
 *       hob maker's speed limit).</li>
 * </ul>
 * Any broken invariant is an error finding and the program is not written.
 */
final class SafetyCheck {

    /** Slack for comparing diameters that went through arithmetic, mm. */
    private static final double EPS_MM = 1e-9;

    private SafetyCheck() {
    }

    /**
     * Checks a program model.
     *
     * @param program          the model
     * @param finalDiameterMm  final infeed (root) diameter, mm
     * @param job              the job (machine profile and hob limits)
     * @return error findings, empty when every invariant holds
     */
    static List<Finding> check(NcProgram program, double finalDiameterMm, HobJob job) {
        List<Finding> out = new ArrayList<>();
        MachineProfile m = job.machine();
        boolean synced = false;
        double workRpm = 0;
        int index = 0;
        for (NcOp op : program.ops()) {
            index++;
            if (op instanceof NcOp.Synchronise s) {
                synced = true;
                workRpm = s.sync().workRpm();
                speeds(s.sync(), job, index, out);
            } else if (op instanceof NcOp.Fixed f && f.key() == TemplateKey.SYNC_OFF) {
                synced = false;
            } else if (op instanceof NcOp.Fixed f && f.key() == TemplateKey.SPINDLES_STOP && synced) {
                out.add(error(PostCode.NC_SAFETY_STOP_WHILE_SYNCED, "cycle.steps", "operation " + index
                        + " stops the spindles while they are still synchronised",
                        "switch the synchronisation off before the spindles stop"));
            } else if (op instanceof NcOp.Fixed f && f.key() == TemplateKey.PROGRAM_END && synced) {
                out.add(error(PostCode.NC_SAFETY_SYNC_LEFT_ON, "cycle.steps",
                        "the program ends with the spindles still synchronised",
                        "switch the synchronisation off and stop the spindles before the end"));
            } else if (op instanceof NcOp.Move mv && !mv.rapid() && mv.cutting()) {
                if (!synced) {
                    out.add(error(PostCode.NC_SAFETY_CUT_WITHOUT_SYNC, "cycle.steps", "cutting move " + index
                            + " comes before the synchronisation is on",
                            "switch the synchronisation on before the first cutting move"));
                }
                if (mv.diameterMm() < finalDiameterMm - EPS_MM) {
                    out.add(error(PostCode.NC_SAFETY_BELOW_ROOT, "cycle.steps", String.format(Locale.ROOT,
                            "cutting move %d goes to diameter %.4f mm, below the final root diameter %.4f mm",
                            index, mv.diameterMm(), finalDiameterMm),
                            "plan the cycle again; no cut may go below the final infeed diameter"));
                }
                double rate = mv.feedMmPerRev() * workRpm;
                if (rate > m.maxFeedMmPerMin() + EPS_MM) {
                    out.add(error(PostCode.NC_SAFETY_FEED_RATE, "machine.maxFeed", String.format(Locale.ROOT,
                            "cutting move %d feeds at %.3f mm/min, above the machine's %.3f mm/min",
                            index, rate, m.maxFeedMmPerMin()), "lower the feed or the speed"));
                }
            }
        }
        return out;
    }

    private static void speeds(CycleStep.SyncOn s, HobJob job, int index, List<Finding> out) {
        MachineProfile m = job.machine();
        within(PostCode.NC_SAFETY_HOB_SPEED, "machine.hobSpindle", "hob", s.hobRpm(), m.hobMinRpm(), m.hobMaxRpm(),
                index, out);
        within(PostCode.NC_SAFETY_WORK_SPEED, "machine.workSpindle", "work", s.workRpm(), m.workMinRpm(),
                m.workMaxRpm(), index, out);
        job.hob().maxRpm().ifPresent(max -> {
            if (s.hobRpm() > max) {
                out.add(error(PostCode.NC_SAFETY_HOB_SPEED, "hob.maxRpm", String.format(Locale.ROOT,
                        "operation %d runs the hob at %.1f rpm, above the hob maker's limit %.1f rpm",
                        index, s.hobRpm(), max), "lower the cutting speed"));
            }
        });
        double ratio = (double) s.hobTurns() / s.workTurns();
        if (ratio > m.maxSyncRatio()) {
            out.add(error(PostCode.NC_SAFETY_SYNC_RATIO, "machine.maxSyncRatio", String.format(Locale.ROOT,
                    "operation %d asks for a ratio of %d:%d, above the machine's largest %.1f:1",
                    index, s.hobTurns(), s.workTurns(), m.maxSyncRatio()),
                    "use a multi-start hob or another machine"));
        }
    }

    private static void within(PostCode code, String field, String spindle, double rpm, double min, double max,
                               int index, List<Finding> out) {
        if (rpm < min || rpm > max) {
            out.add(error(code, field, String.format(Locale.ROOT,
                    "operation %d runs the %s spindle at %.3f rpm, outside the machine's %.1f to %.1f rpm",
                    index, spindle, rpm, min, max), "change the cutting speed or choose another machine"));
        }
    }

    private static Finding error(PostCode code, String field, String message, String fix) {
        return code.at(field, message + "; the program was not written", fix);
    }
}
