package org.hobwright.wizard.plan;

import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.MachineProfile;

/**
 * The hob speeds the machine and the hob allow, with the name of the limit at each end.
 * The work-spindle limits enter through the ratio: n₀ = n₂ z₂ / z₀.
 *
 * <pre>
 * upper = min(hob spindle max, hob maker's max, work spindle max · z₂/z₀)
 * lower = max(hob spindle min, work spindle min · z₂/z₀)
 * </pre>
 *
 * @param minRpm    lowest allowed hob speed, rpm
 * @param maxRpm    highest allowed hob speed, rpm
 * @param minLimit  the limit that sets the lowest speed, in words
 * @param maxLimit  the limit that sets the highest speed, in words
 */
public record SpeedWindow(double minRpm, double maxRpm, String minLimit, String maxLimit) {

    /** Words for the hob spindle's maximum. */
    public static final String HOB_SPINDLE_MAX = "hob spindle maximum speed (machine profile)";
    /** Words for the hob maker's maximum. */
    public static final String HOB_MAKER_MAX = "hob maximum speed (hob maker)";
    /** Words for the work spindle's maximum. */
    public static final String WORK_SPINDLE_MAX = "work spindle maximum speed through the sync ratio (machine profile)";

    /**
     * The window for a machine, a hob and a ratio. Reads the machine only through its accessors.
     *
     * @param machine the machine profile
     * @param hob     the hob
     * @param ratio   the sync ratio
     */
    public static SpeedWindow of(MachineProfile machine, HobSpec hob, SyncRatio ratio) {
        double perWork = ratio.hobTurnsPerWorkTurn();
        double max = machine.hobMaxRpm();
        String maxLimit = HOB_SPINDLE_MAX;
        if (hob.maxRpm().isPresent() && hob.maxRpm().getAsDouble() < max) {
            max = hob.maxRpm().getAsDouble();
            maxLimit = HOB_MAKER_MAX;
        }
        double workMax = machine.workMaxRpm() * perWork;
        if (workMax < max) {
            max = workMax;
            maxLimit = WORK_SPINDLE_MAX;
        }
        double min = machine.hobMinRpm();
        String minLimit = "hob spindle minimum speed (machine profile)";
        double workMin = machine.workMinRpm() * perWork;
        if (workMin > min) {
            min = workMin;
            minLimit = "work spindle minimum speed through the sync ratio (machine profile)";
        }
        return new SpeedWindow(min, max, minLimit, maxLimit);
    }

    /** True when some speed satisfies both ends. */
    public boolean isOpen() {
        return minRpm <= maxRpm;
    }

    /** True when the speed lies within the window (relative tolerance 1e-9). */
    public boolean contains(double rpm) {
        return rpm >= minRpm * (1 - 1e-9) && rpm <= maxRpm * (1 + 1e-9);
    }
}
