package org.hobwright.api.host;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * One row of the cutting-data table the planner uses: the built-in typical values, replaced row by
 * row by the shop's own {@code cutting-data.json} in the library folder. Canonical units. Every
 * built-in value is a typical starting value, to be confirmed with the hob supplier.
 *
 * @param workMaterial       work material key, e.g. {@code steel-case-hardening}
 * @param hobMaterial        hob material key: {@code hss}, {@code hss-coated}, {@code carbide}
 * @param cuttingSpeedMPerMin cutting speed range at the hob tip, m/min
 * @param roughFeedMmPerRev  axial feed range for roughing, mm per work revolution (modules from the
 *                           fine-module limit on)
 * @param finishFeedMmPerRev axial feed range for finishing, mm per work revolution (as above)
 * @param maxChipThicknessMm largest chip thickness, mm
 * @param status             how sure the row is, e.g. "typical, confirm with the hob supplier"
 */
@ApiStatus(since = "1.1")
public record CuttingRow(String workMaterial, String hobMaterial, Range cuttingSpeedMPerMin, Range roughFeedMmPerRev,
                         Range finishFeedMmPerRev, double maxChipThicknessMm, String status) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param workMaterial work material key, e.g. {@code steel-case-hardening}
     * @param hobMaterial hob material key: {@code hss}, {@code hss-coated}, {@code carbide}
     * @param cuttingSpeedMPerMin cutting speed range at the hob tip, m/min
     * @param roughFeedMmPerRev axial feed range for roughing, mm per work revolution (modules from the fine-module
     *     limit on)
     * @param finishFeedMmPerRev axial feed range for finishing, mm per work revolution (as above)
     * @param maxChipThicknessMm largest chip thickness, mm
     * @param status how sure the row is, e.g. "typical, confirm with the hob supplier"
     */
    public CuttingRow {
        Checks.text("workMaterial", workMaterial);
        Checks.text("hobMaterial", hobMaterial);
        Checks.present("cuttingSpeedMPerMin", cuttingSpeedMPerMin);
        Checks.present("roughFeedMmPerRev", roughFeedMmPerRev);
        Checks.present("finishFeedMmPerRev", finishFeedMmPerRev);
        Checks.positive("maxChipThicknessMm", maxChipThicknessMm);
        Checks.present("status", status);
    }
}
