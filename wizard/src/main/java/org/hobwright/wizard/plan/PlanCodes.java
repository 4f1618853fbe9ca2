package org.hobwright.wizard.plan;

/**
 * Stable finding codes of the planner (documented in DEVELOPERS.md, "Finding codes: planner").
 * Codes are never reused for another meaning.
 */
public final class PlanCodes {
    /** Sync ratio z₂/z₀ above the machine's largest ratio (error). */
    public static final String SYNC_RATIO_TOO_HIGH = "PLAN_SYNC_RATIO_TOO_HIGH";
    /** Touch-off (blank) diameter not above the root diameter (error). */
    public static final String NO_DEPTH = "PLAN_NO_DEPTH";
    /** Hob radius not larger than the depth to cut (error). */
    public static final String HOB_TOO_SMALL = "PLAN_HOB_TOO_SMALL";
    /** Swivel setting beyond the holder's range (error). */
    public static final String SWIVEL_BEYOND_HOLDER = "PLAN_SWIVEL_BEYOND_HOLDER";
    /** Holder resolution rounds the swivel angle (info). */
    public static final String SWIVEL_ROUNDED = "PLAN_SWIVEL_ROUNDED";
    /** No cutting-data row and a speed or feed left open (error). */
    public static final String CUTTING_DATA_MISSING = "PLAN_CUTTING_DATA_MISSING";
    /** No speed satisfies both the minimum and the maximum limits (error). */
    public static final String SPEED_WINDOW_EMPTY = "PLAN_SPEED_WINDOW_EMPTY";
    /** Hob speed lowered to a machine or hob limit (warning). */
    public static final String HOB_RPM_CAPPED = "PLAN_HOB_RPM_CAPPED";
    /** Hob speed raised to a machine minimum (warning). */
    public static final String HOB_RPM_RAISED = "PLAN_HOB_RPM_RAISED";
    /** Cutting speed outside the cutting-data range (warning, info when a limit caused it). */
    public static final String CUTTING_SPEED_OUTSIDE_TABLE = "PLAN_CUTTING_SPEED_OUTSIDE_TABLE";
    /** Feed outside the cutting-data range (warning). */
    public static final String FEED_OUTSIDE_TABLE = "PLAN_FEED_OUTSIDE_TABLE";
    /** Feed lowered to the machine's maximum feed rate (warning). */
    public static final String FEED_RATE_CAPPED = "PLAN_FEED_RATE_CAPPED";
    /** Default feed lowered below the table's range to meet a quality target (info). */
    public static final String FEED_LOWERED_FOR_TARGET = "PLAN_FEED_LOWERED_FOR_TARGET";
    /** Predicted flank feed mark deeper than the target (warning). */
    public static final String FEED_MARK_OVER_TARGET = "PLAN_FEED_MARK_OVER_TARGET";
    /** Predicted enveloping depth deeper than the target (warning). */
    public static final String ENVELOPING_OVER_TARGET = "PLAN_ENVELOPING_OVER_TARGET";
    /** Predicted chip thickness above the limit (warning). */
    public static final String CHIP_OVER_LIMIT = "PLAN_CHIP_OVER_LIMIT";
    /** No chip-thickness limit known, not checked (info). */
    public static final String CHIP_LIMIT_UNKNOWN = "PLAN_CHIP_LIMIT_UNKNOWN";
    /** Hob shift asked for on a machine without a shift axis (info). */
    public static final String HOB_SHIFT_NO_AXIS = "PLAN_HOB_SHIFT_NO_AXIS";
    /** Hob too short to shift within its usable length (warning). */
    public static final String HOB_SHIFT_NO_ROOM = "PLAN_HOB_SHIFT_NO_ROOM";
    /** Shift step larger than the usable shift range (warning). */
    public static final String HOB_SHIFT_STEP_TOO_LARGE = "PLAN_HOB_SHIFT_STEP_TOO_LARGE";
    /** A step outside the machine's radial travel (error). */
    public static final String TRAVEL_RADIAL = "PLAN_TRAVEL_RADIAL";
    /** A step outside the machine's axial travel (error). */
    public static final String TRAVEL_AXIAL = "PLAN_TRAVEL_AXIAL";
    /** A safety invariant failed inside the planner; nothing may be posted (error). */
    public static final String INVARIANT_BROKEN = "PLAN_INVARIANT_BROKEN";
    /** The fastest cycle, with its time, bound and binding limit (info). */
    public static final String FASTEST = "PLAN_FASTEST";
    /** No fastest cycle could be proposed (warning). */
    public static final String FASTEST_NONE = "PLAN_FASTEST_NONE";

    /** The hob's cutting sense is not given and clockwise is assumed (info). */
    public static final String HOB_SENSE_ASSUMED = "PLAN_HOB_SENSE_ASSUMED";
    /** The hob is turned round on its arbor and the spindle runs against its marked sense (warning). */
    public static final String HOB_TURNED_ROUND = "PLAN_HOB_TURNED_ROUND";

    /** Source text for rules of thumb. */
    public static final String NO_SOURCE = "common practice, no source";
    /** Source text for the machine profile limits. */
    public static final String MACHINE = "machine profile";
    /** Source text for the cutting-data table. */
    public static final String TABLE = "cutting-data table (typical values, to confirm with the hob supplier)";

    private PlanCodes() {
    }
}
