package org.hobwright.post;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.MachineTimes;

/**
 * The batch at the machine: how many parts, the time each takes from one blank in to the next,
 * and the whole batch. Printed on the setup sheet and in the report.
 *
 * <pre>
 * time per part = load + cycle + unload      the cycle's steps already hold the swivel and hob-shift moves
 * batch time    = parts × time per part
 * </pre>
 *
 * A load or unload time the machine profile does not give counts as 0 s; {@link #unknownTimes()}
 * names it, and the planner says so in a finding.
 *
 * @param parts   parts in the batch ({@code cycle.batchSize})
 * @param cycleS  the cycle time of one part, s: the sum of the cycle's steps
 * @param loadS   putting a blank in and clamping it, s, when the machine profile gives it
 * @param unloadS taking the finished part out, s, when the machine profile gives it
 */
public record Batch(int parts, double cycleS, OptionalDouble loadS, OptionalDouble unloadS) {

    /** The batch of a planned cycle. */
    public static Batch of(HobCycle cycle, HobJob job) {
        MachineTimes t = job.machine().times();
        return new Batch(job.cycle().run().batchSize(), cycle.stepSeconds(), t.loadS(), t.unloadS());
    }

    /** Load, cycle and unload, s. */
    public double timePerPartS() {
        return loadS.orElse(0) + cycleS + unloadS.orElse(0);
    }

    /** Every part of the batch, s. */
    public double batchTimeS() {
        return parts * timePerPartS();
    }

    /** The times the machine profile does not give, by their profile keys ({@code times.load}). */
    public List<String> unknownTimes() {
        List<String> out = new ArrayList<>(2);
        if (loadS.isEmpty()) {
            out.add("times.load");
        }
        if (unloadS.isEmpty()) {
            out.add("times.unload");
        }
        return out;
    }
}
