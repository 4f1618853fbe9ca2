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
 * @param run                 batch size, program number, tool station, hob mounting and hob life
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
        boolean fastest,
        @ApiStatus(since = "1.1") RunSettings run) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param workMaterial work material key of the cutting-data table, e.g. {@code steel-case-hardening}
     * @param cuttingSpeedMPerMin the value
     * @param roughFeedMmPerRev the value
     * @param finishFeedMmPerRev the value
     * @param roughDepthMm the value
     * @param finishStockMm radial stock left for the finishing pass, mm (0 = one pass to full depth)
     * @param method climb or conventional
     * @param axialClearanceMm air gap before the approach and after the overrun, mm
     * @param radialClearanceMm radial gap between the hob tip and the blank when rapid moving, mm
     * @param coolant coolant on during the cut
     * @param targets quality limits
     * @param hobShiftPerPartMm hob shift applied between parts, mm (0 = no shifting)
     * @param hobShiftEveryParts shift after this many parts, at least 1
     * @param fastest true to let the optimiser propose the shortest cycle beside the user's plan
     * @param run batch size, program number, tool station, hob mounting and hob life
     */
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
        Checks.present("cycle.run", run);
    }

    /**
     * Settings for one part with the dialect's program number and tool station ({@link RunSettings#DEFAULTS}).
     *
     * @param workMaterial work material key of the cutting-data table, e.g. {@code steel-case-hardening}
     * @param cuttingSpeedMPerMin the value
     * @param roughFeedMmPerRev the value
     * @param finishFeedMmPerRev the value
     * @param roughDepthMm the value
     * @param finishStockMm radial stock left for the finishing pass, mm (0 = one pass to full depth)
     * @param method climb or conventional
     * @param axialClearanceMm air gap before the approach and after the overrun, mm
     * @param radialClearanceMm radial gap between the hob tip and the blank when rapid moving, mm
     * @param coolant coolant on during the cut
     * @param targets quality limits
     * @param hobShiftPerPartMm hob shift applied between parts, mm (0 = no shifting)
     * @param hobShiftEveryParts shift after this many parts, at least 1
     * @param fastest true to let the optimiser propose the shortest cycle beside the user's plan
     */
    @ApiStatus(since = "1.1")
    public CycleSettings(String workMaterial, OptionalDouble cuttingSpeedMPerMin, OptionalDouble roughFeedMmPerRev,
                         OptionalDouble finishFeedMmPerRev, OptionalDouble roughDepthMm, double finishStockMm,
                         HobbingMethod method, double axialClearanceMm, double radialClearanceMm, boolean coolant,
                         QualityTargets targets, double hobShiftPerPartMm, int hobShiftEveryParts, boolean fastest) {
        this(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev, roughDepthMm, finishStockMm,
                method, axialClearanceMm, radialClearanceMm, coolant, targets, hobShiftPerPartMm, hobShiftEveryParts,
                fastest, RunSettings.DEFAULTS);
    }

    /**
     * This cycle settings with another {@code workMaterial}.
     *
     * @param workMaterial work material key of the cutting-data table, e.g. {@code steel-case-hardening}
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withWorkMaterial(String workMaterial) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with another {@code cuttingSpeedMPerMin}.
     *
     * @param cuttingSpeedMPerMin cutting speed v_c at the hob tip, m/min
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withCuttingSpeedMPerMin(OptionalDouble cuttingSpeedMPerMin) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with a {@code cuttingSpeedMPerMin} given.
     *
     * @param cuttingSpeedMPerMin the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withCuttingSpeedMPerMin(double cuttingSpeedMPerMin) {
        return withCuttingSpeedMPerMin(OptionalDouble.of(cuttingSpeedMPerMin));
    }

    /**
     * This cycle settings with another {@code roughFeedMmPerRev}.
     *
     * @param roughFeedMmPerRev axial feed per work revolution for roughing passes, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withRoughFeedMmPerRev(OptionalDouble roughFeedMmPerRev) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with a {@code roughFeedMmPerRev} given.
     *
     * @param roughFeedMmPerRev the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withRoughFeedMmPerRev(double roughFeedMmPerRev) {
        return withRoughFeedMmPerRev(OptionalDouble.of(roughFeedMmPerRev));
    }

    /**
     * This cycle settings with another {@code finishFeedMmPerRev}.
     *
     * @param finishFeedMmPerRev axial feed per work revolution for the finishing pass, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withFinishFeedMmPerRev(OptionalDouble finishFeedMmPerRev) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with a {@code finishFeedMmPerRev} given.
     *
     * @param finishFeedMmPerRev the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withFinishFeedMmPerRev(double finishFeedMmPerRev) {
        return withFinishFeedMmPerRev(OptionalDouble.of(finishFeedMmPerRev));
    }

    /**
     * This cycle settings with another {@code roughDepthMm}.
     *
     * @param roughDepthMm largest radial depth of one roughing pass, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withRoughDepthMm(OptionalDouble roughDepthMm) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with a {@code roughDepthMm} given.
     *
     * @param roughDepthMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withRoughDepthMm(double roughDepthMm) {
        return withRoughDepthMm(OptionalDouble.of(roughDepthMm));
    }

    /**
     * This cycle settings with another {@code finishStockMm}.
     *
     * @param finishStockMm radial stock left for the finishing pass, mm (0 = one pass to full depth)
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withFinishStockMm(double finishStockMm) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with another {@code method}.
     *
     * @param method climb or conventional
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withMethod(HobbingMethod method) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with another {@code axialClearanceMm}.
     *
     * @param axialClearanceMm air gap before the approach and after the overrun, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withAxialClearanceMm(double axialClearanceMm) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with another {@code radialClearanceMm}.
     *
     * @param radialClearanceMm radial gap between the hob tip and the blank when rapid moving, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withRadialClearanceMm(double radialClearanceMm) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with another {@code coolant}.
     *
     * @param coolant coolant on during the cut
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withCoolant(boolean coolant) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with another {@code targets}.
     *
     * @param targets quality limits
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withTargets(QualityTargets targets) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with another {@code hobShiftPerPartMm}.
     *
     * @param hobShiftPerPartMm hob shift applied between parts, mm (0 = no shifting)
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withHobShiftPerPartMm(double hobShiftPerPartMm) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with another {@code hobShiftEveryParts}.
     *
     * @param hobShiftEveryParts shift after this many parts, at least 1
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withHobShiftEveryParts(int hobShiftEveryParts) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with another {@code fastest}.
     *
     * @param fastest true to let the optimiser propose the shortest cycle beside the user's plan
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withFastest(boolean fastest) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }

    /**
     * This cycle settings with another {@code run}.
     *
     * @param run batch size, program number, tool station, hob mounting and hob life
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public CycleSettings withRun(RunSettings run) {
        return new CycleSettings(workMaterial, cuttingSpeedMPerMin, roughFeedMmPerRev, finishFeedMmPerRev,
                roughDepthMm, finishStockMm, method, axialClearanceMm, radialClearanceMm, coolant, targets,
                hobShiftPerPartMm, hobShiftEveryParts, fastest, run);
    }
}
