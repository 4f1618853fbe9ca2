package org.hobwright.wizard.plan;

import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobbingMethod;

/**
 * Senses of rotation of hob and work, and the sign of the differential, for a hob hand, a helix
 * hand and climb or conventional hobbing. Derived here from the kinematics (no published text
 * read for the exact form); the machine's dialect maps each sense onto its own words.
 *
 * <p>Frame: the work axis Z points out of the gear's entry face, the hob feeds along −Z (from the
 * entry face toward the far face); the hob sits on the +X side with its axis along +Y (tilted by
 * the swivel), its drive end at −Y. Senses are seen as {@link Rotation} defines them: the work from
 * the entry face, the hob from its drive end.
 * <ul>
 * <li><b>Hob.</b> A hob tooth at the contact point moves along +Z when the hob turns clockwise seen
 *     from its drive end. Climb hobbing means the teeth move against the feed at contact (R. P.
 *     Phillips, "Design and Selection of Hobs", Gear Technology, glossary; FORMULAS.md §7.4), so climb = clockwise,
 *     conventional = counter-clockwise.</li>
 * <li><b>Work.</b> Like a worm and wheel: a right-hand thread turned clockwise (seen from its drive
 *     end) carries its tooth pattern toward −Y, which drags the gear teeth at the contact point
 *     clockwise seen from the entry face. Rule: the work turns in the same sense as the hob for a
 *     right-hand hob and in the opposite sense for a left-hand hob.</li>
 * <li><b>Differential.</b> A right-hand helix advances counter-clockwise (seen from +Z) as z grows
 *     (FORMULAS.md §5.2); feeding along −Z the work must turn an extra 360°·Δz/p_z counter-clockwise for a
 *     right-hand gear, clockwise for a left-hand gear. The sign is given relative to the work's own
 *     sense: +1 when the extra rotation adds to it, −1 when it opposes it.</li>
 * </ul>
 *
 * @param hob                  hob sense
 * @param work                 work sense
 * @param differentialSign     +1 when the helical addition turns the work further in its own sense, −1 otherwise
 */
public record SpindleSenses(Rotation hob, Rotation work, int differentialSign) {

    /**
     * The senses for a job.
     *
     * @param hobHand   hob thread hand
     * @param method    climb or conventional
     * @param gearHand  helix hand of the gear (only its sign matters, and only for helical gears)
     */
    public static SpindleSenses of(Hand hobHand, HobbingMethod method, Hand gearHand) {
        Rotation hob = method == HobbingMethod.CLIMB ? Rotation.CLOCKWISE : Rotation.COUNTER_CLOCKWISE;
        Rotation work = hobHand == Hand.RIGHT ? hob : hob.reversed();
        Rotation extra = gearHand == Hand.RIGHT ? Rotation.COUNTER_CLOCKWISE : Rotation.CLOCKWISE;
        return new SpindleSenses(hob, work, extra == work ? 1 : -1);
    }
}
