package org.hobwright.wizard.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobbingMethod;
import org.hobwright.api.job.MachineTimes;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;

/**
 * The steps before the synchronisation: comment lines the setter needs beside the moves (sync ratio
 * and spindle senses, feed direction, a hob turned round on its arbor, helical addition, hob shift),
 * the swivel setting (a move on machines with a programmable swivel, the setter's setting on a manual
 * holder), and the hob-shift move on machines with a shift axis. Part, gear, hob, swivel and the
 * cautions are not repeated here: every writer prints them in its own header.
 */
public final class HeaderSteps {
    private HeaderSteps() {
    }

    /**
     * The header steps of a job.
     *
     * @param job            the job
     * @param swivel         the machine's setting
     * @param drive          ratio, senses and differential
     * @param s              speeds of the plan
     * @param shift          hob shift, on machines with a shift axis
     */
    public static List<CycleStep> of(HobJob job, SwivelSetting swivel,
                                     Drive drive, PlanSettings s, Optional<HobShiftPlan> shift) {
        List<CycleStep> out = new ArrayList<>(12);
        Units u = job.units();
        out.add(comment("sync: hob " + drive.ratio().hobTurns() + " : work " + drive.ratio().workTurns()
                + " turns; hob " + Decimal.fixed(s.hobRpm(), 1) + " rpm " + drive.senses().hob().word()
                + " seen from its drive end; work " + Decimal.fixed(drive.workRpm(s.hobRpm()), 4) + " rpm "
                + drive.senses().work().word() + " seen from the front face"));
        out.add(comment(feedWords(drive.senses().feedSign(), job.cycle().method())));
        if (job.cycle().run().hobTurnedRound()) {
            out.add(comment("HOB TURNED ROUND ON ITS ARBOR: THE HOB SPINDLE RUNS "
                    + drive.senses().hob().word().toUpperCase(Locale.ROOT) + " SEEN FROM ITS DRIVE END"));
        }
        if (drive.differentialDegPerMm() != 0) {
            out.add(comment("differential: " + Decimal.signed(drive.differentialDegPerMm() * u.toMm(1), 6)
                    + " deg of work rotation per " + u.symbol() + " of axial travel toward the back face"));
        }
        shift.ifPresent(p -> out.add(comment(p.describe(u))));
        MachineTimes times = job.machine().times();
        boolean programmable = job.machine().swivel().programmable();
        out.add(new CycleStep.Swivel(swivel.machineAngleDeg(), programmable ? times.swivelS().orElse(0) : 0,
                programmable));
        shift.ifPresent(p -> out.add(new CycleStep.HobShift(p.positionMm(), times.hobShiftS().orElse(0))));
        return out;
    }

    /** The feed direction in words a setter checks at the machine. */
    static String feedWords(int feedSign, HobbingMethod method) {
        return "feed: " + (feedSign > 0 ? "from the front face toward the chuck" : "from the chuck side toward the "
                + "front face") + " (" + (method == HobbingMethod.CLIMB ? "climb" : "conventional") + " hobbing)";
    }

    private static CycleStep.Comment comment(String text) {
        return new CycleStep.Comment(text.replace('\r', ' ').replace('\n', ' '));
    }
}
