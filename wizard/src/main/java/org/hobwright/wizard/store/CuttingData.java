package org.hobwright.wizard.store;

/**
 * One row of the cutting-data table: typical values for a work material cut with a hob material.
 * Every built-in value is typical, to be confirmed with the hob supplier (orders of magnitude from
 * hob-maker tables, from memory, FORMULAS.md §8.2). Canonical units.
 *
 * @param workMaterial       work material key, e.g. {@code steel-case-hardening}
 * @param hobMaterial        hob material key: {@code hss}, {@code hss-coated}, {@code carbide}
 * @param cuttingSpeed       cutting speed range, m/min
 * @param roughFeed          axial feed range for roughing, single-start hob, mm per work revolution
 * @param finishFeed         axial feed range for finishing, mm per work revolution
 * @param maxChipThicknessMm largest Hoffmeister chip thickness, mm
 * @param status             how sure the row is, e.g. "typical, confirm with the hob supplier"
 */
public record CuttingData(String workMaterial, String hobMaterial, ValueRange cuttingSpeed, ValueRange roughFeed,
                          ValueRange finishFeed, double maxChipThicknessMm, String status) {

    /** Factor of the speed range for splines (typical, to confirm with the hob supplier; common practice, no source). */
    public static final double SPLINE_SPEED = 0.9;
    /** Factor of the feed ranges for splines (typical, to confirm with the hob supplier; common practice, no source). */
    public static final double SPLINE_FEED = 0.8;

    /**
     * The row for a spline: speed × {@value #SPLINE_SPEED} and feeds × {@value #SPLINE_FEED}. The spline's
     * 30° to 45° flanks load the hob tooth's corners harder than a 20° gear of the same module, and a
     * spline's teeth are cut to full depth in one or two passes: the built-in rule lowers speed and feed
     * a step. Typical values, to be confirmed with the hob supplier (common practice, no source).
     */
    public CuttingData forSplines() {
        return new CuttingData(workMaterial, hobMaterial, cuttingSpeed.times(SPLINE_SPEED), roughFeed.times(SPLINE_FEED),
                finishFeed.times(SPLINE_FEED), maxChipThicknessMm, status + "; spline rule: speed × " + SPLINE_SPEED
                + ", feeds × " + SPLINE_FEED + " (typical)");
    }

    /** The same row with other feed ranges (for fine modules). */
    public CuttingData withFeeds(ValueRange rough, ValueRange finish) {
        return new CuttingData(workMaterial, hobMaterial, cuttingSpeed, rough, finish, maxChipThicknessMm, status);
    }
}
