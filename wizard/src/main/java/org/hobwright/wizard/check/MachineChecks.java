package org.hobwright.wizard.check;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.HobJob;
import org.hobwright.wizard.setup.HobSetup;

/** Can the machine of the job cut this gear with this hob? Limits from the machine profile. */
public final class MachineChecks {
    private MachineChecks() {
    }

    /** Helical gear on a machine that cannot add the helical work rotation; hob too large for the holder. */
    public static void capacity(HobJob job, Wording words, List<Finding> out) {
        var machine = job.machine();
        if (!job.gear().isSpur() && !machine.followsHelix()) {
            out.add(EngineeringCode.MACHINE_NO_HELIX.at("gear.helixAngle", "machine " + machine.name()
                    + " cannot add the helical work rotation (followsHelix is false), so it cannot hob a "
                    + words.angle(job.gear().helixAngleDeg()) + " helical gear",
                    "choose a machine whose profile follows a helix, or check that the gear is meant to be helical"));
        }
        if (job.hob().outsideDiameterMm() > machine.maxHobDiameterMm()) {
            out.add(EngineeringCode.MACHINE_HOB_TOO_LARGE.at("hob.outsideDiameter", "hob outside diameter "
                    + words.length(job.hob().outsideDiameterMm()) + " is larger than machine " + machine.name()
                    + " takes (" + words.length(machine.maxHobDiameterMm()) + ")",
                    "use a hob of at most " + words.length(machine.maxHobDiameterMm()) + " or another machine"));
        }
    }

    /** The swivel angle must lie within the machine's swivel range. */
    public static void swivel(HobJob job, HobSetup setup, Wording words, List<Finding> out) {
        double max = job.machine().swivel().maxAngleDeg();
        double eta = setup.swivelAngleDeg();
        if (Math.abs(eta) <= max + 1e-9) {
            return;
        }
        double sameHand = Math.abs(job.gear().helixAngleDeg()) - setup.leadAngleDeg();
        boolean handHelps = !job.gear().isSpur() && job.gear().hand() != job.hob().hand() && Math.abs(sameHand) <= max;
        String field = handHelps ? "hob.hand" : "gear.helixAngle";
        String fix = handHelps ? "use a " + job.gear().hand().word() + "-hand hob: the swivel becomes "
                + words.angle(sameHand) : "choose a machine with a larger swivel range";
        out.add(EngineeringCode.MACHINE_SWIVEL_LIMIT.at(field, "swivel angle " + words.angle(eta) + " is beyond the "
                + "range ±" + words.angle(max) + " of machine " + job.machine().name(), fix));
    }
}
