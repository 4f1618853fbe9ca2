package org.hobwright.api.cycle;

import java.util.List;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * Result of the generating simulation of one tooth space (transverse section).
 *
 * @param profileDeviationMaxMm      largest deviation of the simulated flank from the true involute, mm
 * @param envelopingDepthMm          enveloping-cut depth measured on the simulated flank, mm
 * @param closedFormEnvelopingDepthMm the same estimated by the closed-form formula, mm
 * @param undercut                   true when the simulated root cuts into the involute (undercut)
 * @param activeInvoluteStartDiameterMm diameter where the simulated flank becomes involute, mm
 * @param simulatedProfile           the simulated tooth space outline, root to tip on both flanks,
 *                                   gear centre at the origin, tooth space centred on +y, mm
 * @param nominalProfile             the true involute flanks on the same axes, mm
 * @param deviation                  deviation along the roll length: x = roll length mm, y = deviation mm
 */
@ApiStatus(since = "1.0")
public record SimulationData(
        double profileDeviationMaxMm,
        double envelopingDepthMm,
        double closedFormEnvelopingDepthMm,
        boolean undercut,
        double activeInvoluteStartDiameterMm,
        List<Point> simulatedProfile,
        List<Point> nominalProfile,
        List<Point> deviation) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param profileDeviationMaxMm largest deviation of the simulated flank from the true involute, mm
     * @param envelopingDepthMm enveloping-cut depth measured on the simulated flank, mm
     * @param closedFormEnvelopingDepthMm the same estimated by the closed-form formula, mm
     * @param undercut true when the simulated root cuts into the involute (undercut)
     * @param activeInvoluteStartDiameterMm diameter where the simulated flank becomes involute, mm
     * @param simulatedProfile the simulated tooth space outline, root to tip on both flanks, gear centre at the
     *     origin, tooth space centred on +y, mm
     * @param nominalProfile the true involute flanks on the same axes, mm
     * @param deviation deviation along the roll length: x = roll length mm, y = deviation mm
     */
    public SimulationData {
        Checks.nonNegative("profileDeviationMaxMm", profileDeviationMaxMm);
        Checks.nonNegative("envelopingDepthMm", envelopingDepthMm);
        Checks.nonNegative("closedFormEnvelopingDepthMm", closedFormEnvelopingDepthMm);
        Checks.nonNegative("activeInvoluteStartDiameterMm", activeInvoluteStartDiameterMm);
        simulatedProfile = List.copyOf(Checks.present("simulatedProfile", simulatedProfile));
        nominalProfile = List.copyOf(Checks.present("nominalProfile", nominalProfile));
        deviation = List.copyOf(Checks.present("deviation", deviation));
    }
}
