package org.hobwright.post;

import java.util.Locale;
import java.util.Optional;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobbingMethod;

/**
 * What the setter checks at the machine before the first part, in words: the senses of rotation of
 * both spindles (from the cycle's synchronisation step), the direction of the axial feed (from the
 * cycle's cutting moves) and a hob turned round on its arbor (from the job). Printed by the program
 * header and the setup sheet alike.
 *
 * @param hob          the hob spindle, e.g. {@code clockwise seen from its drive end}
 * @param work         the work spindle, e.g. {@code counter-clockwise seen from the front face of the gear}
 * @param feed         the feed, e.g. {@code from the front face toward the chuck (climb hobbing)}
 * @param turnedRound  the warning in capitals when the hob is turned round on its arbor
 */
public record Senses(String hob, String work, String feed, Optional<String> turnedRound) {

    /** The senses of a cycle with steps. */
    public static Senses of(HobCycle cycle, HobJob job) {
        CycleStep.SyncOn on = cycle.steps().stream().filter(CycleStep.SyncOn.class::isInstance)
                .map(CycleStep.SyncOn.class::cast).findFirst().orElseThrow();
        String hob = on.hobRotation().word() + " seen from its drive end";
        String work = on.workRotation().word() + " seen from the front face of the gear";
        String method = job.cycle().method() == HobbingMethod.CLIMB ? "climb" : "conventional";
        String feed = (towardChuck(cycle) ? "from the front face toward the chuck" : "from the chuck side toward the "
                + "front face") + " (" + method + " hobbing)";
        Optional<String> turned = job.cycle().run().hobTurnedRound()
                ? Optional.of("HOB TURNED ROUND ON ITS ARBOR: THE HOB SPINDLE RUNS "
                + on.hobRotation().word().toUpperCase(Locale.ROOT) + " SEEN FROM ITS DRIVE END, AGAINST THE SENSE "
                + "MARKED ON THE HOB") : Optional.empty();
        return new Senses(hob, work, feed, turned);
    }

    /** True when the cutting moves run toward the back face (the axial coordinate grows). */
    private static boolean towardChuck(HobCycle cycle) {
        double last = Double.NaN;
        for (CycleStep s : cycle.steps()) {
            if (s instanceof CycleStep.Feed f) {
                if (f.cutting() && !Double.isNaN(last)) {
                    return f.axialMm() > last;
                }
                last = f.axialMm();
            } else if (s instanceof CycleStep.Rapid r) {
                last = r.axialMm();
            }
        }
        return true;
    }
}
