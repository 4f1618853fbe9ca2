package org.hobwright.api.job;

import java.util.Objects;
import java.util.OptionalDouble;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * How the user wants the gear cut. Empty values are filled by the planner from the cutting-data
 * table and the machine's limits.
 *
 * @param workMaterial        work material key of the cutting-data table, e.g. {@code steel-case-hardening}
 * @param cuttingSpeedMPerMin cutting speed v_c at the hob tip, m/min
 * @param roughFeedMmPerRev   axial feed per work revolution for roughing passes, mm
 * @param finishFeedMmPerRev  axial feed per work revolution for the finishing pass, mm
 * @param roughDepthMm        largest radial depth of one roughing pass, mm
 * @param finishStockMm       radial stock left for the finishing pass, mm (0 = one pass to full depth)
 * @param method              climb or conventional
 * @param axialClearanceMm    air gap before the approach and after the overrun, mm
 * @param radialClearanceMm   radial gap between the hob tip and the blank when rapid moving, mm
 * @param coolant             coolant on during the cut
 * @param targets             quality limits
 * @param hobShiftPerPartMm   hob shift applied between parts, mm (0 = no shifting)
 * @param hobShiftEveryParts  shift after this many parts, at least 1
 * @param fastest             true to let the optimiser propose the shortest cycle beside the user's plan
 */
@ApiStatus(since = "1.0")
public record CycleSettings(
        String workMaterial,
        OptionalDouble cuttingSpeedMPerMin,
        OptionalDouble roughFeedMmPerRev,
        OptionalDouble finishFeedMmPerRev,
        OptionalDouble roughDepthMm,
        double finishStockMm,
        HobbingMethod method,
        double axialClearanceMm,
        double radialClearanceMm,
        boolean coolant,
        QualityTargets targets,
        double hobShiftPerPartMm,
        int hobShiftEveryParts,
        boolean fastest) {

    public CycleSettings {
        Checks.text("cycle.workMaterial", workMaterial);
        Objects.requireNonNull(cuttingSpeedMPerMin, "cuttingSpeedMPerMin");
        Checks.field(JobFields.CYCLE_CUTTING_SPEED, cuttingSpeedMPerMin);
        Objects.requireNonNull(roughFeedMmPerRev, "roughFeedMmPerRev");
        Checks.field(JobFields.CYCLE_ROUGH_FEED, roughFeedMmPerRev);
        Objects.requireNonNull(finishFeedMmPerRev, "finishFeedMmPerRev");
        Checks.field(JobFields.CYCLE_FINISH_FEED, finishFeedMmPerRev);
        Objects.requireNonNull(roughDepthMm, "roughDepthMm");
        Checks.field(JobFields.CYCLE_ROUGH_DEPTH, roughDepthMm);
        Checks.field(JobFields.CYCLE_FINISH_STOCK, finishStockMm);
        Checks.present("cycle.method", method);
        Checks.field(JobFields.CYCLE_AXIAL_CLEARANCE, axialClearanceMm);
        Checks.field(JobFields.CYCLE_RADIAL_CLEARANCE, radialClearanceMm);
        Checks.present("cycle.targets", targets);
        Checks.field(JobFields.HOB_SHIFT_PER_PART, hobShiftPerPartMm);
        Checks.field(JobFields.HOB_SHIFT_EVERY_PARTS, hobShiftEveryParts);
    }
}
