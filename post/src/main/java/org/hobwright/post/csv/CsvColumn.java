package org.hobwright.post.csv;

/**
 * The columns of the cycle CSV, version {@value CycleCsv#VERSION}, in file order. Header names
 * carry the unit ({@code _mm}, {@code _s}, {@code _rpm}, {@code _deg}); columns without a unit are
 * counts, words or flags. Readers look columns up by header name.
 */
public enum CsvColumn {
    /** Version of the column set; the same on every row. */
    FORMAT_VERSION("format_version"),
    /** Step number, 1 = first. */
    STEP_NO("step_no"),
    /** Step kind: comment, coolant, swivel, sync-on, sync-off, spindles-stop, dwell, hob-shift, rapid, feed. */
    KIND("kind"),
    /** Pass number (rapid, feed), 0 outside the passes. */
    PASS_NO("pass_no"),
    /** Work diameter the hob tip reaches at the end of the move (rapid, feed), mm. */
    DIAMETER_MM("diameter_mm"),
    /** Hob centre along the work axis from the front face (rapid, feed), mm. */
    AXIAL_MM("axial_mm"),
    /** The hob's tip (outside) diameter d_a0 (rapid, feed), mm. */
    HOB_TIP_DIAMETER_MM("hob_tip_diameter_mm"),
    /** The hob centre's distance from the work axis at the end of the move (rapid, feed), mm. */
    HOB_CENTRE_RADIUS_MM("hob_centre_radius_mm"),
    /** The dialect's letter of the radial axis (rapid, feed; empty without a dialect). */
    RADIAL_AXIS("radial_axis"),
    /**
     * The hob centre on the radial axis as the dialect counts it: the centre distance, doubled for
     * diameter programming, times the axis sign (rapid, feed), mm.
     */
    RADIAL_VALUE_MM("radial_value_mm"),
    /** The dialect's letter of the axial axis (rapid, feed; empty without a dialect). */
    AXIAL_AXIS("axial_axis"),
    /** The hob centre on the axial axis as the dialect counts it: axial_mm times the axis sign (rapid, feed), mm. */
    AXIAL_VALUE_MM("axial_value_mm"),
    /** Feed per work revolution (feed), mm. */
    FEED_MM_PER_REV("feed_mm_per_rev"),
    /** true when the hob cuts (feed). */
    CUTTING("cutting"),
    /** Hob turns of the ratio (sync-on). */
    HOB_TURNS("hob_turns"),
    /** Work turns of the ratio (sync-on). */
    WORK_TURNS("work_turns"),
    /** Hob speed (sync-on), rpm. */
    HOB_RPM("hob_rpm"),
    /** Work speed (sync-on), rpm. */
    WORK_RPM("work_rpm"),
    /** Hob sense of rotation (sync-on): clockwise or counter-clockwise. */
    HOB_ROTATION("hob_rotation"),
    /** Work sense of rotation (sync-on). */
    WORK_ROTATION("work_rotation"),
    /** Helical addition (sync-on), degrees of work rotation per mm of axial travel. */
    DIFFERENTIAL_DEG_PER_MM("differential_deg_per_mm"),
    /** Swivel setting in the machine's sign convention (swivel), degrees. */
    SWIVEL_DEG("swivel_deg"),
    /** true when the control turns the swivel axis, false for a manual holder the setter sets (swivel). */
    SWIVEL_PROGRAMMABLE("swivel_programmable"),
    /** The dialect's letter of the swivel axis (swivel, programmable, when the dialect has one). */
    SWIVEL_AXIS("swivel_axis"),
    /** Hob shift position (hob-shift), mm. */
    HOB_SHIFT_MM("hob_shift_mm"),
    /** true for coolant on, false for off (coolant). */
    COOLANT("coolant"),
    /** Duration of the step, s. */
    TIME_S("time_s"),
    /** Comment text (comment). */
    TEXT("text");

    private final String header;

    CsvColumn(String header) {
        this.header = header;
    }

    /** The header name. */
    public String header() {
        return header;
    }
}
