package org.hobwright.wizard.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;

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

    /**
     * The header steps of a job.
     *
     * @param job            the job
     * @param swivelAngleDeg η, signed, degrees
     * @param swivelDms      η as degrees-minutes-seconds
     * @param swivel         the machine's setting
     * @param drive          ratio, senses and differential
     * @param s              speeds of the plan
     * @param shift          hob shift, on machines with a shift axis
     */
    public static List<CycleStep> of(HobJob job, double swivelAngleDeg, String swivelDms, SwivelSetting swivel,
                                     Drive drive, PlanSettings s, Optional<HobShiftPlan> shift) {
        GearSpec g = job.gear();
        HobSpec h = job.hob();
        List<CycleStep> out = new ArrayList<>(12);
        out.add(comment(g.partName() + " - job " + job.name()));
        out.add(comment("gear: " + g.teeth() + " teeth, normal module " + Text.fixed(g.moduleMm(), 4)
                + " mm, pressure angle " + Text.fixed(g.pressureAngleDeg(), 2) + " deg, helix "
                + (g.isSpur() ? "0 (spur)" : Text.fixed(g.helixAngleDeg(), 4) + " deg " + g.hand().word() + " hand")
                + ", face width " + Text.fixed(g.faceWidthMm(), 3) + " mm"));
        out.add(comment("hob: " + h.starts() + " start(s), " + h.hand().word() + " hand, outside diameter "
                + Text.fixed(h.outsideDiameterMm(), 3) + " mm, " + h.gashes() + " gashes, " + h.material()));
        out.add(comment("swivel: " + swivel.direction() + "; angle " + Text.fixed(swivelAngleDeg, 4) + " deg = "
                + swivelDms + " (right hand positive)"));
        out.add(comment("sync: hob " + drive.ratio().hobTurns() + " : work " + drive.ratio().workTurns()
                + " turns; hob " + Text.fixed(s.hobRpm(), 1) + " rpm " + words(drive.senses().hob())
                + " seen from its drive end; work " + Text.fixed(drive.workRpm(s.hobRpm()), 4) + " rpm "
                + words(drive.senses().work()) + " seen from the entry face"));
        if (drive.differentialDegPerMm() != 0) {
            out.add(comment("differential: " + Text.signed(drive.differentialDegPerMm(), 6)
                    + " deg of work rotation per mm of axial feed"));
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
