package org.hobwright.wizard.setup;

import java.util.Locale;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.SwivelHolder;

/**
 * The swivel in words: which hands meet, which rule gives the angle, and which way to turn the hob on
 * this machine. The machine's sense comes from its profile ({@link SwivelHolder#positiveSense()},
 * {@link SwivelHolder#positiveIsRight()}); nothing machine-specific is built in.
 */
public final class SwivelDirection {
    private SwivelDirection() {
    }

    /**
     * The swivel setting in the machine's own sign convention, degrees: η when the machine's positive
     * setting is a right-hand (positive) η, else −η.
     */
    public static double machineSettingDeg(HobSetup setup, SwivelHolder holder) {
        return holder.positiveIsRight() ? setup.swivelAngleDeg() : -setup.swivelAngleDeg();
    }

    /** Which hands meet and which rule gives |η|, e.g. "same hand (right-hand gear, right-hand hob): |η| = |β| − γ". */
    public static String rule(GearSpec gear, HobSpec hob) {
        String hobHand = hob.hand().word() + "-hand hob";
        if (gear.isSpur()) {
            return "spur gear with a " + hobHand + ": |η| = γ, tilted against the hob's hand";
        }
        String hands = "(" + gear.hand().word() + "-hand gear, " + hobHand + ")";
        return gear.hand() == hob.hand() ? "same hand " + hands + ": |η| = |β| − γ"
                : "opposite hands " + hands + ": |η| = |β| + γ";
    }

    /**
     * The direction in words for this machine, e.g. "turn the hob 13° 14′ 12.4″ (13.2368°) in the
     * machine's positive sense: top of the hob toward the chuck".
     */
    public static String describe(HobSetup setup, SwivelHolder holder) {
        double setting = machineSettingDeg(setup, holder);
        String amount = Angles.dms(Math.abs(setting))
                + String.format(Locale.ROOT, " (%.4f°)", Math.abs(setting));
        if (Math.abs(setting) < 1e-9) {
            return "no swivel: hob axis square to the work axis";
        }
        return setting > 0 ? "turn the hob " + amount + " in the machine's positive sense: " + holder.positiveSense()
                : "turn the hob " + amount + " against the machine's positive sense (positive is: "
                        + holder.positiveSense() + ")";
    }
}
