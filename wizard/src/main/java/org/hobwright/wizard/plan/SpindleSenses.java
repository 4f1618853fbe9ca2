package org.hobwright.wizard.plan;

import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.job.CuttingSense;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobbingMethod;

/**
 * Senses of rotation of hob and work, the direction of the axial feed and the sign of the
 * differential (FORMULAS.md §7.4).
 *
 * <p><b>The hob turns in its cutting sense, always.</b> A hob cuts in one sense only, set by the
 * way its teeth are relieved behind the cutting faces; turned backwards it rubs with the backs of
 * its teeth. The hob spindle therefore turns in the hob's cutting sense seen from the hob's drive
 * end, which is the spindle's sense seen from the spindle's drive end, unless the hob is turned
 * round on its arbor: then the spindle runs the other way. Climb or conventional hobbing is chosen
 * by the direction of the axial feed, never by the spindle.
 *
 * <p><b>Climb and conventional</b> (definitions read in R. P. Phillips, "Design and Selection of Hobs",
 * Gear Technology, glossary "climb hobbing", "conventional hobbing"; the same rule in D. P. Townsend
 * (ed.), <i>Dudley's Gear Handbook</i>, 2nd ed., McGraw-Hill 1991, hobbing chapter, from memory, page
 * not checked): climb hobbing turns the hob opposite to the feed of the hob relative to the work at
 * the point of contact (the chip starts thick); conventional hobbing turns it with the feed (the chip
 * starts thin).
 *
 * <p><b>Derivation</b> in the machine's own geometry. Unit vectors: w along the work axis, out of the
 * gear's front face (away from the chuck); x from the work axis toward the hob centre; h along the
 * hob axis, from the spindle's drive end toward the hob. The hob teeth at the work sit at −R x from
 * the hob centre. The machine profile states which way clockwise-turning teeth move at the work:
 * x × h = κ w with κ = +1 when they move away from the chuck, −1 toward it
 * ({@code clockwiseTeethTowardChuck}). With s = +1 for a clockwise spindle (ω = s h, clockwise seen
 * looking along +h):
 * <ul>
 * <li><b>Teeth at the contact:</b> v = ω × (−R x) = s R (x × h) = s κ R w.</li>
 * <li><b>Feed.</b> Feed sign φ = +1 when the hob travels from the front face toward the back face
 *     (along −w). Climb needs v · (−φ w) &lt; 0: φ = s κ; conventional φ = −s κ.</li>
 * <li><b>Work.</b> A thread of hand H (H = +1 right) turned with ω = s h carries its tooth pattern at
 *     the contact along −H s h, like a nut on a turning screw; the gear tooth at the contact, at r x
 *     from the work axis, must move with it: Ω w × r x = −H s h. Since h = κ (w × x),
 *     Ω = −H s κ / r. Seen from the front face (looking along −w) the work turns clockwise when
 *     Ω &lt; 0, that is when H s κ = +1.</li>
 * <li><b>Differential.</b> A right-hand helix advances counter-clockwise about +w as it rises toward
 *     the front face (FORMULAS.md §5.2); for each mm the hob travels toward the back face the work
 *     turns an extra 360°·Δ/p_z counter-clockwise (seen from the front face) for a right-hand gear,
 *     clockwise for a left-hand gear. The sign is given against the work's own sense and does not
 *     depend on the feed direction (the addition is per mm toward the back face).</li>
 * </ul>
 *
 * @param hob              hob spindle sense, seen from its drive end
 * @param work             work spindle sense, seen from the gear's front face
 * @param differentialSign +1 when the helical addition (per mm toward the back face) turns the work
 *                         further in its own sense, −1 otherwise
 * @param feedSign         +1 when the hob feeds from the front face toward the back face, −1 the other way
 */
public record SpindleSenses(Rotation hob, Rotation work, int differentialSign, int feedSign) {

    /**
     * The hob spindle's sense: the hob's cutting sense, reversed when the hob is turned round on its arbor.
     *
     * @param cutting      the sense the hob cuts in, seen from its own drive end
     * @param turnedRound  true when the hob's drive end faces away from the spindle's drive
     */
    public static Rotation hobSpindle(CuttingSense cutting, boolean turnedRound) {
        Rotation r = cutting == CuttingSense.CLOCKWISE ? Rotation.CLOCKWISE : Rotation.COUNTER_CLOCKWISE;
        return turnedRound ? r.reversed() : r;
    }

    /**
     * The senses for a job.
     *
     * @param hobSpindle           the hob spindle's sense ({@link #hobSpindle})
     * @param teethTowardChuck     true when clockwise-turning hob teeth move toward the chuck at the work
     * @param method               climb or conventional
     * @param hobHand              hob thread hand
     * @param gearHand             helix hand of the gear (only its sign matters, and only for helical gears)
     */
    public static SpindleSenses of(Rotation hobSpindle, boolean teethTowardChuck, HobbingMethod method, Hand hobHand,
                                   Hand gearHand) {
        int s = hobSpindle == Rotation.CLOCKWISE ? 1 : -1;
        int kappa = teethTowardChuck ? -1 : 1;
        int feed = method == HobbingMethod.CLIMB ? s * kappa : -s * kappa;
        Rotation work = hobHand.sign() * s * kappa > 0 ? Rotation.CLOCKWISE : Rotation.COUNTER_CLOCKWISE;
        Rotation extra = gearHand == Hand.RIGHT ? Rotation.COUNTER_CLOCKWISE : Rotation.CLOCKWISE;
        return new SpindleSenses(hobSpindle, work, extra == work ? 1 : -1, feed);
    }
}
