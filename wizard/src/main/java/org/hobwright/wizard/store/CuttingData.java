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

    /** The same row with other feed ranges (for fine modules). */
    public CuttingData withFeeds(ValueRange rough, ValueRange finish) {
        return new CuttingData(workMaterial, hobMaterial, cuttingSpeed, rough, finish, maxChipThicknessMm, status);
    }
}
