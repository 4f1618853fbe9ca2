package org.hobwright.wizard.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.wizard.setup.Angles;

/**
 * The steps before the synchronisation: comment lines (part, gear, hob, swivel, sync, cautions,
 * hob shift), the swivel move on machines with a programmable swivel, and the hob-shift move on
 * machines with a shift axis. Lengths in the comments are millimetres.
 */
public final class HeaderSteps {
    /** Caution printed in every program. */
    public static final String CAUTION = "CAUTION: rotating hob and synchronised spindles. Check the sync ratio,"
            + " directions and swivel against the machine builder's manual; prove out at reduced override, single"
            + " block, guards closed; follow local codes and licensed practice";
    /** Cutting-data remark printed in every program. */
    public static final String CUTTING_DATA = "Cutting data are typical values, to confirm with the hob supplier";

    private HeaderSteps() {
    }

    /** The header steps of a job. */
    public static List<CycleStep> of(HobJob job, double swivelAngleDeg, SwivelSetting swivel, Drive drive,
                                     PlanSettings s, Optional<HobShiftPlan> shift) {
        GearSpec g = job.gear();
        HobSpec h = job.hob();
        List<CycleStep> out = new ArrayList<>(12);
        out.add(comment(g.partName() + " - job " + job.name()));
        out.add(comment(String.format(Locale.ROOT, "gear: %d teeth, normal module %.4f mm, pressure angle %.2f deg,"
                + " helix %s, face width %.3f mm", g.teeth(), g.moduleMm(), g.pressureAngleDeg(),
                g.isSpur() ? "0 (spur)" : String.format(Locale.ROOT, "%.4f deg %s hand", g.helixAngleDeg(),
                        g.hand().word()), g.faceWidthMm())));
        out.add(comment(String.format(Locale.ROOT, "hob: %d start(s), %s hand, outside diameter %.3f mm, %d gashes,"
                + " %s", h.starts(), h.hand().word(), h.outsideDiameterMm(), h.gashes(), h.material())));
        out.add(comment(String.format(Locale.ROOT, "swivel: %s; angle %.4f deg = %s (right hand positive)",
                swivel.direction(), swivelAngleDeg, Angles.dms(swivelAngleDeg))));
        out.add(comment(String.format(Locale.ROOT, "sync: hob %d : work %d turns; hob %.1f rpm %s seen from its drive end; work %.4f rpm %s seen from the entry face",
                drive.ratio().hobTurns(), drive.ratio().workTurns(), s.hobRpm(), words(drive.senses().hob()),
                drive.workRpm(s.hobRpm()), words(drive.senses().work()))));
        if (drive.differentialDegPerMm() != 0) {
            out.add(comment(String.format(Locale.ROOT, "differential: %+.6f deg of work rotation per mm of axial feed",
                    drive.differentialDegPerMm())));
        }
        out.add(comment(CAUTION));
        out.add(comment(CUTTING_DATA));
        shift.ifPresent(p -> out.add(comment(p.describe())));
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
