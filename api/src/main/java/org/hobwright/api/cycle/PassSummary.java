package org.hobwright.api.cycle;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * One axial pass.
 *
 * @param pass              pass number, 1 = first
 * @param infeedDiameterMm  work diameter of the hob tip during this pass, mm
 * @param radialDepthMm     depth below the blank tip reached by this pass, mm
 * @param feedMmPerRev      axial feed per work revolution, mm
 * @param approachMm        approach (run-in) length from first contact to full depth, mm
 * @param overrunMm         overrun (run-out) length past the face where the hob leaves the gear, mm
 * @param axialTravelMm     whole feed travel of the pass, mm
 * @param seconds           time of the pass including its rapids, s
 */
@ApiStatus(since = "1.0")
public record PassSummary(int pass, double infeedDiameterMm, double radialDepthMm, double feedMmPerRev,
                          double approachMm, double overrunMm, double axialTravelMm, double seconds) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param pass pass number, 1 = first
     * @param infeedDiameterMm work diameter of the hob tip during this pass, mm
     * @param radialDepthMm depth below the blank tip reached by this pass, mm
     * @param feedMmPerRev axial feed per work revolution, mm
     * @param approachMm approach (run-in) length from first contact to full depth, mm
     * @param overrunMm overrun (run-out) length past the face where the hob leaves the gear, mm
     * @param axialTravelMm whole feed travel of the pass, mm
     * @param seconds time of the pass including its rapids, s
     */
    public PassSummary {
        Checks.atLeast("pass", pass, 1);
        Checks.positive("infeedDiameterMm", infeedDiameterMm);
        Checks.positive("radialDepthMm", radialDepthMm);
        Checks.positive("feedMmPerRev", feedMmPerRev);
        Checks.nonNegative("approachMm", approachMm);
        Checks.nonNegative("overrunMm", overrunMm);
        Checks.positive("axialTravelMm", axialTravelMm);
        Checks.nonNegative("seconds", seconds);
    }
}
