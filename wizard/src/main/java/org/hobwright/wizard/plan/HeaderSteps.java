package org.hobwright.wizard.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.job.HobJob;
import org.hobwright.text.Decimal;

/**
 * The steps before the synchronisation: comment lines the setter needs beside the moves (sync ratio
 * and spindle senses, helical addition, hob shift), the swivel move on machines with a programmable
 * swivel, and the hob-shift move on machines with a shift axis. Part, gear, hob, swivel and the
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
        out.add(comment("sync: hob " + drive.ratio().hobTurns() + " : work " + drive.ratio().workTurns()
                + " turns; hob " + Decimal.fixed(s.hobRpm(), 1) + " rpm " + words(drive.senses().hob())
                + " seen from its drive end; work " + Decimal.fixed(drive.workRpm(s.hobRpm()), 4) + " rpm "
                + words(drive.senses().work()) + " seen from the entry face"));
        if (drive.differentialDegPerMm() != 0) {
            out.add(comment("differential: " + Decimal.signed(drive.differentialDegPerMm(), 6)
                    + " deg of work rotation per mm of axial feed"));
        }
        shift.ifPresent(p -> out.add(comment(p.describe(job.units()))));
        if (job.machine().swivel().programmable()) {
            out.add(new CycleStep.Swivel(swivel.machineAngleDeg(), 0));
        }
        shift.ifPresent(p -> out.add(new CycleStep.HobShift(p.positionMm(), 0)));
        return out;
    }

    private static String words(Rotation r) {
        return r == Rotation.CLOCKWISE ? "clockwise" : "counter-clockwise";
    }

    private static CycleStep.Comment comment(String text) {
        return new CycleStep.Comment(text.replace('\r', ' ').replace('\n', ' '));
    }
}
